import { useEffect } from 'react';
import { deleteSelection, parseWireId, type Pair } from './store/commands/index.ts';
import type { EditorStore } from './store/editorStore.ts';

/** Keys typed into a field belong to the field (its own undo, its own Backspace); keys in a dialog to the dialog. */
function inField(target: EventTarget | null): boolean {
  return (
    target instanceof Element && target.closest('input, textarea, select, [contenteditable="true"], dialog') !== null
  );
}

/** Delete, Ctrl/Cmd+Z, Ctrl/Cmd+Shift+Z and Ctrl/Cmd+Y, anywhere but in a field. */
export function useShortcuts(store: EditorStore): void {
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (inField(e.target)) return;
      const s = store.getState();
      const mod = e.ctrlKey || e.metaKey;
      const key = e.key.toLowerCase();
      if (mod && key === 'z') {
        e.preventDefault();
        if (e.shiftKey) s.redo();
        else s.undo();
      } else if (mod && key === 'y') {
        e.preventDefault();
        s.redo();
      } else if (!mod && (e.key === 'Delete' || e.key === 'Backspace')) {
        const wires = s.selection.wires
          .map(parseWireId)
          .filter((w) => w !== undefined)
          .map((w): Pair => [w.a, w.b]);
        if (s.selection.parts.length === 0 && wires.length === 0) return;
        e.preventDefault();
        s.apply(deleteSelection({ parts: s.selection.parts, wires }));
      }
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [store]);
}
