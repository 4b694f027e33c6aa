/**
 * A newcomer's first minutes: the example opens with its red wires; two chips from the palette;
 * a 3.3 V push-pull output into a 5 V HC input turns red with its numbers; TTL-level inputs
 * (HCT) clear it; undo brings it back; a reload keeps the design. No console error, no CSP
 * violation on the way.
 */
import { expect, test } from '@playwright/test';
import { fitAll, handle, uncoveredPoint, wire } from './gestures.ts';

test("a newcomer's first minutes", async ({ page }) => {
  const problems: string[] = [];
  page.on('console', (m) => {
    if (m.type() === 'error') problems.push(`console: ${m.text()}`);
  });
  page.on('pageerror', (e) => problems.push(`page error: ${e.message}`));
  await page.addInitScript(() => {
    document.addEventListener('securitypolicyviolation', (e) => {
      console.error(`CSP violation: ${e.violatedDirective} ${e.blockedURI}`);
    });
  });

  await page.goto('/');

  // The example's planted fault: a 3.3 V output into a 74HC input on the 5 V valve board.
  await expect(page.locator('.rc-wire[data-net="VALVE_EN"]').first()).toHaveAttribute('data-severity', 'error');
  await expect(page.locator('.rc-wire[data-severity="error"]').first()).toBeVisible();
  expect(await page.locator('.rc-wire[data-severity="error"]').count()).toBeGreaterThan(1);

  // Place a 74HC gate by dragging it onto an empty stretch of canvas, then a 74LVC gate by Enter.
  const canvas = await page.locator('#rc-canvas').boundingBox();
  if (canvas === null) throw new Error('no canvas');
  const before = await page.locator('.react-flow__node').count();
  await page.locator('[data-template="gate:74hc"]').dragTo(page.locator('#rc-canvas'), {
    targetPosition: { x: canvas.width * 0.3, y: canvas.height - 90 },
  });
  await expect(page.locator('.react-flow__node')).toHaveCount(before + 1);
  const hc = (await page.locator('.react-flow__node').last().getAttribute('data-id')) ?? '';
  await expect(page.locator(`[data-part="${hc}"]`)).toContainText('74HC CMOS');

  await page.getByTestId('palette-search').fill('single gate 74lvc');
  await page.getByTestId('palette-search').press('Enter');
  await expect(page.locator('.react-flow__node')).toHaveCount(before + 2);
  const lvc = (await page.locator('.react-flow__node').last().getAttribute('data-id')) ?? '';
  await expect(page.locator(`[data-part="${lvc}"]`)).toContainText('74LVC');

  // Bring both into view, then wire the LVC output to the HC input.
  await fitAll(page);
  await wire(page, handle(page, lvc, 'Y'), handle(page, hc, 'A'));
  const edge = page.locator(`.react-flow__edge[data-id$=":${lvc}.Y:${hc}.A"] .rc-wire`);
  await expect(edge).toHaveAttribute('data-severity', 'error');
  await expect(edge).toHaveAttribute('data-rule', 'level-high');
  const net = (await edge.getAttribute('data-net')) ?? '';

  // The numbers: 74LVC VOH ≥ VDD − 0.2 V at 100 µA with VDD = 3.3 V − 5 % = 3.135 V gives
  // 2.935 V; 74HC VIH = 0.675·VDD + 0.15 at 5.25 V is 3.694 V (JESD7, as the profile library
  // restates it); NMH = 2.935 − 3.694 = −0.759 V.
  const row = page.locator(`.rc-finding[data-net="${net}"][data-rule="level-high"][data-severity="error"]`);
  await expect(row).toBeVisible();
  await expect(row).toContainText('NMH -0.759 V');
  await expect(row).toContainText('needs 3.694 V to read high');
  // The driver's corner shows whole (four digits where the value has them): 2.935 V, not 2.94 V.
  await expect(row).toContainText('guarantees 2.935 V high');
  await expect(row).toContainText('High level reaches the receiver');

  // Hovering the wire shows its worst high margin.
  // A point of the wire that no chip covers (wires pass under chips).
  const mid = await uncoveredPoint(edge);
  await page.mouse.move(mid.x, mid.y);
  await expect(page.locator('.rc-wire-tip [data-margin="high"]')).toHaveText('-0.759 V');

  // HCT inputs read 2.0 V as high (JESD7): the wire turns neutral.
  await page.locator(`[data-part="${hc}"] .rc-chip-head`).click();
  await page.getByTestId('part-profile').selectOption('74hct');
  await expect(edge).not.toHaveAttribute('data-severity', /error|warning/);
  await expect(row).toHaveCount(0);

  // Undo from the keyboard, with the focus away from any field.
  await page.locator('.react-flow__pane').click({ position: { x: 20, y: 20 } });
  await page.keyboard.press('Control+z');
  await expect(edge).toHaveAttribute('data-severity', 'error');

  // A reload keeps the design (saved, debounced, to IndexedDB).
  await expect(page.getByTestId('save-status')).toHaveAttribute('data-state', 'saved');
  await page.reload();
  await expect(page.locator(`.rc-wire[data-net="${net}"]`)).toHaveAttribute('data-severity', 'error');
  await expect(page.locator(`[data-part="${hc}"]`)).toContainText('74HC CMOS');

  expect(problems).toEqual([]);
});

test('a refused connection says why', async ({ page }) => {
  await page.goto('/');
  await expect(page.locator('.rc-wire').first()).toBeVisible();
  // U1.SDA and U2.SDA are already on the SDA net.
  await wire(page, handle(page, 'U1', 'SDA'), handle(page, 'U2', 'SDA'));
  await expect(page.getByTestId('notice')).toContainText('already on net SDA');
});

test('the keyboard: Delete a wire, undo, redo; New design is one step too', async ({ page }) => {
  await page.goto('/');
  const wireOf = (net: string) => page.locator(`.rc-wire[data-net="${net}"]`);
  await expect(wireOf('VALVE_EN')).toHaveCount(1);
  // Select the wire from the findings list's net, then click it on the canvas.
  await page.locator('.rc-finding[data-net="VALVE_EN"]').first().click();
  await expect(page.getByTestId('net-details')).toContainText('VALVE_EN');
  const edge = page.locator('.react-flow__edge').filter({ has: wireOf('VALVE_EN') });
  await edge.evaluate((el) => el.dispatchEvent(new MouseEvent('click', { bubbles: true })));
  await expect(edge).toHaveClass(/selected/);
  await page.keyboard.press('Delete');
  await expect(wireOf('VALVE_EN')).toHaveCount(0);
  await page.keyboard.press('Control+z');
  await expect(wireOf('VALVE_EN')).toHaveCount(1);
  await page.keyboard.press('Control+Shift+z');
  await expect(wireOf('VALVE_EN')).toHaveCount(0);
  await page.keyboard.press('Control+z');
  await page.keyboard.press('Control+y');
  await expect(wireOf('VALVE_EN')).toHaveCount(0);

  // A new design opens beside the example: the example stays in the library as it was.
  await page.getByTestId('new-design').click();
  await expect(page.locator('.react-flow__node')).toHaveCount(0);
  await expect(page.getByTestId('design-title')).toHaveValue('Untitled design');
  await page.getByTestId('open-library').click();
  await expect(page.locator('[data-testid="library-row"][data-title="Greenhouse irrigation controller"]')).toHaveCount(
    1,
  );
});

test('numeric fields take engineering notation and refuse anything else', async ({ page }) => {
  await page.goto('/');
  await page.locator('.rc-finding[data-net="VALVE_EN"]').first().click();
  await page.getByTestId('net-pull-to').selectOption('5v0');
  const ohms = page.getByTestId('net-pull-ohms');
  await expect(ohms).toHaveValue('10 kΩ');
  await ohms.fill('4k7x');
  await ohms.press('Enter');
  await expect(ohms).toHaveAttribute('aria-invalid', 'true');
  await expect(page.locator('.rc-field-error')).toContainText('not a known prefix or unit');
  await ohms.fill('-1k');
  await ohms.press('Enter');
  await expect(page.locator('.rc-field-error')).toContainText('negative');
  // IEC 60062: 4K7 is 4.7 kΩ.
  await ohms.fill('4K7');
  await ohms.press('Enter');
  await expect(ohms).toHaveValue('4.7 kΩ');
  await expect(ohms).toHaveAttribute('aria-invalid', 'false');

  await page.locator('.rc-fold summary', { hasText: 'Rails' }).click();
  const nominal = page.getByTestId('rail-nominal-3v3');
  await nominal.fill('3V3');
  await nominal.press('Enter');
  await expect(nominal).toHaveValue('3.3 V');
  await nominal.fill('0');
  await nominal.press('Enter');
  await expect(page.locator('.rc-field-error')).toContainText('above 0 V');
});
