/**
 * The editor's IndexedDB database and its schema versions.
 *
 * - Version 1 (issue 7): one record, `current`, holding the design being edited.
 * - Version 2: the library. `designs` holds one small record per design (what the list shows,
 *   and `rev`, the number of its newest revision); `revisions` describes the last
 *   `KEPT_REVISIONS` saves of each design and `documents` holds their documents, both keyed by
 *   `[designId+rev]`, so that listing revisions reads no document. The newest revision is the
 *   design's current state: a save writes its document once. `prefs` holds the design last
 *   opened. The upgrade moves the version-1 record into the library.
 * - Version 3: the version-1 table is dropped (Dexie lets an upgrade read a table only if a
 *   later version deletes it).
 *
 * Documents are stored as the plain design object with its format `version`; every load runs
 * them through the engine's `migrate()` and `validateDesign`, so a later format version only
 * needs a migration step in rules/model, not a database upgrade.
 */
import { Dexie, type EntityTable, type Table, type Transaction } from 'dexie';

/** One design of the library: what the list shows, and the number of its newest revision. */
export interface DesignRecord {
  readonly id: string;
  readonly title: string;
  /** The newest revision's number; a save must start from it (see `saveDesign`). */
  readonly rev: number;
  readonly createdAt: number;
  readonly updatedAt: number;
  /** When it was moved to "recently deleted"; null while it is in the library. */
  readonly deletedAt: number | null;
  /** Unwaived errors and warnings of all power states at the newest revision. */
  readonly errors: number;
  readonly warnings: number;
  /** Parts at the newest revision (absent in records written before it was kept). */
  readonly parts?: number;
}

/** One saved state of a design, without its document. */
export interface RevisionRecord {
  readonly designId: string;
  readonly rev: number;
  readonly savedAt: number;
  readonly title: string;
  readonly errors: number;
  readonly warnings: number;
  /**
   * What changed since the revision before: the commands' names (changes.ts); absent in
   * revisions written before they were kept and in a design's first one.
   */
  readonly changes?: readonly string[];
}

/** The document of one revision. */
export interface DocumentRecord {
  readonly designId: string;
  readonly rev: number;
  /** The design file's `version` the document was written in. */
  readonly formatVersion: number;
  /** The design document, unvalidated until it is read back. */
  readonly doc: unknown;
}

export interface PrefRecord {
  readonly key: string;
  readonly value: unknown;
}

/** The version-1 record (issue 7). */
export interface LegacyCurrentRecord {
  readonly id: 'current';
  readonly design: unknown;
  readonly savedAt: number;
}

/** How many saves of each design are kept. */
export const KEPT_REVISIONS = 50;

/** The title a moved design gets when its document has none. */
const RECOVERED_TITLE = 'Recovered design';

/** A fresh design id. */
export function newDesignId(): string {
  return crypto.randomUUID();
}

function titleOf(doc: unknown): string {
  if (typeof doc === 'object' && doc !== null && typeof (doc as { title?: unknown }).title === 'string') {
    return (doc as { title: string }).title;
  }
  return RECOVERED_TITLE;
}

function formatVersionOf(doc: unknown): number {
  const v = typeof doc === 'object' && doc !== null ? (doc as { version?: unknown }).version : undefined;
  return typeof v === 'number' ? v : 0;
}

/**
 * Version 1 → 2: the one `current` record becomes a design of the library with one revision.
 * Its document is moved as it is: a record the reader refuses is reported when it is opened,
 * not lost here. Counts are unknown until it is opened and saved again.
 */
async function moveCurrentIntoLibrary(tx: Transaction): Promise<void> {
  const rows = (await tx.table('current').toArray()) as LegacyCurrentRecord[];
  for (const row of rows) {
    const id = newDesignId();
    const at = typeof row.savedAt === 'number' ? row.savedAt : Date.now();
    const design: DesignRecord = {
      id,
      title: titleOf(row.design),
      rev: 1,
      createdAt: at,
      updatedAt: at,
      deletedAt: null,
      errors: 0,
      warnings: 0,
    };
    const revision: RevisionRecord = { designId: id, rev: 1, savedAt: at, title: design.title, errors: 0, warnings: 0 };
    const document: DocumentRecord = {
      designId: id,
      rev: 1,
      formatVersion: formatVersionOf(row.design),
      doc: row.design,
    };
    await tx.table('designs').add(design);
    await tx.table('revisions').add(revision);
    await tx.table('documents').add(document);
    await tx.table('prefs').put({ key: 'lastOpened', value: id });
  }
}

/** The editor's database. */
export class RailcrossDb extends Dexie {
  designs!: EntityTable<DesignRecord, 'id'>;
  revisions!: Table<RevisionRecord, [string, number]>;
  documents!: Table<DocumentRecord, [string, number]>;
  prefs!: EntityTable<PrefRecord, 'key'>;

  constructor(name = 'railcross') {
    super(name);
    this.version(1).stores({ current: 'id' });
    this.version(2)
      .stores({ designs: 'id, deletedAt', revisions: '[designId+rev]', documents: '[designId+rev]', prefs: 'key' })
      .upgrade(moveCurrentIntoLibrary);
    this.version(3).stores({ current: null });
  }
}
