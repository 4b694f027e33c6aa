/** Sessions (what one browser tab runs) on a test database of their own, closed afterwards. */
import { Dexie } from 'dexie';
import { afterEach } from 'vitest';
import type { Session } from '../../../app/session/session.ts';
import { startSession } from '../../../app/session/start.ts';
import type { KeyValueStore } from '../../../app/storage/staging.ts';

let n = 0;
const sessions: Session[] = [];
const names = new Set<string>();

export function dbName(): string {
  const name = `railcross-session-${process.pid}-${n++}`;
  names.add(name);
  return name;
}

/** Start a session (a tab) on the database `name`. */
export async function tab(name: string, staging: KeyValueStore | null = null): Promise<Session> {
  const session = await startSession(name, staging);
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

/** localStorage as a map: what a browser keeps across a reload of the page. */
export class MemoryStore implements KeyValueStore {
  readonly map = new Map<string, string>();
  /** Refuse writes, as a full store does. */
  full = false;
  get length(): number {
    return this.map.size;
  }
  key(index: number): string | null {
    return [...this.map.keys()][index] ?? null;
  }
  getItem(key: string): string | null {
    return this.map.get(key) ?? null;
  }
  setItem(key: string, value: string): void {
    if (this.full) throw new Error('QuotaExceededError');
    this.map.set(key, value);
  }
  removeItem(key: string): void {
    this.map.delete(key);
  }
}
