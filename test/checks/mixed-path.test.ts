import rule from '../../rules/checks/mixed-path.ts';
import type { Design } from '../../rules/model/schema.ts';
import { ruleTester } from '../support/ruleTester.ts';
import { net, resistor, scenario } from '../support/build.ts';
import { divider, fetBus } from '../support/paths.ts';

// The pair analysis solves series resistors (nodal analysis), one shifter next to the receiver's
// net, and series resistors before such a shifter; a driver that reaches a receiver through
// anything more is reported.

/** The FET-shifted bus with a series resistor RS between the 3.3 V controller and the shifter's drain. */
function resistorThenFet(extra: { standby?: boolean } = {}): Design {
  const d = fetBus();
  return {
    ...d,
    ...(extra.standby === true ? { scenarios: [scenario('standby', ['1v8'])] } : {}),
    discretes: [...(d.discretes ?? []), resistor('RS', 100, { tolerance: 0.01 })],
    nets: [
      net('SDA_X', ['U1.SDA', 'RS.1']),
      net('SDA_H', ['RS.2', 'Q1.D', 'RH.1']),
      net('SDA_L', ['U2.SDA', 'Q1.S', 'RL.1']),
    ],
  };
}

/** Two FET shifters in a row: 1.8 V — Q1 — a middle net — Q2 — 3.3 V. */
function twoFets(): Design {
  const d = fetBus();
  return {
    ...d,
    discretes: [
      ...(d.discretes ?? []),
      { id: 'Q2', kind: 'fet-shifter', gate: '1v8', vgsThMax: 1, rdsOnMax: 6 },
      resistor('RM', 4700, { tolerance: 0.01, tie: { '2': '3v3' } }),
    ],
    nets: [
      net('SDA_H', ['U1.SDA', 'Q2.D', 'RH.1']),
      net('SDA_M', ['Q2.S', 'Q1.D', 'RM.1']),
      net('SDA_L', ['U2.SDA', 'Q1.S', 'RL.1']),
    ],
  };
}

ruleTester(rule, {
  valid: [
    { name: 'a FET shifter between the two chips (solved per shifter)', design: fetBus() },
    { name: 'a divider (solved by nodal analysis)', design: divider() },
  ],
  invalid: [
    {
      // U1 → RS → Q1 → U2 is solved (test/engine/chain.test.ts); U2 → Q1 → RS → U1, a resistor
      // beyond the shifter, is not.
      name: 'a series resistor beyond a FET shifter',
      design: resistorThenFet(),
      findings: [
        {
          messageId: 'notSolved',
          severity: 'error',
          id: 'mixed-path:SDA_X:all-on:U2.SDA',
          values: { driver: 'U2.SDA', via: ['Q1', 'RS'], receivers: ['U1.SDA'] },
        },
      ],
    },
    {
      // With the 1.8 V gate rail off the FET passes nothing; U2 is off too. Only all-on reports.
      name: 'a FET whose gate rail is off passes nothing',
      design: resistorThenFet({ standby: true }),
      findings: [{ messageId: 'notSolved', severity: 'error', id: 'mixed-path:SDA_X:all-on:U2.SDA' }],
    },
    {
      name: 'two FET shifters in a row',
      design: twoFets(),
      findings: [
        {
          messageId: 'notSolved',
          severity: 'error',
          id: 'mixed-path:SDA_H:all-on:U2.SDA',
          values: { via: ['Q1', 'Q2'] },
        },
        {
          messageId: 'notSolved',
          severity: 'error',
          id: 'mixed-path:SDA_L:all-on:U1.SDA',
          values: { via: ['Q2', 'Q1'] },
        },
      ],
    },
  ],
});
