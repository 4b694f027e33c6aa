/**
 * The editor's one key listener: a press bound in the registry (registry.ts) runs its command,
 * unless a field or a dialog has the focus (keys typed into a field belong to the field: its
 * own undo, its own Backspace) or the command acts on the canvas and the focus is elsewhere.
 */
import { useEffect, useRef } from 'react';
import { useReactFlow } from '@xyflow/react';
import { useEditorStore } from '../store/EditorProvider.tsx';
import { CANVAS_ID, fitViewOptions, useFocus } from '../canvas/placement.ts';
import { keyDown, type KeyContext } from './registry.ts';

function inFieldOrDialog(target: EventTarget | null): boolean {
  return (
    target instanceof Element && target.closest('input, textarea, select, [contenteditable="true"], dialog') !== null
  );
}

function onCanvas(target: EventTarget | null): boolean {
  return target === document.body || (target instanceof Element && target.closest(`#${CANVAS_ID}`) !== null);
}

export function useKeys(): void {
  const store = useEditorStore();
  const { fitView } = useReactFlow();
  const focus = useFocus();
  const clipboard = useRef<KeyContext['clipboard']>(null);

  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (e.defaultPrevented || inFieldOrDialog(e.target)) return;
      const ctx: KeyContext = {
        store,
        view: {
          fitAll: () => void fitView({ ...fitViewOptions, duration: 200 }),
          focus: (target) => focus(target),
        },
        clipboard: clipboard.current,
      };
      if (keyDown(ctx, e, onCanvas(e.target))) e.preventDefault();
      clipboard.current = ctx.clipboard;
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [store, fitView, focus]);
}
