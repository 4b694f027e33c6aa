/**
 * A fix tried on a copy: the design it would make and its full re-check, with the findings it
 * removes and those it brings. The findings panel shows this before the user applies a fix.
 */
import { produce } from 'immer';
import { check } from '../../../../rules/check/index.ts';
import type { CheckResult, Finding } from '../../../../rules/engine/index.ts';
import type { Design } from '../../../../rules/model/index.ts';
import { isRefusal } from '../command.ts';
import type { QuickFix } from './types.ts';

export interface FixPreview {
  /** The design after the fix; the unchanged design when the fix refused. */
  readonly design: Design;
  readonly result: CheckResult;
  /** Why the fix cannot be applied to this design, if it cannot. */
  readonly refused?: string;
  /** Findings of the current check that the fix removes (or whose severity it changes). */
  readonly gone: readonly Finding[];
  /** Findings the fix brings (new, or with another severity or waiver state than before). */
  readonly added: readonly Finding[];
}

/** A finding as compared before and after: same id, same severity, same waiver state. */
function signature(f: Finding): string {
  return `${f.id}\u0000${f.severity}\u0000${f.waived === undefined ? '' : 'waived'}`;
}

/** The findings of `after` that `before` does not have (by id, severity and waiver state). */
export function findingsAdded(before: readonly Finding[], after: readonly Finding[]): Finding[] {
  const had = new Set(before.map(signature));
  return after.filter((f) => !had.has(signature(f)));
}

/** Unwaived errors of `after` that `before` did not have. */
export function newErrors(before: readonly Finding[], after: readonly Finding[]): Finding[] {
  return findingsAdded(before, after).filter((f) => f.severity === 'error' && f.waived === undefined);
}

/** The design with `recipe` applied, or the refusal. Never touches `design`. */
export function tryOn(design: Design, recipe: QuickFix['apply']): { design: Design; refused?: string } {
  let refused: string | undefined;
  const next = produce(design, (draft) => {
    const out = recipe(draft);
    if (isRefusal(out)) refused = out.refused;
  });
  return refused === undefined ? { design: next } : { design, refused };
}

/**
 * Re-check the design as `fix` would leave it. `before` is the current result; only its findings
 * are read. It is not handed to the engine: a result serves as `previous` once, and the store's
 * next edit should keep its incremental check.
 */
export function previewFix(fix: QuickFix, design: Design, before: CheckResult): FixPreview {
  const tried = tryOn(design, fix.apply);
  const result = check(tried.design);
  return {
    design: tried.design,
    result,
    ...(tried.refused === undefined ? {} : { refused: tried.refused }),
    gone: findingsAdded(result.findings, before.findings),
    added: findingsAdded(before.findings, result.findings),
  };
}
