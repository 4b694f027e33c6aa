/**
 * The waits of settled.ts on a page of their own: each resolves on the condition it names, and
 * when the condition never comes it throws within its limit, saying what it waited for, rather
 * than letting the test go on as if it had come.
 */
import { expect, test } from '@playwright/test';
import { settledBox, viewSettled } from './settled.ts';

/** A stand-in canvas: a `.react-flow__viewport` whose transform moves `frames` times (forever when -1), one step a frame. */
const PAGE = (frames: number) => `
<body style="margin: 0">
<div class="react-flow__viewport" style="transform: translate(0px, 0px) scale(1)">
  <div id="box" style="position: absolute; left: 0; top: 0; width: 20px; height: 20px"></div>
</div>
<script>
  let k = 0;
  const step = () => {
    if (${frames} >= 0 && k >= ${frames}) return;
    k += 1;
    document.querySelector('.react-flow__viewport').style.transform = 'translate(' + k + 'px, 0px) scale(1)';
    document.getElementById('box').style.left = k + 'px';
    requestAnimationFrame(step);
  };
  requestAnimationFrame(step);
</script>`;

test('a view that moves for 20 frames settles where it stopped; its box too', async ({ page }) => {
  await page.setContent(PAGE(20));
  expect(await viewSettled(page, { from: 'translate(0px, 0px) scale(1)' })).toBe('translate(20px, 0px) scale(1)');
  // Its own left (20 px) inside the view moved by 20 px.
  expect((await settledBox(page.locator('#box'))).x).toBe(40);
});

test('a view that never stops: the wait fails within its limit and says so', async ({ page }) => {
  await page.setContent(PAGE(-1));
  await expect(viewSettled(page, { timeout: 500 })).rejects.toThrow(/still changing after 500 ms/);
  await expect(settledBox(page.locator('#box'), 500)).rejects.toThrow(/box of .* still changing after 500 ms/);
});

test('a view that must move and never does: the wait fails and says from where', async ({ page }) => {
  await page.setContent(PAGE(0));
  await expect(viewSettled(page, { from: 'translate(0px, 0px) scale(1)', timeout: 500 })).rejects.toThrow(
    /never moved from translate\(0px, 0px\) scale\(1\) within 500 ms/,
  );
});
