/**
 * Preferred-number series of IEC 60063, as printed in its table. Several E24 entries
 * (2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 8.2) differ from the rounded geometric 10^(i/24), so the
 * values are listed, never computed.
 */

/** IEC 60063 E12 mantissas. */
export const E12: readonly number[] = Object.freeze([1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2]);

/** IEC 60063 E24 mantissas. */
export const E24: readonly number[] = Object.freeze([
  1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2,
  9.1,
]);

/**
 * Decades searched: 10⁻¹⁵ (femtofarads) to 10¹⁵, wider than any resistor, capacitor or time
 * the design file holds. An unbounded end is cut here.
 */
const MIN_DECADE = -15;
const MAX_DECADE = 15;

/** Relative slack at the ends of a range, so that a bound computed as 4699.999999999 still admits 4700. */
const END_TOLERANCE = 1e-9;

/**
 * One series value: the mantissa's decimal digits with a power of ten, read as one decimal
 * literal (`Number("4.7e3")`), so it is the double nearest the exact value (4700, not
 * 4700.000000000001) at every decade.
 */
function scaled(mantissa: number, decade: number): number {
  return Number(`${mantissa}e${decade}`);
}

/**
 * The series scaled to one decade, made once per (series, decade): building each value from its
 * literal costs a string round trip, and the pull-up advice searches the same decades net after
 * net.
 */
const decadeCache = new WeakMap<readonly number[], Map<number, readonly number[]>>();
function decadeValues(series: readonly number[], decade: number): readonly number[] {
  let bySeries = decadeCache.get(series);
  if (bySeries === undefined) {
    bySeries = new Map();
    decadeCache.set(series, bySeries);
  }
  let values = bySeries.get(decade);
  if (values === undefined) {
    values = series.map((m) => scaled(m, decade));
    bySeries.set(decade, values);
  }
  return values;
}

function decadeOf(x: number): number {
  return Math.floor(Math.log10(x));
}

/**
 * Every value of `series` (mantissas from 1 to below 10, such as {@link E12} or {@link E24})
 * scaled by a power of ten that lies in [`lo`, `hi`], ascending. Each end admits values
 * within 1e-9 relative of it. Empty when `lo > hi` or either is NaN; decades beyond
 * 10⁻¹⁵…10¹⁵ are not searched.
 */
export function seriesValuesBetween(series: readonly number[], lo: number, hi: number): number[] {
  if (Number.isNaN(lo) || Number.isNaN(hi) || lo > hi || hi <= 0) return [];
  const lower = lo > 0 ? lo * (1 - END_TOLERANCE) : lo;
  const upper = hi * (1 + END_TOLERANCE);
  // One decade of slack either side: log10 of a value near a power of ten may round either way.
  const first = lo > 0 && Number.isFinite(lo) ? Math.max(MIN_DECADE, decadeOf(lo) - 1) : MIN_DECADE;
  const last = Number.isFinite(hi) ? Math.min(MAX_DECADE, decadeOf(hi) + 1) : MAX_DECADE;
  const values: number[] = [];
  for (let decade = first; decade <= last; decade++) {
    for (const v of decadeValues(series, decade)) if (v >= lower && v <= upper) values.push(v);
  }
  // A caller's own series need not be sorted or lie within one decade.
  return values.sort((x, y) => x - y);
}

/**
 * The largest value of `series` within [`lo`, `hi`] (ends with 1e-9 relative slack), e.g.
 * the largest standard pull-up between a bus's minimum and maximum resistance. `null` when
 * no value fits, when `lo > hi`, or when `hi` is not finite (an unbounded maximum names no
 * value to choose).
 */
export function largestInRange(series: readonly number[], lo: number, hi: number): number | null {
  if (!Number.isFinite(hi) || Number.isNaN(lo) || lo > hi || hi <= 0) return null;
  const lower = lo > 0 ? lo * (1 - END_TOLERANCE) : lo;
  const upper = hi * (1 + END_TOLERANCE);
  // Walk down from the decade above hi: the first value at or below hi is the answer if it is
  // not below lo (the engine asks this once per pulled net, so no list is built).
  const top = Math.min(MAX_DECADE, decadeOf(hi) + 1);
  for (let decade = top; decade >= MIN_DECADE; decade--) {
    let best: number | null = null;
    for (const v of decadeValues(series, decade)) if (v <= upper && (best === null || v > best)) best = v;
    if (best !== null) return best >= lower ? best : null;
  }
  return null;
}
