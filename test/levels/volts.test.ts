/**
 * Volts with the digits a supply's corner needs (issue 18): a level shows as many significant
 * digits as it needs, up to four, so that 3.3 V − 5 % reads 3.135 V and not 3.13 V; a margin (a
 * difference of two levels) keeps three. The corners are nominal × (1 ± tolerance), JESD8C's
 * 3.3 V ± 0.3 V and the common ±5 % and ±10 % supplies (common practice); the figures are
 * worked by hand beside each case.
 */
import { describe, expect, it } from 'vitest';
import { formatMargin, formatQuantity } from '../../rules/levels/units.ts';
import { volts } from '../../rules/checks/format.ts';
import { railRange } from '../../rules/levels/rails.ts';

const levels: [name: string, value: number, shown: string][] = [
  ['3.3 V − 5 % = 3.135 V', 3.3 * 0.95, '3.135 V'],
  ['3.3 V + 5 % = 3.465 V', 3.3 * 1.05, '3.465 V'],
  ['1.8 V − 5 % = 1.71 V', 1.8 * 0.95, '1.71 V'],
  ['5 V + 5 % = 5.25 V', 5 * 1.05, '5.25 V'],
  ['5 V − 10 % = 4.5 V', 5 * 0.9, '4.5 V'],
  ['2.5 V − 5 % = 2.375 V', 2.5 * 0.95, '2.375 V'],
  ['1.2 V + 10 % = 1.32 V', 1.2 * 1.1, '1.32 V'],
  ['a low output level of 0.4 V', 0.4, '0.4 V'],
  ['JESD8C LVTTL VIH 2 V', 2, '2 V'],
  ['74HC VIH at 4.5 V, 0.7 × 4.5 = 3.15 V', 0.7 * 4.5, '3.15 V'],
  ['one third of a volt: four digits at most', 1 / 3, '0.3333 V'],
  ['12.345 V: four digits at most', 12.345, '12.35 V'],
  ['a negative rail, −5 V − 5 % = −5.25 V', -5 * 1.05, '-5.25 V'],
];

describe('volts with the digits the corner needs', () => {
  it.each(levels)('%s', (_name, value, shown) => {
    expect(formatQuantity(value, 'V')).toBe(shown);
    expect(volts(value)).toBe(shown);
  });

  it("a rail's corners as the range makes them: 3.3 V ± 5 % spans 3.135 V–3.465 V", () => {
    const r = railRange({ nominal: 3.3, tolerance: 0.05 });
    expect(`${volts(r.min)}–${volts(r.max)}`).toBe('3.135 V–3.465 V');
  });

  const margins: [name: string, value: number, shown: string][] = [
    ['2.935 V − 3.69375 V = −0.75875 V', 2.935 - 3.69375, '-0.759 V'],
    ['3.135 V − 0.2 V − 2 V = 0.935 V', 3.135 - 0.2 - 2, '0.935 V'],
    ['0.8 V − 0.4 V = 0.4 V', 0.8 - 0.4, '0.4 V'],
  ];
  it.each(margins)('a margin keeps three digits: %s', (_name, value, shown) => {
    expect(formatMargin(value)).toBe(shown);
  });

  it('other units keep three digits: 4.7 kΩ, 1/3 A', () => {
    expect(formatQuantity(4700, 'Ω')).toBe('4.7 kΩ');
    expect(formatQuantity(1 / 3, 'A')).toBe('0.333 A');
  });
});
