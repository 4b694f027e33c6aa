/**
 * Stands in, in the command line's build only (rules/cli/vite.config.ts), for the packages jsPDF loads
 * for features the report never uses (HTML and SVG rendering: html2canvas, canvg, DOMPurify),
 * so that the PDF chunk a fresh process must parse is half the size.
 */
export default function unavailable(): never {
  throw new Error('not part of the railcross command line');
}
