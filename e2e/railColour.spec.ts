/**
 * A rail's colour reaches the chips' style only in the format's grammar (#rgb or #rrggbb,
 * rules/model/colour.ts; issue 14: `url(...)` went into a CSS property unchecked). The
 * example's 5 V rail colours its chips; a colour picked in the Rails fold recolours them; no
 * console error or CSP violation on the way.
 */
import { expect, test } from '@playwright/test';

const railOf = (page: import('@playwright/test').Page, part: string) =>
  page
    .locator(`.rc-chip[data-part="${part}"]`)
    .evaluate((el) => getComputedStyle(el).getPropertyValue('--rail').trim());

test('a rail colour picked in the editor colours the chips on that rail', async ({ page }) => {
  const problems: string[] = [];
  page.on('console', (m) => {
    if (m.type() === 'error') problems.push(`console: ${m.text()}`);
  });
  page.on('pageerror', (e) => problems.push(`page error: ${e.message}`));
  await page.addInitScript(() => {
    document.addEventListener('securitypolicyviolation', (e) =>
      console.error(`CSP violation: ${e.violatedDirective} ${e.blockedURI}`),
    );
  });
  await page.goto('/');
  // The example: U3 sits on the 5 V rail, coloured #c2410c in rules/examples/greenhouse.json.
  await expect(page.locator('.rc-chip[data-part="U3"]')).toBeVisible();
  expect(await railOf(page, 'U3')).toBe('#c2410c');

  await page.locator('.rc-fold summary', { hasText: 'Rails' }).click();
  const picker = page.locator('.rc-rail-row[data-rail="5v0"] input[type="color"]');
  await expect(picker).toHaveValue('#c2410c');
  await picker.fill('#1d4ed8');
  await expect.poll(() => railOf(page, 'U3')).toBe('#1d4ed8');
  await page.screenshot({ path: 'test-results/rail-colour.png' });
  expect(problems).toEqual([]);
});
