import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { createFlowDeriver, deriveOnce } from '../../app/canvas/deriveFlow.ts';
import { connectPins, setNetLabel, setPartLabel } from '../../app/store/commands/index.ts';
import { readDesign } from '../../rules/model/reader.ts';
import { net } from '../support/build.ts';
import { bench, harness } from './harness.ts';

const text = readFileSync(new URL('../../rules/examples/greenhouse.json', import.meta.url), 'utf8');

describe('nodes and edges from the design', () => {
  it('one node per part, n−1 wires per net of n pins, the net\'s name on its first wire', () => {
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
    const d = bench({ nets: [net('A', ['D.Y1', 'H.A', 'T.A'], { route: [['D.Y1', 'T.A'], ['D.Y1', 'H.A']] })] });
    expect(deriveOnce(d).edges.map((e) => e.id)).toEqual(['A:D.Y1:T.A', 'A:D.Y1:H.A']);
  });

  it('an edit replaces only the node and edge objects it touched', () => {
    const h = harness(bench({ nets: [net('A', ['D.Y1', 'H.A']), net('B', ['D.Y2', 'T.A'])] }));
    const flow = createFlowDeriver();
    const n0 = flow.nodes(h.design.parts, [], null);
    const e0 = flow.edges(h.design.nets, []);

    h.apply(setPartLabel('T', 'Receiver'));
    const n1 = flow.nodes(h.design.parts, [], null);
    expect(n1.map((n, k) => n === n0[k])).toEqual([true, true, false, true]);

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
});
