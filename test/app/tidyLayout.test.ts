/**
 * Tidy layout (app/store/commands/tidyLayout.ts): chips arranged by signal flow with a
 * layered layout, as one undo step. Signal flow left to right and no overlapping chips are
 * what a block diagram is read by (common practice); the routes afterwards are judged by the
 * router's own measures.
 */
import { describe, expect, it } from 'vitest';
import { exampleDesign } from '../../app/example.ts';
import { chipSize, DISCRETE_SIZE } from '../../app/canvas/chipLayout.ts';
import { chipBox, discreteBox } from '../../app/canvas/routes.ts';
import { netWires, tidyLayout, wireId } from '../../app/store/commands/index.ts';
import type { Design } from '../../rules/model/schema.ts';
import { bodyCrossings, routeOnce } from '../../rules/routing/index.ts';
import { design as makeDesign, input, net, output, part } from '../support/build.ts';
import { divider, fetBus } from '../support/paths.ts';
import { generateDesign } from '../support/generator.ts';
import { harness } from './harness.ts';

/** A chain A → B → C placed backwards and piled on one spot. */
function backwardsChain(): Design {
  const d = makeDesign({
    parts: [
      part('C', '3v3', '74lvc', [input('I')], { position: { x: 0, y: 0 } }),
      part('B', '3v3', '74lvc', [input('I'), output('O')], { position: { x: 0, y: 0 } }),
      part('A', '3v3', '74lvc', [output('O')], { position: { x: 0, y: 0 } }),
    ],
    nets: [net('N1', ['A.O', 'B.I']), net('N2', ['B.O', 'C.I'])],
  });
  return d;
}

/** Every part and part between chips of a design piled on one spot. */
function piled(d: Design): Design {
  const at = { x: 0, y: 0 };
  return {
    ...d,
    parts: d.parts.map((p) => ({ ...p, position: at })),
    discretes: (d.discretes ?? []).map((x) => ({ ...x, position: at })),
  };
}

const cases: [string, () => Design][] = [
  ['a chain placed backwards on one spot', backwardsChain],
  // U1 (5 V) → R1 → U2 (3.3 V), R2 from the divided net to ground.
  ['a divider piled on one spot', () => piled(divider())],
  // U2 (1.8 V) — Q1 — U1 (3.3 V), a pull-up on each side.
  ['a FET-shifted bus piled on one spot', () => piled(fetBus())],
  ['the greenhouse example', exampleDesign],
  ['a generated 40-part board', () => generateDesign(3, { parts: 40 })],
];

describe('tidy layout', () => {
  it.each(cases)('%s: no two chips overlap, and a driver stands left of its receivers', (_name, make) => {
    const h = harness(make());
    expect(h.apply(tidyLayout()).ok).toBe(true);
    const d = h.design;
    const box = (id: string) => {
      const p = d.parts.find((x) => x.id === id);
      if (p !== undefined) return { ...p.position!, ...chipSize(p) };
      const x = d.discretes!.find((y) => y.id === id)!;
      return { ...x.position!, ...DISCRETE_SIZE };
    };
    // The parts between chips are arranged with the chips: none overlaps another or a chip.
    const ids = [...d.parts.map((p) => p.id), ...(d.discretes ?? []).map((x) => x.id)];
    for (let i = 0; i < ids.length; i++) {
      for (let j = i + 1; j < ids.length; j++) {
        const a = box(ids[i]!);
        const b = box(ids[j]!);
        const apart = a.x + a.width <= b.x || b.x + b.width <= a.x || a.y + a.height <= b.y || b.y + b.height <= a.y;
        expect(apart, `${ids[i]} and ${ids[j]}`).toBe(true);
      }
    }
    if (_name.startsWith('a divider')) {
      expect(box('U1').x).toBeLessThan(box('R1').x);
      expect(box('R1').x).toBeLessThan(box('U2').x);
    }
    if (_name.startsWith('a FET')) {
      expect(box('U2').x).toBeLessThan(box('Q1').x);
      expect(box('Q1').x).toBeLessThan(box('U1').x);
    }
    // Signal flow: on a design without loops every driver is left of the receivers it drives.
    if (_name.startsWith('a chain')) {
      expect(box('A').x).toBeLessThan(box('B').x);
      expect(box('B').x).toBeLessThan(box('C').x);
    }
  });

  it.each(cases)('%s: one undo step puts every chip back', (_name, make) => {
    const h = harness(make());
    const where = (d: Design) => [...d.parts, ...(d.discretes ?? [])].map((p) => p.position);
    const before = structuredClone(where(h.design));
    h.apply(tidyLayout());
    expect(where(h.design)).not.toEqual(before);
    expect(h.undo()).toBe(true);
    expect(where(h.design)).toEqual(before);
  });

  it('the example, tidied, routes without a wire through a chip or a part between chips', () => {
    const h = harness(exampleDesign());
    h.apply(tidyLayout());
    const boxes = [...h.design.parts.map(chipBox), ...(h.design.discretes ?? []).map(discreteBox)];
    const wires = h.design.nets.flatMap((n) =>
      netWires(n).map(([a, b]) => ({ id: wireId(n.id, a, b), net: n.id, a, b })),
    );
    expect(bodyCrossings([...routeOnce(boxes, wires).values()], boxes)).toEqual([]);
  });
});
