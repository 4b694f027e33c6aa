/** The PDF report's file name; no jsPDF here, so that the editor can name a file before loading it. */

/**
 * A safe file name for a design's PDF report: the title as a lower-case ASCII slug (accents
 * dropped, anything else between words a single `-`, at most 60 characters) plus
 * `-report.pdf`; `railcross-report.pdf` when the title leaves nothing.
 *
 * @example reportPdfFileName('Greenhouse irrigation controller') === 'greenhouse-irrigation-controller-report.pdf'
 */
export function reportPdfFileName(title: string): string {
  const slug = title
    .normalize('NFKD')
    .replace(/\p{M}+/gu, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .slice(0, 60)
    .replace(/^-+|-+$/g, '');
  return `${slug === '' ? 'railcross' : slug}-report.pdf`;
}
