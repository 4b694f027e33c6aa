import 'fake-indexeddb/auto';
import { afterEach, describe, expect, it } from 'vitest';
import { RailcrossDb } from '../../app/storage/db.ts';
import { loadCurrent, Saver } from '../../app/storage/currentDesign.ts';
import { newDesign } from '../../rules/model/newDesign.ts';

let n = 0;
const dbs: RailcrossDb[] = [];
function freshDb(): RailcrossDb {
  const db = new RailcrossDb(`railcross-test-${n++}`);
  dbs.push(db);
  return db;
}
afterEach(async () => {
  for (const db of dbs.splice(0)) await db.delete();
});

describe('storage of the current design', () => {
  it('starts empty', async () => {
    expect(await loadCurrent(freshDb())).toEqual({ status: 'empty' });
  });

  it('a burst of saves is one write, of the last design, and loads back', async () => {
    const db = freshDb();
    const saver = new Saver(db, 20);
    for (const title of ['a', 'b', 'c']) saver.save(newDesign(title));
    await saver.flush();
    expect(saver.writes).toBe(1);
    expect(saver.status).toEqual({ state: 'saved' });
    expect(await loadCurrent(db)).toEqual({ status: 'ok', design: newDesign('c') });
  });

  it('writes after the quiet spell without a flush', async () => {
    const db = freshDb();
    const saver = new Saver(db, 10);
    saver.save(newDesign('later'));
    await new Promise((r) => setTimeout(r, 60));
    await saver.flush();
    expect(saver.writes).toBe(1);
    const loaded = await loadCurrent(db);
    expect(loaded.status === 'ok' ? loaded.design.title : '').toBe('later');
  });

  it.each([
    { name: 'not a design at all', value: 'hello', path: '(root)' },
    { name: 'a part on an unknown rail', value: { ...newDesign(), parts: [{ id: 'U1', label: '', rail: 'nope', profile: '74hc', pins: [] }] }, path: 'parts[0].rail' },
    { name: 'a rail voltage stored as NaN', value: { ...newDesign(), rails: [{ id: 'r', label: '', nominal: Number.NaN }] }, path: 'rails[0].nominal' },
  ])('refuses a stored value that is $name, naming the place', async ({ value, path }) => {
    const db = freshDb();
    await db.current.put({ id: 'current', design: value, savedAt: 0 });
    const loaded = await loadCurrent(db);
    expect(loaded.status).toBe('refused');
    expect(loaded.status === 'refused' ? loaded.errors.map((e) => e.path) : []).toContain(path);
  });
});
