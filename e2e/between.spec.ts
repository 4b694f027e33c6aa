/**
 * Parts between chips in the editor: the example's resistors and FET shifters are drawn with
 * their values; a resistor placed from the palette is wired between two chips' pins, its value
 * edited in engineering notation, and the check sees the path it makes.
 */
import { expect, test } from '@playwright/test';
import { fitAll, wire } from './gestures.ts';

test('parts between chips: drawn with their values, placed, wired and edited', async ({ page }) => {
  const problems: string[] = [];
  page.on('pageerror', (e) => problems.push(e.message));
  page.on('console', (m) => {
    if (m.type() === 'error') problems.push(m.text());
  });
  await page.goto('/');
  await fitAll(page);
  // The example's divider and the FET shifters, values on the canvas (IEC 60062 code, small k).
  await expect(page.getByTestId('value-R5')).toHaveText('1k8 ±1 %');
  await expect(page.getByTestId('value-R3')).toHaveText('1k0 ±1 %');
  await expect(page.getByTestId('value-Q2')).toHaveText('VGS(th) ≤ 1 V');

  // The planted FET-shifter fault is among the findings, with its numbers.
  await expect(
    page.getByText(/U20\.SCL must sink both pull-ups through Q2: 294 µA \+ 3\.15 mA = 3\.45 mA/).first(),
  ).toBeVisible();

  // Place a resistor from the palette: a new R8 with 10 kΩ ±5 %.
  await page.getByTestId('place-resistor').click();
  await expect(page.getByTestId('value-R8')).toHaveText('10k ±5 %');
  await expect(page.getByTestId('discrete-details')).toContainText('R8');

  // Edit its value in engineering notation.
  const ohms = page.getByTestId('discrete-ohms');
  await ohms.fill('4k7');
  await ohms.press('Enter');
  await expect(page.getByTestId('value-R8')).toHaveText('4k7 ±5 %');

  // Wire it across the divider's top resistor R5: from the display's busy output to the
  // controller's input. R5‖R8 = 1.27 kΩ over 3.3 kΩ lifts the input to 5.25 × 3.333/(1.274 + 3.333)
  // = 3.8 V, above its 3.135 + 0.5 V: the divided net turns red.
  await expect(page.locator('.rc-wire[data-net="BUSY_DIV"]').first()).not.toHaveAttribute('data-severity', 'error');
  await wire(
    page,
    page.locator('.react-flow__node[data-id="R8"] .react-flow__handle[data-handleid="1"]'),
    page.locator('.react-flow__node[data-id="U4"] .react-flow__handle[data-handleid="BUSY"]'),
  );
  await wire(
    page,
    page.locator('.react-flow__node[data-id="R8"] .react-flow__handle[data-handleid="2"]'),
    page.locator('.react-flow__node[data-id="U1"] .react-flow__handle[data-handleid="DISP_BUSY"]'),
  );
  await expect(page.locator('.rc-wire[data-net="BUSY_DIV"]').first()).toHaveAttribute('data-severity', 'error');
  await page.locator('.react-flow__node[data-id="R8"]').click();
  await expect(page.getByTestId('discrete-details')).toContainText('U4.BUSY → U1.DISP_BUSY');
  // One undo takes the second wire away again.
  await page.keyboard.press('Control+z');
  await expect(page.locator('.rc-wire[data-net="BUSY_DIV"]').first()).not.toHaveAttribute('data-severity', 'error');
  expect(problems).toEqual([]);
});
