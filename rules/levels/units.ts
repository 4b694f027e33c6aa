/**
 * Engineering notation at the edges (design-format.md: the file holds plain SI numbers; the
 * editor shows and accepts `4k7`, `100n`, `2.2 µ`, `15 pF`).
 *
 * Values are built from their decimal digits as one string (`Number("4.7e3")`), never by
 * multiplying a parsed mantissa by a power of ten, so `4k7` is exactly 4700 and `100n` is the
 * same double as the literal `100e-9`.
 */

/** The units a quantity in the design file can have. */
export type Unit = 'V' | 'A' | 'Ω' | 'F' | 's' | 's/V';

/** A parsed quantity in SI base units, or why the text is not one. Never NaN. */
export type QuantityResult = { ok: true; value: number } | { ok: false; error: string };

/** SI prefixes accepted on input, as powers of ten. Both micro signs (U+00B5, U+03BC) and `u`. */
const SI_PREFIX: Readonly<Record<string, number>> = {
  f: -15,
  p: -12,
  n: -9,
  u: -6,
  '\u00b5': -6,
  '\u03bc': -6,
  m: -3,
  k: 3,
  M: 6,
  G: 9,
};

/**
 * IEC 60062 resistance code letters: the letter stands for the decimal point and the
 * multiplier (R = 1, K = 10³, M = 10⁶, G = 10⁹, T = 10¹²).
 */
const IEC_RESISTANCE_LETTER: Readonly<Record<string, number>> = { R: 0, K: 3, M: 6, G: 9, T: 12 };

/** Symbols accepted after a value, per unit. `R` for ohms follows IEC 60062 (`470R`). */
const UNIT_SYMBOLS: Readonly<Record<Unit, readonly string[]>> = {
  Ω: ['\u03a9', '\u2126', 'ohm', 'ohms', 'Ohm', 'Ohms', 'OHM', 'OHMS', 'R'],
  V: ['V'],
  A: ['A'],
  F: ['F'],
  s: ['s'],
  's/V': ['s/V'],
};

const ALL_UNITS = Object.keys(UNIT_SYMBOLS) as Unit[];

function unitOfSymbol(symbol: string): Unit | undefined {
  return ALL_UNITS.find((u) => UNIT_SYMBOLS[u].includes(symbol));
}

/** Letters that may stand in for the decimal point (`4k7`, `2u2`, `R47`, `3V3`) for a unit. */
function decimalPointLetter(letter: string, unit: Unit | undefined): number | undefined {
  if (unit === 'Ω' && letter in IEC_RESISTANCE_LETTER) return IEC_RESISTANCE_LETTER[letter];
  // `3V3`, `1V8`: how rails are commonly named (common practice).
  if (unit === 'V' && letter === 'V') return 0;
  return SI_PREFIX[letter];
}

/** A prefix letter written before a unit symbol (or alone). `K` and `T` (IEC 60062) only on resistances. */
function prefixExponent(letter: string, unit: Unit | undefined): number | undefined {
  if (unit === 'Ω' && (letter === 'K' || letter === 'T')) return IEC_RESISTANCE_LETTER[letter];
  return SI_PREFIX[letter];
}

function isDigit(c: string | undefined): boolean {
  return c !== undefined && c >= '0' && c <= '9';
}

function digitsFrom(text: string, start: number): string {
  let end = start;
  while (isDigit(text[end])) end++;
  return text.slice(start, end);
}

function unitName(unit: Unit | undefined): string {
  return unit === undefined ? 'a plain number' : `a value in ${unit}`;
}

/** Build the value from decimal digits and a power of ten, refusing overflow and underflow. */
function fromDigits(intDigits: string, fracDigits: string, exponent: number, negative: boolean): QuantityResult {
  const value = Number(`${intDigits || '0'}.${fracDigits || '0'}e${exponent}`);
  if (!Number.isFinite(value)) return { ok: false, error: 'the value is too large' };
  if (value === 0 && /[1-9]/.test(intDigits + fracDigits)) return { ok: false, error: 'the value is too small' };
  // -0 would print as "0" but compare unequal under Object.is; return a plain 0.
  return { ok: true, value: negative && value !== 0 ? -value : value };
}

/**
 * Read what follows the number: nothing, a unit symbol, a prefix, or a prefix and a unit
 * symbol. Returns the prefix's power of ten, or an error.
 */
function readSuffix(
  suffix: string,
  unit: Unit | undefined,
  allowPrefix: boolean,
): { ok: true; exponent: number } | { ok: false; error: string } {
  if (suffix === '') return { ok: true, exponent: 0 };
  const symbolOk = (s: string) => s === '' || (unit !== undefined && UNIT_SYMBOLS[unit].includes(s));
  if (symbolOk(suffix)) return { ok: true, exponent: 0 };
  const first = suffix[0]!;
  const rest = suffix.slice(1);
  const p = prefixExponent(first, unit);
  if (p !== undefined && symbolOk(rest)) {
    if (!allowPrefix)
      return { ok: false, error: `a prefix ("${first}") after an exponent or a letter code; write one or the other` };
    return { ok: true, exponent: p };
  }
  const other = unitOfSymbol(suffix) ?? (p !== undefined ? unitOfSymbol(rest) : undefined);
  if (other !== undefined && other !== unit) {
    return { ok: false, error: `expected ${unitName(unit)}, found a value in ${other}` };
  }
  if (suffix.includes(',')) return { ok: false, error: 'use "." as the decimal point' };
  return { ok: false, error: `expected ${unitName(unit)}; "${suffix}" is not a known prefix or unit` };
}

/**
 * Parse engineering notation into SI base units. Never throws and never returns NaN.
 *
 * Accepts, for example: `0.33`, `1e-9`, `4.7k`, `4.7 kΩ`, `4.7kohm`, `4k7` (the prefix letter
 * as the decimal point), `100n`, `15 pF`, `2.2 µ`, `2.2u`, `2.2 μ`, `-0.3 V`, `3V3`; with
 * `unit` `'Ω'` also the IEC 60062 resistance codes (`R47`, `4R7`, `470R`, `4K7`, `47K3`,
 * `4M7`, `1G5`) and `K`, `T` for kilo and tera. `m` is milli and `M` mega. A unit symbol, when written,
 * must be `unit`'s (`ohm`, `R` or `Ω` for ohms). Without `unit`, no unit symbol is accepted.
 * A minus sign is accepted only where a negative value is meaningful: volts and plain numbers.
 */
export function parseQuantity(text: string, unit?: Unit): QuantityResult {
  if (typeof text !== 'string') return { ok: false, error: 'expected text' };
  const s = text.trim();
  if (s === '') return { ok: false, error: `expected ${unitName(unit)}, found nothing` };

  let i = 0;
  let negative = false;
  const signChar = s[0];
  if (signChar === '-' || signChar === '\u2212' || signChar === '+') {
    negative = signChar !== '+';
    i++;
  }
  if (negative && unit !== undefined && unit !== 'V') {
    return { ok: false, error: `a negative value is not meaningful in ${unit}` };
  }

  const intDigits = digitsFrom(s, i);
  i += intDigits.length;
  const c = s[i];

  // Letter as decimal point: `4k7`, `R47`, `4R7`, `2u2`. A trailing letter (`470R`, `4k`) is
  // read below as a prefix or unit, which means the same.
  if (c !== undefined && c !== '.' && isDigit(s[i + 1])) {
    const letterExponent = decimalPointLetter(c, unit);
    if (letterExponent !== undefined) {
      const fracDigits = digitsFrom(s, i + 1);
      const after = readSuffix(s.slice(i + 1 + fracDigits.length).trimStart(), unit, false);
      if (!after.ok) return after;
      return fromDigits(intDigits, fracDigits, letterExponent, negative);
    }
  }

  let fracDigits = '';
  if (c === '.') {
    i++;
    fracDigits = digitsFrom(s, i);
    i += fracDigits.length;
    if (fracDigits === '') return { ok: false, error: 'expected a digit after the decimal point' };
  }
  if (intDigits === '' && fracDigits === '') {
    return { ok: false, error: `expected ${unitName(unit)} such as ${example(unit)}, found "${s}"` };
  }

  let exponent = 0;
  let hasExponent = false;
  if (
    (s[i] === 'e' || s[i] === 'E') &&
    (isDigit(s[i + 1]) || ((s[i + 1] === '-' || s[i + 1] === '+') && isDigit(s[i + 2])))
  ) {
    let j = i + 1;
    const expSign = s[j] === '-' ? -1 : 1;
    if (s[j] === '-' || s[j] === '+') j++;
    const expDigits = digitsFrom(s, j);
    // Anything this long is a typo; keep the exponent a safe integer.
    if (expDigits.length > 4) return { ok: false, error: 'the exponent is out of range' };
    exponent = expSign * Number(expDigits);
    hasExponent = true;
    i = j + expDigits.length;
  }

  const after = readSuffix(s.slice(i).trimStart(), unit, !hasExponent);
  if (!after.ok) return after;
  return fromDigits(intDigits, fracDigits, exponent + after.exponent, negative);
}

function example(unit: Unit | undefined): string {
  switch (unit) {
    case 'Ω':
      return '4k7 or 4.7 kΩ';
    case 'F':
      return '100n or 15 pF';
    case 'V':
      return '3.3 or 3.3 V';
    case 'A':
      return '4 mA';
    case 's':
      return '300 ns';
    case 's/V':
      return '10 ns/V';
    default:
      return '4.7 or 4k7';
  }
}

/** SI prefixes used on output, largest first, with the exact power of ten each stands for. */
const OUTPUT_PREFIXES: readonly { exponent: number; scale: number; symbol: string }[] = [
  { exponent: 9, scale: 1e9, symbol: 'G' },
  { exponent: 6, scale: 1e6, symbol: 'M' },
  { exponent: 3, scale: 1e3, symbol: 'k' },
  { exponent: 0, scale: 1, symbol: '' },
  { exponent: -3, scale: 1e-3, symbol: 'm' },
  { exponent: -6, scale: 1e-6, symbol: '\u00b5' },
  { exponent: -9, scale: 1e-9, symbol: 'n' },
  { exponent: -12, scale: 1e-12, symbol: 'p' },
];

function join(number: string, prefix: string, unit: string): string {
  const suffix = prefix + unit;
  return suffix === '' ? number : `${number} ${suffix}`;
}

/**
 * Significant digits of a voltage: as many as it needs, up to four, so that a supply's corner
 * shows whole (3.3 V − 5 % is 3.135 V, not 3.13 V; 1.71 V, 5.25 V and 0.4 V keep their digits,
 * trailing zeros being trimmed).
 */
export const VOLT_DIGITS = 4;

/** A noise margin (a difference of two levels): three significant digits are enough, `-0.759 V`. */
export function formatMargin(volts: number): string {
  return formatQuantity(volts, 'V', 3);
}

/**
 * Format an SI value for display: `4.7 kΩ`, `100 nF`, `2.4 V`, `16 mA`, `-0.3 V`, `300 ns`,
 * `0 V`. Rounds to `digits` significant digits (1–21), trims trailing zeros, and uses the
 * prefixes p n µ m k M G (µ is U+00B5). Magnitudes from 0.1 to 1 keep no prefix (`0.4 V`,
 * `0.47 Ω`), as engineers write them. Infinite values print as `∞`; NaN prints as `—`.
 * The output parses back with {@link parseQuantity}. Volts take up to four digits by default
 * ({@link VOLT_DIGITS}); a margin, a difference of two levels, is written with three
 * ({@link formatMargin}).
 */
export function formatQuantity(value: number, unit: string, digits = unit === 'V' ? VOLT_DIGITS : 3): string {
  // Messages print the same few levels, currents and resistances over and over (a check of
  // 10,000 parts formats about 50,000 numbers): remembered per unit at the default digits.
  if (digits !== (unit === 'V' ? VOLT_DIGITS : 3)) return format(value, unit, digits);
  let byValue = formatted.get(unit);
  if (byValue === undefined) {
    byValue = new Map();
    formatted.set(unit, byValue);
  }
  let text = byValue.get(value);
  if (text === undefined) {
    if (byValue.size >= FORMATTED_MAX) byValue.clear();
    text = format(value, unit, digits);
    byValue.set(value, text);
  }
  return text;
}

const formatted = new Map<string, Map<number, string>>();
/** Enough for every distinct value of a large board; cleared rather than grown without end. */
const FORMATTED_MAX = 4096;

function format(value: number, unit: string, digits: number): string {
  if (Number.isNaN(value)) return '—';
  if (!Number.isFinite(value)) return join(value < 0 ? '-∞' : '∞', '', unit);
  if (value === 0) return join('0', '', unit);
  const d = Number.isFinite(digits) ? Math.min(21, Math.max(1, Math.round(digits))) : 3;
  const sign = value < 0 ? '-' : '';
  // Round first, so that 999.96 becomes 1000 and takes the next prefix ("1 kΩ").
  const rounded = Number(Math.abs(value).toPrecision(d));
  const prefix =
    rounded >= 0.1 && rounded < 1
      ? OUTPUT_PREFIXES[3]!
      : (OUTPUT_PREFIXES.find((p) => rounded >= p.scale) ?? OUTPUT_PREFIXES[OUTPUT_PREFIXES.length - 1]!);
  // Dividing by an inexact power of ten (1e-9) can leave 99.99999999999999: round again.
  const scaled = String(Number((rounded / prefix.scale).toPrecision(d)));
  // Beyond the prefixes' reach String() switches to exponent form; print that without a prefix.
  if (scaled.includes('e')) return join(sign + String(rounded), '', unit);
  return join(sign + scaled, prefix.symbol, unit);
}

/**
 * Parse an IEC 60062 resistance code: digits with one letter R, K, M, G or T standing for
 * the decimal point and the multiplier (`R47` = 0.47 Ω, `4R7` = 4.7 Ω, `470R`, `4K7`,
 * `47K3`, `4M7`, `1G5`). Strict: upper-case letters only, no spaces, no unit.
 */
export function parseIec60062(code: string): QuantityResult {
  if (typeof code !== 'string') return { ok: false, error: 'expected text' };
  const m = /^(\d*)([RKMGT])(\d*)$/.exec(code.trim());
  if (m === null || m[1]! + m[3]! === '') {
    return { ok: false, error: `expected an IEC 60062 resistance code such as 4K7 or R47, found "${code}"` };
  }
  return fromDigits(m[1]!, m[3]!, IEC_RESISTANCE_LETTER[m[2]!]!, false);
}

/**
 * Write a resistance as an IEC 60062 code with up to three significant digits: 4700 →
 * `4K7`, 0.47 → `R47`, 470 → `470R`, 1000 → `1K0`, 10 000 → `10K`, 0 → `0R` (a zero-ohm
 * link). A one-digit value keeps a trailing 0 (`1K0`, `2R0`) so that the letter never ends
 * a single digit, as resistor markings commonly do. Returns `''` outside 0 and 1 mΩ to
 * 999 TΩ (negative, non-finite, or beyond what the code letters reach).
 */
export function formatIec60062(ohms: number): string {
  if (ohms === 0) return '0R';
  const rounded = Number.isFinite(ohms) ? Number(ohms.toPrecision(3)) : NaN;
  if (!(rounded >= 1e-3 && rounded < 1e15)) return '';
  const letters: readonly [string, number][] = [
    ['T', 12],
    ['G', 9],
    ['M', 6],
    ['K', 3],
    ['R', 0],
  ];
  const [letter, exponent] = letters.find(([, e]) => rounded >= Number(`1e${e}`)) ?? ['R', 0];
  // In this range String() never uses exponent form, so its digits are the code's digits.
  const scaled = Number((rounded / Number(`1e${exponent}`)).toPrecision(3));
  const [intPart = '', fracPart = ''] = String(scaled).split('.');
  if (intPart === '0') return `R${fracPart.padEnd(2, '0')}`;
  if (fracPart === '') return intPart.length === 1 ? `${intPart}${letter}0` : `${intPart}${letter}`;
  return `${intPart}${letter}${fracPart}`;
}
