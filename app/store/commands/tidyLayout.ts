/**
 * Tidy layout: the chips arranged by signal flow, left to right, by a layered-layout library
 * (@dagrejs/dagre, MIT, synchronous, so that it runs inside a command's recipe): each net's
 * drivers lead to its receivers; a bidirectional pin counts as both. The parts between chips are
 * nodes too (design format version 2), taking the signal's direction from the chips on each of
 * their nets: a discrete's pin on a net with a chip output receives from it; on a net with chip
 * inputs and no output it drives them; on a net of bidirectional pins only (a FET-shifted bus)
 * its left pin (1, S, K, as the canvas draws it) receives and its right pin drives. One undo step.
 */
import { graphlib, layout } from '@dagrejs/dagre';
import { DISCRETE_PINS, type Design } from '../../../rules/model/index.ts';
import { chipSize, DISCRETE_SIZE, NODE_MARGIN } from '../../canvas/chipLayout.ts';
import { refuse, splitPinKey, type Command } from './command.ts';

/** Room between chips in one layer, and between layers: enough for a channel of wires either way. */
export const TIDY_GAP = { chips: 80, layers: 200 } as const;

/** Positions for every part and every part between chips, top-left corners rounded to the canvas's 10-unit grid. */
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
  const leftPin = new Set<string>();
  for (const d of design.discretes ?? []) {
    g.setNode(d.id, {
      width: DISCRETE_SIZE.width + 2 * NODE_MARGIN,
      height: DISCRETE_SIZE.height + 2 * NODE_MARGIN,
    });
    const [left] = DISCRETE_PINS[d.kind];
    leftPin.add(`${d.id}.${left}`);
  }
  for (const net of design.nets) {
    const drivers = new Set<string>();
    const receivers = new Set<string>();
    const roles = net.pins.map((key) => roleOf.get(key));
    const hasOutput = roles.includes('output');
    const hasInput = roles.includes('input');
    for (const key of net.pins) {
      const part = splitPinKey(key).part;
      if (!g.hasNode(part)) continue;
      let role = roleOf.get(key);
      // A discrete's pin: the signal's direction from the chips on the net.
      if (role === undefined) role = hasOutput ? 'input' : hasInput ? 'output' : leftPin.has(key) ? 'input' : 'output';
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
  for (const d of design.discretes ?? []) {
    const n = g.node(d.id) as { x: number; y: number; width: number; height: number };
    out.set(d.id, { x: Math.round((n.x - n.width / 2) / 10) * 10, y: Math.round((n.y - n.height / 2) / 10) * 10 });
  }
  return out;
}

export function tidyLayout(): Command {
  return {
    name: 'Tidy layout',
    recipe(design) {
      if (design.parts.length === 0) return refuse('There are no chips to arrange.');
      const at = tidyPositions(design as Design);
      for (const part of [...design.parts, ...(design.discretes ?? [])]) {
        const p = at.get(part.id)!;
        if (part.position?.x !== p.x || part.position?.y !== p.y) part.position = { x: p.x, y: p.y };
      }
    },
  };
}
