/**
 * The incremental check equals a full check: random designs, random sequences of edits of
 * every kind, and after every edit the two results deep-equal.
 */
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { check } from '../../rules/check/check.ts';
import type { CheckResult } from '../../rules/engine/types.ts';
import { validateDesign } from '../../rules/model/reader.ts';
import type { Design, PinState } from '../../rules/model/schema.ts';
import { applyEdit, EDIT_KINDS, generateDesign, rng } from '../support/generator.ts';

/** The parts of a result that must agree (stats differ by design). */
function comparable(r: CheckResult) {
  return {
    states: r.states.map((s) => ({ id: s.id, label: s.label, off: [...s.off].sort() })),
    summary: r.summary,
    findings: r.findings,
    nets: new Map([...r.nets].map(([s, m]) => [s, new Map([...m].sort(([a], [b]) => (a < b ? -1 : 1)))])),
    lonePins: new Map([...r.lonePins].map(([s, m]) => [s, new Map([...m].sort(([a], [b]) => (a < b ? -1 : 1)))])),
    railFindings: new Map([...r.railFindings].sort(([a], [b]) => (a < b ? -1 : 1))),
    injectionFindings: r.injectionFindings,
  };
}

describe('incremental check', () => {
  it('equals a full check after every edit of a random sequence', { timeout: 600_000 }, () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 2 ** 31 - 1 }),
        fc.integer({ min: 3, max: 14 }),
        fc.array(fc.tuple(fc.constantFrom(...EDIT_KINDS), fc.integer({ min: 1, max: 2 ** 31 - 1 })), {
          minLength: 1,
          maxLength: 12,
        }),
        (seed, parts, edits) => {
          // Half the designs carry parts between chips (version 2), joining neighbouring nets.
          let design = generateDesign(seed, {
            parts,
            faultRate: 0.3,
            wiring: seed % 2 === 0 ? 'random' : 'board',
            discretes: seed % 3 === 0 ? 0 : 0.35,
          });
          let result = check(design);
          for (const [kind, editSeed] of edits) {
            design = applyEdit(design, kind, rng(editSeed));
            const read = validateDesign(design);
            expect(read.ok ? [] : read.errors, `${kind} keeps the design valid`).toEqual([]);
            result = check(design, result);
            expect(comparable(result), `after ${kind}`).toEqual(comparable(check(design)));
          }
        },
      ),
      { numRuns: 500, endOnFailure: true },
    );
  });

  it('a part that only moved re-checks nothing', () => {
    const design = generateDesign(7, { parts: 40 });
    const first = check(design);
    const moved = applyEdit(design, 'move-part', rng(3));
    const next = check(moved, first);
    expect(next.stats.incremental).toBe(true);
    expect(next.stats.netsChecked).toBe(0);
  });

  it('an edit re-checks only the nets it touches, in each power state', () => {
    const design = generateDesign(11, { parts: 200 });
    const first = check(design);
    const next = check(applyEdit(design, 'connect', rng(5)), first);
    expect(next.stats.incremental).toBe(true);
    // One pin left one net and joined another: at most two nets, in each of the two states.
    expect(next.stats.netsChecked).toBeGreaterThan(0);
    expect(next.stats.netsChecked).toBeLessThanOrEqual(4);
  });

  it('without shared objects it falls back to a full check', () => {
    const design = generateDesign(13, { parts: 30 });
    const first = check(design);
    const copy = structuredClone(design);
    const next = check(copy, first);
    expect(comparable(next)).toEqual(comparable(check(copy)));
  });
});

/**
 * A power state whose pin states alone change re-checks the pins it sets or set, not the whole
 * state: each case edits the example's reset state and holds the incremental result to a full
 * check (a pin whose state is taken away must be judged again as in all-on).
 */
describe('incremental check: pin states of a power state', () => {
  const example = (): Design => {
    const read = validateDesign(
      JSON.parse(readFileSync(new URL('../../rules/examples/greenhouse.json', import.meta.url), 'utf8')),
    );
    if (!read.ok) throw new Error('the example does not read');
    return read.design;
  };
  const withReset = (d: Design, pins: (p: readonly PinState[]) => PinState[]): Design => ({
    ...d,
    scenarios: d.scenarios!.map((s) => (s.id === 'reset' ? { ...s, pins: pins(s.pins ?? []) } : s)),
  });
  it.each<[string, (p: readonly PinState[]) => PinState[]]>([
    ['a pin state taken away', (p) => p.slice(1)],
    ['every pin state taken away', () => []],
    ['a pin state changed', (p) => p.map((x, k) => (k === 0 ? { ...x, role: 'output' as const } : x))],
    ['a pin state added', (p) => [...p, { pin: 'U1.FAULT_N', role: 'output' as const }]],
  ])('%s', (_name, edit) => {
    const before = example();
    const after = withReset(before, edit);
    const incremental = check(after, check(before));
    expect(incremental.stats.incremental).toBe(true);
    expect(comparable(incremental)).toEqual(comparable(check(after)));
    // Only the nets of the pins involved were judged again, in each power state.
    expect(incremental.stats.netsChecked).toBeLessThan(after.nets.length);
  });
});
