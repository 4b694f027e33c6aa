/**
 * Rail colours before they reach a style (issue 14: a rail's `colour` went into a CSS property
 * unchecked, and `url(...)` made the browser try a load). One grammar, `#rgb` or `#rrggbb`
 * (rules/model/colour.ts), held by the reader, by the colour command and by the chip's style.
 */
import { describe, expect, it } from 'vitest';
import { railStyle } from '../../app/canvas/railStyle.ts';
import { setRailColour } from '../../app/store/commands/index.ts';
import { isRailColour, longRailColour } from '../../rules/model/colour.ts';
import { readDesign } from '../../rules/model/reader.ts';
import { greenhouse } from '../model/fixtures.ts';
import { harness } from './harness.ts';

const valid = ['#abc', '#ABC', '#c0562b', '#C0562B', '#000000'];
const invalid = [
  'url(https://example.invalid/x.png)',
  'var(--accent)',
  'red',
  'rgb(1, 2, 3)',
  '#12',
  '#1234',
  '#12345g',
  ' #123456',
  '#123456 ',
  '#123456;background:url(x)',
  '',
  '#\u0661\u0662\u0663', // Arabic-Indic digits are not hexadecimal digits
];

describe('the colour grammar', () => {
  it.each(valid)('accepts %j', (c) => expect(isRailColour(c)).toBe(true));
  it.each(invalid)('refuses %j', (c) => expect(isRailColour(c)).toBe(false));
  it.each([
    ['#abc', '#aabbcc'],
    ['#C0562B', '#c0562b'],
    ['red', undefined],
  ])('longRailColour(%j) is %j (what the colour picker can show)', (c, long) => expect(longRailColour(c)).toBe(long));
});

describe('the reader', () => {
  it.each(valid)('accepts a rail coloured %j', (c) => {
    const d = greenhouse();
    d.rails[0]!.colour = c;
    const r = readDesign(JSON.stringify(d));
    expect(r.ok ? [] : r.errors).toEqual([]);
  });
  it.each(invalid)('refuses a rail coloured %j, naming the path', (c) => {
    const d = greenhouse();
    d.rails[0]!.colour = c;
    const r = readDesign(JSON.stringify(d));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors).toContainEqual({
      path: 'rails[0].colour',
      message: expect.stringContaining('expected a colour "#rgb" or "#rrggbb"'),
    });
  });
});

describe('the editor', () => {
  it.each(invalid)('the colour command refuses %j with a message', (c) => {
    const h = harness();
    const before = h.design;
    const out = h.apply(setRailColour(h.design.rails[0]!.id, c));
    expect(out.ok ? '' : out.reason).toMatch(/not a colour/);
    expect(h.design).toBe(before);
  });
  it.each(valid)('the colour command takes %j', (c) => {
    const h = harness();
    const id = h.design.rails[0]!.id;
    expect(h.apply(setRailColour(id, c)).ok).toBe(true);
    expect(h.design.rails[0]!.colour).toBe(c);
  });
  it.each(invalid)('a chip never puts %j into its style (a design held in memory without the reader)', (c) => {
    expect(railStyle(c)).toEqual({ '--rail': 'var(--rail-default)' });
  });
  it.each(valid)('a chip takes %j as its rail colour', (c) => {
    expect(railStyle(c)).toEqual({ '--rail': c });
  });
  it('a rail without a colour has the default', () => {
    expect(railStyle(undefined)).toEqual({ '--rail': 'var(--rail-default)' });
  });
});
