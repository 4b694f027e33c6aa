/**
 * The editor's store: the document (undoable), the UI state (selection, chosen power state,
 * the open dialog: never undone) and the findings (derived). Every edit goes through
 * `apply(command)`, the one commit path: immer records the patches for undo, the engine
 * re-checks with the previous result, and subscribers (storage) see the new design.
 */
import { applyPatches, enablePatches, produceWithPatches, type Patch } from 'immer';
import { createStore, type StoreApi } from 'zustand/vanilla';
import { check } from '../../rules/check/index.ts';
import { ALL_ON } from '../../rules/engine/index.ts';
import type { CheckResult } from '../../rules/engine/index.ts';
import type { Design } from '../../rules/model/index.ts';
import { isRefusal, type Command } from './commands/command.ts';
import { netStatuses, type NetStatus } from './netStatus.ts';
import { cleanSelection, EMPTY_SELECTION, type Selection } from './selection.ts';

enablePatches();

/** One undo step. */
export interface Step {
  readonly name: string;
  readonly patches: readonly Patch[];
  readonly inverse: readonly Patch[];
}

export type Outcome =
  | { readonly ok: true; readonly changed: boolean }
  | { readonly ok: false; readonly reason: string };

/** The last re-check, for the status line. */
export interface CheckStat {
  readonly action: string;
  readonly netsChecked: number;
  readonly ms: number;
}

/** What the status line says after a command: refused with why, or done. (The library's notices are `StatusNote`.) */
export interface StatusNote {
  readonly kind: 'refused' | 'done';
  readonly text: string;
}

/** An open dialog: the pin table of a new chip (`part` null) or of a part, the list of shortcuts, or the search box. */
export type Dialog =
  | { readonly kind: 'chip'; readonly part: string | null }
  | { readonly kind: 'keys' }
  | { readonly kind: 'search' };

export interface XY {
  readonly x: number;
  readonly y: number;
}

export interface EditorState {
  readonly design: Design;
  readonly result: CheckResult;
  readonly past: readonly Step[];
  readonly future: readonly Step[];
  readonly selection: Selection;
  /** The power state the wires are coloured for. */
  readonly powerState: string;
  /** Worst severity per net in `powerState`. */
  readonly netStatus: ReadonlyMap<string, NetStatus>;
  readonly lastCheck: CheckStat;
  readonly notice: StatusNote | null;
  readonly dialog: Dialog | null;
  /** Opened read-only (a design too large to edit comfortably): every command is refused. */
  readonly readOnly: boolean;

  apply(command: Command): Outcome;
  undo(): boolean;
  redo(): boolean;
  select(selection: Partial<Selection>): void;
  setPowerState(id: string): void;
  notify(notice: StatusNote | null): void;
  openDialog(dialog: Dialog | null): void;
}

export type EditorStore = StoreApi<EditorState>;

/** Why an edit is refused in a read-only editor. */
export const READ_ONLY = 'This design is open read-only: choose "Edit" beside the title to change it.';

/** Create an editor holding `design` (already validated) and its first full check. */
export function createEditorStore(design: Design, options: { readonly readOnly?: boolean } = {}): EditorStore {
  const readOnly = options.readOnly === true;
  return createStore<EditorState>()((set, get) => {
    /** Take a new design: re-check against the previous result and keep the UI state consistent. */
    function adopt(
      next: Design,
      action: string,
      history: Pick<EditorState, 'past' | 'future'>,
      notice: StatusNote | null,
    ): void {
      const s = get();
      const result = check(next, s.result);
      const powerState = result.states.some((st) => st.id === s.powerState) ? s.powerState : ALL_ON;
      set({
        ...history,
        design: next,
        result,
        powerState,
        netStatus: netStatuses(result, powerState, s.netStatus),
        selection: cleanSelection(next, s.selection),
        lastCheck: { action, netsChecked: result.stats.netsChecked, ms: result.stats.ms },
        notice,
      });
    }

    const first = check(design);
    return {
      design,
      result: first,
      past: [],
      future: [],
      selection: EMPTY_SELECTION,
      powerState: ALL_ON,
      netStatus: netStatuses(first, ALL_ON),
      lastCheck: { action: 'Open', netsChecked: first.stats.netsChecked, ms: first.stats.ms },
      notice: null,
      dialog: null,
      readOnly,

      apply(command) {
        const s = get();
        if (readOnly) {
          set({ notice: { kind: 'refused', text: READ_ONLY } });
          return { ok: false, reason: READ_ONLY };
        }
        let refusal: string | undefined;
        const [next, patches, inverse] = produceWithPatches(s.design, (draft) => {
          const out = command.recipe(draft);
          if (isRefusal(out)) {
            refusal = out.refused;
            return undefined;
          }
          return out;
        });
        if (refusal !== undefined) {
          set({ notice: { kind: 'refused', text: refusal } });
          return { ok: false, reason: refusal };
        }
        if (patches.length === 0) return { ok: true, changed: false };
        const step: Step = { name: command.name, patches, inverse };
        adopt(next, command.name, { past: [...s.past, step], future: [] }, null);
        return { ok: true, changed: true };
      },

      undo() {
        if (readOnly) return false;
        const s = get();
        const step = s.past[s.past.length - 1];
        if (step === undefined) return false;
        const next = applyPatches(s.design, step.inverse as Patch[]);
        adopt(
          next,
          `Undo ${step.name}`,
          { past: s.past.slice(0, -1), future: [step, ...s.future] },
          { kind: 'done', text: `Undid: ${step.name}` },
        );
        return true;
      },

      redo() {
        if (readOnly) return false;
        const s = get();
        const step = s.future[0];
        if (step === undefined) return false;
        const next = applyPatches(s.design, step.patches as Patch[]);
        adopt(
          next,
          `Redo ${step.name}`,
          { past: [...s.past, step], future: s.future.slice(1) },
          { kind: 'done', text: `Redid: ${step.name}` },
        );
        return true;
      },

      select(partial) {
        const s = get();
        set({ selection: cleanSelection(s.design, { ...s.selection, ...partial }) });
      },

      setPowerState(id) {
        const s = get();
        if (id === s.powerState || !s.result.states.some((st) => st.id === id)) return;
        set({ powerState: id, netStatus: netStatuses(s.result, id, s.netStatus) });
      },

      notify(notice) {
        set({ notice });
      },

      openDialog(dialog) {
        set({ dialog });
      },
    };
  });
}
