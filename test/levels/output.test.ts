/**
 * The guaranteed output level at a load current (rules-catalogue.md, "Guaranteed output levels,
 * not guesses"), on the 74HC rows of JESD7 as restated in parts' DC tables: VOH VDD−0.1 V at
 * 20 µA and VDD−0.66 V at 4 mA (the 4.5 V row carried up), VOL 0.1 V at 20 µA, 0.33 V at 4 mA.
 */
import { describe, expect, it } from 'vitest';
import { largestTestCurrent, outputLevel } from '../../rules/levels/output.ts';

const voh = [
  { v: 'VDD-0.1', i: 20e-6 },
  { v: 'VDD-0.66', i: 4e-3 },
];
const vol = [
  { v: 0.1, i: 20e-6 },
  { v: 0.33, i: 4e-3 },
];
const slopeHigh = (-0.66 + 0.1) / (4e-3 - 20e-6);
const slopeLow = (0.33 - 0.1) / (4e-3 - 20e-6);

describe('outputLevel', () => {
  const cases: [string, typeof voh | typeof vol, number, number, 'high' | 'low', number, boolean][] = [
    ['no load takes the lightest row', voh, 0, 4.5, 'high', 4.4, false],
    ['a load exactly at a test current takes that row', voh, 20e-6, 4.5, 'high', 4.4, false],
    ['a load just above it takes the next row', voh, 21e-6, 4.5, 'high', 3.84, false],
    ['exactly the largest test current is still guaranteed', voh, 4e-3, 5.5, 'high', 4.84, false],
    ['within 1e-9 of a test current counts as at it', voh, 4e-3 * (1 + 1e-12), 4.5, 'high', 3.84, false],
    [
      'above the last row: the line through the last two, extrapolated',
      voh,
      5e-3,
      4.5,
      'high',
      3.84 + slopeHigh * 1e-3,
      true,
    ],
    ['the low side likewise', vol, 6e-3, 4.5, 'low', 0.33 + slopeLow * 2e-3, true],
    ['low side, light load', vol, 1e-6, 5, 'low', 0.1, false],
  ];
  it.each(cases)('%s', (_name, points, load, vdd, sense, v, estimate) => {
    const r = outputLevel(points, load, vdd, sense)!;
    expect(r.v).toBeCloseTo(v, 12);
    expect(r.estimate).toBe(estimate);
  });

  // A single row: the resistive line through the origin, as if the output were a resistor from
  // its own rail. Numbers worked by hand from the rows named beside each case.
  it.each([
    // I2C-bus specification: VOL 0.4 V @ 3 mA (VDD > 2 V). 4.54 mA: 0.4 × 4.54 / 3 = 0.60533 V.
    ['a 0.4 V @ 3 mA row at 4.54 mA', [{ v: 0.4, i: 3e-3 }], 4.54e-3, 3.3, 'low', (0.4 * 4.54) / 3],
    // I2C-bus specification, VDD ≤ 2 V: VOL 0.2·VDD @ 3 mA = 0.342 V at 1.71 V; 4.59 mA gives
    // 0.342 × 4.59 / 3 = 0.52326 V, above VIL 0.3 × 1.71 = 0.513 V (a failing low level).
    [
      'a 0.2·VDD @ 3 mA row at 4.59 mA and 1.71 V',
      [{ v: '0.2*VDD', i: 3e-3 }],
      4.59e-3,
      1.71,
      'low',
      (0.342 * 4.59) / 3,
    ],
    // JESD8C LVCMOS: VOH VDD − 0.2 V @ 100 µA only; 1 mA at 3.0 V: 3.0 − 0.2 × 10 = 1.0 V.
    ['a VDD−0.2 @ 100 µA row at 1 mA', [{ v: 'VDD-0.2', i: 100e-6 }], 1e-3, 3.0, 'high', 1.0],
    // The same row at 100 mA: the line reaches 0 V and stops at the output's own rail (common practice).
    ['a VDD−0.2 @ 100 µA row far beyond it stops at 0 V', [{ v: 'VDD-0.2', i: 100e-6 }], 100e-3, 3.0, 'high', 0],
    ['a 0.4 V @ 3 mA row far beyond it stops at VDD', [{ v: 0.4, i: 3e-3 }], 1, 3.3, 'low', 3.3],
    // A row at 0 A draws no line: its level is kept.
    ['a row at 0 A keeps its level', [{ v: 0.1, i: 0 }], 1e-3, 3.3, 'low', 0.1],
  ] as const)('single row: %s', (_name, points, load, vdd, sense, v) => {
    const r = outputLevel(points, load, vdd, sense)!;
    expect(r.v).toBeCloseTo(v, 12);
    expect(r.estimate).toBe(true);
  });

  it('an extrapolation is never better than the last guaranteed row', () => {
    // A list whose heavier row is (oddly) better than its lighter one: the estimate keeps the last row.
    const r = outputLevel(
      [
        { v: 2.0, i: 1e-3 },
        { v: 2.4, i: 2e-3 },
      ],
      5e-3,
      3.3,
      'high',
    )!;
    expect(r.v).toBe(2.4);
  });

  // An output cannot swing beyond its own supply rails (common practice): the line stops at 0 V
  // high and at VDD low, also when test points a hair apart would send it to ±Infinity.
  it.each([
    ['74HC high far above its rows: 0 V, not below', voh, 1, 4.5, 'high', 0],
    ['74HC low far above its rows: VDD, not above', vol, 1, 4.5, 'low', 4.5],
    [
      'rows 1e-300 A apart, high: 0 V, not -Infinity',
      [
        { v: 3, i: 1e-300 },
        { v: 2, i: 2e-300 },
      ],
      1e-3,
      3.3,
      'high',
      0,
    ],
    [
      'rows 1e-300 A apart, low: VDD, not +Infinity',
      [
        { v: 0.2, i: 1e-300 },
        { v: 0.4, i: 2e-300 },
      ],
      1e-3,
      3.3,
      'low',
      3.3,
    ],
    [
      'a last row already below 0 V stays as it is (never better)',
      [
        { v: 0.5, i: 1e-3 },
        { v: -0.5, i: 2e-3 },
      ],
      1,
      3.3,
      'high',
      -0.5,
    ],
  ] as const)('%s', (_name, points, load, vdd, sense, v) => {
    const r = outputLevel(points, load, vdd, sense)!;
    expect(r.v).toBe(v);
    expect(r.estimate).toBe(true);
  });

  it('unsorted rows are read in order of current', () => {
    expect(outputLevel([vol[1]!, vol[0]!], 1e-6, 5, 'low')!.v).toBe(0.1);
  });

  it('no rows, no level', () => {
    expect(outputLevel(undefined, 0, 5, 'high')).toBeUndefined();
    expect(outputLevel([], 0, 5, 'high')).toBeUndefined();
    expect(largestTestCurrent(voh)).toBe(4e-3);
    expect(largestTestCurrent(undefined)).toBeUndefined();
  });
});
