/**
 * The page's session: which design is open, its editor and autosave, the library actions,
 * and what the user must be told (a conflict with another tab, a failed write, a refused
 * file). Not React: the components read `state` through narrow selectors.
 *
 * Every opened design gets a fresh editor store (its own undo history). Edits reach storage
 * through the editor's subscription → `Saver` → `Library.save`, which refuses to write over
 * a revision it did not start from.
 */
import { createStore, type StoreApi } from 'zustand/vanilla';
import { newDesign } from '../../rules/model/index.ts';
import type { DesignError } from '../../rules/model/index.ts';
import type { Design } from '../../rules/model/index.ts';
import { replaceDesign, setTitle } from '../store/commands/index.ts';
import { createEditorStore, type EditorStore } from '../store/editorStore.ts';
import type { DesignRecord } from '../storage/db.ts';
import { MAX_DESIGN_FILE_BYTES, readDesignFile, reportJsonFileName } from '../storage/designFile.ts';
import { makeChecker, type Checker } from '../check/checker.ts';
import { LARGE_DESIGN_PARTS, WORKER_FILE_BYTES, type Counts, type Stage } from '../check/jobs.ts';
import { ROOT_PATH } from '../../rules/model/index.ts';
import { storageProblem } from '../storage/errors.ts';
import type { Change, Library } from '../storage/library.ts';
import type { Saver } from '../storage/saver.ts';
import { fingerprint, stage, unstage, type KeyValueStore } from '../storage/staging.ts';
import { commitDrafts, hasDrafts } from '../panels/drafts.ts';
import { exportDesignFile } from './download.ts';
import { countsOf, Editing, HELD, type Conflict, type EditingHooks, type Entry } from './editing.ts';
import type { TabChannel } from './tabs.ts';

export type { Conflict, Entry } from './editing.ts';

export interface OpenDesign {
  /** The design's id in the library; null when storage is unavailable. */
  readonly id: string | null;
  /** Changes whenever the editor store does (the view remounts on it). */
  readonly serial: number;
  readonly store: EditorStore;
  readonly saver: Saver<Entry>;
}

export interface NoticeAction {
  readonly label: string;
  readonly run: () => void;
}

export interface Notice {
  /** One notice per key: a newer one replaces it. */
  readonly key: string;
  readonly tone: 'error' | 'info';
  readonly title: string;
  readonly lines: readonly string[];
  readonly actions?: readonly NoticeAction[];
}

export type LibraryView = 'designs' | 'deleted' | 'history';

/** A design too large to open at once, waiting for the user's choice (see check/jobs.ts). */
export interface LargeChoice {
  readonly id: string;
  readonly title: string;
  readonly parts: number;
  /** Its unwaived errors and warnings, when already checked (an import). */
  readonly counts: Counts | null;
  /** Imported just now, the design the page opens at start, or one picked in the library. */
  readonly source: 'import' | 'start' | 'library';
  /** The checker's key for the read that checked it, reused by "report only". */
  readonly key: number | null;
  /** What is being done for it now ("Checking…"). */
  readonly busy: string | null;
  readonly report: {
    readonly counts: Counts;
    readonly findings: number;
    readonly text: string;
    readonly fileName: string;
  } | null;
  readonly error: string | null;
}

export type LargeAction = 'open' | 'read-only' | 'report' | 'cancel';

function stageText(stage: Stage, title: string, parts: number | null): string {
  if (stage === 'reading') return `Reading “${title}”…`;
  if (stage === 'checking')
    return `Checking “${title}”${parts === null ? '' : ` (${parts.toLocaleString('en')} parts)`}…`;
  return `Writing the report of “${title}”…`;
}

/** Let the browser paint (a progress text, a dialog) before a long step on this thread. */
const painted = () =>
  new Promise<void>((resolve) => {
    if (typeof requestAnimationFrame === 'function') requestAnimationFrame(() => setTimeout(resolve, 0));
    else setTimeout(resolve, 0);
  });
export interface SessionState {
  readonly open: OpenDesign;
  readonly conflict: Conflict | null;
  readonly notices: readonly Notice[];
  readonly view: LibraryView | null;
  /** Why nothing can be stored in this browser, if so. */
  readonly storageError: string | null;
  /** A long task in progress ("Making the PDF…"), for the progress indication. */
  readonly task: string | null;
  /** A large design waiting for the choice of how to open it. */
  readonly large: LargeChoice | null;
}

/** The key of the notice that says a design went to Recently deleted: one per design. */
export function deletedNoticeKey(id: string): string {
  return `deleted-${id}`;
}

export function errorLines(errors: readonly DesignError[], max = 6): string[] {
  const lines = errors.slice(0, max).map((e) => `${e.path}: ${e.message}`);
  if (errors.length > max) lines.push(`… and ${errors.length - max} more`);
  return lines;
}

/** Revisions the reader refused on opening, and which one is open instead. */
export function refusedRevisionsNotice(
  title: string,
  revs: readonly number[],
  opened: number,
  errors: readonly DesignError[],
): Notice {
  const which =
    revs.length === 1 ? `revision ${revs[0]} could not be read` : `revisions ${revs.join(', ')} could not be read`;
  return {
    key: 'open',
    tone: 'error',
    title: `“${title}”: ${which}; revision ${opened} is open`,
    lines: [...errorLines(errors, 3), 'The unreadable revisions stay stored; the next save starts from this one.'],
  };
}

/** The page's localStorage, or null where there is none (or it may not be used). */
export function pageStore(): KeyValueStore | null {
  try {
    return typeof localStorage === 'undefined' ? null : localStorage;
  } catch {
    return null;
  }
}

export class Session {
  readonly state: StoreApi<SessionState>;
  /** This tab's name: its staged entry and its lock carry it. */
  readonly tab: string;
  /** Where page-hide stages unsaved edits (see storage/staging.ts). */
  staging: KeyValueStore | null = pageStore();
  /** True while this tab's entry is staged and not yet known to be stored. */
  private staged = false;
  private ctx: Editing;
  private serial = 0;
  private readonly hooks: EditingHooks = {
    onConflict: (editing, conflict) => {
      if (editing === this.ctx) this.state.setState({ conflict });
    },
    isHeld: (editing) => editing === this.ctx && this.state.getState().conflict !== null,
    onStatus: (editing) => this.onSaveStatus(editing),
    storageError: () => this.state.getState().storageError,
  };

  constructor(
    readonly library: Library | null,
    private readonly channel: TabChannel | null,
    first: { readonly id: string | null; readonly rev: number; readonly design: Design | EditorStore },
    storageError: string | null = null,
  ) {
    this.tab = channel?.tab ?? crypto.randomUUID();
    this.ctx = this.editing(first.id, first.rev, first.design);
    this.state = createStore<SessionState>()(() => ({
      open: this.openOf(this.ctx),
      conflict: null,
      notices: [],
      view: null,
      storageError,
      task: null,
      large: null,
    }));
    this.channel?.subscribe((change) => this.onRemoteChange(change));
    this.settled = this.afterOpen(this.ctx);
  }

  /** Resolves when the bookkeeping after opening a design (last opened, counts) is stored. */
  settled: Promise<void>;

  /** The open design's editor. */
  get editor(): EditorStore {
    return this.ctx.store;
  }

  get openId(): string | null {
    return this.ctx.id;
  }

  // ---- opening ---------------------------------------------------------------------------

  /** Reads, checks and reports large designs off the main thread (created when first needed). */
  private checkerInstance: Checker | null = null;
  get checker(): Checker {
    return (this.checkerInstance ??= makeChecker());
  }

  /**
   * Open a design of the library in place of the current one (whose edits are saved first).
   * A design of more than `LARGE_DESIGN_PARTS` parts waits for the user's choice unless `force`.
   */
  async openDesign(
    id: string,
    options: { readonly force?: boolean; readonly readOnly?: boolean } = {},
  ): Promise<boolean> {
    if (this.library === null || (id === this.ctx.id && options.force !== true)) return id === this.ctx.id;
    if (options.force !== true) {
      const parts = await this.library.partCount(id);
      if (parts > LARGE_DESIGN_PARTS) {
        const record = await this.library.db.designs.get(id);
        this.offerLarge({
          id,
          title: record?.title ?? id,
          parts,
          counts: record === undefined ? null : { errors: record.errors, warnings: record.warnings },
          source: 'library',
          key: null,
        });
        return false;
      }
    }
    await this.flush();
    const opened = await this.library.open(id);
    if (!opened.ok) {
      this.notify({
        key: 'open',
        tone: 'error',
        title: 'This design could not be opened',
        lines:
          opened.reason === 'missing'
            ? ['It is no longer in the library.']
            : opened.refused.flatMap((r) => errorLines(r.errors, 3)),
      });
      return false;
    }
    if (opened.refused.length > 0)
      this.notify(
        refusedRevisionsNotice(
          opened.record.title,
          opened.refused.map((r) => r.rev),
          opened.rev,
          opened.refused[0]?.errors ?? [],
        ),
      );
    this.adopt(
      id,
      opened.record.rev,
      opened.design,
      options.readOnly === true ? createEditorStore(opened.design, { readOnly: true }) : undefined,
    );
    return true;
  }

  // ---- large designs ---------------------------------------------------------------------

  /** Ask how to open a large design. */
  offerLarge(choice: Omit<LargeChoice, 'busy' | 'report' | 'error'>): void {
    this.state.setState({ large: { ...choice, busy: null, report: null, error: null }, view: null });
  }

  /** The user's choice for the large design on offer. */
  async chooseLarge(action: LargeAction): Promise<void> {
    const large = this.state.getState().large;
    if (large === null || large.busy !== null) return;
    const setLarge = (patch: Partial<LargeChoice>) => {
      const now = this.state.getState().large;
      if (now !== null && now.id === large.id) this.state.setState({ large: { ...now, ...patch } });
    };
    if (action === 'report') {
      if (this.library === null) return;
      setLarge({ busy: 'Checking…', error: null });
      const onStage = (stage: Stage) => setLarge({ busy: stageText(stage, large.title, large.parts) });
      try {
        const reply = await this.checker.report(
          large.key !== null ? { key: large.key } : { doc: await this.library.newestDocument(large.id) },
          onStage,
        );
        if (!reply.ok) setLarge({ busy: null, error: reply.errors.join('; ') });
        else {
          setLarge({
            busy: null,
            counts: reply.counts,
            report: {
              counts: reply.counts,
              findings: reply.findings,
              text: `${JSON.stringify(reply.report, null, 2)}\n`,
              fileName: reportJsonFileName(large.title),
            },
          });
        }
      } catch (error) {
        setLarge({ busy: null, error: storageProblem(error) });
      }
      return;
    }
    if (action === 'cancel') {
      this.state.setState({ large: null });
      // At start nothing else is open yet: open the most recent other design, or a new one.
      if (this.ctx.id === null && this.library !== null) await this.openOther(large.id);
      return;
    }
    setLarge({ busy: `Opening “${large.title}”…` });
    this.setTask(`Opening “${large.title}” (${large.parts.toLocaleString('en')} parts)…`);
    await painted();
    try {
      const ok = await this.openDesign(large.id, { force: true, readOnly: action === 'read-only' });
      this.state.setState({ large: null });
      if (!ok && this.ctx.id === null && this.library !== null) await this.openOther(large.id);
    } finally {
      this.setTask(null);
    }
  }

  /** Open the editor of the open design for editing (it was opened read-only). */
  async editAnyway(): Promise<void> {
    const id = this.ctx.id;
    if (id === null || !this.ctx.store.getState().readOnly) return;
    this.setTask('Opening the design for editing…');
    await painted();
    try {
      await this.openDesign(id, { force: true });
    } finally {
      this.setTask(null);
    }
  }

  private async openOther(except: string): Promise<void> {
    const library = this.library;
    if (library === null) return;
    await this.guard('No design could be opened', async () => {
      const { designs } = await library.list();
      for (const d of designs) {
        if (d.id === except || (await library.partCount(d.id)) > LARGE_DESIGN_PARTS) continue;
        if (await this.openDesign(d.id)) return;
      }
      await this.createAndOpen(newDesign());
    });
  }

  /** Store `design` as a new design and open it. */
  async createAndOpen(design: Design): Promise<DesignRecord | null> {
    if (this.library === null) {
      this.ctx.store.getState().apply(replaceDesign(design, 'Open a design'));
      return null;
    }
    await this.flush();
    // The editor's first check gives the counts the list shows.
    const store = createEditorStore(design);
    const record = await this.library.create(design, countsOf(store));
    this.adopt(record.id, record.rev, design, store);
    return record;
  }

  async newDesign(): Promise<void> {
    await this.guard('The new design could not be stored', () => this.createAndOpen(newDesign()));
  }

  /**
   * Import a design file as a new design; a refused file changes nothing stored. A file of more
   * than `WORKER_FILE_BYTES` is read and checked in the worker, so that the page keeps answering;
   * a design of more than `LARGE_DESIGN_PARTS` parts is stored and offered with a choice.
   */
  async importFile(file: File): Promise<boolean> {
    if (file.size > WORKER_FILE_BYTES && file.size <= MAX_DESIGN_FILE_BYTES) return this.importInWorker(file);
    const read = await readDesignFile(file);
    if (!read.ok) {
      this.notify({
        key: 'import',
        tone: 'error',
        title: `“${file.name}” was not imported: it is not a valid design file`,
        lines: [...errorLines(read.errors), 'Nothing stored has changed.'],
      });
      return false;
    }
    const ok = await this.guard(`“${file.name}” could not be stored`, () => this.createAndOpen(read.design));
    if (ok)
      this.notify({ key: 'import', tone: 'info', title: `Imported “${read.design.title}” as a new design`, lines: [] });
    this.setView(null);
    return ok;
  }

  private async importInWorker(file: File): Promise<boolean> {
    this.setView(null);
    this.setTask(stageText('reading', file.name, null));
    const library = this.library;
    let outcome: Awaited<ReturnType<Checker['read']>>;
    try {
      const store = library === null ? undefined : { dbName: library.db.name, aboveParts: LARGE_DESIGN_PARTS };
      outcome = await this.checker.read(file, (stage) => this.setTask(stageText(stage, file.name, null)), store);
    } catch (error) {
      this.setTask(null);
      this.notify({
        key: 'import',
        tone: 'error',
        title: `“${file.name}” was not imported`,
        lines: [`${ROOT_PATH}: ${storageProblem(error)}`, 'Nothing stored has changed.'],
      });
      return false;
    }
    const { reply, key } = outcome;
    if (!reply.ok) {
      this.setTask(null);
      this.notify({
        key: 'import',
        tone: 'error',
        title: `“${file.name}” was not imported: it is not a valid design file`,
        lines: [...errorLines(reply.errors), 'Nothing stored has changed.'],
      });
      return false;
    }
    const imported: Notice = {
      key: 'import',
      tone: 'info',
      title: `Imported “${reply.title}” as a new design`,
      lines: [],
    };
    if (reply.stored !== null) {
      // Stored by the worker: tell other tabs, and offer the choice.
      this.setTask(null);
      this.channel?.post({ id: reply.stored.id, rev: reply.stored.rev, deleted: false });
      this.notify(imported);
      this.offerLarge({
        id: reply.stored.id,
        title: reply.title,
        parts: reply.parts,
        counts: reply.counts,
        source: 'import',
        key,
      });
      return true;
    }
    const design = reply.design;
    if (design === null) {
      this.setTask(null);
      return false;
    }
    this.setTask(`Opening “${design.title}”…`);
    await painted();
    const ok = await this.guard(`“${file.name}” could not be stored`, () => this.createAndOpen(design));
    this.setTask(null);
    if (ok) this.notify(imported);
    return ok;
  }

  // ---- library actions -------------------------------------------------------------------

  async rename(id: string, title: string): Promise<void> {
    if (id === this.ctx.id) {
      this.ctx.store.getState().apply(setTitle(title));
      return;
    }
    await this.guard('The design could not be renamed', async () =>
      this.refused('renamed', await this.library?.rename(id, title)),
    );
  }

  async duplicate(id: string): Promise<void> {
    if (id === this.ctx.id) await this.flush();
    await this.guard('The design could not be duplicated', async () =>
      this.refused('duplicated', await this.library?.duplicate(id)),
    );
  }

  /** A library action that found the design changed, gone or unreadable says so. */
  private refused(what: string, outcome: object | undefined): void {
    if (outcome === undefined || !('ok' in outcome) || outcome.ok !== false || !('reason' in outcome)) return;
    const why =
      outcome.reason === 'changed'
        ? 'another tab saved it meanwhile: try again'
        : outcome.reason === 'unreadable'
          ? 'its stored revisions could not be read'
          : 'it is no longer in the library';
    this.notify({ key: 'storage', tone: 'error', title: `The design could not be ${what}`, lines: [`Why: ${why}.`] });
  }

  /** Move a design to "recently deleted"; deleting the open one opens the next (or a new one). */
  async remove(id: string): Promise<void> {
    const library = this.library;
    if (library === null) return;
    const isOpen = id === this.ctx.id;
    if (isOpen) await this.flush();
    await this.guard('The design could not be deleted', async () => {
      await library.remove(id);
      if (isOpen) {
        const { designs } = await library.list();
        const next = designs.find((d) => d.id !== id);
        if (next === undefined || !(await this.openDesign(next.id))) await this.createAndOpen(newDesign());
      }
    });
  }

  async restore(id: string): Promise<void> {
    const ok = await this.guard('The design could not be restored', async () => this.library?.restore(id));
    // The notice that said it was deleted is no longer true, whichever way it came back.
    if (ok) this.dismiss(deletedNoticeKey(id));
  }

  async purge(id: string): Promise<void> {
    await this.guard('The design could not be deleted', async () => this.library?.purge(id));
  }

  /** Bring back a revision of the open design: as its current state (undoable), or as a new design. */
  async restoreRevision(rev: number, asCopy: boolean): Promise<void> {
    const { library, ctx } = this;
    if (library === null || ctx.id === null) return;
    const read = await library.readRevision(ctx.id, rev);
    if (!read.ok) {
      this.notify({
        key: 'revision',
        tone: 'error',
        title: `Revision ${rev} could not be read`,
        lines: errorLines(read.errors),
      });
      return;
    }
    this.setView(null);
    if (asCopy)
      await this.guard('The copy could not be stored', () =>
        this.createAndOpen({ ...read.design, title: `${read.design.title} (revision ${rev})` }),
      );
    else ctx.store.getState().apply(replaceDesign(read.design, `Restore revision ${rev}`));
  }

  // ---- saving and other tabs -------------------------------------------------------------

  /** Write what is pending now (page hidden or closing, another design opening). */
  flush(): Promise<void> {
    return this.ctx.saver.flush();
  }

  /** True while an edit, or text typed in a field, is not yet stored. */
  hasUnsaved(): boolean {
    const { saver } = this.ctx;
    return hasDrafts() || saver.unstored !== undefined || saver.status.state === 'failed';
  }

  /**
   * The page is being hidden or closed: commit the fields' typed text, stage the newest
   * unsaved state synchronously, and start its save (which may not finish). Returns whether
   * something is staged.
   */
  leave(): boolean {
    commitDrafts();
    const staged = this.stage();
    void this.flush();
    return staged;
  }

  /** Write the open design's newest unsaved state to the staging store, synchronously. */
  stage(): boolean {
    const { ctx } = this;
    const entry = ctx.saver.unstored;
    if (this.library === null || ctx.id === null || entry === undefined) return false;
    const inFlight = ctx.saver.inFlight;
    this.staged = stage(this.staging, {
      tab: this.tab,
      id: ctx.id,
      baseRev: ctx.baseRev,
      inFlight: inFlight === undefined || inFlight === entry ? null : fingerprint(inFlight.design),
      design: entry.design,
      errors: entry.errors,
      warnings: entry.warnings,
      at: Date.now(),
    });
    return this.staged;
  }

  /** Settle a conflict: load the stored version, restore the deleted design, or keep this tab's as a copy. */
  async resolveConflict(choice: 'reload' | 'restore' | 'copy'): Promise<void> {
    const { library, ctx } = this;
    if (library === null || ctx.id === null) return;
    if (choice === 'copy') {
      const design = ctx.store.getState().design;
      const title = `${design.title} (copy)`;
      const ok = await this.guard('The copy could not be stored', async () => {
        const record = await library.create({ ...design, title }, countsOf(ctx.store));
        // Keep this editor and its undo history; it now edits the copy.
        ctx.close(false);
        this.ctx = this.editing(record.id, record.rev, ctx.store);
        this.ctx.store.getState().apply(setTitle(title));
        this.state.setState({ open: this.openOf(this.ctx), conflict: null });
        this.settled = this.afterOpen(this.ctx);
        await this.settled;
      });
      if (ok)
        this.notify({
          key: 'conflict',
          tone: 'info',
          title: `This tab's version is now a new design, “${title}”`,
          lines: [],
        });
      return;
    }
    if (choice === 'restore') {
      await library.restore(ctx.id);
      this.dismiss(deletedNoticeKey(ctx.id));
      this.state.setState({ conflict: null });
      await this.flush();
      return;
    }
    const opened = await library.open(ctx.id);
    if (!opened.ok) {
      this.notify({
        key: 'conflict',
        tone: 'error',
        title: 'The other version could not be read',
        lines: opened.reason === 'missing' ? [] : opened.refused.flatMap((r) => errorLines(r.errors, 3)),
      });
      return;
    }
    this.state.setState({ conflict: null });
    ctx.takeStored(opened.record.rev, () =>
      ctx.store.getState().apply(replaceDesign(opened.design, "Load the other tab's version")),
    );
  }

  /** When this tab comes back into view, a change it missed is found by comparing revisions. */
  async checkStored(): Promise<void> {
    const { library, ctx } = this;
    if (library === null || ctx.id === null || this.state.getState().conflict !== null) return;
    const record = await library.db.designs.get(ctx.id).catch(() => undefined);
    if (record === undefined) this.onRemoteChange({ id: ctx.id, rev: 0, deleted: true });
    else this.onRemoteChange({ id: ctx.id, rev: record.rev, deleted: record.deletedAt !== null });
  }

  private onRemoteChange(change: Change): void {
    const { ctx } = this;
    if (change.id !== ctx.id) return;
    const conflict = this.state.getState().conflict;
    if (change.deleted) {
      this.state.setState({ conflict: { kind: 'deleted', restorable: change.rev > 0 } });
    } else if (change.rev > ctx.baseRev) {
      this.state.setState({ conflict: { kind: 'changed', rev: change.rev, savedAt: Date.now() } });
    } else if (conflict?.kind === 'deleted' && change.rev === ctx.baseRev) {
      // Restored in the other tab, with nothing saved over this tab's revision.
      this.state.setState({ conflict: null });
      void this.flush();
    }
  }

  // ---- notices and views -----------------------------------------------------------------

  notify(notice: Notice): void {
    const rest = this.state.getState().notices.filter((n) => n.key !== notice.key);
    this.state.setState({ notices: [...rest, notice] });
  }

  dismiss(key: string): void {
    this.state.setState({ notices: this.state.getState().notices.filter((n) => n.key !== key) });
  }

  setView(view: LibraryView | null): void {
    this.state.setState({ view });
  }

  setTask(task: string | null): void {
    this.state.setState({ task });
  }

  /** Run a storage action; a failure becomes a notice (the editor keeps its design). */
  private async guard(title: string, action: () => Promise<unknown>): Promise<boolean> {
    try {
      await action();
      return true;
    } catch (error) {
      this.notify({ key: 'storage', tone: 'error', title, lines: [storageProblem(error)] });
      return false;
    }
  }

  /** Stop listening to other tabs and drop timers (tests; the page never closes its session). */
  close(): void {
    this.ctx.close(false);
    this.channel?.close();
  }

  // ---- the open design's editor and autosave ---------------------------------------------

  private adopt(id: string | null, rev: number, design: Design, store?: EditorStore): void {
    if (this.state.getState().large?.id === id) this.state.setState({ large: null });
    // An edit made while the next design was loading is still written to its own design.
    this.ctx.close(true);
    this.ctx = this.editing(id, rev, store ?? design);
    this.state.setState({ open: this.openOf(this.ctx), conflict: null, view: null });
    this.settled = this.afterOpen(this.ctx);
  }

  private editing(id: string | null, rev: number, from: Design | EditorStore): Editing {
    const editing = new Editing(this.library, id, rev, from, this.hooks);
    // A new store is a new view; the same store under a new id (a copy) keeps its view.
    if (editing.store !== this.ctx?.store) this.serial++;
    return editing;
  }

  private openOf(ctx: Editing): OpenDesign {
    return { id: ctx.id, serial: this.serial, store: ctx.store, saver: ctx.saver };
  }

  /** Remember the open design for a reload of this tab and for the next start, and fix its counts. */
  private async afterOpen(ctx: Editing): Promise<void> {
    if (this.library === null || ctx.id === null) return;
    try {
      sessionStorage.setItem(OPEN_KEY, ctx.id);
    } catch {
      // No session storage: the next start opens the last design opened in any tab.
    }
    try {
      await this.library.setLastOpened(ctx.id);
      await this.library.setCounts(ctx.id, ctx.baseRev, countsOf(ctx.store));
    } catch {
      // Not worth a message: the next save writes both again.
    }
  }

  private onSaveStatus(ctx: Editing): void {
    if (ctx !== this.ctx) return;
    const status = ctx.saver.status;
    if (this.staged) {
      // Once everything is stored the staged entry is stale; until then it follows the newest state.
      if (ctx.saver.unstored === undefined && status.state === 'saved') {
        unstage(this.staging, this.tab);
        this.staged = false;
      } else if (status.state === 'saving') {
        this.stage();
      }
    }
    if (status.state === 'saved') this.dismiss('save');
    if (status.state !== 'failed' || status.error === HELD) return;
    this.notify({
      key: 'save',
      tone: 'error',
      title: 'Your changes are not saved',
      lines: [
        `Why: ${status.error}.`,
        'The design stays open in this page. Export it now to keep a copy, or try again.',
      ],
      actions: [
        { label: 'Export design file', run: () => exportDesignFile(ctx.store.getState().design) },
        { label: 'Try again', run: () => void ctx.saver.flush() },
      ],
    });
  }
}

/** Where a tab remembers its open design across a reload. */
export const OPEN_KEY = 'railcross.openDesign';
