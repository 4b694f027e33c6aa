/**
 * Subscriptions by key (a net id, a part id) to a value derived from the editor's state: a
 * store change wakes only the components whose own value changed. A thousand chips and two
 * thousand wires each subscribed to the whole store would each run their selectors on every
 * change, a drag step included (stack.md, "React Flow at scale").
 */
import { useCallback, useSyncExternalStore } from 'react';
import type { EditorState, EditorStore } from './editorStore.ts';

export interface KeyedSpec<V> {
  /** Whether a change of the state can change any value (a cheap identity test). */
  readonly relevant: (s: EditorState, prev: EditorState) => boolean;
  readonly read: (s: EditorState, key: string) => V;
  readonly same: (a: V, b: V) => boolean;
}

export class KeyedView<V> {
  private readonly subs = new Map<string, Set<() => void>>();
  private readonly values = new Map<string, V>();

  constructor(
    private readonly store: EditorStore,
    private readonly spec: KeyedSpec<V>,
  ) {
    store.subscribe((s, prev) => {
      if (!spec.relevant(s, prev)) return;
      for (const [key, listeners] of this.subs) {
        const old = this.values.get(key);
        const next = spec.read(s, key);
        if (old !== undefined && spec.same(old, next)) continue;
        this.values.set(key, next);
        for (const l of listeners) l();
      }
    });
  }

  subscribe(key: string, listener: () => void): () => void {
    let set = this.subs.get(key);
    if (set === undefined) {
      set = new Set();
      this.subs.set(key, set);
    }
    set.add(listener);
    return () => {
      set.delete(listener);
      if (set.size === 0) {
        this.subs.delete(key);
        this.values.delete(key);
      }
    };
  }

  get(key: string): V {
    let v = this.values.get(key);
    if (v === undefined) {
      v = this.spec.read(this.store.getState(), key);
      this.values.set(key, v);
    }
    return v;
  }
}

const views = new WeakMap<EditorStore, WeakMap<KeyedSpec<unknown>, KeyedView<unknown>>>();

/** The view of `spec` over `store`, made once per store. */
export function keyedView<V>(store: EditorStore, spec: KeyedSpec<V>): KeyedView<V> {
  let byStore = views.get(store);
  if (byStore === undefined) {
    byStore = new WeakMap();
    views.set(store, byStore);
  }
  let view = byStore.get(spec as KeyedSpec<unknown>);
  if (view === undefined) {
    view = new KeyedView(store, spec as KeyedSpec<unknown>);
    byStore.set(spec as KeyedSpec<unknown>, view);
  }
  return view as KeyedView<V>;
}

/** A component's own value of a keyed view, re-rendering only when that value changes. */
export function useKeyed<V>(store: EditorStore, spec: KeyedSpec<V>, key: string): V {
  const view = keyedView(store, spec);
  const subscribe = useCallback((l: () => void) => view.subscribe(key, l), [view, key]);
  const get = useCallback(() => view.get(key), [view, key]);
  return useSyncExternalStore(subscribe, get, get);
}
