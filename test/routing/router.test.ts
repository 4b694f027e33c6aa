/**
 * The router the canvas and the PDF diagram share (rules/routing): on the shipped example and
 * on generated boards, no two nets share a track for more than a wire's width and no wire runs
 * through a chip; routing again after a move touches only the moved chip's neighbourhood and
 * gives what routing from nothing gives; runs of different nets are nudged apart.
 */
import { readFileSync } from 'node:fs';
import { produce } from 'immer';
import { describe, expect, it } from 'vitest';
import type { Design } from '../../rules/model/schema.ts';
import {
  bodyCrossings,
  nudge,
  routeOnce,
  sharedTracks,
  SPACING,
  WireRouter,
  type WireSpec,
} from '../../rules/routing/index.ts';
import { chipBox, discreteBox } from '../../app/canvas/routes.ts';
import { netWires, wireId } from '../../app/store/commands/index.ts';
import { generateDesign } from '../support/generator.ts';

/** The heaviest wire the canvas draws is 3 units wide (styles.css, a selected wire). */
const WIRE_WIDTH = 3;

const example = (): Design =>
  JSON.parse(readFileSync(new URL('../../rules/examples/greenhouse.json', import.meta.url), 'utf8')) as Design;
const wiresOf = (d: Design): WireSpec[] =>
  d.nets.flatMap((n) => netWires(n).map(([a, b]) => ({ id: wireId(n.id, a, b), net: n.id, a, b })));

describe('routes that cannot be misread', () => {
  it.each([
    ['the greenhouse example', example()],
    [
      'a generated 200-part board (seed 4, chips 400 × 320 apart, wired in rows of 6)',
      generateDesign(4, { parts: 200, grid: { columns: 20, dx: 400, dy: 320 }, cluster: 6 }),
    ],
  ])('%s: no shared track, no wire through a chip, every wire from pin to pin at right angles', (_name, design) => {
    // The parts between chips are boxes too, as the canvas routes them (app/canvas/routes.ts).
    const boxes = [...design.parts.map(chipBox), ...(design.discretes ?? []).map(discreteBox)];
    const wires = wiresOf(design);
    const routes = [...routeOnce(boxes, wires).values()];
    expect(routes).toHaveLength(wires.length);
    expect(sharedTracks(routes, WIRE_WIDTH)).toEqual([]);
    expect(bodyCrossings(routes, boxes)).toEqual([]);
    const anchors = new Map(boxes.flatMap((b) => b.pins.map((p) => [p.key, p] as const)));
    for (const r of routes) {
      const spec = wires.find((w) => w.id === r.id)!;
      expect(r.points[0]).toMatchObject({ x: anchors.get(spec.a)!.x, y: anchors.get(spec.a)!.y });
      expect(r.points[r.points.length - 1]).toMatchObject({ x: anchors.get(spec.b)!.x, y: anchors.get(spec.b)!.y });
      for (let k = 1; k < r.points.length; k++) {
        const [a, b] = [r.points[k - 1]!, r.points[k]!];
        expect(a.x === b.x || a.y === b.y, `${r.id} segment ${k}`).toBe(true);
      }
    }
  });
});

describe('a known limit: where the nudger cannot place a cluster of runs clear of the chips, it leaves them', () => {
  // Measured on boards the generator draws at random: the old router (one channel per wire, a
  // track only for runs on the very same channel line) left 66 to 100 shared tracks on such a
  // board; the nudger leaves a few short ones beside pins, never a run through a chip.
  it.each([1, 2, 3, 5, 6, 18])(
    'seed %d: under 2 %% of the wires share a track with another net, none through a chip',
    (seed) => {
      const design = generateDesign(seed, { parts: 200, grid: { columns: 20, dx: 400, dy: 320 }, cluster: 6 });
      const boxes = design.parts.map(chipBox);
      const wires = wiresOf(design);
      const routes = [...routeOnce(boxes, wires).values()];
      expect(sharedTracks(routes, WIRE_WIDTH).length).toBeLessThan(wires.length * 0.02);
      expect(bodyCrossings(routes, boxes)).toEqual([]);
    },
  );
});

describe('routing again after an edit', () => {
  const design = generateDesign(4, { parts: 200, grid: { columns: 20, dx: 400, dy: 320 }, cluster: 6 });
  const wires = wiresOf(design);
  it.each([
    [
      'a chip moved a little',
      (d: Design) => {
        d.parts[45]!.position = { x: d.parts[45]!.position!.x + 30, y: d.parts[45]!.position!.y - 20 };
      },
    ],
    [
      'a chip moved across the board',
      (d: Design) => {
        d.parts[3]!.position = { x: 2000, y: 2000 };
      },
    ],
    [
      'a chip taken away',
      (d: Design) => {
        d.parts.splice(7, 1);
      },
    ],
  ])('%s: only its neighbourhood is routed again, and the result is routing from nothing', (_name, edit) => {
    const router = new WireRouter();
    router.update(design.parts.map(chipBox), wires);
    const after = produce(design, edit);
    const boxes = after.parts.map(chipBox);
    const again = router.update(boxes, wires);
    expect(again.rerouted).toBeGreaterThan(0);
    expect(again.rerouted).toBeLessThan(wires.length / 4);
    const fresh = routeOnce(boxes, wires);
    expect([...again.routes.entries()].map(([id, r]) => [id, r.points])).toEqual(
      [...fresh.entries()].map(([id, r]) => [id, r.points]),
    );
  });

  it('an edit that moves nothing routes nothing again and changes no route', () => {
    const router = new WireRouter();
    const boxes = design.parts.map(chipBox);
    router.update(boxes, wires);
    const again = router.update(boxes, wires);
    expect(again.rerouted).toBe(0);
    expect(again.changed.size).toBe(0);
  });
});

describe('nudging runs apart', () => {
  const line = (net: string, y: number, x0: number, x1: number) => ({
    net,
    points: [
      { x: x0 - 20, y: y + 40 },
      { x: x0, y: y + 40 },
      { x: x0, y },
      { x: x1, y },
      { x: x1, y: y + 40 },
      { x: x1 + 20, y: y + 40 },
    ],
  });
  it.each([
    ['two nets on one line', [line('A', 0, 0, 200), line('B', 0, 50, 300)], SPACING],
    ['three nets on one line', [line('A', 0, 0, 200), line('B', 0, 50, 300), line('C', 0, 20, 100)], SPACING],
    ['two nets 2 units apart', [line('A', 0, 0, 200), line('B', 2, 50, 300)], SPACING],
  ])('%s: a track each, %d apart', (_name, wires, gap) => {
    const out = nudge(wires, []);
    expect(
      sharedTracks(
        out.map((points, k) => ({ net: wires[k]!.net, points })),
        WIRE_WIDTH,
      ),
    ).toEqual([]);
    const ys = out
      .map((pts) => pts.find((p, k) => k > 0 && pts[k - 1]!.y === p.y && Math.abs(pts[k - 1]!.x - p.x) > 50)!.y)
      .sort((a, b) => a - b);
    for (let k = 1; k < ys.length; k++) expect(ys[k]! - ys[k - 1]!).toBeGreaterThanOrEqual(gap);
  });

  it("one net's runs on one line stay as they are", () => {
    const wires = [line('A', 0, 0, 200), line('A', 0, 50, 300)];
    expect(nudge(wires, [])).toEqual(wires.map((w) => w.points));
  });

  it('a run is not nudged into a chip: it goes to the free side', () => {
    const wires = [line('A', 0, 0, 200), line('B', 0, 50, 300)];
    // A chip just below the line: both tracks must go above it.
    const chip = { x: 60, y: 6, width: 100, height: 100 };
    const out = nudge(wires, [chip]);
    expect(
      bodyCrossings(
        out.map((points, k) => ({ net: wires[k]!.net, points })),
        [{ id: 'U', ...chip }],
      ),
    ).toEqual([]);
    expect(
      sharedTracks(
        out.map((points, k) => ({ net: wires[k]!.net, points })),
        WIRE_WIDTH,
      ),
    ).toEqual([]);
  });
});
