/**
 * A chip's measures are kept once, in app/canvas/chipLayout.ts: the canvas lays nodes out and
 * routes wires by them, and styles.css draws with them through custom properties. Fails when
 * styles.css writes a chip's measure by hand again (the two would drift apart unseen: a wire
 * ending beside its pin, a chip clipped by its node), or uses a measure nobody sets.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import {
  BODY_PADDING,
  CHIP_WIDTH,
  HEADER_HEIGHT,
  MEASURE_VARS,
  setMeasureVars,
  TOP_BORDER,
} from '../../app/canvas/chipLayout.ts';

const css = readFileSync(new URL('../../app/styles.css', import.meta.url), 'utf8');

/** The declarations of the rule whose selector is exactly `selector` (comments taken out). */
function declarations(sheet: string, selector: string): Map<string, string> {
  const plain = sheet.replace(/\/\*[\s\S]*?\*\//g, '');
  const out = new Map<string, string>();
  for (const m of plain.matchAll(/([^{}]+)\{([^{}]*)\}/g)) {
    if (m[1]!.trim() !== selector) continue;
    for (const d of m[2]!.split(';')) {
      const at = d.indexOf(':');
      if (at > 0) out.set(d.slice(0, at).trim(), d.slice(at + 1).trim());
    }
  }
  return out;
}

/** Where styles.css sizes a chip, a pin row, a handle or a part between chips, and the custom property each must use. */
const MEASURED: readonly [selector: string, property: string, variable: string][] = [
  ['.rc-chip', 'margin', '--chip-margin'],
  ['.rc-chip', 'width', '--chip-width'],
  ['.rc-chip', 'border', '--chip-border'],
  ['.rc-chip', 'border-top', '--chip-top-border'],
  ['.rc-chip-head', 'height', '--chip-head-height'],
  ['.rc-chip-body', 'padding', '--chip-body-padding'],
  ['.rc-pin', 'height', '--chip-row-height'],
  ['.rc-strip', 'height', '--chip-strip-height'],
  ['.rc-strip', 'gap', '--chip-strip-gap'],
  ['.rc-strip .rc-pin', 'height', '--chip-strip-height'],
  ['.react-flow__handle.rc-handle', 'width', '--handle-size'],
  ['.react-flow__handle.rc-handle', 'height', '--handle-size'],
  ['.rc-discrete', 'margin', '--chip-margin'],
  ['.rc-discrete', 'width', '--discrete-width'],
  ['.rc-discrete', 'height', '--discrete-height'],
];

/** A length written by hand: a number with a unit. */
const BY_HAND = /(^|[\s(,])\d*\.?\d+(px|rem|em)\b/;

describe('the chip measures, kept once', () => {
  it.each(MEASURED)('%s { %s } uses var(%s) and no length of its own', (selector, property, variable) => {
    const value = declarations(css, selector).get(property);
    expect(value, `${selector} ${property}`).toBeDefined();
    expect(value).toContain(`var(${variable})`);
    expect(value).not.toMatch(BY_HAND);
  });

  it.each([
    ['width: 208px', true],
    ['3px solid var(--rail)', true],
    ['var(--chip-body-padding) 0', false],
    ['var(--chip-border) solid #8f9aa3', false],
    ['0.5em', true],
  ])('tells a length written by hand: %s → %s', (value, byHand) => {
    expect(BY_HAND.test(value)).toBe(byHand);
  });

  it('sets every custom property styles.css reads for a chip, and styles.css reads every one set', () => {
    const read = new Set([...css.matchAll(/var\((--(?:chip|handle|discrete)-[a-z-]+)\)/g)].map((m) => m[1]!));
    expect([...read].sort()).toEqual(Object.keys(MEASURE_VARS).sort());
  });

  it('sets them on the page root as lengths the layout numbers give', () => {
    const set = new Map<string, string>();
    setMeasureVars({ style: { setProperty: (k, v) => set.set(k, v) } });
    expect(Object.fromEntries(set)).toEqual(MEASURE_VARS);
    // What the layout counts whole, the stylesheet draws in parts: the header below its top
    // border, the body's padding half above and half below the rows.
    expect(MEASURE_VARS['--chip-width']).toBe(`${CHIP_WIDTH}px`);
    expect(MEASURE_VARS['--chip-head-height']).toBe(`${HEADER_HEIGHT - TOP_BORDER}px`);
    expect(MEASURE_VARS['--chip-body-padding']).toBe(`${BODY_PADDING / 2}px`);
  });
});
