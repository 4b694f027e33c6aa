/** What the browser tests share: wiring two pins by dragging, a wire's uncovered point, a page's problems. */
import type { Locator, Page } from '@playwright/test';
import { settledBox, viewSettled } from './settled.ts';

/**
 * The middle of an element once it has stopped moving (its box unchanged over two animation
 * frames): a view fitted with an animation moves every handle for a moment.
 */
export async function centre(locator: Locator): Promise<{ x: number; y: number }> {
  const box = await settledBox(locator);
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

/** Console errors, page errors and CSP violations of a page, to be empty at the end. */
export function watch(page: Page): string[] {
  const problems: string[] = [];
  page.on('console', (m) => {
    if (m.type() === 'error') problems.push(`console: ${m.text()}`);
  });
  page.on('pageerror', (e) => problems.push(`page error: ${e.message}`));
  void page.addInitScript(() => {
    document.addEventListener('securitypolicyviolation', (e) =>
      console.error(`CSP violation: ${e.violatedDirective} ${e.blockedURI}`),
    );
  });
  return problems;
}

/** A point of a drawn wire (`.react-flow__edge`) that nothing else covers, in page coordinates, to hover it. */
export async function uncoveredPoint(edge: Locator): Promise<{ x: number; y: number }> {
  return edge.locator('path.react-flow__edge-path').evaluate((el) => {
    const path = el as SVGPathElement;
    const m = path.getScreenCTM()!;
    const length = path.getTotalLength();
    for (let k = 1; k < 40; k++) {
      const p = path.getPointAtLength((length * k) / 40);
      const x = p.x * m.a + p.y * m.c + m.e;
      const y = p.x * m.b + p.y * m.d + m.f;
      if (document.elementFromPoint(x, y)?.closest('.react-flow__edge') === path.closest('.react-flow__edge'))
        return { x, y };
    }
    throw new Error('the wire is covered everywhere');
  });
}

/**
 * The whole board in view (the fit button: F does the same). The example opens on its errors at a
 * readable zoom, and the canvas draws only what is in view: a test that reads every chip or wire
 * of it fits first, and reads once the view has stopped moving.
 */
export async function fitAll(page: Page): Promise<void> {
  await page.locator('.react-flow__controls-fitview').click();
  await viewSettled(page);
}
