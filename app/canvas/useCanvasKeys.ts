/**
 * The canvas's keys: copy, paste and duplicate of chips with the nets among them, arrow-key
 * nudges (one undo step each), select all, fit the view, and "?" for the list. Undo, redo and
 * Delete are `useShortcuts`'s. Nothing here acts while a field or a dialog has the focus.
 */
import { useEffect, useRef } from 'react';
import { useReactFlow } from '@xyflow/react';
import { copyParts, planPaste, type Clip } from '../store/clipboard.ts';
import { insertParts, nudgeParts } from '../store/commands/index.ts';
import { useEditorStore } from '../store/EditorProvider.tsx';
import type { EditorStore } from '../store/editorStore.ts';
import { CANVAS_ID, fitViewOptions, useFocus } from './placement.ts';
import { NUDGE, NUDGE_BIG } from './shortcuts.ts';

/** Where a paste lands: each paste of one copy a step further down and right, so that none hides another. */
const PASTE_STEP = 40;

const ARROWS: Readonly<Record<string, [number, number]>> = {
  ArrowLeft: [-1, 0],
  ArrowRight: [1, 0],
  ArrowUp: [0, -1],
  ArrowDown: [0, 1],
};

function inFieldOrDialog(target: EventTarget | null): boolean {
  return (
    target instanceof Element && target.closest('input, textarea, select, [contenteditable="true"], dialog') !== null
  );
}

/**
 * Copy, paste, select-all and the arrows act on chips only while the canvas (or nothing) has
 * the focus: elsewhere they keep their usual meaning (copying a finding's text, scrolling a list).
 */
function onCanvas(target: EventTarget | null): boolean {
  return target === document.body || (target instanceof Element && target.closest(`#${CANVAS_ID}`) !== null);
}

function paste(store: EditorStore, clip: Clip, times: number, name?: string): void {
  const s = store.getState();
  const planned = planPaste(s.design, clip, { x: PASTE_STEP * times, y: PASTE_STEP * times });
  const out = s.apply(insertParts(planned.parts, planned.nets, name));
  if (out.ok) s.select({ parts: planned.parts.map((p) => p.id), wires: [], net: null });
}

export function useCanvasKeys(): void {
  const store = useEditorStore();
  const { fitView } = useReactFlow();
  const focus = useFocus();
  const clipboard = useRef<{ clip: Clip; pasted: number } | null>(null);

  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (e.defaultPrevented || inFieldOrDialog(e.target)) return;
      const s = store.getState();
      if (s.dialog !== null) return;
      const mod = e.ctrlKey || e.metaKey;
      const key = e.key.length === 1 ? e.key.toLowerCase() : e.key;
      const chosen = s.selection.parts;
      const canvas = onCanvas(e.target);
      if (mod && !e.altKey && canvas && (key === 'c' || key === 'd')) {
        const clip = copyParts(s.design, chosen);
        if (clip === undefined) return;
        e.preventDefault();
        if (key === 'c') {
          clipboard.current = { clip, pasted: 0 };
          s.notify({
            kind: 'done',
            text: `Copied ${clip.parts.length} ${clip.parts.length === 1 ? 'part' : 'parts'} and ${clip.nets.length} ${clip.nets.length === 1 ? 'net' : 'nets'}.`,
          });
        } else {
          paste(
            store,
            clip,
            1,
            `Duplicate ${clip.parts.length === 1 ? clip.parts[0]!.id : `${clip.parts.length} parts`}`,
          );
        }
      } else if (mod && !e.altKey && canvas && key === 'v') {
        const held = clipboard.current;
        if (held === null) return;
        e.preventDefault();
        held.pasted++;
        paste(store, held.clip, held.pasted);
      } else if (mod && canvas && key === 'a') {
        e.preventDefault();
        s.select({ parts: s.design.parts.map((p) => p.id), wires: [], net: null });
      } else if (!mod && !e.altKey && canvas && key in ARROWS && chosen.length > 0) {
        const [dx, dy] = ARROWS[key]!;
        const step = e.shiftKey ? NUDGE_BIG : NUDGE;
        e.preventDefault();
        s.apply(nudgeParts(chosen, dx * step, dy * step));
      } else if (!mod && !e.altKey && key === 'f' && e.shiftKey) {
        const net = s.selection.net;
        if (chosen.length === 0 && net === null) return;
        e.preventDefault();
        focus(chosen.length > 0 ? { parts: chosen } : { net: net! });
      } else if (!mod && !e.altKey && key === 'f') {
        e.preventDefault();
        void fitView({ ...fitViewOptions, duration: 200 });
      } else if (!mod && key === '?') {
        e.preventDefault();
        s.openDialog({ kind: 'keys' });
      } else if (key === 'Escape' && (chosen.length > 0 || s.selection.wires.length > 0 || s.selection.net !== null)) {
        s.select({ parts: [], wires: [], net: null });
      }
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [store, fitView, focus]);
}
