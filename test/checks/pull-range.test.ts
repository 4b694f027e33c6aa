import rule from '../../rules/checks/pull-range.ts';
import { ruleTester } from '../support/ruleTester.ts';
import { bidir, design, input, net, output, part, rail, rail1v8, rail3v3, rail5v0, scenario } from '../support/build.ts';
import type { Net, Pin, Rail } from '../../rules/model/schema.ts';

// Rail ends: 3.3 V ± 5 % = 3.135–3.465 V, 1.8 V ± 5 % = 1.71–1.89 V, 5 V ± 5 % = 4.75–5.25 V.
// i2c pins (I2C-bus specification as the library restates it): VOL 0.4 V @ 3 mA, VIH 0.7·VDD,
// iih = iil = 10 µA, cin 10 pF. Default minMargin 0.2 V, default wiring 5 pF (design-format.md).
// 30–70 % of an RC edge: ln(7/3)·RC (rules-catalogue.md, "Constants").
const K = Math.log(7 / 3);
const od = { drive: 'open-drain' as const };

/** Two i2c bus pins M.SDA and S.SDA on 3v3 with the net's extras. */
function bus(netExtra: Partial<Net>, more: { pinPull?: Pin['pull']; off?: string[] } = {}) {
  return design({
    parts: [
      part('M', '3v3', 'i2c', [bidir('SDA', { ...od, ...(more.pinPull === undefined ? {} : { pull: more.pinPull }) })]),
      part('S', '3v3', 'i2c', [bidir('SDA', od)]),
    ],
    nets: [net('SDA', ['M.SDA', 'S.SDA'], netExtra)],
    ...(more.off === undefined ? {} : { scenarios: [scenario('off', more.off)] }),
  });
}
// Each driver sinks 3 mA less the other pin's 10 µA; Vpull at 3.465 V (its highest) sets Rmin.
const busRMin = (3.465 - 0.4) / (3e-3 - 10e-6);
// VIH = 0.7·VDD on the pull's own rail: (0.3·VDD − 0.2) / 20 µA is smallest at 3.135 V.
const busRMaxLevel = (0.3 * 3.135 - 0.2) / 20e-6;

/** Open-drain output D.Y (off-board, typed-in values) into input R.A, both on `r`, pulled to `r`. */
function typed(r: Rail, driver: Pin['params'], receiver: Pin['params'], netExtra: Partial<Net>) {
  return design({
    rails: [r],
    parts: [
      part('D', r.id, 'off-board', [output('Y', { ...od, params: driver })]),
      part('R', r.id, 'off-board', [input('A', { params: receiver })]),
    ],
    nets: [net('N', ['D.Y', 'R.A'], { pull: { to: r.id, ohms: 1000 }, ...netExtra })],
  });
}
const exact5 = rail('p5', 5, { tolerance: 0 });
// Rmin = 4.5 V / 9 mA = 500 Ω; Rmax from the rise time is 10 kΩ at 100 pF when tr = 1e4·ln(7/3)·100 pF.
const edgeDriver = { vol: [{ v: 0.5, i: 9e-3 }] };
const edgeNet = { wiringCapacitance: 100e-12, maxRiseTime: 1e4 * K * 100e-12 };

ruleTester(rule, {
  valid: [
    { name: 'no pull of its own: internal pulls are not sized', design: bus({}, { pinPull: { to: '3v3', ohms: 4700 } }) },
    { name: 'a pull to ground is not sized', design: bus({ pull: { to: 'ground', ohms: 4700 } }) },
    {
      name: 'push-pull drivers have no pull-up range',
      design: design({
        parts: [part('D', '3v3', 'lvcmos33', [output('Y')]), part('R', '3v3', 'lvcmos33', [input('A')])],
        nets: [net('N', ['D.Y', 'R.A'], { pull: { to: '3v3', ohms: 10000 } })],
      }),
    },
  ],
  invalid: [
    {
      name: 'bus pull-up inside its range (level bound)',
      design: bus({ pull: { to: '3v3', ohms: 4700 } }),
      findings: [{
        messageId: 'inRange', severity: 'info', id: 'pull-range:SDA:all-on', pins: ['M.SDA', 'S.SDA'],
        // IEC 60063 E24: 3.6 is the largest mantissa with 36 kΩ ≤ 37.025 kΩ.
        values: { ohms: 4700, rMin: busRMin, rMax: busRMaxLevel, empty: false, suggested: 36000, rMaxBy: 'level', rMaxCorner: { '3v3': 3.135 } },
      }],
    },
    {
      // C = 2 × 10 pF + 200 pF wiring; 1 µs / (ln(7/3) × 220 pF) = 5364.6 Ω binds before the level.
      name: 'bus pull-up inside its range (rise-time bound)',
      design: bus({ pull: { to: '3v3', ohms: 4700 }, wiringCapacitance: 200e-12, maxRiseTime: 1e-6 }),
      findings: [{
        messageId: 'inRange', severity: 'info',
        // IEC 60063 E24: 5.1 kΩ ≤ 5364.6 Ω < 5.6 kΩ.
        values: { rMin: busRMin, rMax: 1e-6 / (K * 220e-12), suggested: 5100, rMaxBy: 'rise-time', capacitance: 220e-12 },
      }],
    },
    {
      name: 'bus pull-up too small for the drivers',
      design: bus({ pull: { to: '3v3', ohms: 1000 } }),
      findings: [{ messageId: 'tooSmall', severity: 'error', values: { ohms: 1000, rMin: busRMin, empty: false, suggested: 36000 } }],
    },
    {
      name: 'bus pull-up too large for the input-high level',
      design: bus({ pull: { to: '3v3', ohms: 47000 } }),
      findings: [{ messageId: 'tooLarge', severity: 'error', values: { ohms: 47000, rMax: busRMaxLevel } }],
    },
    {
      // Internal pulls are not part of the range: the same numbers as without M's 10 kΩ.
      name: 'several pulls: only the net\'s own is sized',
      design: bus({ pull: { to: '3v3', ohms: 4700 } }, { pinPull: { to: '3v3', ohms: 10000 } }),
      findings: [{ messageId: 'inRange', severity: 'info', values: { ohms: 4700, rMin: busRMin, rMax: busRMaxLevel } }],
    },
    {
      name: 'exactly at Rmin is inside',
      design: typed(exact5, edgeDriver, {}, { ...edgeNet, pull: { to: 'p5', ohms: 500 } }),
      findings: [{ messageId: 'inRange', severity: 'info', values: { ohms: 500, rMin: 500, rMax: 10000, suggested: 10000 } }],
    },
    {
      name: 'exactly at Rmax is inside',
      design: typed(exact5, edgeDriver, {}, { ...edgeNet, pull: { to: 'p5', ohms: 10000 } }),
      findings: [{ messageId: 'inRange', severity: 'info', values: { ohms: 10000, rMax: 10000 } }],
    },
    {
      name: 'just above Rmax is outside',
      design: typed(exact5, edgeDriver, {}, { ...edgeNet, pull: { to: 'p5', ohms: 10001 } }),
      findings: [{ messageId: 'tooLarge', severity: 'error', values: { ohms: 10001, rMax: 10000 } }],
    },
    {
      name: 'just below Rmin is outside',
      design: typed(exact5, edgeDriver, {}, { ...edgeNet, pull: { to: 'p5', ohms: 499 } }),
      findings: [{ messageId: 'tooSmall', severity: 'error', values: { ohms: 499, rMin: 500 } }],
    },
    {
      // No rise-time limit and no input current: no upper bound, so no value to suggest.
      name: 'unbounded above',
      design: typed(exact5, edgeDriver, { vih: 2 }, { pull: { to: 'p5', ohms: 100000 } }),
      findings: [{ messageId: 'inRange', severity: 'info', values: { rMin: 500, rMax: null, empty: false, suggested: null } }],
    },
    {
      // Rmin = 5 V / 20 mA = 250 Ω; Rmax = 260 Ω by the rise time: IEC 60063 E24 has 240 and 270 only.
      name: 'a range with no E24 value',
      design: typed(exact5, { vol: [{ v: 0, i: 20e-3 }] }, {}, {
        wiringCapacitance: 100e-12, maxRiseTime: 260 * K * 100e-12, pull: { to: 'p5', ohms: 255 },
      }),
      findings: [{ messageId: 'inRange', severity: 'info', values: { rMin: 250, rMax: 260, empty: false, suggested: null } }],
    },
    {
      // Rmin = 500 Ω by the sink; Rmax = 400 Ω by the rise time: nothing fits.
      name: 'an empty range: Rmin above Rmax',
      design: typed(exact5, edgeDriver, {}, { wiringCapacitance: 100e-12, maxRiseTime: 400 * K * 100e-12 }),
      findings: [{ messageId: 'noRange', severity: 'error', values: { ohms: 1000, rMin: 500, rMax: 400, empty: true, suggested: null } }],
    },
    {
      // IOL,rated 3 mA exactly equals the load's iil of 3 mA: the denominator is not positive.
      name: 'an empty range: the driver cannot sink the loads\' iil',
      design: typed(exact5, { vol: [{ v: 0.4, i: 3e-3 }] }, { iil: 3e-3 }, {}),
      findings: [{ messageId: 'noRange', severity: 'error', values: { rMin: null, rMax: null, empty: true, suggested: null, rMinDriver: 'D.Y' } }],
    },
    {
      // Eight 74LS inputs (handbook: IIL 0.4 mA each) are 3.2 mA against an I2C pin's 3 mA.
      name: 'an empty range: eight 74LS loads on a 3 mA open-drain pin',
      design: design({
        parts: [
          part('M', '5v0', 'i2c', [output('SCL', od)]),
          part('L', '5v0', '74ls', ['A1', 'A2', 'A3', 'A4', 'A5', 'A6', 'A7', 'A8'].map((id) => input(id))),
        ],
        nets: [net('SCL', ['M.SCL', 'L.A1', 'L.A2', 'L.A3', 'L.A4', 'L.A5', 'L.A6', 'L.A7', 'L.A8'], { pull: { to: '5v0', ohms: 2200 } })],
      }),
      findings: [{ messageId: 'noRange', severity: 'error', values: { rMin: null, empty: true } }],
    },
    {
      // Pull to 3v3 (3.135 V at its lowest) against a 74HC input on 5 V (VIH 0.675·VDD + 0.15 =
      // 3.69375 V at 5.25 V, JESD7 as restated): no resistor lifts the net far enough.
      name: 'an empty range: the pull rail is below the receiver\'s VIH',
      design: design({
        parts: [part('D', '1v8', 'i2c-lv', [output('Y', od)]), part('R', '5v0', '74hc', [input('A')])],
        nets: [net('N', ['D.Y', 'R.A'], { pull: { to: '3v3', ohms: 4700 } })],
      }),
      findings: [{ messageId: 'noRange', severity: 'error', values: { rMax: 0, empty: true, rMaxCorner: { '3v3': 3.135, '5v0': 5.25 } } }],
    },
    {
      // Three rails: VOL 0.2·VDD (i2c-lv) is largest at 1v8's lowest end while Vpull is at 3v3's
      // highest: Rmin = (3.465 − 0.2 × 1.71) / (3 mA − 0) (lvcmos33 gives no iil). Rmax: the
      // largest VIH of the receivers, LVCMOS 2.0 V beats 0.65 × 1.89 = 1.2285 V (JESD8-7), against
      // Vpull at 3.135 V, over Σiih = 10 µA (the driver's own).
      name: 'corners across the pull, driver and receiver rails',
      design: design({
        parts: [
          part('D', '1v8', 'i2c-lv', [output('Y', od)]),
          part('R', '3v3', 'lvcmos33', [input('A')]),
          part('C', '1v8', 'lvcmos18', [input('A')]),
        ],
        nets: [net('N', ['D.Y', 'R.A', 'C.A'], { pull: { to: '3v3', ohms: 10000 } })],
      }),
      findings: [{
        messageId: 'inRange', severity: 'info',
        values: {
          rMin: (3.465 - 0.2 * 1.71) / 3e-3, rMinCorner: { '3v3': 3.465, '1v8': 1.71 }, rMinDriver: 'D.Y',
          rMax: (3.135 - 2.0 - 0.2) / 10e-6, suggested: 91000,
        },
      }],
    },
    {
      // A Schmitt receiver is judged by vtPlus: 2.8 V here, so (3.135 − 2.8 − 0.2) / 10 µA = 13.5 kΩ
      // (with its vih of 2.0 V it would be 93.5 kΩ and 15 kΩ would pass).
      name: 'a Schmitt receiver\'s vtPlus is its VIH',
      design: design({
        parts: [
          part('D', '1v8', 'i2c-lv', [output('Y', od)]),
          part('R', '3v3', 'lvcmos33', [input('A', { params: { schmitt: { vtPlus: 2.8, vtMinus: 1 } } })]),
        ],
        nets: [net('N', ['D.Y', 'R.A'], { pull: { to: '3v3', ohms: 15000 } })],
      }),
      findings: [{ messageId: 'tooLarge', severity: 'error', values: { rMax: (3.135 - 2.8 - 0.2) / 10e-6 } }],
    },
    {
      // In `io-off` the 1v8 driver is unpowered: it no longer sets Rmin, but its iil (10 µA)
      // still loads M (rules-catalogue.md, "Power states"). all-on: S (1 mA rated) sets Rmin at
      // 3.096 kΩ, above the 2.2 kΩ fitted; in io-off M's 1.025 kΩ does.
      name: 'a driver on an off rail',
      design: design({
        rails: [rail5v0, rail3v3, rail1v8],
        parts: [
          part('M', '3v3', 'i2c', [bidir('SDA', od)]),
          part('S', '1v8', 'off-board', [output('SDA', { ...od, params: { vol: [{ v: 0.4, i: 1e-3 }], iil: 10e-6 } })]),
        ],
        nets: [net('SDA', ['M.SDA', 'S.SDA'], { pull: { to: '3v3', ohms: 2200 } })],
        scenarios: [scenario('io-off', ['1v8'])],
      }),
      findings: [
        { messageId: 'tooSmall', severity: 'error', scenario: 'all-on', values: { rMin: (3.465 - 0.4) / (1e-3 - 10e-6), rMinDriver: 'S.SDA' } },
        { messageId: 'inRange', severity: 'info', scenario: 'io-off', id: 'pull-range:SDA:io-off', values: { rMin: (3.465 - 0.4) / (3e-3 - 10e-6), rMinDriver: 'M.SDA' } },
      ],
    },
    {
      // A pull to a rail that is off is not sized (level-high reports the dead pull-up): only all-on,
      // where Rmax = (4.75 − 0.7 × 3.465 − 0.2) / 20 µA (Vpull at 5v0's lowest, VIH at 3v3's highest).
      name: 'a pull to an off rail',
      design: bus({ pull: { to: '5v0', ohms: 4700 } }, { off: ['5v0'] }),
      findings: [{
        messageId: 'inRange', severity: 'info', scenario: 'all-on',
        values: { rMin: (5.25 - 0.4) / (3e-3 - 10e-6), rMax: (4.75 - 0.7 * 3.465 - 0.2) / 20e-6, rMaxCorner: { '5v0': 4.75, '3v3': 3.465 } },
      }],
    },
  ],
});
