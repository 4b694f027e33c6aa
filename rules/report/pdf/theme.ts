/**
 * The report's look: a quiet technical page, slate ink on white, hairline rules, one muted
 * blue accent, and severity shown by shape and weight as well as colour, so that a greyscale
 * print still tells an error from a warning.
 */
import type { jsPDF } from 'jspdf';

export type Rgb = readonly [number, number, number];

export const INK: Rgb = [31, 41, 51];
export const INK_2: Rgb = [61, 74, 85];
export const MUTED: Rgb = [107, 119, 130];
export const HAIRLINE: Rgb = [200, 205, 201];
export const PANEL: Rgb = [237, 239, 235];
export const ZEBRA: Rgb = [248, 248, 246];
export const ACCENT: Rgb = [44, 110, 143];
export const WHITE: Rgb = [255, 255, 255];

/** Worst unwaived severity of a net, as the diagram and the tables show it. */
export type Status = 'error' | 'warning' | 'clean';

export const STATUS_COLOUR: Readonly<Record<Status | 'info', Rgb>> = {
  error: [178, 34, 44],
  warning: [168, 98, 0],
  info: [86, 104, 124],
  clean: [92, 102, 112],
};
/** The pale casing under an error wire, and the tint of a failing table cell. */
export const ERROR_SOFT: Rgb = [244, 208, 210];
export const WARNING_SOFT: Rgb = [253, 240, 214];

/** A rail without a colour of its own. */
export const RAIL_DEFAULT: Rgb = [122, 133, 144];

/** Paper sizes in points (ISO 216 A4, 210 × 297 mm; US Letter, 8.5 × 11 in). */
export const PAPER = { a4: [595.28, 841.89], letter: [612, 792] } as const;
export type Paper = keyof typeof PAPER;

/** Page margins in points; the top and bottom leave room for the running header and footer. */
export const MARGIN = { left: 42, right: 42, top: 62, bottom: 54 } as const;

/** Body text sizes in points. */
export const SIZE = { title: 22, h1: 14, h2: 10.5, body: 9, small: 7.5, table: 7.5 } as const;

export const setDraw = (doc: jsPDF, c: Rgb): unknown => doc.setDrawColor(c[0], c[1], c[2]);
export const setFill = (doc: jsPDF, c: Rgb): unknown => doc.setFillColor(c[0], c[1], c[2]);
export const setText = (doc: jsPDF, c: Rgb): unknown => doc.setTextColor(c[0], c[1], c[2]);

/** `#rgb` or `#rrggbb` (a rail's `colour`); anything else, e.g. a named CSS colour, is `undefined`. */
export function parseHexColour(css: string | undefined): Rgb | undefined {
  if (css === undefined) return undefined;
  const m = /^#([0-9a-f]{3}|[0-9a-f]{6})$/i.exec(css.trim());
  if (m === null) return undefined;
  const hex = m[1]!.length === 3 ? [...m[1]!].map((c) => c + c).join('') : m[1]!;
  return [parseInt(hex.slice(0, 2), 16), parseInt(hex.slice(2, 4), 16), parseInt(hex.slice(4, 6), 16)];
}

/**
 * Draws a severity mark centred on (x, y), `size` points across: a filled square turned on
 * its corner for an error, a hollow triangle for a warning, a hollow circle for info, a
 * small tick-free dot for clean. Distinct in outline, so colour is never the only cue.
 */
export function drawSeverityMark(doc: jsPDF, status: Status | 'info', x: number, y: number, size: number): void {
  const r = size / 2;
  const c = STATUS_COLOUR[status];
  setDraw(doc, c);
  doc.setLineDashPattern([], 0);
  doc.setLineWidth(Math.max(0.3, size / 9));
  if (status === 'error') {
    setFill(doc, c);
    doc.moveTo(x, y - r);
    doc.lineTo(x + r, y);
    doc.lineTo(x, y + r);
    doc.lineTo(x - r, y);
    doc.close();
    doc.fill();
  } else if (status === 'warning') {
    setFill(doc, WARNING_SOFT);
    doc.triangle(x, y - r, x + r, y + r * 0.8, x - r, y + r * 0.8, 'FD');
  } else if (status === 'info') {
    doc.circle(x, y, r * 0.8, 'S');
  } else {
    setFill(doc, c);
    doc.circle(x, y, r * 0.35, 'F');
  }
}
