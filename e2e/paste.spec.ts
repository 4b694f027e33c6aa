/**
 * Duplicate and paste land on the nearest free spot: no copy covers a chip or a part between
 * chips (measured from the drawn bodies on the page, not from the design).
 */
import { expect, test, type Page } from '@playwright/test';
import { fitAll, watch } from './gestures.ts';

interface Body {
  id: string;
  x: number;
  y: number;
  w: number;
  h: number;
}

/** Every drawn body (a node's first child: the chip or the part between chips), in page pixels. */
async function bodies(page: Page): Promise<Body[]> {
  return page.locator('.react-flow__node').evaluateAll((nodes) =>
    nodes.map((n) => {
      const r = (n.firstElementChild as HTMLElement).getBoundingClientRect();
      return { id: n.getAttribute('data-id') ?? '', x: r.x, y: r.y, w: r.width, h: r.height };
    }),
  );
}

/** The pairs of bodies that overlap, with the area they share (px² on the page). */
function overlaps(list: readonly Body[]): string[] {
  const out: string[] = [];
  for (let i = 0; i < list.length; i++) {
    for (let j = i + 1; j < list.length; j++) {
      const a = list[i]!;
      const b = list[j]!;
      const w = Math.min(a.x + a.w, b.x + b.w) - Math.max(a.x, b.x);
      const h = Math.min(a.y + a.h, b.y + b.h) - Math.max(a.y, b.y);
      if (w > 0 && h > 0) out.push(`${a.id}×${b.id}: ${Math.round(w * h)} px²`);
    }
  }
  return out;
}

test('a duplicate and two pastes of example chips cover no other body', async ({ page }) => {
  const problems = watch(page);
  await page.goto('/');
  await expect(page.locator('.rc-wire').first()).toBeVisible();
  // The example opens zoomed to its errors, and the canvas draws only what is in view.
  await fitAll(page);
  const nodes = page.locator('.react-flow__node');
  const before = await nodes.count();
  expect(overlaps(await bodies(page))).toEqual([]);

  await page.locator('[data-part="U3"] .rc-chip-head').click();
  await page.keyboard.press('Control+d');
  await fitAll(page);
  await expect(nodes).toHaveCount(before + 1);
  expect(overlaps(await bodies(page))).toEqual([]);

  await page.locator('[data-part="U3"] .rc-chip-head').click();
  await page.locator('[data-part="U4"] .rc-chip-head').click({ modifiers: ['Shift'] });
  await page.keyboard.press('Control+c');
  await page.keyboard.press('Control+v');
  await fitAll(page);
  await expect(nodes).toHaveCount(before + 3);
  await page.locator('[data-part="U3"] .rc-chip-head').click();
  await page.locator('[data-part="U4"] .rc-chip-head').click({ modifiers: ['Shift'] });
  await page.keyboard.press('Control+v');
  await fitAll(page);
  await expect(nodes).toHaveCount(before + 5);
  expect(overlaps(await bodies(page))).toEqual([]);
  expect(problems).toEqual([]);
});
