/** Fresh databases for storage tests, and a dump of everything one holds. */
import { afterEach } from 'vitest';
import { RailcrossDb } from '../../../app/storage/db.ts';

let n = 0;
const opened: RailcrossDb[] = [];

/** A database of its own for one test, deleted afterwards. */
export function freshDb(name = `railcross-test-${process.pid}-${n++}`): RailcrossDb {
  const db = new RailcrossDb(name);
  opened.push(db);
  return db;
}

afterEach(async () => {
  for (const db of opened.splice(0)) await db.delete();
});

/** Every table's records, as one text: equal texts mean nothing stored changed. */
export async function dump(db: RailcrossDb): Promise<string> {
  const out: Record<string, unknown[]> = {};
  for (const table of [...db.tables].sort((a, b) => a.name.localeCompare(b.name)))
    out[table.name] = await table.toArray();
  return JSON.stringify(out);
}

/** A clock the test moves by hand. */
export function manualClock(start = Date.UTC(2026, 0, 15, 12, 0, 0)): {
  now: () => number;
  advance: (ms: number) => void;
} {
  let t = start;
  return { now: () => t, advance: (ms) => void (t += ms) };
}
