/**
 * Junction dots and hops (rules/routing/marks.ts). A dot where three or more runs of one net
 * meet, none at a plain corner; a crossing of two nets drawn as a hop so that it cannot be read
 * as a join: common practice in schematic drawing (the junction dot is the convention of
 * IEC 60617 and IEEE Std 315, from memory).
 */
import { describe, expect, it } from 'vitest';
import {
  crossIndex,
  hopPolyline,
  hopsOf,
  HOP,
  junctionsOf,
  markRoutes,
  MAX_HOPS,
  pathPoints,
  svgPath,
  type Route,
} from '../../rules/routing/index.ts';

const route = (id: string, net: string, ...xy: number[]): Route => {
  const points = [];
  for (let k = 0; k < xy.length; k += 2) points.push({ x: xy[k]!, y: xy[k + 1]! });
  return { id, net, points };
};

describe('junctions', () => {
  it.each([
    [
      "a T: a second wire of the net leaves the first one's run",
      [route('a', 'N', 0, 0, 100, 0), route('b', 'N', 50, 0, 50, 40)],
      [{ x: 50, y: 0 }],
    ],
    [
      'a wire that follows another and parts from it',
      [route('a', 'N', 0, 0, 100, 0), route('b', 'N', 0, 0, 60, 0, 60, 30)],
      [{ x: 60, y: 0 }],
    ],
    [
      'a cross of four runs of one net',
      [route('a', 'N', 0, 0, 100, 0), route('b', 'N', 50, -20, 50, 0, 50, 20)],
      [{ x: 50, y: 0 }],
    ],
  ])('%s: one dot', (_name, routes, dots) => {
    expect(junctionsOf(routes).map((j) => j.at)).toEqual(dots);
  });

  it.each([
    ['a plain corner', [route('a', 'N', 0, 0, 50, 0, 50, 40)]],
    ['two wires of the net leaving one pin the same way', [route('a', 'N', 0, 0, 30, 0), route('b', 'N', 0, 0, 60, 0)]],
    ['runs of two nets meeting', [route('a', 'N', 0, 0, 100, 0), route('b', 'M', 50, 0, 50, 40)]],
  ])('%s: no dot', (_name, routes) => {
    expect(junctionsOf(routes)).toEqual([]);
  });
});

describe('hops', () => {
  const across = route('h', 'A', 0, 10, 100, 10);
  it.each([
    ['a vertical run of another net across it', route('v', 'B', 40, 0, 40, 30), [40]],
    ['a vertical run of the same net (a join, not a hop)', route('v', 'A', 40, 0, 40, 30), []],
    ['a run of another net that ends on its line (a T, not a crossing)', route('v', 'B', 40, 0, 40, 10), []],
    ["a crossing too near the run's end for an arc", route('v', 'B', HOP, 0, HOP, 30), []],
  ])('%s', (_name, other, xs) => {
    expect(hopsOf(across, crossIndex([across, other])).map((h) => h.x)).toEqual(xs);
  });

  it('draws each hop as one arc over the crossing, running either way', () => {
    const other = route('v', 'B', 40, 0, 40, 30);
    for (const wire of [across, route('r', 'A', 100, 10, 0, 10)]) {
      const { hops } = markRoutes([wire, other]);
      const d = svgPath(wire.points, hops.get(wire.id));
      expect(d.match(/A/g)).toHaveLength(1);
      // The arc starts HOP before the crossing and ends HOP after it, on the wire's own line.
      const pts = pathPoints(d);
      expect(pts.map((p) => p.y).every((y) => y === 10)).toBe(true);
      expect(pts.map((p) => p.x).filter((x) => Math.abs(x - 40) === HOP)).toHaveLength(2);
      // The PDF's polyline rises HOP above the line at the crossing.
      const poly = hopPolyline(wire.points, hops.get(wire.id));
      expect(Math.min(...poly.map((p) => p.y))).toBeCloseTo(10 - HOP, 6);
    }
  });
});

describe('a wire crossing many others', () => {
  it.each([
    [MAX_HOPS, MAX_HOPS],
    [MAX_HOPS + 1, 0],
  ])('crossing %d wires of other nets: %d hops drawn', (n, drawn) => {
    const long = route('h', 'A', 0, 10, 1000, 10);
    const others = Array.from({ length: n }, (_, k) => route(`v${k}`, `B${k}`, 40 + k * 20, 0, 40 + k * 20, 30));
    expect(markRoutes([long, ...others]).hops.get('h')?.length ?? 0).toBe(drawn);
  });
});
