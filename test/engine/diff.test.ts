/**
 * `changedById` against a plain reference: the records whose identity differs, matched by id,
 * with those gone reported once. The walk takes shortcuts (records one place away after a
 * deletion or insertion are matched by identity), so every shape of edit is a case here.
 */
import { describe, expect, it } from 'vitest';
import { changedById } from '../../rules/engine/diff.ts';

type Rec = { id: string; v: number };
const rec = (id: string, v = 0): Rec => ({ id, v });

/** The reference: by id, what changed (old, now), in no particular order. */
function reference(before: readonly Rec[], after: readonly Rec[]): string[] {
  const was = new Map(before.map((r) => [r.id, r]));
  const now = new Map(after.map((r) => [r.id, r]));
  const out: string[] = [];
  for (const [id, r] of now) if (was.get(id) !== r) out.push(`${was.has(id) ? 'changed' : 'added'} ${id}`);
  for (const id of was.keys()) if (!now.has(id)) out.push(`removed ${id}`);
  return out.sort();
}

function reported(before: readonly Rec[], after: readonly Rec[]): string[] {
  const index = new Map(before.map((r) => [r.id, r]));
  const out: string[] = [];
  changedById(
    before,
    after,
    (id) => index.get(id),
    (old, now) =>
      out.push(`${old === undefined ? 'added' : now === undefined ? 'removed' : 'changed'} ${(now ?? old)!.id}`),
  );
  return out.sort();
}

const base = ['a', 'b', 'c', 'd', 'e', 'f'].map((id) => rec(id));
const [a, b, c, d, e, f] = base as [Rec, Rec, Rec, Rec, Rec, Rec];

const cases: [string, Rec[]][] = [
  ['nothing', [a, b, c, d, e, f]],
  ['append', [a, b, c, d, e, f, rec('g')]],
  ['remove the first', [b, c, d, e, f]],
  ['remove one in the middle', [a, b, d, e, f]],
  ['remove the last', [a, b, c, d, e]],
  ['remove two apart', [a, c, d, f]],
  ['remove two together', [a, b, e, f]],
  ['insert in the middle', [a, b, rec('x'), c, d, e, f]],
  ['insert at the start', [rec('x'), a, b, c, d, e, f]],
  ['change one', [a, b, rec('c', 1), d, e, f]],
  ['remove one and change a later one', [a, c, d, rec('e', 1), f]],
  ['remove one and insert another later', [a, c, d, rec('y'), e, f]],
  ['swap two', [a, c, b, d, e, f]],
  ['move the last to the front', [f, a, b, c, d, e]],
  ['reverse', [f, e, d, c, b, a]],
  ['replace everything', [rec('p'), rec('q')]],
  ['empty', []],
  ['a changed record moved after a removal', [a, c, rec('b', 1), d, e, f]],
];

describe('changedById reports what a plain comparison by id does', () => {
  it.each(cases)('%s', (_name, after) => {
    expect(reported(base, after)).toEqual(reference(base, after));
  });

  it('from a frozen array to a frozen array (immer freezes what it makes)', () => {
    const after = Object.freeze([a, c, d, rec('e', 2), f, rec('z')]);
    expect(reported(Object.freeze([...base]), after)).toEqual(reference(base, after));
  });
});
