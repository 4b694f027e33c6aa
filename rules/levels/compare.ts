/**
 * Comparisons of computed values with limits (rules-catalogue.md, "Comparisons"): values within
 * 1e-9 of the larger magnitude are equal, so that ten 1.6 mA loads on a 16 mA output pass and
 * a margin of exactly 0 V is judged by the levels it is the difference of, not by rounding.
 */
export const RELATIVE_TOLERANCE = 1e-9;

/** True when `a` and `b` are equal within 1e-9 of the larger magnitude. */
export function nearlyEqual(a: number, b: number): boolean {
  if (a === b) return true;
  return Math.abs(a - b) <= RELATIVE_TOLERANCE * Math.max(Math.abs(a), Math.abs(b));
}

/** `a > b`, strictly, and not merely by rounding noise. */
export function exceeds(a: number, b: number): boolean {
  return a > b && !nearlyEqual(a, b);
}

/** `a < b`, strictly, and not merely by rounding noise. */
export function below(a: number, b: number): boolean {
  return a < b && !nearlyEqual(a, b);
}
