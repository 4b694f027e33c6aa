/**
 * Keeps runs of different nets apart (ours, on top of the channel router): runs that lie on
 * one line, or closer than `spacing`, and overlap along it are dealt tracks `spacing` apart,
 * as a person drawing a schematic keeps parallel wires apart. A run is moved across its own
 * direction, its neighbours stretching to follow, so every run stays horizontal or vertical;
 * the short stub out of each pin never moves sideways (a pin's wire leaves it straight), and a
 * placement that would take a run into a part body is traded for one that does not.
 */
import { BoxIndex, type BodyRect } from './channels.ts';
import type { Point } from './types.ts';

export interface NudgeWire {
  readonly net: string;
  readonly points: readonly Point[];
}

/** Room between parallel runs of different nets, canvas units. */
export const SPACING = 8;
/** How long the straight stub out of a pin stays. */
const STUB_KEEP = 6;

interface Seg {
  readonly wire: number;
  /** Index of the run's first point. */
  readonly k: number;
  readonly net: string;
  readonly at: number;
  readonly lo: number;
  readonly hi: number;
  /** A jog beside a pin moves only so far that its stub still leaves the pin outwards: [min, max]. */
  readonly limit?: readonly [number, number];
}

/**
 * Each wire's points with a movable joint after its first stub and before its last one:
 * [A, S, S, …, T, T, B], where A→S and T→B are the pin stubs (S and T at `STUB_KEEP` from the pins).
 */
function withJoints(points: readonly Point[]): Point[] {
  const n = points.length;
  if (n < 2) return points.map((p) => ({ ...p }));
  const stubEnd = (a: Point, b: Point): Point => {
    const d = Math.abs(b.x - a.x) + Math.abs(b.y - a.y);
    const t = Math.min(1, STUB_KEEP / (d || 1));
    return { x: a.x + (b.x - a.x) * t, y: a.y + (b.y - a.y) * t };
  };
  const s = stubEnd(points[0]!, points[1]!);
  const t = stubEnd(points[n - 1]!, points[n - 2]!);
  return [
    { ...points[0]! },
    s,
    { ...s },
    ...points.slice(1, n - 1).map((p) => ({ ...p })),
    { ...t },
    t,
    { ...points[n - 1]! },
  ];
}

/** Drops repeated points and the middle of three in a line. */
export function tidy(points: readonly Point[]): Point[] {
  const out: Point[] = [];
  for (const p of points) {
    const last = out[out.length - 1];
    if (last !== undefined && last.x === p.x && last.y === p.y) continue;
    const before = out[out.length - 2];
    if (
      before !== undefined &&
      last !== undefined &&
      ((before.x === last.x && last.x === p.x) || (before.y === last.y && last.y === p.y))
    ) {
      // Keep a point where the line doubles back on itself (it is a corner of a U of zero width).
      const back = (last.x - before.x) * (p.x - last.x) + (last.y - before.y) * (p.y - last.y) < 0;
      if (!back) out.pop();
    }
    out.push(p);
  }
  return out;
}

/** Whether the run a→b passes through a body (closer than the router's clearance counts). */
function hitsBody(index: BoxIndex, a: Point, b: Point): boolean {
  const lx = Math.min(a.x, b.x);
  const hx = Math.max(a.x, b.x);
  const ly = Math.min(a.y, b.y);
  const hy = Math.max(a.y, b.y);
  let hit = false;
  index.each(index.begin(), lx, ly, hx, hy, (r) => {
    if (lx < r.x1 && hx > r.x0 && ly < r.y1 && hy > r.y0) hit = true;
  });
  return hit;
}

/** One pass over the runs of one direction. Returns how many runs moved. */
function pass(
  wires: Point[][],
  nets: readonly string[],
  horizontal: boolean,
  index: BoxIndex,
  spacing: number,
  jogs: boolean,
): number {
  const segs: Seg[] = [];
  wires.forEach((pts, w) => {
    const n = pts.length;
    // Runs between the joints (points 2 … n-3); the jogs beside the pins too when asked.
    for (let k = jogs ? 1 : 2; k + 1 <= (jogs ? n - 2 : n - 3); k++) {
      const a = pts[k]!;
      const b = pts[k + 1]!;
      if (horizontal ? a.y !== b.y || a.x === b.x : a.x !== b.x || a.y === b.y) continue;
      let limit: [number, number] | undefined;
      if (k === 1 || k === n - 3) {
        const pin = k === 1 ? pts[0]! : pts[n - 1]!;
        const at = horizontal ? a.y : a.x;
        const from = horizontal ? pin.y : pin.x;
        if (at === from) continue;
        limit = at > from ? [from + 2, Infinity] : [-Infinity, from - 2];
      }
      segs.push({
        wire: w,
        k,
        net: nets[w]!,
        at: horizontal ? a.y : a.x,
        lo: horizontal ? Math.min(a.x, b.x) : Math.min(a.y, b.y),
        hi: horizontal ? Math.max(a.x, b.x) : Math.max(a.y, b.y),
        ...(limit === undefined ? {} : { limit }),
      });
    }
  });
  segs.sort((u, v) => u.at - v.at || u.lo - v.lo);
  let moved = 0;
  const put = (p: Point, at: number): Point => (horizontal ? { x: p.x, y: at } : { x: at, y: p.y });
  // Clusters: runs chained by lines closer than `spacing`.
  for (let i = 0; i < segs.length; ) {
    let j = i + 1;
    while (j < segs.length && segs[j]!.at - segs[j - 1]!.at < spacing) j++;
    const cluster = segs.slice(i, j);
    i = j;
    if (cluster.length < 2) continue;
    // Does anything in it clash: two nets side by side along the line?
    const clash = cluster.some((s, a) =>
      cluster.some((t, b) => b > a && t.net !== s.net && Math.min(s.hi, t.hi) - Math.max(s.lo, t.lo) > -spacing),
    );
    if (!clash) continue;
    // Tracks by first come along the line; a run joins a track of its own net or one it does not meet.
    const byLo = [...cluster].sort((u, v) => u.lo - v.lo || u.at - v.at);
    const tracks: { end: number; net: string; sum: number; count: number }[] = [];
    const trackOf = new Map<Seg, number>();
    for (const s of byLo) {
      let t = tracks.findIndex((tr) => tr.net === s.net || tr.end < s.lo - spacing);
      if (t < 0) {
        tracks.push({ end: s.hi, net: s.net, sum: 0, count: 0 });
        t = tracks.length - 1;
      }
      const tr = tracks[t]!;
      tracks[t] = { end: Math.max(tr.end, s.hi), net: s.net, sum: tr.sum + s.at, count: tr.count + 1 };
      trackOf.set(s, t);
    }
    const n = tracks.length;
    if (n < 2) continue;
    // Tracks keep the order of the runs' old lines, so that wires cross each other no more than before.
    const order = tracks
      .map((_, t) => t)
      .sort((u, v) => tracks[u]!.sum / tracks[u]!.count - tracks[v]!.sum / tracks[v]!.count);
    const rank = new Map(order.map((t, r) => [t, r]));
    const centre = cluster.reduce((sum, s) => sum + s.at, 0) / cluster.length;
    // Centred on the old lines, else slid along: the first that enters no body (the run itself
    // or the runs either side of it, which stretch to follow).
    const centred = Math.round(centre - ((n - 1) / 2) * spacing);
    const starts = [centred];
    // Then slid either way, half a track at a time, nearest first.
    for (let k = 1; k <= 2 * n + 2; k++) starts.push(centred + (k * spacing) / 2, centred - (k * spacing) / 2);
    let best: number | null = null;
    for (const start of starts) {
      let bad = false;
      for (const s of cluster) {
        const at = start + rank.get(trackOf.get(s)!)! * spacing;
        if (at === s.at) continue;
        if (s.limit !== undefined && (at < s.limit[0] || at > s.limit[1])) bad = true;
        const pts = wires[s.wire]!;
        const a = put(pts[s.k]!, at);
        const b = put(pts[s.k + 1]!, at);
        if (
          bad ||
          hitsBody(index, a, b) ||
          (s.k > 0 && hitsBody(index, pts[s.k - 1]!, a)) ||
          (s.k + 2 < pts.length && hitsBody(index, b, pts[s.k + 2]!))
        ) {
          bad = true;
          break;
        }
      }
      if (!bad) {
        best = start;
        break;
      }
    }
    // Better two wires close than one through a chip: such a cluster stays as it was.
    if (best === null) continue;
    for (const s of cluster) {
      const at = best + rank.get(trackOf.get(s)!)! * spacing;
      if (at === s.at) continue;
      const pts = wires[s.wire]!;
      pts[s.k] = put(pts[s.k]!, at);
      pts[s.k + 1] = put(pts[s.k + 1]!, at);
      moved++;
    }
  }
  return moved;
}

/**
 * The wires with runs of different nets kept `spacing` apart where the router put them on one
 * line or too close; `boxes` are the part bodies that moved runs must stay out of.
 */
export function nudge(wires: readonly NudgeWire[], boxes: readonly BodyRect[], spacing = SPACING): Point[][] {
  const work = wires.map((w) => withJoints(w.points));
  const nets = wires.map((w) => w.net);
  const index = new BoxIndex(boxes);
  for (let round = 0; round < 4; round++) {
    // The jogs beside the pins join in from the second round, once the runs they lead to have moved.
    const jogs = round > 0;
    const moved = pass(work, nets, true, index, spacing, jogs) + pass(work, nets, false, index, spacing, jogs);
    if (moved === 0) break;
  }
  return work.map(tidy);
}
