/** Gestures the browser tests share: wiring two pins by dragging between their handles. */
import type { Locator, Page } from '@playwright/test';

export async function centre(locator: Locator): Promise<{ x: number; y: number }> {
  const box = await locator.boundingBox();
  if (box === null) throw new Error('not visible');
  return { x: box.x + box.width / 2, y: box.y + box.height / 2 };
}

/** Drag from one pin's handle to another's, as a hand would. */
export async function wire(page: Page, from: Locator, to: Locator): Promise<void> {
  const a = await centre(from);
  const b = await centre(to);
  await page.mouse.move(a.x, a.y);
  await page.mouse.down();
  await page.mouse.move((a.x + b.x) / 2, (a.y + b.y) / 2, { steps: 8 });
  await page.mouse.move(b.x, b.y, { steps: 8 });
  await page.mouse.up();
}

/** A pin's handle on the canvas. */
export const handle = (page: Page, part: string, pin: string) =>
  page.locator(`.react-flow__node[data-id="${part}"] .react-flow__handle[data-handleid="${pin}"]`);
