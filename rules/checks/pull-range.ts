/**
 * pull-range: the range of pull-up resistance an open-drain net allows, from the drivers' sink
 * rating (Rmin) and from the rise time and the input-high level (Rmax), and whether the net's
 * own pull lies inside it (rules-catalogue.md).
 */
import { sortedPoints } from '../levels/output.ts';
import { levelAt } from '../levels/level.ts';
import { below, exceeds, higherScore } from '../levels/compare.ts';
import { E24, largestInRange } from '../levels/series.ts';
import type { Corner } from '../levels/rails.ts';
import { highThreshold } from '../engine/resolve.ts';
import { worstCorner } from '../engine/netMath.ts';
import { GROUND } from '../engine/powerStates.ts';
import type { NetView, PinView } from '../engine/types.ts';
import { RISE_30_70 } from '../levels/rc.ts';
import { defineRule } from './defineRule.ts';
import { ohms as fmtOhms } from './format.ts';
import { partsOfPins as partsOf } from '../model/pinKeys.ts';


interface Data {
  net: string;
  ohms: number;
  rail: string;
  rMin: number | null;
  rMax: number | null;
  suggested: number | null;
  /** Drivers whose rated sink current cannot even carry the other pins' iil. */
  weak: readonly string[];
}

/** A bound with the corner it was found at. */
interface Bound {
  readonly r: number;
  readonly corner: Record<string, number>;
}

const cornerRecord = (c: Corner): Record<string, number> => Object.fromEntries(c);

/**
 * Rmin: for each open-drain driver, `(Vpull − VOL) / (IOL,rated − Σ iil of the other pins)` at
 * its largest `vol` test point, the largest over the corners of the pull's and the driver's
 * rails; the largest over the drivers wins. `weak` lists drivers whose denominator is not
 * positive (no resistor works). Without any `vol` list there is no lower bound (0 Ω).
 */
function minimum(view: NetView, drivers: readonly PinView[], pullRail: string) {
  let best: (Bound & { driver: string }) | undefined;
  const weak: string[] = [];
  for (const d of drivers) {
    const points = d.params.vol;
    if (points === undefined || points.length === 0) continue;
    const top = sortedPoints(points)[points.length - 1]!;
    let sumIil = 0;
    for (const p of view.pins) if (p !== d) sumIil += p.params.iil ?? 0;
    if (!exceeds(top.i, sumIil)) {
      weak.push(d.key);
      continue;
    }
    const current = top.i - sumIil;
    // The largest resistance is the worst; worstCorner keeps the lowest score.
    const worst = worstCorner([pullRail, d.rail], view.rails, (c) => {
      const r = ((c.get(pullRail) ?? 0) - levelAt(top.v, c.get(d.rail) ?? 0)) / current;
      return { score: -r, r, corner: cornerRecord(c) };
    });
    if (worst !== undefined && (best === undefined || higherScore(worst.r, best.r))) best = { r: worst.r, corner: worst.corner, driver: d.key };
  }
  return { best, weak };
}

/**
 * Rmax from the level: `(Vpull − VIH − minMargin) / Σ iih` over all pins, VIH the largest of the
 * powered receivers at the corner, the smallest over the corners of the pull's and the
 * receivers' rails. Undefined when Σ iih is 0 or no receiver has a VIH.
 */
function levelMaximum(view: NetView, pullRail: string): Bound | undefined {
  let sumIih = 0;
  for (const p of view.pins) sumIih += p.params.iih ?? 0;
  const judged = view.receivers.filter((r) => highThreshold(r) !== undefined);
  if (sumIih <= 0 || judged.length === 0) return undefined;
  const railIds = [pullRail, ...judged.map((r) => r.rail)];
  return worstCorner(railIds, view.rails, (c) => {
    let vih = -Infinity;
    for (const r of judged) vih = Math.max(vih, levelAt(highThreshold(r)!, c.get(r.rail) ?? 0));
    const r = ((c.get(pullRail) ?? 0) - vih - view.settings.minMargin) / sumIih;
    return { score: r, r, corner: cornerRecord(c) };
  });
}

const emptyHint =
  'Lower the net\'s capacitance (shorter wiring, fewer loads), allow a slower rise time, split the net with a ' +
  'buffer, use drivers rated for more sink current, or use receivers with lower thresholds.';

function range(d: Data): string {
  return d.rMax === null ? `${fmtOhms(d.rMin ?? 0)} and above` : `${fmtOhms(d.rMin ?? 0)}–${fmtOhms(d.rMax)}`;
}

function suggestion(d: Data): string {
  if (d.suggested !== null) return `; largest E24 value inside: ${fmtOhms(d.suggested)}`;
  return d.rMax === null ? '' : '; no E24 value lies inside';
}

export default defineRule({
  id: 'pull-range',
  meta: {
    title: 'Open-drain pull-ups are sized',
    severity: { error: 'when the pull-up is outside its range or no value fits', info: 'with the range when inside' },
    explanation:
      'A pull-up on an open-drain net must be small enough to charge the net\'s capacitance within its ' +
      'maximum rise time (30–70 %, ln(7/3)·RC) and to hold the net above every receiver\'s VIH plus ' +
      'the wanted margin against all input currents, yet large enough that each driver, at its largest ' +
      'rated sink current less the other pins\' low-level currents, still pulls the net down to its ' +
      'rated VOL. Each bound is taken at the worst ends of the rails involved. Only the net\'s own ' +
      'resistor (its pull, else a resistor part from the net to a rail) is sized here; internal pulls of ' +
      'pins are not part of the range.',
    hint:
      'Choose a pull-up inside the range; the largest standard value inside draws the least current.',
    messages: {
      noRange: (d: Data) =>
        d.rMin === null
          ? `No pull-up works on net ${d.net}: ${d.weak.join(', ')} cannot sink the other pins' low-level current at its rated VOL.`
          : d.rMax !== null && d.rMax <= 0
            ? `No pull-up works on net ${d.net}: ${d.rail} itself is below the receivers' VIH plus the wanted margin.`
            : `No pull-up works on net ${d.net}: it must be at least ${fmtOhms(d.rMin)} but at most ${fmtOhms(d.rMax ?? 0)}.`,
      tooSmall: (d: Data) =>
        `The ${fmtOhms(d.ohms)} pull-up to ${d.rail} on net ${d.net} is below ${fmtOhms(d.rMin ?? 0)}, the least its drivers can pull down to VOL (range ${range(d)}${suggestion(d)}).`,
      tooLarge: (d: Data) =>
        `The ${fmtOhms(d.ohms)} pull-up to ${d.rail} on net ${d.net} is above ${fmtOhms(d.rMax ?? 0)}, the most that rise time and input-high level allow (range ${range(d)}${suggestion(d)}).`,
      inRange: (d: Data) =>
        `The ${fmtOhms(d.ohms)} pull-up to ${d.rail} on net ${d.net} is inside its range, ${range(d)}${suggestion(d)}.`,
    },
  },
  checkNet(view, report) {
    // The net's own resistor: its `pull`, else a resistor part from the net to a rail.
    const pull = view.net.pull ?? view.pulls.find((p) => p.resistor === true && p.to !== GROUND);
    if (pull === undefined || pull.to === GROUND || view.rails.off.has(pull.to) || !view.rails.ranges.has(pull.to)) return;
    const drivers = view.drivers.filter((d) => d.drive === 'open-drain');
    if (drivers.length === 0) return;

    const { best, weak } = minimum(view, drivers, pull.to);
    // A bound below 0 Ω (Vpull under VOL, or under VIH + minMargin) means the same as 0 Ω.
    const rMin = weak.length > 0 ? null : Math.max(0, best?.r ?? 0);
    const level = levelMaximum(view, pull.to);
    const maxRise = view.net.maxRiseTime;
    const rise = maxRise === undefined || view.capacitance <= 0 ? undefined : maxRise / (RISE_30_70 * view.capacitance);
    // A bound that is not a number is kept (and fails the check) rather than losing to the other.
    const byLevel = level !== undefined && (rise === undefined || !higherScore(level.r, rise));
    const rMaxRaw = byLevel ? level!.r : rise;
    const rMax = rMaxRaw === undefined ? null : Math.max(0, rMaxRaw);
    const empty = rMin === null || (rMax !== null && (!exceeds(rMax, 0) || exceeds(rMin, rMax)));
    const suggested = empty || rMax === null ? null : largestInRange(E24, rMin!, rMax);

    const messageId = empty ? 'noRange'
      : below(pull.ohms, rMin!) ? 'tooSmall'
        : rMax !== null && exceeds(pull.ohms, rMax) ? 'tooLarge' : 'inRange';
    const keys = drivers.map((d) => d.key);
    report({
      messageId,
      data: { net: view.net.id, ohms: pull.ohms, rail: pull.to, rMin, rMax, suggested, weak },
      severity: messageId === 'inRange' ? 'info' : 'error',
      pins: keys,
      parts: partsOf(...keys),
      values: {
        ohms: pull.ohms, rMin, rMax, empty, suggested,
        rMinDriver: weak[0] ?? best?.driver ?? null, rMinCorner: best?.corner ?? null,
        rMaxBy: rMax === null ? null : byLevel ? 'level' : 'rise-time', rMaxCorner: byLevel ? level!.corner : null,
        capacitance: view.capacitance,
      },
      ...(messageId === 'inRange' ? { hint: 'Nothing to change; a pull-up nearer the top of the range draws less current.' } : {}),
      ...(empty ? { hint: emptyHint } : {}),
    });
  },
});
