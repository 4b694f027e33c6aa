import rule from '../../rules/checks/overvoltage.ts';
import { ruleTester } from '../support/ruleTester.ts';
import { design, link, net, output, input, part, rail, rail3v3, scenario } from '../support/build.ts';
import { divider, seriesClamp } from '../support/paths.ts';

ruleTester(rule, {
  valid: [
    {
      // 74LVC inputs accept up to 5.5 V whatever VDD (as restated in parts' DC tables).
      name: '5 V output into a 5 V-tolerant 3.3 V input',
      design: link({ rail: '5v0', profile: '74hc' }, { rail: '3v3', profile: '74lvc' }),
    },
    {
      name: 'a source exactly at the limit does not exceed it',
      design: design({
        rails: [rail('5v5', 5, { max: 5.5 }), rail3v3],
        parts: [part('D', '5v5', '74hc', [output('Y')]), part('R', '3v3', '74lvc', [input('A')])],
        nets: [net('N', ['D.Y', 'R.A'])],
      }),
    },
    {
      // One rail, one VDD: VDD never exceeds VDD + 0.5.
      name: 'same-rail push-pull into a clamped CMOS input',
      design: link({ rail: '5v0', profile: '74hc' }, { rail: '5v0', profile: '74hc' }),
    },
    {
      name: 'an open-drain driver on a higher rail, pulled up to the receiver rail',
      design: link(
        { rail: '5v0', profile: '74hc', pin: { drive: 'open-drain' } },
        { rail: '3v3', profile: 'lvcmos33' },
        { net: { pull: { to: '3v3', ohms: 10000 } } },
      ),
    },
    {
      name: 'a pin without viMax is not checked',
      design: link({ rail: '5v0', profile: '74hc' }, { rail: '3v3', profile: 'off-board' }),
    },
    {
      name: 'a pull to ground never raises the net',
      design: link(
        { rail: '1v8', profile: 'lvcmos18' },
        { rail: '1v8', profile: 'lvcmos18' },
        { net: { pull: { to: 'ground', ohms: 10000 } } },
      ),
    },
    {
      // The divider: judged at 5.25 × 3.333/(2.178 + 3.333) = 3.175 V, below 3.135 + 0.5 V.
      name: 'a 2.2 kΩ / 3.3 kΩ divider from 5 V into a 3.3 V input',
      design: divider(),
    },
    {
      name: "a series resistor into a pin with an injection limit is clamp-current's to judge",
      design: seriesClamp({ injectionMax: 5e-3 }),
    },
  ],
  invalid: [
    {
      // Through 1 kΩ the open net still reaches 5.25 V; the clamp would carry (5.25 − 3.135)/950.
      name: 'a series resistor into a pin that states no injection limit',
      design: seriesClamp(),
      findings: [
        {
          messageId: 'throughResistance',
          severity: 'error',
          id: 'overvoltage:RX1:all-on:U2.A1',
          values: { vNet: 5.25, viMax: 3.635, current: (5.25 - 3.135) / 950, source: 'U1.Y1' },
        },
      ],
    },
    {
      // A CMOS input without tolerance: VDD + 0.5 V (the 3.3 V interface standards print this
      // form, restated), at the receiver rail's lowest 3.135 V, against the 5 V rail's 5.25 V.
      name: '5 V push-pull into a 3.3 V LVCMOS input',
      design: link({ rail: '5v0', profile: '74hc' }, { rail: '3v3', profile: 'lvcmos33' }),
      findings: [
        {
          messageId: 'tooHigh',
          severity: 'error',
          id: 'overvoltage:N:all-on:R.A',
          pins: ['R.A'],
          values: { vNet: 5.25, viMax: 3.135 + 0.5, pin: 'R.A' },
        },
      ],
    },
    {
      name: "a pin's own internal pull-up to a higher rail",
      design: design({
        parts: [
          part('R', '1v8', 'lvcmos18', [input('A', { pull: { to: '3v3', ohms: 47000 } })]),
          part('D', '1v8', 'lvcmos18', [output('Y')]),
        ],
        nets: [net('N', ['D.Y', 'R.A'])],
      }),
      findings: [
        {
          messageId: 'tooHigh',
          severity: 'error',
          id: 'overvoltage:N:all-on:D.Y',
          values: { vNet: 3.465, viMax: 1.71 + 0.5 },
        },
        {
          messageId: 'tooHigh',
          severity: 'error',
          id: 'overvoltage:N:all-on:R.A',
          values: { vNet: 3.465, viMax: 1.71 + 0.5 },
        },
      ],
    },
    {
      // With the 5 V rail off the driver puts nothing on the net; with the 3.3 V rail off the
      // receiver is back-power's to judge. Only all-on remains.
      name: 'pins on an off rail neither drive nor are checked',
      design: link(
        { rail: '5v0', profile: '74hc' },
        { rail: '3v3', profile: 'lvcmos33' },
        {
          scenarios: [scenario('tx-off', ['5v0']), scenario('rx-off', ['3v3'])],
        },
      ),
      findings: [{ messageId: 'tooHigh', severity: 'error', scenario: 'all-on' }],
    },
    {
      // The net's pull-up to 5 V reaches the 3.3 V input even though every driver is open-drain.
      name: 'a pull-up to a higher rail',
      design: link(
        { rail: '3v3', profile: '74lvc', pin: { drive: 'open-drain' } },
        { rail: '3v3', profile: 'lvcmos33' },
        { net: { pull: { to: '5v0', ohms: 10000 } } },
      ),
      findings: [{ messageId: 'tooHigh', severity: 'error', id: 'overvoltage:N:all-on:R.A', values: { vNet: 5.25 } }],
    },
  ],
});
