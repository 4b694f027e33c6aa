/**
 * The canvas: React Flow showing nodes and edges derived from the design. It keeps no copy of
 * the design; it turns React Flow's events into commands (connect, move, select).
 */
import { useCallback, useEffect, useLayoutEffect, useMemo, useRef, useState, type DragEvent } from 'react';
import { ALL_ON } from '../../rules/engine/index.ts';
import { useStore } from 'zustand';
import { createStore } from 'zustand/vanilla';
import {
  Background,
  BackgroundVariant,
  ConnectionMode,
  Controls,
  Panel,
  ReactFlow,
  useReactFlow,
  type Connection,
  type EdgeChange,
  type FinalConnectionState,
  type IsValidConnection,
  type NodeChange,
} from '@xyflow/react';
import { connectPins, moveParts, parseWireId, tidyLayout, type Move } from '../store/commands/index.ts';
import { useEditor, useEditorStore } from '../store/EditorProvider.tsx';
import type { XY } from '../store/editorStore.ts';
import { ChipNode } from './ChipNode.tsx';
import {
  createFlowDeriver,
  type ChipNode as ChipNodeType,
  type DiscreteNode as DiscreteNodeType,
  type WireEdge as WireEdgeType,
} from './deriveFlow.ts';
import { DiscreteNode } from './DiscreteNode.tsx';
import { Legend } from './Legend.tsx';
import { LARGE_DESIGN_PARTS } from '../check/limits.ts';
import { CANVAS_ID, fitViewOptions, TEMPLATE_MIME, usePlacePart } from './placement.ts';
import { WireEdge } from './WireEdge.tsx';
import { createRouteKeeper, type RouteKeeper } from './routes.ts';
import { RouteContext } from './routeContext.ts';
import { useKeys } from '../keys/useKeys.ts';
import { keysOf } from '../keys/registry.ts';
import { Dialogs } from '../panels/Dialogs.tsx';

const nodeTypes = { chip: ChipNode, discrete: DiscreteNode };
type AnyNode = ChipNodeType | DiscreteNodeType;
const edgeTypes = { wire: WireEdge };
const proOptions = { hideAttribution: true };
const snapGrid: [number, number] = [10, 10];
/** Shift adds a chip to the selection (and Shift+drag draws a selection box, React Flow's default); Ctrl and Cmd too. */
const multiSelectionKeys = ['Shift', 'Meta', 'Control'];

const pinOf = (node: string, handle: string | null | undefined) => `${node}.${handle ?? ''}`;

interface DragState {
  readonly drag: ReadonlyMap<string, XY> | null;
  readonly moving: ReadonlySet<string> | null;
}

function sameKeys(set: ReadonlySet<string> | null, map: ReadonlyMap<string, unknown>): boolean {
  if (set === null || set.size !== map.size) return false;
  for (const k of map.keys()) if (!set.has(k)) return false;
  return true;
}

/** The least zoom at which a chip's pin names (11 px in styles.css) show at their size. */
export const READABLE_ZOOM = 1;

/** Where a large design's view starts: at its top-left chip, at a readable size. */
function largeViewport(
  parts: readonly { readonly position?: { readonly x: number; readonly y: number } | undefined }[],
): { x: number; y: number; zoom: number } {
  const zoom = 0.8;
  let corner: { x: number; y: number } | undefined;
  for (const p of parts) {
    const at = p.position;
    if (
      at !== undefined &&
      Number.isFinite(at.x) &&
      Number.isFinite(at.y) &&
      (corner === undefined || at.x + at.y < corner.x + corner.y)
    )
      corner = at;
  }
  return { x: 24 - (corner?.x ?? 0) * zoom, y: 24 - (corner?.y ?? 0) * zoom, zoom };
}

/** Tidy layout: the chips arranged by signal flow (one undo step), then the whole design fitted in view. */
function TidyButton() {
  const store = useEditorStore();
  const flow = useReactFlow();
  const empty = useEditor((s) => s.design.parts.length === 0);
  return (
    <button
      type="button"
      className="rc-tidy-btn"
      disabled={empty}
      data-testid="tidy-layout"
      title="Arrange the chips by signal flow, left to right (one undo step)"
      onClick={() => {
        if (store.getState().apply(tidyLayout()).ok) requestAnimationFrame(() => void flow.fitView(fitViewOptions));
      }}
    >
      Tidy layout
    </button>
  );
}

export function Canvas() {
  const store = useEditorStore();
  const parts = useEditor((s) => s.design.parts);
  const discreteParts = useEditor((s) => s.design.discretes);
  const nets = useEditor((s) => s.design.nets);
  const selectedParts = useEditor((s) => s.selection.parts);
  const selectedWires = useEditor((s) => s.selection.wires);
  // Where dragged chips are while a drag lasts: a small store of the canvas's own, not the
  // editor's, so that a drag step wakes only the canvas (not every chip's and wire's
  // subscription), yet renders at once, as a store update does (not a frame later, as state
  // set from a pointer event would). The end of the drag is the one command.
  // `moving`: the dragged chips' ids, one set for the whole drag, so that their wires are marked
  // once when it starts (deriveFlow.ts, MOVING_WIRE) and not rebuilt on every step.
  const dragStore = useRef(createStore<DragState>(() => ({ drag: null, moving: null }))).current;
  const drag = useStore(dragStore, (s) => s.drag);
  const moving = useStore(dragStore, (s) => s.moving);
  const setDrag = useCallback(
    (next: (was: ReadonlyMap<string, XY> | null) => ReadonlyMap<string, XY> | null) => {
      const was = dragStore.getState();
      const drag = next(was.drag);
      dragStore.setState({
        drag,
        moving: drag === null ? null : sameKeys(was.moving, drag) ? was.moving : new Set(drag.keys()),
      });
    },
    [dragStore],
  );
  const deriver = useRef(createFlowDeriver()).current;
  const chipNodes = useMemo(() => deriver.nodes(parts, selectedParts, drag), [deriver, parts, selectedParts, drag]);
  const discreteNodes = useMemo(
    () => deriver.discretes(discreteParts, selectedParts, drag),
    [deriver, discreteParts, selectedParts, drag],
  );
  // Most designs have no parts between chips: then the chips' own array, unchanged. Parts
  // between chips come first (drawn beneath), so that the chips keep their order, the newest last.
  const nodes = useMemo<AnyNode[]>(
    () => (discreteNodes.length === 0 ? chipNodes : [...discreteNodes, ...chipNodes]),
    [chipNodes, discreteNodes],
  );
  const edges = useMemo(() => deriver.edges(nets, selectedWires, moving), [deriver, nets, selectedWires, moving]);
  // Wires routed around chips from the design (not from a drag); each wire reads its own route.
  const keeper = useRef<RouteKeeper | null>(null);
  keeper.current ??= createRouteKeeper();
  const routes = keeper.current;
  useLayoutEffect(() => routes.update(parts, nets, discreteParts ?? []), [routes, parts, nets, discreteParts]);
  useEffect(() => () => routes.dispose(), [routes]);
  const place = usePlacePart();
  useKeys();

  const onNodesChange = useCallback(
    (changes: NodeChange<AnyNode>[]) => {
      const s = store.getState();
      let dragging: Map<string, XY> | undefined;
      const moves: Move[] = [];
      let selected: Set<string> | undefined;
      for (const c of changes) {
        if (c.type === 'dimensions' && c.dimensions !== undefined) deriver.measured.set(c.id, c.dimensions);
        else if (c.type === 'position' && c.position !== undefined) {
          if (c.dragging === true) (dragging ??= new Map()).set(c.id, c.position);
          else moves.push({ id: c.id, ...c.position });
        } else if (c.type === 'select') {
          selected ??= new Set(s.selection.parts);
          if (c.selected) selected.add(c.id);
          else selected.delete(c.id);
        }
      }
      if (dragging !== undefined) {
        const step = dragging;
        setDrag((was) => new Map([...(was ?? []), ...step]));
      }
      // The end of a drag is the one step that goes on the undo stack.
      if (moves.length > 0) {
        s.apply(moveParts(moves));
        setDrag(() => null);
      }
      if (selected !== undefined) s.select({ parts: [...selected], ...(selected.size > 0 ? { net: null } : {}) });
    },
    [store, deriver, setDrag],
  );

  const onEdgesChange = useCallback(
    (changes: EdgeChange<WireEdgeType>[]) => {
      const s = store.getState();
      let wires: Set<string> | undefined;
      for (const c of changes) {
        if (c.type !== 'select') continue;
        wires ??= new Set(s.selection.wires);
        if (c.selected) wires.add(c.id);
        else wires.delete(c.id);
      }
      if (wires === undefined) return;
      const list = [...wires];
      const nets = new Set(list.map((id) => parseWireId(id)?.net));
      const net = nets.size === 1 ? ([...nets][0] ?? null) : null;
      s.select({ wires: list, ...(list.length > 0 ? { net } : {}) });
    },
    [store],
  );

  const onConnect = useCallback(
    (c: Connection) => {
      store.getState().apply(connectPins(pinOf(c.source, c.sourceHandle), pinOf(c.target, c.targetHandle)));
    },
    [store],
  );

  // Refused while dragging (a pin to itself, to its own net): the handle shows it; on release, say why.
  const isValidConnection = useCallback<IsValidConnection>(
    (c) => {
      const a = pinOf(c.source, c.sourceHandle);
      const b = pinOf(c.target, c.targetHandle);
      return a !== b && !store.getState().design.nets.some((n) => n.pins.includes(a) && n.pins.includes(b));
    },
    [store],
  );

  const onConnectEnd = useCallback(
    (_: MouseEvent | TouchEvent, state: FinalConnectionState) => {
      if (state.isValid === true || state.fromHandle === null || state.toHandle === null) return;
      store
        .getState()
        .apply(
          connectPins(
            pinOf(state.fromHandle.nodeId, state.fromHandle.id),
            pinOf(state.toHandle.nodeId, state.toHandle.id),
          ),
        );
    },
    [store],
  );

  const onPaneClick = useCallback(() => store.getState().select({ parts: [], wires: [], net: null }), [store]);

  const onDragOver = useCallback((e: DragEvent) => {
    if (!e.dataTransfer.types.includes(TEMPLATE_MIME)) return;
    e.preventDefault();
    e.dataTransfer.dropEffect = 'copy';
  }, []);

  const onDrop = useCallback(
    (e: DragEvent) => {
      const id = e.dataTransfer.getData(TEMPLATE_MIME);
      if (id === '') return;
      e.preventDefault();
      place(id, { x: e.clientX, y: e.clientY });
    },
    [place],
  );

  const readOnly = useEditor((s) => s.readOnly);
  // Decided once per editor (a design that grows past the limit keeps its view).
  const [large] = useState(() => {
    const { parts: all } = store.getState().design;
    return all.length > LARGE_DESIGN_PARTS ? largeViewport(all) : null;
  });
  // The opening view: readable (pin names at their 11 px, zoom 1 or more), on the chips with
  // errors when the whole board would not fit at that size. F and the fit button still fit all.
  const [openingFit] = useState(() => {
    if (large !== null) return fitViewOptions;
    const { result } = store.getState();
    const errorParts = new Set<string>();
    for (const f of result.findings)
      if (f.severity === 'error' && f.waived === undefined && f.scenario === ALL_ON)
        for (const p of f.parts) errorParts.add(p);
    const nodes = [...errorParts].map((id) => ({ id }));
    return { ...fitViewOptions, minZoom: READABLE_ZOOM, ...(nodes.length === 0 ? {} : { nodes }) };
  });
  return (
    <RouteContext.Provider value={routes.store}>
      {/* biome-ignore lint/a11y/noStaticElementInteractions: the canvas is the drop target of palette drags; the palette's Enter key places a part without one */}
      <div
        className={`rc-canvas${drag !== null ? ' rc-canvas--dragging' : ''}`}
        id={CANVAS_ID}
        onDragOver={onDragOver}
        onDrop={onDrop}
      >
        <ReactFlow<AnyNode, WireEdgeType>
          nodes={nodes}
          edges={edges}
          nodeTypes={nodeTypes}
          edgeTypes={edgeTypes}
          onNodesChange={onNodesChange}
          onEdgesChange={onEdgesChange}
          onConnect={onConnect}
          onConnectEnd={onConnectEnd}
          onPaneClick={onPaneClick}
          isValidConnection={isValidConnection}
          connectionMode={ConnectionMode.Loose}
          nodesDraggable={!readOnly}
          nodesConnectable={!readOnly}
          deleteKeyCode={null}
          multiSelectionKeyCode={multiSelectionKeys}
          onlyRenderVisibleElements
          snapToGrid
          snapGrid={snapGrid}
          // A large design opens on its first chips, not fitted whole: every chip in view at once
          // is what the page waits on (press F to fit it all).
          fitView={large === null}
          defaultViewport={large ?? undefined}
          fitViewOptions={openingFit}
          minZoom={0.05}
          proOptions={proOptions}
          aria-label="Canvas: chips and the wires between them"
        >
          <Background variant={BackgroundVariant.Dots} gap={20} size={1.2} className="rc-grid" />
          <Controls showInteractive={false} position="bottom-right" />
          <Panel position="bottom-left">
            <Legend />
          </Panel>
          {parts.length === 0 && (discreteParts ?? []).length === 0 && (
            <Panel position="top-center" className="rc-start-hint" data-testid="start-hint">
              <strong>An empty board.</strong> Set its supplies under Rails on the right, then drag a chip from the
              palette onto the canvas (or pick one and press Enter). Join two pins by dragging from one to the other:
              every net is checked as you draw it.
            </Panel>
          )}
          <Panel position="top-right">
            <TidyButton />
            <button
              type="button"
              className="rc-tidy-btn"
              data-testid="search-button"
              title={`Find a part, pin, net or finding (${keysOf('search')})`}
              onClick={() => store.getState().openDialog({ kind: 'search' })}
            >
              Find…
            </button>
            <button
              type="button"
              className="rc-keys-btn"
              aria-label="Keyboard shortcuts"
              title={`Keyboard shortcuts (${keysOf('shortcuts')})`}
              data-testid="shortcuts-button"
              onClick={() => store.getState().openDialog({ kind: 'keys' })}
            >
              ?
            </button>
          </Panel>
        </ReactFlow>
        <Dialogs />
      </div>
    </RouteContext.Provider>
  );
}
