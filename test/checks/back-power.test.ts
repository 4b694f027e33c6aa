import rule from '../../rules/checks/back-power.ts';
import { ruleTester } from '../support/ruleTester.ts';
import {
  bidir,
  design,
  input,
  link,
  net,
  output,
  part,
  rail,
  rail1v8,
  rail3v3,
  rail5v0,
  scenario,
} from '../support/build.ts';

// Rail ends: 5 V ± 5 % = 4.75–5.25 V, 3.3 V ± 5 % = 3.135–3.465 V. In a scenario an off rail is
// 0 V (rules-catalogue.md). 74HC: JESD7 as restated; 74LVC: partial power-down, pins may carry
// 5.5 V at VDD = 0 (as restated in parts' DC tables); an unpowered pin without such a rating
// conducts through its clamp diode above about 0.5 V (common practice).
const rxOff = [scenario('rx-off', ['3v3'])];

/** A 74HC output on 5 V drives input R.A of a part on 3.3 V, whose rail is off in `rx-off`. */
const fiveVoltInto = (receiver: Parameters<typeof link>[1], extra: Parameters<typeof link>[2] = {}) =>
  link({ rail: '5v0', profile: '74hc' }, receiver, { scenarios: rxOff, ...extra });

ruleTester(rule, {
  valid: [
    {
      name: 'no scenario: all-on has no off rail',
      design: link({ rail: '5v0', profile: '74hc' }, { rail: '3v3', profile: 'lvcmos33' }),
    },
    // 74LVC: unpoweredSafe with viMaxOff 5.5 V; 5.25 V stays below it.
    { name: '74LVC partial power-down takes a 5 V driver', design: fiveVoltInto({ rail: '3v3', profile: '74lvc' }) },
    {
      // 5 V ± 10 % reaches 5.5 V exactly: "exceeds" is strict (rules-catalogue.md, "Comparisons").
      name: '74LVC at exactly its 5.5 V unpowered limit',
      design: fiveVoltInto(
        { rail: '3v3', profile: '74lvc' },
        {
          rails: [{ ...rail5v0, tolerance: 0.1 }, rail3v3, rail1v8],
        },
      ),
    },
    {
      // A source at exactly the 0.5 V clamp limit (a 0.5 V rail with no tolerance).
      name: 'exactly at the 0.5 V clamp limit',
      design: link(
        { rail: 'bias', profile: 'lvcmos33' },
        { rail: '3v3', profile: 'lvcmos33' },
        {
          rails: [rail('bias', 0.5, { tolerance: 0 }), rail3v3],
          scenarios: rxOff,
        },
      ),
    },
    {
      // With the driver's rail off nothing on the net is live: the dead driver is no source.
      name: 'the driver is the one switched off',
      design: link(
        { rail: '5v0', profile: '74hc' },
        { rail: '3v3', profile: 'lvcmos33' },
        { scenarios: [scenario('tx-off', ['5v0'])] },
      ),
    },
    {
      // An open-drain driver only pulls low (netSources), and a pull-up to the off rail is at 0 V.
      name: 'open-drain driver pulled up to the off rail',
      design: link(
        { rail: '5v0', profile: '74hc', pin: { drive: 'open-drain' } },
        { rail: '3v3', profile: 'lvcmos33' },
        {
          scenarios: rxOff,
          net: { pull: { to: '3v3', ohms: 4700 } },
        },
      ),
    },
    {
      // unpoweredSafe: the powered limit, 5.5 V fixed (74AHC inputs tolerate 5.5 V whatever VDD,
      // as restated), is not exceeded by 5.25 V.
      name: 'unpoweredSafe pin held to its powered limit, which holds',
      design: fiveVoltInto({ rail: '3v3', profile: '74ahc', pin: { params: { unpoweredSafe: true } } }),
    },
    {
      // The catalogue: an unpoweredSafe pin with no viMax and no viMaxOff is not checked.
      name: 'unpoweredSafe pin without viMax is not checked',
      design: fiveVoltInto({ rail: '3v3', profile: 'off-board', pin: { params: { unpoweredSafe: true } } }),
    },
  ],
  invalid: [
    {
      name: '5 V driver into an unpowered 3.3 V CMOS input',
      design: fiveVoltInto({ rail: '3v3', profile: 'lvcmos33' }),
      findings: [
        {
          messageId: 'clampConducts',
          severity: 'error',
          scenario: 'rx-off',
          id: 'back-power:N:rx-off:R.A',
          pins: ['R.A'],
          values: { vNet: 5.25, viMax: 0.5, pin: 'R.A', source: 'D.Y' },
        },
      ],
    },
    {
      // Just above the clamp limit: a 0.6 V source (no tolerance).
      name: 'a 0.6 V source already conducts into the dead rail',
      design: link(
        { rail: 'bias', profile: 'lvcmos33' },
        { rail: '3v3', profile: 'lvcmos33' },
        {
          rails: [rail('bias', 0.6, { tolerance: 0 }), rail3v3],
          scenarios: rxOff,
        },
      ),
      findings: [{ messageId: 'clampConducts', severity: 'error', values: { vNet: 0.6, viMax: 0.5 } }],
    },
    {
      // 74LVC's 5.5 V limit against a rail whose top is 5.6 V.
      name: '74LVC above its unpowered limit',
      design: fiveVoltInto({ rail: '3v3', profile: '74lvc' }, { rails: [{ ...rail5v0, max: 5.6 }, rail3v3, rail1v8] }),
      findings: [
        { messageId: 'aboveOffLimit', severity: 'error', values: { vNet: 5.6, viMax: 5.5, limit: 'viMaxOff' } },
      ],
    },
    {
      // viMaxOff wins whatever unpoweredSafe says: 3.6 V unpowered, though the powered limit
      // (74AHC, 5.5 V) would let 5.25 V pass.
      name: 'viMaxOff overrides unpoweredSafe',
      design: fiveVoltInto({ rail: '3v3', profile: '74ahc', pin: { params: { unpoweredSafe: true, viMaxOff: 3.6 } } }),
      findings: [{ messageId: 'aboveOffLimit', severity: 'error', values: { vNet: 5.25, viMax: 3.6 } }],
    },
    {
      // ... and a pin that is not unpoweredSafe still gets its viMaxOff rather than 0.5 V.
      name: 'viMaxOff applies to a pin that is not unpoweredSafe',
      design: fiveVoltInto({
        rail: '3v3',
        profile: 'lvcmos33',
        pin: { params: { unpoweredSafe: false, viMaxOff: 4 } },
      }),
      findings: [{ messageId: 'aboveOffLimit', severity: 'error', values: { vNet: 5.25, viMax: 4 } }],
    },
    {
      // unpoweredSafe without viMaxOff: viMax VDD+0.5 (JESD8C as restated) at the rail's lowest
      // voltage when on, 3.135 + 0.5 = 3.635 V, not at the 0 V of the off rail.
      name: "unpoweredSafe pin held to viMax at its rail's lowest voltage",
      design: fiveVoltInto({ rail: '3v3', profile: 'lvcmos33', pin: { params: { unpoweredSafe: true } } }),
      findings: [
        {
          messageId: 'abovePoweredLimit',
          severity: 'error',
          values: { vNet: 5.25, viMax: 3.135 + 0.5, limit: 'viMax' },
        },
      ],
    },
    {
      // A pull resistor to a live rail is a source, whatever the open-drain driver does.
      name: 'a pull-up to a live rail feeds an unpowered input',
      design: link(
        { rail: '5v0', profile: '74hc', pin: { drive: 'open-drain' } },
        { rail: '3v3', profile: 'lvcmos33' },
        {
          scenarios: rxOff,
          net: { pull: { to: '5v0', ohms: 4700 } },
        },
      ),
      findings: [{ messageId: 'clampConducts', severity: 'error', values: { vNet: 5.25, viMax: 0.5, source: 'net' } }],
    },
    {
      // Another pin's internal pull-up to its live rail is a source too.
      name: 'an internal pull-up of a powered pin feeds the unpowered one',
      design: design({
        parts: [
          part('P', '5v0', '74hc', [input('A', { pull: { to: '5v0', ohms: 50000 } })]),
          part('R', '3v3', 'lvcmos33', [input('A')]),
        ],
        nets: [net('N', ['P.A', 'R.A'])],
        scenarios: rxOff,
      }),
      findings: [
        {
          messageId: 'clampConducts',
          severity: 'error',
          id: 'back-power:N:rx-off:R.A',
          values: { vNet: 5.25, source: 'P.A' },
        },
      ],
    },
    {
      // Whatever its role: an unpowered output and bidir pin are fed like an input. The 3.3 V
      // LVCMOS driver on the live rail gives 3.465 V (its rail's top). One finding per pin, by id.
      name: 'unpowered output and bidir pins, one finding each',
      design: design({
        parts: [
          part('L', '3v3', 'lvcmos33', [output('Y')]),
          part('U', '1v8', 'lvcmos18', [output('Y', { drive: 'three-state' }), bidir('IO')]),
        ],
        nets: [net('N', ['L.Y', 'U.Y', 'U.IO'])],
        scenarios: [scenario('core-off', ['1v8'])],
      }),
      findings: [
        {
          messageId: 'clampConducts',
          severity: 'error',
          id: 'back-power:N:core-off:U.IO',
          values: { vNet: 3.465, pin: 'U.IO' },
        },
        {
          messageId: 'clampConducts',
          severity: 'error',
          id: 'back-power:N:core-off:U.Y',
          values: { vNet: 3.465, pin: 'U.Y' },
        },
      ],
    },
  ],
});
