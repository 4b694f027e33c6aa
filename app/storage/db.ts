import { Dexie, type EntityTable } from 'dexie';

/** The one record of the current design. The stored value is checked by the reader on load. */
export interface CurrentRecord {
  readonly id: 'current';
  readonly design: unknown;
  readonly savedAt: number;
}

/**
 * The editor's IndexedDB database. Version 1 holds only the current design; a library of
 * designs and earlier revisions come as later versions with their own tables.
 */
export class RailcrossDb extends Dexie {
  current!: EntityTable<CurrentRecord, 'id'>;

  constructor(name = 'railcross') {
    super(name);
    this.version(1).stores({ current: 'id' });
  }
}

let shared: RailcrossDb | undefined;

/** The database of the page, opened on first use. */
export function defaultDb(): RailcrossDb {
  shared ??= new RailcrossDb();
  return shared;
}
