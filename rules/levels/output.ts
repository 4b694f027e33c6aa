/**
 * The guaranteed output level of a driver at a load current (rules-catalogue.md, "Guaranteed
 * output levels, not guesses").
 */
/** A guaranteed output level `v` (a Level) at a load current `i` (A): the model's OutputPoint. */
export interface OutputPoint {
  readonly v: string | number;
  readonly i: number;
}
import { levelAt } from './level.ts';
import { exceeds } from './compare.ts';

export interface OutputLevel {
  /** Volts at the given supply. */
  readonly v: number;
  /** The test current whose level was used, A (for an estimate, the load itself). */
  readonly atCurrent: number;
  /** True when the load exceeds the largest test current and the level is extrapolated. */
  readonly estimate: boolean;
}

/** The points sorted by test current (the library keeps them so; a design-local list may not). */
export function sortedPoints(points: readonly OutputPoint[]): readonly OutputPoint[] {
  for (let k = 1; k < points.length; k++) {
    if (points[k]!.i < points[k - 1]!.i) return [...points].sort((p, q) => p.i - q.i);
  }
  return points;
}

/** The largest test current of a list, or undefined for an empty or missing list. */
export function largestTestCurrent(points: readonly OutputPoint[] | undefined): number | undefined {
  if (points === undefined || points.length === 0) return undefined;
  let m = points[0]!.i;
  for (const p of points) if (p.i > m) m = p.i;
  return m;
}

/**
 * The level guaranteed at `load` for a `voh` (`sense: 'high'`) or `vol` (`'low'`) list, at supply
 * `vdd`: the entry with the smallest test current that is at least the load. Above the largest
 * test current there is no guarantee: the straight line through the last two points,
 * extrapolated to the load, never better than the last guaranteed point; with a single point,
 * that point. The line stops at the output's own rails, 0 V for a high level and `vdd` for a low
 * one (an output stage cannot swing beyond its supply: common practice), so that test points
 * a hair apart never extrapolate to astronomical or infinite volts. A load or supply that is
 * not finite gives NaN (no guarantee), never a clamped level. Undefined for an empty list.
 */
export function outputLevel(
  points: readonly OutputPoint[] | undefined,
  load: number,
  vdd: number,
  sense: 'high' | 'low',
): OutputLevel | undefined {
  if (points === undefined || points.length === 0) return undefined;
  // A load or supply that is not a finite number guarantees nothing: NaN, which every
  // comparison of the rules (rules/levels/compare.ts) judges as a failure.
  if (!Number.isFinite(load) || !Number.isFinite(vdd)) return { v: Number.NaN, atCurrent: load, estimate: true };
  const sorted = sortedPoints(points);
  for (const p of sorted) {
    if (!exceeds(load, p.i)) return { v: levelAt(p.v, vdd), atCurrent: p.i, estimate: false };
  }
  const last = sorted[sorted.length - 1]!;
  const vLast = levelAt(last.v, vdd);
  if (sorted.length === 1) return { v: vLast, atCurrent: load, estimate: true };
  const prev = sorted[sorted.length - 2]!;
  const vPrev = levelAt(prev.v, vdd);
  const di = last.i - prev.i;
  const line = di > 0 ? vLast + ((vLast - vPrev) / di) * (load - last.i) : vLast;
  const v = sense === 'high'
    ? Math.max(Number.isNaN(line) ? -Infinity : Math.min(line, vLast), Math.min(0, vLast))
    : Math.min(Number.isNaN(line) ? Infinity : Math.max(line, vLast), Math.max(vdd, vLast));
  return { v, atCurrent: load, estimate: true };
}
