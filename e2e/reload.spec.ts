/**
 * No edit lost on a reload (issue 14): an edit committed 0, 50 or 100 ms before the page
 * reloads (well inside the 300 ms autosave delay), ten arrow-key nudges, and text typed in a
 * field but never committed are all there after the reload; leaving while anything is unsaved
 * asks first. No console error and no CSP violation on the way.
 */
import { expect, test, type Page } from '@playwright/test';

const DELAYS = [0, 50, 100];

function watch(page: Page): { problems: string[]; dialogs: string[] } {
  const problems: string[] = [];
  const dialogs: string[] = [];
  page.on('console', (m) => {
    if (m.type() === 'error') problems.push(`console: ${m.text()}`);
  });
  page.on('pageerror', (e) => problems.push(`page error: ${e.message}`));
  // The leave-page question: answered "leave", as a user who reloads anyway would.
  page.on('dialog', (d) => {
    dialogs.push(d.type());
    void d.accept();
  });
  void page.addInitScript(() => {
    document.addEventListener('securitypolicyviolation', (e) =>
      console.error(`CSP violation: ${e.violatedDirective} ${e.blockedURI}`),
    );
  });
  return { problems, dialogs };
}

const title = (page: Page) => page.getByTestId('design-title');
const chip = (page: Page, id: string) => page.locator(`.react-flow__node[data-id="${id}"]`);

/** A chip's place on the canvas in flow units (the node's own transform, not the view's). */
async function placeOf(page: Page, id: string): Promise<string> {
  return chip(page, id).evaluate((el) => (el as HTMLElement).style.transform);
}

async function reloadAfter(page: Page, ms: number): Promise<void> {
  // The fixed delay is the quantity under test: how long before the reload the edit was made.
  if (ms > 0) await page.waitForTimeout(ms);
  await page.reload();
  await expect(page.locator('.react-flow__node').first()).toBeVisible();
}

test('every committed edit, nudge and typed text survives a reload 0, 50 and 100 ms later', async ({ page }) => {
  const { problems, dialogs } = watch(page);
  await page.goto('/');
  await expect(page.locator('.react-flow__node').first()).toBeVisible();

  for (const ms of DELAYS) {
    const name = `Irrigation controller, reload after ${ms} ms`;
    await title(page).fill(name);
    await title(page).press('Enter');
    await reloadAfter(page, ms);
    await expect(title(page), `title committed ${ms} ms before the reload`).toHaveValue(name);
  }

  for (const ms of DELAYS) {
    await chip(page, 'U1').locator('.rc-chip-head').click();
    await expect(chip(page, 'U1')).toHaveClass(/selected/);
    // Nothing left to store before the nudges, so that what the reload may lose is the nudges alone.
    await expect(page.getByTestId('save-status'), 'stored before the nudges').toHaveAttribute(
      'data-state',
      /saved|idle/,
    );
    const before = await placeOf(page, 'U1');
    for (let k = 0; k < 10; k++) await page.keyboard.press('ArrowRight');
    const moved = await placeOf(page, 'U1');
    expect(moved).not.toBe(before);
    await reloadAfter(page, ms);
    await expect.poll(() => placeOf(page, 'U1'), { message: `ten nudges ${ms} ms before the reload` }).toBe(moved);
  }

  // Typed, never committed (no Enter, no blur): page-hide commits it.
  await title(page).fill('Typed but not committed');
  await reloadAfter(page, 0);
  await expect(title(page)).toHaveValue('Typed but not committed');

  // The page asked before leaving with unsaved edits, and once all is stored it reloads without asking.
  expect(dialogs.length).toBeGreaterThan(0);
  expect(new Set(dialogs)).toEqual(new Set(['beforeunload']));
  await expect(page.getByTestId('save-status')).toHaveAttribute('data-state', /saved|idle/);
  const asked = dialogs.length;
  await page.reload();
  await expect(title(page)).toHaveValue('Typed but not committed');
  expect(dialogs.length).toBe(asked);
  expect(problems).toEqual([]);
});
