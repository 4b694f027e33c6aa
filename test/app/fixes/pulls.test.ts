/**
 * Resistor fixes: a pull-up sized by the open-collector formulas, a pull-up moved into its
 * range, ties for floating inputs, and the waiver for shared three-state enables.
 *
 * Sizing (handbook, open-collector pull-up; the I2C-bus specification's rise-time bound; IEC
 * 60063 E12 for the chosen value, nearest the middle of the range as README's policy says):
 *   Rmin = (VCC,max − VOL) / (IOL − Σ IIL),  Rmax = (VCC,min − VIH − margin) / Σ IIH.
 * The greenhouse's numbers are its own invented demo data (off-board switch: VOL 0.1 V at 1 mA,
 * 1 µA leakage; controller input 1 µA; thermostat 10 µA); the controller's VIH is 0.7·VDD
 * (common practice, the mcu-gpio starting point); 3.3 V ± 5 %: 3.135–3.465 V; margin 0.2 V.
 */
import { describe, expect, it } from 'vitest';
import { exampleDesign } from '../../../app/example.ts';
import { CONTENTION_NOTE } from '../../../app/store/commands/fixes/index.ts';
import { design, input, net, output, part, rail3v3, rail5v0 } from '../../support/build.ts';
import { applyAndUndo, type FixCase, netOf, offered, pinOf } from './support.ts';

const greenhouse = exampleDesign();

/** IEC 60063 E12 mantissas (transcribed). */
const E12 = [1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2];

/**
 * The pull-up advice (README, "Pull-up advice"), written again here from its definition: the
 * E12 value inside [lo, hi] nearest √(lo·hi) on a log scale.
 */
function nearestMiddleE12(lo: number, hi: number): number {
  const middle = Math.sqrt(lo * hi);
  const inside: number[] = [];
  for (let decade = 1; decade <= 6; decade++)
    for (const m of E12) {
      const v = Number((m * 10 ** decade).toPrecision(2));
      if (v >= lo && v <= hi) inside.push(v);
    }
  return inside.reduce((a, b) => (Math.abs(Math.log(b / middle)) <= Math.abs(Math.log(a / middle)) ? b : a));
}

// TANK_LOW: Rmin = (3.465 − 0.1) / (1 mA − 1 µA) = 3.368 kΩ; Rmax = (3.135 − 0.7·3.135 − 0.2) /
// (1 µA + 1 µA) = 370.25 kΩ, leakage only, and the switch is off-board: the advice is
// [3368/0.95, 10 kΩ] (5 % tolerance, the 10 kΩ practical cap), √ = 5955 Ω → 5.6 kΩ.
const tankLow = nearestMiddleE12((3.465 - 0.1) / (1e-3 - 1e-6) / 0.95, 10e3);
// FLOW: only the controller's 40 kΩ pulls it up, beyond what the 10 µs rise allows over 1.505 nF:
// Rmax = 10 µs / (ln(7/3) × 1.505 nF); Rmin = (3.465 − 0.4) / (1 mA − 1 µA). A pull of the net's
// own beside 40 kΩ: [1/(1/Rmin − 1/40 k)/0.95, 1/(1/(0.7·Rmax) − 1/40 k)/1.05] → 4.7 kΩ.
const flowRMin = (3.465 - 0.4) / (1e-3 - 1e-6);
const flowRMax = 10e-6 / (Math.log(7 / 3) * 1.505e-9);
const flow = nearestMiddleE12(1 / (1 / flowRMin - 1 / 40e3) / 0.95, 1 / (1 / (0.7 * flowRMax) - 1 / 40e3) / 1.05);

/** Two three-state 3.3 V LVCMOS outputs sharing a net with one input; LVCMOS is rated at 100 µA (JESD8C, as restated). */
const shared = design({
  rails: [rail5v0, rail3v3],
  parts: [
    part('A', '3v3', 'lvcmos33', [output('Y', { drive: 'three-state' })]),
    part('B', '3v3', 'lvcmos33', [output('Y', { drive: 'three-state' })]),
    part('R', '3v3', 'lvcmos33', [input('A')]),
  ],
  nets: [net('BUS', ['A.Y', 'B.Y', 'R.A'])],
});
// The smallest tie of 10, 22, 47, 100 kΩ that keeps each output within its 100 µA row:
// a pull-up to 3.465 V against VOL 0.2 V draws 3.265 V / R, a pull-down 3.465 V / R.
const sharedUp = [10e3, 22e3, 47e3, 100e3].find((r) => (3.465 - 0.2) / r <= 100e-6);
const sharedDown = [10e3, 22e3, 47e3, 100e3].find((r) => 3.465 / r <= 100e-6);

const unused = design({
  rails: [rail3v3],
  parts: [part('U', '3v3', 'lvcmos33', [input('SPARE'), input('A')]), part('D', '3v3', 'lvcmos33', [output('Y')])],
  nets: [net('N', ['D.Y', 'U.A'])],
});

const cases: FixCase[] = [
  {
    name: `greenhouse TANK_LOW (missing-pull): ${tankLow} Ω to 3v3`,
    start: greenhouse,
    finding: 'missing-pull:TANK_LOW:all-on',
    fix: 'pull-up',
    expect: (d) => expect(netOf(d, 'TANK_LOW').pull).toEqual({ to: '3v3', ohms: tankLow }),
  },
  {
    name: `greenhouse FLOW (pull-range, the internal pull too weak): add ${flow} Ω`,
    start: greenhouse,
    finding: 'pull-range:FLOW:all-on',
    fix: 'pull-value',
    expect: (d) => expect(netOf(d, 'FLOW').pull).toEqual({ to: '3v3', ohms: flow }),
  },
  {
    // The net's own 100 kΩ with too little left by a 10 µs rise limit: the advice of the rule.
    name: 'a pull-up too large is changed to the advised value',
    start: {
      ...greenhouse,
      nets: greenhouse.nets.map((n) => (n.id === 'FROST' ? { ...n, wiringCapacitance: 1e-9, maxRiseTime: 10e-6 } : n)),
    },
    finding: 'pull-range:FROST:all-on',
    fix: 'pull-value',
    // C = 1 nF + 5 pF; Rmax = 10 µs / (ln(7/3) × 1.005 nF) = 11.74 kΩ; Rmin = (3.465 − 0.4) /
    // (1 mA − 1 µA); beside the controller's 30–50 kΩ: [1/(1/Rmin − 1/30 k)/0.95,
    // 1/(1/(0.7·Rmax) − 1/50 k)/1.05], √ ≈ 5.34 kΩ → 5.6 kΩ.
    expect: (d) =>
      expect(netOf(d, 'FROST').pull).toEqual({
        to: '3v3',
        ohms: nearestMiddleE12(
          1 / (1 / flowRMin - 1 / 30e3) / 0.95,
          1 / (1 / ((0.7 * 10e-6) / (Math.log(7 / 3) * 1.005e-9)) - 1 / 50e3) / 1.05,
        ),
      }),
  },
  {
    name: "greenhouse BOARD_SLEEP (no driver): 10 kΩ up to the receivers' 5v0",
    start: greenhouse,
    finding: 'floating-input:SLEEP:all-on',
    fix: 'pull-up',
    expect: (d) => expect(netOf(d, 'SLEEP').pull).toEqual({ to: '5v0', ohms: 10e3 }),
  },
  {
    name: 'greenhouse BOARD_SLEEP (no driver): 10 kΩ down to ground',
    start: greenhouse,
    finding: 'floating-input:SLEEP:all-on',
    fix: 'pull-down',
    expect: (d) => expect(netOf(d, 'SLEEP').pull).toEqual({ to: 'ground', ohms: 10e3 }),
  },
  {
    name: `three-state drivers only: pull-up of ${sharedUp} Ω, within the drivers' rating`,
    start: shared,
    finding: 'floating-input:BUS:all-on',
    fix: 'pull-up',
    expect: (d) => expect(netOf(d, 'BUS').pull).toEqual({ to: '3v3', ohms: sharedUp }),
  },
  {
    name: `three-state drivers only: pull-down of ${sharedDown} Ω`,
    start: shared,
    finding: 'floating-input:BUS:all-on',
    fix: 'pull-down',
    expect: (d) => expect(netOf(d, 'BUS').pull).toEqual({ to: 'ground', ohms: sharedDown }),
  },
  {
    name: 'an unused input tied high by its own pull',
    start: unused,
    finding: 'floating-input:U.SPARE:all-on',
    fix: 'pull-up',
    expect: (d) => expect(pinOf(d, 'U.SPARE').pull).toEqual({ to: '3v3', ohms: 10e3 }),
  },
  {
    name: 'an unused input tied low by its own pull',
    start: unused,
    finding: 'floating-input:U.SPARE:all-on',
    fix: 'pull-down',
    expect: (d) => expect(pinOf(d, 'U.SPARE').pull).toEqual({ to: 'ground', ohms: 10e3 }),
  },
  {
    name: 'shared three-state enables: a waiver with a note to complete',
    start: shared,
    finding: 'contention:BUS:all-on',
    fix: 'waive-contention',
    expect: (d) => expect(netOf(d, 'BUS').waivers).toEqual([{ rule: 'contention', note: CONTENTION_NOTE }]),
  },
];

describe('resistor fixes and the enables waiver', () => {
  it('the expected values are what the formulas give (guards the transcription)', () => {
    expect([tankLow, flow, sharedUp, sharedDown]).toEqual([5.6e3, 4.7e3, 47e3, 47e3]);
  });

  it.each(cases)('$name', ({ start, finding, fix, expect: check }) => {
    applyAndUndo(start, finding, fix, ({ design: d }) => check(d));
  });

  it('the waiver fix asks for its note to be completed', () => {
    const { fix } = applyAndUndo(shared, 'contention:BUS:all-on', 'waive-contention');
    expect(fix.followUp).toEqual({ kind: 'complete-waiver-note', net: 'BUS', rule: 'contention' });
  });

  it.each([
    ['a pull-up inside its range (info)', greenhouse, 'pull-range:SDA:all-on', []],
    ['two push-pull outputs fighting (no mechanical fix)', greenhouse, 'contention:PUMP_EN:all-on', []],
    ['an overloaded output (no mechanical fix)', greenhouse, 'drive-load:STATUS:all-on:U3.STATUS', []],
    ['a slow edge (no mechanical fix)', greenhouse, 'edge-rate:FLOW:all-on', []],
    ['a rail crossing (info)', greenhouse, 'rail-crossing:VALVE_EN:all-on', []],
  ])('offers nothing for %s', (_name, start, finding, fixes) => {
    expect(offered(start, finding)).toEqual(fixes);
  });

  it('offers nothing for a waived finding', () => {
    const waived = {
      ...shared,
      nets: [{ ...shared.nets[0]!, waivers: [{ rule: 'contention' as const, note: 'one enable at a time' }] }],
    };
    expect(offered(waived, 'contention:BUS:all-on')).toEqual([]);
  });
});
