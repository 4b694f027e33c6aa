/**
 * The editor, part 2: a chip of one's own from the pin table with a VIH override, a waiver
 * written from a finding's row, copy and paste of two connected chips. Wires and rows are
 * found by their data attributes (net, severity, rule), never by their look.
 */
import { expect, test, type Page } from '@playwright/test';
import { fitAll, handle, wire } from './gestures.ts';
import { viewSettled, viewTransform } from './settled.ts';

const wireOf = (page: Page, net: string) => page.locator(`.rc-wire[data-net="${net}"]`);

/** Press a key with the focus on the canvas, away from any field. */
async function onCanvas(page: Page, key: string): Promise<void> {
  await page.locator('.react-flow__pane').click({ position: { x: 12, y: 12 } });
  await page.keyboard.press(key);
}

test("a chip from the pin table, with one pin's VIH overridden, judged by the override", async ({ page }) => {
  await page.goto('/');
  await expect(page.locator('.rc-wire').first()).toBeVisible();

  await page.getByTestId('new-chip').click();
  const dialog = page.getByTestId('chip-dialog');
  await expect(dialog).toBeVisible();
  await dialog.getByTestId('chip-id').fill('X1');
  await dialog.getByTestId('chip-label').fill('Valve gate of our own');
  await dialog.getByTestId('chip-rail').selectOption('5v0');
  await dialog.getByTestId('chip-profile').selectOption('74hc');
  for (const [k, id, role] of [
    [0, 'A', 'input'],
    [1, 'B', 'input'],
    [2, 'Y', 'output'],
  ] as const) {
    await dialog.getByTestId('pin-add').click();
    await dialog.getByTestId(`pin-${k}-id`).fill(id);
    await dialog.getByTestId(`pin-${k}-role`).selectOption(role);
  }
  // A TTL-level threshold on A only: VIH 2.0 V (JESD7, 74HCT input levels).
  await dialog.getByTestId('pin-0-params').click();
  const vih = dialog.getByTestId('pin-0-param-vih');
  await expect(vih).toHaveAttribute('placeholder', '0.675*VDD+0.15');
  await vih.fill('2.0');
  await vih.press('Enter');
  await expect(dialog.getByTestId('pin-0-params')).toHaveText('1 override');
  await dialog.getByTestId('chip-commit').click();
  await expect(dialog).toHaveCount(0);
  await expect(page.locator('[data-part="X1"]')).toContainText('Valve gate of our own');

  // A 3.3 V 74LVC gate drives A: 74LVC VOH ≥ VDD − 0.2 V at 100 µA (JESD8C), 2.935 V at 3.135 V, well above 2.0 V.
  await page.getByTestId('palette-search').fill('single gate 74lvc');
  await page.getByTestId('palette-search').press('Enter');
  const lvc = (await page.locator('.react-flow__node').last().getAttribute('data-id')) ?? '';
  // F fits the board with the new chip in an animation: the handles are aimed at once it has ended.
  const view = await viewTransform(page);
  await onCanvas(page, 'f');
  await viewSettled(page, { from: view });
  await wire(page, handle(page, lvc, 'Y'), handle(page, 'X1', 'A'));
  const edge = page.locator(`.react-flow__edge[data-id$=":${lvc}.Y:X1.A"] .rc-wire`);
  await expect(edge).toHaveCount(1);
  const net = (await edge.getAttribute('data-net')) ?? '';
  await expect(edge).not.toHaveAttribute('data-severity', /error|warning/);
  await expect(page.locator(`.rc-finding[data-net="${net}"][data-rule="level-high"]`)).toHaveCount(0);

  // X1.B is on no net: its finding may still be accepted, the waiver kept in the pin.
  const lone = page.locator('li', {
    has: page.locator('.rc-finding[data-net=""][data-rule="floating-input"]', { hasText: 'X1.B' }),
  });
  await expect(lone.getByTestId('waive')).toHaveCount(1);
  await expect(lone).not.toContainText('cannot be waived');

  // The details panel says where A's VIH comes from.
  await page.locator('[data-part="X1"] .rc-chip-head').click();
  await page.getByTestId('pin-toggle-A').click();
  await expect(page.locator('[data-testid="pin-effective-A"] tr[data-param="vih"]')).toHaveAttribute(
    'data-origin',
    'pin',
  );
  await expect(page.getByTestId('part-profile-source')).toContainText('JESD7');

  // Edit the chip: A's VIH at 0.8·VDD is 4.2 V at 5.25 V, above what the gate can give: the high level fails.
  await page.getByTestId('part-edit').click();
  await page.getByTestId('pin-0-params').click();
  await page.getByTestId('pin-0-param-vih').fill('0.8*VDD');
  await page.getByTestId('pin-0-param-vih').press('Enter');
  await page.getByTestId('chip-commit').click();
  await expect(edge).toHaveAttribute('data-severity', 'error');
  await expect(edge).toHaveAttribute('data-rule', 'level-high');
  const row = page.locator(`.rc-finding[data-net="${net}"][data-rule="level-high"][data-severity="error"]`);
  await expect(row).toContainText('4.2 V');
});

test('a finding accepted with a note: the wire loses its colour, the row keeps the note; undo', async ({ page }) => {
  await page.goto('/');
  const valve = wireOf(page, 'VALVE_EN');
  await expect(valve).toHaveAttribute('data-severity', 'error');
  const item = page.locator('li', { has: page.locator('.rc-finding[data-net="VALVE_EN"][data-rule="level-high"]') });
  await item.getByTestId('waive').click();
  await item.getByTestId('waive-note').fill('Valve board input is 3.3 V tolerant per its bench test');
  await item.getByTestId('waive-accept').click();
  await expect(valve).not.toHaveAttribute('data-severity', /error|warning/);
  const row = page.locator('.rc-finding[data-net="VALVE_EN"][data-rule="level-high"]');
  await expect(row).toHaveAttribute('data-waived', 'true');
  await expect(row).toContainText('Valve board input is 3.3 V tolerant per its bench test');
  // The net's details list the waiver.
  await row.click();
  await expect(page.getByTestId('net-waivers')).toContainText('Valve board input is 3.3 V tolerant');
  await onCanvas(page, 'Control+z');
  await expect(valve).toHaveAttribute('data-severity', 'error');
  await expect(row).toHaveAttribute('data-waived', 'false');
});

test('copy and paste of two connected chips brings the net between them, not the ones outside', async ({ page }) => {
  await page.goto('/');
  await expect(page.locator('.rc-wire').first()).toBeVisible();
  await fitAll(page);
  const nodes = page.locator('.react-flow__node');
  const before = await nodes.count();
  const wiresBefore = await page.locator('.rc-wire').count();
  // U3 (valve driver) and U4 (display) share only the BOARD_SLEEP net; U3 also drives U1 and U5.
  await page.locator('[data-part="U3"] .rc-chip-head').click();
  await page.locator('[data-part="U4"] .rc-chip-head').click({ modifiers: ['Shift'] });
  await expect(page.locator('.react-flow__node.selected')).toHaveCount(2);
  await page.keyboard.press('Control+c');
  await page.keyboard.press('Control+v');
  // The copies land on the nearest free spot, which may lie outside the view: fit to count them.
  await fitAll(page);
  await expect(nodes).toHaveCount(before + 2);
  await expect(page.locator('[data-part="U8"]')).toContainText('Valve driver board');
  await expect(page.locator('[data-part="U9"]')).toContainText('Display module');
  const pasted = page.locator('.react-flow__edge[data-id$=":U8.SLEEP:U9.SLEEP"] .rc-wire');
  await expect(pasted).toHaveCount(1);
  await expect(pasted).toHaveAttribute('data-severity', /.+/);
  await expect(page.locator('.rc-wire')).toHaveCount(wiresBefore + 1);
  // The pasted chips are the selection: arrow keys move them, one undo step per press.
  await expect(page.locator('.react-flow__node.selected')).toHaveCount(2);
  const at = await page.locator('.react-flow__node[data-id="U8"]').boundingBox();
  await page.keyboard.press('ArrowRight');
  await expect
    .poll(async () => (await page.locator('.react-flow__node[data-id="U8"]').boundingBox())?.x ?? 0)
    .toBeGreaterThan((at?.x ?? 0) + 1);
  await page.keyboard.press('Control+z');
  await page.keyboard.press('Control+z');
  await expect(nodes).toHaveCount(before);
});

test('the shortcut list opens with "?" and says what the keys do', async ({ page }) => {
  await page.goto('/');
  await expect(page.locator('.rc-wire').first()).toBeVisible();
  await onCanvas(page, '?');
  const list = page.getByTestId('shortcuts');
  await expect(list).toBeVisible();
  await expect(list.getByRole('heading', { name: 'Keyboard shortcuts' })).toBeVisible();
  await expect(list).toContainText('duplicate the selected chips');
  await page.keyboard.press('Escape');
  await expect(list).toHaveCount(0);
});

test('every chip is drawn exactly at the size its node is given (the canvas contains each chip strictly)', async ({
  page,
}) => {
  await page.goto('/');
  await expect(page.locator('.rc-wire').first()).toBeVisible();
  await fitAll(page);
  const sizes = await page.locator('.react-flow__node').evaluateAll((nodes) =>
    nodes.map((n) => {
      const chip = n.firstElementChild as HTMLElement;
      // The chip's margin (6 px each side, styles.css) holds the outer half of each handle.
      return {
        id: n.getAttribute('data-id'),
        node: [(n as HTMLElement).offsetWidth, (n as HTMLElement).offsetHeight],
        chip: [chip.offsetWidth + 12, chip.offsetHeight + 12],
      };
    }),
  );
  expect(sizes.length).toBeGreaterThan(5);
  for (const s of sizes) expect({ id: s.id, size: s.chip }).toEqual({ id: s.id, size: s.node });
});

test('Shift+drag on the canvas selects the chips inside the box; Delete removes them in one step', async ({ page }) => {
  await page.goto('/');
  await expect(page.locator('.rc-wire').first()).toBeVisible();
  const a = await page.locator('.react-flow__node[data-id="U6"]').boundingBox();
  const b = await page.locator('.react-flow__node[data-id="U7"]').boundingBox();
  if (a === null || b === null) throw new Error('U6 or U7 not in view');
  await page.keyboard.down('Shift');
  await page.mouse.move(Math.min(a.x, b.x) - 8, Math.min(a.y, b.y) - 8);
  await page.mouse.down();
  await page.mouse.move(Math.max(a.x + a.width, b.x + b.width) + 8, Math.max(a.y + a.height, b.y + b.height) + 8, {
    steps: 10,
  });
  await page.mouse.up();
  await page.keyboard.up('Shift');
  await expect(page.locator('.react-flow__node.selected')).toHaveCount(2);
  const ids = await page
    .locator('.react-flow__node.selected')
    .evaluateAll((ns) => ns.map((n) => n.getAttribute('data-id')).sort());
  expect(ids).toEqual(['U6', 'U7']);
  await page.keyboard.press('Delete');
  await expect(page.locator('.react-flow__node[data-id="U6"]')).toHaveCount(0);
  await expect(page.locator('.react-flow__node[data-id="U7"]')).toHaveCount(0);
  await page.keyboard.press('Control+z');
  await expect(page.locator('.react-flow__node[data-id="U6"]')).toHaveCount(1);
  await expect(page.locator('.react-flow__node[data-id="U7"]')).toHaveCount(1);
});

test('a rule with many findings lists the first 60 and shows the rest on request', async ({ page }) => {
  // A test bench of our own: 75 spare gates whose enable inputs are left on no net, each one a
  // floating-input warning (an unused CMOS input floats: common practice).
  const parts = Array.from({ length: 75 }, (_, k) => ({
    id: `G${k + 1}`,
    label: `Spare gate ${k + 1}`,
    rail: '3v3',
    profile: '74lvc',
    position: { x: (k % 15) * 240, y: Math.floor(k / 15) * 140 },
    pins: [{ id: 'EN', role: 'input', side: 'left' }],
  }));
  const design = {
    format: 'railcross.design',
    version: 1,
    title: 'Spare gate bench',
    rails: [{ id: '3v3', label: '3.3 V', nominal: 3.3, tolerance: 0.05 }],
    parts,
    nets: [],
  };
  await page.goto('/');
  await expect(page.locator('.react-flow__node').first()).toBeVisible();
  await page.getByTestId('open-library').click();
  await page.getByTestId('import-file').setInputFiles({
    name: 'spare-gates.railcross.json',
    mimeType: 'application/json',
    buffer: Buffer.from(JSON.stringify(design)),
  });
  await expect(page.getByTestId('design-title')).toHaveValue('Spare gate bench');

  const rows = page.locator('.rc-finding[data-rule="floating-input"]');
  await expect(page.locator('[data-count="warning"]')).toContainText('75 warnings');
  await expect(rows).toHaveCount(60);
  await page.getByTestId('more-floating-input').click();
  await expect(rows).toHaveCount(75);
  await expect(page.getByTestId('more-floating-input')).toHaveCount(0);
});

test("the details panel fits its column: rails, power states and a part's fields stay inside it", async ({ page }) => {
  await page.goto('/');
  await expect(page.locator('.react-flow__node').first()).toBeVisible();
  const outside = () =>
    page.locator('.rc-details').evaluate((panel) => {
      const edge = panel.getBoundingClientRect().right + 0.5;
      return [...panel.querySelectorAll('input, select, button, table')]
        .filter((e) => e.getBoundingClientRect().width > 0 && e.getBoundingClientRect().right > edge)
        .map((e) => e.outerHTML.slice(0, 60));
    });
  await page.getByText('Rails', { exact: true }).click();
  await page.getByText('Power states', { exact: true }).click();
  await expect(page.locator('.rc-rail-row').first()).toBeVisible();
  expect(await outside()).toEqual([]);
  await page.locator('.react-flow__node[data-id="U1"] .rc-chip-head').click();
  await expect(page.locator('.rc-details')).toContainText('Irrigation controller');
  expect(await outside()).toEqual([]);
});
