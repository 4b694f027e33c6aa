/**
 * The series resistor as a quick fix for an over-voltage (design format version 2): a driver on a
 * higher rail that lifts an input above its `viMax` is separated from it by a resistor that holds
 * the input's clamp current within the pin's injection-current limit:
 *
 *   R·(1 − t) ≥ (Vsrc,max − VDD,rx,min)/Iinj,max      (the diode's drop at 0 V, the worst case)
 *
 * rounded up to the next E24 value (IEC 60063; the 5 % series, t = 5 %), so that the resistor's
 * low end still holds the limit. The clamp current, the receiver's margins and the edge time
 * shown with the fix are read from a trial check of the design it would make, so they are the
 * engine's own figures. A pin without an injection limit gets a fix that says what it needs.
 */
import { check } from '../../../../rules/check/index.ts';
import type { CheckResult, FindingOf } from '../../../../rules/engine/index.ts';
import { exceeds } from '../../../../rules/levels/index.ts';
import { levelAt } from '../../../../rules/levels/index.ts';
import { E24, seriesValuesBetween } from '../../../../rules/levels/index.ts';
import { formatQuantity } from '../../../../rules/levels/index.ts';
import type { Design } from '../../../../rules/model/index.ts';
import { refuse } from '../command.ts';
import { rangeOfRail, resolvedPin } from './lookup.ts';
import { tryOn } from './preview.ts';
import { applySplit, planSplit, type SplitPlan } from './split.ts';
import type { FixFigure, QuickFix } from './types.ts';

/** The resistor's tolerance: the 5 % parts of the E24 series (IEC 60063). */
export const SERIES_TOLERANCE = 0.05;

/** The smallest series resistance that holds `injectionMax` at the resistor's low end, rounded up to E24. */
export function seriesOhms(vSource: number, vddRxMin: number, injectionMax: number, tolerance = SERIES_TOLERANCE) {
  const least = (vSource - vddRxMin) / injectionMax;
  if (!(least > 0) || !Number.isFinite(least)) return undefined;
  const need = least / (1 - tolerance);
  const ohms = seriesValuesBetween(E24, need, need * 10)[0];
  return ohms === undefined ? undefined : { least, ohms };
}

/** A figure that the check could not decide is shown as such (—), never as a number. */
const show =
  (unit: string, digits = 3) =>
  (x: number | null) =>
    x === null ? '—' : formatQuantity(x, unit, digits);
const V = show('V', 4);
const A = show('A');
const OHM = show('Ω');
const S = show('s');

/** The engine's figures for the receiver on the new net in the trial check (all rails on). */
export function receiverFigures(result: CheckResult, plan: SplitPlan, pin: string): FixFigure[] {
  const out: FixFigure[] = [];
  const view = result.nets.get('all-on')?.get(plan.rxNet)?.view;
  const clamp = result.findings.find(
    (f): f is FindingOf<'clamp-current'> =>
      f.rule === 'clamp-current' && f.scenario === 'all-on' && f.values.pin === pin,
  );
  if (clamp !== undefined)
    out.push({
      label: `Clamp current into ${pin} (limit ${A(clamp.values.injectionMax)})`,
      value: A(clamp.values.current),
    });
  else out.push({ label: `Clamp current into ${pin}`, value: 'none: its limit is not exceeded' });
  const pair = view?.analysis.pairs.find((p) => p.driver === plan.source && p.receiver === pin);
  if (pair?.high != null)
    out.push({
      label: `High margin at ${pin} (${V(pair.high.out)} against VIH ${V(pair.high.threshold)})`,
      value: V(pair.high.margin),
    });
  if (pair?.low != null)
    out.push({
      label: `Low margin at ${pin} (${V(pair.low.out)} against VIL ${V(pair.low.threshold)})`,
      value: V(pair.low.margin),
    });
  const rail = result.findings.find(
    (f): f is FindingOf<'rail-injection'> =>
      f.rule === 'rail-injection' && f.scenario === 'all-on' && f.values.currents.some((c) => c.pin === pin),
  );
  if (rail !== undefined)
    out.push({
      label:
        rail.values.minLoad === null
          ? `Clamp current into ${rail.values.rail}, which states no minimum load (rail-injection asks for it)`
          : `Clamp current into ${rail.values.rail} (its minimum load ${A(rail.values.minLoad)})`,
      value: A(rail.values.total),
    });
  const edge = view?.pathEdge;
  if (edge !== undefined)
    out.push({
      label: `10–90 % edge, ln 9 · ${OHM(edge.resistance)} · ${formatQuantity(edge.capacitance, 'F')}`,
      value: S(edge.riseTime),
    });
  return out;
}

/** overvoltage by a driver on the pin's own net: a series resistor sized from the injection limit. */
export function seriesResistorFix(design: Design, finding: FindingOf<'overvoltage'>): QuickFix | undefined {
  const planned = planSplit(design, finding, false);
  if (planned === undefined) return undefined;
  const { plan, rxRail } = planned;
  const range = rangeOfRail(design, rxRail);
  if (range === undefined) return undefined;
  const vSource = finding.values.vNet;
  // An undecided over-voltage names no voltage to size from.
  if (vSource === null || !Number.isFinite(vSource)) return undefined;
  // Every moved input that the source lifts above its limit needs a stated injection limit.
  let injection = Number.POSITIVE_INFINITY;
  const unstated: string[] = [];
  for (const key of plan.moved) {
    const p = resolvedPin(design, key);
    if (p?.params.viMax === undefined) continue;
    if (!exceeds(vSource, levelAt(p.params.viMax, range.min))) continue;
    if (p.params.injectionMax === undefined) unstated.push(key);
    else injection = Math.min(injection, p.params.injectionMax);
  }
  const title = `Insert a series resistor before ${finding.values.pin}`;
  if (unstated.length > 0) {
    const need =
      `needs the injection-current limit of ${unstated.join(', ')} (injectionMax, from the datasheet): ` +
      `the resistor is sized R ≥ (${V(vSource)} − ${V(range.min)})/Iinj,max, and a limit is not guessed.`;
    return {
      id: 'series-resistor',
      finding: finding.id,
      title,
      sentence: `A series resistor only limits the clamp current of ${finding.values.pin}; sizing it ${need}`,
      unavailable: `Sizing the resistor ${need}`,
      apply: () => refuse(`Sizing the resistor ${need}`),
    };
  }
  if (!Number.isFinite(injection)) return undefined;
  const sized = seriesOhms(vSource, range.min, injection);
  if (sized === undefined) return undefined;
  const values = { series: sized.ohms, tolerance: SERIES_TOLERANCE };
  const trial = tryOn(design, (d) => applySplit(d, plan, values));
  if (trial.refused !== undefined) return undefined;
  const figures: FixFigure[] = [
    {
      label: `Least resistance, (${V(vSource)} − ${V(range.min)})/${A(injection)}`,
      value: OHM(sized.least),
    },
    {
      label: `Chosen (E24, ±${SERIES_TOLERANCE * 100} %; its low end ${OHM(sized.ohms * (1 - SERIES_TOLERANCE))})`,
      value: OHM(sized.ohms),
    },
    ...receiverFigures(check(trial.design), plan, finding.values.pin),
  ];
  return {
    id: 'series-resistor',
    finding: finding.id,
    title,
    sentence:
      `Moves ${plan.moved.join(', ')} to a net ${plan.rxNet} behind ${plan.series} ${OHM(sized.ohms)} ±${SERIES_TOLERANCE * 100} % from ${plan.source}, ` +
      `the next E24 value whose low end holds the clamp current within ${A(injection)}.`,
    figures,
    apply: (draft) => applySplit(draft, plan, values),
  };
}
