/**
 * Resistor fixes: a pull-up sized by the open-collector formulas, a pull-up moved into its
 * range, ties for floating inputs, and the waiver for shared three-state enables.
 *
 * Sizing (handbook, open-collector pull-up; IEC 60063 E24 for the chosen value):
 *   Rmin = (VCC,max − VOL) / (IOL − Σ IIL),  Rmax = (VCC,min − VIH − margin) / Σ IIH.
 * The greenhouse's numbers are its own invented demo data (off-board switch: VOL 0.1 V at 1 mA,
 * 1 µA leakage; controller input 1 µA; thermostat 10 µA); the controller's VIH is 0.7·VDD
 * (common practice, the mcu-gpio starting point); 3.3 V ± 5 %: 3.135–3.465 V; margin 0.2 V.
 */
import { describe, expect, it } from 'vitest';
import { exampleDesign } from '../../../app/example.ts';
import { CONTENTION_NOTE } from '../../../app/store/commands/fixes/index.ts';
import type { Design } from '../../../rules/model/schema.ts';
import { design, input, net, output, part, rail3v3, rail5v0 } from '../../support/build.ts';
import { applyAndUndo, type FixCase, netOf, offered, pinOf } from './support.ts';

const greenhouse = exampleDesign();

/** The largest IEC 60063 E24 value at or below r (E24 mantissas transcribed from IEC 60063). */
function e24Below(r: number): number {
  const E24 = [1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2, 9.1];
  const decade = 10 ** Math.floor(Math.log10(r));
  const m = [...E24].reverse().find((x) => x * decade <= r)!;
  return Number((m * decade).toPrecision(2));
}

// TANK_LOW: Rmax = (3.135 − 0.7·3.135 − 0.2) / (1 µA + 1 µA) = 370.25 kΩ → 360 kΩ;
// Rmin = (3.465 − 0.1) / (1 mA − 1 µA) = 3.37 kΩ lies below it.
const tankLow = e24Below((3.135 * 0.3 - 0.2) / 2e-6);
// FROST: Rmax = (3.135 · 0.3 − 0.2) / (10 µA + 1 µA) = 67.3 kΩ → 62 kΩ (the 100 kΩ fitted is too large).
const frost = e24Below((3.135 * 0.3 - 0.2) / 11e-6);

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
    start: greenhouse, finding: 'missing-pull:TANK_LOW:all-on', fix: 'pull-up',
    expect: (d) => expect(netOf(d, 'TANK_LOW').pull).toEqual({ to: '3v3', ohms: tankLow }),
  },
  {
    name: `greenhouse FROST (pull-range, too large): ${frost} Ω`,
    start: greenhouse, finding: 'pull-range:FROST:all-on', fix: 'pull-value',
    expect: (d) => expect(netOf(d, 'FROST').pull).toEqual({ to: '3v3', ohms: frost }),
  },
  {
    name: 'greenhouse BOARD_SLEEP (no driver): 10 kΩ up to the receivers\' 5v0',
    start: greenhouse, finding: 'floating-input:SLEEP:all-on', fix: 'pull-up',
    expect: (d) => expect(netOf(d, 'SLEEP').pull).toEqual({ to: '5v0', ohms: 10e3 }),
  },
  {
    name: 'greenhouse BOARD_SLEEP (no driver): 10 kΩ down to ground',
    start: greenhouse, finding: 'floating-input:SLEEP:all-on', fix: 'pull-down',
    expect: (d) => expect(netOf(d, 'SLEEP').pull).toEqual({ to: 'ground', ohms: 10e3 }),
  },
  {
    name: `three-state drivers only: pull-up of ${sharedUp} Ω, within the drivers' rating`,
    start: shared, finding: 'floating-input:BUS:all-on', fix: 'pull-up',
    expect: (d) => expect(netOf(d, 'BUS').pull).toEqual({ to: '3v3', ohms: sharedUp }),
  },
  {
    name: `three-state drivers only: pull-down of ${sharedDown} Ω`,
    start: shared, finding: 'floating-input:BUS:all-on', fix: 'pull-down',
    expect: (d) => expect(netOf(d, 'BUS').pull).toEqual({ to: 'ground', ohms: sharedDown }),
  },
  {
    name: 'an unused input tied high by its own pull',
    start: unused, finding: 'floating-input:U.SPARE:all-on', fix: 'pull-up',
    expect: (d) => expect(pinOf(d, 'U.SPARE').pull).toEqual({ to: '3v3', ohms: 10e3 }),
  },
  {
    name: 'an unused input tied low by its own pull',
    start: unused, finding: 'floating-input:U.SPARE:all-on', fix: 'pull-down',
    expect: (d) => expect(pinOf(d, 'U.SPARE').pull).toEqual({ to: 'ground', ohms: 10e3 }),
  },
  {
    name: 'shared three-state enables: a waiver with a note to complete',
    start: shared, finding: 'contention:BUS:all-on', fix: 'waive-contention',
    expect: (d) => expect(netOf(d, 'BUS').waivers).toEqual([{ rule: 'contention', note: CONTENTION_NOTE }]),
  },
];

describe('resistor fixes and the enables waiver', () => {
  it('the expected values are what the formulas give (guards the transcription)', () => {
    expect([tankLow, frost, sharedUp, sharedDown]).toEqual([360e3, 62e3, 47e3, 47e3]);
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
    const waived = { ...shared, nets: [{ ...shared.nets[0]!, waivers: [{ rule: 'contention' as const, note: 'one enable at a time' }] }] };
    expect(offered(waived, 'contention:BUS:all-on')).toEqual([]);
  });
});
