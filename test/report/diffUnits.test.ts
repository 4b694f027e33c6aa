/**
 * Every number a finding carries prints with its unit in `railcross diff` (SI units,
 * report-format.md): a values key added to a rule without a unit would print raw, as
 * `4205.816554809843`. Checked over the example and generated boards with every rule firing.
 */
import { describe, expect, it } from 'vitest';
import { check } from '../../rules/check/check.ts';
import { changeText, UNITLESS_VALUE_KEYS, unitOfValue } from '../../rules/report/diff.ts';
import { generateDesign } from '../support/generator.ts';
import { greenhouse } from './fixtures.ts';

const designs = [greenhouse(), ...[5, 13, 21].map((seed) => generateDesign(seed, { parts: 40, faultRate: 0.6 }))];

describe('diff units', () => {
  it('every numeric values key has a unit or is named unitless', () => {
    const missing = new Set<string>();
    for (const d of designs) {
      for (const f of check(d).findings) {
        for (const [k, v] of Object.entries(f.values as Readonly<Record<string, unknown>>)) {
          if (typeof v === 'number' && unitOfValue(k) === undefined && !UNITLESS_VALUE_KEYS.has(k))
            missing.add(`${f.rule}.${k}`);
        }
      }
    }
    expect([...missing].sort()).toEqual([]);
  });

  it('a changed resistance prints in engineering notation', () => {
    expect(changeText({ key: 'values.ohmsMin', before: 40e3, after: 4205.816554809843 })).toBe(
      'ohmsMin 40 kΩ → 4.21 kΩ',
    );
  });
});
