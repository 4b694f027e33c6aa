import type { CheckResult, Finding, Severity } from '../../rules/engine/index.ts';
import type { RuleId } from '../../rules/model/index.ts';

/** What a wire shows: the worst unwaived severity of its net in one power state, and the rule that gave it. */
export interface NetStatus {
  readonly severity: Severity | 'clean';
  readonly rule: RuleId | null;
}

export const CLEAN: NetStatus = { severity: 'clean', rule: null };

const RANK: Readonly<Record<Severity, number>> = { error: 3, warning: 2, info: 1 };

/** The worst of some findings, waived ones aside; the first in report order wins a tie. */
export function worstOf(findings: readonly Finding[]): NetStatus {
  let worst: Finding | undefined;
  for (const f of findings) {
    if (f.waived !== undefined) continue;
    if (worst === undefined || RANK[f.severity] > RANK[worst.severity]) worst = f;
  }
  return worst === undefined ? CLEAN : { severity: worst.severity, rule: worst.rule };
}

/**
 * Every net's status in one power state. Statuses equal to the previous map's are reused, so
 * that a wire whose net did not change keeps the same object.
 */
export function netStatuses(
  result: CheckResult,
  stateId: string,
  previous?: ReadonlyMap<string, NetStatus>,
): ReadonlyMap<string, NetStatus> {
  const out = new Map<string, NetStatus>();
  const perNet = result.nets.get(stateId);
  if (perNet === undefined) return out;
  for (const [netId, r] of perNet) {
    const s = worstOf(r.findings);
    const old = previous?.get(netId);
    out.set(netId, old !== undefined && old.severity === s.severity && old.rule === s.rule ? old : s);
  }
  return out;
}
