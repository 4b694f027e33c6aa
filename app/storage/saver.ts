/**
 * Autosave: the newest value is written once edits pause for `delayMs`, or at the latest
 * `maxWaitMs` after the first unsaved edit, so that a long burst of edits is still saved.
 * Writes never overlap; a value that failed to be written stays pending until a newer one
 * replaces it or `flush()` tries again.
 */

export type SaveStatus =
  | { readonly state: 'idle' | 'pending' | 'saving' | 'saved' }
  | { readonly state: 'failed'; readonly error: string };

export interface SaverOptions<T> {
  /** Write one value; throws (rejects) when it could not be stored. */
  readonly write: (value: T) => Promise<void>;
  /** Quiet spell after the last edit; with a write of < 100 ms, a change is stored within 500 ms. */
  readonly delayMs?: number;
  readonly maxWaitMs?: number;
  readonly now?: () => number;
}

/** The default quiet spell, ms. */
export const SAVE_DELAY_MS = 300;
/** The longest an edit waits while edits keep coming, ms. */
export const SAVE_MAX_WAIT_MS = 2000;

export class Saver<T> {
  private readonly write: (value: T) => Promise<void>;
  private readonly delayMs: number;
  private readonly maxWaitMs: number;
  private readonly now: () => number;
  private timer: ReturnType<typeof setTimeout> | undefined;
  private pending: { value: T } | undefined;
  /** The value being written now, until its write ends. */
  private current: { value: T } | undefined;
  private firstPendingAt: number | undefined;
  private writing: Promise<void> = Promise.resolve();
  private readonly listeners = new Set<() => void>();
  status: SaveStatus = { state: 'idle' };
  /** Writes that succeeded. */
  writes = 0;

  constructor(options: SaverOptions<T>) {
    this.write = options.write;
    this.delayMs = options.delayMs ?? SAVE_DELAY_MS;
    this.maxWaitMs = options.maxWaitMs ?? SAVE_MAX_WAIT_MS;
    this.now = options.now ?? Date.now;
  }

  /** Schedule `value` to be written. */
  save(value: T): void {
    this.pending = { value };
    const now = this.now();
    this.firstPendingAt ??= now;
    this.setStatus({ state: 'pending' });
    this.clearTimer();
    const wait = Math.max(0, Math.min(this.delayMs, this.firstPendingAt + this.maxWaitMs - now));
    this.timer = setTimeout(() => void this.flush(), wait);
  }

  /** Write what is pending now; resolves when every write so far has ended. */
  flush(): Promise<void> {
    this.clearTimer();
    if (this.pending !== undefined) this.writing = this.writing.then(() => this.writePending());
    return this.writing;
  }

  /** Forget what is pending: the state it held is stored already, or was given up. */
  discard(): void {
    this.clearTimer();
    this.pending = undefined;
    this.firstPendingAt = undefined;
    if (this.status.state !== 'saving') this.setStatus({ state: 'saved' });
  }

  /** True while something is not yet stored. */
  get unsaved(): boolean {
    return this.pending !== undefined;
  }

  /** The newest value not known to be stored: the pending one, else the one being written. */
  get unstored(): T | undefined {
    return (this.pending ?? this.current)?.value;
  }

  /** The value whose write has started and not yet ended. */
  get inFlight(): T | undefined {
    return this.current?.value;
  }

  subscribe(listener: () => void): () => void {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  }

  dispose(): void {
    this.clearTimer();
    this.listeners.clear();
  }

  private async writePending(): Promise<void> {
    const taken = this.pending;
    if (taken === undefined) return;
    this.pending = undefined;
    this.firstPendingAt = undefined;
    this.current = taken;
    this.setStatus({ state: 'saving' });
    try {
      await this.write(taken.value);
      this.writes++;
      this.current = undefined;
      this.setStatus({ state: this.pending === undefined ? 'saved' : 'pending' });
    } catch (error) {
      this.current = undefined;
      // Keep it for the next attempt unless a newer value came meanwhile.
      this.pending ??= taken;
      this.setStatus({ state: 'failed', error: error instanceof Error ? error.message : String(error) });
    }
  }

  private clearTimer(): void {
    if (this.timer !== undefined) clearTimeout(this.timer);
    this.timer = undefined;
  }

  private setStatus(status: SaveStatus): void {
    this.status = status;
    for (const l of this.listeners) l();
  }
}

/** What a save indicator reads: the status and a way to hear of its changes. */
export interface SaveIndicator {
  readonly status: SaveStatus;
  subscribe(listener: () => void): () => void;
}
