import { describe, expect, it } from 'vitest';
import { formatPercent, parsePercent } from '../../app/panels/percent.ts';

describe('tolerance typed as a percentage', () => {
  it.each([
    { text: '5', value: 0.05 },
    { text: '5 %', value: 0.05 },
    { text: '±2.5%', value: 0.025 },
    { text: '10', value: 0.1 },
    { text: '0', value: 0 },
  ])('"$text" is $value', ({ text, value }) => {
    const r = parsePercent(text);
    expect(r.ok ? r.value : r.error).toBeCloseTo(value, 12);
  });

  it.each(['', 'five', '5 V', '5,5'])('refuses "%s" with a reason, never NaN', (text) => {
    const r = parsePercent(text);
    expect(r.ok).toBe(false);
    expect(r.ok ? '' : r.error).not.toBe('');
  });

  it.each([
    { fraction: 0.05, text: '5 %' },
    { fraction: 0.025, text: '2.5 %' },
    { fraction: 0.07, text: '7 %' },
  ])('$fraction shows as "$text" and reads back', ({ fraction, text }) => {
    expect(formatPercent(fraction)).toBe(text);
    const r = parsePercent(text);
    expect(r.ok ? r.value : NaN).toBeCloseTo(fraction, 12);
  });
});
