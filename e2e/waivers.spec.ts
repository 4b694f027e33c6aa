/**
 * Waivers for the unused inputs of a new part: the waive form chooses every power state by
 * default (and says so), a waiver of a pin on no net outlives a power state added after it, and
 * one fix ties every other unused input of the part in one undo step.
 */
import { expect, test, type Page } from '@playwright/test';
import { watch } from './gestures.ts';

const loneRows = (page: Page, part: string) =>
  page.locator('.rc-finding[data-net=""][data-rule="floating-input"]', { hasText: `${part}.` });
const itemOf = (page: Page, text: string) =>
  page.locator('li.rc-finding-item', {
    has: page.locator('.rc-finding[data-rule="floating-input"]', { hasText: text }),
  });

test('the unused inputs of a 16-pin controller: one waived in every state, the rest tied in one step', async ({
  page,
}) => {
  const problems = watch(page);
  await page.goto('/');
  await expect(page.locator('.rc-wire').first()).toBeVisible();
  await page.getByTestId('new-design').click();
  await expect(page.locator('.react-flow__node')).toHaveCount(0);
  await page.getByTestId('palette-search').fill('microcontroller with 16 pins');
  await page.getByTestId('palette-search').press('Enter');
  await expect(page.locator('.react-flow__node')).toHaveCount(1);
  const part = (await page.locator('.react-flow__node').first().getAttribute('data-id')) ?? '';
  // Its inputs IN1–IN6 and RX are on no net: each floats (floating-input, a warning).
  await expect(loneRows(page, part)).toHaveCount(7);

  // Waive IN1: the form offers both scopes, every power state chosen.
  const in1 = itemOf(page, `${part}.IN1 `);
  await in1.getByTestId('waive').click();
  await expect(in1.getByTestId('waive-every-state')).toBeChecked();
  await expect(in1.getByTestId('waive-this-state')).not.toBeChecked();
  await expect(in1.getByTestId('waive-scope')).toContainText('in every power state');
  await in1.getByTestId('waive-note').fill('Spare input, test point only');
  await page.screenshot({ path: 'e2e/screenshots/waive-form.png' });
  await in1.getByTestId('waive-accept').click();
  const in1Row = page.locator('.rc-finding[data-rule="floating-input"]', { hasText: `${part}.IN1 ` });
  await expect(in1Row).toHaveAttribute('data-waived', 'true');

  // A power state added afterwards: IN1 stays waived there too.
  await page.locator('.rc-fold summary', { hasText: 'Power states' }).click();
  await page.getByRole('button', { name: 'Add a power state' }).click();
  await page.getByTestId('findings-state').selectOption({ label: 'All power states' });
  await expect(loneRows(page, part)).toHaveCount(14);
  await expect(in1Row).toHaveCount(2);
  for (const row of await in1Row.all()) await expect(row).toHaveAttribute('data-waived', 'true');

  // The fix on IN2 ties the other six unused inputs at once.
  const in2 = itemOf(page, `${part}.IN2 `).first();
  await in2.getByTestId('fix-open').click();
  const tie = in2.locator('[data-fix="tie-unused-inputs"]');
  await expect(tie).toContainText('Tie all 6 unused inputs');
  await tie.getByTestId('fix-try').click();
  await expect(tie.getByTestId('fix-preview')).toBeVisible();
  await tie.getByTestId('fix-apply').click();
  // Only the waived IN1 is left, in both states.
  await expect(loneRows(page, part)).toHaveCount(2);
  await expect(page.locator('.rc-finding[data-rule="floating-input"][data-waived="false"]')).toHaveCount(0);

  // One undo brings all six back.
  await page.locator('.react-flow__pane').click({ position: { x: 12, y: 12 } });
  await page.keyboard.press('Control+z');
  await expect(loneRows(page, part)).toHaveCount(14);

  // The part's details list the waiver kept in its pin; withdrawn there, IN1 floats again.
  await page.locator(`[data-part="${part}"] .rc-chip-head`).click();
  const kept = page.getByTestId('pin-waivers');
  await expect(kept).toContainText('IN1');
  await expect(kept).toContainText('every power state');
  await expect(kept).toContainText('Spare input, test point only');
  await kept.getByRole('button', { name: `Withdraw the waiver of floating-input on IN1` }).click();
  await expect(kept).toHaveCount(0);
  await expect(page.locator('.rc-finding[data-rule="floating-input"][data-waived="true"]')).toHaveCount(0);
  expect(problems).toEqual([]);
});
