/**
 * A rail's tolerance shown and typed as "± 5 %" while the file keeps a fraction (issue 18); a
 * quantity of another unit is refused with a reason that says the field takes percent. The
 * conversion of a voltage is nominal × percent: 0.25 V of 3.3 V is 7.576 % (worked by hand).
 */
import { describe, expect, it } from 'vitest';
import { formatPercent, parsePercent } from '../../app/panels/percent.ts';

describe('tolerance typed as a percentage', () => {
  it.each([
    { text: '5', value: 0.05 },
    { text: '5 %', value: 0.05 },
    { text: '± 5 %', value: 0.05 },
    { text: '±2.5%', value: 0.025 },
    { text: '+/- 10 %', value: 0.1 },
    { text: '10', value: 0.1 },
    { text: '.5', value: 0.005 },
    { text: '0', value: 0 },
  ])('"$text" is $value', ({ text, value }) => {
    const r = parsePercent(text);
    expect(r.ok ? r.value : r.error).toBeCloseTo(value, 12);
  });

  it.each([
    { text: '0.25 V', says: /"0\.25 V" is a voltage: the tolerance takes percent.*± 7\.576 %/ },
    { text: '250 mV', says: /"250 mV" is a voltage: the tolerance takes percent.*± 7\.576 %/ },
    { text: '± 0.25 V', says: /is a voltage: the tolerance takes percent/ },
    { text: '5 mA', says: /"5 mA" is a current: the tolerance takes percent/ },
    { text: '5 V', says: /is a voltage: the tolerance takes percent/ },
    { text: 'five', says: /expected the tolerance in percent, e\.g\. ± 5 %; found "five"/ },
    { text: '5,5', says: /expected the tolerance in percent/ },
    { text: '', says: /expected the tolerance in percent/ },
    { text: '-5 %', says: /0 % or more/ },
  ])('refuses "$text" and says the field takes percent', ({ text, says }) => {
    const r = parsePercent(text, 3.3);
    expect(r.ok).toBe(false);
    expect(r.ok ? '' : r.error).toMatch(says);
  });

  it.each([
    { fraction: 0.05, text: '± 5 %' },
    { fraction: 0.025, text: '± 2.5 %' },
    { fraction: 0.07, text: '± 7 %' },
    { fraction: 0.1, text: '± 10 %' },
  ])('$fraction shows as "$text" and reads back', ({ fraction, text }) => {
    expect(formatPercent(fraction)).toBe(text);
    const r = parsePercent(text);
    expect(r.ok ? r.value : NaN).toBeCloseTo(fraction, 12);
  });
});
