/**
 * Starting the editor: the stored design if there is a valid one, else the example; then every
 * new design goes to storage, debounced.
 */
import { createEditorStore, type EditorStore } from './store/editorStore.ts';
import { defaultSaver, loadCurrent, type LoadResult, type Saver } from './storage/currentDesign.ts';
import { exampleDesign } from './example.ts';

export async function boot(): Promise<{ store: EditorStore; saver: Saver }> {
  let loaded: LoadResult;
  try {
    loaded = await loadCurrent();
  } catch (error) {
    // No IndexedDB (a private window may refuse it): the editor still works, unsaved.
    loaded = { status: 'refused', errors: [{ path: '(storage)', message: error instanceof Error ? error.message : String(error) }] };
  }
  const store = createEditorStore(loaded.status === 'ok' ? loaded.design : exampleDesign());
  if (loaded.status === 'refused') {
    const first = loaded.errors[0];
    store.getState().notify({ kind: 'refused', text: `The stored design could not be read (${first?.path}: ${first?.message}); the example is open instead.` });
  }
  const saver = defaultSaver();
  store.subscribe((s, prev) => {
    if (s.design !== prev.design) saver.save(s.design);
  });
  // Leaving the page writes what is pending at once rather than after the quiet spell.
  addEventListener('pagehide', () => void saver.flush());
  addEventListener('visibilitychange', () => {
    if (document.visibilityState === 'hidden') void saver.flush();
  });
  return { store, saver };
}
