/**
 * The diagram's geometry (rules/report/pdf/diagramLayout.ts): boxes, pin anchors, which pin
 * pairs become wires, and right-angled routes that stay out of part boxes. Plain geometry, no
 * PDF: the expected values follow from the chip measures (208 wide, a 44 header, 20 per pin
 * row, 30 per top or bottom strip, 4 of padding above and below the rows).
 */
import { describe, expect, it } from 'vitest';
import type { Net, Part, Pin } from '../../rules/model/schema.ts';
import { sideOf } from '../../rules/model/pinDefaults.ts';
import { netWires } from '../../rules/model/wiring.ts';
import {
  BoxIndex,
  STUB,
  layoutDiagram,
  partBox,
  routePoints,
  routeWire,
  spreadChannels,
  type PartBox,
  type PinPlace,
  type Point,
} from '../../rules/report/pdf/diagramLayout.ts';
import { netStatus } from '../../rules/report/pdf/diagram.ts';
import type { Report, ReportFinding } from '../../rules/report/reportSchema.ts';
import { bidir, design, input, net, output, part } from '../support/build.ts';

const at = (x: number, y: number): Pick<Part, 'position'> => ({ position: { x, y } });
const place = (box: PartBox, pin: string): PinPlace => box.pins.find((p) => p.pin.id === pin)!;

describe('sideOf', () => {
  it.each<[string, Pin, string]>([
    ['an input', input('A'), 'left'],
    ['an output', output('Y'), 'right'],
    ['a bidir pin', bidir('IO'), 'right'],
    ['an input the design puts on top', input('A', { side: 'top' }), 'top'],
    ['an output the design puts on the left', output('Y', { side: 'left' }), 'left'],
  ])('%s goes %s', (_name, pin, side) => {
    expect(sideOf(pin)).toBe(side);
  });
});

describe('partBox', () => {
  it.each<[string, Part, { width: number; height: number; headerTop: number }]>([
    // 44 + 3 + 1 row × 20 + 3 + 1 (a part without pins keeps one row)
    ['no pins', part('A', '3v3', 'lvcmos33', [], at(0, 0)), { width: 208, height: 71, headerTop: 0 }],
    // rows = max(2 left, 1 right) = 2: 44 + 3 + 40 + 3 + 1 (the editor's padding of 6 split, its 1-unit border)
    [
      'two inputs and an output',
      part('A', '3v3', 'lvcmos33', [input('A'), input('B'), output('Y')], at(10, 20)),
      { width: 208, height: 91, headerTop: 20 },
    ],
    // a top strip (30) above the header, a bottom strip (30) below the rows
    [
      'pins on every side',
      part(
        'A',
        '3v3',
        'lvcmos33',
        [input('T', { side: 'top' }), input('L'), output('R'), output('B', { side: 'bottom' })],
        at(0, 100),
      ),
      { width: 208, height: 131, headerTop: 130 },
    ],
  ])('%s', (_name, p, expected) => {
    const box = partBox(p);
    expect({ width: box.width, height: box.height, headerTop: box.headerTop }).toEqual(expected);
  });

  it('anchors left pins on the left edge and right pins on the right, one row (20) apart, below the header', () => {
    const box = partBox(part('U1', '3v3', 'lvcmos33', [input('A'), input('B'), output('Y')], at(100, 50)));
    expect(place(box, 'A').at).toEqual({ x: 100, y: 50 + 44 + 3 + 10 });
    expect(place(box, 'B').at).toEqual({ x: 100, y: 50 + 44 + 3 + 30 });
    expect(place(box, 'Y').at).toEqual({ x: 308, y: 50 + 44 + 3 + 10 });
    expect(place(box, 'A').key).toBe('U1.A');
  });

  it('spreads top and bottom pins evenly across the width', () => {
    const box = partBox(
      part(
        'U1',
        '3v3',
        'lvcmos33',
        [input('P', { side: 'top' }), input('Q', { side: 'top' }), output('Z', { side: 'bottom' })],
        at(0, 0),
      ),
    );
    expect(place(box, 'P').at).toEqual({ x: 52, y: 0 });
    expect(place(box, 'Q').at).toEqual({ x: 156, y: 0 });
    expect(place(box, 'Z').at).toEqual({ x: 104, y: box.height });
  });

  it('puts a part without a position at the origin', () => {
    expect(partBox(part('A', '3v3', 'lvcmos33', [])).x).toBe(0);
  });
});

describe('netWires', () => {
  const pins = ['A.Y', 'B.X', 'C.X', 'D.X'];
  it.each<[string, Net, [string, string][]]>([
    [
      "no route: a chain in the net's order",
      net('N', pins),
      [
        ['A.Y', 'B.X'],
        ['B.X', 'C.X'],
        ['C.X', 'D.X'],
      ],
    ],
    [
      'a route that reaches every pin',
      net('N', pins, {
        route: [
          ['A.Y', 'B.X'],
          ['A.Y', 'C.X'],
          ['A.Y', 'D.X'],
        ],
      }),
      [
        ['A.Y', 'B.X'],
        ['A.Y', 'C.X'],
        ['A.Y', 'D.X'],
      ],
    ],
    [
      'a partial route, the rest chained on',
      net('N', pins, { route: [['A.Y', 'C.X']] }),
      [
        ['A.Y', 'C.X'],
        ['A.Y', 'B.X'],
        ['C.X', 'D.X'],
      ],
    ],
    [
      'route pairs off the net, to itself, or repeated are ignored',
      net('N', ['A.Y', 'B.X'], {
        route: [
          ['A.Y', 'Z.Q'],
          ['A.Y', 'A.Y'],
          ['B.X', 'A.Y'],
          ['A.Y', 'B.X'],
        ],
      }),
      [['B.X', 'A.Y']],
    ],
    ['one pin: no wire', net('N', ['A.Y']), []],
  ])('%s', (_name, n, expected) => {
    expect(netWires(n)).toEqual(expected);
  });
});

/** Whether an axis-aligned segment passes through the inside of a box (its edges excluded). */
function throughBox(a: Point, b: Point, box: PartBox): boolean {
  const [lx, hx, ly, hy] = [Math.min(a.x, b.x), Math.max(a.x, b.x), Math.min(a.y, b.y), Math.max(a.y, b.y)];
  return lx < box.x + box.width && hx > box.x && ly < box.y + box.height && hy > box.y;
}

function expectOrthogonal(points: readonly Point[]): void {
  for (let k = 1; k < points.length; k++) {
    const [a, b] = [points[k - 1]!, points[k]!];
    expect(a.x === b.x || a.y === b.y, `segment ${k} is level or upright`).toBe(true);
    expect(a.x === b.x && a.y === b.y, `segment ${k} has length`).toBe(false);
  }
}

describe('routes', () => {
  const driver = partBox(part('D', '3v3', 'lvcmos33', [output('Y')], at(0, 0)));
  const receiver = partBox(part('R', '3v3', 'lvcmos33', [input('A')], at(400, 200)));
  const wall = partBox(
    part(
      'W',
      '3v3',
      'lvcmos33',
      [input('A'), input('B'), input('C'), input('D'), input('E'), input('F'), input('G'), input('H')],
      at(250, 0),
    ),
  );

  it('facing pins with nothing between: out of each pin by the stub, turning half-way', () => {
    const points = routePoints(routeWire(place(driver, 'Y'), place(receiver, 'A')));
    const a = place(driver, 'Y').at;
    const b = place(receiver, 'A').at;
    const half = (a.x + STUB + (b.x - STUB)) / 2;
    expect(points).toEqual([
      a,
      { x: a.x + STUB, y: a.y },
      { x: half, y: a.y },
      { x: half, y: b.y },
      { x: b.x - STUB, y: b.y },
      b,
    ]);
  });

  it.each<[string, PartBox[]]>([
    ['no other box', [driver, receiver]],
    ['a box standing where the half-way channel would run', [driver, receiver, wall]],
  ])('with %s: right angles only, from pin to pin, through no box', (_name, boxes) => {
    const route = routeWire(place(driver, 'Y'), place(receiver, 'A'), new BoxIndex(boxes));
    const points = routePoints(route);
    expectOrthogonal(points);
    expect(points[0]).toEqual(place(driver, 'Y').at);
    expect(points.at(-1)).toEqual(place(receiver, 'A').at);
    for (const box of boxes) {
      for (let k = 1; k < points.length; k++)
        expect(throughBox(points[k - 1]!, points[k]!, box), `segment ${k} through ${box.part.id}`).toBe(false);
    }
  });

  it('the wall really is in the half-way channel (so the case above can fail)', () => {
    const points = routePoints(routeWire(place(driver, 'Y'), place(receiver, 'A')));
    expect(points.some((p, k) => k > 0 && throughBox(points[k - 1]!, p, wall))).toBe(true);
  });

  it('pins facing the same way go round the outer one, not back through their own boxes', () => {
    const left = partBox(part('L', '3v3', 'lvcmos33', [output('Y')], at(0, 0)));
    const right = partBox(part('M', '3v3', 'lvcmos33', [output('Z')], at(300, 200)));
    const boxes = [left, right];
    const points = routePoints(routeWire(place(left, 'Y'), place(right, 'Z'), new BoxIndex(boxes)));
    expectOrthogonal(points);
    for (const box of boxes)
      for (let k = 1; k < points.length; k++) expect(throughBox(points[k - 1]!, points[k]!, box)).toBe(false);
  });
});

describe('spreadChannels', () => {
  // Two parts in one column driving two in another: every wire's half-way channel is the same line.
  const a = partBox(part('A', '3v3', 'lvcmos33', [output('Y'), output('Z')], at(0, 0)));
  const b = partBox(part('B', '3v3', 'lvcmos33', [input('P'), input('Q')], at(400, 100)));
  const r1 = routeWire(place(a, 'Y'), place(b, 'P'));
  const r2 = routeWire(place(a, 'Z'), place(b, 'Q'));

  it('the two routes share a channel and overlap along it', () => {
    expect(r1.axis).toBe('x');
    expect(r1.at).toBe(r2.at);
  });

  it.each<[string, string, number]>([
    ['wires of different nets are set 6 apart, about the channel', 'N2', 6],
    ['wires of one net may share the line', 'N1', 0],
  ])('%s', (_name, secondNet, gap) => {
    const offsets = spreadChannels([
      { route: r1, net: 'N1' },
      { route: r2, net: secondNet },
    ]);
    expect(Math.abs(offsets[1]! - offsets[0]!)).toBe(gap);
    // Centred on the channel line either way.
    expect(offsets[0]! + offsets[1]!).toBe(0);
  });

  it('a lone wire stays on its channel', () => {
    expect(spreadChannels([{ route: r1, net: 'N1' }])).toEqual([0]);
  });
});

describe('layoutDiagram', () => {
  it('a design without parts has nothing to fit', () => {
    expect(layoutDiagram(design({ parts: [] })).bounds).toBeNull();
  });

  it('the bounds hold every box with room for stubs and net names', () => {
    const d = design({
      parts: [
        part('A', '3v3', 'lvcmos33', [output('Y')], at(-50, 10)),
        part('B', '3v3', 'lvcmos33', [input('X')], at(600, 400)),
      ],
      nets: [net('N', ['A.Y', 'B.X', 'C.Q'])],
    });
    const layout = layoutDiagram(d);
    const { minX, minY, maxX, maxY } = layout.bounds!;
    for (const box of layout.boxes) {
      expect(minX).toBeLessThan(box.x - STUB);
      expect(minY).toBeLessThan(box.y);
      expect(maxX).toBeGreaterThan(box.x + box.width + STUB);
      expect(maxY).toBeGreaterThan(box.y + box.height);
    }
    // A pin the net names but no part has (C.Q) gets no wire; the other pair does.
    expect(layout.wires).toHaveLength(1);
    expect(layout.netLabels.map((l) => l.pin.key)).toEqual(['A.Y']);
  });
});

describe('netStatus', () => {
  const f = (
    net: string | null,
    severity: ReportFinding['severity'],
    scenario = 'all-on',
    waived?: string,
  ): ReportFinding => ({
    id: `x:${net}:${scenario}:${severity}`,
    rule: 'level-high',
    severity,
    scenario,
    net,
    pins: [],
    parts: [],
    message: '',
    values: {},
    hint: '',
    ...(waived === undefined ? {} : { waived }),
  });
  const report = {
    findings: [
      f('A', 'warning'),
      f('A', 'error'),
      f('B', 'info'),
      f('C', 'error', 'all-on', 'reviewed'),
      f('C', 'warning'),
      f('D', 'error', 'standby'),
      f(null, 'error'),
    ],
  } as unknown as Report;

  it.each([
    ['A', 'error'],
    ['B', undefined], // info only: clean
    ['C', 'warning'], // the waived error no longer colours the net
    ['D', undefined], // its error is in another power state
  ])('net %s in all-on: %s', (netId, expected) => {
    expect(netStatus(report, 'all-on').get(netId)).toBe(expected);
  });

  it('the other power state has its own', () => {
    expect(netStatus(report, 'standby').get('D')).toBe('error');
  });
});
