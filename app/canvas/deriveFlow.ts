/**
 * React Flow nodes and edges derived from the design, cached per record: an edit replaces only
 * the node and edge objects of what it touched, because a changed object makes React Flow
 * re-measure and re-render it (stack.md, "React Flow at scale"). Severity stays out of the
 * edge objects: each wire reads its net's status from the store by id.
 */
import type { Edge, Node } from '@xyflow/react';
import type { Design, Net, Part } from '../../rules/model/schema.ts';
import { netWires, splitPinKey, wireId } from '../store/commands/index.ts';
import type { XY } from '../store/editorStore.ts';
import { chipSize, NODE_MARGIN } from './chipLayout.ts';

export type ChipNode = Node<{ part: Part }, 'chip'>;
export type WireEdge = Edge<{ net: string; label: string | null }, 'wire'>;

interface NodeEntry {
  readonly part: Part;
  readonly selected: boolean;
  readonly x: number;
  readonly y: number;
  readonly node: ChipNode;
}

interface NetEntry {
  readonly net: Net;
  readonly selectedKey: string;
  readonly edges: readonly WireEdge[];
}

export interface Measured {
  readonly width: number;
  readonly height: number;
}

/** A deriver keeps its caches between calls; make one per canvas. */
export function createFlowDeriver() {
  const nodeCache = new Map<string, NodeEntry>();
  const netCache = new Map<string, NetEntry>();
  /** Sizes React Flow measured, handed to each new node object so that it is not re-measured from nothing. */
  const measured = new Map<string, Measured>();

  function nodes(parts: readonly Part[], selectedParts: readonly string[], drag: ReadonlyMap<string, XY> | null): ChipNode[] {
    const selected = new Set(selectedParts);
    const seen = new Set<string>();
    const out = parts.map((part) => {
      seen.add(part.id);
      const pos = drag?.get(part.id) ?? part.position ?? { x: 0, y: 0 };
      const isSelected = selected.has(part.id);
      const hit = nodeCache.get(part.id);
      if (hit !== undefined && hit.part === part && hit.selected === isSelected && hit.x === pos.x && hit.y === pos.y) return hit.node;
      const size = measured.get(part.id);
      // The drawn size before React Flow measures it: nodes outside the view are never
      // rendered (onlyRenderVisibleElements), and the first fitView must still see them.
      const drawn = chipSize(part);
      const node: ChipNode = {
        id: part.id,
        type: 'chip',
        position: { x: pos.x, y: pos.y },
        data: { part },
        selected: isSelected,
        initialWidth: drawn.width + 2 * NODE_MARGIN,
        initialHeight: drawn.height + 2 * NODE_MARGIN,
        ...(size === undefined ? {} : { measured: { width: size.width, height: size.height } }),
      };
      nodeCache.set(part.id, { part, selected: isSelected, x: pos.x, y: pos.y, node });
      return node;
    });
    for (const id of nodeCache.keys()) if (!seen.has(id)) nodeCache.delete(id);
    return out;
  }

  function edges(nets: readonly Net[], selectedWires: readonly string[]): WireEdge[] {
    const selected = new Set(selectedWires);
    const seen = new Set<string>();
    const out: WireEdge[] = [];
    for (const net of nets) {
      seen.add(net.id);
      const wires = netWires(net);
      const ids = wires.map(([a, b]) => wireId(net.id, a, b));
      const selectedKey = ids.filter((id) => selected.has(id)).join('|');
      const hit = netCache.get(net.id);
      if (hit !== undefined && hit.net === net && hit.selectedKey === selectedKey) {
        out.push(...hit.edges);
        continue;
      }
      const made = wires.map(([a, b], k): WireEdge => {
        const s = splitPinKey(a);
        const t = splitPinKey(b);
        return {
          id: ids[k]!,
          type: 'wire',
          source: s.part,
          sourceHandle: s.pin,
          target: t.part,
          targetHandle: t.pin,
          // The first wire carries the net's name.
          data: { net: net.id, label: k === 0 ? (net.label ?? net.id) : null },
          selected: selected.has(ids[k]!),
        };
      });
      netCache.set(net.id, { net, selectedKey, edges: made });
      out.push(...made);
    }
    for (const id of netCache.keys()) if (!seen.has(id)) netCache.delete(id);
    return out;
  }

  return { nodes, edges, measured };
}

export type FlowDeriver = ReturnType<typeof createFlowDeriver>;

/** Parts and nets of a design as React Flow would get them, without caching (tests, one-off uses). */
export function deriveOnce(design: Design): { nodes: ChipNode[]; edges: WireEdge[] } {
  const d = createFlowDeriver();
  return { nodes: d.nodes(design.parts, [], null), edges: d.edges(design.nets, []) };
}
