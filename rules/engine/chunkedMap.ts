/**
 * A string-keyed map that is a value: editing it gives a new map and never changes the old one.
 *
 * A check result keeps one entry per net and power state; an edit re-checks a handful of them.
 * Copying a 10,000-entry Map per edit would cost more than the re-check itself, and sharing one
 * mutable Map between an old and a new result let the old result change under its reader. So
 * the entries live in buckets (about `BUCKET` entries each, by a hash of the key): an edit copies
 * the array of buckets and the buckets it touches, and shares every other bucket with the map it
 * came from. A bucket is never changed once its map is built, so anything computed from one
 * bucket (the tallies of `tallyOf`) can be cached by the bucket's identity.
 */

/** Entries a bucket aims at: small enough to copy per edit, large enough to keep the spine short. */
const BUCKET = 16;

function bucketCountFor(size: number): number {
  let n = 1;
  while (n * BUCKET < size && n < 1 << 16) n *= 2;
  return n;
}

/** FNV-1a over UTF-16 units: cheap, stable, and spreads the short ids a design uses. */
function hash(key: string): number {
  let h = 0x811c9dc5;
  for (let i = 0; i < key.length; i++) {
    h ^= key.charCodeAt(i);
    h = Math.imul(h, 0x01000193);
  }
  return h >>> 0;
}

type Bucket<V> = ReadonlyMap<string, V>;

const EMPTY_BUCKET: Bucket<never> = new Map<string, never>();

export class ChunkedMap<V> implements ReadonlyMap<string, V> {
  private constructor(
    private readonly buckets: readonly Bucket<V>[],
    readonly size: number,
  ) {}

  static empty<V>(): ChunkedMap<V> {
    return new ChunkedMap<V>([EMPTY_BUCKET], 0);
  }

  static from<V>(entries: Iterable<readonly [string, V]>): ChunkedMap<V> {
    const list = [...entries];
    const n = bucketCountFor(list.length);
    const buckets: Map<string, V>[] = Array.from({ length: n }, () => new Map());
    for (const [k, v] of list) buckets[hash(k) & (n - 1)]!.set(k, v);
    let size = 0;
    for (const b of buckets) size += b.size;
    return new ChunkedMap(buckets, size);
  }

  get(key: string): V | undefined {
    return this.buckets[hash(key) & (this.buckets.length - 1)]!.get(key);
  }

  has(key: string): boolean {
    return this.buckets[hash(key) & (this.buckets.length - 1)]!.has(key);
  }

  /** A new map with `changes` applied (`undefined` deletes); this one is left as it was. */
  with(changes: Iterable<readonly [string, V | undefined]>): ChunkedMap<V> {
    const n = this.buckets.length;
    const spine = this.buckets.slice();
    const copied = new Set<number>();
    let size = this.size;
    for (const [key, value] of changes) {
      const at = hash(key) & (n - 1);
      if (!copied.has(at)) {
        spine[at] = new Map(spine[at]);
        copied.add(at);
      }
      const bucket = spine[at] as Map<string, V>;
      const had = bucket.has(key);
      if (value === undefined) {
        if (had) {
          bucket.delete(key);
          size--;
        }
      } else {
        bucket.set(key, value);
        if (!had) size++;
      }
    }
    if (copied.size === 0) return this;
    // Grown far past its spine (a design built up edit by edit): spread it again, once.
    if (size > 4 * n * BUCKET) return ChunkedMap.from(chain(spine));
    return new ChunkedMap(spine, size);
  }

  /** The buckets, for computations cached per bucket (each is never changed once built). */
  chunks(): readonly Bucket<V>[] {
    return this.buckets;
  }

  forEach(fn: (value: V, key: string, map: ReadonlyMap<string, V>) => void, thisArg?: unknown): void {
    for (const [k, v] of this) fn.call(thisArg, v, k, this);
  }

  *entries(): MapIterator<[string, V]> {
    for (const b of this.buckets) yield* b.entries();
  }

  *keys(): MapIterator<string> {
    for (const b of this.buckets) yield* b.keys();
  }

  *values(): MapIterator<V> {
    for (const b of this.buckets) yield* b.values();
  }

  [Symbol.iterator](): MapIterator<[string, V]> {
    return this.entries();
  }
}

function* chain<V>(buckets: readonly Bucket<V>[]): Generator<[string, V]> {
  for (const b of buckets) yield* b.entries();
}

/**
 * Sums `measure` over every entry, caching each bucket's sum by the bucket's identity: after an
 * edit only the copied buckets are summed again. `cache` belongs to one `measure`.
 */
export function tallyOf<V, S>(
  map: ChunkedMap<V>,
  cache: WeakMap<object, S>,
  measure: (bucket: ReadonlyMap<string, V>) => S,
  add: (into: S, part: S) => void,
  zero: () => S,
): S {
  const total = zero();
  for (const bucket of map.chunks()) {
    let part = cache.get(bucket);
    if (part === undefined) {
      part = measure(bucket);
      cache.set(bucket, part);
    }
    add(total, part);
  }
  return total;
}
