/**
 * Tidy layout (app/store/commands/tidyLayout.ts): chips arranged by signal flow with a
 * layered layout, as one undo step. Signal flow left to right and no overlapping chips are
 * what a block diagram is read by (common practice); the routes afterwards are judged by the
 * router's own measures.
 */
import { describe, expect, it } from 'vitest';
import { exampleDesign } from '../../app/example.ts';
import { chipSize } from '../../app/canvas/chipLayout.ts';
import { chipBox } from '../../app/canvas/routes.ts';
import { netWires, tidyLayout, wireId } from '../../app/store/commands/index.ts';
import type { Design } from '../../rules/model/schema.ts';
import { bodyCrossings, routeOnce } from '../../rules/routing/index.ts';
import { design as makeDesign, input, net, output, part } from '../support/build.ts';
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

const cases: [string, () => Design][] = [
  ['a chain placed backwards on one spot', backwardsChain],
  ['the greenhouse example', exampleDesign],
  ['a generated 40-part board', () => generateDesign(3, { parts: 40 })],
];

describe('tidy layout', () => {
  it.each(cases)('%s: no two chips overlap, and a driver stands left of its receivers', (_name, make) => {
    const h = harness(make());
    expect(h.apply(tidyLayout()).ok).toBe(true);
    const d = h.design;
    const box = (id: string) => {
      const p = d.parts.find((x) => x.id === id)!;
      return { ...p.position!, ...chipSize(p) };
    };
    for (let i = 0; i < d.parts.length; i++) {
      for (let j = i + 1; j < d.parts.length; j++) {
        const a = box(d.parts[i]!.id);
        const b = box(d.parts[j]!.id);
        const apart = a.x + a.width <= b.x || b.x + b.width <= a.x || a.y + a.height <= b.y || b.y + b.height <= a.y;
        expect(apart, `${d.parts[i]!.id} and ${d.parts[j]!.id}`).toBe(true);
      }
    }
    // Signal flow: on a design without loops every driver is left of the receivers it drives.
    if (_name.startsWith('a chain')) {
      expect(box('A').x).toBeLessThan(box('B').x);
      expect(box('B').x).toBeLessThan(box('C').x);
    }
  });

  it.each(cases)('%s: one undo step puts every chip back', (_name, make) => {
    const h = harness(make());
    const before = structuredClone(h.design.parts.map((p) => p.position));
    h.apply(tidyLayout());
    expect(h.design.parts.map((p) => p.position)).not.toEqual(before);
    expect(h.undo()).toBe(true);
    expect(h.design.parts.map((p) => p.position)).toEqual(before);
  });

  it('the example, tidied, routes without a wire through a chip', () => {
    const h = harness(exampleDesign());
    h.apply(tidyLayout());
    const boxes = h.design.parts.map(chipBox);
    const wires = h.design.nets.flatMap((n) =>
      netWires(n).map(([a, b]) => ({ id: wireId(n.id, a, b), net: n.id, a, b })),
    );
    expect(bodyCrossings([...routeOnce(boxes, wires).values()], boxes)).toEqual([]);
  });
});
