/** The design's history lists, for each revision, the commands that made it. */
import { expect, test } from '@playwright/test';
import { watch } from './gestures.ts';

test('each revision says what changed: the names of its commands', async ({ page }) => {
  const problems = watch(page);
  await page.goto('/');
  await expect(page.locator('.rc-wire').first()).toBeVisible();
  const item = page.locator('li', { has: page.locator('.rc-finding[data-net="VALVE_EN"][data-rule="level-high"]') });
  await item.getByTestId('waive').click();
  await item.getByTestId('waive-note').fill('Valve board input is 3.3 V tolerant');
  await item.getByTestId('waive-accept').click();
  await page.locator('.rc-fold summary', { hasText: 'Power states' }).click();
  await page.getByRole('button', { name: 'Add a power state' }).click();

  await page.getByTestId('open-library').click();
  await page.getByRole('tab', { name: /History of/ }).click();
  const rows = page.getByTestId('revision-row');
  // The first revision is the example as it was stored; the edits come after it.
  const changes = page.getByTestId('revision-changes');
  await expect(changes.last()).toHaveText('Created');
  await expect(changes.first()).toContainText('Add a power state');
  await expect(rows.first().getByTestId('revision-changes')).toContainText('Add a power state');
  const all = (await changes.allInnerTexts()).join('\n');
  expect(all).toContain('Waive level-high on net VALVE_EN');
  // The column is wide enough to read a command's name on one or two lines.
  expect((await changes.first().boundingBox())?.width ?? 0).toBeGreaterThan(180);
  await page.screenshot({ path: 'e2e/screenshots/revisions.png' });
  expect(problems).toEqual([]);
});
