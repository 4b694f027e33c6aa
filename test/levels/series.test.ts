import { describe, expect, it } from 'vitest';
import { E12, E24, largestInRange, seriesValuesBetween } from '../../rules/levels/series.ts';

// IEC 60063, table of the E12 and E24 series (transcribed).
const IEC60063_E12 = [1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2];
const IEC60063_E24 = [
  1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2,
  9.1,
];

describe('IEC 60063 tables', () => {
  it('E12 is the table', () => expect(E12).toEqual(IEC60063_E12));
  it('E24 is the table', () => expect(E24).toEqual(IEC60063_E24));
  it('E12 is every second E24 value (IEC 60063)', () => {
    expect(E24.filter((_, i) => i % 2 === 0)).toEqual(E12);
  });
  it('E24 is not the rounded geometric series: they differ at 2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 8.2', () => {
    const geometric = E24.map((_, i) => Math.round(10 * 10 ** (i / 24)) / 10);
    expect(E24.filter((v, i) => v !== geometric[i])).toEqual([2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 8.2]);
  });
  it('the tables cannot be changed', () => {
    expect(Object.isFrozen(E12) && Object.isFrozen(E24)).toBe(true);
  });
});

describe('seriesValuesBetween', () => {
  // Expected values are decimal literals: a scaled value must be exactly that double (4700,
  // not 4700.000000000001).
  const cases: [name: string, series: readonly number[], lo: number, hi: number, values: number[]][] = [
    [
      'one E12 decade of ohms',
      E12,
      1000,
      10000,
      [1000, 1200, 1500, 1800, 2200, 2700, 3300, 3900, 4700, 5600, 6800, 8200, 10000],
    ],
    [
      'picofarads',
      E12,
      1e-12,
      4.7e-12,
      [1e-12, 1.2e-12, 1.5e-12, 1.8e-12, 2.2e-12, 2.7e-12, 3.3e-12, 3.9e-12, 4.7e-12],
    ],
    ['milliohms', E24, 1e-3, 1.3e-3, [1e-3, 1.1e-3, 1.2e-3, 1.3e-3]],
    ['teraohm end', E24, 8e11, 1e12, [8.2e11, 9.1e11, 1e12]],
    ['across decades', E12, 6e5, 1.3e6, [6.8e5, 8.2e5, 1e6, 1.2e6]],
    ['an end just above a value, within 1e-9 relative', E24, 4700 * (1 + 1e-10), 4700 * (1 + 1e-10), [4700]],
    ['an end just below a value, within 1e-9 relative', E24, 4700 * (1 - 1e-10), 4700 * (1 - 1e-10), [4700]],
    ['an end 1e-8 relative away is outside', E24, 4700 * (1 + 1e-8), 4800, []],
    ['lo of 0 starts at the smallest decade searched', E12, 0, 1.5e-15, [1e-15, 1.2e-15, 1.5e-15]],
    ['lo > hi', E24, 3000, 2000, []],
    ['hi not positive', E24, -5, 0, []],
    ['NaN', E24, NaN, 1000, []],
    ['a caller series, unsorted', [2.2, 1.0], 1, 30, [1, 2.2, 10, 22]],
  ];
  it.each(cases)('%s', (_name, series, lo, hi, values) => {
    expect(seriesValuesBetween(series, lo, hi)).toEqual(values);
  });

  it('scales every E24 value exactly at every decade from 1e-3 to 1e12', () => {
    for (let decade = -3; decade <= 12; decade++) {
      const got = seriesValuesBetween(E24, 10 ** decade * 0.999, 10 ** decade * 9.99);
      expect(got).toEqual(IEC60063_E24.map((m) => Number(`${m}e${decade}`)));
    }
    expect(seriesValuesBetween(E24, 4000, 5000)).toContain(4700);
  });

  it('an unbounded hi stops at the top decade searched', () => {
    const all = seriesValuesBetween(E12, 1e14, Infinity);
    expect(all[all.length - 1]).toBe(8.2e15);
  });
});

describe('largestInRange', () => {
  // I2C-bus specification, pull-up sizing: Rp(min) = (VDD − VOL(max)) / IOL,
  // Rp(max) = tr / (0.8473 · Cb), where 0.8473 is ln(7/3), the 30 %→70 % time of a single-pole
  // RC in units of RC (the worked values use it unrounded). Worked values (reference): 966.7,
  // 2950.6, 5901.1, 885.2, 255.0–257.5 Ω.
  const rpMin = (vdd: number, vol: number, iol: number) => (vdd - vol) / iol;
  const rpMax = (tr: number, cb: number) => tr / (Math.log(7 / 3) * cb);
  it('the formulas give the worked values', () => {
    expect(rpMin(3.3, 0.4, 3e-3)).toBeCloseTo(966.7, 1);
    expect(rpMax(1000e-9, 400e-12)).toBeCloseTo(2950.6, 1);
    expect(rpMax(1000e-9, 200e-12)).toBeCloseTo(5901.1, 1);
    expect(rpMax(300e-9, 400e-12)).toBeCloseTo(885.2, 1);
    expect(rpMin(5.5, 0.4, 20e-3)).toBeCloseTo(255.0, 1);
    expect(rpMax(120e-9, 550e-12)).toBeCloseTo(257.5, 1);
  });

  const cases: [name: string, series: readonly number[], lo: number, hi: number, best: number | null][] = [
    // I2C-bus specification, standard-mode, 3.3 V, 3 mA, 400 pF: 966.7–2950.6 Ω.
    ['I2C standard-mode 400 pF, E24', E24, rpMin(3.3, 0.4, 3e-3), rpMax(1000e-9, 400e-12), 2700],
    ['I2C standard-mode 400 pF, E12', E12, rpMin(3.3, 0.4, 3e-3), rpMax(1000e-9, 400e-12), 2700],
    // I2C-bus specification, standard-mode at 200 pF: up to 5901.1 Ω.
    ['I2C standard-mode 200 pF, E24', E24, rpMin(3.3, 0.4, 3e-3), rpMax(1000e-9, 200e-12), 5600],
    // I2C-bus specification, fast-mode at 400 pF: Rp(max) 885.2 < Rp(min) 966.7, no pull-up.
    ['I2C fast-mode 400 pF: empty range', E24, rpMin(3.3, 0.4, 3e-3), rpMax(300e-9, 400e-12), null],
    // I2C-bus specification, fast-mode plus, 5.5 V, 20 mA, 550 pF: 255.0–257.5 Ω, no E24 value.
    ['I2C fast-mode plus 5.5 V 550 pF', E24, rpMin(5.5, 0.4, 20e-3), rpMax(120e-9, 550e-12), null],
    ['the worked ends as printed', E24, 966.7, 2950.6, 2700],
    ['255.0–257.5 as printed', E24, 255.0, 257.5, null],
    // Handbook (open-collector TTL data pages): 74LS open-collector, four loads, 742.2 Ω–13.06 kΩ.
    ['open-collector pull-up, E24 has 13k', E24, 742.2, 13.06e3, 13000],
    ['open-collector pull-up, E12 stops at 12k', E12, 742.2, 13.06e3, 12000],
    ['unbounded above', E24, 966.7, Infinity, null],
    ['NaN above', E24, 966.7, NaN, null],
    ['no value between 2.7k and 3.0k', E24, 2750, 2950, null],
    ['lo > hi', E24, 3000, 2000, null],
    ['a value exactly at hi', E24, 1000, 2700, 2700],
    ['a value exactly at lo', E24, 2700, 2900, 2700],
    ['a hi computed a hair below 4700', E12, 1000, 4699.999999, 4700],
    ['capacitors', E12, 90e-12, 110e-12, 100e-12],
    ['milliohms', E12, 1e-3, 1.1e-3, 1e-3],
    ['teraohms', E24, 9e11, 9.5e11, 9.1e11],
  ];
  it.each(cases)('%s', (_name, series, lo, hi, best) => {
    expect(largestInRange(series, lo, hi)).toBe(best);
  });
});
