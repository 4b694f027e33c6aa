/**
 * pull-range: the range of pull-up resistance an open-drain net allows, from the drivers' sink
 * rating (Rmin) and from the rise time and the input-high level (Rmax); whether every pull-up
 * of the net together (its own, the pins' internal ones) lies inside it, each at the worst end
 * of its range; and the value to fit as the net's own pull-up (README, "Pull-up advice").
 */
import { outputLevel, rowsAt } from '../levels/output.ts';
import { levelAt } from '../levels/level.ts';
import { below, exceeds, higherScore } from '../levels/compare.ts';
import { corners, type Corner } from '../levels/rails.ts';
import {
  DEFAULT_RESISTOR_TOLERANCE,
  PRACTICAL_CAP_OFF_BOARD,
  PRACTICAL_CAP_ON_BOARD,
  RISE_GUARD,
  choosePull,
  lowestPowerPull,
  shrinkByTolerance,
} from '../levels/pullAdvice.ts';
import { pullTolerance } from '../model/pullRange.ts';
import { highThreshold } from '../engine/resolve.ts';
import { parallelResistance, pullRails, thevenin, worstCorner } from '../engine/netMath.ts';
import { GROUND } from '../engine/powerStates.ts';
import type { NetView, PinView, PullSource } from '../engine/types.ts';
import { RISE_30_70 } from '../levels/rc.ts';
import { defineRule } from './defineRule.ts';
import { amps, ohms as fmtOhms, seconds, volts } from './format.ts';
import { partsOfPins as partsOf } from '../model/pinKeys.ts';
import type { PullAdviceValues } from '../engine/values.ts';
import type { Names } from '../engine/names.ts';

interface Data {
  net: string;
  /** What is judged: "the 4.7 kΩ pull-up to 3v3", or the pulls together. */
  pulls: string;
  /** "is" for one pull, "are" for several. */
  verb: string;
  ohms: number;
  rMin: number | null;
  rMax: number | null;
  /** Drivers whose rated sink current cannot even carry the other pins' iil. */
  weak: readonly string[];
  advice: string;
}

/** A bound with the corner it was found at. */
interface Bound {
  readonly r: number;
  readonly corner: Record<string, number>;
}

const cornerRecord = (c: Corner): Record<string, number> => Object.fromEntries(c);

/** Σ iil of the pins other than `d`. */
function otherIil(view: NetView, d: PinView): number {
  let sum = 0;
  for (const p of view.pins) if (p !== d) sum += p.params.iil ?? 0;
  return sum;
}

/**
 * Rmin of the pulls together: for each open-drain driver, `(Vpull − VOL) / (IOL,rated − Σ iil
 * of the other pins)` at its largest `vol` test point, the largest over the corners of the
 * pulls' and the driver's rails; the largest over the drivers wins. `weak` lists drivers whose
 * denominator is not positive (no resistor works). Without any `vol` list there is no lower
 * bound (0 Ω).
 */
function minimum(view: NetView, drivers: readonly PinView[], ups: readonly PullSource[]) {
  let best: (Bound & { driver: string }) | undefined;
  const weak: string[] = [];
  for (const d of drivers) {
    const points = d.params.vol;
    const rows = points === undefined ? [] : rowsAt(points, view.rails.ranges.get(d.rail)?.min ?? 0);
    if (points === undefined || rows.length === 0) continue;
    const top = rows[rows.length - 1]!;
    const sumIil = otherIil(view, d);
    if (!exceeds(top.i, sumIil)) {
      weak.push(d.key);
      continue;
    }
    const current = top.i - sumIil;
    // The largest resistance is the worst; worstCorner keeps the lowest score.
    const worst = worstCorner([...pullRails(ups), d.rail], view.rails, (c) => {
      const r = (thevenin(ups, c)!.v - levelAt(top.v, c.get(d.rail) ?? 0)) / current;
      return { score: -r, r, corner: cornerRecord(c) };
    });
    if (worst !== undefined && (best === undefined || higherScore(worst.r, best.r)))
      best = { r: worst.r, corner: worst.corner, driver: d.key };
  }
  return { best, weak };
}

function sumIih(view: NetView): number {
  let sum = 0;
  for (const p of view.pins) sum += p.params.iih ?? 0;
  return sum;
}

/** The largest VIH of the powered receivers at a corner (−∞ when none has one). */
function highestVih(judged: readonly PinView[], c: Corner): number {
  let vih = -Infinity;
  for (const r of judged) vih = Math.max(vih, levelAt(highThreshold(r)!, c.get(r.rail) ?? 0));
  return vih;
}

/**
 * Rmax from the level: `(Vpull − VIH − minMargin) / Σ iih` over all pins, VIH the largest of the
 * powered receivers at the corner, the smallest over the corners of the pulls' and the
 * receivers' rails. Undefined when Σ iih is 0 or no receiver has a VIH.
 */
function levelMaximum(view: NetView, ups: readonly PullSource[]): Bound | undefined {
  const judged = view.receivers.filter((r) => highThreshold(r) !== undefined);
  const iih = sumIih(view);
  // Only a sum that is 0 means no bound; one that is not a number goes on and fails the check.
  if (iih <= 0 || judged.length === 0) return undefined;
  return worstCorner([...pullRails(ups), ...judged.map((r) => r.rail)], view.rails, (c) => {
    const r = (thevenin(ups, c)!.v - highestVih(judged, c) - view.settings.minMargin) / iih;
    return { score: r, r, corner: cornerRecord(c) };
  });
}

/** `1/(1/bound − g)`: the resistance that, beside conductance `g`, gives `bound` together; ∞ when `g` alone reaches it. */
function beside(bound: number, g: number): number {
  const left = 1 / bound - g;
  return left > 0 ? 1 / left : Infinity;
}

/** What the suggested pull gives, each at the worst end of every pull's range and the worst corner. */
interface Outcome {
  readonly rise: number | null;
  readonly high: number | null;
  readonly low: number | null;
  readonly sink: number | null;
}

function outcome(view: NetView, drivers: readonly PinView[], ups: readonly PullSource[]): Outcome {
  const rWeak = parallelResistance(ups, 'max')!;
  const rise = view.capacitance > 0 ? RISE_30_70 * rWeak * view.capacitance : null;
  const iih = sumIih(view);
  let high: number | null = null;
  for (const c of corners(pullRails(ups), view.rails.ranges)) {
    const th = thevenin(ups, c, 'max')!;
    const v = th.v - th.r * iih;
    if (high === null || v < high) high = v;
  }
  let low: number | null = null;
  let sink: number | null = null;
  for (const d of drivers) {
    const points = d.params.vol;
    const rows = points === undefined ? [] : rowsAt(points, view.rails.ranges.get(d.rail)?.min ?? 0);
    if (points === undefined || rows.length === 0) continue;
    const top = rows[rows.length - 1]!;
    for (const c of corners([...pullRails(ups), d.rail], view.rails.ranges)) {
      const vdd = c.get(d.rail) ?? 0;
      const th = thevenin(ups, c, 'min')!;
      const i = Math.max(0, (th.v - levelAt(top.v, vdd)) / th.r) + otherIil(view, d);
      const v = outputLevel(points, i, vdd, 'low')!.v;
      if (sink === null || i > sink) sink = i;
      if (low === null || v > low) low = v;
    }
  }
  return { rise, high, low, sink };
}

/** The pulls judged, in words: the net's own alone as before, or every one with their parallel value. */
function describePulls(ups: readonly PullSource[], together: number, names: Names): string {
  const one = ups[0]!;
  const to = names.rail(one.to);
  // A resistor part (version 2) is an external pull-up, named by its designator.
  if (ups.length === 1) {
    return one.origin === 'net'
      ? `The ${fmtOhms(one.ohms)} pull-up to ${to}`
      : one.resistor === true
        ? `The ${fmtOhms(one.ohms)} pull-up ${one.origin} to ${to}`
        : `The ${fmtOhms(one.ohms)} pull-up inside ${one.origin}`;
  }
  const parts = ups.map((p) =>
    p.origin === 'net'
      ? `${fmtOhms(p.ohms)} of the net`
      : p.resistor === true
        ? `${fmtOhms(p.ohms)} of ${p.origin}`
        : `${fmtOhms(p.ohms)} inside ${p.origin}`,
  );
  return `The pull-ups (${parts.join(', ')}; ${fmtOhms(together)} together)`;
}

const emptyHint =
  "Lower the net's capacitance (shorter wiring, fewer loads), allow a slower rise time, split the net with a " +
  'buffer, use drivers rated for more sink current, or use receivers with lower thresholds.';

function range(d: Data): string {
  return d.rMax === null ? `${fmtOhms(d.rMin ?? 0)} and above` : `${fmtOhms(d.rMin ?? 0)}–${fmtOhms(d.rMax)}`;
}

interface Advice {
  readonly text: string;
  readonly values: PullAdviceValues;
}

/**
 * The value to fit as the net's own pull-up (to its rail, or to the internal pulls' rail when
 * the net has none): the range the others leave for it, with the advice's rise-time guard,
 * shrunk by its tolerance, capped where only leakage bounds it; the E12 value nearest the
 * middle, and the largest E24 value as the lowest-power alternative.
 */
function advise(
  view: NetView,
  drivers: readonly PinView[],
  ups: readonly PullSource[],
  rMin: number,
  level: Bound | undefined,
  rise: number | undefined,
): Advice {
  const own = ups.find((p) => p.origin === 'net');
  const others = ups.filter((p) => p !== own);
  const to = own?.to ?? ups[0]!.to;
  let gStrong = 0;
  let gWeak = 0;
  for (const p of others) {
    gStrong += 1 / p.min;
    gWeak += 1 / p.max;
  }
  const guarded = rise === undefined ? undefined : RISE_GUARD * rise;
  const byRise = guarded !== undefined && (level === undefined || guarded < level.r);
  const effMax = byRise ? guarded : level?.r;
  const lo = rMin > 0 ? beside(rMin, gStrong) : 0;
  const hi = effMax === undefined ? Infinity : beside(effMax, gWeak);
  // The net's pull as written (its view always carries both ends): 5 % unless it gives a range.
  const tolerance =
    own === undefined || view.net.pull === undefined
      ? DEFAULT_RESISTOR_TOLERANCE
      : pullTolerance(view.net.pull, DEFAULT_RESISTOR_TOLERANCE);
  const shrunk = shrinkByTolerance(lo, hi, tolerance);
  const offBoard = view.pins.some((p) => p.profileId === 'off-board');
  const cap = offBoard ? PRACTICAL_CAP_OFF_BOARD : PRACTICAL_CAP_ON_BOARD;
  // A bound from the rise time is the net's own; a leakage bound (or none) says little about noise.
  const capped = !(byRise && Number.isFinite(hi)) && cap >= shrunk.lo && cap < shrunk.hi;
  const top = capped ? cap : shrunk.hi;
  const othersTooStrong = lo === Infinity;
  // Without a sink rating there is no lower bound, and the middle of [0, Rmax] means nothing.
  const choice =
    othersTooStrong || !(shrunk.lo > 0) || !(shrunk.lo <= top)
      ? { suggested: null, series: null }
      : choosePull(shrunk.lo, top);
  const lowestPower = othersTooStrong || !Number.isFinite(shrunk.hi) ? null : lowestPowerPull(shrunk.lo, shrunk.hi);
  const s = choice.suggested;
  const result: Outcome =
    s === null
      ? { rise: null, high: null, low: null, sink: null }
      : outcome(view, drivers, [
          ...others,
          { ohms: s, min: s * (1 - tolerance), max: s * (1 + tolerance), to, origin: 'net' },
        ]);
  const values = {
    suggested: s,
    suggestedSeries: choice.series,
    lowestPower,
    adviceTo: to,
    adviceMin: Number.isFinite(shrunk.lo) ? shrunk.lo : null,
    adviceMax: Number.isFinite(top) ? top : null,
    adviceTolerance: tolerance,
    adviceCap: capped ? cap : null,
    riseGuard: byRise ? RISE_GUARD : null,
    othersOhms: others.length === 0 ? null : parallelResistance(others)!,
    suggestedRise: result.rise,
    suggestedHigh: result.high,
    suggestedLow: result.low,
    suggestedSink: result.sink,
  };
  return { text: adviceText(values, view.names.rail(to), othersTooStrong, own !== undefined), values };
}

function adviceText(
  v: {
    suggested: number | null;
    suggestedSeries: string | null;
    lowestPower: number | null;
    adviceMin: number | null;
    adviceMax: number | null;
    adviceTolerance: number;
    adviceCap: number | null;
    riseGuard: number | null;
    othersOhms: number | null;
    suggestedRise: number | null;
    suggestedHigh: number | null;
    suggestedLow: number | null;
    suggestedSink: number | null;
  },
  to: string,
  othersTooStrong: boolean,
  hasOwn: boolean,
): string {
  if (othersTooStrong) {
    return (
      ` The pins' internal pull-ups alone (${fmtOhms(v.othersOhms!)}) already pull harder than the drivers can sink: ` +
      `disable or remove some of them${hasOwn ? " and the net's own pull-up" : ''}.`
    );
  }
  if (v.suggested === null && v.adviceMin === 0)
    return ' No driver gives a rated sink current (vol), so the range has no lower end to advise from.';
  if (v.suggested === null) return " No standard value fits the range left after the resistor's tolerance.";
  const which = hasOwn ? "For the net's own pull-up" : `For a pull-up of the net's own to ${to}`;
  const span = `${fmtOhms(v.adviceMin ?? 0)}–${v.adviceMax === null ? '∞' : fmtOhms(v.adviceMax)}`;
  const how = [
    `within ±${Math.round(v.adviceTolerance * 1000) / 10} % tolerance`,
    ...(v.riseGuard === null ? [] : [`rise-time bound at ${v.riseGuard} × maxRiseTime`]),
    ...(v.othersOhms === null ? [] : [`beside the pins' own ${fmtOhms(v.othersOhms)}`]),
  ].join(', ');
  const gives = [
    ...(v.suggestedRise === null ? [] : [`rise ${seconds(v.suggestedRise)}`]),
    ...(v.suggestedHigh === null ? [] : [`high ${volts(v.suggestedHigh)}`]),
    ...(v.suggestedLow === null ? [] : [`low ${volts(v.suggestedLow)}`]),
    ...(v.suggestedSink === null ? [] : [`sink ${amps(v.suggestedSink)}`]),
  ].join(', ');
  const cap =
    v.adviceCap === null
      ? ''
      : ` Only leakage bounds it from above, so it is capped at ${fmtOhms(v.adviceCap)}, a practical value; a rise-time limit on the net would sharpen it.`;
  const alt =
    v.lowestPower === null || v.lowestPower === v.suggested
      ? ''
      : ` Largest value inside (lowest power): ${fmtOhms(v.lowestPower)}.`;
  return (
    ` ${which}: ${fmtOhms(v.suggested)} (${v.suggestedSeries} nearest the middle of ${span}, ${how})` +
    `${gives === '' ? '' : `, worst case ${gives}`}.${cap}${alt}`
  );
}

export default defineRule({
  id: 'pull-range',
  meta: {
    title: 'Open-drain pull-ups are sized',
    severity: {
      error: 'when the pull-ups are outside their range or no value fits',
      info: 'with the range and the advice when inside',
    },
    explanation:
      'A net whose open-drain drivers release it high is judged by all its pull-ups to powered rails together, ' +
      "the net's own and the pins' internal ones in parallel, each at the worst end of its range (the largest " +
      'for the rise time and the high level, the smallest for the sink current). Together they must be small ' +
      "enough to charge the net's capacitance within its maximum rise time (30–70 %, ln(7/3)·RC) and to hold " +
      "the net above every receiver's VIH plus the wanted margin against all input currents, yet large enough " +
      "that each driver, at its largest rated sink current less the other pins' low-level currents, still pulls " +
      'the net down to its rated VOL. Each bound is taken at the worst ends of the rails involved. The advice ' +
      "is for the net's own pull-up, beside the pins' internal ones: the range they leave, with the rise-time " +
      "bound at 0.7 × maxRiseTime (a capacitance guard), shrunk by the resistor's tolerance (5 % unless the " +
      'pull gives one) to [Rmin/(1−t), Rmax/(1+t)]; where only leakage bounds it from above, capped at 10 kΩ ' +
      'on a net with an off-board pin and at 47 kΩ on board; the IEC 60063 E12 value nearest the geometric mean ' +
      'of that range (E24 when no E12 value fits), with its worst rise time, high level, low level and sink ' +
      'current, and the largest E24 value inside as the lowest-power alternative.',
    hint:
      'Fit the suggested value: it sits in the middle of the range, where tolerance and stray capacitance do ' +
      'not push the net out of its limits.',
    messages: {
      noRange: (d: Data) =>
        d.rMin === null
          ? `No pull-up works on net ${d.net}: ${d.weak.join(', ')} cannot sink the other pins' low-level current at its rated VOL.`
          : d.rMax !== null && d.rMax <= 0
            ? `No pull-up works on net ${d.net}: its pull-up rail is below the receivers' VIH plus the wanted margin.`
            : `No pull-up works on net ${d.net}: it must be at least ${fmtOhms(d.rMin)} but at most ${fmtOhms(d.rMax ?? 0)}.`,
      tooSmall: (d: Data) =>
        `${d.pulls} on net ${d.net} can be below ${fmtOhms(d.rMin ?? 0)}, the least its drivers can pull down to VOL (range ${range(d)}).${d.advice}`,
      tooLarge: (d: Data) =>
        `${d.pulls} on net ${d.net} can be above ${fmtOhms(d.rMax ?? 0)}, the most that rise time and input-high level allow (range ${range(d)}).${d.advice}`,
      inRange: (d: Data) =>
        `${d.pulls} on net ${d.net} ${d.verb} inside ${d.verb === 'is' ? 'its' : 'their'} range, ${range(d)}.${d.advice}`,
    },
  },
  checkNet(view, report) {
    const drivers = view.drivers.filter((d) => d.drive === 'open-drain');
    if (drivers.length === 0) return;
    // Pulls to powered rails hold the net high; one to ground or to an off rail is not a pull-up.
    const ups = view.pulls.filter((p) => p.to !== GROUND && !view.rails.off.has(p.to) && view.rails.ranges.has(p.to));
    if (ups.length === 0) return;

    const { best, weak } = minimum(view, drivers, ups);
    // A bound below 0 Ω (Vpull under VOL, or under VIH + minMargin) means the same as 0 Ω.
    const rMin = weak.length > 0 ? null : Math.max(0, best?.r ?? 0);
    const level = levelMaximum(view, ups);
    const maxRise = view.net.maxRiseTime;
    const rise = maxRise === undefined || view.capacitance <= 0 ? undefined : maxRise / (RISE_30_70 * view.capacitance);
    // A bound that is not a number is kept (and fails the check) rather than losing to the other.
    const byLevel = level !== undefined && (rise === undefined || !higherScore(level.r, rise));
    const rMaxRaw = byLevel ? level!.r : rise;
    const rMax = rMaxRaw === undefined ? null : Math.max(0, rMaxRaw);
    const empty = rMin === null || (rMax !== null && (!exceeds(rMax, 0) || exceeds(rMin, rMax)));

    const together = parallelResistance(ups)!;
    const strongest = parallelResistance(ups, 'min')!;
    const weakest = parallelResistance(ups, 'max')!;
    const advice = empty ? undefined : advise(view, drivers, ups, rMin!, level, rise);
    const messageId = empty
      ? 'noRange'
      : below(strongest, rMin!)
        ? 'tooSmall'
        : rMax !== null && exceeds(weakest, rMax)
          ? 'tooLarge'
          : 'inRange';
    const keys = drivers.map((d) => d.key);
    report({
      messageId,
      data: {
        net: view.names.net(view.net.id),
        pulls: describePulls(ups, together, view.names),
        verb: ups.length === 1 ? 'is' : 'are',
        ohms: together,
        rMin,
        rMax,
        weak,
        advice: advice?.text ?? '',
      },
      severity: messageId === 'inRange' ? 'info' : 'error',
      pins: keys,
      parts: partsOf(...keys),
      values: {
        ohms: together,
        ohmsMin: strongest,
        ohmsMax: weakest,
        rMin,
        rMax,
        empty,
        ...(advice?.values ?? { suggested: null, lowestPower: null }),
        rMinDriver: weak[0] ?? best?.driver ?? null,
        rMinCorner: best?.corner ?? null,
        rMaxBy: rMax === null ? null : byLevel ? 'level' : 'rise-time',
        rMaxCorner: byLevel ? level!.corner : null,
        capacitance: view.capacitance,
      },
      ...(messageId === 'inRange'
        ? { hint: 'Nothing must change; the suggested value leaves the most room for tolerance and stray capacitance.' }
        : {}),
      ...(empty ? { hint: emptyHint } : {}),
    });
  },
});
