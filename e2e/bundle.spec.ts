/**
 * What the page loads: no script of the production build over 500 kB (the size above which the
 * bundler warns), and the PDF writer and its fonts only when a PDF report is exported.
 */
import { expect, test } from '@playwright/test';

/** The PDF writer's chunk, the libraries only it uses (jsPDF, html2canvas, DOMPurify) and the fonts. */
const PDF_ONLY = /reportPdf-|html2canvas|purify|jspdf|\.ttf$/i;

test('the editor opens without the PDF writer and its fonts, in scripts under 500 kB; export loads them', async ({
  page,
}) => {
  const loaded: { url: string; bytes: number }[] = [];
  page.on('response', async (response) => {
    const url = response.url();
    if (!/\/assets\//.test(url)) return;
    const body = await response.body().catch(() => Buffer.alloc(0));
    loaded.push({ url: url.replace(/^.*\/assets\//, ''), bytes: body.length });
  });
  await page.goto('/');
  await expect(page.locator('.rc-wire').first()).toBeVisible();
  await page.waitForLoadState('networkidle');

  const scripts = loaded.filter((r) => r.url.endsWith('.js'));
  expect(scripts.length).toBeGreaterThan(3);
  expect(scripts.filter((r) => r.bytes > 500_000)).toEqual([]);
  expect(loaded.filter((r) => PDF_ONLY.test(r.url)).map((r) => r.url)).toEqual([]);

  await page.getByTestId('export-menu').click();
  const download = page.waitForEvent('download');
  await page.getByTestId('export-report-pdf').click();
  expect((await download).suggestedFilename()).toMatch(/\.pdf$/);
  const later = loaded.filter((r) => PDF_ONLY.test(r.url)).map((r) => r.url);
  expect(later.filter((u) => u.endsWith('.ttf'))).toHaveLength(3);
  expect(later.some((u) => u.startsWith('reportPdf-'))).toBe(true);
  // The PDF writer's own chunk is under the limit too.
  expect(loaded.filter((r) => r.url.endsWith('.js') && r.bytes > 500_000)).toEqual([]);
});
