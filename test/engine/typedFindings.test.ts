/**
 * Findings are typed end to end: `Finding` is a union discriminated by `rule`, each rule's
 * `values` has its own type (rules/engine/values.ts), and a rule's drafts are held to it. The
 * `@ts-expect-error` lines below are the test: `npm test` type-checks this file, and a line that
 * no longer errors (a key renamed on one side only, a check that stopped narrowing) fails it.
 */
import { describe, expect, it } from 'vitest';
import { defineRule } from '../../rules/checks/defineRule.ts';
import { check } from '../../rules/check/check.ts';
import { isOfRule, valuesOf } from '../../rules/engine/findings.ts';
import type { Finding } from '../../rules/engine/types.ts';
import { greenhouse } from '../report/fixtures.ts';

const result = check(greenhouse());

/** Reads a level-high finding's margin by narrowing on `rule`. */
function marginOf(f: Finding): number | null | undefined {
  if (f.rule === 'level-high') return f.values.margin;
  // @ts-expect-error: an overvoltage finding has no margin
  if (f.rule === 'overvoltage') return f.values.margin;
  return undefined;
}

describe('typed findings', () => {
  it("narrow by rule: the example's planted level-high error reads its margin", () => {
    const f = result.findings.find((x) => x.rule === 'level-high' && x.severity === 'error')!;
    expect(marginOf(f)).toBeLessThan(0);
    expect(valuesOf(f, 'level-high').margin).toBe(marginOf(f));
  });

  it('valuesOf refuses a finding of another rule', () => {
    const f = result.findings.find((x) => x.rule === 'overvoltage')!;
    expect(() => valuesOf(f, 'level-high')).toThrow(/expected a level-high finding, found overvoltage/);
    expect(isOfRule(f, 'overvoltage')).toBe(true);
  });

  it('a renamed key fails to compile, on the reading side and on the reporting side', () => {
    const f = result.findings.find((x) => x.rule === 'overvoltage')!;
    if (isOfRule(f, 'overvoltage')) {
      expect(typeof f.values.vNet).toBe('number');
      // @ts-expect-error: `vnet` is not a key of the overvoltage values (it is `vNet`)
      expect(f.values.vnet).toBeUndefined();
    }
    const rule = defineRule({
      id: 'missing-pull',
      meta: { title: 't', severity: { error: '' }, explanation: 'e', hint: 'h', messages: { m: () => 'm' } },
      checkNet(_view, report) {
        // @ts-expect-error: missing-pull reports `drivers`, not `driver`
        report({ messageId: 'm', data: undefined, severity: 'error', pins: [], parts: [], values: { driver: [] } });
      },
    });
    expect(rule.id).toBe('missing-pull');
  });
});
