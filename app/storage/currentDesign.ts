/**
 * Keeping the current design across reloads: `loadCurrent()` reads and validates it,
 * `saveCurrent(design)` writes it after a quiet spell, so that a burst of edits is one write.
 */
import type { DesignError } from '../../rules/model/paths.ts';
import { validateDesign } from '../../rules/model/reader.ts';
import type { Design } from '../../rules/model/schema.ts';
import { defaultDb, type RailcrossDb } from './db.ts';

export type LoadResult =
  | { readonly status: 'empty' }
  | { readonly status: 'ok'; readonly design: Design }
  | { readonly status: 'refused'; readonly errors: readonly DesignError[] };

/** The stored design, validated by the reader; a stored value it refuses comes back with its errors. */
export async function loadCurrent(db: RailcrossDb = defaultDb()): Promise<LoadResult> {
  const record = await db.current.get('current');
  if (record === undefined) return { status: 'empty' };
  const read = validateDesign(record.design);
  return read.ok ? { status: 'ok', design: read.design } : { status: 'refused', errors: read.errors };
}

export type SaveStatus = { readonly state: 'idle' | 'pending' | 'saving' | 'saved' } | { readonly state: 'failed'; readonly error: string };

/** A debounced writer of the current design. */
export class Saver {
  private timer: ReturnType<typeof setTimeout> | undefined;
  private pending: Design | undefined;
  private writing: Promise<void> = Promise.resolve();
  private listeners = new Set<() => void>();
  status: SaveStatus = { state: 'idle' };
  /** How many writes reached the database (for tests and the curious). */
  writes = 0;

  constructor(
    private readonly db: RailcrossDb = defaultDb(),
    private readonly delayMs = 400,
  ) {}

  /** Save `design` once no newer one has come for `delayMs`. */
  save(design: Design): void {
    this.pending = design;
    this.setStatus({ state: 'pending' });
    if (this.timer !== undefined) clearTimeout(this.timer);
    this.timer = setTimeout(() => void this.flush(), this.delayMs);
  }

  /** Write what is pending now; resolves when every write so far has ended. */
  flush(): Promise<void> {
    if (this.timer !== undefined) clearTimeout(this.timer);
    this.timer = undefined;
    const design = this.pending;
    this.pending = undefined;
    if (design !== undefined) {
      this.writing = this.writing.then(() => this.write(design));
    }
    return this.writing;
  }

  private async write(design: Design): Promise<void> {
    this.setStatus({ state: 'saving' });
    try {
      await this.db.current.put({ id: 'current', design, savedAt: Date.now() });
      this.writes++;
      if (this.pending === undefined) this.setStatus({ state: 'saved' });
    } catch (error) {
      this.setStatus({ state: 'failed', error: error instanceof Error ? error.message : String(error) });
    }
  }

  subscribe(listener: () => void): () => void {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  }

  private setStatus(status: SaveStatus): void {
    this.status = status;
    for (const l of this.listeners) l();
  }
}

let shared: Saver | undefined;

/** The page's saver. */
export function defaultSaver(): Saver {
  shared ??= new Saver();
  return shared;
}

/** Save the current design, debounced (see `Saver`). */
export function saveCurrent(design: Design): void {
  defaultSaver().save(design);
}
