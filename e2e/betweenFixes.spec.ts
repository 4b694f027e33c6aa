/**
 * The parts between chips placed, wired and fixed in the browser, on a bench of our own
 * (crossingBench.ts): a FET shifter and a diode shifter from the palette wired between spare
 * pins (the check then reports pairs across them), the FET-shifter fix on the 3.3 V + 1.8 V
 * open-drain line, and the series-resistor and divider fixes with their figures shown before they are applied.
 */
import { expect, type Page, test } from '@playwright/test';
import { CROSSING_BENCH } from './crossingBench.ts';
import { fitAll, handle, watch, wire } from './gestures.ts';

async function openBench(page: Page): Promise<void> {
  await page.goto('/');
  await expect(page.locator('.react-flow__node').first()).toBeVisible();
  await page.getByTestId('open-library').click();
  await page.getByTestId('import-file').setInputFiles({
    name: 'rail-crossing-bench.railcross.json',
    mimeType: 'application/json',
    buffer: Buffer.from(JSON.stringify(CROSSING_BENCH)),
  });
  await expect(page.getByTestId('design-title')).toHaveValue('Rail crossing bench');
  // A design opens zoomed to its errors, and the canvas draws only what is in view.
  await fitAll(page);
}

const row = (page: Page, id: string) => page.locator(`li[data-finding-row="${id}"]`);

test('FET and diode shifters from the palette, wired, and the FET-shifter fix', async ({ page }) => {
  const problems = watch(page);
  await openBench(page);

  // A FET shifter from the palette, its gate on the last rail (1.8 V), wired from the spare
  // 1.8 V port (source) to the spare 3.3 V port (drain).
  await page.getByTestId('place-fet-shifter').click();
  await fitAll(page);
  await expect(page.getByTestId('value-Q1')).toHaveText('VGS(th) ≤ 1 V');
  await wire(page, handle(page, 'Q1', 'S'), handle(page, 'U5', 'SCL'));
  await wire(page, handle(page, 'Q1', 'D'), handle(page, 'U6', 'SCL'));
  await page.locator('.react-flow__node[data-id="Q1"]').click();
  const details = page.getByTestId('discrete-details');
  // Each side's driver reaches the other side's pin through Q1.
  await expect(details).toContainText('U5.SCL → U6.SCL');
  await expect(details).toContainText('U6.SCL → U5.SCL');

  // A diode shifter: cathode on the 3.3 V output, anode on the 5 V input.
  await page.getByTestId('place-diode-shifter').click();
  await fitAll(page);
  await expect(page.getByTestId('value-D1')).toHaveText('Vf ≤ 0.45 V');
  await wire(page, handle(page, 'D1', 'K'), handle(page, 'U7', 'Y'));
  await wire(page, handle(page, 'D1', 'A'), handle(page, 'U8', 'A'));
  await page.locator('.react-flow__node[data-id="D1"]').click();
  await expect(details).toContainText('U7.Y → U8.A');

  // The 1.8 V sensor on the 3.3 V pull-up: the FET-shifter fix splits the line at a new shifter.
  await page.getByTestId('tab-findings').click();
  const over = row(page, 'overvoltage:SDA:all-on:U2.SDA');
  await over.getByTestId('fix-open').click();
  const fix = over.locator('[data-fix="fet-shifter"]');
  await expect(fix).toContainText('Insert FET shifter Q2 on SDA');
  await fix.getByTestId('fix-try').click();
  await expect(fix.getByTestId('fix-preview')).toContainText('Removes');
  await fix.getByTestId('fix-apply').click();
  await expect(row(page, 'overvoltage:SDA:all-on:U2.SDA')).toHaveCount(0);
  await expect(page.getByTestId('value-Q2')).toHaveText('VGS(th) ≤ 1 V');
  await expect(page.getByTestId('value-R1')).toBeVisible();
  await expect(page.getByTestId('value-R2')).toBeVisible();
  // One undo step takes the shifter and both pull-ups away.
  await page.keyboard.press('Control+z');
  await expect(row(page, 'overvoltage:SDA:all-on:U2.SDA')).toHaveCount(1);
  await expect(page.getByTestId('value-Q2')).toHaveCount(0);
  await expect(page.getByTestId('value-R1')).toHaveCount(0);
  expect(problems).toEqual([]);
});

test('the series-resistor fix shows its figures, inserts the resistor and undoes in one step', async ({ page }) => {
  const problems = watch(page);
  await openBench(page);
  await page.getByTestId('tab-findings').click();
  const over = row(page, 'overvoltage:TX:all-on:U4.A');
  await over.getByTestId('fix-open').click();
  const fix = over.locator('[data-fix="series-resistor"]');
  // Before applying: (5.25 − 3.135)/1 mA = 2.115 kΩ, ÷ 0.95 → 2.4 kΩ (E24); 2.115 V/2.28 kΩ = 928 µA;
  // ln 9 · 2.52 kΩ · 10 pF = 55.4 ns (the numbers the unit table works by hand).
  const figures = fix.getByTestId('fix-figures');
  await expect(figures).toContainText('2.4 kΩ');
  await expect(figures).toContainText('928 µA');
  await expect(figures).toContainText('55.4 ns');
  await fix.getByTestId('fix-try').click();
  await expect(fix.getByTestId('fix-preview')).toContainText('Removes');
  await fix.getByTestId('fix-apply').click();
  await expect(row(page, 'overvoltage:TX:all-on:U4.A')).toHaveCount(0);
  await expect(page.getByTestId('value-R1')).toHaveText('2k4 ±5 %');
  await expect(page.locator('.rc-wire[data-net="TX_3v3"]').first()).toBeVisible();
  await page.keyboard.press('Control+z');
  await expect(row(page, 'overvoltage:TX:all-on:U4.A')).toHaveCount(1);
  await expect(page.getByTestId('value-R1')).toHaveCount(0);
  expect(problems).toEqual([]);
});

test('the divider fix shows the pair, its current against the rating and its edge, applies and undoes', async ({
  page,
}) => {
  const problems = watch(page);
  await openBench(page);
  await page.getByTestId('tab-findings').click();
  const over = row(page, 'overvoltage:TX:all-on:U4.A');
  await over.getByTestId('fix-open').click();
  const fix = over.locator('[data-fix="divider"]');
  // The rule of divider.ts, worked by hand for the 74HC driver (4 mA rating) into the 3.3 V input at
  // 10 pF: 7.5 kΩ / 11 kΩ draws 5.25/(7425 + 10890) = 287 µA (at most half of 4 mA); its edge,
  // ln 9 · (7575‖11110 = 4504 Ω) · 10 pF = 99.0 ns, meets the default 100 ns (the unit table's rule).
  const figures = fix.getByTestId('fix-figures');
  await expect(figures).toContainText('7.5 kΩ / 11 kΩ');
  await expect(figures).toContainText('287 µA');
  await expect(figures).toContainText('at most 50 % of its rated 4 mA');
  await expect(figures).toContainText('99 ns');
  await figures.screenshot({ path: test.info().outputPath('divider-figures.png') });
  await fix.getByTestId('fix-apply').click();
  await expect(row(page, 'overvoltage:TX:all-on:U4.A')).toHaveCount(0);
  await expect(page.getByTestId('value-R1')).toHaveText('7k5 ±1 %');
  await expect(page.getByTestId('value-R2')).toHaveText('11k ±1 %');
  await page.keyboard.press('Control+z');
  await expect(row(page, 'overvoltage:TX:all-on:U4.A')).toHaveCount(1);
  await expect(page.getByTestId('value-R1')).toHaveCount(0);
  expect(problems).toEqual([]);
});
