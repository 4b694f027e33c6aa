import type { Design } from '../../rules/model/index.ts';
import { netWires, parseWireId, samePair } from './commands/netGraph.ts';

/** What is selected: parts, wires (by wire id), and the net the details panel shows. */
export interface Selection {
  readonly parts: readonly string[];
  readonly wires: readonly string[];
  readonly net: string | null;
}

export const EMPTY_SELECTION: Selection = { parts: [], wires: [], net: null };

/** The selection without what no longer exists (after an undo, a delete, a split). */
export function cleanSelection(design: Design, sel: Selection): Selection {
  const parts = sel.parts.filter(
    (id) => design.parts.some((p) => p.id === id) || (design.discretes ?? []).some((d) => d.id === id),
  );
  const wires = sel.wires.filter((id) => {
    const w = parseWireId(id);
    const net = w === undefined ? undefined : design.nets.find((n) => n.id === w.net);
    return net !== undefined && netWires(net).some((p) => samePair(p, w!.a, w!.b));
  });
  const net = sel.net !== null && design.nets.some((n) => n.id === sel.net) ? sel.net : null;
  if (parts.length === sel.parts.length && wires.length === sel.wires.length && net === sel.net) return sel;
  return { parts, wires, net };
}
