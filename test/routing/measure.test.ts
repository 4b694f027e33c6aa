/** The measures the browser test judges the drawing by (rules/routing/measure.ts). */
import { describe, expect, it } from 'vitest';
import { bodyCrossings, pathPoints, sharedTracks } from '../../rules/routing/index.ts';

const w = (net: string, ...xy: number[]) => {
  const points = [];
  for (let k = 0; k < xy.length; k += 2) points.push({ x: xy[k]!, y: xy[k + 1]! });
  return { net, points };
};

describe('shared tracks', () => {
  it.each([
    ['two nets on one line for 60 units', [w('A', 0, 0, 100, 0), w('B', 40, 0, 160, 0)], 60],
    ['two nets 2 units apart (drawn as one line at width 3)', [w('A', 0, 0, 100, 0), w('B', 0, 2, 100, 2)], 100],
    ['vertical runs', [w('A', 5, 0, 5, 50), w('B', 5, 20, 5, 90)], 30],
  ])('%s: found, with its length', (_name, wires, length) => {
    expect(sharedTracks(wires, 3)[0]?.length).toBe(length);
  });

  it.each([
    ["one net's two wires on one line", [w('A', 0, 0, 100, 0), w('A', 40, 0, 160, 0)]],
    ['two nets a track apart', [w('A', 0, 0, 100, 0), w('B', 0, 8, 100, 8)]],
    ["two nets touching end to end within a wire's width", [w('A', 0, 0, 100, 0), w('B', 98, 0, 200, 0)]],
    ['a crossing', [w('A', 0, 0, 100, 0), w('B', 50, -50, 50, 50)]],
  ])('%s: none', (_name, wires) => {
    expect(sharedTracks(wires, 3)).toEqual([]);
  });
});

describe('runs through a chip', () => {
  const chip = { id: 'U1', x: 100, y: 100, width: 200, height: 80 };
  // Lengths inside the body less the 1-unit edge allowance on each side (a pin sits on the edge).
  it.each([
    ['straight through', w('A', 0, 140, 400, 140), 200 - 2],
    ['into it and out of its top', w('A', 0, 140, 150, 140, 150, 0), 50 - 1 + (40 - 1)],
  ])('%s', (_name, wire, length) => {
    expect(bodyCrossings([wire], [chip]).reduce((s, c) => s + c.length, 0)).toBe(length);
  });
  it.each([
    ['ending on a pin at its edge', w('A', 0, 140, 100, 140)],
    ['running along its edge', w('A', 100, 0, 100, 300)],
    ['passing by', w('A', 0, 90, 400, 90)],
  ])('%s: not through it', (_name, wire) => {
    expect(bodyCrossings([wire], [chip])).toEqual([]);
  });
});

describe('path points', () => {
  it.each([
    [
      'M and L',
      'M0,0L10,0L10,20',
      [
        [0, 0],
        [10, 0],
        [10, 20],
      ],
    ],
    [
      'a hop arc ends on its line',
      'M0,0L36,0A4,4 0 0 1 44,0L100,0',
      [
        [0, 0],
        [36, 0],
        [44, 0],
        [100, 0],
      ],
    ],
    [
      "React Flow's own step path (H and V)",
      'M 5 5 H 20 V 40',
      [
        [5, 5],
        [20, 5],
        [20, 40],
      ],
    ],
    [
      'a rounded corner (Q) ends where its run goes on',
      'M0 0L17 0Q20 0 20 3L20 40',
      [
        [0, 0],
        [17, 0],
        [20, 3],
        [20, 40],
      ],
    ],
  ])('%s', (_name, d, xy) => {
    expect(pathPoints(d).map((p) => [p.x, p.y])).toEqual(xy);
  });
});
