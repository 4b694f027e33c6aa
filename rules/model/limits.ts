/**
 * The physical limits of the design format: the ranges outside which a number in a design file
 * makes no electrical sense for a board of logic chips, and which the reader refuses with the
 * value's JSON path. They exist so that every computation of the engine stays a finite number
 * of sensible size (the largest voltage times the largest conductance, the largest resistance
 * times the largest capacitance …); a value the engine could not compute must never reach a
 * rule, where a comparison with NaN or ∞ would be silently false (a wrong pass).
 *
 * The limits are deliberately wide (common practice for board-level logic lies orders of
 * magnitude inside each), so that no real design is refused; they are documented in
 * README.md ("Limits of the numbers") and, through the zod schema, in design.schema.json.
 */

/**
 * Volts, any voltage in the file (rail nominal, min, max; a Level's volts; viMaxOff; vddRange;
 * minMargin): ±10 kV. Logic rails are a few volts; 10 kV leaves room for any supply a logic
 * signal could meet on a board while keeping every product with a conductance finite.
 */
export const MAX_VOLTS = 10_000;

/**
 * The factor of VDD in a Level (`0.7*VDD` has 0.7): at most 10 in magnitude. Thresholds and
 * output levels are fractions of the supply or the supply less a drop (factor 0 … 1); a factor
 * beyond 10 can only be a typing error.
 */
export const MAX_VDD_FACTOR = 10;

/**
 * A rail's tolerance, a fraction of nominal: 0 or more and below 1. At 1 the rail's low end
 * reaches 0 V (a rail that may be off is a scenario, not a tolerance); a tolerance of 3.6e307
 * made the rail's range ±∞ and every margin on it undefined.
 */
export const MAX_TOLERANCE = 1;

/**
 * Ohms, a pull resistor: 1 mΩ to 1 TΩ. Below a milliohm a resistor is a wire (and 5e-324 Ω,
 * a denormal, made the pull's current infinite); above a teraohm it is an open circuit.
 */
export const MIN_OHMS = 1e-3;
export const MAX_OHMS = 1e12;

/**
 * Amperes, any current (iih, iil, ioMax, an output point's test current): 0, or 1 fA to 1 kA.
 * Logic inputs leak picoamperes to microamperes and outputs drive milliamperes; the floor keeps
 * denormal currents (whose differences and quotients overflow) out.
 */
export const MIN_AMPS = 1e-15;
export const MAX_AMPS = 1e3;

/** Farads, a capacitance (cin, wiring): 0, or 1 aF to 1 F. A net's capacitance is picofarads. */
export const MIN_FARADS = 1e-18;
export const MAX_FARADS = 1;

/**
 * Seconds, a net's maxRiseTime: 0, or 1 fs to 1 s. An edge slower than a second is no longer
 * a logic edge; the floor keeps denormals out of the quotients of the rise-time bound.
 */
export const MIN_SECONDS = 1e-15;
export const MAX_SECONDS = 1;

/** Seconds per volt, a receiver's maxInputRamp: 0, or 1 fs/V to 1 s/V, for the same reasons. */
export const MIN_RAMP = 1e-15;
export const MAX_RAMP = 1;

const PREFIXES: readonly (readonly [number, string])[] = [
  [1e12, 'T'],
  [1e9, 'G'],
  [1e6, 'M'],
  [1e3, 'k'],
  [1, ''],
  [1e-3, 'm'],
  [1e-6, 'µ'],
  [1e-9, 'n'],
  [1e-12, 'p'],
  [1e-15, 'f'],
  [1e-18, 'a'],
];

/**
 * A limit in engineering notation ("1 TΩ", "1 aF", "-10 kV"): the limits reach prefixes the
 * report's notation (formatQuantity, picos to gigas) does not need.
 */
export function limitText(value: number, unit: string): string {
  const m = Math.abs(value);
  const [scale, symbol] = PREFIXES.find(([p]) => m >= p * (1 - 1e-12)) ?? PREFIXES[PREFIXES.length - 1]!;
  return `${Number((value / scale).toPrecision(3))} ${symbol}${unit}`;
}

/** "from 1 mΩ to 1 TΩ": a range in the words the reader's messages use. */
export function rangeText(min: number, max: number, unit: string): string {
  return `from ${limitText(min, unit)} to ${limitText(max, unit)}`;
}
