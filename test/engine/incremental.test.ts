/**
 * The incremental check equals a full check: random designs, random sequences of edits of
 * every kind, and after every edit the two results deep-equal.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { check } from '../../rules/check/check.ts';
import type { CheckResult } from '../../rules/engine/types.ts';
import { validateDesign } from '../../rules/model/reader.ts';
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
