import rule from '../../rules/checks/pull-range.ts';
import { ruleTester } from '../support/ruleTester.ts';
import {
  bidir,
  design,
  input,
  net,
  output,
  part,
  rail,
  rail1v8,
  rail3v3,
  rail5v0,
  scenario,
} from '../support/build.ts';
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

// The advice (README, "Pull-up advice"): the range shrunk by a 5 % resistor tolerance (IEC 60062
// code J, common practice) to [Rmin/0.95, Rmax/1.05], the rise-time bound at 0.7 × maxRiseTime;
// the IEC 60063 E12 value nearest √(lo·hi) on a log scale, else E24; capped at 47 kΩ on board or
// 10 kΩ with an off-board pin where only leakage bounds it (common practice).
const T = 0.05;
/** The nominal range of the advice from the bounds of the pulls together (no other pulls). */
const shrunk = (lo: number, hi: number) => ({ adviceMin: lo / (1 - T), adviceMax: hi / (1 + T) });
/** 1/(1/bound − g): the net's own pull that gives `bound` beside the pins' conductance g. */
const beside = (bound: number, g: number) => 1 / (1 / bound - g);

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

/** D.Y as in `typed` into R.A, whose internal pull is `pull`; the net has none of its own. */
function rangedPull(pull: NonNullable<Pin['pull']>) {
  return design({
    rails: [exact5],
    parts: [
      part('D', 'p5', 'off-board', [output('Y', { ...od, params: edgeDriver })]),
      part('R', 'p5', 'off-board', [input('A', { pull })]),
    ],
    nets: [net('N', ['D.Y', 'R.A'], edgeNet)],
  });
}
// Rmin = 4.5 V / 9 mA = 500 Ω; Rmax from the rise time is 10 kΩ at 100 pF when tr = 1e4·ln(7/3)·100 pF.
const edgeDriver = { vol: [{ v: 0.5, i: 9e-3 }] };
const edgeNet = { wiringCapacitance: 100e-12, maxRiseTime: 1e4 * K * 100e-12 };

ruleTester(rule, {
  valid: [
    { name: 'a pull to ground is not a pull-up', design: bus({ pull: { to: 'ground', ohms: 4700 } }) },
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
      // Bounds as before; advice [1079.0 Ω, 35.26 kΩ], √(lo·hi) = 6168 Ω: E12 5.6 kΩ (ratio 1.1015)
      // beats 6.8 kΩ (1.1024); 47 kΩ lies above, no cap. Largest E24 inside: 33 kΩ. For 5.6 kΩ
      // ± 5 %: rise ln(7/3) × 5.88 kΩ × 25 pF; high 3.135 − 5.88 kΩ × 20 µA; sink (3.465 − 0.4) /
      // 5.32 kΩ + the other pin's 10 µA, inside the 3 mA row, so low 0.4 V.
      name: 'bus pull-up inside its range (level bound)',
      design: bus({ pull: { to: '3v3', ohms: 4700 } }),
      findings: [
        {
          messageId: 'inRange',
          severity: 'info',
          id: 'pull-range:SDA:all-on',
          pins: ['M.SDA', 'S.SDA'],
          values: {
            ohms: 4700,
            rMin: busRMin,
            rMax: busRMaxLevel,
            empty: false,
            rMaxBy: 'level',
            rMaxCorner: { '3v3': 3.135 },
            ...shrunk(busRMin, busRMaxLevel),
            adviceCap: null,
            riseGuard: null,
            suggested: 5600,
            suggestedSeries: 'E12',
            lowestPower: 33000,
            suggestedRise: K * 5880 * 25e-12,
            suggestedHigh: 3.135 - 5880 * 20e-6,
            suggestedSink: (3.465 - 0.4) / 5320 + 10e-6,
            suggestedLow: 0.4,
          },
        },
      ],
    },
    {
      // C = 2 × 10 pF + 200 pF wiring; 1 µs / (ln(7/3) × 220 pF) = 5364.6 Ω binds before the level.
      // Advice: 0.7 × 5364.6 / 1.05 = 3576.4 Ω from 1079.0 Ω; √ = 1964 Ω: E12 1.8 kΩ (1.091)
      // beats 2.2 kΩ (1.120). Largest E24 inside: 3.3 kΩ.
      name: 'bus pull-up inside its range (rise-time bound)',
      design: bus({ pull: { to: '3v3', ohms: 4700 }, wiringCapacitance: 200e-12, maxRiseTime: 1e-6 }),
      findings: [
        {
          messageId: 'inRange',
          severity: 'info',
          values: {
            rMin: busRMin,
            rMax: 1e-6 / (K * 220e-12),
            rMaxBy: 'rise-time',
            capacitance: 220e-12,
            ...shrunk(busRMin, (0.7 * 1e-6) / (K * 220e-12)),
            riseGuard: 0.7,
            adviceCap: null,
            suggested: 1800,
            lowestPower: 3300,
          },
        },
      ],
    },
    {
      // The fast-mode bus: 300 ns (I2C-bus specification, fast-mode tr) at 200 pF, range
      // 1.03–1.77 kΩ; the advice 1079–1180 Ω holds no E12 value, and E24 1.1 kΩ only.
      name: 'a fast-mode bus of 200 pF gets 1.1 kΩ, not 1.6 kΩ',
      design: bus({ pull: { to: '3v3', ohms: 1500 }, wiringCapacitance: 180e-12, maxRiseTime: 300e-9 }),
      findings: [
        {
          messageId: 'inRange',
          severity: 'info',
          values: {
            rMin: busRMin,
            rMax: 300e-9 / (K * 200e-12),
            ...shrunk(busRMin, (0.7 * 300e-9) / (K * 200e-12)),
            suggested: 1100,
            suggestedSeries: 'E24',
            lowestPower: 1100,
          },
        },
      ],
    },
    {
      name: 'bus pull-up too small for the drivers',
      design: bus({ pull: { to: '3v3', ohms: 1000 } }),
      findings: [
        {
          messageId: 'tooSmall',
          severity: 'error',
          values: { ohms: 1000, rMin: busRMin, empty: false, suggested: 5600 },
        },
      ],
    },
    {
      name: 'bus pull-up too large for the input-high level',
      design: bus({ pull: { to: '3v3', ohms: 47000 } }),
      findings: [{ messageId: 'tooLarge', severity: 'error', values: { ohms: 47000, rMax: busRMaxLevel } }],
    },
    {
      // An internal pull alone: 4.7 kΩ inside M. Advice for a pull of the net's own beside it:
      // from 1/(1/1025.1 − 1/4700) = 1311.0 Ω; M's pull alone meets the level bound, so only the
      // 47 kΩ cap (on board) bounds it: [1380.0, 47000], √ = 8054 Ω, E12 8.2 kΩ.
      name: 'an internal pull alone is judged',
      design: bus({}, { pinPull: { to: '3v3', ohms: 4700 } }),
      findings: [
        {
          messageId: 'inRange',
          severity: 'info',
          values: {
            ohms: 4700,
            rMin: busRMin,
            rMax: busRMaxLevel,
            adviceMin: beside(busRMin, 1 / 4700) / (1 - T),
            adviceMax: 47000,
            adviceCap: 47000,
            othersOhms: 4700,
            suggested: 8200,
            lowestPower: null,
          },
        },
      ],
    },
    {
      // The net's 4.7 kΩ and M's 10 kΩ: 3197 Ω together, inside. The net's own from
      // 1/(1/1025.1 − 1/10 k) = 1142.2 Ω; M's 10 kΩ alone meets the level bound: capped at 47 kΩ.
      // [1202.3, 47000]: √ = 7517 Ω, E12 8.2 kΩ (1.091) beats 6.8 kΩ (1.105).
      name: "every pull counts: the net's own and a pin's internal one in parallel",
      design: bus({ pull: { to: '3v3', ohms: 4700 } }, { pinPull: { to: '3v3', ohms: 10000 } }),
      findings: [
        {
          messageId: 'inRange',
          severity: 'info',
          values: {
            ohms: 1 / (1 / 4700 + 1 / 10000),
            rMin: busRMin,
            rMax: busRMaxLevel,
            adviceMin: beside(busRMin, 1 / 10000) / (1 - T),
            adviceMax: 47000,
            suggested: 8200,
          },
        },
      ],
    },
    {
      // The review's bus: 4.7 kΩ and two 2.2 kΩ module pull-ups, 891 Ω together; four i2c pins, so
      // Rmin = (3.465 − 0.4) / (3 mA − 30 µA) = 1032.0 Ω. Too strong; the net's own must be at
      // least 1/(1/1032.0 − 2/2.2 k) = 16.69 kΩ; [17.57 k, 47 k] (cap): √ = 28.74 kΩ, E12 27 kΩ.
      name: 'module pull-ups make the pulls together too strong',
      design: design({
        parts: [
          part('M', '3v3', 'i2c', [bidir('SDA', od)]),
          part('S', '3v3', 'i2c', [bidir('SDA', od)]),
          part('A', '3v3', 'i2c', [input('SDA', { pull: { to: '3v3', ohms: 2200 } })]),
          part('B', '3v3', 'i2c', [input('SDA', { pull: { to: '3v3', ohms: 2200 } })]),
        ],
        nets: [net('SDA', ['M.SDA', 'S.SDA', 'A.SDA', 'B.SDA'], { pull: { to: '3v3', ohms: 4700 } })],
      }),
      findings: [
        {
          messageId: 'tooSmall',
          severity: 'error',
          values: {
            ohms: 1 / (1 / 4700 + 2 / 2200),
            rMin: (3.465 - 0.4) / (3e-3 - 30e-6),
            othersOhms: 1100,
            adviceMin: beside((3.465 - 0.4) / (3e-3 - 30e-6), 2 / 2200) / (1 - T),
            adviceMax: 47000,
            suggested: 27000,
          },
        },
      ],
    },
    {
      // Three 2.2 kΩ module pull-ups (733 Ω) are already below Rmin = (3.465 − 0.4) / (3 mA −
      // 30 µA): no pull of the net's own can help.
      name: "the pins' own pulls alone are too strong",
      design: design({
        parts: [
          part('M', '3v3', 'i2c', [bidir('SDA', od)]),
          part('A', '3v3', 'i2c', [input('SDA', { pull: { to: '3v3', ohms: 2200 } })]),
          part('B', '3v3', 'i2c', [input('SDA', { pull: { to: '3v3', ohms: 2200 } })]),
          part('C', '3v3', 'i2c', [input('SDA', { pull: { to: '3v3', ohms: 2200 } })]),
        ],
        nets: [net('SDA', ['M.SDA', 'A.SDA', 'B.SDA', 'C.SDA'])],
      }),
      findings: [
        { messageId: 'tooSmall', severity: 'error', values: { ohms: 2200 / 3, suggested: null, othersOhms: 2200 / 3 } },
      ],
    },
    {
      // An internal pull given as a datasheet's range (invented: 600 Ω, 450–800 Ω): the sink
      // check takes its smallest end, 450 Ω, below Rmin = 4.5 V / 9 mA = 500 Ω.
      name: "a pull's range: its smallest end judges the sink current",
      design: rangedPull({ to: 'p5', ohms: 600, min: 450, max: 800 }),
      findings: [
        { messageId: 'tooSmall', severity: 'error', values: { ohms: 600, ohmsMin: 450, ohmsMax: 800, rMin: 500 } },
      ],
    },
    {
      // A net pull of 9.8 kΩ ± 5 %: its largest end, 10.29 kΩ, is above the 10 kΩ the rise time allows.
      name: "a pull's tolerance: its largest end judges the rise time",
      design: typed(exact5, edgeDriver, {}, { ...edgeNet, pull: { to: 'p5', ohms: 9800, tolerance: 0.05 } }),
      findings: [
        { messageId: 'tooLarge', severity: 'error', values: { ohms: 9800, ohmsMax: 9800 * 1.05, rMax: 10000 } },
      ],
    },
    {
      // The net's own 2.2 kΩ ± 1 % is shrunk by its own tolerance: [500/0.99, 7000/1.01].
      name: "the advice shrinks by the pull's own tolerance",
      design: typed(exact5, edgeDriver, {}, { ...edgeNet, pull: { to: 'p5', ohms: 2200, tolerance: 0.01 } }),
      findings: [
        {
          messageId: 'inRange',
          severity: 'info',
          values: { adviceMin: 500 / 0.99, adviceMax: 7000 / 1.01, adviceTolerance: 0.01 },
        },
      ],
    },
    {
      // Advice [526.3, 6666.7] (0.7 × 10 kΩ / 1.05): √ = 1873 Ω, E12 1.8 kΩ; largest E24 inside 6.2 kΩ.
      name: 'exactly at Rmin is inside',
      design: typed(exact5, edgeDriver, {}, { ...edgeNet, pull: { to: 'p5', ohms: 500 } }),
      findings: [
        {
          messageId: 'inRange',
          severity: 'info',
          values: { ohms: 500, rMin: 500, rMax: 10000, ...shrunk(500, 7000), suggested: 1800, lowestPower: 6200 },
        },
      ],
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
      // No rise-time limit and no input current: no upper bound; off-board pins cap the advice
      // at 10 kΩ: [526.3, 10000], √ = 2294 Ω, E12 2.2 kΩ; no largest value in an open range.
      name: 'unbounded above: capped at 10 kΩ with off-board pins',
      design: typed(exact5, edgeDriver, { vih: 2 }, { pull: { to: 'p5', ohms: 100000 } }),
      findings: [
        {
          messageId: 'inRange',
          severity: 'info',
          values: {
            rMin: 500,
            rMax: null,
            empty: false,
            adviceCap: 10000,
            adviceMax: 10000,
            suggested: 2200,
            lowestPower: null,
          },
        },
      ],
    },
    {
      // The off-board switch: only leakage bounds it. 5 V exact, VOL 0.4 V @ 1 mA, VIH
      // 3.5 V (5 V CMOS, common practice), 10 µA: range 4.6–130 kΩ; the advice [4842, 123810]
      // capped at 10 kΩ: √ = 6959 Ω, E12 6.8 kΩ (not 120 kΩ, the largest E24 inside).
      name: 'an off-board switch bounded only by leakage gets a practical value',
      design: typed(
        exact5,
        { vol: [{ v: 0.4, i: 1e-3 }] },
        { vih: 3.5, iih: 10e-6 },
        { pull: { to: 'p5', ohms: 100000 } },
      ),
      findings: [
        {
          messageId: 'inRange',
          severity: 'info',
          values: {
            rMin: 4600,
            rMax: (5 - 3.5 - 0.2) / 10e-6,
            adviceMin: 4600 / (1 - T),
            adviceCap: 10000,
            suggested: 6800,
            lowestPower: 120000,
          },
        },
      ],
    },
    {
      // Rmin = 5 V / 20 mA = 250 Ω; Rmax = 260 Ω by the rise time: IEC 60063 E24 has 240 and 270 only.
      name: 'a range with no E24 value',
      design: typed(
        exact5,
        { vol: [{ v: 0, i: 20e-3 }] },
        {},
        {
          wiringCapacitance: 100e-12,
          maxRiseTime: 260 * K * 100e-12,
          pull: { to: 'p5', ohms: 255 },
        },
      ),
      findings: [
        { messageId: 'inRange', severity: 'info', values: { rMin: 250, rMax: 260, empty: false, suggested: null } },
      ],
    },
    {
      // Rmin = 500 Ω by the sink; Rmax = 400 Ω by the rise time: nothing fits.
      name: 'an empty range: Rmin above Rmax',
      design: typed(exact5, edgeDriver, {}, { wiringCapacitance: 100e-12, maxRiseTime: 400 * K * 100e-12 }),
      findings: [
        {
          messageId: 'noRange',
          severity: 'error',
          values: { ohms: 1000, rMin: 500, rMax: 400, empty: true, suggested: null },
        },
      ],
    },
    {
      // IOL,rated 3 mA exactly equals the load's iil of 3 mA: the denominator is not positive.
      name: "an empty range: the driver cannot sink the loads' iil",
      design: typed(exact5, { vol: [{ v: 0.4, i: 3e-3 }] }, { iil: 3e-3 }, {}),
      findings: [
        {
          messageId: 'noRange',
          severity: 'error',
          values: { rMin: null, rMax: null, empty: true, suggested: null, rMinDriver: 'D.Y' },
        },
      ],
    },
    {
      // Eight 74LS inputs (handbook: IIL 0.4 mA each) are 3.2 mA against an I2C pin's 3 mA.
      name: 'an empty range: eight 74LS loads on a 3 mA open-drain pin',
      design: design({
        parts: [
          part('M', '5v0', 'i2c', [output('SCL', od)]),
          part(
            'L',
            '5v0',
            '74ls',
            ['A1', 'A2', 'A3', 'A4', 'A5', 'A6', 'A7', 'A8'].map((id) => input(id)),
          ),
        ],
        nets: [
          net('SCL', ['M.SCL', 'L.A1', 'L.A2', 'L.A3', 'L.A4', 'L.A5', 'L.A6', 'L.A7', 'L.A8'], {
            pull: { to: '5v0', ohms: 2200 },
          }),
        ],
      }),
      findings: [{ messageId: 'noRange', severity: 'error', values: { rMin: null, empty: true } }],
    },
    {
      // Pull to 3v3 (3.135 V at its lowest) against a 74HC input on 5 V (VIH 0.675·VDD + 0.15 =
      // 3.69375 V at 5.25 V, JESD7 as restated): no resistor lifts the net far enough.
      name: "an empty range: the pull rail is below the receiver's VIH",
      design: design({
        parts: [part('D', '1v8', 'i2c-lv', [output('Y', od)]), part('R', '5v0', '74hc', [input('A')])],
        nets: [net('N', ['D.Y', 'R.A'], { pull: { to: '3v3', ohms: 4700 } })],
      }),
      findings: [
        {
          messageId: 'noRange',
          severity: 'error',
          values: { rMax: 0, empty: true, rMaxCorner: { '3v3': 3.135, '5v0': 5.25 } },
        },
      ],
    },
    {
      // Three rails: VOL 0.2·VDD (i2c-lv) is largest at 1v8's lowest end while Vpull is at 3v3's
      // highest: Rmin = (3.465 − 0.2 × 1.71) / (3 mA − 2 × 5 µA) (LVCMOS ±5 µA, from memory). Rmax:
      // the largest VIH of the receivers, LVCMOS 2.0 V beats 0.65 × 1.89 = 1.2285 V (JESD8-7),
      // against Vpull at 3.135 V, over Σiih = 10 µA (the driver's own) + 2 × 5 µA.
      name: 'corners across the pull, driver and receiver rails',
      design: design({
        parts: [
          part('D', '1v8', 'i2c-lv', [output('Y', od)]),
          part('R', '3v3', 'lvcmos33', [input('A')]),
          part('C', '1v8', 'lvcmos18', [input('A')]),
        ],
        nets: [net('N', ['D.Y', 'R.A', 'C.A'], { pull: { to: '3v3', ohms: 10000 } })],
      }),
      findings: [
        {
          messageId: 'inRange',
          severity: 'info',
          values: {
            rMin: (3.465 - 0.2 * 1.71) / (3e-3 - 10e-6),
            rMinCorner: { '3v3': 3.465, '1v8': 1.71 },
            rMinDriver: 'D.Y',
            // Advice [1099.5, 44524] (the 47 kΩ cap lies above): √ = 6997 Ω, E12 6.8 kΩ; largest E24 inside 43 kΩ.
            rMax: (3.135 - 2.0 - 0.2) / 20e-6,
            adviceCap: null,
            suggested: 6800,
            lowestPower: 43000,
          },
        },
      ],
    },
    {
      // A Schmitt receiver is judged by vtPlus: 2.8 V here, so (3.135 − 2.8 − 0.2) / 15 µA = 9 kΩ
      // (10 µA from the bus pin, 5 µA LVCMOS from memory; with its vih of 2.0 V it would be 62.3 kΩ
      // and 15 kΩ would pass).
      name: "a Schmitt receiver's vtPlus is its VIH",
      design: design({
        parts: [
          part('D', '1v8', 'i2c-lv', [output('Y', od)]),
          part('R', '3v3', 'lvcmos33', [input('A', { params: { schmitt: { vtPlus: 2.8, vtMinus: 1 } } })]),
        ],
        nets: [net('N', ['D.Y', 'R.A'], { pull: { to: '3v3', ohms: 15000 } })],
      }),
      findings: [{ messageId: 'tooLarge', severity: 'error', values: { rMax: (3.135 - 2.8 - 0.2) / 15e-6 } }],
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
        {
          messageId: 'tooSmall',
          severity: 'error',
          scenario: 'all-on',
          values: { rMin: (3.465 - 0.4) / (1e-3 - 10e-6), rMinDriver: 'S.SDA' },
        },
        {
          messageId: 'inRange',
          severity: 'info',
          scenario: 'io-off',
          id: 'pull-range:SDA:io-off',
          values: { rMin: (3.465 - 0.4) / (3e-3 - 10e-6), rMinDriver: 'M.SDA' },
        },
      ],
    },
    {
      // A pull to a rail that is off is not sized (level-high reports the dead pull-up): only all-on,
      // where Rmax = (4.75 − 0.7 × 3.465 − 0.2) / 20 µA (Vpull at 5v0's lowest, VIH at 3v3's highest).
      name: 'a pull to an off rail',
      design: bus({ pull: { to: '5v0', ohms: 4700 } }, { off: ['5v0'] }),
      findings: [
        {
          messageId: 'inRange',
          severity: 'info',
          scenario: 'all-on',
          values: {
            rMin: (5.25 - 0.4) / (3e-3 - 10e-6),
            rMax: (4.75 - 0.7 * 3.465 - 0.2) / 20e-6,
            rMaxCorner: { '5v0': 4.75, '3v3': 3.465 },
          },
        },
      ],
    },
  ],
});
