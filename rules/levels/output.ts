/**
 * The guaranteed output level of a driver at a load current (rules-catalogue.md, "Guaranteed
 * output levels, not guesses").
 */
/** A guaranteed output level `v` (a Level) at a load current `i` (A): the model's OutputPoint. */
export interface OutputPoint {
  readonly v: string | number;
  /** The lowest supply the row holds at, V (from it up); every supply when absent. */
  readonly vddMin?: number | undefined;
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

/**
 * The rows guaranteed at supply `vdd`, sorted by test current: a row with a `vddMin` (a
 * datasheet's column tabulated from that supply up) counts only from there (1e-9 relative slack).
 */
export function rowsAt(points: readonly OutputPoint[], vdd: number): readonly OutputPoint[] {
  const sorted = sortedPoints(points);
  let limited = false;
  for (let k = 0; k < sorted.length; k++) if (sorted[k]!.vddMin !== undefined) limited = true;
  if (!limited) return sorted;
  // Asked for every pair at every corner: the rows of one list at one supply are worked out once.
  let bySupply = rowsMemo.get(sorted);
  if (bySupply === undefined) {
    bySupply = new Map();
    rowsMemo.set(sorted, bySupply);
  }
  let rows = bySupply.get(vdd);
  if (rows === undefined) {
    rows = sorted.filter((p) => p.vddMin === undefined || !exceeds(p.vddMin, vdd));
    bySupply.set(vdd, rows);
  }
  return rows;
}

const rowsMemo = new WeakMap<readonly OutputPoint[], Map<number, readonly OutputPoint[]>>();

/**
 * The largest test current of a list, or undefined for an empty or missing list; with `vdd`,
 * of the rows guaranteed at that supply (a driver's is taken at its rail's lowest voltage).
 */
export function largestTestCurrent(points: readonly OutputPoint[] | undefined, vdd?: number): number | undefined {
  if (points === undefined || points.length === 0) return undefined;
  const rows = vdd === undefined ? points : rowsAt(points, vdd);
  if (rows.length === 0) return undefined;
  let m = rows[0]!.i;
  for (const p of rows) if (p.i > m) m = p.i;
  return m;
}

/**
 * The level guaranteed at `load` for a `voh` (`sense: 'high'`) or `vol` (`'low'`) list, at supply
 * `vdd`: the entry with the smallest test current that is at least the load. Above the largest
 * test current there is no guarantee: the straight line through the last two points,
 * extrapolated to the load, never better than the last guaranteed point; with a single point,
 * the resistive line through the origin, as if the output were a resistor from its own rail
 * (VOL · I/I_row for a low level, VDD − (VDD − VOH) · I/I_row for a high one), or that point's
 * level when its test current is 0 A (no line can be drawn). The line stops at the output's own rails, 0 V for a high level and `vdd` for a low
 * one (an output stage cannot swing beyond its supply: common practice), so that test points
 * a hair apart never extrapolate to astronomical or infinite volts. A load or supply that is
 * not finite gives NaN (no guarantee), never a clamped level. Rows with a `vddMin` above `vdd`
 * do not count; when none counts, all are read and the level is an estimate. Undefined for an
 * empty list.
 */
export function outputLevel(
  points: readonly OutputPoint[] | undefined,
  load: number,
  vdd: number,
  sense: 'high' | 'low',
): OutputLevel | undefined {
  if (points === undefined || points.length === 0) return undefined;
  const at: LevelAt = { atCurrent: 0, estimate: false };
  const v = levelInto(points, load, vdd, sense, at);
  return { v, atCurrent: at.atCurrent, estimate: at.estimate };
}

/**
 * The volts of `outputLevel` alone (NaN for a missing or empty list), for loops that score
 * every corner and keep one: it makes no object.
 */
export function outputVolts(
  points: readonly OutputPoint[] | undefined,
  load: number,
  vdd: number,
  sense: 'high' | 'low',
): number {
  if (points === undefined || points.length === 0) return Number.NaN;
  return levelInto(points, load, vdd, sense, scratch);
}

interface LevelAt {
  atCurrent: number;
  estimate: boolean;
}

const scratch: LevelAt = { atCurrent: 0, estimate: false };

/** The level's volts; the test current used and whether it is an estimate are written to `at`. */
function levelInto(
  points: readonly OutputPoint[],
  load: number,
  vdd: number,
  sense: 'high' | 'low',
  at: LevelAt,
): number {
  at.atCurrent = load;
  at.estimate = true;
  // A load or supply that is not a finite number guarantees nothing: NaN, which every
  // comparison of the rules (rules/levels/compare.ts) judges as a failure.
  if (!Number.isFinite(load) || !Number.isFinite(vdd)) return Number.NaN;
  const guaranteed = rowsAt(points, vdd);
  // No row holds at this supply: the rows are read all the same, and every level is an estimate.
  const sorted = guaranteed.length > 0 ? guaranteed : sortedPoints(points);
  // Indexed, not for…of: the library's lists are frozen, and V8 iterates a frozen array through
  // its generic iterator, an object per step (measured: the check's largest allocation).
  for (let k = 0; k < sorted.length; k++) {
    const p = sorted[k]!;
    if (!exceeds(load, p.i)) {
      at.atCurrent = p.i;
      at.estimate = guaranteed.length === 0;
      return levelAt(p.v, vdd);
    }
  }
  const last = sorted[sorted.length - 1]!;
  const vLast = levelAt(last.v, vdd);
  if (sorted.length === 1) {
    if (!(last.i > 0)) return vLast;
    const scale = load / last.i;
    const line = sense === 'high' ? vdd - (vdd - vLast) * scale : vLast * scale;
    return bounded(line, vLast, vdd, sense);
  }
  const prev = sorted[sorted.length - 2]!;
  const vPrev = levelAt(prev.v, vdd);
  const di = last.i - prev.i;
  const line = di > 0 ? vLast + ((vLast - vPrev) / di) * (load - last.i) : vLast;
  return bounded(line, vLast, vdd, sense);
}

/** An extrapolated level: never better than the last guaranteed one, never past the output's own rails. */
function bounded(line: number, vLast: number, vdd: number, sense: 'high' | 'low'): number {
  return sense === 'high'
    ? Math.max(Number.isNaN(line) ? -Infinity : Math.min(line, vLast), Math.min(0, vLast))
    : Math.min(Number.isNaN(line) ? Infinity : Math.max(line, vLast), Math.max(vdd, vLast));
}
