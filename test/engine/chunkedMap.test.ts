/** The engine's persistent tables behave as a Map, and editing one never changes the one it came from. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ChunkedMap, tallyOf } from '../../rules/engine/chunkedMap.ts';

const sorted = (m: ReadonlyMap<string, number>) => [...m].sort(([a], [b]) => (a < b ? -1 : 1));

describe('ChunkedMap', () => {
  it('agrees with a Map over random edits, and every earlier version stays as it was', () => {
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.string({ maxLength: 3 }), fc.integer()), { maxLength: 200 }),
        fc.array(
          fc.array(fc.tuple(fc.string({ maxLength: 3 }), fc.option(fc.integer(), { nil: undefined })), {
            maxLength: 40,
          }),
          { maxLength: 30 },
        ),
        (start, edits) => {
          const model = new Map(start);
          let map = ChunkedMap.from(start);
          const history: [ChunkedMap<number>, [string, number][]][] = [[map, sorted(model)]];
          for (const edit of edits) {
            for (const [k, v] of edit)
              if (v === undefined) model.delete(k);
              else model.set(k, v);
            map = map.with(edit);
            history.push([map, sorted(model)]);
            expect(map.size).toBe(model.size);
            for (const k of model.keys()) expect(map.get(k)).toBe(model.get(k));
          }
          for (const [m, seen] of history) expect(sorted(m)).toEqual(seen);
        },
      ),
      { numRuns: 200 },
    );
  });

  it('an edit that changes nothing returns the same map; one that does shares the untouched buckets', () => {
    const big = ChunkedMap.from(Array.from({ length: 5000 }, (_, k) => [`N${k}`, k] as [string, number]));
    expect(big.with([])).toBe(big);
    const next = big.with([['N17', -1]]);
    const shared = next.chunks().filter((b, k) => b === big.chunks()[k]).length;
    expect(next.chunks().length).toBe(big.chunks().length);
    expect(shared).toBe(big.chunks().length - 1);
    expect(big.get('N17')).toBe(17);
    expect(next.get('N17')).toBe(-1);
  });

  it('a map grown one entry at a time spreads into more buckets', () => {
    let m = ChunkedMap.empty<number>();
    for (let k = 0; k < 3000; k++) m = m.with([[`K${k}`, k]]);
    expect(m.size).toBe(3000);
    expect(m.chunks().length).toBeGreaterThan(8);
    expect(Math.max(...m.chunks().map((b) => b.size))).toBeLessThan(3000 / 4);
  });

  it('tallies are cached per bucket and counted again only where an edit copied', () => {
    const m = ChunkedMap.from(Array.from({ length: 1000 }, (_, k) => [`P${k}`, 1] as [string, number]));
    const cache = new WeakMap<object, { n: number }>();
    let measured = 0;
    const measure = (b: ReadonlyMap<string, number>) => {
      measured++;
      let n = 0;
      for (const v of b.values()) n += v;
      return { n };
    };
    const sum = (into: { n: number }, p: { n: number }) => {
      into.n += p.n;
    };
    expect(tallyOf(m, cache, measure, sum, () => ({ n: 0 })).n).toBe(1000);
    const first = measured;
    const next = m.with([
      ['P3', 5],
      ['new', 2],
    ]);
    expect(tallyOf(next, cache, measure, sum, () => ({ n: 0 })).n).toBe(1006);
    expect(measured - first).toBeLessThanOrEqual(2);
  });
});
