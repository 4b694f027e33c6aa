/**
 * Comparisons of computed values with limits (rules-catalogue.md, "Comparisons"): values within
 * 1e-9 of the larger magnitude are equal, so that ten 1.6 mA loads on a 16 mA output pass and
 * a margin of exactly 0 V is judged by the levels it is the difference of, not by rounding.
 *
 * Fail safe: a comparison with NaN is false in JavaScript, so `if (margin < 0) report(...)`
 * stays silent on a NaN margin and a design passes that nobody could judge. `exceeds` and
 * `below` therefore answer true whenever either operand is not a finite number (NaN from 0/0,
 * ±∞ from an overflow): every caller asks "does this break the limit?", and a value that
 * cannot be computed cannot be shown to keep it. The finding that results carries the
 * non-finite number, and the engine turns such a finding into a "cannot be guaranteed" error
 * (rules/engine/undecidable.ts).
 */
export const RELATIVE_TOLERANCE = 1e-9;

/** True when `a` and `b` are equal within 1e-9 of the larger magnitude. */
export function nearlyEqual(a: number, b: number): boolean {
  if (a === b) return true;
  return Math.abs(a - b) <= RELATIVE_TOLERANCE * Math.max(Math.abs(a), Math.abs(b));
}

/** True unless both are finite numbers: a comparison that cannot decide. */
export function undecidable(a: number, b: number): boolean {
  return !Number.isFinite(a) || !Number.isFinite(b);
}

/** `a > b`, strictly, and not merely by rounding noise; true when either is not finite. */
export function exceeds(a: number, b: number): boolean {
  if (undecidable(a, b)) return true;
  return a > b && !nearlyEqual(a, b);
}

/** `a < b`, strictly, and not merely by rounding noise; true when either is not finite. */
export function below(a: number, b: number): boolean {
  if (undecidable(a, b)) return true;
  return a < b && !nearlyEqual(a, b);
}

/**
 * For "keep the worst" loops: true when `candidate` should replace `worst` as the lowest score.
 * A non-finite score is the worst of all and, once kept, is never replaced, so that a corner
 * whose arithmetic failed cannot hide behind a finite one.
 */
export function lowerScore(candidate: number, worst: number): boolean {
  if (!Number.isFinite(worst)) return false;
  return !Number.isFinite(candidate) || candidate < worst;
}

/** As `lowerScore`, for loops that keep the highest value (an excess, a resistance). */
export function higherScore(candidate: number, worst: number): boolean {
  if (!Number.isFinite(worst)) return false;
  return !Number.isFinite(candidate) || candidate > worst;
}
