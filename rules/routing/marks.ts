/**
 * What makes routed wires readable as a schematic is read (common practice in schematic
 * drawing): a dot where a net branches, and a hop where a wire crosses one of another net, so
 * that a crossing can never be taken for a join. Pure geometry over the routes.
 */
import type { Point, Route } from './types.ts';

/** A horizontal run of one wire hops over a vertical run of another net at `x`. */
export interface Hop {
  readonly wire: string;
  /** Index of the horizontal segment (points[k] → points[k + 1]). */
  readonly segment: number;
  readonly x: number;
}

export interface Marks {
  /** Where a net branches: three or more of its runs meet. */
  readonly junctions: readonly { net: string; at: Point }[];
  /** Hops by wire id, each wire's in the order its segments run. */
  readonly hops: ReadonlyMap<string, readonly Hop[]>;
}

/** The radius of a hop, canvas units. */
export const HOP = 4;

/**
 * Hops are drawn on a wire that crosses at most this many wires of other nets: a wire crossing
 * dozens reads no better for a row of arcs than for plain crossings (a dot still marks every
 * join), and each arc costs a rasteriser (measured: 21,936 arcs in one working view of the
 * generated 1,000-part board took an edit from 56 to 677 ms to the painted frame).
 */
export const MAX_HOPS = 12;

const DIRS = { left: 1, right: 2, up: 4, down: 8 } as const;

/** Which ways the segment a→b leaves point p, as a bit set (0 when p is not on it). */
function waysFrom(a: Point, b: Point, p: Point): number {
  if (a.y === b.y && p.y === a.y) {
    const lo = Math.min(a.x, b.x);
    const hi = Math.max(a.x, b.x);
    if (p.x < lo || p.x > hi || lo === hi) return 0;
    return (p.x > lo ? DIRS.left : 0) | (p.x < hi ? DIRS.right : 0);
  }
  if (a.x === b.x && p.x === a.x) {
    const lo = Math.min(a.y, b.y);
    const hi = Math.max(a.y, b.y);
    if (p.y < lo || p.y > hi || lo === hi) return 0;
    return (p.y > lo ? DIRS.up : 0) | (p.y < hi ? DIRS.down : 0);
  }
  return 0;
}

const bits = (n: number) => (n & 1) + ((n >> 1) & 1) + ((n >> 2) & 1) + ((n >> 3) & 1);

/** Branch points of one net's routes: a route's corner or end where runs leave in three or four ways. */
function netJunctions(routes: readonly Route[]): Point[] {
  const candidates = new Map<string, Point>();
  for (const r of routes) for (const p of r.points) candidates.set(`${p.x},${p.y}`, p);
  const out: Point[] = [];
  for (const p of candidates.values()) {
    let ways = 0;
    for (const r of routes) {
      for (let k = 1; k < r.points.length; k++) ways |= waysFrom(r.points[k - 1]!, r.points[k]!, p);
    }
    if (bits(ways) >= 3) out.push(p);
  }
  return out;
}

interface Run {
  readonly wire: string;
  readonly net: string;
  readonly segment: number;
  /** The run's fixed coordinate (y of a horizontal run, x of a vertical one). */
  readonly at: number;
  readonly lo: number;
  readonly hi: number;
}

/** The vertical runs of a set of routes sorted by x: what a horizontal run asks for its hops. */
export interface CrossIndex {
  readonly vertical: readonly Run[];
}

function runsOf(r: Route, horizontal: boolean, out: Run[]): void {
  for (let k = 1; k < r.points.length; k++) {
    const a = r.points[k - 1]!;
    const b = r.points[k]!;
    if (horizontal && a.y === b.y && a.x !== b.x)
      out.push({ wire: r.id, net: r.net, segment: k - 1, at: a.y, lo: Math.min(a.x, b.x), hi: Math.max(a.x, b.x) });
    else if (!horizontal && a.x === b.x && a.y !== b.y)
      out.push({ wire: r.id, net: r.net, segment: k - 1, at: a.x, lo: Math.min(a.y, b.y), hi: Math.max(a.y, b.y) });
  }
}

export function crossIndex(routes: Iterable<Route>): CrossIndex {
  const vertical: Run[] = [];
  for (const r of routes) runsOf(r, false, vertical);
  vertical.sort((u, v) => u.at - v.at);
  return { vertical };
}

/**
 * One wire's hops: where a horizontal run of it crosses a vertical run of another net. Asked
 * per wire, so that a canvas works out only the wires it draws.
 */
export function hopsOf(route: Route, index: CrossIndex): Hop[] {
  const { vertical } = index;
  const firstAtLeast = (x: number) => {
    let lo = 0;
    let hi = vertical.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (vertical[mid]!.at < x) lo = mid + 1;
      else hi = mid;
    }
    return lo;
  };
  const runs: Run[] = [];
  runsOf(route, true, runs);
  const out: Hop[] = [];
  for (const h of runs) {
    // A hop needs room for its arc inside the run, clear of the run's own corners.
    for (let k = firstAtLeast(h.lo + HOP + 1); k < vertical.length && vertical[k]!.at <= h.hi - HOP - 1; k++) {
      const v = vertical[k]!;
      if (v.net === h.net || h.at <= v.lo || h.at >= v.hi) continue;
      out.push({ wire: h.wire, segment: h.segment, x: v.at });
    }
  }
  return out;
}

/** Branch points by net. */
export function junctionsOf(routes: Iterable<Route>): { net: string; at: Point }[] {
  const byNet = new Map<string, Route[]>();
  for (const r of routes) {
    const list = byNet.get(r.net);
    if (list === undefined) byNet.set(r.net, [r]);
    else list.push(r);
  }
  const junctions: { net: string; at: Point }[] = [];
  for (const [net, list] of byNet)
    if (list.length > 1) for (const at of netJunctions(list)) junctions.push({ net, at });
  return junctions;
}

/** Junction dots and hops for a set of routes (hops only on wires with at most MAX_HOPS). */
export function markRoutes(routes: Iterable<Route>): Marks {
  const list = [...routes];
  const index = crossIndex(list);
  const hops = new Map<string, Hop[]>();
  for (const r of list) {
    const h = hopsOf(r, index);
    if (h.length > 0 && h.length <= MAX_HOPS) hops.set(r.id, h);
  }
  return { junctions: junctionsOf(list), hops };
}

/**
 * The hops of one segment in the order the segment runs, two closer than an arc's width merged
 * into the first (one arc reads as crossing both).
 */
function segmentHops(a: Point, b: Point, hops: readonly Hop[], segment: number): number[] {
  const dir = Math.sign(b.x - a.x);
  const xs = hops
    .filter((h) => h.segment === segment)
    .map((h) => h.x)
    .sort((u, v) => dir * (u - v));
  const out: number[] = [];
  for (const x of xs) if (out.length === 0 || Math.abs(x - out[out.length - 1]!) > 2 * HOP + 1) out.push(x);
  return out;
}

/** An SVG path for a route, each hop a half circle over the wire it crosses. */
export function svgPath(points: readonly Point[], hops: readonly Hop[] = []): string {
  if (points.length === 0) return '';
  let d = `M${points[0]!.x},${points[0]!.y}`;
  for (let k = 1; k < points.length; k++) {
    const a = points[k - 1]!;
    const b = points[k]!;
    if (a.y === b.y && hops.length > 0) {
      const dir = Math.sign(b.x - a.x);
      for (const x of segmentHops(a, b, hops, k - 1)) {
        // Over the top whichever way the run goes: clockwise left to right, counter-clockwise back.
        d += `L${x - dir * HOP},${a.y}A${HOP},${HOP} 0 0 ${dir > 0 ? 1 : 0} ${x + dir * HOP},${a.y}`;
      }
    }
    d += `L${b.x},${b.y}`;
  }
  return d;
}

/** The same route as a polyline, each hop a half circle of `steps` chords (for a PDF, which draws lines). */
export function hopPolyline(points: readonly Point[], hops: readonly Hop[] = [], steps = 6): Point[] {
  const out: Point[] = points.length > 0 ? [points[0]!] : [];
  for (let k = 1; k < points.length; k++) {
    const a = points[k - 1]!;
    const b = points[k]!;
    if (a.y === b.y && hops.length > 0) {
      const dir = Math.sign(b.x - a.x);
      for (const x of segmentHops(a, b, hops, k - 1)) {
        for (let s = 0; s <= steps; s++) {
          const t = (Math.PI * s) / steps;
          out.push({ x: x - dir * HOP * Math.cos(t), y: a.y - HOP * Math.sin(t) });
        }
      }
    }
    out.push(b);
  }
  return out;
}
