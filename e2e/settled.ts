/**
 * Waits on what a test means by "once it has settled", instead of fixed sleeps: a sleep long
 * enough on a loaded 2-core machine is needlessly long everywhere else, and one that is too short
 * lets a test read a view in mid-flight and pass or fail by luck. Each wait here has a limit and
 * throws, saying what never came, when it is reached.
 */
import { expect, type Locator, type Page } from '@playwright/test';

/** The canvas's pan and zoom: the style transform React Flow sets on `.react-flow__viewport`. */
export function viewTransform(page: Page): Promise<string> {
  return page.locator('.react-flow__viewport').evaluate((el) => (el as HTMLElement).style.transform);
}

/**
 * Runs in the page: resolves with what `el`'s box (or, without `el`, the canvas's view transform)
 * reads once it has read the same in three animation frames in a row, and, with `from`, only after
 * it has first read something else. Written without named inner functions: the benchmark runs
 * under tsx, whose build gives every named function a helper call that the page does not have.
 */
const stillOverTwoFrames = async ({
  el,
  from,
  timeout,
  what,
}: {
  el: Element | null;
  from: string | undefined;
  timeout: number;
  what: string;
}): Promise<string> => {
  let last: string | undefined;
  let moved = from === undefined;
  let same = 0;
  let over = false;
  let timer: ReturnType<typeof setTimeout> | undefined;
  const limit = new Promise<never>((_, reject) => {
    timer = setTimeout(() => {
      over = true;
      reject(
        new Error(
          moved
            ? `${what} still changing after ${timeout} ms (last: ${last})`
            : `${what} never moved from ${from} within ${timeout} ms`,
        ),
      );
    }, timeout);
  });
  const still = (async () => {
    while (!over) {
      let value: string;
      if (el === null)
        value =
          document.querySelector<HTMLElement>('.react-flow__viewport')?.style.transform ?? 'no .react-flow__viewport';
      else {
        const r = el.getBoundingClientRect();
        value = `${r.x},${r.y},${r.width},${r.height}`;
      }
      if (!moved && value !== from) moved = true;
      same = value === last ? same + 1 : 0;
      last = value;
      if (moved && same >= 2) return value;
      await new Promise((r) => requestAnimationFrame(r));
    }
    return last ?? '';
  })();
  try {
    return await Promise.race([still, limit]);
  } finally {
    clearTimeout(timer);
  }
};

/**
 * Waits until the canvas's view has stopped moving: its transform unchanged over two animation
 * frames (an animated fit changes it every frame until it ends). `from`, the transform before the
 * action, when the action must move the view (F or Shift+F after a change of what is on screen):
 * then it first waits for the transform to differ from it, since an animated fit starts a frame or
 * two after its key and the old view can look still meanwhile. The view is looked up each frame
 * (reopening a design draws a new canvas). Returns the settled transform.
 */
export function viewSettled(page: Page, options: { from?: string; timeout?: number } = {}): Promise<string> {
  return page.evaluate(stillOverTwoFrames, {
    el: null,
    from: options.from,
    timeout: options.timeout ?? 10_000,
    what: 'the canvas view (.react-flow__viewport transform)',
  });
}

/**
 * An element's box once it has stopped moving (unchanged over two animation frames): a view fitted
 * with an animation moves every handle for a moment, and a slow machine may still be inside it.
 */
export async function settledBox(
  locator: Locator,
  timeout = 10_000,
): Promise<{ x: number; y: number; width: number; height: number }> {
  await expect(locator, 'the element to measure').toBeVisible({ timeout });
  const el = await locator.elementHandle({ timeout });
  if (el === null) throw new Error(`${locator} is not on the page`);
  try {
    const box = await locator
      .page()
      .evaluate(stillOverTwoFrames, { el, from: undefined, timeout, what: `the box of ${locator}` });
    const [x, y, width, height] = box.split(',').map(Number) as [number, number, number, number];
    return { x, y, width, height };
  } finally {
    await el.dispose();
  }
}

/** Every wire drawn on its route: none left with the straight stand-in the canvas draws until its route comes. */
export async function wiresRouted(page: Page, timeout = 30_000): Promise<void> {
  await expect(page.locator('.rc-wire[data-routed="no"]'), 'wires still waiting for their route').toHaveCount(0, {
    timeout,
  });
}

/**
 * The canvas at rest after a change of view: the view still (see viewSettled), then every chip it
 * draws measured (React Flow hides a node until it has its size, and draws its wires after) and
 * every drawn wire on its route. For the benchmark, whose figures must not include the drawing
 * the view change left behind; without `expect`, which needs a running test.
 */
export async function canvasSettled(page: Page, options: { from?: string; timeout?: number } = {}): Promise<string> {
  const timeout = options.timeout ?? 10_000;
  const view = await viewSettled(page, { ...options, timeout });
  try {
    await page.waitForFunction(
      () =>
        ![...document.querySelectorAll<HTMLElement>('.react-flow__node')].some(
          (n) => n.style.visibility === 'hidden',
        ) && document.querySelector('.rc-wire[data-routed="no"]') === null,
      null,
      { timeout, polling: 'raf' },
    );
  } catch (e) {
    throw new Error(
      `the canvas did not draw every chip measured and every wire routed within ${timeout} ms: ${(e as Error).message}`,
    );
  }
  return view;
}
