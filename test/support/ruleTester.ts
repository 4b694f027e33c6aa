/**
 * A strict table tester for rules (house-style.md): every case named, no duplicate names,
 * every invalid case expects at least one finding, every message of the rule is used by some
 * case, and the designs are deep-frozen so that a rule that mutates its input fails. The views a
 * rule receives are frozen too (views are shared across power states and read by the editor),
 * and every severity it reports must be one its meta declares.
 * Each case's design must also be a valid design file.
 */
import { describe, expect, it } from 'vitest';
import { declaredSeverities, type AnyRule } from '../../rules/checks/defineRule.ts';
import type { Design } from '../../rules/model/schema.ts';
import type { Finding, Severity } from '../../rules/engine/types.ts';
import { check } from '../../rules/check/check.ts';
import { validateDesign } from '../../rules/model/reader.ts';
import { deepFreeze } from '../../rules/profiles/define.ts';
import { idsWhereLabelsBelong, relabelled } from './relabel.ts';

export { deepFreeze };

export interface ValidCase {
  name: string;
  design: Design;
}

export interface ExpectedFinding {
  messageId: string;
  severity: Severity;
  scenario?: string;
  net?: string | null;
  id?: string;
  pins?: string[];
  /** Compared key by key; numbers to 1e-9 of the larger magnitude (1e-15 absolute near 0). */
  values?: Record<string, unknown>;
  waived?: string;
}

export interface InvalidCase {
  name: string;
  design: Design;
  findings: ExpectedFinding[];
}

function expectValue(actual: unknown, expected: unknown, path: string): void {
  if (typeof expected === 'number' && typeof actual === 'number') {
    // Relative, so that nanoseconds and picofarads are compared as finely as volts.
    const tolerance = 1e-9 * Math.max(Math.abs(actual), Math.abs(expected)) + 1e-15;
    expect(Math.abs(actual - expected), `${path}: ${actual} vs ${expected}`).toBeLessThanOrEqual(tolerance);
  } else if (Array.isArray(expected)) {
    expect(Array.isArray(actual), path).toBe(true);
    expect((actual as unknown[]).length, path).toBe(expected.length);
    expected.forEach((e, k) => {
      expectValue((actual as unknown[])[k], e, `${path}[${k}]`);
    });
  } else {
    expect(actual, path).toEqual(expected);
  }
}

const refuse = (what: string) => () => {
  throw new TypeError(`a rule changed a ${what} of its view: views are shared and read-only`);
};

/**
 * Deep-freezes a view, Maps and Sets included (Object.freeze alone leaves `set`, `add`, `delete`
 * and `clear` working on them).
 */
export function freezeView<T>(value: T, seen = new Set<unknown>()): T {
  if (value === null || typeof value !== 'object' || seen.has(value)) return value;
  seen.add(value);
  if (value instanceof Map) {
    for (const [k, v] of value) {
      freezeView(k, seen);
      freezeView(v, seen);
    }
    if (!Object.isFrozen(value))
      for (const m of ['set', 'delete', 'clear']) Object.defineProperty(value, m, { value: refuse('Map') });
  } else if (value instanceof Set) {
    for (const v of value) freezeView(v, seen);
    if (!Object.isFrozen(value))
      for (const m of ['add', 'delete', 'clear']) Object.defineProperty(value, m, { value: refuse('Set') });
  }
  Object.freeze(value);
  for (const key of Object.keys(value)) freezeView((value as Record<string, unknown>)[key], seen);
  return value;
}

/**
 * The rule as the tester runs it: each view frozen before the rule sees it, and each draft's
 * severity held to the severities the rule's meta declares.
 */
export function guarded(rule: AnyRule): AnyRule {
  const declared = new Set(declaredSeverities(rule.meta.severity));
  const guard =
    <D extends { severity: Severity }>(report: (d: D) => void) =>
    (draft: D) => {
      if (!declared.has(draft.severity)) {
        throw new Error(
          `${rule.id} reported severity '${draft.severity}', which its meta does not declare (${[...declared].join(', ')})`,
        );
      }
      report(draft);
    };
  return {
    ...rule,
    ...(rule.checkNet === undefined
      ? {}
      : { checkNet: (view, report) => rule.checkNet!(freezeView(view), guard(report)) }),
    ...(rule.checkPin === undefined
      ? {}
      : { checkPin: (view, report) => rule.checkPin!(freezeView(view), guard(report)) }),
    ...(rule.checkRail === undefined
      ? {}
      : { checkRail: (view, report) => rule.checkRail!(freezeView(view), guard(report)) }),
  };
}

/** Runs only `rule` (guarded) on the design and returns its findings in the report's order. */
export function findingsOf(rule: AnyRule, design: Design): readonly Finding[] {
  return check(design, undefined, [guarded(rule)]).findings;
}

export function ruleTester(rule: AnyRule, table: { valid: ValidCase[]; invalid: InvalidCase[] }): void {
  describe(`rule ${rule.id}`, () => {
    it('has a well-formed table', () => {
      const names = [...table.valid, ...table.invalid].map((c) => c.name);
      for (const n of names) expect(n.trim(), 'every case is named').not.toBe('');
      expect(new Set(names).size, `duplicate case names in ${names.join(' | ')}`).toBe(names.length);
      for (const c of table.invalid) expect(c.findings.length, `${c.name} expects no finding`).toBeGreaterThan(0);
      const used = new Set(table.invalid.flatMap((c) => c.findings.map((f) => f.messageId)));
      for (const id of Object.keys(rule.meta.messages))
        expect(used.has(id), `message ${id} is used by no case`).toBe(true);
    });

    for (const c of table.valid) {
      it(`valid: ${c.name}`, () => {
        const d = deepFreeze(c.design);
        const read = validateDesign(d);
        expect(read.ok ? [] : read.errors, 'the case is a valid design').toEqual([]);
        const found = findingsOf(rule, d);
        expect(found.map((f) => `${f.id}: ${f.message}`)).toEqual([]);
      });
    }

    for (const c of table.invalid) {
      it(`invalid: ${c.name}`, () => {
        const d = deepFreeze(c.design);
        const read = validateDesign(d);
        expect(read.ok ? [] : read.errors, 'the case is a valid design').toEqual([]);
        const found = findingsOf(rule, d);
        expect(found.length, found.map((f) => `${f.id}: ${f.message}`).join('\n')).toBe(c.findings.length);
        c.findings.forEach((e, k) => {
          const f = found[k]!;
          expect(f.rule).toBe(rule.id);
          expect(f.messageId, f.message).toBe(e.messageId);
          expect(f.severity, f.message).toBe(e.severity);
          expect(f.message.length).toBeGreaterThan(0);
          if (e.scenario !== undefined) expect(f.scenario).toBe(e.scenario);
          if (e.net !== undefined) expect(f.net).toBe(e.net);
          if (e.id !== undefined) expect(f.id).toBe(e.id);
          if (e.pins !== undefined) expect(f.pins).toEqual(e.pins);
          if (e.waived !== undefined) expect(f.waived).toBe(e.waived);
          for (const [key, v] of Object.entries(e.values ?? {}))
            expectValue((f.values as Readonly<Record<string, unknown>>)[key], v, `${f.id} values.${key}`);
        });
      });

      // One name for one thing (issue 18): with every net, rail and profile labelled apart from
      // its id, the same findings name them by label; ids stay in the machine fields.
      it(`labels: ${c.name}`, () => {
        const d = deepFreeze(relabelled(c.design));
        const found = findingsOf(rule, d);
        expect(found.map((f) => f.id)).toEqual(findingsOf(rule, deepFreeze(c.design)).map((f) => f.id));
        for (const f of found) {
          expect(idsWhereLabelsBelong(f.message, d), `message: ${f.message}`).toEqual([]);
          expect(idsWhereLabelsBelong(f.hint, d), `hint: ${f.hint}`).toEqual([]);
        }
      });
    }
  });
}
