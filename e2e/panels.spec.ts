/**
 * The side panel at 1440 × 900: widened by dragging its edge, remembered after a reload, and
 * wide enough then for the voltage ladder and the rail-crossings table to show whole.
 */
import { expect, test } from '@playwright/test';
import { centre, uncoveredPoint } from './gestures.ts';

test('the side panel widens by its edge, keeps its width, and then shows the ladder and the crossings whole', async ({
  page,
}) => {
  await page.goto('/');
  await expect(page.locator('.rc-wire[data-net="VALVE_EN"]').first()).toBeVisible();
  const side = page.locator('.rc-side');
  const before = (await side.boundingBox())!.width;
  expect(before).toBeLessThan(400);

  // Drag the panel's edge to 620 px from the window's right.
  const edge = await centre(page.getByTestId('side-resizer'));
  await page.mouse.move(edge.x, edge.y);
  await page.mouse.down();
  await page.mouse.move(1440 - 620, edge.y, { steps: 6 });
  await page.mouse.up();
  await expect.poll(async () => Math.round((await side.boundingBox())!.width)).toBeGreaterThan(600);

  // Remembered in this browser.
  await page.reload();
  await expect(page.locator('.rc-wire[data-net="VALVE_EN"]').first()).toBeVisible();
  const wide = (await side.boundingBox())!;
  expect(wide.width).toBeGreaterThan(600);

  // The crossings table and a net's ladder fit inside the panel.
  await page.getByTestId('tab-crossings').click();
  const table = page.getByTestId('crossings');
  await expect(table).toBeVisible();
  const t = (await table.boundingBox())!;
  expect(t.x + t.width).toBeLessThanOrEqual(wide.x + wide.width + 1);
  await page.screenshot({ path: 'e2e/screenshots/panel-crossings-wide.png' });
  await page.locator('[data-testid="crossings"] tr[data-net="VALVE_EN"][data-scenario="all-on"]').click();
  const ladder = page.getByTestId('net-ladder');
  await expect(ladder).toBeVisible();
  await ladder.scrollIntoViewIfNeeded();
  const l = (await ladder.boundingBox())!;
  expect(l.x).toBeGreaterThanOrEqual(wide.x - 1);
  expect(l.x + l.width).toBeLessThanOrEqual(wide.x + wide.width + 1);
  await page.screenshot({ path: 'e2e/screenshots/panel-ladder-wide.png' });

  // Keys move the edge too; a double-click returns to the default.
  await page.getByTestId('side-resizer').dblclick();
  await expect.poll(async () => Math.round((await side.boundingBox())!.width)).toBe(372);
});

test('hovering a red wire says why it is red: its worst finding in words', async ({ page }) => {
  await page.goto('/');
  const edge = page.locator('.react-flow__edge:has(.rc-wire[data-net="DISP_RX"])').first();
  await expect(edge.locator('.rc-wire')).toHaveAttribute('data-severity', 'error');
  await expect(page.locator('.rc-wire[data-routed="no"]')).toHaveCount(0);
  // A point along the wire that nothing else covers.
  const at = await uncoveredPoint(edge);
  await page.mouse.move(at.x, at.y);
  // DISP_RX: the 5 V display's output into the 3.3 V controller, beyond what the input may see.
  const worst = page.locator('.rc-wire-tip [data-worst]');
  await expect(worst).toHaveAttribute('data-worst', 'overvoltage');
  await expect(worst).toContainText('No pin sees more than it may');
  await expect(worst).toContainText('DISP_RX');
});

test('at the default width, the crossings table scrolls inside its frame rather than running out of the panel', async ({
  page,
}) => {
  await page.goto('/');
  await page.getByTestId('tab-crossings').click();
  const table = page.getByTestId('crossings');
  await expect(table).toBeVisible();
  const m = await table.evaluate((t) => {
    const frame = t.closest('.rc-findings-list') as HTMLElement;
    const side = t.closest('.rc-side') as HTMLElement;
    const f = frame.getBoundingClientRect();
    const s = side.getBoundingClientRect();
    return {
      frameRight: f.right,
      sideRight: s.right,
      frameLeft: f.left,
      sideLeft: s.left,
      scroll: frame.scrollWidth,
      client: frame.clientWidth,
      table: t.getBoundingClientRect().width,
      overflowX: getComputedStyle(frame).overflowX,
    };
  });
  // The frame stays inside the panel; a table wider than the frame scrolls within it.
  expect(m.frameLeft).toBeGreaterThanOrEqual(m.sideLeft - 1);
  expect(m.frameRight).toBeLessThanOrEqual(m.sideRight + 1);
  if (m.table > m.client) {
    expect(['auto', 'scroll']).toContain(m.overflowX);
    expect(m.scroll).toBeGreaterThan(m.client);
  }
  await page.screenshot({ path: 'e2e/screenshots/panel-crossings-default.png' });
});
