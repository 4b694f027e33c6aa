import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import type { Session } from '../../../app/session/session.ts';
import { Library } from '../../../app/storage/library.ts';
import { fingerprint, replayStaged, STAGE_PREFIX, type Staged } from '../../../app/storage/staging.ts';
import { nudgeParts, setTitle } from '../../../app/store/commands/index.ts';
import type { Design } from '../../../rules/model/schema.ts';
import { exampleDesign } from '../../../app/example.ts';
import { freshDb } from './support.ts';
import { dbName, MemoryStore, tab } from './sessionSupport.ts';

/** The page goes without its pending save finishing: what was staged is all that is left. */
function pageGone(session: Session): void {
  session.close();
  session.library?.db.close();
}

const xOf = (d: Design, id: string) => d.parts.find((p) => p.id === id)?.position?.x;
const titleOf = async (session: Session) => session.editor.getState().design.title;

describe('an edit staged on page-hide is there after the next start', () => {
  it.each([
    {
      name: 'a title typed and committed',
      edit: (s: Session) => s.editor.getState().apply(setTitle('Rev C')),
      expected: (d: Design) => d.title === 'Rev C',
    },
    {
      name: 'ten arrow-key nudges of a chip',
      edit: (s: Session) => {
        for (let k = 0; k < 10; k++) s.editor.getState().apply(nudgeParts(['U1'], 10, 0));
      },
      expected: (d: Design) => xOf(d, 'U1') === (xOf(exampleDesign(), 'U1') ?? NaN) + 100,
    },
  ])('$name, within the autosave delay', async ({ edit, expected }) => {
    const name = dbName();
    const store = new MemoryStore();
    const a = await tab(name, store);
    edit(a);
    expect(a.hasUnsaved()).toBe(true);
    // The autosave delay has not passed: nothing is in IndexedDB yet, only the staged entry.
    expect(a.stage()).toBe(true);
    const id = a.openId;
    pageGone(a);
    const b = await tab(name, store);
    expect(b.openId).toBe(id);
    expect(expected(b.editor.getState().design)).toBe(true);
    expect(b.state.getState().open.saver.unsaved).toBe(false);
    const opened = await b.library!.open(id!);
    expect(opened.ok && opened.rev).toBe(2);
    expect([...store.map.keys()]).toEqual([]);
  });

  it('a staged entry is removed once the save it stands for is stored', async () => {
    const store = new MemoryStore();
    const a = await tab(dbName(), store);
    a.editor.getState().apply(setTitle('Rev D'));
    expect(a.stage()).toBe(true);
    expect(store.map.size).toBe(1);
    await a.flush();
    expect(store.map.size).toBe(0);
    expect(a.hasUnsaved()).toBe(false);
  });

  it('a full store stages nothing and says so (the leave-page warning still holds)', async () => {
    const store = new MemoryStore();
    store.full = true;
    const a = await tab(dbName(), store);
    a.editor.getState().apply(setTitle('Rev E'));
    expect(a.stage()).toBe(false);
    expect(a.hasUnsaved()).toBe(true);
    expect(await titleOf(a)).toBe('Rev E');
  });

  it('nothing unsaved stages nothing', async () => {
    const store = new MemoryStore();
    const a = await tab(dbName(), store);
    expect(a.hasUnsaved()).toBe(false);
    expect(a.stage()).toBe(false);
    expect(store.map.size).toBe(0);
  });
});

/** A library holding the example at revision 1, and a staged entry built from it. */
async function setup() {
  const library = new Library(freshDb());
  const base = exampleDesign();
  const record = await library.create(base);
  const store = new MemoryStore();
  const put = (entry: Partial<Staged> & { design: Design }) => {
    const staged: Staged = {
      tab: 'tab-1',
      id: record.id,
      baseRev: 1,
      inFlight: null,
      errors: 1,
      warnings: 2,
      at: 1,
      ...entry,
    };
    store.setItem(STAGE_PREFIX + staged.tab, JSON.stringify(staged));
  };
  const titles = async () => (await library.list()).designs.map((d) => `${d.title}@${d.rev}`).sort();
  return { library, base, id: record.id, store, put, titles };
}

describe('replaying staged entries at start: never over a revision they did not start from', () => {
  it.each([
    {
      name: 'nothing was saved after it: it becomes the next revision',
      before: async () => {},
      staged: (base: Design) => ({ design: { ...base, title: 'B' } }),
      outcome: 'saved',
      titles: ['B@2'],
    },
    {
      name: 'its save landed before the page went: nothing more is written',
      before: async (l: Library, id: string, base: Design) =>
        void (await l.save(id, 1, { ...base, title: 'B' }, { errors: 0, warnings: 0 })),
      staged: (base: Design) => ({ design: { ...base, title: 'B' } }),
      outcome: 'stored-already',
      titles: ['B@2'],
    },
    {
      name: 'the save under way (A) landed, the pending one (B) did not: B goes on top of A',
      before: async (l: Library, id: string, base: Design) =>
        void (await l.save(id, 1, { ...base, title: 'A' }, { errors: 0, warnings: 0 })),
      staged: (base: Design) => ({ design: { ...base, title: 'B' }, inFlight: fingerprint({ ...base, title: 'A' }) }),
      outcome: 'saved',
      titles: ['B@3'],
    },
    {
      name: 'another tab saved something else meanwhile: kept as a recovered copy beside it',
      before: async (l: Library, id: string, base: Design) =>
        void (await l.save(id, 1, { ...base, title: 'Other tab' }, { errors: 0, warnings: 0 })),
      staged: (base: Design) => ({ design: { ...base, title: 'B' }, inFlight: fingerprint({ ...base, title: 'A' }) }),
      outcome: 'recovered',
      titles: ['B (recovered)@1', 'Other tab@2'],
    },
    {
      name: 'the design was deleted meanwhile: kept as a recovered copy',
      before: async (l: Library, id: string) => l.remove(id),
      staged: (base: Design) => ({ design: { ...base, title: 'B' } }),
      outcome: 'recovered',
      titles: ['B (recovered)@1'],
    },
  ])('$name', async ({ before, staged, outcome, titles }) => {
    const s = await setup();
    await before(s.library, s.id, s.base);
    s.put(staged(s.base));
    const replayed = await replayStaged(s.library, s.store);
    expect(replayed.map((r) => r.outcome)).toEqual([outcome]);
    expect(await s.titles()).toEqual(titles);
    expect(s.store.length).toBe(0);
  });

  it('leaves the entry of a tab that is still open to that tab', async () => {
    const s = await setup();
    s.put({ design: { ...s.base, title: 'B' } });
    const replayed = await replayStaged(s.library, s.store, async (tab) => tab === 'tab-1');
    expect(replayed).toEqual([]);
    expect(s.store.length).toBe(1);
    expect(await s.titles()).toEqual([`${s.base.title}@1`]);
  });

  it.each([
    { name: 'not JSON', text: '{"tab":', why: /JSON/ },
    { name: 'not an entry', text: '{"tab":"x"}', why: /not a staged design entry/ },
    {
      name: 'a design the reader refuses',
      text: JSON.stringify({
        tab: 'x',
        id: 'y',
        baseRev: 1,
        inFlight: null,
        design: { format: 'railcross.design', version: 1, parts: 3 },
        errors: 0,
        warnings: 0,
        at: 0,
      }),
      why: /parts|title|rails/,
    },
  ])('drops an unreadable entry ($name) and says why, writing nothing', async ({ text, why }) => {
    const s = await setup();
    s.store.setItem(`${STAGE_PREFIX}x`, text);
    const replayed = await replayStaged(s.library, s.store);
    expect(replayed).toHaveLength(1);
    expect(replayed[0]!.outcome).toBe('unreadable');
    expect(replayed[0]!.outcome === 'unreadable' && replayed[0]!.why).toMatch(why);
    expect(s.store.length).toBe(0);
    expect(await s.titles()).toEqual([`${s.base.title}@1`]);
  });
});
