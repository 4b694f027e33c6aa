/**
 * The design library: every design the user has, its last `KEPT_REVISIONS` saves, and the
 * designs deleted in the last `DELETED_KEPT_MS`. Every write is one transaction; a save
 * compares the design's revision number inside it, so that a tab holding an older revision
 * can never overwrite a newer one written by another tab.
 */
import { Dexie } from 'dexie';
import { migrate } from '../../rules/model/index.ts';
import type { DesignError } from '../../rules/model/index.ts';
import { validateDesign, type ReadResult } from '../../rules/model/index.ts';
import type { Design } from '../../rules/model/index.ts';
import { KEPT_REVISIONS, newDesignId, type DesignRecord, type RailcrossDb, type RevisionRecord } from './db.ts';
import { checkDesignRecord, checkRevisionRecord, designPlace, isSkipped, type Skipped } from './records.ts';

/** How long a deleted design can be restored: 30 days. */
export const DELETED_KEPT_MS = 30 * 24 * 60 * 60 * 1000;

/** Unwaived errors and warnings of all power states, for the list. */
export interface Counts {
  readonly errors: number;
  readonly warnings: number;
}

/** What a save stores beside the design: its counts and, where known, the commands since the last save. */
export interface SaveInfo extends Counts {
  readonly changes?: readonly string[];
}

export interface Listing {
  /** The library, the most recently changed first. */
  readonly designs: readonly DesignRecord[];
  /** Recently deleted, the most recently deleted first. */
  readonly deleted: readonly DesignRecord[];
  /** Records that could not be read. */
  readonly skipped: readonly Skipped[];
}

export type SaveOutcome =
  | { readonly ok: true; readonly rev: number; readonly savedAt: number }
  /** Another tab saved first: `rev` is its revision; nothing was written. */
  | { readonly ok: false; readonly reason: 'changed'; readonly rev: number; readonly savedAt: number }
  /** The design was deleted (restorable) or purged meanwhile; nothing was written. */
  | { readonly ok: false; readonly reason: 'deleted' | 'missing' };

/** A revision whose document the reader refused. */
export interface RefusedRevision {
  readonly rev: number;
  readonly errors: readonly DesignError[];
}

export type OpenOutcome =
  | {
      readonly ok: true;
      readonly record: DesignRecord;
      readonly design: Design;
      /** The revision read: the newest one the reader accepts. */
      readonly rev: number;
      /** Newer revisions it refused, newest first. */
      readonly refused: readonly RefusedRevision[];
    }
  | { readonly ok: false; readonly reason: 'missing' }
  | { readonly ok: false; readonly reason: 'unreadable'; readonly refused: readonly RefusedRevision[] };

/** What changed, for other tabs. */
export interface Change {
  readonly id: string;
  readonly rev: number;
  readonly deleted: boolean;
}

/** A stored document through the engine's migration and reader. */
export function readDocument(doc: unknown): ReadResult {
  return validateDesign(migrate(doc));
}

const range = (id: string) =>
  [
    [id, Dexie.minKey],
    [id, Dexie.maxKey],
  ] as const;

export class Library {
  constructor(
    readonly db: RailcrossDb,
    private readonly onChange: (change: Change) => void = () => {},
    private readonly now: () => number = Date.now,
  ) {}

  async list(): Promise<Listing> {
    const rows = await this.db.designs.toArray();
    const designs: DesignRecord[] = [];
    const deleted: DesignRecord[] = [];
    const skipped: Skipped[] = [];
    rows.forEach((row, i) => {
      const record = checkDesignRecord(row, designPlace(row, i));
      if (isSkipped(record)) skipped.push(record);
      else (record.deletedAt === null ? designs : deleted).push(record);
    });
    designs.sort((a, b) => b.updatedAt - a.updatedAt);
    deleted.sort((a, b) => (b.deletedAt ?? 0) - (a.deletedAt ?? 0));
    return { designs, deleted, skipped };
  }

  /** Store `design` as a new design of the library (a new id: it never replaces another). */
  async create(design: Design, counts: Counts = { errors: 0, warnings: 0 }): Promise<DesignRecord> {
    const at = this.now();
    const record: DesignRecord = {
      id: newDesignId(),
      title: design.title,
      rev: 1,
      createdAt: at,
      updatedAt: at,
      deletedAt: null,
      ...pick(counts),
      parts: design.parts.length,
    };
    await this.db.transaction('rw', this.db.designs, this.db.revisions, this.db.documents, async () => {
      await this.db.designs.add(record);
      await this.writeRevision(record.id, 1, at, design, counts);
    });
    this.onChange({ id: record.id, rev: 1, deleted: false });
    return record;
  }

  /** The newest revision of a design the reader accepts. */
  async open(id: string): Promise<OpenOutcome> {
    const raw = await this.db.designs.get(id);
    if (raw === undefined) return { ok: false, reason: 'missing' };
    const record = checkDesignRecord(raw, designPlace(raw, 0));
    if (isSkipped(record))
      return {
        ok: false,
        reason: 'unreadable',
        refused: [{ rev: 0, errors: [{ path: record.where, message: record.message }] }],
      };
    const refused: RefusedRevision[] = [];
    for (let rev = record.rev; rev >= 1 && rev > record.rev - KEPT_REVISIONS; rev--) {
      const stored = await this.db.documents.get([id, rev]);
      if (stored === undefined) continue;
      const read = readDocument(stored.doc);
      if (read.ok) return { ok: true, record, design: read.design, rev, refused };
      refused.push({ rev, errors: read.errors });
    }
    return { ok: false, reason: 'unreadable', refused };
  }

  /**
   * How many parts the newest revision of a design holds, read without the reader (so that a
   * design too large to open at once is known before it is opened); 0 when it cannot tell.
   */
  async partCount(id: string): Promise<number> {
    const record = await this.db.designs.get(id);
    if (record === undefined) return 0;
    // Kept in the record since issue 14: a large document is then never read to count its parts.
    if (Number.isInteger(record.parts) && (record.parts ?? -1) >= 0) return record.parts ?? 0;
    const stored = await this.db.documents.get([id, record.rev]);
    const doc = stored?.doc;
    const parts = typeof doc === 'object' && doc !== null ? (doc as { parts?: unknown }).parts : undefined;
    return Array.isArray(parts) ? parts.length : 0;
  }

  /** The newest revision's document as stored (unread). */
  async newestDocument(id: string): Promise<unknown> {
    const record = await this.db.designs.get(id);
    if (record === undefined) return undefined;
    return (await this.db.documents.get([id, record.rev]))?.doc;
  }

  /**
   * Save `design` as the next revision of `id`, provided its newest revision is still
   * `baseRev`; drop revisions beyond the last `KEPT_REVISIONS`. One transaction.
   */
  async save(id: string, baseRev: number, design: Design, counts: SaveInfo): Promise<SaveOutcome> {
    const { designs, revisions, documents } = this.db;
    const outcome = await this.db.transaction('rw', designs, revisions, documents, async (): Promise<SaveOutcome> => {
      const current = await designs.get(id);
      if (current === undefined) return { ok: false, reason: 'missing' };
      if (current.deletedAt !== null) return { ok: false, reason: 'deleted' };
      if (current.rev !== baseRev)
        return { ok: false, reason: 'changed', rev: current.rev, savedAt: current.updatedAt };
      const rev = baseRev + 1;
      const at = this.now();
      await this.writeRevision(id, rev, at, design, counts, counts.changes);
      await designs.put({
        ...current,
        title: design.title,
        rev,
        updatedAt: at,
        ...pick(counts),
        parts: design.parts.length,
      });
      if (rev > KEPT_REVISIONS) {
        const [from] = range(id);
        await revisions
          .where('[designId+rev]')
          .between(from, [id, rev - KEPT_REVISIONS], true, true)
          .delete();
        await documents
          .where('[designId+rev]')
          .between(from, [id, rev - KEPT_REVISIONS], true, true)
          .delete();
      }
      return { ok: true, rev, savedAt: at };
    });
    if (outcome.ok) this.onChange({ id, rev: outcome.rev, deleted: false });
    return outcome;
  }

  /** Rename a design that is not open here (an open one is renamed through its editor). */
  async rename(id: string, title: string): Promise<SaveOutcome | OpenOutcome> {
    const opened = await this.open(id);
    if (!opened.ok) return opened;
    return this.save(
      id,
      opened.record.rev,
      { ...opened.design, title },
      { ...pick(opened.record), changes: [`Rename the design to “${title}”`] },
    );
  }

  /** A new design holding the newest readable state of `id`, titled "… (copy)". */
  async duplicate(id: string): Promise<DesignRecord | OpenOutcome> {
    const opened = await this.open(id);
    if (!opened.ok) return opened;
    return this.create({ ...opened.design, title: `${opened.design.title} (copy)` }, opened.record);
  }

  /** Move to "recently deleted". */
  async remove(id: string): Promise<void> {
    await this.setDeleted(id, this.now());
  }

  async restore(id: string): Promise<void> {
    await this.setDeleted(id, null);
  }

  /** Delete a design and all its revisions for good. */
  async purge(id: string): Promise<void> {
    const { designs, revisions, documents } = this.db;
    const [from, to] = range(id);
    await this.db.transaction('rw', designs, revisions, documents, async () => {
      await designs.delete(id);
      await revisions.where('[designId+rev]').between(from, to, true, true).delete();
      await documents.where('[designId+rev]').between(from, to, true, true).delete();
    });
    this.onChange({ id, rev: 0, deleted: true });
  }

  /** Purge what was deleted more than `DELETED_KEPT_MS` ago; returns how many designs went. */
  async purgeExpired(): Promise<number> {
    const ids = await this.db.designs
      .where('deletedAt')
      .below(this.now() - DELETED_KEPT_MS)
      .primaryKeys();
    for (const id of ids) await this.purge(id);
    return ids.length;
  }

  /** The kept revisions of a design, newest first (without their documents). */
  async revisions(id: string): Promise<{ revisions: RevisionRecord[]; skipped: Skipped[] }> {
    const [from, to] = range(id);
    const rows = await this.db.revisions.where('[designId+rev]').between(from, to, true, true).reverse().toArray();
    const revisions: RevisionRecord[] = [];
    const skipped: Skipped[] = [];
    rows.forEach((row, i) => {
      const record = checkRevisionRecord(row, `revisions[${JSON.stringify(id)}, ${i}]`);
      if (isSkipped(record)) skipped.push(record);
      else revisions.push(record);
    });
    return { revisions, skipped };
  }

  /** One revision's document through the reader. */
  async readRevision(id: string, rev: number): Promise<ReadResult> {
    const stored = await this.db.documents.get([id, rev]);
    if (stored === undefined)
      return {
        ok: false,
        errors: [
          {
            path: `documents[${JSON.stringify(id)}, ${rev}]`,
            message: 'expected a stored revision, found none (it may have been dropped as one of the oldest)',
          },
        ],
      };
    return readDocument(stored.doc);
  }

  /** Record a design's counts as the engine finds them now (a file imported or moved from version 1). */
  async setCounts(id: string, rev: number, counts: Counts): Promise<void> {
    await this.db.transaction('rw', this.db.designs, async () => {
      const current = await this.db.designs.get(id);
      if (current === undefined || current.rev !== rev) return;
      if (current.errors === counts.errors && current.warnings === counts.warnings) return;
      await this.db.designs.put({ ...current, ...pick(counts) });
    });
  }

  async lastOpened(): Promise<string | undefined> {
    const pref = await this.db.prefs.get('lastOpened');
    return typeof pref?.value === 'string' ? pref.value : undefined;
  }

  async setLastOpened(id: string): Promise<void> {
    await this.db.prefs.put({ key: 'lastOpened', value: id });
  }

  private async writeRevision(
    id: string,
    rev: number,
    at: number,
    design: Design,
    counts: Counts,
    changes?: readonly string[],
  ): Promise<void> {
    await this.db.revisions.add({
      designId: id,
      rev,
      savedAt: at,
      title: design.title,
      ...pick(counts),
      ...(changes === undefined || changes.length === 0 ? {} : { changes: [...changes] }),
    });
    await this.db.documents.add({ designId: id, rev, formatVersion: design.version, doc: design });
  }

  private async setDeleted(id: string, deletedAt: number | null): Promise<void> {
    let rev = 0;
    await this.db.transaction('rw', this.db.designs, async () => {
      const current = await this.db.designs.get(id);
      if (current === undefined) return;
      rev = current.rev;
      await this.db.designs.put({ ...current, deletedAt });
    });
    this.onChange({ id, rev, deleted: deletedAt !== null });
  }
}

function pick(counts: Counts): Counts {
  return { errors: counts.errors, warnings: counts.warnings };
}
