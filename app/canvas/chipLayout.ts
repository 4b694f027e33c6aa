/**
 * Where a chip's pins go, and how big the chip and the parts between chips are drawn. These
 * numbers are the one source of the measures: styles.css draws with them through the custom
 * properties of `MEASURE_VARS` (set on the page's root at start), never with numbers of its own.
 */
import type { Part, Pin } from '../../rules/model/index.ts';
import {
  BODY_PADDING,
  BOTTOM_BORDER,
  CHIP_WIDTH,
  DISCRETE_SIZE,
  HEADER_HEIGHT,
  ROW_HEIGHT,
  STRIP_HEIGHT,
  TOP_BORDER,
} from '../../rules/routing/index.ts';

import { sideOf, type Side } from '../../rules/model/index.ts';

export { sideOf, type Side };

export interface PinLayout {
  readonly left: readonly Pin[];
  readonly right: readonly Pin[];
  readonly top: readonly Pin[];
  readonly bottom: readonly Pin[];
}

const cache = new WeakMap<readonly Pin[], PinLayout>();

export function pinLayout(pins: readonly Pin[]): PinLayout {
  const hit = cache.get(pins);
  if (hit !== undefined) return hit;
  const out: Record<Side, Pin[]> = { left: [], right: [], top: [], bottom: [] };
  for (const p of pins) out[sideOf(p)].push(p);
  cache.set(pins, out);
  return out;
}

// Shared with the PDF diagram (rules/ cannot import app/), so kept in rules/.
export { BODY_PADDING, BOTTOM_BORDER, CHIP_WIDTH, DISCRETE_SIZE, HEADER_HEIGHT, ROW_HEIGHT, STRIP_HEIGHT, TOP_BORDER };
/** Room around the chip inside its node, where the outer half of each handle sits. */
export const NODE_MARGIN = 6;
/** Space between the pins of a top or bottom row. */
export const STRIP_GAP = 10;
/** A pin's handle, square; its centre sits on the chip's edge. */
export const HANDLE_SIZE = 9;

/** The measures as the CSS custom properties styles.css draws with. */
export const MEASURE_VARS: Readonly<Record<string, string>> = {
  '--chip-margin': `${NODE_MARGIN}px`,
  '--chip-width': `${CHIP_WIDTH}px`,
  '--chip-top-border': `${TOP_BORDER}px`,
  '--chip-head-height': `${HEADER_HEIGHT - TOP_BORDER}px`,
  '--chip-row-height': `${ROW_HEIGHT}px`,
  '--chip-body-padding': `${BODY_PADDING / 2}px`,
  '--chip-strip-height': `${STRIP_HEIGHT}px`,
  '--chip-strip-gap': `${STRIP_GAP}px`,
  '--chip-border': `${BOTTOM_BORDER}px`,
  '--handle-size': `${HANDLE_SIZE}px`,
  '--discrete-width': `${DISCRETE_SIZE.width}px`,
  '--discrete-height': `${DISCRETE_SIZE.height}px`,
};

/** Set the measures on an element (the page's root), for styles.css to read. */
export function setMeasureVars(el: { readonly style: { setProperty(name: string, value: string): void } }): void {
  for (const [name, value] of Object.entries(MEASURE_VARS)) el.style.setProperty(name, value);
}

/**
 * The chip's drawn size, exactly as styles.css draws it: the node is given this size (plus its
 * margin), so that the browser can contain each chip's layout and paint (`contain: strict`).
 */
export function chipSize(part: Part): { width: number; height: number } {
  const hit = sizes.get(part.pins);
  if (hit !== undefined) return hit;
  const l = pinLayout(part.pins);
  const rows = Math.max(l.left.length, l.right.length);
  const body = rows > 0 ? rows * ROW_HEIGHT + BODY_PADDING : 0;
  const strips = (l.top.length > 0 ? STRIP_HEIGHT : 0) + (l.bottom.length > 0 ? STRIP_HEIGHT : 0);
  const size = { width: CHIP_WIDTH, height: HEADER_HEIGHT + body + strips + BOTTOM_BORDER };
  sizes.set(part.pins, size);
  return size;
}

const sizes = new WeakMap<readonly Pin[], { width: number; height: number }>();
