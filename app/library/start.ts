/**
 * Starting the editor: open the database (upgrading it if needed), purge designs deleted more
 * than 30 days ago, and open the design this tab had open (a reload), else the one last opened
 * in any tab, else the most recently changed; the example on a first start. Without storage
 * the editor still works, on the example, and says that nothing will be kept.
 */
import type { Design } from '../../rules/model/schema.ts';
import { newDesign } from '../../rules/model/newDesign.ts';
import { exampleDesign } from '../example.ts';
import { RailcrossDb } from '../storage/db.ts';
import { storageProblem } from '../storage/errors.ts';
import { Library } from '../storage/library.ts';
import { errorLines, OPEN_KEY, refusedRevisionsNotice, Session, type Notice } from './session.ts';
import { exportDesignFile } from './download.ts';
import { TabChannel } from './tabs.ts';

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
      timer = setTimeout(() => reject(new Error('another Railcross tab keeps an older version of the database open: close or reload it, then reload this page')), BLOCKED_MS);
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

/** The design to open first, and what the user should hear about the others. */
async function chooseFirst(library: Library, notices: Notice[]): Promise<First> {
  const listing = await library.list();
  if (listing.skipped.length > 0) {
    const n = listing.skipped.length;
    notices.push({
      key: 'skipped', tone: 'error',
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
    const opened = await library.open(id);
    const title = listing.designs.find((d) => d.id === id)?.title ?? id;
    if (opened.ok) {
      if (opened.refused.length > 0) {
        notices.push(refusedRevisionsNotice(title, opened.refused.map((r) => r.rev), opened.rev, opened.refused[0]?.errors ?? []));
      }
      return { id, rev: opened.record.rev, design: opened.design };
    }
    const errors = opened.reason === 'unreadable' ? opened.refused.flatMap((r) => errorLines(r.errors, 2)).slice(0, 6) : [];
    notices.push({ key: `unreadable-${id}`, tone: 'error', title: `“${title}” could not be read and was skipped`, lines: errors });
  }
  const design = listing.designs.length === 0 && listing.skipped.length === 0 ? exampleDesign() : newDesign();
  const record = await library.create(design);
  return { id: record.id, rev: record.rev, design };
}

/** Open storage and the first design; never throws (a storage failure gives an unsaved session). */
export async function startSession(dbName?: string): Promise<Session> {
  const start = performance.now();
  const channel = new TabChannel();
  let library: Library;
  const notices: Notice[] = [];
  let first: First;
  try {
    const db = await openDb(dbName);
    library = new Library(db, (change) => channel.post(change));
    await library.purgeExpired();
    first = await chooseFirst(library, notices);
  } catch (error) {
    const why = storageProblem(error);
    const session = new Session(null, null, { id: null, rev: 0, design: exampleDesign() }, why);
    session.notify({
      key: 'storage', tone: 'error', title: 'Designs cannot be stored in this browser',
      lines: [`Why: ${why}.`, 'You can still edit, import and export; export your design to keep it.'],
      actions: [{ label: 'Export design file', run: () => exportDesignFile(session.editor.getState().design) }],
    });
    channel.close();
    return session;
  }
  performance.measure('railcross:open', { start });
  const session = new Session(library, channel, first);
  for (const n of notices) session.notify(n);
  await session.settled;
  return session;
}

/** Save when the page is hidden or closed; look for another tab's changes when it comes back. */
export function attachPageEvents(session: Session): () => void {
  const onHide = () => void session.flush();
  const onVisibility = () => {
    if (document.visibilityState === 'hidden') void session.flush();
    else void session.checkStored();
  };
  const onBeforeUnload = (e: BeforeUnloadEvent) => {
    // A design that could not be stored would be lost: let the browser ask.
    if (session.state.getState().open.saver.status.state === 'failed') e.preventDefault();
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
