import { describe, expect, it } from 'vitest';
import { deleteSelection, disconnectWire, netWires } from '../../app/store/commands/index.ts';
import type { Net } from '../../rules/model/schema.ts';
import { net } from '../support/build.ts';
import { bench, harness } from './harness.ts';

const waiver = [{ rule: 'level-high' as const, note: 'reviewed' }];

interface Case {
  name: string;
  nets: Net[];
  wire: [string, string];
  expect: Partial<Net>[];
}

const cases: Case[] = [
  {
    name: 'the only wire of a two-pin net: the net goes',
    nets: [net('A', ['D.Y1', 'H.A'])],
    wire: ['D.Y1', 'H.A'],
    expect: [],
  },
  {
    name: 'a wire of a loop: the net stays whole, only its route changes',
    nets: [
      net('A', ['D.Y1', 'H.A', 'T.A'], {
        route: [
          ['D.Y1', 'H.A'],
          ['H.A', 'T.A'],
          ['T.A', 'D.Y1'],
        ],
      }),
    ],
    wire: ['H.A', 'D.Y1'],
    expect: [
      {
        id: 'A',
        pins: ['D.Y1', 'H.A', 'T.A'],
        route: [
          ['H.A', 'T.A'],
          ['T.A', 'D.Y1'],
        ],
      },
    ],
  },
  {
    name: 'a pin cut off alone leaves the net; the rest keeps everything',
    nets: [net('A', ['D.Y1', 'H.A', 'T.A'], { label: 'EN', pull: { to: '5v0', ohms: 10e3 }, waivers: waiver })],
    wire: ['D.Y1', 'H.A'],
    expect: [
      {
        id: 'A',
        label: 'EN',
        pins: ['H.A', 'T.A'],
        pull: { to: '5v0', ohms: 10e3 },
        waivers: waiver,
        route: [['H.A', 'T.A']],
      },
    ],
  },
  {
    name: 'the bigger half keeps id, label, pull, capacitance and waivers even without the first pin',
    nets: [
      net('A', ['D.Y1', 'H.A', 'H.B', 'T.A', 'T.B'], {
        label: 'EN',
        pull: { to: '5v0', ohms: 10e3 },
        waivers: waiver,
        wiringCapacitance: 20e-12,
        maxRiseTime: 1e-6,
      }),
    ],
    wire: ['H.A', 'H.B'],
    expect: [
      {
        id: 'A',
        label: 'EN',
        pins: ['H.B', 'T.A', 'T.B'],
        pull: { to: '5v0', ohms: 10e3 },
        waivers: waiver,
        wiringCapacitance: 20e-12,
      },
      { id: 'N1', pins: ['D.Y1', 'H.A'], route: [['D.Y1', 'H.A']], maxRiseTime: 1e-6 },
    ],
  },
  {
    name: "two equal halves: the half with the net's first pin keeps the net",
    nets: [net('A', ['D.Y1', 'H.A', 'H.B', 'T.A'], { label: 'EN' }), net('N1', ['D.Y2', 'T.B'])],
    wire: ['H.A', 'H.B'],
    expect: [{ id: 'A', label: 'EN', pins: ['D.Y1', 'H.A'] }, { id: 'N2', pins: ['H.B', 'T.A'] }, { id: 'N1' }],
  },
];

/** The new half must carry no attribute it was not given. */
const bareKeys = ['id', 'pins', 'route', 'maxRiseTime'];

describe('disconnectWire', () => {
  it.each(cases)('$name', ({ nets, wire, expect: want }) => {
    const h = harness(bench({ nets }));
    expect(h.apply(disconnectWire(...wire))).toEqual({ ok: true, changed: true });
    const got = h.design.nets;
    expect(got).toHaveLength(want.length);
    want.forEach((w, k) => {
      expect(got[k]).toMatchObject(w);
    });
    for (const n of got)
      if (!nets.some((o) => o.id === n.id)) expect(Object.keys(n).filter((k) => !bareKeys.includes(k))).toEqual([]);
    // Every net the split leaves is drawn by wires that join all of its pins.
    for (const n of got) expect(netWires(n)).toHaveLength(n.pins.length - 1);
    expect(h.undo()).toBe(true);
    expect(h.design.nets).toEqual(nets);
  });

  it('refuses a wire that is not there, with a reason', () => {
    const h = harness(bench({ nets: [net('A', ['D.Y1', 'H.A', 'T.A'])] }));
    // The chain is D.Y1–H.A, H.A–T.A: no wire D.Y1–T.A.
    const out = h.apply(disconnectWire('D.Y1', 'T.A'));
    expect(out).toEqual({ ok: false, reason: 'No wire joins D.Y1 and T.A.' });
  });
});

describe('deleteSelection', () => {
  it("takes a deleted part's pins off its nets, keeps the rest whole, and drops nets left with one pin", () => {
    const h = harness(
      bench({
        nets: [net('A', ['D.Y1', 'H.A', 'T.A']), net('B', ['H.Y', 'T.B']), net('C', ['D.Y2', 'H.B'])],
      }),
    );
    expect(h.apply(deleteSelection({ parts: ['H'], wires: [] })).ok).toBe(true);
    expect(h.design.parts.map((p) => p.id)).toEqual(['D', 'T', 'S']);
    // A kept D.Y1 and T.A, joined again by the drawing although H.A sat between them.
    expect(h.nets()).toEqual([{ id: 'A', pins: ['D.Y1', 'T.A'] }]);
    expect(netWires(h.design.nets[0]!)).toEqual([['D.Y1', 'T.A']]);
    expect(h.undo()).toBe(true);
    expect(h.design.parts.map((p) => p.id)).toEqual(['D', 'H', 'T', 'S']);
    expect(h.nets().map((n) => n.id)).toEqual(['A', 'B', 'C']);
  });

  it('deletes parts and wires as one step', () => {
    const h = harness(bench({ nets: [net('A', ['D.Y1', 'H.A']), net('B', ['D.Y2', 'T.A', 'T.B'])] }));
    expect(
      h.apply(
        deleteSelection({
          parts: ['S'],
          wires: [
            ['D.Y1', 'H.A'],
            ['T.A', 'T.B'],
          ],
        }),
      ).ok,
    ).toBe(true);
    expect(h.nets()).toEqual([{ id: 'B', pins: ['D.Y2', 'T.A'] }]);
    expect(h.store.getState().past).toHaveLength(1);
    h.undo();
    expect(h.nets()).toEqual([
      { id: 'A', pins: ['D.Y1', 'H.A'] },
      { id: 'B', pins: ['D.Y2', 'T.A', 'T.B'] },
    ]);
  });
});
