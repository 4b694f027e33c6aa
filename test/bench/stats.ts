/** Small statistics the benchmarks share. */

/** The median of the finite values (NaN when there are none). */
export function median(xs: readonly number[]): number {
  const s = xs.filter((x) => Number.isFinite(x)).sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length === 0 ? NaN : s.length % 2 ? s[m]! : (s[m - 1]! + s[m]!) / 2;
}

/** `x` rounded to `digits` decimals. */
export function round(x: number, digits: number): number {
  return Math.round(x * 10 ** digits) / 10 ** digits;
}
