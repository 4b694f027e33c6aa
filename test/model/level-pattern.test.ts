/**
 * The published schema's Level pattern against the reader's parser (rules/levels/level.ts):
 * the grammar of design-format.md, transcribed:
 *   level := term (("+" | "-") term)*;  term := ["-"] factor ("*" factor)*, at most one VDD;
 *   factor := decimal | "VDD";  decimal := digits ["." digits] | "." digits.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseLevel } from '../../rules/levels/level.ts';
import { LEVEL_PATTERN } from '../../rules/model/schema.ts';

const pattern = new RegExp(LEVEL_PATTERN);

describe('LEVEL_PATTERN', () => {
  const cases: { text: string; ok: boolean }[] = [
    { text: '2.0', ok: true },
    { text: '0.7*VDD', ok: true },
    { text: 'VDD-0.45', ok: true },
    { text: '0.65*VDD+0.1', ok: true },
    { text: ' 0.5 * VDD - 0.1 ', ok: true },
    { text: '-0.2+VDD*0.9', ok: true },
    { text: '.5*VDD', ok: true },
    { text: 'VDD - -0.5', ok: true },
    { text: '2*0.35*VDD*1', ok: true },
    { text: '', ok: false },
    { text: '5.', ok: false },
    { text: '.', ok: false },
    { text: '0.7*VDD*VDD', ok: false },
    { text: 'VDD+', ok: false },
    { text: '2VDD', ok: false },
    { text: 'VDD/2', ok: false },
    { text: '1e3', ok: false },
    { text: '--1', ok: false },
    { text: '1++2', ok: false },
    { text: 'vdd', ok: false },
  ];
  it.each(cases)('"$text" → $ok, as the parser says', ({ text, ok }) => {
    expect(pattern.test(text)).toBe(ok);
    expect(parseLevel(text).ok).toBe(ok);
  });

  it('agrees with the parser on random token strings', () => {
    const token = fc.constantFrom('VDD', '*', '+', '-', ' ', '.', '0', '7', '12', '.5', '3.3', 'V', '/');
    fc.assert(
      fc.property(fc.array(token, { maxLength: 9 }), (tokens) => {
        const text = tokens.join('');
        expect(pattern.test(text)).toBe(parseLevel(text).ok);
      }),
      { numRuns: 2000 },
    );
  });
});
