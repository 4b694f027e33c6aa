/**
 * Explain and fix: the voltage ladder of a net carries the engine's numbers, the crossings
 * table opens it, and a quick fix clears its finding in one undoable step; then every fix the
 * example's findings offer, in both power states, applied and undone from its row.
 */
import { readFileSync } from 'node:fs';
import { expect, test, type Page } from '@playwright/test';
import { check } from '../rules/check/check.ts';
import type { Design } from '../rules/model/schema.ts';
import { fixesFor } from '../app/store/commands/fixes/index.ts';

const example = JSON.parse(
  readFileSync(new URL('../rules/examples/greenhouse.json', import.meta.url), 'utf8'),
) as Design;

test("the ladder of a crossing net shows the engine's margins, and a quick fix clears its finding", async ({
  page,
}) => {
  const problems: string[] = [];
  page.on('pageerror', (e) => problems.push(e.message));
  page.on('console', (m) => {
    if (m.type() === 'error') problems.push(m.text());
  });
  await page.goto('/');
  await expect(page.locator('.rc-wire[data-net="VALVE_EN"]').first()).toHaveAttribute('data-severity', 'error');

  // The crossings table lists VALVE_EN in all-on with its worst margins; a click opens its ladder.
  await page.getByTestId('tab-crossings').click();
  const row = page.locator('[data-testid="crossings"] tr[data-net="VALVE_EN"][data-scenario="all-on"]');
  await expect(row).toHaveAttribute('data-severity', 'error');
  await row.click();
  const ladder = page.getByTestId('net-ladder');
  await expect(ladder).toBeVisible();

  // Every margin drawn equals the engine's analysis of the net (computed here, in Node).
  const analysis = check(example).nets.get('all-on')!.get('VALVE_EN')!.view.analysis;
  for (const pair of analysis.pairs) {
    for (const [kind, side] of [
      ['nmh', pair.high],
      ['nml', pair.low],
    ] as const) {
      if (side === null) continue;
      const mark = ladder
        .locator(`[data-kind="${kind}"][data-driver="${pair.driver}"][data-receiver="${pair.receiver}"]`)
        .first();
      const drawn = Number(await mark.getAttribute('data-margin'));
      expect(Math.abs(drawn - side.margin)).toBeLessThan(1e-9);
      await expect(mark).toHaveAttribute('data-status', side.status);
    }
  }
  const voh = ladder.locator('[data-kind="voh"][data-pin="U1.VALVE_EN"]').first();
  expect(Math.abs(Number(await voh.getAttribute('data-volts')) - analysis.pairs[0]!.high!.out)).toBeLessThan(1e-9);

  // The quick fix: the HC receiver gets TTL-level inputs (HCT); the finding goes; undo brings it back.
  await page.getByTestId('tab-findings').click();
  const finding = page.locator('li[data-finding-row="level-high:VALVE_EN:all-on:U1.VALVE_EN>U3.EN"]');
  await finding.getByTestId('fix-open').click();
  const fix = finding.locator('[data-fix="ttl-inputs"]');
  await fix.getByTestId('fix-try').click();
  await expect(fix.getByTestId('fix-preview')).toContainText('Removes');
  await fix.getByTestId('fix-apply').click();
  await expect(page.locator('li[data-finding-row="level-high:VALVE_EN:all-on:U1.VALVE_EN>U3.EN"]')).toHaveCount(0);
  await expect(page.getByTestId('notice')).toContainText('before');
  await page.keyboard.press('Control+z');
  await expect(page.locator('li[data-finding-row="level-high:VALVE_EN:all-on:U1.VALVE_EN>U3.EN"]')).toHaveCount(1);
  expect(problems).toEqual([]);
});

/** The ids of the unwaived errors listed for the power state on the canvas. */
async function errorIds(page: Page): Promise<string[]> {
  return page
    .locator('li[data-finding-row]:not(.rc-finding-item--waived)')
    .evaluateAll((rows) =>
      rows
        .filter((r) => r.querySelector('.rc-finding[data-severity="error"]') !== null)
        .map((r) => r.getAttribute('data-finding-row') ?? ''),
    );
}

test('every quick fix offered on the example works from its row: the finding goes, no error comes, undo restores it', async ({
  page,
}) => {
  test.setTimeout(180_000);
  const problems: string[] = [];
  page.on('pageerror', (e) => problems.push(e.message));
  await page.goto('/');
  await expect(page.locator('.react-flow__node').first()).toBeVisible();
  let tried = 0;
  let unavailable = 0;
  for (const state of ['all-on', 'standby', 'reset']) {
    await page.getByTestId('power-state').selectOption(state);
    const rows = await page
      .locator('li[data-finding-row]')
      .evaluateAll((els) =>
        els
          .filter((e) => e.querySelector('[data-testid="fix-open"]') !== null)
          .map((e) => e.getAttribute('data-finding-row') ?? ''),
      );
    expect(rows.length, `rows with a fix in ${state}`).toBeGreaterThan(0);
    for (const id of rows) {
      const row = page.locator(`li[data-finding-row="${id}"]`);
      await row.getByTestId('fix-open').click();
      const fixes = await row
        .locator('[data-fix]')
        .evaluateAll((els) => els.map((e) => e.getAttribute('data-fix') ?? ''));
      // A rule with remedies may have none for this case (two push-pull outputs on one net): it says so.
      if (fixes.length === 0) await expect(row).toContainText('No quick fix applies');
      for (const fixId of fixes) {
        if ((await row.getByTestId('fix-open').count()) > 0) await row.getByTestId('fix-open').click();
        const fix = row.locator(`[data-fix="${fixId}"]`);
        // A fix that cannot be worked out from the design says what it needs and offers no Apply.
        if ((await fix.getByTestId('fix-unavailable').count()) > 0) {
          await expect(fix.getByTestId('fix-apply')).toHaveCount(0);
          unavailable++;
          continue;
        }
        const before = await errorIds(page);
        if ((await fix.getByTestId('fix-confirm').count()) > 0) await fix.getByTestId('fix-confirm').check();
        await fix.getByTestId('fix-apply').click();
        await expect(row, `${fixId} on ${id}`).toHaveCount(0);
        const after = await errorIds(page);
        expect(
          after.filter((e) => !before.includes(e)),
          `errors brought by ${fixId} on ${id}`,
        ).toEqual([]);
        await page.keyboard.press('Control+z');
        await expect(row, `undo of ${fixId} on ${id}`).toHaveCount(1);
        expect(await errorIds(page)).toEqual(before);
        tried++;
      }
    }
  }
  // As many as the fixes module offers for the example's findings, worked out here in Node.
  const result = check(example);
  const all = result.findings.flatMap((f) => fixesFor(f, example, result));
  const offered = all.filter((x) => x.unavailable === undefined).length;
  expect(offered).toBeGreaterThan(10);
  expect(tried).toBe(offered);
  expect(unavailable).toBe(all.length - offered);
  expect(problems).toEqual([]);
});
