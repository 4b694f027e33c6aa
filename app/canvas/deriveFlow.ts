/**
 * React Flow nodes and edges derived from the design, cached per record: an edit replaces only
 * the node and edge objects whose drawing it changed, because a changed object makes React Flow
 * re-run its selectors and re-render (stack.md, "React Flow at scale"). What a chip shows (its
 * part) and what a wire shows (its net's severity) stay out of the objects: each chip reads its
 * part and each wire its net's status from the editor's store by id. A node changes only with
 * its place, size or selection; a net's edges only with its wires, name or selection.
 */
import type { Edge, Node } from '@xyflow/react';
import type { Design, Discrete, Net, Part } from '../../rules/model/index.ts';
import { netWires, splitPinKey, wireId } from '../store/commands/index.ts';
import type { XY } from '../store/editorStore.ts';
import { chipSize, DISCRETE_SIZE, NODE_MARGIN } from './chipLayout.ts';

export type ChipNode = Node<{ readonly part: string }, 'chip'>;
export type WireEdge = Edge<{ net: string; label: string | null; pull: Net['pull'] | null }, 'wire'>;
/** A part between chips (version 2) as a node. */
export type DiscreteNode = Node<{ readonly discrete: string }, 'discrete'>;

/** The drawn size of a part between chips (chipLayout.ts keeps it with the other measures). */
export { DISCRETE_SIZE };

/**
 * Class names of a chip being dragged and of the wires that end on it. styles.css gives those
 * elements compositing layers of their own while the drag lasts, so that a drag step re-rasters
 * a few wires alone rather than every wire and chip beneath them (measured in `npm run
 * bench:ui`: a drag step 37 → 28 ms to the painted frame at 1,000 parts).
 */
export const MOVING_CHIP = 'rc-moving';
export const MOVING_WIRE = 'rc-wire-moving';
/**
 * Above this many chips in one drag the marks are left off: every layer costs the software
 * compositor a pass over its area on each frame, which outweighs the raster it saves.
 */
export const MOVING_LAYERS_MAX = 24;

const layered = (ids: { readonly size: number } | null | undefined) =>
  ids != null && ids.size > 0 && ids.size <= MOVING_LAYERS_MAX;

interface NodeEntry {
  readonly key: string;
  readonly node: ChipNode;
}

interface NetEntry {
  readonly net: Net;
  readonly ids: readonly string[];
  readonly selectedKey: string;
  /** Which of its wires end on a chip being dragged (`rc-wire-moving`). */
  readonly movingKey: string;
  /** Wires, name and selection: what the edge objects hold. */
  readonly key: string;
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
  let lastNodes: ChipNode[] = [];
  let lastEdges: WireEdge[] = [];

  /**
   * The previous array when every object in it is the same: a new array, even of the same
   * objects, makes React Flow adopt its nodes again and run every node's and edge's selectors.
   */
  function same<T>(last: T[], next: T[]): T[] {
    return last.length === next.length && next.every((x, k) => x === last[k]) ? last : next;
  }

  function nodes(
    parts: readonly Part[],
    selectedParts: readonly string[],
    drag: ReadonlyMap<string, XY> | null,
  ): ChipNode[] {
    const selected = new Set(selectedParts);
    const seen = new Set<string>();
    const marksChips = layered(drag);
    const out = parts.map((part) => {
      seen.add(part.id);
      const pos = drag?.get(part.id) ?? part.position ?? { x: 0, y: 0 };
      const isSelected = selected.has(part.id);
      const isMoving = marksChips && drag!.has(part.id);
      // The drawn size, given rather than measured: nodes outside the view are never rendered
      // (onlyRenderVisibleElements), yet the first fitView must see them; and a node of known
      // size lets the browser contain it (styles.css, contain: strict).
      const drawn = chipSize(part);
      const key = `${pos.x},${pos.y},${drawn.width},${drawn.height},${isSelected ? 1 : 0},${isMoving ? 1 : 0}`;
      const hit = nodeCache.get(part.id);
      if (hit !== undefined && hit.key === key) return hit.node;
      const size = measured.get(part.id);
      const node: ChipNode = {
        id: part.id,
        type: 'chip',
        position: { x: pos.x, y: pos.y },
        data: { part: part.id },
        selected: isSelected,
        ...(isMoving ? { className: MOVING_CHIP } : {}),
        width: drawn.width + 2 * NODE_MARGIN,
        height: drawn.height + 2 * NODE_MARGIN,
        ...(size === undefined ? {} : { measured: { width: size.width, height: size.height } }),
      };
      nodeCache.set(part.id, { key, node });
      return node;
    });
    for (const id of nodeCache.keys()) if (!seen.has(id)) nodeCache.delete(id);
    lastNodes = same(lastNodes, out);
    return lastNodes;
  }

  /**
   * `moving`: the ids of the chips being dragged (one set for the whole drag, null otherwise).
   */
  function edges(
    nets: readonly Net[],
    selectedWires: readonly string[],
    moving: ReadonlySet<string> | null = null,
  ): WireEdge[] {
    const selected = new Set(selectedWires);
    const seen = new Set<string>();
    const out: WireEdge[] = [];
    const marked = layered(moving) ? moving : null;
    const movingOf = (net: Net): string => {
      if (marked === null) return '';
      let key = '';
      for (const pin of net.pins) if (marked.has(splitPinKey(pin).part)) key += `${pin}|`;
      return key;
    };
    for (const net of nets) {
      seen.add(net.id);
      const hit = netCache.get(net.id);
      const mine =
        selected.size === 0
          ? ''
          : (hit?.ids ?? netWires(net).map(([a, b]) => wireId(net.id, a, b)))
              .filter((id) => selected.has(id))
              .join('|');
      const movingKey = movingOf(net);
      // The same net object drawn with the same selection: nothing to look at.
      if (hit !== undefined && hit.net === net && hit.selectedKey === mine && hit.movingKey === movingKey) {
        out.push(...hit.edges);
        continue;
      }
      const wires = netWires(net);
      const ids = wires.map(([a, b]) => wireId(net.id, a, b));
      const selectedKey = selected.size === 0 ? '' : ids.filter((id) => selected.has(id)).join('|');
      const label = net.label ?? net.id;
      const pull = net.pull === undefined ? '' : `${net.pull.to}/${net.pull.ohms}`;
      const key = `${ids.join('|')}\n${label}\n${pull}\n${selectedKey}\n${movingKey}`;
      // A changed net drawn the same (a waiver, a pull, a capacitance): the same edge objects.
      if (hit !== undefined && hit.key === key) {
        netCache.set(net.id, { ...hit, net, selectedKey });
        out.push(...hit.edges);
        continue;
      }
      const made = wires.map(([a, b], k): WireEdge => {
        const s = splitPinKey(a);
        const t = splitPinKey(b);
        const moves = marked !== null && (marked.has(s.part) || marked.has(t.part));
        return {
          id: ids[k]!,
          type: 'wire',
          source: s.part,
          sourceHandle: s.pin,
          target: t.part,
          targetHandle: t.pin,
          // The first wire carries the net's name and its pull.
          data: { net: net.id, label: k === 0 ? label : null, pull: k === 0 ? (net.pull ?? null) : null },
          selected: selected.has(ids[k]!),
          ...(moves ? { className: MOVING_WIRE } : {}),
        };
      });
      netCache.set(net.id, { net, ids, selectedKey, movingKey, key, edges: made });
      out.push(...made);
    }
    for (const id of netCache.keys()) if (!seen.has(id)) netCache.delete(id);
    lastEdges = same(lastEdges, out);
    return lastEdges;
  }

  const discreteCache = new Map<string, { key: string; node: DiscreteNode }>();
  let lastDiscretes: DiscreteNode[] = [];

  /** The parts between chips as nodes, cached as chips are. */
  function discretes(
    list: readonly Discrete[] | undefined,
    selectedParts: readonly string[],
    drag: ReadonlyMap<string, XY> | null,
  ): DiscreteNode[] {
    const selected = new Set(selectedParts);
    const out = (list ?? []).map((d) => {
      const pos = drag?.get(d.id) ?? d.position ?? { x: 0, y: 0 };
      const isSelected = selected.has(d.id);
      const key = `${pos.x},${pos.y},${isSelected ? 1 : 0}`;
      const hit = discreteCache.get(d.id);
      if (hit !== undefined && hit.key === key) return hit.node;
      const node: DiscreteNode = {
        id: d.id,
        type: 'discrete',
        position: { x: pos.x, y: pos.y },
        data: { discrete: d.id },
        selected: isSelected,
        width: DISCRETE_SIZE.width + 2 * NODE_MARGIN,
        height: DISCRETE_SIZE.height + 2 * NODE_MARGIN,
      };
      discreteCache.set(d.id, { key, node });
      return node;
    });
    const ids = new Set((list ?? []).map((d) => d.id));
    for (const id of discreteCache.keys()) if (!ids.has(id)) discreteCache.delete(id);
    lastDiscretes = same(lastDiscretes, out);
    return lastDiscretes;
  }

  return { nodes, edges, discretes, measured };
}

export type FlowDeriver = ReturnType<typeof createFlowDeriver>;

/** Parts and nets of a design as React Flow would get them, without caching (tests, one-off uses). */
export function deriveOnce(design: Design): { nodes: ChipNode[]; edges: WireEdge[]; discretes: DiscreteNode[] } {
  const d = createFlowDeriver();
  return {
    nodes: d.nodes(design.parts, [], null),
    edges: d.edges(design.nets, []),
    discretes: d.discretes(design.discretes, [], null),
  };
}
