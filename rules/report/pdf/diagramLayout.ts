/**
 * Where the diagram puts things, in the design's own canvas units: part boxes at their
 * `position`, pin anchors on the box sides, and each net's wires as right-angled polylines.
 * The box geometry takes the editor's chip measures (app/canvas/chipLayout.ts; rules/ cannot
 * import app/), so that parts the editor shows apart are apart on paper too. Pure: no jsPDF.
 */
import type { Design, Net, Part, Pin } from '../../model/schema.ts';

export type Side = NonNullable<Pin['side']>;

/** The editor's chip measures, canvas units. */
export const CHIP = { width: 208, header: 44, row: 20, strip: 30, pad: 4 } as const;

/** How far a wire leaves its pin straight out before it turns. */
export const STUB = 14;

export interface Point {
  readonly x: number;
  readonly y: number;
}

export interface PinPlace {
  /** `PART.PIN` */
  readonly key: string;
  readonly pin: Pin;
  readonly side: Side;
  /** The anchor on the box edge. */
  readonly at: Point;
}

export interface PartBox {
  readonly part: Part;
  readonly x: number;
  readonly y: number;
  readonly width: number;
  readonly height: number;
  /** Top of the header (below the top pin strip, if any). */
  readonly headerTop: number;
  readonly pins: readonly PinPlace[];
}

export interface Bounds {
  readonly minX: number;
  readonly minY: number;
  readonly maxX: number;
  readonly maxY: number;
}

/** The side the design gives, else inputs left and outputs and bidir pins right (as the editor). */
export function sideOf(pin: Pin): Side {
  return pin.side ?? (pin.role === 'input' ? 'left' : 'right');
}

const OUT: Readonly<Record<Side, Point>> = { left: { x: -1, y: 0 }, right: { x: 1, y: 0 }, top: { x: 0, y: -1 }, bottom: { x: 0, y: 1 } };

/** The outward direction of a side. */
export const normalOf = (side: Side): Point => OUT[side];

/**
 * How far from the origin the diagram places a part: a design may put one anywhere a finite
 * number allows, but a box at 1e308 would overflow its own far edge to Infinity, and with it the
 * drawing's scale. Such a part is drawn at this distance instead (a billion canvas units: far
 * beyond any real drawing, so the placement of every sane design is untouched).
 */
const FARTHEST = 1e9;

const onCanvas = (v: number): number => Math.max(-FARTHEST, Math.min(FARTHEST, v));

/** A part's box and its pin anchors. */
export function partBox(part: Part): PartBox {
  const by: Record<Side, Pin[]> = { left: [], right: [], top: [], bottom: [] };
  for (const pin of part.pins) by[sideOf(pin)].push(pin);
  const rows = Math.max(by.left.length, by.right.length, 1);
  const topStrip = by.top.length > 0 ? CHIP.strip : 0;
  const bottomStrip = by.bottom.length > 0 ? CHIP.strip : 0;
  const x = onCanvas(part.position?.x ?? 0);
  const y = onCanvas(part.position?.y ?? 0);
  const width = CHIP.width;
  const height = topStrip + CHIP.header + CHIP.pad + rows * CHIP.row + CHIP.pad + bottomStrip;
  const rowY = (k: number) => y + topStrip + CHIP.header + CHIP.pad + (k + 0.5) * CHIP.row;
  const spread = (k: number, n: number) => x + (width * (k + 0.5)) / n;
  const pins: PinPlace[] = [];
  const place = (pin: Pin, side: Side, at: Point) => pins.push({ key: `${part.id}.${pin.id}`, pin, side, at });
  by.left.forEach((pin, k) => place(pin, 'left', { x, y: rowY(k) }));
  by.right.forEach((pin, k) => place(pin, 'right', { x: x + width, y: rowY(k) }));
  by.top.forEach((pin, k) => place(pin, 'top', { x: spread(k, by.top.length), y }));
  by.bottom.forEach((pin, k) => place(pin, 'bottom', { x: spread(k, by.bottom.length), y: y + height }));
  return { part, x, y, width, height, headerTop: y + topStrip, pins };
}

/**
 * The pin pairs drawn as wires: the net's `route` pairs that name two different pins of the
 * net (each pair once), then, for pins that the route leaves unconnected, a chain through
 * the pins in the net's order. So a net without a route is a chain, and every pin is reached.
 */
export function netWires(net: Net): [string, string][] {
  const on = new Set(net.pins);
  const parent = new Map<string, string>(net.pins.map((p) => [p, p]));
  const find = (p: string): string => {
    let r = p;
    while (parent.get(r) !== r) r = parent.get(r)!;
    parent.set(p, r);
    return r;
  };
  const wires: [string, string][] = [];
  const seen = new Set<string>();
  for (const [a, b] of net.route ?? []) {
    if (a === b || !on.has(a) || !on.has(b)) continue;
    const key = a < b ? `${a}\u0000${b}` : `${b}\u0000${a}`;
    if (seen.has(key)) continue;
    seen.add(key);
    wires.push([a, b]);
    parent.set(find(a), find(b));
  }
  const first = net.pins[0];
  for (let k = 1; k < net.pins.length; k++) {
    const p = net.pins[k]!;
    if (first !== undefined && find(p) !== find(first)) {
      wires.push([net.pins[k - 1]!, p]);
      parent.set(find(p), find(first));
    }
  }
  return wires;
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
const CLEARANCE = 5;
const CHANNEL = 10;
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

  constructor(boxes: readonly PartBox[]) {
    for (const b of boxes) {
      const r: Rect = { x0: b.x - CLEARANCE, y0: b.y - CLEARANCE, x1: b.x + b.width + CLEARANCE, y1: b.y + b.height + CLEARANCE, seen: 0 };
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
      for (const cell of this.cells.values()) if (cell.i >= i0 && cell.i <= i1 && cell.j >= j0 && cell.j <= j1) take(cell);
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
  for (let k = 1; k < points.length; k++) sum += Math.abs(points[k]!.x - points[k - 1]!.x) + Math.abs(points[k]!.y - points[k - 1]!.y);
  return sum;
}

function dedupe(points: readonly Point[]): Point[] {
  return points.filter((pt, k) => k === 0 || pt.x !== points[k - 1]!.x || pt.y !== points[k - 1]!.y);
}

/** Channel positions worth trying between `lo` and `hi`: the middle, the ends, and beside nearby boxes. */
function channels(mid: number, ends: readonly number[], edges: readonly number[], limit: number): number[] {
  const near = [...new Set(edges)].sort((u, v) => Math.abs(u - mid) - Math.abs(v - mid)).slice(0, limit);
  return [...new Set([mid, ...ends, ...near])];
}

/**
 * A wire's route: out of each pin by {@link STUB} to `p` and `q`, then one channel between
 * them: a vertical run at `at` between two horizontal ones (`x`), or the other way round (`y`).
 */
export interface Route {
  readonly a: PinPlace;
  readonly b: PinPlace;
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
export function routeWire(a: PinPlace, b: PinPlace, index?: BoxIndex): Route {
  const na = normalOf(a.side);
  const nb = normalOf(b.side);
  const p = { x: a.at.x + na.x * STUB, y: a.at.y + na.y * STUB };
  const q = { x: b.at.x + nb.x * STUB, y: b.at.y + nb.y * STUB };
  const mid = { x: (p.x + q.x) / 2, y: (p.y + q.y) / 2 };
  const xEdges: number[] = [];
  const yEdges: number[] = [];
  if (index !== undefined) {
    const m = 4 * CHANNEL + STUB;
    index.each(index.begin(), Math.min(p.x, q.x) - m, Math.min(p.y, q.y) - m, Math.max(p.x, q.x) + m, Math.max(p.y, q.y) + m, (r) => {
      xEdges.push(r.x0 - CHANNEL + CLEARANCE, r.x1 + CHANNEL - CLEARANCE);
      yEdges.push(r.y0 - CHANNEL + CLEARANCE, r.y1 + CHANNEL - CLEARANCE);
    });
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

/** One wire of a net, ready to draw. */
export interface Wire {
  readonly net: Net;
  readonly points: readonly Point[];
}

/** Everything the diagram draws, in canvas units. */
export interface DiagramLayout {
  readonly boxes: readonly PartBox[];
  readonly wires: readonly Wire[];
  /** Each net's first placed pin, where its name is written. */
  readonly netLabels: readonly { net: Net; pin: PinPlace }[];
  /** Everything drawn, with room for stubs and net names; null for a design without parts. */
  readonly bounds: Bounds | null;
}

/** Room beside the drawing for net names written outside the outermost pins. */
const LABEL_ROOM = { x: 70, y: 24 };

/** Lays out the design's parts and wires. Pins a net names that do not exist are skipped. */
export function layoutDiagram(design: Design): DiagramLayout {
  const boxes = design.parts.map(partBox);
  const index = new BoxIndex(boxes);
  const anchors = new Map<string, PinPlace>();
  for (const box of boxes) for (const p of box.pins) anchors.set(p.key, p);
  const routes: { route: Route; net: string; source: Net }[] = [];
  const netLabels: { net: Net; pin: PinPlace }[] = [];
  for (const net of design.nets) {
    const first = net.pins.map((k) => anchors.get(k)).find((p) => p !== undefined);
    if (first !== undefined) netLabels.push({ net, pin: first });
    for (const [a, b] of netWires(net)) {
      const pa = anchors.get(a);
      const pb = anchors.get(b);
      if (pa !== undefined && pb !== undefined) routes.push({ route: routeWire(pa, pb, index), net: net.id, source: net });
    }
  }
  const offsets = spreadChannels(routes);
  const wires: Wire[] = routes.map((r, k) => ({ net: r.source, points: routePoints(r.route, offsets[k]) }));
  if (boxes.length === 0) return { boxes, wires, netLabels, bounds: null };
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const b of boxes) {
    minX = Math.min(minX, b.x - STUB - LABEL_ROOM.x);
    minY = Math.min(minY, b.y - STUB - LABEL_ROOM.y);
    maxX = Math.max(maxX, b.x + b.width + STUB + LABEL_ROOM.x);
    maxY = Math.max(maxY, b.y + b.height + STUB + LABEL_ROOM.y);
  }
  return { boxes, wires, netLabels, bounds: { minX, minY, maxX, maxY } };
}
