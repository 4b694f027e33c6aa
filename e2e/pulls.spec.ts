/**
 * Pull resistors in sight: the example's SDA net shows its 4.7 kΩ pull-up (IEC 60062 code 4K7)
 * beside its name on the canvas; the controller's RAIN pin shows its internal 47 kΩ, and its
 * tooltip names its pull, its rail and its profile.
 */
import { expect, test } from '@playwright/test';

test("pulls drawn with their values; a pin's tooltip says its pull, rail and profile", async ({ page }) => {
  await page.goto('/');
  await expect(page.locator('[data-net-label="SDA"] [data-pull]')).toHaveText('↑4K7 3.3 V');
  await expect(page.locator('[data-net-label="SCL"] [data-pull]')).toHaveText('↑4K7 3.3 V');
  const rain = page.locator('.react-flow__node[data-id="U1"] [data-pin="RAIN"]');
  await expect(rain.locator('[data-pin-pull]')).toHaveText('↑47K');
  const tip = (await rain.getAttribute('title')) ?? '';
  expect(tip).toContain('internal pull-up 47 kΩ to 3.3 V controller I/O (3v3)');
  expect(tip).toContain('rail 3.3 V controller I/O (3v3)');
  expect(tip).toMatch(/profile mcu-gpio/);
  // A pin without a pull of its own says so, rather than leaving it unsaid.
  expect(await page.locator('.react-flow__node[data-id="U1"] [data-pin="VALVE_EN"]').getAttribute('title')).toContain(
    'no pull of its own',
  );
});
