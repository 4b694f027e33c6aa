/**
 * The search box at 1440 × 900: opened with its key from the canvas, a part, a pin, a net and a
 * finding found by part of a name, chosen (Enter, a click), and each then selected, with its
 * details open, and in view on the canvas although the view had been moved away from it.
 */
import { expect, test, type Locator, type Page } from '@playwright/test';
import { watch } from './gestures.ts';

/** Whether the element is drawn and its box lies inside the canvas's box (the flow's visible part). */
async function inView(page: Page, el: Locator): Promise<boolean> {
  // The canvas renders only what is in view: an element not there is out of it.
  if ((await el.count()) === 0) return false;
  const canvas = (await page.locator('.react-flow').boundingBox())!;
  const box = await el.boundingBox();
  if (box === null) return false;
  return (
    box.x >= canvas.x &&
    box.y >= canvas.y &&
    box.x + box.width <= canvas.x + canvas.width &&
    box.y + box.height <= canvas.y + canvas.height
  );
}

/** Drag the empty canvas until `el` is out of view (a few strokes at most). */
async function panAway(page: Page, el: Locator): Promise<void> {
  const canvas = (await page.locator('.react-flow').boundingBox())!;
  for (let k = 0; k < 4 && (await inView(page, el)); k++) {
    // A point on the empty pane near the top-left corner, dragged to the bottom-right.
    await page.mouse.move(canvas.x + 14, canvas.y + 14);
    await page.mouse.down();
    await page.mouse.move(canvas.x + canvas.width - 20, canvas.y + canvas.height - 20, { steps: 8 });
    await page.mouse.up();
  }
  expect(await inView(page, el)).toBe(false);
}

async function openSearch(page: Page, key: string): Promise<Locator> {
  await page.locator('.react-flow__pane').click({ position: { x: 12, y: 12 } });
  await page.keyboard.press(key);
  const dialog = page.getByTestId('search');
  await expect(dialog).toBeVisible();
  await expect(page.getByTestId('search-input')).toBeFocused();
  return dialog;
}

test('"/" opens the search box; a part found by part of its name is chosen with Enter, selected and brought into view', async ({
  page,
}) => {
  const problems = watch(page);
  await page.goto('/');
  await expect(page.locator('.rc-wire').first()).toBeVisible();
  const node = page.locator('.react-flow__node[data-id="U20"]');
  await panAway(page, node);

  const dialog = await openSearch(page, '/');
  // The key that opened the box is not typed into it.
  await expect(page.getByTestId('search-input')).toHaveValue('');
  await page.keyboard.type('WETness');
  const parts = dialog.getByRole('group', { name: 'Parts' });
  await expect(parts.getByRole('option')).toHaveText([/U20\s*Leaf wetness sensor/]);
  await expect(parts.getByRole('option').first()).toHaveAttribute('aria-selected', 'true');
  await page.screenshot({ path: 'e2e/screenshots/search-open.png' });
  await page.keyboard.press('Enter');

  await expect(dialog).toHaveCount(0);
  await expect(node).toHaveClass(/selected/);
  await expect(page.getByTestId('part-details')).toContainText('Leaf wetness sensor');
  await expect.poll(() => inView(page, node)).toBe(true);
  await page.screenshot({ path: 'e2e/screenshots/search-chosen.png' });
  expect(problems).toEqual([]);
});

test('Ctrl+K finds a net by its label, lists the hits grouped by kind, and a click shows the net', async ({ page }) => {
  await page.goto('/');
  await expect(page.locator('.rc-wire').first()).toBeVisible();
  const wire = page.locator('.rc-wire[data-net="TANK_LOW"]').first();
  await panAway(page, page.locator('.react-flow__node[data-id="J3"]'));

  const dialog = await openSearch(page, 'Control+k');
  await page.keyboard.type('tank_low');
  // A pin and a net match; the groups come in the order parts, pins, nets, findings.
  await expect(dialog.getByRole('group')).toHaveText([/^Pins/, /^Nets/, /^Findings/]);
  await page.screenshot({ path: 'e2e/screenshots/search-groups.png' });
  await dialog
    .getByRole('group', { name: 'Nets' })
    .getByRole('option', { name: /TANK_LOW_N/ })
    .click();

  await expect(dialog).toHaveCount(0);
  await expect(page.getByTestId('net-details')).toContainText('TANK_LOW_N');
  await expect.poll(() => inView(page, wire)).toBe(true);
});

test('a finding found by its rule id, chosen with the arrows, shows its power state and its net', async ({ page }) => {
  await page.goto('/');
  await expect(page.locator('.rc-wire').first()).toBeVisible();
  const dialog = await openSearch(page, '/');
  await page.keyboard.type('overvoltage');
  const findings = dialog.getByRole('group', { name: 'Findings' }).getByRole('option');
  await expect(findings.first()).toBeVisible();
  const second = findings.nth(1);
  const detail = (await second.locator('.rc-search-detail').textContent()) ?? '';
  await page.keyboard.press('ArrowDown');
  await expect(second).toHaveAttribute('aria-selected', 'true');
  await page.keyboard.press('Enter');
  await expect(dialog).toHaveCount(0);
  await expect(page.getByTestId('net-details')).toBeVisible();
  // The canvas is coloured for the finding's power state (the first words of the row's detail).
  const state = detail.split(' · ')[0]!;
  await expect(page.getByTestId('power-state').locator('option:checked')).toHaveText(state);
});

test('a query that matches nothing says so', async ({ page }) => {
  await page.goto('/');
  await expect(page.locator('.rc-wire').first()).toBeVisible();
  const dialog = await openSearch(page, '/');
  await page.keyboard.type('nothing-by-this-name');
  await expect(dialog.getByRole('status')).toHaveText('No part, pin, net or finding matches “nothing-by-this-name”.');
  await page.keyboard.press('Escape');
  await expect(dialog).toHaveCount(0);
});

test('a pin found by PART.PIN is centred in view, its chip selected', async ({ page }) => {
  await page.goto('/');
  await expect(page.locator('.rc-wire').first()).toBeVisible();
  const pin = page.locator('.react-flow__node[data-id="U4"] [data-pin="BUSY"]');
  await panAway(page, pin);
  const dialog = await openSearch(page, '/');
  await page.keyboard.type('u4.bus');
  await expect(dialog.getByRole('option')).toHaveText([/U4\.BUSY/]);
  await page.keyboard.press('Enter');
  await expect(dialog).toHaveCount(0);
  await expect(page.locator('.react-flow__node[data-id="U4"]')).toHaveClass(/selected/);
  await expect.poll(() => inView(page, pin)).toBe(true);
  // Centred: the pin is within a fifth of the canvas's width of its middle.
  const canvas = (await page.locator('.react-flow').boundingBox())!;
  const box = (await pin.boundingBox())!;
  expect(Math.abs(box.x + box.width / 2 - (canvas.x + canvas.width / 2))).toBeLessThan(canvas.width / 5);
});
