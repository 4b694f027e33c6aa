/**
 * Running a quick fix the way the editor will: find the finding in the store's result, take
 * the fix `fixesFor` offers, commit it through the store, then undo.
 */
import { expect } from 'vitest';
import { applyFix, fixesFor, newErrors, type QuickFix } from '../../../app/store/commands/fixes/index.ts';
import type { Finding } from '../../../rules/engine/types.ts';
import { validateDesign } from '../../../rules/model/reader.ts';
import type { Design } from '../../../rules/model/schema.ts';
import { harness, type Harness } from '../harness.ts';

/** One row of a fix table: apply `fix` for `finding` on `start`, then look at the design. */
export interface FixCase {
  name: string;
  start: Design;
  finding: string;
  fix: string;
  expect: (d: Design) => void;
}

/** The part, net or pin of a design by id (`PART.PIN` for a pin); the cases know it is there. */
export const partById = (d: Design, id: string) => d.parts.find((p) => p.id === id)!;
export const netOf = (d: Design, id: string) => d.nets.find((n) => n.id === id)!;
export const pinOf = (d: Design, key: string) => {
  const [part, pin] = key.split('.');
  return partById(d, part!).pins.find((x) => x.id === pin)!;
};

export interface Applied {
  readonly h: Harness;
  readonly fix: QuickFix;
  readonly finding: Finding;
  readonly before: readonly Finding[];
  readonly after: readonly Finding[];
  readonly design: Design;
}

/**
 * The finding still stands: an unwaived error or warning with its id, or with its rule, net and
 * pins in another power state. (A pull-up moved into its range keeps the id as an info.)
 */
export function stillStands(findings: readonly Finding[], f: Finding): boolean {
  const sameWhere = (g: Finding) => g.rule === f.rule && g.net === f.net && g.pins.join() === f.pins.join();
  return findings.some((g) => g.waived === undefined && g.severity !== 'info' && (g.id === f.id || sameWhere(g)));
}

/** The ids of the fixes offered for a finding of the design. */
export function offered(design: Design, findingId: string): string[] {
  const h = harness(design);
  const { result } = h.store.getState();
  const finding = result.findings.find((f) => f.id === findingId);
  if (finding === undefined)
    throw new Error(`no finding ${findingId}; have ${result.findings.map((f) => f.id).join(', ')}`);
  return fixesFor(finding, h.design, result).map((x) => x.id);
}

/**
 * Apply fix `fixId` for finding `findingId` through the store, and check what every fix must
 * do: the finding is gone (or waived), no new unwaived error appears anywhere, the result is a
 * design the reader accepts, and one undo gives back the design exactly.
 */
export function applyAndUndo(start: Design, findingId: string, fixId: string, inspect?: (a: Applied) => void): Applied {
  const h = harness(start);
  const original = h.design;
  const copy = structuredClone(original);
  const { result } = h.store.getState();
  const finding = result.findings.find((f) => f.id === findingId);
  if (finding === undefined)
    throw new Error(`no finding ${findingId}; have ${result.findings.map((f) => f.id).join(', ')}`);
  const before = result.findings;
  const fixes = fixesFor(finding, original, result);
  const fix = fixes.find((x) => x.id === fixId);
  if (fix === undefined)
    throw new Error(`no fix ${fixId} for ${findingId}; offered ${fixes.map((x) => x.id).join(', ')}`);

  const outcome = h.apply(applyFix(fix));
  expect(outcome).toEqual({ ok: true, changed: true });
  const after = h.store.getState().result.findings;
  const applied: Applied = { h, fix, finding, before, after, design: h.design };

  expect(stillStands(after, finding), `${findingId} still stands`).toBe(false);
  expect(newErrors(before, after).map((f) => f.id)).toEqual([]);
  const read = validateDesign(structuredClone(h.design));
  expect(read.ok ? [] : read.errors.map((e) => `${e.path}: ${e.message}`)).toEqual([]);
  inspect?.(applied);

  expect(h.undo()).toBe(true);
  expect(h.design).toEqual(copy);
  expect(h.store.getState().result.findings.map((f) => f.id)).toEqual(before.map((f) => f.id));
  return applied;
}
