import rule from '../../rules/checks/rail-crossing.ts';
import { ruleTester } from '../support/ruleTester.ts';
import { design, input, link, net, part, scenario } from '../support/build.ts';

ruleTester(rule, {
  valid: [
    {
      name: 'a net on one rail',
      design: link({ rail: '3v3', profile: 'lvcmos33' }, { rail: '3v3', profile: 'lvcmos33' }),
    },
    {
      name: "a pull resistor's rail does not make a crossing",
      design: link(
        { rail: '3v3', profile: 'i2c', pin: { drive: 'open-drain' } },
        { rail: '3v3', profile: 'i2c' },
        { net: { pull: { to: '5v0', ohms: 4700 } } },
      ),
    },
  ],
  invalid: [
    {
      // JESD8C LVCMOS VOH 3.135 − 0.2 V, VOL 0.2 V into 74HCT 2.0 / 0.8 V (JESD7 as restated).
      name: 'a passing crossing is still listed, with its margins',
      design: link({ rail: '3v3', profile: 'lvcmos33' }, { rail: '5v0', profile: '74hct' }),
      findings: [
        {
          messageId: 'crosses',
          severity: 'info',
          id: 'rail-crossing:N:all-on',
          values: { rails: ['3v3', '5v0'], marginHigh: 2.935 - 2.0, marginLow: 0.8 - 0.2 },
        },
      ],
    },
    {
      name: 'one row per power state; margins null without a powered pair',
      design: link(
        { rail: '3v3', profile: 'lvcmos33' },
        { rail: '5v0', profile: '74hct' },
        { scenarios: [scenario('tx-off', ['3v3'])] },
      ),
      findings: [
        { messageId: 'crosses', severity: 'info', scenario: 'all-on' },
        { messageId: 'crosses', severity: 'info', scenario: 'tx-off', values: { marginHigh: null, marginLow: null } },
      ],
    },
    {
      name: 'inputs alone on two rails cross too',
      design: design({
        parts: [part('A', '3v3', 'lvcmos33', [input('X')]), part('B', '1v8', 'lvcmos18', [input('X')])],
        nets: [net('N', ['A.X', 'B.X'])],
      }),
      findings: [
        {
          messageId: 'crosses',
          severity: 'info',
          values: { rails: ['3v3', '1v8'], marginHigh: null, marginLow: null },
        },
      ],
    },
  ],
});
