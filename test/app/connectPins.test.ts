import { describe, expect, it } from 'vitest';
import { connectPins } from '../../app/store/commands/index.ts';
import type { Net } from '../../rules/model/schema.ts';
import { net } from '../support/build.ts';
import { bench, harness } from './harness.ts';

interface Case {
  name: string;
  nets: Net[];
  from: string;
  to: string;
  /** The nets afterwards (id, pins, and any other field named), in design order. */
  expect: Partial<Net>[];
}

const cases: Case[] = [
  {
    name: 'two free pins start net N1 with the pair as its route',
    nets: [],
    from: 'D.Y1',
    to: 'H.A',
    expect: [{ id: 'N1', pins: ['D.Y1', 'H.A'], route: [['D.Y1', 'H.A']] }],
  },
  {
    name: 'a fresh id skips the ids taken',
    nets: [net('N1', ['D.Y2', 'H.B']), net('N2', ['D.Y3', 'H.C'])],
    from: 'D.Y1',
    to: 'H.A',
    expect: [{ id: 'N1' }, { id: 'N2' }, { id: 'N3', pins: ['D.Y1', 'H.A'] }],
  },
  {
    name: "a free pin joins the other pin's net; the net's implicit chain becomes its route",
    nets: [net('CLK', ['D.Y1', 'H.A', 'H.B'], { label: 'CLK' })],
    from: 'T.A',
    to: 'H.B',
    expect: [
      {
        id: 'CLK',
        label: 'CLK',
        pins: ['D.Y1', 'H.A', 'H.B', 'T.A'],
        route: [
          ['D.Y1', 'H.A'],
          ['H.A', 'H.B'],
          ['T.A', 'H.B'],
        ],
      },
    ],
  },
  {
    name: "two nets merge; the drag's first net keeps its id, label and pull, waivers are united",
    nets: [
      net('A', ['D.Y1', 'H.A'], {
        label: 'ALPHA',
        pull: { to: '5v0', ohms: 10e3 },
        waivers: [{ rule: 'level-high', note: 'reviewed' }],
      }),
      net('B', ['H.B', 'T.A'], {
        label: 'BETA',
        pull: { to: '3v3', ohms: 4.7e3 },
        waivers: [
          { rule: 'level-low', note: 'reviewed too' },
          { rule: 'level-high', note: 'reviewed' },
        ],
      }),
    ],
    from: 'H.A',
    to: 'H.B',
    expect: [
      {
        id: 'A',
        label: 'ALPHA',
        pins: ['D.Y1', 'H.A', 'H.B', 'T.A'],
        pull: { to: '5v0', ohms: 10e3 },
        waivers: [
          { rule: 'level-high', note: 'reviewed' },
          { rule: 'level-low', note: 'reviewed too' },
        ],
        route: [
          ['D.Y1', 'H.A'],
          ['H.B', 'T.A'],
          ['H.A', 'H.B'],
        ],
      },
    ],
  },
  {
    name: "the merged net takes the other's label and pull when it has none; the stricter rise time wins",
    nets: [
      net('N4', ['D.Y1', 'H.A'], { maxRiseTime: 1e-6 }),
      net('SDA', ['H.B', 'T.A'], { label: 'SDA', pull: { to: '3v3', ohms: 4.7e3 }, maxRiseTime: 300e-9 }),
    ],
    from: 'D.Y1',
    to: 'T.A',
    expect: [
      {
        id: 'N4',
        label: 'SDA',
        pull: { to: '3v3', ohms: 4.7e3 },
        maxRiseTime: 300e-9,
        pins: ['D.Y1', 'H.A', 'H.B', 'T.A'],
      },
    ],
  },
  {
    name: 'wiring capacitance adds up, the net without its own counting the design default (5 pF, design-format.md)',
    nets: [net('P', ['D.Y1', 'H.A'], { wiringCapacitance: 50e-12 }), net('Q', ['H.B', 'T.A'])],
    from: 'T.A',
    to: 'H.A',
    expect: [{ id: 'Q', wiringCapacitance: 55e-12 }],
  },
];

const refused: { name: string; nets: Net[]; from: string; to: string; reason: RegExp }[] = [
  { name: 'a pin to itself', nets: [], from: 'H.A', to: 'H.A', reason: /itself/ },
  {
    name: 'a pin to a pin on the same net',
    nets: [net('X', ['D.Y1', 'H.A', 'T.A'], { label: 'XLABEL' })],
    from: 'D.Y1',
    to: 'T.A',
    reason: /already on net XLABEL/,
  },
  { name: 'a pin that does not exist', nets: [], from: 'H.A', to: 'H.Q', reason: /no pin H\.Q/ },
  { name: 'a part that does not exist', nets: [], from: 'Z.A', to: 'H.A', reason: /no pin Z\.A/ },
];

describe('connectPins', () => {
  it.each(cases)('$name', ({ nets, from, to, expect: want }) => {
    const h = harness(bench({ nets }));
    expect(h.apply(connectPins(from, to))).toEqual({ ok: true, changed: true });
    const got = h.design.nets;
    expect(got).toHaveLength(want.length);
    want.forEach((w, k) => {
      expect(got[k]).toMatchObject(w);
    });
    // One step: undo brings back exactly the nets before.
    expect(h.undo()).toBe(true);
    expect(h.design.nets).toEqual(nets);
  });

  it.each(refused)('refuses $name, with a reason, changing nothing', ({ nets, from, to, reason }) => {
    const h = harness(bench({ nets }));
    const before = h.design;
    const out = h.apply(connectPins(from, to));
    expect(out.ok).toBe(false);
    expect(out.ok ? '' : out.reason).toMatch(reason);
    expect(h.design).toBe(before);
    expect(h.store.getState().past).toHaveLength(0);
    expect(h.store.getState().notice?.text).toMatch(reason);
  });
});
