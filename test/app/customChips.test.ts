/**
 * Custom chips from the pin table: per-pin overrides change the checks; later edits of the
 * designator and the pins carry the nets along; one undo takes each edit back.
 */
import { describe, expect, it } from 'vitest';
import { addPart, connectPins, editPart, renamePart, type Command } from '../../app/store/commands/index.ts';
import type { Design, Part } from '../../rules/model/schema.ts';
import { validateDesign } from '../../rules/model/reader.ts';
import { input, net, output, part } from '../support/build.ts';
import { bench, harness } from './harness.ts';

/** A chip on the 5 V rail with 74HC numbers, three pins; `A` may carry a VIH override. */
function chip(vih?: number | string): Part {
  return part(
    'X1',
    '5v0',
    '74hc',
    [input('A', vih === undefined ? {} : { params: { vih } }), input('B'), output('Y')],
    { label: 'Custom valve gate' },
  );
}

function highMargin(h: ReturnType<typeof harness>, netId: string): number | null | undefined {
  return h.store.getState().result.nets.get('all-on')?.get(netId)?.view.analysis.worstHigh;
}

describe('custom chips', () => {
  // D.Y1 is 3.3 V LVCMOS: VOH ≥ VDD − 0.2 V at 100 µA (JESD8C), VDD = 3.3 V − 5 % = 3.135 V → 2.935 V.
  // `rules` are the net's unwaived findings: a 3.3 V driver into a 5 V chip also crosses rails (information).
  const cases: {
    name: string;
    vih: number | string | undefined;
    severity: string;
    rules: string[];
    margin?: number;
  }[] = [
    {
      name: 'no override: the 74HC threshold at 5 V fails',
      vih: undefined,
      severity: 'error',
      rules: ['level-high', 'rail-crossing'],
    },
    // A TTL-level input reads 2.0 V as high (JESD7, 74HCT input levels): 2.935 − 2.0.
    { name: 'VIH overridden to 2.0 V passes', vih: 2, severity: 'info', rules: ['rail-crossing'], margin: 0.935 },
    // 0.5·VDD at the receiver's highest supply, 5 V + 5 % = 5.25 V: 2.625 V; 2.935 − 2.625.
    {
      name: 'VIH overridden to the expression 0.5*VDD passes',
      vih: '0.5*VDD',
      severity: 'info',
      rules: ['rail-crossing'],
      margin: 0.31,
    },
  ];
  it.each(cases)('$name', ({ vih, severity, rules, margin }) => {
    const h = harness();
    expect(h.apply(addPart(chip(vih)))).toEqual({ ok: true, changed: true });
    h.apply(connectPins('D.Y1', 'X1.A'));
    const id = h.netOf('X1.A')!.id;
    expect(h.severity(id)).toBe(severity);
    expect(
      h.store
        .getState()
        .result.nets.get('all-on')
        ?.get(id)
        ?.findings.map((f) => f.rule),
    ).toEqual(rules);
    if (margin !== undefined) expect(highMargin(h, id)).toBeCloseTo(margin, 6);
    const read = validateDesign(h.design);
    expect(read.ok ? [] : read.errors).toEqual([]);
  });

  const refusals: { name: string; part: Part; reason: RegExp }[] = [
    {
      name: 'a pin id used twice',
      part: part('X1', '5v0', '74hc', [input('A'), output('A')]),
      reason: /Pin A is listed twice/,
    },
    {
      name: 'a pin id with a dot',
      part: part('X1', '5v0', '74hc', [input('A.1')]),
      reason: /pin A\.1 id: expected a pin id without "\."/,
    },
    {
      name: 'a Level that does not parse',
      part: part('X1', '5v0', '74hc', [input('A', { params: { vih: '0.7*VDDX' } })]),
      reason: /pin A params vih: expected a Level/,
    },
    {
      name: 'a negative input current',
      part: part('X1', '5v0', '74hc', [input('A', { params: { iih: -1e-6 } })]),
      reason: /pin A params iih: expected a current \(A\) of 0 or more/,
    },
    {
      name: 'a pin on an unknown rail',
      part: part('X1', '5v0', '74hc', [input('A', { rail: '12v' })]),
      reason: /Pin A: there is no rail 12v/,
    },
    {
      name: 'a pin of an unknown profile',
      part: part('X1', '5v0', '74hc', [input('A', { profile: '74xyz' })]),
      reason: /Pin A: there is no profile 74xyz/,
    },
  ];
  it.each(refusals)('refuses $name', ({ part: p, reason }) => {
    const h = harness();
    const out = h.apply(addPart(p));
    expect(out.ok ? '' : out.reason).toMatch(reason);
    expect(h.design.parts).toHaveLength(4);
  });
});

const wired: Design = bench({
  nets: [
    net('A', ['D.Y1', 'H.A', 'T.A'], {
      route: [
        ['D.Y1', 'H.A'],
        ['H.A', 'T.A'],
      ],
    }),
    net('B', ['H.Y', 'T.B']),
  ],
});

interface EditCase {
  name: string;
  command: Command;
  parts: string[];
  nets: { id: string; pins: string[] }[];
  route?: [string, string][] | undefined;
}

const h0 = wired.parts.find((p) => p.id === 'H')!;
const edits: EditCase[] = [
  {
    name: 'renamePart: every PART.PIN reference follows, route too',
    command: renamePart('H', 'U7'),
    parts: ['D', 'U7', 'T', 'S'],
    nets: [
      { id: 'A', pins: ['D.Y1', 'U7.A', 'T.A'] },
      { id: 'B', pins: ['U7.Y', 'T.B'] },
    ],
    route: [
      ['D.Y1', 'U7.A'],
      ['U7.A', 'T.A'],
    ],
  },
  {
    name: 'editPart: a renamed pin keeps its net',
    command: editPart('H', { ...h0, pins: h0.pins.map((p) => (p.id === 'Y' ? { ...p, id: 'OUT' } : p)) }, { Y: 'OUT' }),
    parts: ['D', 'H', 'T', 'S'],
    nets: [
      { id: 'A', pins: ['D.Y1', 'H.A', 'T.A'] },
      { id: 'B', pins: ['H.OUT', 'T.B'] },
    ],
    route: [
      ['D.Y1', 'H.A'],
      ['H.A', 'T.A'],
    ],
  },
  {
    name: 'editPart: a removed pin leaves its nets; a net left with one pin goes; the wires that remain stay',
    command: editPart('H', { ...h0, pins: h0.pins.filter((p) => p.id !== 'A' && p.id !== 'Y') }),
    parts: ['D', 'H', 'T', 'S'],
    nets: [{ id: 'A', pins: ['D.Y1', 'T.A'] }],
    route: undefined,
  },
  {
    name: 'editPart: new designator, label and a swapped pair of pins in one step',
    command: editPart(
      'H',
      {
        ...h0,
        id: 'G1',
        label: 'Valve gate',
        pins: h0.pins.map((p) => (p.id === 'A' ? { ...p, id: 'B' } : p.id === 'B' ? { ...p, id: 'A' } : p)),
      },
      { A: 'B', B: 'A' },
    ),
    parts: ['D', 'G1', 'T', 'S'],
    nets: [
      { id: 'A', pins: ['D.Y1', 'G1.B', 'T.A'] },
      { id: 'B', pins: ['G1.Y', 'T.B'] },
    ],
    route: [
      ['D.Y1', 'G1.B'],
      ['G1.B', 'T.A'],
    ],
  },
];

describe('editing a part', () => {
  it.each(edits)('$name; one undo takes it back', ({ command, parts, nets, route }) => {
    const h = harness(wired);
    expect(h.apply(command)).toEqual({ ok: true, changed: true });
    expect(h.design.parts.map((p) => p.id)).toEqual(parts);
    expect(h.nets()).toEqual(nets);
    expect(h.design.nets[0]!.route).toEqual(route);
    const read = validateDesign(h.design);
    expect(read.ok ? [] : read.errors).toEqual([]);
    expect(h.store.getState().past).toHaveLength(1);
    h.undo();
    expect(h.design).toEqual(wired);
  });

  it('an edit that changes nothing leaves no step', () => {
    const h = harness(wired);
    expect(h.apply(editPart('H', structuredClone(h0)))).toEqual({ ok: true, changed: false });
  });

  const refusals: { name: string; command: Command; reason: RegExp }[] = [
    { name: 'renamePart to a designator in use', command: renamePart('H', 'T'), reason: /already a part T/ },
    { name: 'renamePart to a designator with ":"', command: renamePart('H', 'U:1'), reason: /cannot be a designator/ },
    { name: 'editPart to a designator in use', command: editPart('H', { ...h0, id: 'D' }), reason: /already a part D/ },
    { name: 'editPart of an unknown part', command: editPart('Q', h0), reason: /no part Q/ },
  ];
  it.each(refusals)('refuses $name', ({ command, reason }) => {
    const h = harness(wired);
    const out = h.apply(command);
    expect(out.ok ? '' : out.reason).toMatch(reason);
    expect(h.design).toBe(wired);
  });
});
