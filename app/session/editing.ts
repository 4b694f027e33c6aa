/**
 * One open design: its editor store, its autosave, and the revision it was loaded from or
 * last saved as. Every new design object the editor commits is handed to the saver; the
 * saver writes through `Library.save`, which refuses to write over a revision this editor
 * did not start from.
 */
import type { Design } from '../../rules/model/index.ts';
import { createEditorStore, type EditorStore } from '../store/editorStore.ts';
import { storageProblem } from '../storage/errors.ts';
import type { Library } from '../storage/library.ts';
import { summarizeChanges } from '../storage/changes.ts';
import { Saver } from '../storage/saver.ts';

/** What autosave writes: the design, its counts for the list and the commands that made it. */
export interface Entry {
  readonly design: Design;
  readonly errors: number;
  readonly warnings: number;
  /** The names of the commands (and undos, redos) since the last stored revision, in order. */
  readonly changes?: readonly string[];
}

export type Conflict =
  | { readonly kind: 'changed'; readonly rev: number; readonly savedAt: number }
  | { readonly kind: 'deleted'; readonly restorable: boolean };

/** Why a save was held back while the user chooses between two tabs' versions. */
export const HELD = 'this design changed in another tab: choose which version to keep';

export interface EditingHooks {
  /** A save found a newer revision, or the design deleted: nothing was written. */
  onConflict(editing: Editing, conflict: Conflict): void;
  /** True while saves must wait for the user's choice. */
  isHeld(editing: Editing): boolean;
  onStatus(editing: Editing): void;
  /** Why nothing can be stored, when storage is unavailable. */
  storageError(): string | null;
}

export function countsOf(store: EditorStore): { errors: number; warnings: number } {
  const { summary } = store.getState().result;
  return { errors: summary.error, warnings: summary.warning };
}

export class Editing {
  readonly store: EditorStore;
  readonly saver: Saver<Entry>;
  /** The newest revision this editor knows is stored: its next save must start from it. */
  baseRev: number;
  /** The design object last stored or loaded: an editor holding it has nothing to save. */
  private saved: Design | undefined;
  /** The names of the commands since the last stored revision (the revision list's "what changed"). */
  private changes: string[] = [];
  private readonly off: () => void;

  constructor(
    private readonly library: Library | null,
    /** The design's id in the library; null when storage is unavailable. */
    readonly id: string | null,
    rev: number,
    design: Design | EditorStore,
    private readonly hooks: EditingHooks,
  ) {
    this.store = 'getState' in design ? design : createEditorStore(design);
    this.baseRev = rev;
    this.saved = this.store.getState().design;
    this.saver = new Saver<Entry>({ write: (entry) => this.write(entry) });
    const offStore = this.store.subscribe((s, prev) => {
      if (s.design === prev.design) return;
      // Every change of the design is a command, an undo or a redo, named in `lastCheck`.
      this.changes.push(s.lastCheck.action);
      if (s.design === this.saved) return;
      this.saver.save({
        design: s.design,
        errors: s.result.summary.error,
        warnings: s.result.summary.warning,
        changes: summarizeChanges(this.changes),
      });
    });
    const offSaver = this.saver.subscribe(() => hooks.onStatus(this));
    this.off = () => {
      offStore();
      offSaver();
    };
  }

  /** Take a stored revision as the editor's state (one undoable step) without saving it again. */
  takeStored(rev: number, apply: () => void): void {
    this.baseRev = rev;
    apply();
    this.saved = this.store.getState().design;
    this.changes = [];
    this.saver.discard();
  }

  /** Stop following the editor; with `flush`, what is pending is still written first. */
  close(flush: boolean): void {
    this.off();
    if (flush) void this.saver.flush().finally(() => this.saver.dispose());
    else this.saver.dispose();
  }

  private async write(entry: Entry): Promise<void> {
    const { library, id } = this;
    if (library === null || id === null) {
      throw new Error(`nothing can be stored in this browser (${this.hooks.storageError() ?? 'no IndexedDB'})`);
    }
    if (this.hooks.isHeld(this)) throw new Error(HELD);
    const start = performance.now();
    const written = this.changes.length;
    let outcome: Awaited<ReturnType<typeof library.save>>;
    try {
      outcome = await library.save(id, this.baseRev, entry.design, entry);
    } catch (error) {
      throw new Error(storageProblem(error));
    }
    if (outcome.ok) {
      this.baseRev = outcome.rev;
      this.saved = entry.design;
      // The commands written with it; those made while it was written go with the next revision.
      if (entry.design === this.store.getState().design) this.changes = [];
      else this.changes = this.changes.slice(written);
      performance.measure('railcross:save', { start });
      return;
    }
    this.hooks.onConflict(
      this,
      outcome.reason === 'changed'
        ? { kind: 'changed', rev: outcome.rev, savedAt: outcome.savedAt }
        : { kind: 'deleted', restorable: outcome.reason === 'deleted' },
    );
    throw new Error(HELD);
  }
}
