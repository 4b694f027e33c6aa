/**
 * Telling other tabs of the same browser what this one stored, so that a tab editing the same
 * design can say so at once (the revision check inside every save is what guarantees that
 * nothing is overwritten; this only makes it visible sooner).
 */
import type { Change } from '../storage/library.ts';

const CHANNEL = 'railcross-library';

interface Message extends Change {
  readonly tab: string;
}

function isMessage(value: unknown): value is Message {
  if (typeof value !== 'object' || value === null) return false;
  const m = value as Record<string, unknown>;
  return (
    typeof m.tab === 'string' && typeof m.id === 'string' && typeof m.rev === 'number' && typeof m.deleted === 'boolean'
  );
}

export class TabChannel {
  readonly tab = crypto.randomUUID();
  private readonly channel: BroadcastChannel | null;
  private readonly listeners = new Set<(change: Change) => void>();

  constructor() {
    this.channel = typeof BroadcastChannel === 'function' ? new BroadcastChannel(CHANNEL) : null;
    this.channel?.addEventListener('message', (e: MessageEvent<unknown>) => {
      if (!isMessage(e.data) || e.data.tab === this.tab) return;
      const { id, rev, deleted } = e.data;
      for (const l of this.listeners) l({ id, rev, deleted });
    });
  }

  post(change: Change): void {
    this.channel?.postMessage({ ...change, tab: this.tab } satisfies Message);
  }

  subscribe(listener: (change: Change) => void): () => void {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  }

  close(): void {
    this.channel?.close();
    this.listeners.clear();
  }
}
