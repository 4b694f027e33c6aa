import rule from '../../rules/checks/level-high.ts';
import { ruleTester } from '../support/ruleTester.ts';
import { design, link, net, output, input, part, scenario } from '../support/build.ts';

// Rail ends used below: 5 V ± 5 % = 4.75–5.25 V, 3.3 V ± 5 % = 3.135–3.465 V.
// 74HC VIH line 0.675·VDD + 0.15 (JESD7 as restated, the library's conservative line).
const hcVih = (vdd: number) => 0.675 * vdd + 0.15;
// 74HC VOH rows (JESD7 as restated): VDD−0.1 @ 20 µA, VDD−0.66 @ 4 mA; slope between them, V/A.
const hcSlope = (-0.66 + 0.1) / (4e-3 - 20e-6);

ruleTester(rule, {
  valid: [
    {
      // JESD8C: LVCMOS VOH VDD−0.2 = 2.935 V at 3.135 V against VIH 2.0 V.
      name: '3.3 V LVCMOS into 3.3 V LVCMOS',
      design: link({ rail: '3v3', profile: 'lvcmos33' }, { rail: '3v3', profile: 'lvcmos33' }),
    },
    {
      // Common practice: 5 V CMOS driving TTL passes high.
      name: '74HC driving standard TTL',
      design: link({ rail: '5v0', profile: '74hc' }, { rail: '5v0', profile: 'ttl' }),
    },
    {
      // JESD7: 74HCT VIH is 2.0 V, below LVCMOS's 2.935 V worst high.
      name: '3.3 V LVCMOS into 74HCT on 5 V',
      design: link({ rail: '3v3', profile: 'lvcmos33' }, { rail: '5v0', profile: '74hct' }),
    },
    {
      name: 'margin exactly at minMargin is not a warning',
      design: link(
        { rail: '3v3', profile: 'off-board', part: { params: { voh: [{ v: 2.2, i: 1e-3 }] } } },
        { rail: '3v3', profile: 'lvcmos33' },
      ),
    },
    {
      name: 'open-drain pulled up to the receiver rail',
      design: link(
        { rail: '3v3', profile: 'i2c', pin: { drive: 'open-drain' } },
        { rail: '5v0', profile: '74hc' },
        { net: { pull: { to: '5v0', ohms: 4700 } } },
      ),
    },
    {
      name: 'a driver and a receiver of the same part are not a pair',
      design: design({
        parts: [part('U', '3v3', 'lvcmos33', [output('Y'), input('A', { rail: '5v0', profile: '74hc' })])],
        nets: [net('N', ['U.Y', 'U.A'])],
      }),
    },
    {
      name: 'a receiver without thresholds is not judged',
      design: link({ rail: '3v3', profile: 'lvcmos33' }, { rail: '5v0', profile: 'off-board' }),
    },
  ],
  invalid: [
    {
      // Common practice (5 V): TTL VOH 2.4 V cannot reach a CMOS input's threshold. One rail:
      // both at the same VDD, the worst being 5.25 V for the VIH line.
      name: 'standard TTL driving 74HC fails high, judged at one shared VDD',
      design: link({ rail: '5v0', profile: 'ttl' }, { rail: '5v0', profile: '74hc' }),
      findings: [
        {
          messageId: 'highFails',
          severity: 'error',
          id: 'level-high:N:all-on:D.Y>R.A',
          pins: ['D.Y', 'R.A'],
          values: { voh: 2.4, vih: hcVih(5.25), margin: 2.4 - hcVih(5.25), driverVdd: 5.25, receiverVdd: 5.25 },
        },
      ],
    },
    {
      // Different rails: the driver at its lowest, the receiver at its highest.
      name: '3.3 V LVCMOS into 74HC on 5 V',
      design: link({ rail: '3v3', profile: 'lvcmos33' }, { rail: '5v0', profile: '74hc' }),
      findings: [
        {
          messageId: 'highFails',
          severity: 'error',
          values: {
            voh: 3.135 - 0.2,
            vih: hcVih(5.25),
            margin: 3.135 - 0.2 - hcVih(5.25),
            driverVdd: 3.135,
            receiverVdd: 5.25,
          },
        },
      ],
    },
    {
      name: 'margin of exactly 0 V is a warning, not an error',
      design: link(
        { rail: '3v3', profile: 'off-board', part: { params: { voh: [{ v: 2.0, i: 1e-3 }] } } },
        { rail: '3v3', profile: 'lvcmos33' },
      ),
      findings: [{ messageId: 'highMarginLow', severity: 'warning', values: { voh: 2.0, vih: 2.0, margin: 0 } }],
    },
    {
      name: 'margin below minMargin',
      design: link(
        { rail: '3v3', profile: 'off-board', part: { params: { voh: [{ v: 2.1, i: 1e-3 }] } } },
        { rail: '3v3', profile: 'lvcmos33' },
        { settings: { minMargin: 0.3 } },
      ),
      findings: [{ messageId: 'highMarginLow', severity: 'warning', values: { margin: 0.1 } }],
    },
    {
      // Vhigh = Vpull − R·Σiih = 3.135 − 4.7 kΩ × (10 µA + 1 µA) (I2C-bus input current; 74HC ±1 µA).
      name: 'open-drain pulled up to 3.3 V into a 5 V CMOS input',
      design: link(
        { rail: '3v3', profile: 'i2c', pin: { drive: 'open-drain' } },
        { rail: '5v0', profile: '74hc' },
        { net: { pull: { to: '3v3', ohms: 4700 } } },
      ),
      findings: [
        {
          messageId: 'highFails',
          severity: 'error',
          values: {
            voh: 3.135 - 4700 * 11e-6,
            vih: hcVih(5.25),
            margin: 3.135 - 4700 * 11e-6 - hcVih(5.25),
            driverVdd: null,
            receiverVdd: 5.25,
            vpull: 3.135,
          },
        },
      ],
    },
    {
      // The same pull given as 4.7 kΩ, at most 5 kΩ: the high level takes its largest end.
      name: "a pull's range: its largest end sets the high level",
      design: link(
        { rail: '3v3', profile: 'i2c', pin: { drive: 'open-drain' } },
        { rail: '5v0', profile: '74hc' },
        { net: { pull: { to: '3v3', ohms: 4700, max: 5000 } } },
      ),
      findings: [{ messageId: 'highFails', severity: 'error', values: { voh: 3.135 - 5000 * 11e-6, vpull: 3.135 } }],
    },
    {
      name: 'a Schmitt input is judged by vtPlus, not vih',
      design: link(
        { rail: '3v3', profile: 'lvcmos33' },
        { rail: '3v3', profile: 'lvcmos33', pin: { params: { schmitt: { vtPlus: 3.0, vtMinus: 1.0 } } } },
      ),
      findings: [{ messageId: 'highFails', severity: 'error', values: { vih: 3.0, margin: 2.935 - 3.0 } }],
    },
    {
      // Only all-on fails: with the receiver's rail off it is not a receiver, and with the
      // driver's rail off it drives nothing.
      name: 'pins on an off rail are not judged',
      design: link(
        { rail: '3v3', profile: 'lvcmos33' },
        { rail: '5v0', profile: '74hc' },
        {
          scenarios: [scenario('rx-off', ['5v0']), scenario('tx-off', ['3v3'])],
        },
      ),
      findings: [{ messageId: 'highFails', severity: 'error', scenario: 'all-on' }],
    },
    {
      // A 1 kΩ pull-down loads the 74HC output with 5.25 V / 1 kΩ + 1 µA, past its 4 mA row: the
      // level is the line through its two rows, extrapolated, and marked as an estimate.
      name: 'a load past the last test current gives an estimated level',
      design: link(
        { rail: '5v0', profile: '74hc' },
        { rail: '5v0', profile: '74hc', pin: { params: { schmitt: { vtPlus: 'VDD-0.5', vtMinus: 1 } } } },
        { net: { pull: { to: 'ground', ohms: 1000 } } },
      ),
      findings: [
        {
          messageId: 'highFails',
          severity: 'error',
          values: { estimate: true, margin: -0.66 + hcSlope * (5.25 / 1000 + 1e-6 - 4e-3) + 0.5 },
        },
      ],
    },
    {
      name: 'a waived finding stays, marked with its note',
      design: link(
        { rail: '3v3', profile: 'lvcmos33' },
        { rail: '5v0', profile: '74hc' },
        {
          net: { waivers: [{ rule: 'level-high', note: 'receiver replaced by HCT in rev B' }] },
        },
      ),
      findings: [{ messageId: 'highFails', severity: 'error', waived: 'receiver replaced by HCT in rev B' }],
    },
  ],
});
