/**
 * Measures of a drawing that say whether it can be misread: how long two wires of different
 * nets run on one track (closer than a wire is wide), and how far a wire runs inside a part's
 * body. The unit tests and the browser test judge routes with these.
 */
import type { Point } from './types.ts';

export interface DrawnWire {
  readonly net: string;
  readonly points: readonly Point[];
}

export interface Rect {
  readonly id: string;
  readonly x: number;
  readonly y: number;
  readonly width: number;
  readonly height: number;
}

interface Seg {
  readonly net: string;
  readonly horizontal: boolean;
  readonly at: number;
  readonly lo: number;
  readonly hi: number;
}

function segments(wires: readonly DrawnWire[]): Seg[] {
  const out: Seg[] = [];
  for (const w of wires) {
    for (let k = 1; k < w.points.length; k++) {
      const a = w.points[k - 1]!;
      const b = w.points[k]!;
      if (a.y === b.y && a.x !== b.x)
        out.push({ net: w.net, horizontal: true, at: a.y, lo: Math.min(a.x, b.x), hi: Math.max(a.x, b.x) });
      else if (a.x === b.x && a.y !== b.y)
        out.push({ net: w.net, horizontal: false, at: a.x, lo: Math.min(a.y, b.y), hi: Math.max(a.y, b.y) });
    }
  }
  return out;
}

export interface SharedTrack {
  readonly nets: readonly [string, string];
  /** Length of the run the two share, canvas units. */
  readonly length: number;
  readonly at: Point;
}

/**
 * Runs of wires of different nets closer than `width` to each other (so drawn as one line) and
 * side by side for more than `width`: the longest such stretch for each pair of nets.
 */
export function sharedTracks(wires: readonly DrawnWire[], width: number): SharedTrack[] {
  const segs = segments(wires);
  const worst = new Map<string, SharedTrack>();
  for (const horizontal of [true, false]) {
    const list = segs.filter((s) => s.horizontal === horizontal).sort((u, v) => u.at - v.at);
    for (let i = 0; i < list.length; i++) {
      const s = list[i]!;
      for (let j = i + 1; j < list.length && list[j]!.at - s.at < width; j++) {
        const t = list[j]!;
        if (t.net === s.net) continue;
        const length = Math.min(s.hi, t.hi) - Math.max(s.lo, t.lo);
        if (length <= width) continue;
        const nets: [string, string] = s.net < t.net ? [s.net, t.net] : [t.net, s.net];
        const key = nets.join('\u0000');
        const mid = (Math.max(s.lo, t.lo) + Math.min(s.hi, t.hi)) / 2;
        const at = horizontal ? { x: mid, y: s.at } : { x: s.at, y: mid };
        if ((worst.get(key)?.length ?? 0) < length) worst.set(key, { nets, length, at });
      }
    }
  }
  return [...worst.values()].sort((u, v) => v.length - u.length);
}

export interface BodyCrossing {
  readonly net: string;
  readonly part: string;
  readonly length: number;
}

/**
 * Runs that pass inside a part's body by more than `tolerance` (a wire ends on a pin at the
 * body's edge; touching the edge is not crossing it).
 */
export function bodyCrossings(wires: readonly DrawnWire[], rects: readonly Rect[], tolerance = 1): BodyCrossing[] {
  const out: BodyCrossing[] = [];
  for (const s of segments(wires)) {
    for (const r of rects) {
      const [x0, x1, y0, y1] = [
        r.x + tolerance,
        r.x + r.width - tolerance,
        r.y + tolerance,
        r.y + r.height - tolerance,
      ];
      const length = s.horizontal
        ? s.at > y0 && s.at < y1
          ? Math.min(s.hi, x1) - Math.max(s.lo, x0)
          : 0
        : s.at > x0 && s.at < x1
          ? Math.min(s.hi, y1) - Math.max(s.lo, y0)
          : 0;
      if (length > 0) out.push({ net: s.net, part: r.id, length });
    }
  }
  return out;
}

/**
 * The points of an SVG path: M, L, H, V, the A of a hop (which ends on the line it leaves), and
 * the end point of a Q or C corner (a rounded corner, as React Flow's own step paths draw),
 * absolute commands only.
 */
export function pathPoints(d: string): Point[] {
  const out: Point[] = [];
  const re = /([MLHVAQC])([^MLHVAQC]*)/g;
  let m: RegExpExecArray | null;
  let x = 0;
  let y = 0;
  while ((m = re.exec(d)) !== null) {
    const nums = (m[2]!.match(/-?\d*\.?\d+(?:e[-+]?\d+)?/gi) ?? []).map(Number);
    switch (m[1]) {
      case 'H':
        x = nums[0]!;
        break;
      case 'V':
        y = nums[0]!;
        break;
      case 'A':
        x = nums[5]!;
        y = nums[6]!;
        break;
      case 'Q':
        x = nums[2]!;
        y = nums[3]!;
        break;
      case 'C':
        x = nums[4]!;
        y = nums[5]!;
        break;
      default:
        x = nums[0]!;
        y = nums[1]!;
    }
    out.push({ x, y });
  }
  return out;
}
