/** Sessions (what one browser tab runs) on a test database of their own, closed afterwards. */
import { Dexie } from 'dexie';
import { afterEach } from 'vitest';
import type { Session } from '../../../app/library/session.ts';
import { startSession } from '../../../app/library/start.ts';

let n = 0;
const sessions: Session[] = [];
const names = new Set<string>();

export function dbName(): string {
  const name = `railcross-session-${process.pid}-${n++}`;
  names.add(name);
  return name;
}

/** Start a session (a tab) on the database `name`. */
export async function tab(name: string): Promise<Session> {
  const session = await startSession(name);
  sessions.push(session);
  return session;
}

afterEach(async () => {
  for (const s of sessions.splice(0)) {
    s.close();
    s.library?.db.close();
  }
  for (const name of names) await Dexie.delete(name);
  names.clear();
});
