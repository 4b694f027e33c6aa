import 'fake-indexeddb/auto';
import { Dexie } from 'dexie';
import { describe, expect, it } from 'vitest';
import { Library } from '../../../app/storage/library.ts';
import { newDesign } from '../../../rules/model/newDesign.ts';
import { freshDb } from './support.ts';

let n = 0;

/** A database as issue 7's editor left it: schema version 1, one `current` record. */
async function legacyDb(records: readonly unknown[]): Promise<string> {
  const name = `railcross-legacy-${process.pid}-${n++}`;
  const old = new Dexie(name);
  old.version(1).stores({ current: 'id' });
  await old.table('current').bulkPut([...records]);
  old.close();
  return name;
}

const SAVED_AT = Date.UTC(2026, 10, 3, 9, 30);

describe('upgrading the issue-7 database (schema 1) to the library', () => {
  it('moves the current design into the library as its first revision, and drops the old table', async () => {
    const design = { ...newDesign('Greenhouse controller'), parts: [] };
    const name = await legacyDb([{ id: 'current', design, savedAt: SAVED_AT }]);
    const db = freshDb(name);
    await db.open();
    expect(db.verno).toBe(3);
    expect(db.tables.map((t) => t.name).sort()).toEqual(['designs', 'documents', 'prefs', 'revisions']);
    const library = new Library(db);
    const { designs } = await library.list();
    expect(designs.map((d) => [d.title, d.rev, d.createdAt, d.deletedAt])).toEqual([
      ['Greenhouse controller', 1, SAVED_AT, null],
    ]);
    const opened = await library.open(designs[0]!.id);
    expect(opened.ok && opened.design).toEqual(design);
    expect(await library.lastOpened()).toBe(designs[0]!.id);
  });

  it.each([
    { name: 'an empty version-1 database', records: [], designs: [] },
    {
      name: 'a stored value the reader refuses (moved as it is, reported on opening)',
      records: [
        { id: 'current', design: { format: 'railcross.design', version: 1, title: 'Half-written' }, savedAt: SAVED_AT },
      ],
      designs: ['Half-written'],
    },
    {
      name: 'a stored value without a title',
      records: [{ id: 'current', design: 'not a design', savedAt: SAVED_AT }],
      designs: ['Recovered design'],
    },
  ])('$name', async ({ records, designs }) => {
    const db = freshDb(await legacyDb(records));
    const library = new Library(db);
    const listing = await library.list();
    expect(listing.designs.map((d) => d.title)).toEqual(designs);
    for (const d of listing.designs) {
      const opened = await library.open(d.id);
      expect(opened.ok).toBe(false);
      expect(!opened.ok && opened.reason === 'unreadable' ? opened.refused[0]?.errors.length : 0).toBeGreaterThan(0);
    }
  });
});
