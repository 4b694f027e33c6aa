/** The PDF report's file name; no jsPDF here, so that the editor can name a file before loading it. */

/**
 * A safe file name for a design's PDF report: the title as a lower-case ASCII slug (accents
 * dropped, anything else between words a single `-`, at most 60 characters) plus
 * `-report.pdf`; `railcross-report.pdf` when the title leaves nothing.
 *
 * @example reportPdfFileName('Greenhouse irrigation controller') === 'greenhouse-irrigation-controller-report.pdf'
 */
export function reportPdfFileName(title: string): string {
  return `${slugOf(title, 'railcross')}-report.pdf`;
}

/**
 * A title as a safe file name stem: lower-case ASCII letters and digits, accents dropped,
 * anything else between words one `-`, at most 60 characters; `fallback` when nothing is left.
 * The editor names design files and JSON reports with it too.
 */
export function slugOf(title: string, fallback = 'railcross-design'): string {
  const slug = title
    .normalize('NFKD')
    .replace(/\p{M}+/gu, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .slice(0, 60)
    .replace(/^-+|-+$/g, '');
  return slug === '' ? fallback : slug;
}
