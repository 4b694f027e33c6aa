/**
 * One routing job and its answer, as the canvas hands them to its routing worker (or, where
 * there is no worker, runs them itself): the chips' boxes and the wires in; the routes that
 * changed, every wire's id, the junction dots, and the hops of the wires whose hops changed
 * (a large design crosses itself hundreds of thousands of times: worked out here, off the
 * painting thread, and handed over only where they changed).
 */
import {
  crossIndex,
  hopsOf,
  junctionsOf,
  MAX_HOPS,
  type Box,
  type Hop,
  type Point,
  type Route,
  type WireRouter,
  type WireSpec,
} from '../../rules/routing/index.ts';

export interface RouteJob {
  readonly seq: number;
  readonly boxes: readonly Box[];
  readonly wires: readonly WireSpec[];
}

export interface RouteReply {
  readonly seq: number;
  /** Every routed wire, in order. */
  readonly ids: readonly string[];
  /** The routes that are new or changed since the last reply. */
  readonly changed: readonly Route[];
  readonly junctions: readonly (readonly [string, readonly Point[]])[];
  /** Wires whose hops changed, with their hops as [segment, x, segment, x, …] (empty: none now). */
  readonly hops: readonly (readonly [string, readonly number[]])[];
}

/** What the worker last sent of each wire's hops, to send only what changed. */
export type HopMemory = Map<string, string>;

export function unpackHops(wire: string, flat: readonly number[]): Hop[] {
  const out: Hop[] = [];
  for (let k = 0; k + 1 < flat.length; k += 2) out.push({ wire, segment: flat[k]!, x: flat[k + 1]! });
  return out;
}

export function solve(router: WireRouter, job: RouteJob, memory: HopMemory): RouteReply {
  const { routes, changed } = router.update(job.boxes, job.wires);
  const byNet = new Map<string, Point[]>();
  for (const j of junctionsOf(routes.values())) {
    const list = byNet.get(j.net);
    if (list === undefined) byNet.set(j.net, [j.at]);
    else list.push(j.at);
  }
  const index = crossIndex(routes.values());
  const hops: [string, number[]][] = [];
  for (const r of routes.values()) {
    const flat: number[] = [];
    const list = hopsOf(r, index);
    // A wire crossing dozens of others is drawn without hops (marks.ts, MAX_HOPS).
    if (list.length <= MAX_HOPS) for (const h of list) flat.push(h.segment, h.x);
    const key = flat.join(',');
    if ((memory.get(r.id) ?? '') !== key) hops.push([r.id, flat]);
    if (key === '') memory.delete(r.id);
    else memory.set(r.id, key);
  }
  for (const id of memory.keys()) if (!routes.has(id)) memory.delete(id);
  return {
    seq: job.seq,
    ids: [...routes.keys()],
    changed: [...changed].map((id) => routes.get(id)!),
    junctions: [...byNet],
    hops,
  };
}
