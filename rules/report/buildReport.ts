/**
 * The report object (report-format.md) built from a design and the engine's result. Pure: the
 * caller supplies the time, so that a report can be reproduced byte for byte.
 */
import { interfacePowerRows } from './interfacePower.ts';
import type { Design } from '../model/schema.ts';
import { crossingRails } from '../engine/paths.ts';
import type { CheckResult, Finding, PowerState, Severity } from '../engine/types.ts';
import { summarize } from '../engine/findings.ts';
import { resolveProfile } from '../profiles/index.ts';
import { profileIdOf } from '../model/pinDefaults.ts';
import { labelOr, netLabel } from '../engine/names.ts';
import { effectiveSettings } from '../engine/powerStates.ts';
import { CAUTIONS } from './cautions.ts';
import type { Crossing, FailOn, Report, ReportFinding } from './reportSchema.ts';
import { REPORT_FORMAT_ID, REPORT_FORMAT_VERSION } from './reportSchema.ts';
import { TOOL_NAME } from './version.ts';

/** Options of {@link buildReport}. */
export interface ReportOptions {
  /** The least severity that fails the check (recorded in `settings.failOn`). */
  readonly failOn: FailOn;
  /** ISO 8601 time of the report, e.g. from `SOURCE_DATE_EPOCH`. */
  readonly generatedAt: string;
  /** Report this power state alone (`all-on` or a scenario id). */
  readonly scenario?: string;
}

/** The finding as a report carries it: the engine's message id is internal. */
function reportFinding(f: Finding): ReportFinding {
  return {
    id: f.id,
    rule: f.rule,
    severity: f.severity,
    scenario: f.scenario,
    net: f.net,
    pins: [...f.pins],
    parts: [...f.parts],
    message: f.message,
    values: { ...f.values },
    hint: f.hint,
    ...(f.waived === undefined ? {} : { waived: f.waived }),
  };
}

const RANK: Readonly<Record<Severity, number>> = { info: 0, warning: 1, error: 2 };

/** The most severe unwaived finding among these, info counting as ok. */
function worstOf(findings: readonly Finding[]): Crossing['worst'] {
  let worst = 0;
  for (const f of findings) if (f.waived === undefined) worst = Math.max(worst, RANK[f.severity]);
  return worst === 2 ? 'error' : worst === 1 ? 'warning' : 'ok';
}

/**
 * One row per net joining pins of different rails, per power state, in state then the design's
 * net order (an incremental result's tables are not in file order).
 */
export function crossingRows(result: CheckResult, states: readonly PowerState[] = result.states): Crossing[] {
  const rows: Crossing[] = [];
  for (const state of states) {
    const perNet = result.nets.get(state.id);
    if (perNet === undefined) continue;
    for (const design of result.design.nets) {
      const r = perNet.get(design.id);
      if (r === undefined) continue;
      const { net, view, findings } = r;
      const rails = crossingRails(view);
      if (rails === undefined) continue;
      const { worstHigh, worstLow } = view.analysis;
      // A margin that is not a finite number is written null (JSON has no NaN or ∞) and the row
      // is an error whatever the findings say: the net could not be judged.
      const undecided =
        (worstHigh !== null && !Number.isFinite(worstHigh)) || (worstLow !== null && !Number.isFinite(worstLow));
      rows.push({
        net: net.id,
        label: net.label ?? net.id,
        rails: [...rails],
        scenario: state.id,
        marginHigh: worstHigh !== null && Number.isFinite(worstHigh) ? worstHigh : null,
        marginLow: worstLow !== null && Number.isFinite(worstLow) ? worstLow : null,
        worst: undecided ? 'error' : worstOf(findings),
      });
    }
  }
  return rows;
}

/**
 * The profiles the design uses, by each pin's effective profile (the pin's own, else its
 * part's), in order of first use; a part without pins counts its own profile.
 */
function usedProfiles(design: Design): Report['profiles'] {
  const ids: string[] = [];
  const use = (id: string) => {
    if (!ids.includes(id)) ids.push(id);
  };
  for (const part of design.parts) {
    if (part.pins.length === 0) use(part.profile);
    for (const pin of part.pins) use(profileIdOf(part, pin));
  }
  return ids.flatMap((id) => {
    const p = resolveProfile(design, id);
    return p === undefined ? [] : [{ id: p.id, label: p.label, source: p.source }];
  });
}

/** Labels by id: every rail, and the nets whose label differs from their id (most do not). */
function reportNames(design: Design): NonNullable<Report['names']> {
  const nets: Record<string, string> = {};
  for (const n of design.nets) {
    const label = netLabel(n);
    if (label !== n.id) nets[n.id] = label;
  }
  const rails: Record<string, string> = {};
  for (const r of design.rails) rails[r.id] = labelOr(r.label, r.id);
  return { nets, rails };
}

/** The power states of a result, or the one a `scenario` option names. Undefined when it names none. */
export function selectStates(result: CheckResult, scenario?: string): readonly PowerState[] | undefined {
  if (scenario === undefined) return result.states;
  const state = result.states.find((s) => s.id === scenario);
  return state === undefined ? undefined : [state];
}

/**
 * Builds the report of a check. `result` must be `check(design)`'s (with any setting the
 * caller overrides already applied to `design`). With `scenario`, findings, scenarios,
 * crossings and summary cover that power state alone.
 *
 * @throws RangeError when `scenario` is not a power state of the result: callers check
 * user input first (the command line refuses it with exit status 2).
 */
export function buildReport(design: Design, result: CheckResult, options: ReportOptions): Report {
  const states = selectStates(result, options.scenario);
  if (states === undefined) {
    throw new RangeError(`no power state "${options.scenario}": expected all-on or a scenario id of the design`);
  }
  const ids = new Set(states.map((s) => s.id));
  const findings = result.findings.filter((f) => ids.has(f.scenario));
  const settings = effectiveSettings(design);
  return {
    format: REPORT_FORMAT_ID,
    version: REPORT_FORMAT_VERSION,
    tool: TOOL_NAME,
    generatedAt: options.generatedAt,
    design: { title: design.title, parts: design.parts.length, nets: design.nets.length, rails: design.rails.length },
    settings: {
      minMargin: settings.minMargin,
      defaultWiringCapacitance: settings.defaultWiringCapacitance,
      failOn: options.failOn,
    },
    scenarios: states.map((s) => ({ id: s.id, label: s.label, off: [...s.off] })),
    summary: summarize(findings),
    findings: findings.map(reportFinding),
    crossings: crossingRows(result, states),
    interfacePower: interfacePowerRows(findings).map((r) => ({ ...r, pins: [...r.pins] })),
    profiles: usedProfiles(design),
    cautions: [...CAUTIONS],
    names: reportNames(design),
  };
}
