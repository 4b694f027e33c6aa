import { describe, expect, it } from 'vitest';
import { compileLevel, levelAt, parseLevel } from '../../rules/levels/level.ts';

// The grammar under test is the project's own (design-format.md, "Params"):
//   level := term (("+" | "-") term)*;  term := ["-"] factor ("*" factor)*, at most one VDD;
//   factor := decimal | "VDD";  decimal := digits ["." digits] | "." digits.
// Expected (a, b) of `a + b·VDD` are worked by hand from that grammar.
const accepted: [text: string, a: number, b: number][] = [
  ['2.0', 2, 0], // a fixed threshold, e.g. the TTL VIH of 2.0 V (JESD7 / TTL data books, handbook)
  ['0.7*VDD', 0, 0.7], // I2C-bus specification VIH = 0.7·VDD
  ['0.3*VDD', 0, 0.3], // I2C-bus specification VIL = 0.3·VDD
  ['VDD-0.45', -0.45, 1], // a VOH of VDD − 0.45 V (JESD8-7 style, from memory)
  ['0.65*VDD+0.1', 0.1, 0.65],
  [' - VDD + 5 ', 5, -1],
  ['.5*VDD', 0, 0.5],
  ['VDD*0.7', 0, 0.7],
  ['VDD', 0, 1],
  ['-VDD', 0, -1],
  ['VDD+0.5', 0.5, 1], // CMOS abs max VDD + 0.5 V (common practice)
  ['0.5*VDD*2', 0, 1], // several numeric factors multiply
  ['2*3', 6, 0],
  ['VDD - VDD', 0, 0],
  ['1 - -1', 2, 0], // a term may start with "-", also after a binary "-"
  ['007', 7, 0], // digits may have leading zeros
  ['3.3-0.5*VDD+0.2*VDD', 3.3, -0.3],
  ['0', 0, 0],
];

// Each must be refused with ok:false, never a throw, never a value.
const refused: [text: string, why: string][] = [
  ['process.exit()', 'code, not a Level'],
  ['VDD**2', 'exponentiation is not in the grammar'],
  ['VDD*VDD', 'two VDD in one term is not linear'],
  ['2*VDD*0.5*VDD', 'two VDD in one term, apart'],
  ['1e3', 'no exponent notation'],
  ['2.', 'a decimal point needs digits after it'],
  ['.', 'a lone decimal point'],
  ['0x10', 'no hexadecimal'],
  ['VDD;1', 'no statements'],
  ['Math.max(1,2)', 'no calls'],
  ['', 'empty'],
  ['   ', 'only spaces'],
  ['+1', 'no unary plus'],
  ['--1', 'one unary minus per term'],
  ['1 2', 'two numbers without an operator'],
  ['vdd', 'VDD is upper case'],
  ['(VDD)', 'no parentheses'],
  ['VDD/2', 'no division'],
  ['VDD+', 'a trailing operator'],
  ['*VDD', 'a leading "*"'],
  ['VDD*', 'a trailing "*"'],
  ['0.7 VDD', 'juxtaposition is not multiplication'],
  ['VDDVDD', 'two factors without an operator'],
  ['2VDD', 'a number glued to VDD'],
  ['Infinity', 'not a decimal'],
  ['NaN', 'not a decimal'],
  ['1,5', 'the decimal point is "."'],
  ['\u0661', 'only ASCII digits (Arabic-Indic one)'],
  ['\uff11', 'only ASCII digits (full-width one)'],
  [`1${'0'.repeat(400)}`, 'a number too large to be finite'],
  [`VDD*${'9'.repeat(400)}`, 'a coefficient too large to be finite'],
];

describe('parseLevel accepts the Level grammar', () => {
  it.each(accepted)('%j → a=%d, b=%d', (text, a, b) => {
    const r = parseLevel(text);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.level.a).toBeCloseTo(a, 12);
    expect(r.level.b).toBeCloseTo(b, 12);
  });
});

describe('parseLevel refuses everything else without throwing', () => {
  it.each(refused)('%j (%s)', (text) => {
    let r: ReturnType<typeof parseLevel> | undefined;
    expect(() => {
      r = parseLevel(text);
    }).not.toThrow();
    expect(r?.ok).toBe(false);
    if (r === undefined || r.ok) return;
    expect(r.error.length).toBeGreaterThan(0);
    expect(r.at).toBeGreaterThanOrEqual(0);
    expect(r.at).toBeLessThanOrEqual(text.length);
    expect(r).not.toHaveProperty('level');
  });
});

describe('levelAt evaluates a + b·VDD', () => {
  const cases: [level: string | number, vdd: number, volts: number][] = [
    ['0.7*VDD', 3.3, 2.31], // I2C-bus specification VIH at 3.3 V
    ['0.3*VDD', 5, 1.5], // I2C-bus specification VIL at 5 V
    ['VDD+0.5', 3.3, 3.8], // CMOS abs max (common practice)
    ['VDD-0.45', 1.8, 1.35],
    [2.0, 5, 2.0], // a number is volts, whatever VDD is
    [0.8, 0, 0.8],
  ];
  it.each(cases)('%j at VDD=%d → %d V', (level, vdd, volts) => {
    expect(levelAt(level, vdd)).toBeCloseTo(volts, 12);
  });
});

describe('compileLevel', () => {
  it('returns the same compiled object for the same string (cached)', () => {
    expect(compileLevel('0.65*VDD+0.1')).toBe(compileLevel('0.65*VDD+0.1'));
  });
  it('takes a number as a fixed voltage', () => {
    expect(compileLevel(2.4)).toEqual({ a: 2.4, b: 0 });
  });
  it.each(['VDD*VDD', '1e3', ''])(
    'throws, naming the Level, on %j (only an unvalidated document reaches it)',
    (text) => {
      expect(() => compileLevel(text)).toThrow(`Level "${text}"`);
    },
  );
});
