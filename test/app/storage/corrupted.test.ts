import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import { RailcrossDb } from '../../../app/storage/db.ts';
import { Library } from '../../../app/storage/library.ts';
import { newDesign } from '../../../rules/model/newDesign.ts';
import { freshDb } from './support.ts';
import { dbName, tab } from './sessionSupport.ts';

const zero = { errors: 0, warnings: 0 };

describe('a corrupted record is skipped with a message; the others open', () => {
  it.each([
    {
      name: 'a title that is a number',
      record: { id: 'bad', title: 42, rev: 1, createdAt: 0, updatedAt: 0, deletedAt: null, errors: 0, warnings: 0 },
      where: 'designs["bad"].title',
      message: 'expected a string, found 42',
    },
    {
      name: 'no revision number',
      record: { id: 'bad', title: 'x', createdAt: 0, updatedAt: 0, deletedAt: null, errors: 0, warnings: 0 },
      where: 'designs["bad"].rev',
      message: 'expected a whole number ≥ 1, found nothing',
    },
    {
      name: 'a negative count',
      record: { id: 'bad', title: 'x', rev: 1, createdAt: 0, updatedAt: 0, deletedAt: null, errors: -1, warnings: 0 },
      where: 'designs["bad"].errors',
      message: 'expected a whole number ≥ 0, found -1',
    },
  ])('in the list: $name', async ({ record, where, message }) => {
    const library = new Library(freshDb());
    await library.create(newDesign('Good one'), zero);
    await library.db.designs.put(record as never);
    const listing = await library.list();
    expect(listing.designs.map((d) => d.title)).toEqual(['Good one']);
    expect(listing.skipped).toEqual([{ where, message }]);
  });

  it('a newest revision the reader refuses: the one before opens, and the refusal names the place', async () => {
    const library = new Library(freshDb());
    const record = await library.create(newDesign('Pump board'), zero);
    await library.save(record.id, 1, newDesign('Pump board, second save'), zero);
    await library.db.documents.put({
      designId: record.id,
      rev: 2,
      formatVersion: 1,
      doc: { ...newDesign(), rails: [{ id: 'r', label: '', nominal: 'five' }] },
    });
    const opened = await library.open(record.id);
    expect(opened.ok && [opened.rev, opened.record.rev, opened.design.title]).toEqual([1, 2, 'Pump board']);
    expect(opened.ok && opened.refused.map((r) => [r.rev, r.errors[0]?.path])).toEqual([[2, 'rails[0].nominal']]);
  });

  it('on start, an unreadable design is skipped with a message and the next one opens', async () => {
    const name = dbName();
    const db = new RailcrossDb(name);
    const library = new Library(db);
    const good = await library.create(newDesign('Readable'), zero);
    const bad = await library.create(newDesign('Unreadable'), zero);
    await db.documents.put({ designId: bad.id, rev: 1, formatVersion: 1, doc: 'garbage' });
    await db.designs.put({ id: 'broken', title: null, rev: 1 } as never);
    await library.setLastOpened(bad.id);
    db.close();

    const session = await tab(name);
    expect(session.openId).toBe(good.id);
    expect(session.editor.getState().design.title).toBe('Readable');
    const notices = session.state.getState().notices;
    expect(notices.find((n) => n.key === `unreadable-${bad.id}`)?.title).toContain('“Unreadable” could not be read');
    expect(notices.find((n) => n.key === 'skipped')?.lines).toEqual([
      'designs["broken"].title: expected a string, found null',
    ]);
  });
});
