import { createContext, useContext, type ReactNode } from 'react';
import { useStore } from 'zustand';
import type { EditorState, EditorStore } from './editorStore.ts';

const EditorContext = createContext<EditorStore | null>(null);

export function EditorProvider({ store, children }: { store: EditorStore; children: ReactNode }) {
  return <EditorContext.Provider value={store}>{children}</EditorContext.Provider>;
}

/** The editor store itself, for event handlers that read state without subscribing. */
export function useEditorStore(): EditorStore {
  const store = useContext(EditorContext);
  if (store === null) throw new Error('useEditorStore outside <EditorProvider>');
  return store;
}

/** A narrow, subscribed view of the editor's state. */
export function useEditor<T>(selector: (state: EditorState) => T): T {
  return useStore(useEditorStore(), selector);
}
