/** Turning rule drafts into findings: ids, waivers, and the report's order. */
import type { Net, Waiver } from '../model/schema.ts';
import { type Names, netLabel } from './names.ts';
import type { Draft, MessageFns, Rule } from './rule.ts';
import { RULE_IDS, type RuleId } from '../model/ruleIds.ts';
import type { Finding, FindingOf, PowerState, Severity, Summary } from './types.ts';
import type { FindingValues } from './values.ts';
import { finiteOrNull, UNDECIDABLE, UNDECIDABLE_HINT, undecidableMessage, undecidablePaths } from './undecidable.ts';

/** A finding's id, built in one place: `rule:PLACE:SCENARIO[:suffix]` (report-format.md, "Finding"). */
export function findingId(rule: string, place: string, state: string, suffix: string | undefined): string {
  return `${rule}:${place}:${state}${suffix === undefined ? '' : `:${suffix}`}`;
}

/**
 * Completes a draft. `place` is where the finding sits when the draft names no `subject`: the
 * net's id, or the pin's key for a pin on no net. A draft that carries a number that is not
 * finite becomes an unwaivable "cannot be guaranteed" error (undecidable.ts), whatever the rule said.
 * A finding on a net is waived by the net's waivers; one on a lone pin by `pinWaivers`, that pin's.
 */
export function completeFinding<M extends MessageFns>(
  rule: Rule<M>,
  draft: Draft<M>,
  state: PowerState,
  net: Net | null,
  place: string = net?.id ?? '',
  names?: Names,
  pinWaivers?: readonly Waiver[],
): Finding {
  const at = net?.id ?? draft.subject ?? place;
  const id = findingId(rule.id, at, state.id, draft.suffix);
  const bad = undecidablePaths(draft.values, draft.data);
  // One object literal per finding, its optional keys last, and no spreads: a check makes tens
  // of thousands of these, and spreads cost a copy each.
  const out: {
    id: string;
    rule: string;
    scenario: string;
    net: string | null;
    place: string;
    suffix?: string;
    pins: readonly string[];
    parts: readonly string[];
    severity: Severity;
    message: string;
    messageId: string;
    values: unknown;
    hint: string;
    waived?: string;
  } =
    bad.length === 0
      ? {
          id,
          rule: rule.id,
          scenario: state.id,
          net: net?.id ?? null,
          place: at,
          pins: draft.pins,
          parts: draft.parts,
          severity: draft.severity,
          message: rule.meta.messages[draft.messageId]!(draft.data),
          messageId: draft.messageId,
          values: draft.values,
          hint: draft.hint ?? rule.meta.hint,
        }
      : {
          id,
          rule: rule.id,
          scenario: state.id,
          net: net?.id ?? null,
          place: at,
          pins: draft.pins,
          parts: draft.parts,
          severity: 'error',
          message: undecidableMessage(
            rule.meta.title,
            undecidableSubject(draft, net, names),
            bad,
            draft.values,
            draft.data,
          ),
          messageId: UNDECIDABLE,
          values: { ...finiteOrNull(draft.values), undecidable: bad },
          hint: UNDECIDABLE_HINT,
        };
  if (draft.suffix !== undefined) out.suffix = draft.suffix;
  // A finding that could not be decided is never waived: a waiver accepts a known risk.
  const waived = bad.length === 0 ? waiverNote(net === null ? pinWaivers : net.waivers, rule.id, state.id) : undefined;
  if (waived !== undefined) out.waived = waived;
  // The one place a finding is made: its rule and values come from one typed rule, which the
  // union of findings by rule cannot see through a generic rule.
  return out as Finding;
}

/** What an undecided finding names in its message: the pin pair or pin, else the net (or the rail). */
function undecidableSubject<M extends MessageFns>(draft: Draft<M>, net: Net | null, names?: Names): string {
  // A rail (rail-range, rail-injection) and a profile (rail-range's suffix) by their labels;
  // a pin key is neither, and stays as it is.
  const label = (s: string | undefined) => (s === undefined || names === undefined ? s : names.profile(names.rail(s)));
  const where = net === null ? [label(draft.subject), label(draft.suffix)] : [draft.suffix ?? `net ${netLabel(net)}`];
  return [...new Set(where.filter((w): w is string => w !== undefined && w !== ''))].join(', ');
}

/** Whether a finding is of `rule`: narrows it, and so its values, to that rule's. */
export function isOfRule<I extends RuleId>(f: Finding, rule: I): f is Extract<Finding, FindingOf<I>> {
  return f.rule === rule;
}

/** A finding's values as its rule's type, for a reader that found it by other means; throws on another rule's. */
export function valuesOf<I extends RuleId>(f: Finding, rule: I): FindingValues<I> {
  if (!isOfRule(f, rule)) throw new Error(`expected a ${rule} finding, found ${f.rule} (${f.id})`);
  return f.values as FindingValues<I>;
}

/**
 * The note of the first waiver (of a net, or of a lone pin) that names this rule in this power
 * state; one without a `scenario` covers every state, those added later included.
 */
function waiverNote(waivers: readonly Waiver[] | undefined, rule: string, state: string): string | undefined {
  if (waivers === undefined) return undefined;
  for (const w of waivers) if (w.rule === rule && (w.scenario === undefined || w.scenario === state)) return w.note;
  return undefined;
}

/**
 * The same finding in another power state: a net (or a lone pin) none of whose rails is off
 * there is judged exactly as in `all-on`, so its findings are re-stamped rather than computed
 * again. Its place and suffix are data, so the id is built again, never cut out of the old one;
 * `net` is the net it is on (null for a lone pin, whose own waivers are `pinWaivers`).
 */
export function restampFinding(
  f: Finding,
  state: PowerState,
  net: Net | null,
  pinWaivers?: readonly Waiver[],
): Finding {
  const out = {
    id: findingId(f.rule, f.place, state.id, f.suffix),
    rule: f.rule,
    scenario: state.id,
    net: f.net,
    place: f.place,
    pins: f.pins,
    parts: f.parts,
    severity: f.severity,
    message: f.message,
    messageId: f.messageId,
    values: f.values,
    hint: f.hint,
  } as { -readonly [K in keyof Finding]: Finding[K] };
  if (f.suffix !== undefined) out.suffix = f.suffix;
  // A finding that could not be decided is never waived: a waiver accepts a known risk.
  const waived =
    f.messageId === UNDECIDABLE ? undefined : waiverNote(net === null ? pinWaivers : net.waivers, f.rule, state.id);
  if (waived !== undefined) out.waived = waived;
  return out as Finding;
}

const ruleOrder = new Map<string, number>(RULE_IDS.map((id, k) => [id, k]));

/** Code-point order of two strings (JS `<` compares UTF-16 units). */
export function compareCodePoints(a: string, b: string): number {
  const ia = a[Symbol.iterator]();
  const ib = b[Symbol.iterator]();
  for (;;) {
    const x = ia.next();
    const y = ib.next();
    if (x.done) return y.done ? 0 : -1;
    if (y.done) return 1;
    const d = x.value.codePointAt(0)! - y.value.codePointAt(0)!;
    if (d !== 0) return d;
  }
}

/**
 * The report's order: power state (`all-on` first, then the file's order), net in the file's
 * order (findings with no net last), rule in the catalogue's order, then id by code point.
 */
export function sortFindings(
  findings: Finding[],
  stateOrder: ReadonlyMap<string, number>,
  netOrder: ReadonlyMap<string, number>,
): Finding[] {
  const netRank = (f: Finding) =>
    f.net === null ? Number.MAX_SAFE_INTEGER : (netOrder.get(f.net) ?? Number.MAX_SAFE_INTEGER - 1);
  return findings.sort(
    (a, b) =>
      (stateOrder.get(a.scenario) ?? 0) - (stateOrder.get(b.scenario) ?? 0) ||
      netRank(a) - netRank(b) ||
      (ruleOrder.get(a.rule) ?? 0) - (ruleOrder.get(b.rule) ?? 0) ||
      compareCodePoints(a.id, b.id),
  );
}

/** Unwaived findings by severity, and the waived ones. */
export function summarize(findings: readonly Finding[]): Summary {
  let error = 0;
  let warning = 0;
  let info = 0;
  let waived = 0;
  for (const f of findings) {
    if (f.waived !== undefined) waived++;
    else if (f.severity === 'error') error++;
    else if (f.severity === 'warning') warning++;
    else info++;
  }
  return { error, warning, info, waived };
}
