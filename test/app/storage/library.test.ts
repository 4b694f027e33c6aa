import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import { KEPT_REVISIONS } from '../../../app/storage/db.ts';
import { DELETED_KEPT_MS, Library, type Change } from '../../../app/storage/library.ts';
import { newDesign } from '../../../rules/model/newDesign.ts';
import { dump, freshDb, manualClock } from './support.ts';

const DAY = 24 * 60 * 60 * 1000;

function setup() {
  const clock = manualClock();
  const changes: Change[] = [];
  const library = new Library(freshDb(), (c) => changes.push(c), clock.now);
  return { library, clock, changes };
}

const titles = async (library: Library) => {
  const l = await library.list();
  return { designs: l.designs.map((d) => d.title), deleted: l.deleted.map((d) => d.title) };
};

describe('the design library', () => {
  it('lists designs with their counts, the most recently changed first', async () => {
    const { library, clock } = setup();
    await library.create(newDesign('Pump board'), { errors: 2, warnings: 1 });
    clock.advance(1000);
    await library.create(newDesign('Valve board'), { errors: 0, warnings: 3 });
    const { designs } = await library.list();
    expect(designs.map((d) => [d.title, d.errors, d.warnings, d.rev])).toEqual([
      ['Valve board', 0, 3, 1],
      ['Pump board', 2, 1, 1],
    ]);
  });

  it('opens what was stored, as a fresh object the reader accepted', async () => {
    const { library } = setup();
    const design = newDesign('Pump board');
    const record = await library.create(design);
    const opened = await library.open(record.id);
    expect(opened.ok && opened.design).toEqual(design);
    expect(opened.ok && opened.design).not.toBe(design);
  });

  it.each([
    {
      name: 'rename: a new revision with the new title',
      act: async (l: Library, id: string) => void (await l.rename(id, 'Pump board, rev B')),
      expected: { designs: ['Pump board, rev B'], deleted: [] },
    },
    {
      name: 'duplicate: a second design titled "(copy)"',
      act: async (l: Library, id: string) => void (await l.duplicate(id)),
      expected: { designs: ['Pump board (copy)', 'Pump board'], deleted: [] },
    },
    {
      name: 'delete: moved to recently deleted',
      act: (l: Library, id: string) => l.remove(id),
      expected: { designs: [], deleted: ['Pump board'] },
    },
    {
      name: 'delete then restore: back in the library',
      act: async (l: Library, id: string) => {
        await l.remove(id);
        await l.restore(id);
      },
      expected: { designs: ['Pump board'], deleted: [] },
    },
    {
      name: 'purge: gone from both lists',
      act: (l: Library, id: string) => l.purge(id),
      expected: { designs: [], deleted: [] },
    },
  ])('$name', async ({ act, expected }) => {
    const { library, clock } = setup();
    const record = await library.create(newDesign('Pump board'));
    clock.advance(1000);
    await act(library, record.id);
    expect(await titles(library)).toEqual(expected);
  });

  it("a rename keeps the design's content and moves its revision on", async () => {
    const { library } = setup();
    const record = await library.create(newDesign('Pump board'));
    await library.rename(record.id, 'Pump board, rev B');
    const opened = await library.open(record.id);
    expect(opened.ok && [opened.design.title, opened.design.rails.length, opened.record.rev]).toEqual([
      'Pump board, rev B',
      3,
      2,
    ]);
  });

  it('purges designs deleted more than 30 days ago, with their revisions, and keeps younger ones', async () => {
    const { library, clock } = setup();
    const old = await library.create(newDesign('Old'));
    const young = await library.create(newDesign('Young'));
    await library.remove(old.id);
    clock.advance(2 * DAY);
    await library.remove(young.id);
    clock.advance(DELETED_KEPT_MS - 2 * DAY + 1);
    expect(await library.purgeExpired()).toBe(1);
    expect(await titles(library)).toEqual({ designs: [], deleted: ['Young'] });
    expect(await library.db.revisions.count()).toBe(1);
    expect(await library.db.documents.count()).toBe(1);
  });

  it('tells other tabs of each committed change', async () => {
    const { library, changes } = setup();
    const record = await library.create(newDesign('Pump board'));
    await library.save(record.id, 1, newDesign('Pump board 2'), { errors: 0, warnings: 0 });
    await library.remove(record.id);
    expect(changes).toEqual([
      { id: record.id, rev: 1, deleted: false },
      { id: record.id, rev: 2, deleted: false },
      { id: record.id, rev: 2, deleted: true },
    ]);
  });
});

describe('saving', () => {
  it(`keeps the last ${KEPT_REVISIONS} revisions of a design and no more`, async () => {
    const { library } = setup();
    const record = await library.create(newDesign('v1'));
    for (let rev = 1; rev < 60; rev++) {
      const out = await library.save(record.id, rev, newDesign(`v${rev + 1}`), { errors: 0, warnings: rev });
      expect(out.ok && out.rev).toBe(rev + 1);
    }
    const { revisions } = await library.revisions(record.id);
    expect(revisions.map((r) => r.rev)).toEqual(Array.from({ length: 50 }, (_, k) => 60 - k));
    expect(await library.db.documents.count()).toBe(50);
    const oldest = await library.readRevision(record.id, 11);
    expect(oldest.ok && oldest.design.title).toBe('v11');
    expect((await library.readRevision(record.id, 10)).ok).toBe(false);
  });

  it.each([
    {
      name: 'another tab saved first',
      prepare: (l: Library, id: string) => l.save(id, 1, newDesign('theirs'), { errors: 0, warnings: 0 }),
      reason: 'changed',
    },
    { name: 'another tab deleted it', prepare: (l: Library, id: string) => l.remove(id), reason: 'deleted' },
    { name: 'another tab purged it', prepare: (l: Library, id: string) => l.purge(id), reason: 'missing' },
  ])('refuses to write over a newer state ($name) and changes nothing', async ({ prepare, reason }) => {
    const { library } = setup();
    const record = await library.create(newDesign('base'));
    await prepare(library, record.id);
    const before = await dump(library.db);
    const out = await library.save(record.id, 1, newDesign('mine'), { errors: 0, warnings: 0 });
    expect(out.ok ? 'written' : out.reason).toBe(reason);
    expect(await dump(library.db)).toBe(before);
  });
});
