/**
 * The nearest free spot: a paste, a duplicate, a new part or a translator lands on the shortest
 * grid move that keeps every new body 24 px clear of every chip and part between chips.
 */
import { describe, expect, it } from 'vitest';
import { bodiesOf, nearestFreeOffset, type Rect } from '../../app/canvas/freeSpot.ts';
import { copyParts, planPaste } from '../../app/store/clipboard.ts';
import { exampleDesign } from '../../app/example.ts';

const sq = (x: number, y: number, side = 100): Rect => ({ x, y, width: side, height: side });

interface Case {
  name: string;
  placed: Rect[];
  group: Rect[];
  offset: { dx: number; dy: number };
}

// Gap 24, grid 20: a 100 px square on another must move ≥ 124 px, that is 140 on the grid.
const cases: Case[] = [
  { name: 'nothing placed: stays', placed: [], group: [sq(0, 0)], offset: { dx: 0, dy: 0 } },
  { name: 'already clear: stays', placed: [sq(0, 0)], group: [sq(500, 0)], offset: { dx: 0, dy: 0 } },
  {
    name: 'right on a body: 140 px, the right first among equal moves',
    placed: [sq(0, 0)],
    group: [sq(0, 0)],
    offset: { dx: 140, dy: 0 },
  },
  {
    name: 'right on a body with a neighbour on its right: down, next clockwise',
    placed: [sq(0, 0), sq(140, 0)],
    group: [sq(0, 0)],
    offset: { dx: 0, dy: 140 },
  },
  {
    name: 'over a corner by 10 px: 40 px to the right (34 needed), nearer than any other way',
    placed: [sq(0, 0)],
    group: [sq(90, 90)],
    offset: { dx: 40, dy: 0 },
  },
  {
    name: 'apart but closer than the gap (10 px): 20 px further',
    placed: [sq(0, 0)],
    group: [sq(110, 0)],
    offset: { dx: 20, dy: 0 },
  },
  {
    name: 'a group moves as one: the move that clears both copies',
    placed: [sq(0, 0), sq(420, 0)],
    group: [sq(0, 0), sq(300, 0)],
    offset: { dx: 0, dy: 140 },
  },
  {
    name: 'a small body boxed in left, right and below: up',
    placed: [sq(0, 0, 60), sq(-200, 0), sq(160, 0), sq(-200, 140, 460)],
    group: [sq(0, 0, 60)],
    offset: { dx: 0, dy: -100 },
  },
  {
    name: 'no room within reach (2,400 px): stays where asked',
    placed: [{ x: -5000, y: -5000, width: 10_000, height: 10_000 }],
    group: [sq(0, 0)],
    offset: { dx: 0, dy: 0 },
  },
];

const crowds = (a: Rect, b: Rect, gap: number) =>
  !(
    a.x + a.width + gap <= b.x ||
    b.x + b.width + gap <= a.x ||
    a.y + a.height + gap <= b.y ||
    b.y + b.height + gap <= a.y
  );

describe('the nearest free spot', () => {
  it.each(cases)('$name', ({ placed, group, offset }) => {
    expect(nearestFreeOffset(placed, group)).toEqual(offset);
  });

  it('no shorter grid move is clear (checked by brute force over every move up to 400 px)', () => {
    const placed = [sq(0, 0), sq(140, 0), sq(0, 150, 80), sq(-130, -20, 90)];
    const group = [sq(10, 10), sq(150, 30, 40)];
    const { dx, dy } = nearestFreeOffset(placed, group);
    const clear = (x: number, y: number) =>
      group.every((r) => placed.every((b) => !crowds({ ...r, x: r.x + x, y: r.y + y }, b, 24)));
    expect(clear(dx, dy)).toBe(true);
    for (let i = -20; i <= 20; i++)
      for (let j = -20; j <= 20; j++)
        if (clear(i * 20, j * 20)) expect(Math.hypot(i * 20, j * 20)).toBeGreaterThanOrEqual(Math.hypot(dx, dy));
  });

  it('a duplicate of every part of the example lands clear of every chip and part between chips', () => {
    const greenhouse = exampleDesign();
    const clip = copyParts(
      greenhouse,
      greenhouse.parts.map((p) => p.id),
    )!;
    const planned = planPaste(greenhouse, clip, { x: 40, y: 40 });
    const placed = bodiesOf(greenhouse);
    const mine = bodiesOf({ ...greenhouse, parts: planned.parts, discretes: [] });
    expect(placed.length).toBeGreaterThan(greenhouse.parts.length);
    for (const r of mine) for (const b of placed) expect(crowds(r, b, 24)).toBe(false);
  });
});
