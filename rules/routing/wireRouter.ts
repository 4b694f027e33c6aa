/**
 * Every wire of a design routed by ./channels.ts, kept between edits: a wire is routed again
 * only when one of its pins moved or a part body changed within the stretch of canvas its
 * route was chosen from (the only boxes `routeWire` looks at); the tracks that keep runs of
 * different nets apart (./nudge.ts) are then dealt again over all wires.
 */
import { BoxIndex, CHANNEL, routePoints, routeWire, STUB, type PinAt, type Route as ChannelRoute } from './channels.ts';
import { nudge } from './nudge.ts';
import type { Box, Point, Route, WireSpec } from './types.ts';

interface Entry {
  readonly key: string;
  readonly route: ChannelRoute;
  readonly region: readonly [number, number, number, number];
}

/** How far beyond its stubs a route looks for boxes and channels (routeWire's own query, and one channel more). */
const REACH = 6 * CHANNEL + STUB;

const boxKey = (b: Box) => `${b.x},${b.y},${b.width},${b.height}`;

function samePoints(a: readonly Point[], b: readonly Point[]): boolean {
  if (a.length !== b.length) return false;
  for (let k = 0; k < a.length; k++) if (a[k]!.x !== b[k]!.x || a[k]!.y !== b[k]!.y) return false;
  return true;
}

export interface RouteUpdate {
  /** Every routed wire by id (a wire naming a pin that is not drawn is left out). */
  readonly routes: ReadonlyMap<string, Route>;
  /** The wires whose drawn route is new or different since the last update. */
  readonly changed: ReadonlySet<string>;
  /** How many wires were routed anew (the rest were taken from the last update). */
  readonly rerouted: number;
}

export class WireRouter {
  private entries = new Map<string, Entry>();
  private boxes = new Map<string, Box>();
  private routes = new Map<string, Route>();

  update(boxes: readonly Box[], wires: readonly WireSpec[]): RouteUpdate {
    const changedRects: Box[] = [];
    const next = new Map<string, Box>();
    for (const b of boxes) {
      next.set(b.id, b);
      const was = this.boxes.get(b.id);
      if (was === undefined) changedRects.push(b);
      else if (boxKey(was) !== boxKey(b)) changedRects.push(was, b);
    }
    for (const [id, b] of this.boxes) if (!next.has(id)) changedRects.push(b);
    this.boxes = next;

    const anchors = new Map<string, PinAt>();
    for (const b of boxes) for (const p of b.pins) anchors.set(p.key, { side: p.side, at: { x: p.x, y: p.y } });
    let index: BoxIndex | null = null;
    const touched = (r: readonly [number, number, number, number]) =>
      changedRects.some((b) => b.x < r[2] && b.x + b.width > r[0] && b.y < r[3] && b.y + b.height > r[1]);

    const entries = new Map<string, Entry>();
    const list: { route: ChannelRoute; net: string; spec: WireSpec }[] = [];
    let rerouted = 0;
    for (const w of wires) {
      const a = anchors.get(w.a);
      const b = anchors.get(w.b);
      if (a === undefined || b === undefined || w.a === w.b) continue;
      const key = `${a.side}${a.at.x},${a.at.y}|${b.side}${b.at.x},${b.at.y}`;
      const hit = this.entries.get(w.id);
      let entry: Entry;
      if (hit !== undefined && hit.key === key && !touched(hit.region)) entry = hit;
      else {
        index ??= new BoxIndex(boxes);
        const route = routeWire(a, b, index);
        const region = [
          Math.min(route.p.x, route.q.x) - REACH,
          Math.min(route.p.y, route.q.y) - REACH,
          Math.max(route.p.x, route.q.x) + REACH,
          Math.max(route.p.y, route.q.y) + REACH,
        ] as const;
        entry = { key, route, region };
        rerouted++;
      }
      entries.set(w.id, entry);
      list.push({ route: entry.route, net: w.net, spec: w });
    }
    this.entries = entries;

    const nudged = nudge(
      list.map(({ route, net }) => ({ net, points: routePoints(route) })),
      boxes,
    );
    const routes = new Map<string, Route>();
    const changed = new Set<string>();
    list.forEach(({ spec }, k) => {
      const points = nudged[k]!;
      const was = this.routes.get(spec.id);
      if (was !== undefined && was.net === spec.net && samePoints(was.points, points)) routes.set(spec.id, was);
      else {
        routes.set(spec.id, { id: spec.id, net: spec.net, points });
        changed.add(spec.id);
      }
    });
    this.routes = routes;
    return { routes, changed, rerouted };
  }
}

/** All wires routed once (the PDF, tests). */
export function routeOnce(boxes: readonly Box[], wires: readonly WireSpec[]): ReadonlyMap<string, Route> {
  return new WireRouter().update(boxes, wires).routes;
}
