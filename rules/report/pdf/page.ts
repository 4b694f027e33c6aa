/**
 * Page geometry and flowing text: headings and paragraphs that move to a new page when the
 * current one is full, and the running header and footer drawn once every page exists (only
 * then is "page N of M" known).
 */
import type { jsPDF } from 'jspdf';
import type { FontNames } from './fonts.ts';
import { HAIRLINE, INK, MARGIN, MUTED, SIZE, setDraw, setText, type Paper } from './theme.ts';

/** What every drawing module needs: the document, its fonts, and the paper. */
export interface Ctx {
  readonly doc: jsPDF;
  readonly fonts: FontNames;
  readonly paper: Paper;
  /** Where each section starts, for the contents list on the cover. */
  readonly sections: { title: string; page: number }[];
}

export const pageWidth = (doc: jsPDF): number => doc.internal.pageSize.getWidth();
export const pageHeight = (doc: jsPDF): number => doc.internal.pageSize.getHeight();
export const contentWidth = (doc: jsPDF): number => pageWidth(doc) - MARGIN.left - MARGIN.right;
export const bottomLimit = (doc: jsPDF): number => pageHeight(doc) - MARGIN.bottom;

/** Starts a page in the paper's size and the given orientation; returns the first line's y. */
export function addPage(ctx: Ctx, orientation: 'portrait' | 'landscape' = 'portrait'): number {
  ctx.doc.addPage(ctx.paper, orientation);
  return MARGIN.top;
}

/** `y` if `need` points still fit below it on this page, else the top of a new portrait page. */
export function ensureRoom(ctx: Ctx, y: number, need: number): number {
  return y + need <= bottomLimit(ctx.doc) ? y : addPage(ctx);
}

/** `text` cut to `width` points in the current font, with an ellipsis when it had to be cut. */
export function fitText(doc: jsPDF, text: string, width: number): string {
  if (width <= 0) return '';
  if (doc.getTextWidth(text) <= width) return text;
  const chars = [...text];
  let lo = 0;
  let hi = chars.length;
  while (lo < hi) {
    const mid = Math.ceil((lo + hi) / 2);
    if (doc.getTextWidth(`${chars.slice(0, mid).join('')}…`) <= width) lo = mid;
    else hi = mid - 1;
  }
  return lo === 0 ? '' : `${chars.slice(0, lo).join('')}…`;
}

/**
 * A section heading at the top of the room left (a new page when less than `keep` points
 * would follow it on this one); records the section for the contents. Returns the next y.
 */
export function sectionHeading(ctx: Ctx, y: number, title: string, keep = 90): number {
  const { doc } = ctx;
  const top = y <= MARGIN.top ? y : ensureRoom(ctx, y + 14, 24 + keep);
  ctx.sections.push({ title, page: doc.getNumberOfPages() });
  doc.setFont(ctx.fonts.sans, 'bold');
  doc.setFontSize(SIZE.h1);
  setText(doc, INK);
  doc.text(title, MARGIN.left, top + SIZE.h1 * 0.8);
  setDraw(doc, HAIRLINE);
  doc.setLineWidth(0.6);
  doc.setLineDashPattern([], 0);
  doc.line(MARGIN.left, top + SIZE.h1 + 5, MARGIN.left + contentWidth(doc), top + SIZE.h1 + 5);
  return top + SIZE.h1 + 14;
}

/** A smaller heading inside a section. */
export function subHeading(ctx: Ctx, y: number, title: string, keep = 60): number {
  const { doc } = ctx;
  const top = ensureRoom(ctx, y + 6, SIZE.h2 + keep);
  doc.setFont(ctx.fonts.sans, 'bold');
  doc.setFontSize(SIZE.h2);
  setText(doc, INK);
  doc.text(title, MARGIN.left, top + SIZE.h2 * 0.8);
  return top + SIZE.h2 + 6;
}

/** Options of {@link paragraph}. */
export interface ParagraphOptions {
  readonly size?: number;
  readonly colour?: readonly [number, number, number];
  readonly bold?: boolean;
  readonly indent?: number;
  /** Drawn before the first line, hanging in the indent (e.g. "1."). */
  readonly bullet?: string;
  readonly after?: number;
}

/** Wrapped text from `y`, breaking to new pages as needed; returns the y below it. */
export function paragraph(ctx: Ctx, y: number, text: string, options: ParagraphOptions = {}): number {
  const { doc } = ctx;
  const size = options.size ?? SIZE.body;
  const indent = options.indent ?? 0;
  const lineHeight = size * 1.38;
  doc.setFont(ctx.fonts.sans, options.bold === true ? 'bold' : 'normal');
  doc.setFontSize(size);
  const lines = doc.splitTextToSize(text, contentWidth(doc) - indent) as string[];
  let at = y;
  lines.forEach((line, k) => {
    at = ensureRoom(ctx, at, lineHeight);
    // ensureRoom may have started a page: the font state carries over, the colour must be set per line.
    setText(doc, options.colour ?? INK);
    doc.setFont(ctx.fonts.sans, options.bold === true ? 'bold' : 'normal');
    doc.setFontSize(size);
    if (k === 0 && options.bullet !== undefined) doc.text(options.bullet, MARGIN.left + indent - 12, at + size);
    doc.text(line, MARGIN.left + indent, at + size);
    at += lineHeight;
  });
  return at + (options.after ?? 4);
}

/** `2026-01-01T00:00:00.000Z` → `2026-01-01 00:00 UTC`, whatever the reader's time zone. */
export function displayTime(iso: string): string {
  const m = /^(\d{4}-\d{2}-\d{2})T(\d{2}:\d{2})/.exec(iso);
  return m === null ? iso : `${m[1]} ${m[2]} UTC`;
}

/**
 * Draws the running header (the report's title, not on the cover, which shows it large) and
 * the footer (tool, "page N of M") on every page.
 */
export function drawFurniture(ctx: Ctx, title: string, tool: string, generatedAt: string): void {
  const { doc } = ctx;
  const total = doc.getNumberOfPages();
  for (let page = 1; page <= total; page++) {
    doc.setPage(page);
    const w = pageWidth(doc);
    const h = pageHeight(doc);
    const right = w - MARGIN.right;
    doc.setFontSize(SIZE.small);
    doc.setLineDashPattern([], 0);
    setDraw(doc, HAIRLINE);
    doc.setLineWidth(0.5);
    setText(doc, MUTED);
    if (page > 1) {
      doc.setFont(ctx.fonts.sans, 'normal');
      const when = displayTime(generatedAt);
      const room = right - MARGIN.left - doc.getTextWidth(when) - 24;
      doc.setFont(ctx.fonts.sans, 'bold');
      doc.text(fitText(doc, `Railcross report: ${title}`, room), MARGIN.left, 34);
      doc.setFont(ctx.fonts.sans, 'normal');
      doc.text(when, right, 34, { align: 'right' });
      doc.line(MARGIN.left, 40, right, 40);
    }
    doc.setFont(ctx.fonts.sans, 'normal');
    doc.line(MARGIN.left, h - 38, right, h - 38);
    doc.text(tool, MARGIN.left, h - 27);
    doc.text(`page ${page} of ${total}`, right, h - 27, { align: 'right' });
  }
}
