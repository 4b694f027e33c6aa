/**
 * Tidy layout: the chips arranged by signal flow, left to right, by a layered-layout library
 * (@dagrejs/dagre, MIT, synchronous, so that it runs inside a command's recipe): each net's
 * drivers lead to its receivers; a bidirectional pin counts as both. One undo step.
 */
import { graphlib, layout } from '@dagrejs/dagre';
import type { Design } from '../../../rules/model/schema.ts';
import { chipSize, NODE_MARGIN } from '../../canvas/chipLayout.ts';
import { refuse, splitPinKey, type Command } from './command.ts';

/** Room between chips in one layer, and between layers: enough for a channel of wires either way. */
export const TIDY_GAP = { chips: 80, layers: 200 } as const;

/** Positions for every part, top-left corners rounded to the canvas's 10-unit grid. */
export function tidyPositions(design: Design): Map<string, { x: number; y: number }> {
  const g = new graphlib.Graph({ multigraph: false });
  g.setGraph({ rankdir: 'LR', nodesep: TIDY_GAP.chips, ranksep: TIDY_GAP.layers, marginx: 40, marginy: 40 });
  g.setDefaultEdgeLabel(() => ({}));
  const roleOf = new Map<string, string>();
  for (const part of design.parts) {
    const size = chipSize(part);
    g.setNode(part.id, { width: size.width + 2 * NODE_MARGIN, height: size.height + 2 * NODE_MARGIN });
    for (const pin of part.pins) roleOf.set(`${part.id}.${pin.id}`, pin.role);
  }
  for (const net of design.nets) {
    const drivers = new Set<string>();
    const receivers = new Set<string>();
    for (const key of net.pins) {
      const role = roleOf.get(key);
      const part = splitPinKey(key).part;
      if (!g.hasNode(part)) continue;
      if (role === 'output' || role === 'bidir') drivers.add(part);
      if (role === 'input' || role === 'bidir') receivers.add(part);
    }
    for (const d of drivers)
      for (const r of receivers) if (d !== r && !g.hasEdge(d, r) && !g.hasEdge(r, d)) g.setEdge(d, r);
  }
  layout(g);
  const out = new Map<string, { x: number; y: number }>();
  for (const part of design.parts) {
    const n = g.node(part.id) as { x: number; y: number; width: number; height: number };
    out.set(part.id, { x: Math.round((n.x - n.width / 2) / 10) * 10, y: Math.round((n.y - n.height / 2) / 10) * 10 });
  }
  return out;
}

export function tidyLayout(): Command {
  return {
    name: 'Tidy layout',
    recipe(design) {
      if (design.parts.length === 0) return refuse('There are no chips to arrange.');
      const at = tidyPositions(design as Design);
      for (const part of design.parts) {
        const p = at.get(part.id)!;
        if (part.position?.x !== p.x || part.position?.y !== p.y) part.position = { x: p.x, y: p.y };
      }
    },
  };
}
