import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import {
  createFlowDeriver,
  deriveOnce,
  MOVING_CHIP,
  MOVING_LAYERS_MAX,
  MOVING_WIRE,
} from '../../app/canvas/deriveFlow.ts';
import {
  addWaiver,
  connectPins,
  editPart,
  setNetLabel,
  setPartLabel,
  setPartProfile,
} from '../../app/store/commands/index.ts';
import { chipSize } from '../../app/canvas/chipLayout.ts';
import type { Pin } from '../../rules/model/schema.ts';
import { readDesign } from '../../rules/model/reader.ts';
import { input, net, output, part } from '../support/build.ts';
import { bench, harness } from './harness.ts';

const text = readFileSync(new URL('../../rules/examples/greenhouse.json', import.meta.url), 'utf8');

describe('nodes and edges from the design', () => {
  it("one node per part, n−1 wires per net of n pins, the net's name on its first wire", () => {
    const read = readDesign(text);
    if (!read.ok) throw new Error('example unreadable');
    const { nodes, edges } = deriveOnce(read.design);
    expect(nodes.map((n) => n.id)).toEqual(read.design.parts.map((p) => p.id));
    expect(edges).toHaveLength(read.design.nets.reduce((k, n) => k + n.pins.length - 1, 0));
    const valve = edges.filter((e) => e.data?.net === 'FAULT_N');
    expect(valve.map((e) => [e.id, e.source, e.sourceHandle, e.target, e.targetHandle, e.data?.label])).toEqual([
      ['FAULT_N:U3.FAULT_N:U1.FAULT_N', 'U3', 'FAULT_N', 'U1', 'FAULT_N', 'VALVE_FAULT_N'],
    ]);
  });

  it('a net with a route draws exactly its route', () => {
    const d = bench({
      nets: [
        net('A', ['D.Y1', 'H.A', 'T.A'], {
          route: [
            ['D.Y1', 'T.A'],
            ['D.Y1', 'H.A'],
          ],
        }),
      ],
    });
    expect(deriveOnce(d).edges.map((e) => e.id)).toEqual(['A:D.Y1:T.A', 'A:D.Y1:H.A']);
  });

  it('an edit replaces only the node and edge objects whose drawing it changed', () => {
    const h = harness(bench({ nets: [net('A', ['D.Y1', 'H.A']), net('B', ['D.Y2', 'T.A'])] }));
    const flow = createFlowDeriver();
    const n0 = flow.nodes(h.design.parts, [], null);
    const e0 = flow.edges(h.design.nets, []);

    // A chip reads its part from the store: a new label or family leaves every node, and the array, alone.
    h.apply(setPartLabel('T', 'Receiver'));
    h.apply(setPartProfile('T', '74hc'));
    expect(flow.nodes(h.design.parts, [], null)).toBe(n0);
    // A pin more makes the chip taller: that node only.
    const t = h.design.parts[2]!;
    h.apply(editPart('T', { ...t, pins: [...t.pins, input('C')] }));
    const n1 = flow.nodes(h.design.parts, [], null);
    expect(n1.map((n, k) => n === n0[k])).toEqual([true, true, false, true]);
    expect(n1[2]!.height).toBeGreaterThan(n0[2]!.height!);

    // A waiver changes the net, not its drawing: the same edges, the same array.
    h.apply(addWaiver({ net: 'B', rule: 'level-high' }, 'seen'));
    expect(flow.edges(h.design.nets, [])).toBe(e0);
    h.apply(setNetLabel('B', 'EN'));
    const e1 = flow.edges(h.design.nets, []);
    expect(e1.map((e, k) => e === e0[k])).toEqual([true, false]);

    h.apply(connectPins('H.Y', 'T.B'));
    const e2 = flow.edges(h.design.nets, []);
    expect(e2.slice(0, 2).map((e, k) => e === e1[k])).toEqual([true, true]);
    expect(e2[2]?.id).toBe('N1:H.Y:T.B');

    // Selecting a wire replaces that net's wires only; a drag moves only the dragged node.
    const e3 = flow.edges(h.design.nets, ['A:D.Y1:H.A']);
    expect(e3.map((e, k) => e === e2[k])).toEqual([false, true, true]);
    expect(e3[0]?.selected).toBe(true);
    const n2 = flow.nodes(h.design.parts, [], new Map([['H', { x: 5, y: 6 }]]));
    expect(n2.map((n, k) => n === n1[k])).toEqual([true, false, true, true]);
    expect(n2[1]?.position).toEqual({ x: 5, y: 6 });
  });

  it('a drag marks the dragged chip and the wires ending on it once, and unmarks them at its end', () => {
    const h = harness(bench({ nets: [net('A', ['D.Y1', 'H.A', 'T.A']), net('B', ['D.Y2', 'T.B'])] }));
    const flow = createFlowDeriver();
    const e0 = flow.edges(h.design.nets, [], null);
    const moving = new Set(['T']);
    const e1 = flow.edges(h.design.nets, [], moving);
    // Net A is drawn as the chain D.Y1–H.A–T.A: its second wire ends on T, its first does not.
    expect(e1.map((e) => [e.id, e.className])).toEqual([
      ['A:D.Y1:H.A', undefined],
      ['A:H.A:T.A', MOVING_WIRE],
      ['B:D.Y2:T.B', MOVING_WIRE],
    ]);
    expect(e1[0]).not.toBe(e0[0]); // its net has a moving wire: the net's edges are made again
    // Every later step of the same drag hands over the same array.
    expect(flow.edges(h.design.nets, [], moving)).toBe(e1);
    const n = flow.nodes(h.design.parts, [], new Map([['T', { x: 40, y: 50 }]]));
    expect(n.map((node) => [node.id, node.className])).toEqual([
      ['D', undefined],
      ['H', undefined],
      ['T', MOVING_CHIP],
      ['S', undefined],
    ]);
    // The drag ends: no marks left.
    const e2 = flow.edges(h.design.nets, [], null);
    expect(e2.map((e) => e.className)).toEqual([undefined, undefined, undefined]);
    expect(flow.nodes(h.design.parts, [], null).every((node) => node.className === undefined)).toBe(true);
  });

  it(`a drag of more than ${MOVING_LAYERS_MAX} chips marks none (the layers would cost more than they save)`, () => {
    const many = Array.from({ length: MOVING_LAYERS_MAX + 1 }, (_, k) =>
      part(`P${k}`, '5v0', '74hc', [output('Y')], { position: { x: k * 240, y: 0 } }),
    );
    const d = bench({ parts: many, nets: [net('A', ['P0.Y', 'P1.Y'])] });
    const flow = createFlowDeriver();
    const ids = new Set(many.map((p) => p.id));
    expect(flow.edges(d.nets, [], ids).every((e) => e.className === undefined)).toBe(true);
    expect(
      flow.nodes(d.parts, [], new Map(many.map((p) => [p.id, { x: 1, y: 2 }]))).every((n) => n.className === undefined),
    ).toBe(true);
    expect(flow.edges(d.nets, [], new Set(['P0'])).map((e) => e.className)).toEqual([MOVING_WIRE]);
  });

  // Sizes as styles.css draws them (border 3 + header 41, rows of 20 with 6 of padding, strips of 30, border 1).
  const sizes: { name: string; pins: Pin[]; height: number }[] = [
    { name: 'one input', pins: [input('A')], height: 44 + 26 + 1 },
    { name: 'two inputs and an output', pins: [input('A'), input('B'), output('Y')], height: 44 + 46 + 1 },
    { name: 'a pin on top only', pins: [input('A', { side: 'top' })], height: 44 + 30 + 1 },
    {
      name: 'three rows, a top and a bottom strip',
      pins: [input('A'), input('B'), input('C'), output('T', { side: 'top' }), output('B2', { side: 'bottom' })],
      height: 44 + 66 + 60 + 1,
    },
  ];
  it.each(sizes)('a chip with $name is $height px tall', ({ pins, height }) => {
    expect(chipSize(part('X', '5v0', '74hc', pins))).toEqual({ width: 208, height });
  });
});
