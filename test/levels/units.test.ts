import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { formatIec60062, formatQuantity, parseIec60062, parseQuantity, type Unit } from '../../rules/levels/units.ts';

// IEC 60062, resistance letter codes (the letter is the decimal point and the multiplier:
// R = 1, K = 10³, M = 10⁶, G = 10⁹). The seven examples as the standard's scheme gives them.
const iec60062: [code: string, ohms: number][] = [
  ['R47', 0.47],
  ['4R7', 4.7],
  ['470R', 470],
  ['4K7', 4.7e3],
  ['47K3', 47.3e3],
  ['4M7', 4.7e6],
  ['1G5', 1.5e9],
];

// SI prefixes (the SI Brochure: p 10⁻¹², n 10⁻⁹, µ 10⁻⁶, m 10⁻³, k 10³, M 10⁶, G 10⁹);
// writing the prefix letter as the decimal point (4k7, 2u2) is common practice.
// Expected values are decimal literals: parsing must give exactly the same double.
const parsed: [text: string, unit: Unit | undefined, value: number][] = [
  ['4k7', 'Ω', 4700],
  ['4.7k', 'Ω', 4700],
  ['4.7 kΩ', 'Ω', 4700],
  ['4.7 k\u2126', 'Ω', 4700], // OHM SIGN U+2126 as well as GREEK CAPITAL OMEGA
  ['4.7kohm', 'Ω', 4700],
  ['4.7 kOhm', 'Ω', 4700],
  ['4.7K', 'Ω', 4700], // K for kilo on resistors (IEC 60062 letter, common practice)
  ['4.7\u00a0kΩ', 'Ω', 4700], // a no-break space, as pasted from formatted text
  ['2.2 M', 'Ω', 2.2e6], // M is mega ...
  ['2.2 m', 'Ω', 2.2e-3], // ... and m is milli
  ['4m7', 'Ω', 4.7e-3],
  ['100n', 'F', 100e-9],
  ['15 pF', 'F', 15e-12],
  ['2.2 \u00b5', 'F', 2.2e-6], // MICRO SIGN U+00B5
  ['2.2 \u03bc', 'F', 2.2e-6], // GREEK SMALL LETTER MU U+03BC
  ['2.2u', 'F', 2.2e-6],
  ['2u2', 'F', 2.2e-6],
  ['4n7', 'F', 4.7e-9],
  ['1 fF', 'F', 1e-15],
  ['1F', 'F', 1], // F alone is the unit, f the prefix
  ['1e-9', 'F', 1e-9],
  ['1E3', undefined, 1000],
  ['0.33', undefined, 0.33],
  ['.5', 'V', 0.5],
  [' 4k7 ', 'Ω', 4700],
  ['-0.3 V', 'V', -0.3],
  ['\u22120.3 V', 'V', -0.3], // MINUS SIGN U+2212
  ['+5', 'V', 5],
  ['3V3', 'V', 3.3], // rail names (common practice)
  ['1V8', 'V', 1.8],
  ['16 mA', 'A', 0.016],
  ['300 ns', 's', 300e-9], // the fast-mode rise-time limit (I2C-bus specification)
  ['5 ms', 's', 5e-3],
  ['10 ns/V', 's/V', 10e-9],
  ['0', 'V', 0],
  ['-0', 'V', 0], // a plain 0, not -0
  ...iec60062.map(([code, ohms]): [string, Unit, number] => [code, 'Ω', ohms]),
];

// Refusals: each gives an error result with a message, never NaN, never a throw.
const refusedText: [text: string, unit: Unit | undefined, messageHas: string][] = [
  ['', 'Ω', 'nothing'],
  ['   ', 'Ω', 'nothing'],
  ['abc', 'Ω', 'expected'],
  ['4k7k', 'Ω', 'prefix'],
  ['1..2', 'V', 'digit after the decimal point'],
  ['1.2.3', 'V', 'expected'],
  ['5.', 'V', 'digit after the decimal point'],
  ['4.7 kV', 'Ω', 'in V'],
  ['4.7 V', 'Ω', 'in V'],
  ['4.7 kΩ', 'F', 'in Ω'],
  ['10 ms', 's/V', 'in s'],
  ['4.7 V', undefined, 'in V'],
  ['4,7k', 'Ω', 'decimal point'],
  ['1e3k', 'Ω', 'prefix'],
  ['1e400', 'Ω', 'too large'],
  ['1e-400', 'F', 'too small'],
  ['-4k7', 'Ω', 'negative'],
  ['-1 mA', 'A', 'negative'],
  ['-15 pF', 'F', 'negative'],
  ['4.7K', 'F', 'expected'], // K is no SI prefix; kilo is k
  ['4R7', undefined, 'expected'],
  ['4R7', 'F', 'expected'],
  ['1 2', 'V', 'expected'],
  ['NaN', 'V', 'expected'],
  ['Infinity', 'V', 'expected'],
  ['0x10', 'V', 'expected'],
  ['4.7 k Ω', 'Ω', 'expected'],
  ['R', 'Ω', 'expected'],
  ['k', 'Ω', 'expected'],
  ['- 5', 'V', 'expected'],
];

describe('parseQuantity reads engineering notation exactly', () => {
  it.each(parsed)('%j (%s) → %d', (text, unit, value) => {
    const r = parseQuantity(text, unit);
    expect(r).toEqual({ ok: true, value });
    if (r.ok) expect(Object.is(r.value, value)).toBe(true);
  });
});

describe('parseQuantity refuses with an error result', () => {
  it.each(refusedText)('%j (%s): "%s"', (text, unit, messageHas) => {
    let r: ReturnType<typeof parseQuantity> | undefined;
    expect(() => {
      r = parseQuantity(text, unit);
    }).not.toThrow();
    expect(r?.ok).toBe(false);
    expect(r).not.toHaveProperty('value');
    if (r !== undefined && !r.ok) expect(r.error).toContain(messageHas);
  });
});

describe('formatQuantity', () => {
  const cases: [value: number, unit: string, digits: number | undefined, text: string][] = [
    [4700, 'Ω', undefined, '4.7 kΩ'],
    [100e-9, 'F', undefined, '100 nF'],
    [2.4, 'V', undefined, '2.4 V'], // TTL VOH min (handbook)
    [0.016, 'A', undefined, '16 mA'], // TTL output-low current, 16 mA (handbook)
    [-0.3, 'V', undefined, '-0.3 V'],
    [300e-9, 's', undefined, '300 ns'],
    [0, 'V', undefined, '0 V'],
    [-0, 'V', undefined, '0 V'],
    [15e-12, 'F', undefined, '15 pF'],
    [2.2e-6, 'F', undefined, '2.2 \u00b5F'], // MICRO SIGN U+00B5
    [0.47, 'Ω', undefined, '0.47 Ω'], // 0.1 to 1: no prefix, as engineers write 0.4 V
    [0.4, 'V', undefined, '0.4 V'],
    [0.05, 'V', undefined, '50 mV'],
    [966.7, 'Ω', undefined, '967 Ω'], // I2C-bus Rp(min) at 3.3 V, 3 mA (worked value)
    [2950.6, 'Ω', undefined, '2.95 kΩ'], // I2C-bus Rp(max), standard-mode, 400 pF (worked value)
    [2950.6, 'Ω', 4, '2.951 kΩ'],
    [2950.6, 'Ω', 1, '3 kΩ'],
    [999.96, 'Ω', undefined, '1 kΩ'], // rounding carries into the next prefix
    [0.09996, 'A', undefined, '0.1 A'], // rounds to 0.1, which takes no prefix
    [0.0999, 'A', undefined, '99.9 mA'],
    [0.09996, 'V', undefined, '99.96 mV'], // volts keep up to four digits
    [4.7e6, 'Ω', undefined, '4.7 MΩ'],
    [1.5e9, 'Ω', undefined, '1.5 GΩ'],
    [1e12, 'Ω', undefined, '1000 GΩ'], // beyond G the number grows
    [1e-15, 'F', undefined, '0.001 pF'], // below p the number shrinks
    [1e-21, 'F', undefined, '1e-21 F'], // too small for any prefix
    [5e-3, 's', undefined, '5 ms'],
    [10e-9, 's/V', undefined, '10 ns/V'],
    [1 / 3, 'V', undefined, '0.3333 V'],
    [1 / 3, 'A', undefined, '0.333 A'],
    [3.3, '', undefined, '3.3'],
    [4700, '', undefined, '4.7 k'],
    [Infinity, 'Ω', undefined, '∞ Ω'],
    [-Infinity, 'V', undefined, '-∞ V'],
    [NaN, 'V', undefined, '—'],
  ];
  it.each(cases)('%d %s (digits %s) → %j', (value, unit, digits, text) => {
    expect(formatQuantity(value, unit, digits)).toBe(text);
  });
});

describe('formatQuantity output parses back', () => {
  const values: [value: number, unit: Unit][] = [
    [4700, 'Ω'],
    [0.47, 'Ω'],
    [47300, 'Ω'],
    [1.5e9, 'Ω'],
    [15e-12, 'F'],
    [2.2e-6, 'F'],
    [100e-9, 'F'],
    [1e-21, 'F'],
    [-0.3, 'V'],
    [3.3, 'V'],
    [0.016, 'A'],
    [300e-9, 's'],
    [10e-9, 's/V'],
  ];
  it.each(values)('%d %s', (value, unit) => {
    expect(parseQuantity(formatQuantity(value, unit), unit)).toEqual({ ok: true, value });
  });

  it('round-trips any value to its rounding (property)', () => {
    const units: Unit[] = ['Ω', 'F', 's', 's/V', 'A'];
    fc.assert(
      fc.property(
        fc.double({ min: 1e-16, max: 1e13, noNaN: true }),
        fc.constantFrom(...units),
        fc.integer({ min: 1, max: 8 }),
        (value, unit, digits) => {
          const r = parseQuantity(formatQuantity(value, unit, digits), unit);
          const expected = Number(value.toPrecision(digits));
          return r.ok && Math.abs(r.value - expected) <= 1e-12 * expected;
        },
      ),
    );
  });

  it('round-trips volts of either sign (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e4, max: 1e4, noNaN: true }), (value) => {
        const r = parseQuantity(formatQuantity(value, 'V'), 'V');
        const expected = Number(value.toPrecision(4)) + 0; // + 0 turns -0 into 0
        return r.ok && Math.abs(r.value - expected) <= 1e-12 * Math.abs(expected);
      }),
    );
  });
});

describe('IEC 60062 resistance codes', () => {
  it.each(iec60062)('parseIec60062(%j) = %d Ω', (code, ohms) => {
    expect(parseIec60062(code)).toEqual({ ok: true, value: ohms });
  });

  it.each(iec60062)('formatIec60062 writes %j for %d Ω', (code, ohms) => {
    expect(formatIec60062(ohms)).toBe(code);
  });

  // Beyond the seven examples: marking habits (common practice), three significant digits.
  const formatted: [ohms: number, code: string][] = [
    [1000, '1K0'],
    [10e3, '10K'],
    [100e3, '100K'],
    [1, '1R0'],
    [10, '10R'],
    [0, '0R'], // a zero-ohm link
    [0.1, 'R10'],
    [0.047, 'R047'],
    [4750, '4K75'],
    [12345, '12K3'],
    [999.6, '1K0'],
    [2.2e12, '2T2'],
  ];
  it.each(formatted)('formatIec60062(%d) = %j', (ohms, code) => {
    expect(formatIec60062(ohms)).toBe(code);
    expect(parseIec60062(code)).toEqual({ ok: true, value: Number(ohms.toPrecision(3)) });
  });

  it.each([-1, NaN, Infinity, 1e-4, 1e16])('formatIec60062(%d) is empty', (ohms) => {
    expect(formatIec60062(ohms)).toBe('');
  });

  it.each(['4k7', '4K7Ω', 'R', '', '4K7K', '47 K', '-4K7', '4.7K', 'K'])('parseIec60062 refuses %j', (code) => {
    const r = parseIec60062(code);
    expect(r.ok).toBe(false);
    expect(r).not.toHaveProperty('value');
  });
});

// formatQuantity remembers what it printed at the default digits: asking again, or at other
// digits in between, must give what a fresh call gives.
describe('formatQuantity remembered', () => {
  const values = [3.3, 3.3, -0, 0, Number.NaN, Number.POSITIVE_INFINITY, -1e-3, 4700, 999.96, 1.23456];
  it.each(['V', 'A', 'Ω'])('%s: the same text every time, and other digits are not remembered', (unit) => {
    const first = values.map((v) => formatQuantity(v, unit));
    const other = values.map((v) => formatQuantity(v, unit, 2));
    expect(values.map((v) => formatQuantity(v, unit))).toEqual(first);
    expect(values.map((v) => formatQuantity(v, unit, 2))).toEqual(other);
    expect(formatQuantity(1.23456, unit, 2)).not.toEqual(formatQuantity(1.23456, unit, 5));
  });
});
