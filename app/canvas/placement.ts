/** Placing parts from the palette and bringing things into view: canvas actions other panels call. */
import { partOfPin } from '../../rules/model/index.ts';
import { useCallback } from 'react';
import { useReactFlow } from '@xyflow/react';
import type { DiscreteKind, Part } from '../../rules/model/index.ts';
import { addDiscrete, addPart, newDiscrete } from '../store/commands/index.ts';
import { DISCRETE_SIZE } from './deriveFlow.ts';
import type { EditorStore, Outcome } from '../store/editorStore.ts';
import { useEditorStore } from '../store/EditorProvider.tsx';
import { templateById } from '../store/templates.ts';
import { chipSize } from './chipLayout.ts';
import { freePlace } from './freeSpot.ts';

export const CANVAS_ID = 'rc-canvas';
export const TEMPLATE_MIME = 'application/x-railcross-template';

/**
 * How the whole design is fitted into view. Nodes outside the view are never rendered, so
 * never measured (onlyRenderVisibleElements): `includeHiddenNodes` lets fitView fall back on
 * their drawn size (the nodes' width and height).
 */
export const fitViewOptions = { padding: 0.12, maxZoom: 1.1, includeHiddenNodes: true };

/** The flow position of the visible canvas's middle. */
function useViewCentre(): () => { x: number; y: number } {
  const { screenToFlowPosition } = useReactFlow();
  return useCallback(() => {
    const rect = document.getElementById(CANVAS_ID)?.getBoundingClientRect();
    return screenToFlowPosition(
      rect === undefined ? { x: 0, y: 0 } : { x: rect.left + rect.width / 2, y: rect.top + rect.height / 2 },
    );
  }, [screenToFlowPosition]);
}

/** Add a part centred on `centre`, at the first free spot near it unless `exact`; select it. */
function placeBuilt(store: EditorStore, built: Part, centre: { x: number; y: number }, exact: boolean): Outcome {
  const s = store.getState();
  const size = chipSize(built);
  const corner = { x: centre.x - size.width / 2, y: centre.y - size.height / 2 };
  const at = exact ? corner : freePlace(s.design, corner, size);
  const part = { ...built, position: { x: Math.round(at.x), y: Math.round(at.y) } };
  const out = s.apply(addPart(part));
  if (out.ok) s.select({ parts: [part.id], wires: [], net: null });
  return out;
}

/**
 * Place a part from a template: where it was dropped (`screen`, the pointer's position), or
 * near the middle of the visible canvas, at the first free spot. Selects the new part.
 */
export function usePlacePart(): (templateId: string, screen?: { x: number; y: number }) => string | undefined {
  const store = useEditorStore();
  const { screenToFlowPosition } = useReactFlow();
  const viewCentre = useViewCentre();
  return useCallback(
    (templateId, screen) => {
      const template = templateById(templateId);
      const s = store.getState();
      if (template === undefined) return undefined;
      const centre = screen === undefined ? viewCentre() : screenToFlowPosition(screen);
      const built = template.build(s.design, centre);
      if ('refused' in built) {
        s.notify({ kind: 'refused', text: built.refused });
        return undefined;
      }
      return placeBuilt(store, built, centre, screen !== undefined).ok ? built.id : undefined;
    },
    [store, screenToFlowPosition, viewCentre],
  );
}

/** Place a chip made in the pin table near the middle of the view, at the first free spot. */
export function usePlaceChip(): (part: Part) => Outcome {
  const store = useEditorStore();
  const viewCentre = useViewCentre();
  return useCallback((part) => placeBuilt(store, part, viewCentre(), false), [store, viewCentre]);
}

/** Bring a net (all the parts on it), a part or some parts into view. */
export function useFocus() {
  const store = useEditorStore();
  const { fitView } = useReactFlow();
  return useCallback(
    (target: { net: string } | { part: string } | { parts: readonly string[] }) => {
      const { design } = store.getState();
      let ids: string[];
      if ('net' in target) {
        const net = design.nets.find((n) => n.id === target.net);
        ids = [...new Set((net?.pins ?? []).map(partOfPin))];
      } else ids = 'part' in target ? [target.part] : [...target.parts];
      if (ids.length === 0) return;
      // includeHiddenNodes: see fitViewOptions.
      void fitView({
        nodes: ids.map((id) => ({ id })),
        padding: 0.35,
        duration: 250,
        maxZoom: 1.2,
        includeHiddenNodes: true,
      });
    },
    [store, fitView],
  );
}

/**
 * Place a part between chips (a resistor, a FET or diode shifter) near the middle of the view,
 * with its starting values, and select it.
 */
export function usePlaceDiscrete(): (kind: DiscreteKind) => void {
  const store = useEditorStore();
  const viewCentre = useViewCentre();
  return useCallback(
    (kind) => {
      const s = store.getState();
      const c = viewCentre();
      const part = newDiscrete(s.design, kind, { x: c.x - DISCRETE_SIZE.width / 2, y: c.y - DISCRETE_SIZE.height / 2 });
      const out = s.apply(addDiscrete(part));
      if (out.ok) s.select({ parts: [part.id], wires: [], net: null });
    },
    [store, viewCentre],
  );
}
