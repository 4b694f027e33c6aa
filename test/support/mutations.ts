/**
 * Random mutations of a design document, the corpus of the attack that found issue 14: a
 * number changed to an extreme (1e307, 5e-324, -0, the largest double …), a string changed to
 * hostile text (long white space, backtick runs, unbroken names, right-to-left text and
 * combining marks), a key deleted. Each mutation picks its target by an index taken modulo the
 * number of candidates, so that fast-check can shrink it and any document can be mutated.
 */
import fc from 'fast-check';

/** Numbers JSON can carry that lie at or beyond every limit of the format. */
export const EXTREME_NUMBERS: readonly number[] = [
  1e307,
  -1e307,
  3.6e307,
  Number.MAX_VALUE,
  -Number.MAX_VALUE,
  5e-324,
  -5e-324,
  1e-300,
  -0,
  0,
  1,
  -1,
  0.999999,
  1e12,
  1.0000001e12,
  1e-3,
  0.99e-3,
  1e4,
  10001,
  -10001,
  1e3,
  1001,
  1e-15,
  1e-16,
  1e-18,
  2,
];

/** What JSON cannot carry: for designs that bypass the reader. */
export const NON_FINITE_NUMBERS: readonly number[] = [Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY];

const hostileStringArb: fc.Arbitrary<string> = fc.oneof(
  fc.integer({ min: 1, max: 20_000 }).map((n) => ' '.repeat(n)),
  fc.integer({ min: 1, max: 5_000 }).map((n) => ` \n${' '.repeat(n)}\r\n\t`),
  fc.integer({ min: 1, max: 5_000 }).map((n) => '`'.repeat(n)),
  fc.integer({ min: 1, max: 5_000 }).map((n) => 'a`'.repeat(n)),
  fc.integer({ min: 1, max: 10_000 }).map((n) => 'W'.repeat(n)),
  fc.constantFrom(
    '\u05e9\u05e2\u05d5\u05df',
    'e\u0301\u0302\u0303',
    '|*_<b>&amp;',
    'url(x)',
    '',
    '#abc',
    'red',
    'VDD*1000000',
  ),
  fc.string({ unit: 'binary', maxLength: 40 }),
);

export type Mutation =
  | { readonly kind: 'number'; readonly pick: number; readonly value: number }
  | { readonly kind: 'string'; readonly pick: number; readonly value: string }
  | { readonly kind: 'delete'; readonly pick: number };

type Path = readonly (string | number)[];

/** Paths of every value of one kind in a JSON document, depth first. */
function paths(doc: unknown, want: (v: unknown) => boolean, keysOnly = false): Path[] {
  const out: Path[] = [];
  const walk = (v: unknown, at: Path) => {
    if (!keysOnly && want(v)) out.push(at);
    if (v === null || typeof v !== 'object') return;
    if (Array.isArray(v))
      v.forEach((x, k) => {
        walk(x, [...at, k]);
      });
    else
      for (const [k, x] of Object.entries(v)) {
        if (keysOnly) out.push([...at, k]);
        walk(x, [...at, k]);
      }
  };
  walk(doc, []);
  return out;
}

function set(doc: unknown, path: Path, value: unknown): void {
  let o = doc as Record<string | number, unknown>;
  for (const k of path.slice(0, -1)) o = o[k] as Record<string | number, unknown>;
  o[path[path.length - 1]!] = value;
}

function remove(doc: unknown, path: Path): void {
  let o = doc as Record<string | number, unknown>;
  for (const k of path.slice(0, -1)) o = o[k] as Record<string | number, unknown>;
  delete o[path[path.length - 1]!];
}

/**
 * A copy of `doc` with the mutations applied in order; `spare` keeps the paths it returns true
 * for out of reach (the top-level key names the path's first segment).
 */
export function mutate<T>(doc: T, mutations: readonly Mutation[], spare: (path: Path) => boolean = () => false): T {
  const copy = structuredClone(doc);
  for (const m of mutations) {
    if (m.kind === 'delete') {
      const keys = paths(copy, () => false, true).filter((p) => !spare(p));
      if (keys.length > 0) remove(copy, keys[m.pick % keys.length]!);
      continue;
    }
    const targets = paths(copy, (v) => typeof v === (m.kind === 'number' ? 'number' : 'string')).filter(
      (p) => !spare(p),
    );
    if (targets.length > 0) set(copy, targets[m.pick % targets.length]!, m.value);
  }
  return copy;
}

const pick = fc.nat({ max: 1_000_000 });

/** One to four mutations of any kind: numbers from `numbers`, hostile strings, deleted keys. */
export function mutationsArb(numbers: readonly number[] = EXTREME_NUMBERS): fc.Arbitrary<Mutation[]> {
  return fc.array(
    fc.oneof(
      {
        weight: 5,
        arbitrary: fc.record({ kind: fc.constant('number' as const), pick, value: fc.constantFrom(...numbers) }),
      },
      { weight: 2, arbitrary: fc.record({ kind: fc.constant('string' as const), pick, value: hostileStringArb }) },
      { weight: 1, arbitrary: fc.record({ kind: fc.constant('delete' as const), pick }) },
    ),
    { minLength: 1, maxLength: 4 },
  );
}

/** Number mutations only (for designs that skip the reader, whose shape must stay whole). */
export function numberMutationsArb(numbers: readonly number[]): fc.Arbitrary<Mutation[]> {
  return fc.array(fc.record({ kind: fc.constant('number' as const), pick, value: fc.constantFrom(...numbers) }), {
    minLength: 1,
    maxLength: 4,
  });
}
