/** Where a chip's pins go, and how big the chip is drawn (the CSS in styles.css follows these numbers). */
import type { Part, Pin } from '../../rules/model/schema.ts';

export type Side = NonNullable<Pin['side']>;

/** The side the design gives, else inputs left and outputs and bidir pins right. */
export function sideOf(pin: Pin): Side {
  return pin.side ?? (pin.role === 'input' ? 'left' : 'right');
}

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

export const CHIP_WIDTH = 208;
/** Room around the chip inside its node, where the outer half of each handle sits (styles.css, .rc-chip). */
export const NODE_MARGIN = 6;
/** The rail-coloured top border and the header (styles.css: border-top 3px, .rc-chip-head 41px). */
/** The drawn size of a part between chips: its symbol, designator and value (styles.css .rc-discrete). */
export const DISCRETE_SIZE = { width: 120, height: 64 } as const;

export const HEADER_HEIGHT = 44;
export const ROW_HEIGHT = 20;
/** Padding above and below the pin rows (.rc-chip-body). */
export const BODY_PADDING = 6;
export const STRIP_HEIGHT = 30;
export const BOTTOM_BORDER = 1;

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

/**
 * The first place near `at` where a chip of `size` overlaps no part, trying a widening ring
 * of grid points around it.
 */
export function freePlace(
  parts: readonly Part[],
  at: { x: number; y: number },
  size: { width: number; height: number },
): { x: number; y: number } {
  const gap = 24;
  const boxes = parts.map((p) => ({ ...(p.position ?? { x: 0, y: 0 }), ...chipSize(p) }));
  const free = (x: number, y: number) =>
    boxes.every(
      (b) =>
        x + size.width + gap <= b.x ||
        b.x + b.width + gap <= x ||
        y + size.height + gap <= b.y ||
        b.y + b.height + gap <= y,
    );
  const step = 40;
  for (let ring = 0; ring < 30; ring++) {
    for (let dx = -ring; dx <= ring; dx++) {
      for (let dy = -ring; dy <= ring; dy++) {
        if (Math.max(Math.abs(dx), Math.abs(dy)) !== ring) continue;
        const x = at.x + dx * step;
        const y = at.y + dy * step;
        if (free(x, y)) return { x, y };
      }
    }
  }
  return at;
}
