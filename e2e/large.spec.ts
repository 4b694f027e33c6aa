/**
 * Large designs (issue 14): a 5,000-part file is read and checked in the worker while the page
 * keeps answering (the Export menu opens while the check runs); it then waits for a choice
 * instead of freezing the page; "report only" gives its counts and a report that holds to the
 * report schema; opened read-only it refuses edits; reopened at the next start it asks again,
 * and "not now" opens another design. No console error and no CSP violation (the worker is
 * allowed by the page's policy).
 */
import { readFileSync } from 'node:fs';
import { expect, test } from '@playwright/test';
import { watch } from './gestures.ts';
import { check } from '../rules/check/check.ts';
import { writeDesign } from '../rules/model/writer.ts';
import { ReportSchema } from '../rules/report/reportSchema.ts';
import { generateDesign } from '../test/support/generator.ts';

const PARTS = 5000;

test('a 5,000-part import keeps the page answering and opens with a choice', async ({ page }) => {
  test.setTimeout(240_000);
  const problems = watch(page);
  const design = generateDesign(5000, { parts: PARTS });
  const summary = check(design).summary;
  await page.goto('/');
  await expect(page.locator('.react-flow__node').first()).toBeVisible();
  const before = await page.getByTestId('design-title').inputValue();

  await page.getByTestId('open-library').click();
  await page.getByTestId('import-file').setInputFiles({
    name: 'big-board.railcross.json',
    mimeType: 'application/json',
    buffer: Buffer.from(writeDesign(design)),
  });
  // While the worker reads and checks it, the page answers: the Export menu opens and closes.
  const task = page.getByTestId('task');
  await expect(task).toContainText(/Reading|Checking/);
  await page.getByTestId('export-menu').click();
  await expect(page.getByTestId('export-design')).toBeVisible();
  await expect(task, 'the menu answered while the design was still being processed').toBeVisible();
  await page.getByTestId('export-menu').click();
  await expect(page.getByTestId('export-design')).toBeHidden();

  const choice = page.getByTestId('large-design');
  await expect(choice).toBeVisible({ timeout: 120_000 });
  await expect(choice).toContainText(`${design.title}”`);
  await expect(choice).toContainText('5,000 parts');
  await expect(choice).toContainText(`${summary.error.toLocaleString('en')} error`);
  // Nothing was opened behind it.
  await expect(page.getByTestId('design-title')).toHaveValue(before);

  await page.getByTestId('large-report').click();
  await expect(page.getByTestId('large-report-ready')).toBeVisible({ timeout: 120_000 });
  await expect(page.getByTestId('large-report-ready').locator('[data-count="error"]')).toHaveText(
    `${summary.error.toLocaleString('en')} error${summary.error === 1 ? '' : 's'}`,
  );
  const download = page.waitForEvent('download');
  await page.getByTestId('large-download').click();
  const report = JSON.parse(readFileSync(await (await download).path(), 'utf8')) as unknown;
  expect(ReportSchema.safeParse(report).success).toBe(true);

  await page.getByTestId('large-read-only').click();
  await expect(page.getByTestId('read-only')).toBeVisible({ timeout: 120_000 });
  await expect(page.getByTestId('design-title')).toHaveValue(design.title);
  // Read-only: the fields take no typing, and a nudge of a chip is refused with the reason.
  await expect(page.getByTestId('design-title')).toHaveAttribute('readonly', '');
  await page.locator('.react-flow__pane').click({ position: { x: 5, y: 5 } });
  await page.keyboard.press('Control+a');
  await page.keyboard.press('ArrowRight');
  await expect(page.locator('.rc-status')).toContainText('open read-only');

  // The next start asks again rather than opening it.
  await page.reload();
  await expect(choice).toBeVisible({ timeout: 60_000 });
  await expect(choice).toContainText('It was open when this page last closed');
  await page.getByTestId('large-cancel').click();
  await expect(choice).toBeHidden();
  await expect(page.getByTestId('design-title')).toHaveValue(before);
  expect(problems).toEqual([]);
});
