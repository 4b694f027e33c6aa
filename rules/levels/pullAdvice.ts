/**
 * The pull-up value to suggest inside a range: away from its least certain edges, in the
 * middle, where a resistor's tolerance, a probe's capacitance or a datasheet's spread does not
 * push the net out of its limits (README, "Pull-up advice").
 */
import { E12, E24, largestInRange, seriesValuesBetween } from './series.ts';

/** A resistor's tolerance when the pull gives none: ±5 %, IEC 60062 code J, the usual E24 part (common practice). */
export const DEFAULT_RESISTOR_TOLERANCE = 0.05;

/**
 * The rise-time bound of the advice uses this share of the net's maxRiseTime, so that a probe
 * or some more wiring than drawn still meets the limit (a capacitance guard of 1/0.7 ≈ 1.43,
 * common practice).
 */
export const RISE_GUARD = 0.7;

/**
 * A pull-up bounded only by leakage is capped at a practical value (common practice): 10 kΩ on
 * a net that leaves the board or reads a contact (noise, wetting current of the contact),
 * 47 kΩ on board.
 */
export const PRACTICAL_CAP_OFF_BOARD = 10e3;
export const PRACTICAL_CAP_ON_BOARD = 47e3;

/** `[lo/(1−t), hi/(1+t)]`: the nominal values whose whole tolerance band lies in `[lo, hi]`. */
export function shrinkByTolerance(lo: number, hi: number, tolerance: number): { lo: number; hi: number } {
  return { lo: lo / (1 - tolerance), hi: hi / (1 + tolerance) };
}

/**
 * The value of `series` inside [`lo`, `hi`] nearest the geometric mean √(lo·hi) on a logarithmic
 * scale (a tie goes to the larger value: less current). `null` when none lies inside or when a
 * bound is not finite and positive.
 */
export function nearestToMiddle(series: readonly number[], lo: number, hi: number): number | null {
  if (!(lo > 0) || !Number.isFinite(hi) || lo > hi) return null;
  const middle = Math.sqrt(lo * hi);
  let best: number | null = null;
  let bestDistance = Infinity;
  for (const v of seriesValuesBetween(series, lo, hi)) {
    const d = Math.abs(Math.log(v / middle));
    if (d <= bestDistance + 1e-12) {
      best = v;
      bestDistance = Math.min(d, bestDistance);
    }
  }
  return best;
}

export interface PullChoice {
  /** The suggestion: E12 nearest the middle, else E24 nearest the middle; null when none fits. */
  readonly suggested: number | null;
  readonly series: 'E12' | 'E24' | null;
}

/**
 * The suggestion inside an advice range `[lo, hi]` (already shrunk by the tolerance and cut at
 * any practical cap): the IEC 60063 E12 value nearest the geometric mean, or the E24 one when no
 * E12 value fits; for a range open above, the first E12 value from its low end. A range
 * starting at 0 Ω (no lower bound) is read from 1 Ω.
 */
export function choosePull(lo: number, hi: number): PullChoice {
  const from = Math.max(lo, 1);
  if (hi === Infinity) {
    // A range open above (a practical cap below its low end): the first E12 value from its low end.
    const first = seriesValuesBetween(E12, from, from * 10)[0];
    return first === undefined ? { suggested: null, series: null } : { suggested: first, series: 'E12' };
  }
  const e12 = nearestToMiddle(E12, from, hi);
  if (e12 !== null) return { suggested: e12, series: 'E12' };
  const e24 = nearestToMiddle(E24, from, hi);
  return e24 === null ? { suggested: null, series: null } : { suggested: e24, series: 'E24' };
}

/** The alternative: the largest E24 value inside (the least current that still meets every limit). */
export function lowestPowerPull(lo: number, hi: number): number | null {
  return largestInRange(E24, lo, hi);
}
