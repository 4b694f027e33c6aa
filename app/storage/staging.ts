/**
 * Edits that must outlive the page. IndexedDB is asynchronous: a save started when the page is
 * hidden or closed does not finish once the page is gone (a write needs a read of the design's
 * revision first, and the page's script is no longer there to issue it). localStorage is
 * synchronous, so the page writes its newest unsaved design there on page-hide (`stage`), and
 * the next start carries it into the library (`replayStaged`) with the same rule every save
 * keeps: never over a revision it did not start from. A staged design that meets a newer
 * revision it does not know becomes a new design, "… (recovered)", so that neither is lost.
 *
 * One entry per tab (`railcross.staged.<tab>`), so that two tabs never overwrite each other's
 * entry; a tab's entry is replayed only once that tab is gone (see `tabAlive`).
 */
import type { Design } from '../../rules/model/index.ts';
import { readDocument, type Counts, type Library } from './library.ts';

export const STAGE_PREFIX = 'railcross.staged.';

/** What a tab stages: its open design's newest unsaved state and where it stands. */
export interface Staged {
  readonly tab: string;
  readonly id: string;
  /** The revision the unsaved state starts from. */
  readonly baseRev: number;
  /** The fingerprint of the state whose save was under way, if one was: it may have landed as baseRev + 1. */
  readonly inFlight: string | null;
  readonly design: Design;
  readonly errors: number;
  readonly warnings: number;
  readonly at: number;
}

/** The part of the Web Storage interface used here (localStorage, or a map in tests). */
export interface KeyValueStore {
  readonly length: number;
  key(index: number): string | null;
  getItem(key: string): string | null;
  setItem(key: string, value: string): void;
  removeItem(key: string): void;
}

/**
 * A short fingerprint of a design's JSON text (FNV-1a, 32 bits, with the length): enough to
 * tell whether a stored revision is the state a tab was writing, without keeping that state.
 */
export function fingerprint(design: unknown): string {
  const text = JSON.stringify(design);
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193);
  }
  return `${text.length.toString(36)}-${(h >>> 0).toString(36)}`;
}

/** Write a tab's entry synchronously; false when the store refuses it (full, or unavailable). */
export function stage(store: KeyValueStore | null, staged: Staged): boolean {
  if (store === null) return false;
  try {
    store.setItem(STAGE_PREFIX + staged.tab, JSON.stringify(staged));
    return true;
  } catch {
    return false;
  }
}

export function unstage(store: KeyValueStore | null, tab: string): void {
  try {
    store?.removeItem(STAGE_PREFIX + tab);
  } catch {
    // Nothing to do: a stale entry is recognised as stored at the next start.
  }
}

function isStaged(value: unknown): value is Staged {
  if (typeof value !== 'object' || value === null) return false;
  const v = value as Record<string, unknown>;
  return (
    typeof v.tab === 'string' &&
    typeof v.id === 'string' &&
    Number.isInteger(v.baseRev) &&
    (v.inFlight === null || typeof v.inFlight === 'string') &&
    typeof v.design === 'object' &&
    v.design !== null &&
    typeof v.errors === 'number' &&
    typeof v.warnings === 'number'
  );
}

/** What became of one staged entry. */
export type Replayed =
  | { readonly outcome: 'saved'; readonly id: string; readonly rev: number; readonly title: string }
  | { readonly outcome: 'stored-already'; readonly id: string }
  | { readonly outcome: 'recovered'; readonly id: string; readonly copy: string; readonly title: string }
  | { readonly outcome: 'unreadable'; readonly key: string; readonly why: string };

/**
 * Carry every staged entry of a tab that is gone into the library, oldest first, and remove it.
 * `tabAlive(tab)` says whether a tab is still open (its entry is then left to it).
 */
export async function replayStaged(
  library: Library,
  store: KeyValueStore | null,
  tabAlive: (tab: string) => Promise<boolean> = async () => false,
): Promise<Replayed[]> {
  if (store === null) return [];
  const entries: { key: string; staged: Staged | null; why: string }[] = [];
  try {
    for (let i = 0; i < store.length; i++) {
      const key = store.key(i);
      if (key === null || !key.startsWith(STAGE_PREFIX)) continue;
      let parsed: unknown;
      try {
        parsed = JSON.parse(store.getItem(key) ?? 'null');
      } catch (error) {
        entries.push({ key, staged: null, why: error instanceof Error ? error.message : String(error) });
        continue;
      }
      entries.push(
        isStaged(parsed) ? { key, staged: parsed, why: '' } : { key, staged: null, why: 'not a staged design entry' },
      );
    }
  } catch {
    return [];
  }
  entries.sort((a, b) => (a.staged?.at ?? 0) - (b.staged?.at ?? 0));
  const out: Replayed[] = [];
  for (const { key, staged, why } of entries) {
    if (staged === null) {
      out.push({ outcome: 'unreadable', key, why });
      unstage(store, key.slice(STAGE_PREFIX.length));
      continue;
    }
    if (await tabAlive(staged.tab)) continue;
    out.push(await replayOne(library, staged, key));
    unstage(store, staged.tab);
  }
  return out;
}

async function replayOne(library: Library, staged: Staged, key: string): Promise<Replayed> {
  const read = readDocument(staged.design);
  if (!read.ok)
    return {
      outcome: 'unreadable',
      key,
      why: read.errors
        .map((e) => `${e.path}: ${e.message}`)
        .slice(0, 3)
        .join('; '),
    };
  const { design } = read;
  const counts: Counts = { errors: staged.errors, warnings: staged.warnings };
  const record = await library.db.designs.get(staged.id);
  if (record !== undefined && record.deletedAt === null) {
    let base = record.rev;
    if (record.rev !== staged.baseRev) {
      const newest = (await library.db.documents.get([staged.id, record.rev]))?.doc;
      const print = fingerprint(newest);
      if (print === fingerprint(staged.design)) return { outcome: 'stored-already', id: staged.id };
      // The tab's own save of an earlier state landed before it went: build on it.
      if (!(record.rev === staged.baseRev + 1 && staged.inFlight === print)) base = -1;
    }
    if (base >= 0) {
      const saved = await library.save(staged.id, base, design, counts);
      if (saved.ok) return { outcome: 'saved', id: staged.id, rev: saved.rev, title: design.title };
    }
  }
  // Another tab saved over it, or it was deleted meanwhile: keep both.
  const title = `${design.title} (recovered)`;
  const copy = await library.create({ ...design, title }, counts);
  return { outcome: 'recovered', id: staged.id, copy: copy.id, title };
}
