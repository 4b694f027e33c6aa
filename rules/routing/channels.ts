/**
 * Wires routed in channels between part bodies: each wire leaves its pins straight out, then
 * takes the one channel (a vertical run between two horizontal ones, or the other way round)
 * whose path passes through the fewest bodies, then the shortest; runs of different nets that
 * fall on one channel line get tracks of their own. Pure and synchronous, so that the editor's
 * canvas and the PDF diagram draw the same routes; fast enough to re-route a moved part's
 * neighbourhood between two frames.
 */
import type { Point, Side } from './types.ts';

/** How far a wire leaves its pin straight out before it turns. */
export const STUB = 14;

const OUT: Readonly<Record<Side, Point>> = {
  left: { x: -1, y: 0 },
  right: { x: 1, y: 0 },
  top: { x: 0, y: -1 },
  bottom: { x: 0, y: 1 },
};

/** The outward direction of a side. */
export const normalOf = (side: Side): Point => OUT[side];

/** A pin's anchor as the router sees it: on the edge of its box, facing out of `side`. */
export interface PinAt {
  readonly side: Side;
  readonly at: Point;
}

/** A part body as the router sees it. */
export interface BodyRect {
  readonly x: number;
  readonly y: number;
  readonly width: number;
  readonly height: number;
}

/** An axis-aligned rectangle, canvas units; `seen` marks it as counted in one query. */
interface Rect {
  readonly x0: number;
  readonly y0: number;
  readonly x1: number;
  readonly y1: number;
  seen: number;
}

/** How far outside a box a wire must stay to count as clear of it, and where channels run. */
export const CLEARANCE = 5;
export const CHANNEL = 10;
const CELL = 240;
/**
 * Cells are counted from the origin up to this many either way (±63 million units); a box
 * beyond shares the outermost cell. A design may place a part anywhere a finite number allows,
 * and a cell index that large would no longer step by one (x + 1 === x) nor key uniquely.
 */
const MAX_CELL = 1 << 18;
/** Grid cells are keyed by one number, `i * ROW + j`, unique for indices within ±MAX_CELL. */
const ROW = 1 << 20;

const cellOf = (v: number): number => Math.max(-MAX_CELL, Math.min(MAX_CELL, Math.floor(v / CELL)));

interface Cell {
  readonly i: number;
  readonly j: number;
  readonly rects: Rect[];
}

/**
 * Part boxes in a coarse grid, so that a wire asks only the boxes near its segments. Queries
 * stamp the boxes they return instead of building sets: routing a thousand-part design asks
 * this some hundred thousand times. A query wider than the grid holds cells walks the occupied
 * cells instead of the rectangle's, so that a wire between two far-apart parts costs no more
 * than the design has parts.
 */
export class BoxIndex {
  private readonly cells = new Map<number, Cell>();
  private stamp = 0;

  constructor(boxes: Iterable<BodyRect>) {
    for (const b of boxes) {
      const r: Rect = {
        x0: b.x - CLEARANCE,
        y0: b.y - CLEARANCE,
        x1: b.x + b.width + CLEARANCE,
        y1: b.y + b.height + CLEARANCE,
        seen: 0,
      };
      const i1 = cellOf(r.x1);
      const j1 = cellOf(r.y1);
      for (let i = cellOf(r.x0); i <= i1; i++) {
        for (let j = cellOf(r.y0); j <= j1; j++) {
          const key = i * ROW + j;
          const cell = this.cells.get(key);
          if (cell === undefined) this.cells.set(key, { i, j, rects: [r] });
          else cell.rects.push(r);
        }
      }
    }
  }

  /** Starts a query: boxes visited from now on are reported once each. */
  begin(): number {
    return ++this.stamp;
  }

  /** Calls `visit` for each box not yet visited in query `stamp` whose cells meet the rectangle. */
  each(stamp: number, x0: number, y0: number, x1: number, y1: number, visit: (r: Rect) => void): void {
    const i0 = cellOf(x0);
    const i1 = cellOf(x1);
    const j0 = cellOf(y0);
    const j1 = cellOf(y1);
    const take = (cell: Cell | undefined) => {
      if (cell === undefined) return;
      for (const r of cell.rects) {
        if (r.seen === stamp) continue;
        r.seen = stamp;
        visit(r);
      }
    };
    if ((i1 - i0 + 1) * (j1 - j0 + 1) > this.cells.size) {
      for (const cell of this.cells.values())
        if (cell.i >= i0 && cell.i <= i1 && cell.j >= j0 && cell.j <= j1) take(cell);
      return;
    }
    for (let i = i0; i <= i1; i++) {
      for (let j = j0; j <= j1; j++) take(this.cells.get(i * ROW + j));
    }
  }
}

/** How many boxes an orthogonal polyline passes through (touching an edge does not count). */
function crossings(points: readonly Point[], index: BoxIndex): number {
  const stamp = index.begin();
  let hits = 0;
  for (let k = 1; k < points.length; k++) {
    const a = points[k - 1]!;
    const b = points[k]!;
    const lx = Math.min(a.x, b.x);
    const hx = Math.max(a.x, b.x);
    const ly = Math.min(a.y, b.y);
    const hy = Math.max(a.y, b.y);
    // A box met by an earlier segment is stamped and not counted twice; one that an earlier
    // segment's cells only passed near is stamped too, so test every candidate as it comes.
    index.each(stamp, lx, ly, hx, hy, (r) => {
      if (lx < r.x1 && hx > r.x0 && ly < r.y1 && hy > r.y0) hits++;
      else r.seen = stamp - 1;
    });
  }
  return hits;
}

function pathLength(points: readonly Point[]): number {
  let sum = 0;
  for (let k = 1; k < points.length; k++)
    sum += Math.abs(points[k]!.x - points[k - 1]!.x) + Math.abs(points[k]!.y - points[k - 1]!.y);
  return sum;
}

function dedupe(points: readonly Point[]): Point[] {
  return points.filter((pt, k) => k === 0 || pt.x !== points[k - 1]!.x || pt.y !== points[k - 1]!.y);
}

/** Channel positions worth trying between `lo` and `hi`: the middle, the ends, and beside nearby boxes. */
function channels(mid: number, ends: readonly number[], edges: readonly number[], limit: number): number[] {
  const near = [...new Set(edges)].sort((u, v) => Math.abs(u - mid) - Math.abs(v - mid)).slice(0, limit);
  // The outermost channels, clear of every box near the wire: the way round when all else is blocked.
  const outer = edges.length === 0 ? [] : [Math.min(...edges), Math.max(...edges)];
  return [...new Set([mid, ...ends, ...near, ...outer])];
}

/**
 * A wire's route: out of each pin by {@link STUB} to `p` and `q`, then one channel between
 * them: a vertical run at `at` between two horizontal ones (`x`), or the other way round (`y`).
 */
export interface Route {
  readonly a: PinAt;
  readonly b: PinAt;
  readonly p: Point;
  readonly q: Point;
  readonly axis: 'x' | 'y';
  readonly at: number;
}

function corners(p: Point, q: Point, axis: 'x' | 'y', at: number): Point[] {
  return axis === 'x' ? [p, { x: at, y: p.y }, { x: at, y: q.y }, q] : [p, { x: p.x, y: at }, { x: q.x, y: at }, q];
}

/**
 * Routes pin `a` to pin `b`: of the channels worth trying, the one whose path passes through
 * the fewest part boxes, then the shortest, then the one nearest half-way, never doubling
 * back into its own pins. Without `index`, boxes are not avoided.
 */
export function routeWire(a: PinAt, b: PinAt, index?: BoxIndex): Route {
  const na = normalOf(a.side);
  const nb = normalOf(b.side);
  const p = { x: a.at.x + na.x * STUB, y: a.at.y + na.y * STUB };
  const q = { x: b.at.x + nb.x * STUB, y: b.at.y + nb.y * STUB };
  const mid = { x: (p.x + q.x) / 2, y: (p.y + q.y) / 2 };
  const xEdges: number[] = [];
  const yEdges: number[] = [];
  if (index !== undefined) {
    const m = 4 * CHANNEL + STUB;
    index.each(
      index.begin(),
      Math.min(p.x, q.x) - m,
      Math.min(p.y, q.y) - m,
      Math.max(p.x, q.x) + m,
      Math.max(p.y, q.y) + m,
      (r) => {
        xEdges.push(r.x0 - CHANNEL + CLEARANCE, r.x1 + CHANNEL - CLEARANCE);
        yEdges.push(r.y0 - CHANNEL + CLEARANCE, r.y1 + CHANNEL - CLEARANCE);
      },
    );
  }
  const candidates: ['x' | 'y', number][] = [
    ...channels(mid.x, [p.x, q.x], xEdges, 12).map((v): ['x', number] => ['x', v]),
    ...channels(mid.y, [p.y, q.y], yEdges, 12).map((v): ['y', number] => ['y', v]),
  ];
  let best: Route = { a, b, p, q, axis: 'x', at: mid.x };
  let bestCost = Infinity;
  for (const [axis, at] of candidates) {
    const path = dedupe(corners(p, q, axis, at));
    let cost = pathLength(path) + 0.01 * Math.abs(at - mid[axis]);
    // Leaving a pin back towards its own box, or arriving from behind one, reads as a wrong connection.
    const first = path[1];
    if (first !== undefined && (first.x - p.x) * na.x + (first.y - p.y) * na.y < 0) cost += 400;
    const last = path[path.length - 2];
    if (last !== undefined && (last.x - q.x) * nb.x + (last.y - q.y) * nb.y < 0) cost += 400;
    if (index !== undefined && cost < bestCost) cost += 2000 * crossings(path, index);
    if (cost < bestCost) {
      bestCost = cost;
      best = { a, b, p, q, axis, at };
    }
  }
  return best;
}

/** The points of a route, its channel moved by `offset`; repeats dropped so that a dash pattern runs on. */
export function routePoints(route: Route, offset = 0): Point[] {
  return dedupe([route.a.at, ...corners(route.p, route.q, route.axis, route.at + offset), route.b.at]);
}

/** Room between wires of different nets that share a channel. */
const TRACK = 6;

/**
 * Offsets that keep wires of different nets apart where their channels coincide (pins in
 * the same columns give the same half-way channel): overlapping runs on one channel line get
 * tracks of their own, spread evenly about it; runs of one net may share a track.
 */
export function spreadChannels(routes: readonly { route: Route; net: string }[]): number[] {
  const offsets = routes.map(() => 0);
  const groups = new Map<string, number[]>();
  routes.forEach(({ route }, k) => {
    const [from, to] = route.axis === 'x' ? [route.p.y, route.q.y] : [route.p.x, route.q.x];
    if (from === to) return;
    const key = `${route.axis}${route.at}`;
    const list = groups.get(key);
    if (list === undefined) groups.set(key, [k]);
    else list.push(k);
  });
  const span = (k: number) => {
    const r = routes[k]!.route;
    const [u, v] = r.axis === 'x' ? [r.p.y, r.q.y] : [r.p.x, r.q.x];
    return [Math.min(u, v), Math.max(u, v)] as const;
  };
  for (const members of groups.values()) {
    if (members.length < 2) continue;
    members.sort((i, j) => span(i)[0] - span(j)[0]);
    const tracks: { end: number; net: string }[] = [];
    const track = new Map<number, number>();
    for (const k of members) {
      const [lo, hi] = span(k);
      const net = routes[k]!.net;
      let t = tracks.findIndex((tr) => tr.net === net || tr.end < lo - TRACK);
      if (t < 0) {
        tracks.push({ end: hi, net });
        t = tracks.length - 1;
      } else tracks[t] = { end: Math.max(tracks[t]!.end, hi), net };
      track.set(k, t);
    }
    for (const k of members) offsets[k] = (track.get(k)! - (tracks.length - 1) / 2) * TRACK;
  }
  return offsets;
}
