/**
 * The divider as a quick fix for a one-way push-pull signal from a higher rail into a lower-rail
 * input (design format version 2): R1 from the driver's net to a new net with the inputs, R2 from
 * there to ground. With each resistor at its tolerance ends (t):
 *
 *   k_min = R2(1−t)/(R1(1+t) + R2(1−t)),  k_max = R2(1+t)/(R1(1−t) + R2(1+t))
 *   worst high = VOH,min · k_min − R1‖R2·ΣIIH  against VIH,max   (the formulas, with the
 *   worst low  = VOL,max · k_max + R1‖R2·ΣIIL  against VIL,min    inputs' currents through R1‖R2
 *                                                                 at the same tolerance ends as k)
 *   over-voltage at VDD,drv,max · k_max against the inputs' lowest viMax
 *   10–90 % edge = ln 9 · (R1‖R2) · C, C the new net's wiring and input capacitance
 *
 * the edge's R1‖R2 at both high ends. Values from E24 at ±1 % (IEC 60063), each from 100 Ω to
 * 100 kΩ, R1 + R2 from 1 kΩ to 100 kΩ (input leakage and the edge stay small).
 *
 * The choice, as an engineer would make it: a divider that loads the driver lightly, with an edge
 * fast enough and margins near the best the E24 ratios give. A pair is eligible when
 *
 *   - its worst high and low margins are ≥ 0 and VDD,drv,max · k_max stays within the inputs' limit;
 *   - the driver's VOH is guaranteed at the current the divider draws, VDD,drv,max/(R1 + R2) at
 *     the low ends, and that current is at most DIVIDER_LOAD_SHARE (half) of the driver's rated
 *     current, the largest `voh` test current guaranteed at its rail's lowest (our rule: the rest
 *     is left for the edge's charging current and the guarantee's corner);
 *   - its 10–90 % edge is within the budget: the net's maxRiseTime where set, otherwise
 *     DIVIDER_EDGE_BUDGET (100 ns: a fifth of the 500 ns input rise time a 74HC-class input accepts
 *     at 4.5 V, JESD7's operating conditions from memory, and a tenth of a 1 MHz signal's period);
 *     and for each non-Schmitt input with a maxInputRamp, edge/(0.8 · VDD,drv,min · k_min) within it
 *     (the ramp edge-rate judges).
 *
 * Where no pair within the budget draws as little as half the rating (a tight maxRiseTime), the
 * half is relaxed to the whole rating (the driver's guarantee still holds); the net's maxRiseTime
 * and the inputs' maxInputRamp are never relaxed.
 *
 * A pair's worst margin is the smallest of three: the high margin, the low margin and the
 * over-voltage headroom (the inputs' limit − VDD,drv,max · k_max), so that the ratio stays near
 * the one that balances them rather than drifting to either end of what holds. Of the eligible
 * pairs, those whose worst margin is at least DIVIDER_MARGIN_SHARE (90 %) of the best eligible
 * worst margin are preferred, and among them the largest R1 + R2 (the lightest load);
 * ties go to the better worst margin, then the faster edge. Where the net sets no maxRiseTime and no
 * pair meets the 100 ns default (a heavily loaded net), the default is dropped: near the best worst
 * margin, the fastest edge comes first instead of the largest R1 + R2.
 * The chosen pair is then checked by the engine on a trial copy: a pair whose circuit brings a new
 * error is passed over for the next.
 */
import { check } from '../../../../rules/check/index.ts';
import { highThreshold, lowThreshold } from '../../../../rules/engine/index.ts';
import type { CheckResult, FindingOf, ResolvedPin } from '../../../../rules/engine/index.ts';
import { below, exceeds } from '../../../../rules/levels/index.ts';
import { levelAt } from '../../../../rules/levels/index.ts';
import { largestTestCurrent, outputLevel } from '../../../../rules/levels/index.ts';
import type { Range } from '../../../../rules/levels/index.ts';
import { RISE_10_90 } from '../../../../rules/levels/index.ts';
import { E24, seriesValuesBetween } from '../../../../rules/levels/index.ts';
import { formatQuantity } from '../../../../rules/levels/index.ts';
import { DEFAULT_WIRING_CAPACITANCE, type Design } from '../../../../rules/model/index.ts';
import { findNet, pinAt, rangeOfRail, resolvedPin } from './lookup.ts';
import { driveOf } from '../../../../rules/model/index.ts';
import { newErrors, tryOn } from './preview.ts';
import { applySplit, planSplit } from './split.ts';
import type { FixFigure, QuickFix } from './types.ts';

/** The divider's resistors: ±1 % parts (common practice for dividers), E24 values. */
export const DIVIDER_TOLERANCE = 0.01;
/** The band of R1 + R2, Ω (documented above and on the format page). */
export const DIVIDER_TOTAL = { min: 1e3, max: 100e3 } as const;
/** The range each resistor is taken from, Ω. */
const VALUE_RANGE = { min: 100, max: 100e3 } as const;
/** The largest share of the driver's rated current the divider may draw (header: our rule). */
export const DIVIDER_LOAD_SHARE = 0.5;
/** The edge budget where the net sets no maxRiseTime, s (header: 100 ns). */
export const DIVIDER_EDGE_BUDGET = 100e-9;
/** Pairs whose worst margin is at least this share of the best are preferred (header). */
export const DIVIDER_MARGIN_SHARE = 0.9;
/** Pairs tried on a copy before the fix gives up (each trial is a full check). */
const TRIALS = 5;

/** What the divider's figures need to know of the circuit around it. */
export interface DividerCircuit {
  readonly driver: ResolvedPin;
  readonly driverRail: Range;
  readonly receivers: readonly ResolvedPin[];
  readonly receiverRail: Range;
  /** The new net's capacitance: wiring plus the inputs' cin, F. */
  readonly capacitance: number;
  readonly maxRiseTime?: number;
}

export interface DividerFigures {
  readonly r1: number;
  readonly r2: number;
  readonly tolerance: number;
  readonly kMin: number;
  readonly kMax: number;
  /** R1‖R2 with both at their high ends, Ω. */
  readonly rth: number;
  /** The current the driver sources into the divider at its rail's highest, both at their low ends, A. */
  readonly load: number;
  /** The driver's rated current: its largest `voh` test current guaranteed at its rail's lowest, A. */
  readonly rated?: number;
  /**
   * The longest edge the inputs' maxInputRamp allows, maxInputRamp · 0.8 · VDD,drv,min · k_min
   * (the lowest, over the non-Schmitt inputs that state one), s; undefined without one.
   */
  readonly rampEdge?: number;
  /** Undefined where the driver's rows give no guaranteed level at that load. */
  readonly vohMin?: number;
  readonly volMax?: number;
  readonly high?: { readonly v: number; readonly threshold: number; readonly margin: number };
  readonly low?: { readonly v: number; readonly threshold: number; readonly margin: number };
  /** VDD,drv,max · k_max and the inputs' lowest viMax, V. */
  readonly peak: number;
  readonly limit: number;
  readonly capacitance: number;
  readonly edge: number;
}

const ends = (r: Range) => [r.min, r.max];

/** The divider's figures for one pair: the quantities the header's formulas name. */
export function dividerFigures(c: DividerCircuit, r1: number, r2: number, t = DIVIDER_TOLERANCE): DividerFigures {
  const r1lo = r1 * (1 - t);
  const r1hi = r1 * (1 + t);
  const r2lo = r2 * (1 - t);
  const r2hi = r2 * (1 + t);
  const kMin = r2lo / (r1hi + r2lo);
  const kMax = r2hi / (r1lo + r2hi);
  const rth = (r1hi * r2hi) / (r1hi + r2hi);
  const load = c.driverRail.max / (r1lo + r2lo);
  let iih = 0;
  let iil = 0;
  for (const p of c.receivers) {
    iih += p.params.iih ?? 0;
    iil += p.params.iil ?? 0;
  }
  // The driver's guaranteed levels, worst over its rail's ends; an extrapolated level guarantees nothing.
  let vohMin: number | undefined;
  let volMax: number | undefined;
  let guaranteed = true;
  for (const vdd of ends(c.driverRail)) {
    const h = outputLevel(c.driver.params.voh, load, vdd, 'high');
    const l = outputLevel(c.driver.params.vol, iil, vdd, 'low');
    if (h === undefined || l === undefined || h.estimate || l.estimate) guaranteed = false;
    else {
      vohMin = vohMin === undefined ? h.v : Math.min(vohMin, h.v);
      volMax = volMax === undefined ? l.v : Math.max(volMax, l.v);
    }
  }
  const rated = largestTestCurrent(c.driver.params.voh, c.driverRail.min);
  let rampEdge: number | undefined;
  for (const p of c.receivers) {
    const ramp = p.params.maxInputRamp;
    if (ramp === undefined || p.params.schmitt !== undefined) continue;
    const edge = ramp * 0.8 * c.driverRail.min * kMin;
    rampEdge = rampEdge === undefined ? edge : Math.min(rampEdge, edge);
  }
  let vih = Number.NEGATIVE_INFINITY;
  let vil = Number.POSITIVE_INFINITY;
  let limit = Number.POSITIVE_INFINITY;
  for (const p of c.receivers) {
    const hi = highThreshold(p);
    const lo = lowThreshold(p);
    for (const vdd of ends(c.receiverRail)) {
      if (hi !== undefined) vih = Math.max(vih, levelAt(hi, vdd));
      if (lo !== undefined) vil = Math.min(vil, levelAt(lo, vdd));
      if (p.params.viMax !== undefined) limit = Math.min(limit, levelAt(p.params.viMax, vdd));
    }
  }
  const out: DividerFigures = {
    r1,
    r2,
    tolerance: t,
    kMin,
    kMax,
    rth,
    load,
    ...(rated === undefined ? {} : { rated }),
    ...(rampEdge === undefined ? {} : { rampEdge }),
    peak: c.driverRail.max * kMax,
    limit,
    capacitance: c.capacitance,
    edge: RISE_10_90 * rth * c.capacitance,
  };
  if (!guaranteed || vohMin === undefined || volMax === undefined) return out;
  // The input currents flow through R1‖R2 of the same tolerance case as k.
  const vHigh = vohMin * kMin - ((r1hi * r2lo) / (r1hi + r2lo)) * iih;
  const vLow = volMax * kMax + ((r1lo * r2hi) / (r1lo + r2hi)) * iil;
  return {
    ...out,
    vohMin,
    volMax,
    ...(Number.isFinite(vih) ? { high: { v: vHigh, threshold: vih, margin: vHigh - vih } } : {}),
    ...(Number.isFinite(vil) ? { low: { v: vLow, threshold: vil, margin: vil - vLow } } : {}),
  };
}

/** Whether a pair's figures hold: both margins non-negative, no over-voltage, the edge in time. */
export function dividerHolds(f: DividerFigures, maxRiseTime?: number): boolean {
  if (f.high === undefined || f.low === undefined) return false;
  if (below(f.high.margin, 0) || below(f.low.margin, 0) || !Number.isFinite(f.high.margin + f.low.margin)) return false;
  if (exceeds(f.peak, f.limit)) return false;
  return maxRiseTime === undefined || !exceeds(f.edge, maxRiseTime);
}

/**
 * The worst of the three margins (header): the high and low margins and the over-voltage
 * headroom, the inputs' limit less VDD,drv,max · k_max.
 */
export function worstMargin(f: DividerFigures): number {
  return Math.min(
    f.high?.margin ?? Number.NEGATIVE_INFINITY,
    f.low?.margin ?? Number.NEGATIVE_INFINITY,
    f.limit - f.peak,
  );
}

/** Within DIVIDER_LOAD_SHARE of the driver's rated current (header). */
export function lightLoad(f: DividerFigures): boolean {
  return f.rated !== undefined && !exceeds(f.load, DIVIDER_LOAD_SHARE * f.rated);
}

/** The edge budget of a circuit: its net's maxRiseTime, else the documented default. */
export function edgeBudget(c: DividerCircuit): number {
  return c.maxRiseTime ?? DIVIDER_EDGE_BUDGET;
}

/**
 * Near the best worst margin first, and among those the largest R1 + R2 (`fastest`: the fastest
 * edge); then by worst margin.
 */
function preferred(pairs: DividerFigures[], fastest = false): DividerFigures[] {
  const best = Math.max(...pairs.map(worstMargin));
  const near = (f: DividerFigures) => !below(worstMargin(f), DIVIDER_MARGIN_SHARE * best);
  return pairs.sort(
    (a, b) =>
      Number(near(b)) - Number(near(a)) ||
      (near(a) ? (fastest ? a.edge - b.edge : b.r1 + b.r2 - (a.r1 + a.r2)) : 0) ||
      worstMargin(b) - worstMargin(a) ||
      a.edge - b.edge,
  );
}

/**
 * Every pair that holds (within the net's maxRiseTime and the inputs' maxInputRamp), the
 * preferred first (header): of those drawing at most DIVIDER_LOAD_SHARE of the driver's rating
 * with the edge in budget, near the best worst margin, the largest R1 + R2. Where none draws so
 * little within the budget, the same among all that hold; where none meets the default budget
 * either, near the best worst margin, the fastest edge first.
 */
export function dividerCandidates(c: DividerCircuit, t = DIVIDER_TOLERANCE): DividerFigures[] {
  const values = seriesValuesBetween(E24, VALUE_RANGE.min, VALUE_RANGE.max);
  const pool: DividerFigures[] = [];
  for (const r1 of values)
    for (const r2 of values) {
      const total = r1 + r2;
      if (total < DIVIDER_TOTAL.min || total > DIVIDER_TOTAL.max) continue;
      const f = dividerFigures(c, r1, r2, t);
      if (dividerHolds(f, c.maxRiseTime) && (f.rampEdge === undefined || !exceeds(f.edge, f.rampEdge))) pool.push(f);
    }
  const budget = edgeBudget(c);
  for (const set of [pool.filter(lightLoad), pool]) {
    const within = set.filter((f) => !exceeds(f.edge, budget));
    if (within.length > 0) return [...preferred(within), ...pool.filter((f) => !within.includes(f))];
  }
  return preferred(pool, true);
}

const V = (v: number) => formatQuantity(v, 'V', 4);
const OHM = (r: number) => formatQuantity(r, 'Ω');
const AMP = (i: number) => formatQuantity(i, 'A');

/** The figures the fix shows, in the header's order. */
export function dividerRows(f: DividerFigures, pin: string, maxRiseTime?: number): FixFigure[] {
  const rows: FixFigure[] = [
    { label: `R1 (upper) / R2 (lower to ground), E24 ±${f.tolerance * 100} %`, value: `${OHM(f.r1)} / ${OHM(f.r2)}` },
    { label: 'k = R2/(R1 + R2) at the tolerance ends', value: `${f.kMin.toFixed(4)} … ${f.kMax.toFixed(4)}` },
    {
      label:
        `Driver current, VDD,drv,max/(R1 + R2) at −${f.tolerance * 100} %` +
        (f.rated === undefined
          ? ''
          : ` (at most ${DIVIDER_LOAD_SHARE * 100} % of its rated ${AMP(f.rated)}: ${AMP(DIVIDER_LOAD_SHARE * f.rated)})`),
      value: AMP(f.load),
    },
  ];
  if (f.high !== undefined)
    rows.push({
      label: `Worst high at ${pin}: ${V(f.vohMin!)} · ${f.kMin.toFixed(4)} − R1‖R2·ΣIIH = ${V(f.high.v)} against VIH ${V(f.high.threshold)}`,
      value: V(f.high.margin),
    });
  if (f.low !== undefined)
    rows.push({
      label: `Worst low at ${pin}: ${V(f.volMax!)} · ${f.kMax.toFixed(4)} + R1‖R2·ΣIIL = ${V(f.low.v)} against VIL ${V(f.low.threshold)}`,
      value: V(f.low.margin),
    });
  rows.push(
    { label: `Highest voltage at ${pin}, VDD,drv,max · k_max (its limit ${V(f.limit)})`, value: V(f.peak) },
    {
      label:
        `10–90 % edge, ln 9 · ${OHM(f.rth)} (R1‖R2 at +${f.tolerance * 100} %) · ${formatQuantity(f.capacitance, 'F')}` +
        (maxRiseTime !== undefined
          ? ` (at most ${formatQuantity(maxRiseTime, 's')})`
          : exceeds(f.edge, DIVIDER_EDGE_BUDGET)
            ? ` (no pair meets the default ${formatQuantity(DIVIDER_EDGE_BUDGET, 's')}: the fastest)`
            : ` (at most the default ${formatQuantity(DIVIDER_EDGE_BUDGET, 's')})`),
      value: formatQuantity(f.edge, 's'),
    },
  );
  return rows;
}

/** Why this pair, in the words of the header's rule (which of its branches chose it). */
function choiceWords(f: DividerFigures, c: DividerCircuit): string {
  const load = lightLoad(f)
    ? "at most half the driver's rating"
    : "within the driver's rating (no pair within half meets the edge)";
  if (exceeds(f.edge, edgeBudget(c)))
    return `no pair meets the default ${formatQuantity(DIVIDER_EDGE_BUDGET, 's')} edge, so the fastest whose worst margin is within 90 % of the best, drawing ${load}`;
  const budget =
    c.maxRiseTime === undefined ? `the default ${formatQuantity(DIVIDER_EDGE_BUDGET, 's')}` : "the net's maxRiseTime";
  return `the largest pair (1 kΩ to 100 kΩ in all) whose edge is within ${budget}, drawing ${load}, with its worst margin within 90 % of the best`;
}

/** overvoltage on a net of one push-pull driver and inputs: a divider into the lower rail. */
export function dividerFix(
  design: Design,
  finding: FindingOf<'overvoltage'>,
  result: CheckResult,
): QuickFix | undefined {
  if (finding.net === null) return undefined;
  const net = findNet(design, finding.net);
  if (net === undefined) return undefined;
  // One way only: one push-pull driver, every other pin an input.
  const drivers = net.pins.filter((k) => pinAt(design, k)?.pin.role !== 'input');
  if (drivers.length !== 1 || drivers[0] !== finding.values.source) return undefined;
  const at = pinAt(design, drivers[0]);
  if (at === undefined || driveOf(at.pin) !== 'push-pull') return undefined;
  const planned = planSplit(design, finding, true);
  if (planned === undefined) return undefined;
  const { plan } = planned;
  const driver = resolvedPin(design, plan.source);
  const receivers = plan.moved.map((k) => resolvedPin(design, k));
  const driverRail = rangeOfRail(design, driver?.rail ?? '');
  const receiverRail = rangeOfRail(design, plan.rxRail);
  if (driver === undefined || driverRail === undefined || receiverRail === undefined) return undefined;
  if (receivers.some((p) => p === undefined)) return undefined;
  let capacitance = design.settings?.defaultWiringCapacitance ?? DEFAULT_WIRING_CAPACITANCE;
  for (const p of receivers) capacitance += p!.params.cin ?? 0;
  const circuit: DividerCircuit = {
    driver,
    driverRail,
    receivers: receivers as ResolvedPin[],
    receiverRail,
    capacitance,
    ...(net.maxRiseTime === undefined ? {} : { maxRiseTime: net.maxRiseTime }),
  };
  for (const f of dividerCandidates(circuit).slice(0, TRIALS)) {
    const values = { series: f.r1, shunt: f.r2, tolerance: f.tolerance };
    const trial = tryOn(design, (d) => applySplit(d, plan, values));
    if (trial.refused !== undefined) return undefined;
    if (newErrors(result.findings, check(trial.design).findings).length > 0) continue;
    return {
      id: 'divider',
      finding: finding.id,
      title: `Insert a divider before ${finding.values.pin}`,
      sentence:
        `Moves ${plan.moved.join(', ')} to a net ${plan.rxNet} fed from ${plan.source} through ${plan.series} ${OHM(f.r1)} ` +
        `with ${plan.shunt} ${OHM(f.r2)} to ground (E24, ±${f.tolerance * 100} %): ${choiceWords(f, circuit)}, ` +
        `whose highest output stays within ${finding.values.pin}'s limit.`,
      figures: dividerRows(f, finding.values.pin, net.maxRiseTime),
      apply: (draft) => applySplit(draft, plan, values),
    };
  }
  return undefined;
}
