/**
 * At 1440 × 900 the side panel's ladder and the rail-crossings table are shown whole: the
 * ladder fits its column (scaled) and opens wide in its own view, receivers and margins
 * included; the table fits its frame or scrolls inside it. Measured from the page: an element
 * is whole when its box lies inside the box of the frame that clips it.
 */
import { expect, test, type Locator, type Page } from '@playwright/test';
import { watch } from './gestures.ts';

interface Box {
  x: number;
  y: number;
  width: number;
  height: number;
}

async function box(l: Locator): Promise<Box> {
  const b = await l.boundingBox();
  if (b === null) throw new Error('not visible');
  return b;
}

/** How far `inner` reaches beyond `outer` on the left or right, px (0 when inside). */
const beyond = (inner: Box, outer: Box) =>
  Math.max(0, outer.x - inner.x, inner.x + inner.width - (outer.x + outer.width));

/** The DISP_RX net of the example: an over-voltage, its ladder wide with two drivers' pairs. */
async function openNet(page: Page, net: string): Promise<Locator> {
  await page.goto('/');
  await expect(page.locator('.rc-wire').first()).toBeVisible();
  await page.locator(`.rc-finding[data-net="${net}"]`).first().click();
  const ladder = page.getByTestId('net-ladder');
  await expect(ladder).toBeVisible();
  return ladder;
}

test('the ladder fits its column: the whole drawing inside the side panel, nothing scrolled away', async ({ page }) => {
  const problems = watch(page);
  const ladder = await openNet(page, 'VALVE_EN');
  await ladder.scrollIntoViewIfNeeded();
  await page.screenshot({ path: 'e2e/screenshots/ladder-column.png' });
  const svg = ladder.locator('svg.voltage-ladder');
  const frame = await box(ladder);
  expect(beyond(await box(svg), frame)).toBe(0);
  // Every receiver's column and every margin's label is drawn inside the frame.
  for (const text of await ladder.locator('svg text').all()) expect(beyond(await box(text), frame)).toBeLessThan(1);
  // Nothing hidden in a scroll: the frame holds the drawing at its width.
  const scroll = await ladder
    .locator('.rc-ladder-scroll')
    .evaluate((e) => ({ scroll: e.scrollWidth, client: e.clientWidth }));
  expect(scroll.scroll).toBeLessThanOrEqual(scroll.client);
  expect(problems).toEqual([]);
});

test('the ladder opens wide in its own view, at full size, with its margins and receivers', async ({ page }) => {
  const ladder = await openNet(page, 'VALVE_EN');
  await ladder.getByTestId('ladder-wide').click();
  const dialog = page.getByTestId('ladder-dialog');
  await expect(dialog).toBeVisible();
  await page.screenshot({ path: 'e2e/screenshots/ladder-wide.png' });
  const svg = dialog.locator('svg.voltage-ladder');
  const body = await box(dialog.locator('.rc-modal-body'));
  const drawn = await box(svg);
  expect(beyond(drawn, body)).toBe(0);
  // Drawn at least at its natural size: the width its layout asks for.
  const natural = Number(await svg.getAttribute('data-width'));
  expect(drawn.width).toBeGreaterThanOrEqual(natural - 1);
  // The high margin of the failing pair (74HC input at 5.25 V against a 3.3 V output): negative.
  const nmh = dialog.locator('svg text', { hasText: /NMH\s+-0\.\d+ V/ });
  await expect(nmh.first()).toBeVisible();
  expect(beyond(await box(nmh.first()), body)).toBe(0);
  for (const text of await dialog.locator('svg text').all()) expect(beyond(await box(text), body)).toBeLessThan(1);
  await page.keyboard.press('Escape');
  await expect(dialog).toHaveCount(0);
});

test('the rail-crossings table fits its frame or scrolls inside it: the Worst column whole', async ({ page }) => {
  await page.goto('/');
  await expect(page.locator('.rc-wire').first()).toBeVisible();
  await page.getByTestId('tab-crossings').click();
  const table = page.getByTestId('crossings');
  await expect(table).toBeVisible();
  await page.screenshot({ path: 'e2e/screenshots/crossings-default.png' });
  const frame = page.getByTestId('crossings-frame');
  const f = await box(frame);
  const inner = await frame.evaluate((e) => ({ scroll: e.scrollWidth, client: e.clientWidth }));
  const worst = table.locator('td.rc-worst').first();
  if (inner.scroll <= inner.client) {
    // It fits: every Worst cell inside the frame.
    for (const cell of await table.locator('td.rc-worst').all()) expect(beyond(await box(cell), f)).toBe(0);
  } else {
    // It scrolls inside its frame: scrolled to the end, the Worst column comes into it whole.
    await frame.evaluate((e) => e.scrollTo({ left: e.scrollWidth }));
    expect(beyond(await box(worst), f)).toBe(0);
  }
  // The frame itself lies inside the side panel.
  const panel = await box(page.locator('.rc-side').first());
  expect(beyond(f, panel)).toBe(0);
});
