/**
 * One routing job and its answer, as the canvas hands them to its routing worker (or, where
 * there is no worker, runs them itself): the chips' boxes and the wires in; the routes that
 * changed, every wire's id, the junction dots and the runs a wire asks for its hops out.
 */
import { crossIndex, junctionsOf, type CrossIndex, type Box, type Point, type Route, type WireRouter, type WireSpec } from '../../rules/routing/index.ts';

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
  readonly crossings: CrossIndex;
}

export function solve(router: WireRouter, job: RouteJob): RouteReply {
  const { routes, changed } = router.update(job.boxes, job.wires);
  const byNet = new Map<string, Point[]>();
  for (const j of junctionsOf(routes.values())) {
    const list = byNet.get(j.net);
    if (list === undefined) byNet.set(j.net, [j.at]);
    else list.push(j.at);
  }
  return {
    seq: job.seq,
    ids: [...routes.keys()],
    changed: [...changed].map((id) => routes.get(id)!),
    junctions: [...byNet],
    crossings: crossIndex(routes.values()),
  };
}
