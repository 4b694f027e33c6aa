/**
 * The sorted pin list a `rail-range` finding names, kept up to date pin by pin, against the plain
 * computation it replaces: the keys sorted, and their distinct parts in order of first appearance.
 */
import { describe, expect, it } from 'vitest';
import { partsOfPins } from '../../rules/model/pinKeys.ts';
import { RangedPins } from '../../rules/engine/rangedPins.ts';

const plain = (keys: Iterable<string>) => {
  const sorted = [...keys].sort();
  return { keys: sorted, parts: partsOfPins(...sorted) };
};

// Part ids that sort against each other in the awkward ways: a prefix of another ("U1", "U10",
// "U1-"), characters on both sides of "." ("-" is below it, "0" and "x" above), case.
const START = ['U1.A', 'U10.A', 'U1.B', 'U1-.A', 'U1x.A', 'u1.A', 'J2.3', 'J2.10'];

type Step = ['add' | 'delete', string];
const sequences: [string, Step[]][] = [
  ['nothing', []],
  ['a new part that sorts first', [['add', 'A9.1']]],
  ['a second pin of a part already there', [['add', 'U10.B']]],
  ['a part whose id is a prefix of another', [['add', 'U.A']]],
  ['a part between a prefix and its extension', [['add', 'U1+.A']]],
  ['the only pin of a part leaves', [['delete', 'U1x.A']]],
  ['one of two pins of a part leaves', [['delete', 'U1.A']]],
  [
    'both pins of a part leave',
    [
      ['delete', 'U1.A'],
      ['delete', 'U1.B'],
    ],
  ],
  [
    'a pin leaves and comes back',
    [
      ['delete', 'J2.10'],
      ['add', 'J2.10'],
    ],
  ],
  [
    'a key added twice counts once',
    [
      ['add', 'Z.1'],
      ['add', 'Z.1'],
    ],
  ],
  ['a key not there is not deleted', [['delete', 'Q.1']]],
  ['everything leaves', START.map((k): Step => ['delete', k])],
  ['everything leaves and a new part comes', [...START.map((k): Step => ['delete', k]), ['add', 'N.1']]],
];

describe('RangedPins keeps what sorting the group again would give', () => {
  it.each(sequences)('%s', (_name, steps) => {
    const ranged = RangedPins.of(START);
    const now = new Set(START);
    for (const [op, key] of steps) {
      if (op === 'add') {
        ranged.add(key);
        now.add(key);
      } else {
        ranged.delete(key);
        now.delete(key);
      }
      expect({ keys: ranged.keys(), parts: ranged.parts() }).toEqual(plain(now));
    }
    expect({ keys: ranged.keys(), parts: ranged.parts() }).toEqual(plain(now));
  });

  it('hands out copies: a finding keeps its list whatever joins later', () => {
    const ranged = RangedPins.of(START);
    const keys = ranged.keys();
    const parts = ranged.parts();
    ranged.add('A.1');
    expect(keys).toEqual(plain(START).keys);
    expect(parts).toEqual(plain(START).parts);
  });
});
