/**
 * The nearest free spot for a group of bodies (a paste, a duplicate, a new part): the smallest
 * move, on a grid, that leaves every body of the group clear of every body already placed (chips
 * and parts between chips), with a gap between them for the wires.
 */
import type { Design, Discrete, Part } from '../../rules/model/index.ts';
import { chipSize, DISCRETE_SIZE, NODE_MARGIN } from './chipLayout.ts';

export interface Rect {
  readonly x: number;
  readonly y: number;
  readonly width: number;
  readonly height: number;
}

/** Room kept between two bodies, px: a wire and its track pass between them. */
export const FREE_GAP = 24;
/** The grid the search steps on, px. */
export const FREE_STEP = 20;
/** How far the search looks, in steps (2,400 px each way); beyond it the group stays where it was asked. */
const MAX_RING = 120;
/** The side of an index cell, px. */
const CELL = 256;

const ORIGIN = { x: 0, y: 0 };

/** A chip's body as drawn: its position is the node's corner, the body inside the node's margin. */
export function partRect(part: Part): Rect {
  const at = part.position ?? ORIGIN;
  const { width, height } = chipSize(part);
  return { x: at.x + NODE_MARGIN, y: at.y + NODE_MARGIN, width, height };
}

export function discreteRect(d: Discrete): Rect {
  const at = d.position ?? ORIGIN;
  return { x: at.x + NODE_MARGIN, y: at.y + NODE_MARGIN, ...DISCRETE_SIZE };
}

/** Every body placed in the design: chips and parts between chips. */
export function bodiesOf(design: Design): Rect[] {
  return [...design.parts.map(partRect), ...(design.discretes ?? []).map(discreteRect)];
}

/** Bodies by the index cells they cover, so that a candidate looks only at its neighbours. */
class RectIndex {
  private readonly cells = new Map<string, Rect[]>();
  constructor(rects: readonly Rect[]) {
    for (const r of rects) for (const key of this.keys(r, 0)) this.cells.get(key)?.push(r) ?? this.cells.set(key, [r]);
  }
  private *keys(r: Rect, pad: number): Generator<string> {
    const x0 = Math.floor((r.x - pad) / CELL);
    const x1 = Math.floor((r.x + r.width + pad) / CELL);
    const y0 = Math.floor((r.y - pad) / CELL);
    const y1 = Math.floor((r.y + r.height + pad) / CELL);
    for (let i = x0; i <= x1; i++) for (let j = y0; j <= y1; j++) yield `${i},${j}`;
  }
  /** Whether `r` comes closer than `gap` to any body. */
  crowds(r: Rect, gap: number): boolean {
    for (const key of this.keys(r, gap)) {
      for (const b of this.cells.get(key) ?? []) {
        const apart =
          r.x + r.width + gap <= b.x ||
          b.x + b.width + gap <= r.x ||
          r.y + r.height + gap <= b.y ||
          b.y + b.height + gap <= r.y;
        if (!apart) return true;
      }
    }
    return false;
  }
}

/** Clockwise from the right (screen y grows downward): the order among moves of equal length. */
const turn = (dx: number, dy: number) => {
  const a = Math.atan2(dy, dx);
  return a < 0 ? a + 2 * Math.PI : a;
};

/**
 * The shortest move (dx, dy) on the grid after which no rect of `group` comes within `gap` of a
 * rect of `placed`; among moves of equal length, the first clockwise from the right. (0, 0)
 * when the group is already clear, and also when nothing is clear within the search's reach.
 */
export function nearestFreeOffset(
  placed: readonly Rect[],
  group: readonly Rect[],
  { gap = FREE_GAP, step = FREE_STEP }: { gap?: number; step?: number } = {},
): { dx: number; dy: number } {
  if (group.length === 0 || placed.length === 0) return { dx: 0, dy: 0 };
  const index = new RectIndex(placed);
  const clear = (dx: number, dy: number) =>
    group.every((r) => !index.crowds({ x: r.x + dx, y: r.y + dy, width: r.width, height: r.height }, gap));
  let best: { dx: number; dy: number; d: number; t: number } | undefined;
  for (let ring = 0; ring <= MAX_RING; ring++) {
    // Every move of a later ring is at least ring·step long.
    if (best !== undefined && ring * step > best.d) break;
    for (let i = -ring; i <= ring; i++) {
      for (let j = -ring; j <= ring; j++) {
        if (Math.max(Math.abs(i), Math.abs(j)) !== ring) continue;
        // (−0 would be a move of its own to a deep equality.)
        const dx = i === 0 ? 0 : i * step;
        const dy = j === 0 ? 0 : j * step;
        const d = Math.hypot(dx, dy);
        if (best !== undefined && (d > best.d || (d === best.d && turn(dx, dy) >= best.t))) continue;
        if (clear(dx, dy)) best = { dx, dy, d, t: turn(dx, dy) };
      }
    }
  }
  return best === undefined ? { dx: 0, dy: 0 } : { dx: best.dx, dy: best.dy };
}

/** The nearest corner to `at` where a chip drawn at `size` (its body, as `chipSize` gives) is clear of every body. */
export function freePlace(
  design: Design,
  at: { x: number; y: number },
  size: { width: number; height: number },
): { x: number; y: number } {
  const rect = { x: at.x + NODE_MARGIN, y: at.y + NODE_MARGIN, ...size };
  const { dx, dy } = nearestFreeOffset(bodiesOf(design), [rect]);
  return { x: at.x + dx, y: at.y + dy };
}
