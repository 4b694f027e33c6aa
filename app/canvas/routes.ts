/**
 * The canvas's wire routes: chip bodies and pin anchors measured as styles.css draws them,
 * routed by the router the PDF diagram uses (rules/routing) in a worker of their own (a large
 * design takes longer than a frame), and kept in a small store so that each wire reads its
 * route by id and only the wires whose route changed draw again. Routes follow the design, not
 * a drag: while a drag lasts, the wires on the dragged chips are drawn straight from pin to pin
 * (WireEdge), and until a route arrives a wire is drawn that way too.
 */
import { createStore } from 'zustand/vanilla';
import type { Discrete, Net, Part } from '../../rules/model/index.ts';
import {
  WireRouter,
  type Anchor,
  type Box,
  type Hop,
  type Point,
  type Route,
  type WireSpec,
} from '../../rules/routing/index.ts';
import { solve, unpackHops, type HopMemory, type RouteJob, type RouteReply } from './routeJob.ts';
import { netWires, wireId } from '../store/commands/index.ts';
import {
  BODY_PADDING,
  CHIP_WIDTH,
  chipSize,
  DISCRETE_SIZE,
  HANDLE_SIZE,
  HEADER_HEIGHT,
  NODE_MARGIN,
  pinLayout,
  ROW_HEIGHT,
  STRIP_GAP,
  STRIP_HEIGHT,
  TOP_BORDER,
} from './chipLayout.ts';

export interface RouteState {
  readonly routes: ReadonlyMap<string, Route>;
  /** Each wire's hops over the wires of other nets it crosses (none: not in the map). */
  readonly hops: ReadonlyMap<string, readonly Hop[]>;
  /** Branch points by net id. */
  readonly junctions: ReadonlyMap<string, readonly Point[]>;
}

const EMPTY: RouteState = { routes: new Map(), hops: new Map(), junctions: new Map() };

/** A side handle's centre sits on the chip's edge; React Flow ends a wire on the handle's outer edge. */
const HANDLE_HALF = HANDLE_SIZE / 2;
/** Width of a top or bottom pin's cell in its strip (its text's width: centred, STRIP_GAP apart). */
const STRIP_PIN = 34;

const boxCache = new WeakMap<object, WeakMap<object, Box>>();

/**
 * A part's body and anchors. Top and bottom pins are spread evenly; their handles sit where
 * the strip's text puts them, and WireEdge draws a wire to where React Flow has the handle.
 */
export function chipBox(part: Part): Box {
  const position = part.position ?? ORIGIN;
  let byPos = boxCache.get(part.pins);
  const hit = byPos?.get(position);
  if (hit !== undefined && hit.id === part.id) return hit;
  const { width, height } = chipSize(part);
  const x = position.x + NODE_MARGIN;
  const y = position.y + NODE_MARGIN;
  const l = pinLayout(part.pins);
  const top = l.top.length > 0 ? STRIP_HEIGHT : 0;
  const rowY = (k: number) =>
    y + TOP_BORDER + top + (HEADER_HEIGHT - TOP_BORDER) + BODY_PADDING / 2 + (k + 0.5) * ROW_HEIGHT;
  const spread = (k: number, n: number) => x + CHIP_WIDTH / 2 + (k - (n - 1) / 2) * (STRIP_PIN + STRIP_GAP);
  const pins: Anchor[] = [];
  const key = (id: string) => `${part.id}.${id}`;
  l.left.forEach((p, k) => {
    pins.push({ key: key(p.id), side: 'left', x: x - HANDLE_HALF, y: rowY(k) });
  });
  l.right.forEach((p, k) => {
    pins.push({ key: key(p.id), side: 'right', x: x + width + HANDLE_HALF, y: rowY(k) });
  });
  l.top.forEach((p, k) => {
    pins.push({ key: key(p.id), side: 'top', x: spread(k, l.top.length), y: y - HANDLE_HALF });
  });
  l.bottom.forEach((p, k) => {
    pins.push({ key: key(p.id), side: 'bottom', x: spread(k, l.bottom.length), y: y + height + HANDLE_HALF });
  });
  const box: Box = { id: part.id, x, y, width, height, pins };
  if (byPos === undefined) boxCache.set(part.pins, (byPos = new WeakMap()));
  byPos.set(position, box);
  return box;
}

const ORIGIN = { x: 0, y: 0 };

/** The two pins of each kind of part between chips, left then right (DiscreteNode.tsx draws them so). */
const DISCRETE_ENDS: Readonly<Record<Discrete['kind'], readonly [string, string]>> = {
  resistor: ['1', '2'],
  'fet-shifter': ['S', 'D'],
  'diode-shifter': ['K', 'A'],
};

const discreteBoxes = new WeakMap<Discrete, Box>();

/** A part between chips as an obstacle with its two anchors, at mid-height on each side (a tied end has none). */
export function discreteBox(d: Discrete): Box {
  const hit = discreteBoxes.get(d);
  if (hit !== undefined) return hit;
  const position = d.position ?? ORIGIN;
  const x = position.x + NODE_MARGIN;
  const y = position.y + NODE_MARGIN;
  const { width, height } = DISCRETE_SIZE;
  const [left, right] = DISCRETE_ENDS[d.kind];
  const tied = (pin: string) => d.kind === 'resistor' && d.tie?.[pin as '1' | '2'] !== undefined;
  const pins: Anchor[] = [];
  if (!tied(left)) pins.push({ key: `${d.id}.${left}`, side: 'left', x: x - HANDLE_HALF, y: y + height / 2 });
  if (!tied(right))
    pins.push({ key: `${d.id}.${right}`, side: 'right', x: x + width + HANDLE_HALF, y: y + height / 2 });
  const box: Box = { id: d.id, x, y, width, height, pins };
  discreteBoxes.set(d, box);
  return box;
}

function sameList<T>(a: readonly T[], b: readonly T[]): boolean {
  return a.length === b.length && a.every((x, k) => x === b[k]);
}

/** One per canvas: the routing worker, the last inputs and the store the wires read. */
export function createRouteKeeper() {
  const store = createStore<RouteState>(() => EMPTY);
  let lastBoxes: Box[] = [];
  let lastNets: readonly Net[] | null = null;
  const wiresOf = new WeakMap<Net, WireSpec[]>();
  // Made on the first job (and again after `dispose`); without workers (a test's DOM), the same job runs here.
  let worker: Worker | null = null;
  const local = typeof Worker === 'undefined' ? new WireRouter() : null;
  const localMemory: HopMemory = new Map();
  let seq = 0;
  let busy = false;
  /** The newest job waiting while the worker is busy; older ones are dropped unrouted. */
  let queued: RouteJob | null = null;

  function apply(reply: RouteReply): void {
    const was = store.getState();
    const fresh = new Map(reply.changed.map((r) => [r.id, r]));
    const routes = new Map<string, Route>();
    for (const id of reply.ids) {
      const r = fresh.get(id) ?? was.routes.get(id);
      if (r !== undefined) routes.set(id, r);
    }
    // Dots kept by identity where they did not change, so that their wires stay as drawn.
    const junctions = new Map<string, readonly Point[]>();
    for (const [net, list] of reply.junctions) {
      const old = was.junctions.get(net);
      junctions.set(
        net,
        old !== undefined && old.length === list.length && old.every((p, k) => p.x === list[k]!.x && p.y === list[k]!.y)
          ? old
          : list,
      );
    }
    // Hops arrive only for the wires whose hops changed; the rest keep theirs (and their drawing).
    let hops = was.hops;
    if (reply.hops.length > 0 || was.routes.size !== routes.size) {
      const next = new Map<string, readonly Hop[]>();
      for (const [id, list] of was.hops) if (routes.has(id)) next.set(id, list);
      for (const [id, flat] of reply.hops) {
        if (flat.length === 0) next.delete(id);
        else next.set(id, unpackHops(id, flat));
      }
      hops = next;
    }
    store.setState({ routes, hops, junctions }, true);
  }

  function send(job: RouteJob): void {
    if (local !== null) {
      apply(solve(local, job, localMemory));
      return;
    }
    if (worker === null) {
      worker = new Worker(new URL('./routeWorker.ts', import.meta.url), { type: 'module' });
      worker.onmessage = (e: MessageEvent<RouteReply>) => {
        busy = false;
        apply(e.data);
        if (queued !== null) {
          const next = queued;
          queued = null;
          send(next);
        }
      };
    }
    if (busy) {
      queued = job;
      return;
    }
    busy = true;
    worker.postMessage(job);
  }

  /** Routes the design's wires again where its geometry or nets changed. */
  function update(parts: readonly Part[], nets: readonly Net[], discretes: readonly Discrete[] = []): void {
    const boxes = discretes.length === 0 ? parts.map(chipBox) : [...parts.map(chipBox), ...discretes.map(discreteBox)];
    // A recolouring edit makes new part objects of the same geometry: nothing to route.
    if (nets === lastNets && sameList(boxes, lastBoxes)) return;
    lastBoxes = boxes;
    lastNets = nets;
    const wires: WireSpec[] = [];
    for (const net of nets) {
      let list = wiresOf.get(net);
      if (list === undefined) {
        list = netWires(net).map(([a, b]) => ({ id: wireId(net.id, a, b), net: net.id, a, b }));
        wiresOf.set(net, list);
      }
      wires.push(...list);
    }
    send({ seq: ++seq, boxes, wires });
  }

  /** Ends the worker; the next update starts a new one and routes everything. */
  function dispose(): void {
    worker?.terminate();
    worker = null;
    busy = false;
    queued = null;
    lastBoxes = [];
    lastNets = null;
  }

  return { store, update, dispose };
}

export type RouteKeeper = ReturnType<typeof createRouteKeeper>;
