/**
 * Starting the editor: open the database (upgrading it if needed), purge designs deleted more
 * than 30 days ago, and open the design this tab had open (a reload), else the one last opened
 * in any tab, else the most recently changed; the example on a first start. Without storage
 * the editor still works, on the example, and says that nothing will be kept.
 */
import type { Design } from '../../rules/model/index.ts';
import { newDesign } from '../../rules/model/index.ts';
import { exampleDesign } from '../example.ts';
import { RailcrossDb } from '../storage/db.ts';
import { storageProblem } from '../storage/errors.ts';
import { Library } from '../storage/library.ts';
import { replayStaged, type KeyValueStore, type Replayed } from '../storage/staging.ts';
import { errorLines, OPEN_KEY, pageStore, refusedRevisionsNotice, Session, type Notice } from './session.ts';
import { exportDesignFile } from './download.ts';
import { TabChannel } from './tabs.ts';
import { LARGE_DESIGN_PARTS } from '../check/jobs.ts';
import { createEditorStore } from '../store/editorStore.ts';

function rememberedId(): string | null {
  try {
    return sessionStorage.getItem(OPEN_KEY);
  } catch {
    return null;
  }
}

/** How long an upgrade may wait for another tab to let go of the old database, ms. */
const BLOCKED_MS = 8000;

async function openDb(name: string | undefined): Promise<RailcrossDb> {
  if (typeof indexedDB === 'undefined') throw new Error('this browser offers no IndexedDB');
  const db = new RailcrossDb(name);
  let timer: ReturnType<typeof setTimeout> | undefined;
  // An older Railcross in another tab that does not close its connection blocks the upgrade.
  const blocked = new Promise<never>((_, reject) => {
    db.on('blocked', () => {
      timer = setTimeout(
        () =>
          reject(
            new Error(
              'another Railcross tab keeps an older version of the database open: close or reload it, then reload this page',
            ),
          ),
        BLOCKED_MS,
      );
    });
  });
  try {
    await Promise.race([db.open(), blocked]);
  } finally {
    clearTimeout(timer);
  }
  return db;
}

interface First {
  readonly id: string;
  readonly rev: number;
  readonly design: Design;
}

/** The design to open first holds too many parts to open before the user says how. */
interface LargeFirst {
  readonly large: {
    readonly id: string;
    readonly title: string;
    readonly parts: number;
    readonly errors: number;
    readonly warnings: number;
  };
}

/** The design to open first, and what the user should hear about the others. */
async function chooseFirst(library: Library, notices: Notice[]): Promise<First | LargeFirst> {
  const listing = await library.list();
  if (listing.skipped.length > 0) {
    const n = listing.skipped.length;
    notices.push({
      key: 'skipped',
      tone: 'error',
      title: `${n} stored design ${n === 1 ? 'record' : 'records'} could not be read and ${n === 1 ? 'was' : 'were'} skipped; the others open as usual`,
      lines: listing.skipped.slice(0, 6).map((s) => `${s.where}: ${s.message}`),
    });
  }
  const known = new Set(listing.designs.map((d) => d.id));
  const wanted = [rememberedId(), await library.lastOpened(), ...listing.designs.map((d) => d.id)];
  const tried = new Set<string>();
  for (const id of wanted) {
    if (id === null || id === undefined || !known.has(id) || tried.has(id)) continue;
    tried.add(id);
    const listed = listing.designs.find((d) => d.id === id);
    const title = listed?.title ?? id;
    // Read (and check) nothing of a design this large before the user chooses: that froze the page.
    const parts = await library.partCount(id);
    if (parts > LARGE_DESIGN_PARTS)
      return { large: { id, title, parts, errors: listed?.errors ?? 0, warnings: listed?.warnings ?? 0 } };
    const opened = await library.open(id);
    if (opened.ok) {
      if (opened.refused.length > 0) {
        notices.push(
          refusedRevisionsNotice(
            title,
            opened.refused.map((r) => r.rev),
            opened.rev,
            opened.refused[0]?.errors ?? [],
          ),
        );
      }
      return { id, rev: opened.record.rev, design: opened.design };
    }
    const errors =
      opened.reason === 'unreadable' ? opened.refused.flatMap((r) => errorLines(r.errors, 2)).slice(0, 6) : [];
    notices.push({
      key: `unreadable-${id}`,
      tone: 'error',
      title: `“${title}” could not be read and was skipped`,
      lines: errors,
    });
  }
  const design = listing.designs.length === 0 && listing.skipped.length === 0 ? exampleDesign() : newDesign();
  const record = await library.create(design);
  return { id: record.id, rev: record.rev, design };
}

/** Open storage and the first design; never throws (a storage failure gives an unsaved session). */
export async function startSession(dbName?: string, staging: KeyValueStore | null = pageStore()): Promise<Session> {
  const start = performance.now();
  const channel = new TabChannel();
  let library: Library;
  const notices: Notice[] = [];
  let first: First | LargeFirst;
  let recovered: Replayed[] = [];
  try {
    const db = await openDb(dbName);
    library = new Library(db, (change) => channel.post(change));
    holdTabLock(channel.tab);
    await library.purgeExpired();
    recovered = await replayStaged(library, staging, tabAlive);
    first = await chooseFirst(library, notices);
  } catch (error) {
    const why = storageProblem(error);
    const session = new Session(null, null, { id: null, rev: 0, design: exampleDesign() }, why);
    session.notify({
      key: 'storage',
      tone: 'error',
      title: 'Designs cannot be stored in this browser',
      lines: [`Why: ${why}.`, 'You can still edit, import and export; export your design to keep it.'],
      actions: [{ label: 'Export design file', run: () => exportDesignFile(session.editor.getState().design) }],
    });
    channel.close();
    return session;
  }
  performance.measure('railcross:open', { start });
  const session =
    'large' in first
      ? // Nothing opens behind the choice: an empty, read-only page that stores nothing.
        new Session(library, channel, {
          id: null,
          rev: 0,
          design: createEditorStore(newDesign(first.large.title), { readOnly: true }),
        })
      : new Session(library, channel, first);
  if ('large' in first) {
    const { id, title, parts, errors, warnings } = first.large;
    session.offerLarge({ id, title, parts, counts: { errors, warnings }, source: 'start', key: null });
  }
  session.staging = staging;
  for (const n of notices) session.notify(n);
  for (const n of replayNotices(recovered, session)) session.notify(n);
  await session.settled;
  return session;
}

const LOCK_PREFIX = 'railcross-tab-';

/** Hold a lock named after this tab for as long as the page lives: its staged entry is its own while it does. */
const locks = (): LockManager | undefined => (typeof navigator === 'undefined' ? undefined : navigator.locks);

function holdTabLock(tab: string): void {
  void locks()
    ?.request(LOCK_PREFIX + tab, () => new Promise<void>(() => {}))
    .catch(() => {});
}

/** Whether the tab that staged an entry is still open (where the browser can tell). */
async function tabAlive(tab: string): Promise<boolean> {
  const manager = locks();
  if (manager === undefined) return false;
  try {
    const { held = [] } = await manager.query();
    return held.some((l) => l.name === LOCK_PREFIX + tab);
  } catch {
    return false;
  }
}

/** What start-up carried over from a page that went before its last edits were stored. */
function replayNotices(replayed: readonly Replayed[], session: Session): Notice[] {
  const notices: Notice[] = [];
  const recovered = replayed.filter((r) => r.outcome === 'recovered');
  for (const r of recovered) {
    notices.push({
      key: `recovered-${r.copy}`,
      tone: 'info',
      title: `Edits made just before a page closed are kept as a new design, “${r.title}”`,
      lines: [
        'Another tab saved the design meanwhile (or deleted it), so they were not written over its newer version.',
      ],
      actions: [{ label: 'Open it', run: () => void session.openDesign(r.copy) }],
    });
  }
  const unreadable = replayed.filter((r) => r.outcome === 'unreadable');
  if (unreadable.length > 0) {
    notices.push({
      key: 'staged-unreadable',
      tone: 'error',
      title: 'Edits left by a closed page could not be read and were dropped',
      lines: unreadable.slice(0, 3).map((r) => `${r.key}: ${r.why}`),
    });
  }
  return notices;
}

/**
 * Keep every edit when the page is hidden, reloaded or closed: commit typed text, stage the
 * newest unsaved state synchronously (see storage/staging.ts) and start its save; ask before
 * leaving while anything is unsaved; look for another tab's changes when the page comes back.
 */
export function attachPageEvents(session: Session): () => void {
  const onHide = () => void session.leave();
  const onVisibility = () => {
    if (document.visibilityState === 'hidden') session.leave();
    else void session.checkStored();
  };
  const onBeforeUnload = (e: BeforeUnloadEvent) => {
    // What is staged on page-hide is replayed at the next start; the browser still asks, as
    // the page cannot tell whether there will be a next start in this browser.
    if (session.hasUnsaved()) e.preventDefault();
  };
  addEventListener('pagehide', onHide);
  document.addEventListener('visibilitychange', onVisibility);
  addEventListener('beforeunload', onBeforeUnload);
  return () => {
    removeEventListener('pagehide', onHide);
    document.removeEventListener('visibilitychange', onVisibility);
    removeEventListener('beforeunload', onBeforeUnload);
  };
}
