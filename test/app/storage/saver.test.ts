import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { SAVE_DELAY_MS, SAVE_MAX_WAIT_MS, Saver } from '../../../app/storage/saver.ts';

/** A saver whose writes are recorded with the (fake) time they started. */
function recorder(fail: (value: string) => boolean = () => false) {
  const writes: { value: string; at: number }[] = [];
  const saver = new Saver<string>({
    write: async (value) => {
      writes.push({ value, at: Date.now() });
      if (fail(value)) throw new Error('the disk is full');
    },
  });
  return { saver, writes };
}

beforeEach(() => {
  vi.useFakeTimers({ now: 0 });
});
afterEach(() => {
  vi.useRealTimers();
});

describe('autosave timing', () => {
  it("stores a change within 500 ms of the last edit (the issue's bound)", () => {
    expect(SAVE_DELAY_MS).toBeLessThanOrEqual(400);
  });

  it.each([
    { name: 'one edit', edits: [0], expected: [{ value: 'e0', at: SAVE_DELAY_MS }] },
    {
      name: 'a burst within the quiet spell is one write, of the last value',
      edits: [0, 100, 200],
      expected: [{ value: 'e200', at: 200 + SAVE_DELAY_MS }],
    },
    {
      name: 'two edits a long pause apart are two writes',
      edits: [0, 1000],
      expected: [
        { value: 'e0', at: SAVE_DELAY_MS },
        { value: 'e1000', at: 1000 + SAVE_DELAY_MS },
      ],
    },
    {
      name: 'edits that never pause are still written by the longest wait',
      edits: Array.from({ length: 30 }, (_, k) => k * 100),
      expected: [
        { value: `e${SAVE_MAX_WAIT_MS - 100}`, at: SAVE_MAX_WAIT_MS },
        { value: 'e2900', at: 2900 + SAVE_DELAY_MS },
      ],
    },
  ])('$name', async ({ edits, expected }) => {
    const { saver, writes } = recorder();
    let t = 0;
    for (const at of edits) {
      await vi.advanceTimersByTimeAsync(at - t);
      t = at;
      saver.save(`e${at}`);
    }
    await vi.advanceTimersByTimeAsync(5000);
    expect(writes).toEqual(expected);
    expect(saver.status).toEqual({ state: 'saved' });
  });

  it('writes nothing before the quiet spell ends, and at once on flush (page hidden)', async () => {
    const { saver, writes } = recorder();
    saver.save('a');
    await vi.advanceTimersByTimeAsync(SAVE_DELAY_MS - 1);
    expect(writes).toEqual([]);
    expect(saver.status.state).toBe('pending');
    saver.save('b');
    await saver.flush();
    expect(writes).toEqual([{ value: 'b', at: SAVE_DELAY_MS - 1 }]);
    await vi.advanceTimersByTimeAsync(5000);
    expect(writes).toHaveLength(1);
  });

  it('a failed write keeps the value, says why, and the next flush tries it again', async () => {
    let full = true;
    const { saver, writes } = recorder(() => full);
    saver.save('a');
    await vi.advanceTimersByTimeAsync(SAVE_DELAY_MS);
    expect(saver.status).toEqual({ state: 'failed', error: 'the disk is full' });
    expect(saver.unsaved).toBe(true);
    full = false;
    await saver.flush();
    expect(writes.map((w) => w.value)).toEqual(['a', 'a']);
    expect(saver.status).toEqual({ state: 'saved' });
    expect(saver.unsaved).toBe(false);
  });

  it('writes never overlap: a change made during a write is written after it', async () => {
    const started: string[] = [];
    let release: () => void = () => {};
    const saver = new Saver<string>({
      write: (value) => {
        started.push(value);
        return value === 'slow' ? new Promise<void>((r) => (release = r)) : Promise.resolve();
      },
    });
    saver.save('slow');
    await vi.advanceTimersByTimeAsync(SAVE_DELAY_MS);
    saver.save('next');
    await vi.advanceTimersByTimeAsync(SAVE_DELAY_MS * 3);
    expect(started).toEqual(['slow']);
    release();
    await saver.flush();
    expect(started).toEqual(['slow', 'next']);
  });

  it('tells what is not yet stored: the pending value, else the one being written (what page-hide stages)', async () => {
    let release: () => void = () => {};
    let fail = false;
    const saver = new Saver<string>({
      write: () =>
        new Promise<void>((resolve, reject) => (release = () => (fail ? reject(new Error('disk full')) : resolve()))),
    });
    expect([saver.unstored, saver.inFlight]).toEqual([undefined, undefined]);
    saver.save('a');
    expect([saver.unstored, saver.inFlight]).toEqual(['a', undefined]);
    await vi.advanceTimersByTimeAsync(SAVE_DELAY_MS);
    expect([saver.unstored, saver.inFlight]).toEqual(['a', 'a']);
    saver.save('b');
    expect([saver.unstored, saver.inFlight]).toEqual(['b', 'a']);
    release();
    await vi.advanceTimersByTimeAsync(SAVE_DELAY_MS);
    expect([saver.unstored, saver.inFlight]).toEqual(['b', 'b']);
    fail = true;
    release();
    await vi.advanceTimersByTimeAsync(0);
    // A failed write leaves its value pending, never forgotten.
    expect([saver.unstored, saver.inFlight, saver.status.state]).toEqual(['b', undefined, 'failed']);
  });
});
