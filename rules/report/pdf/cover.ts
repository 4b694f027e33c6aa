/**
 * The cover: what was checked, when, by which version, the verdict in one line, the counts,
 * the power states and rails, and a contents list whose page numbers are filled in last.
 */
import { autoTable } from 'jspdf-autotable';
import type { Design } from '../../model/schema.ts';
import { formatQuantity } from '../../levels/units.ts';
import { railRange } from '../../levels/rails.ts';
import type { Report } from '../reportSchema.ts';
import { designLine, settingsLine } from '../describe.ts';
import { verdict } from '../verdict.ts';
import { contentWidth, displayTime, type Ctx } from './page.ts';
import {
  ACCENT,
  ERROR_SOFT,
  HAIRLINE,
  INK,
  INK_2,
  MARGIN,
  MUTED,
  PANEL,
  RAIL_DEFAULT,
  SIZE,
  STATUS_COLOUR,
  WHITE,
  drawSeverityMark,
  parseHexColour,
  setDraw,
  setFill,
  setText,
  type Rgb,
} from './theme.ts';

const rgb = (c: Rgb): [number, number, number] => [c[0], c[1], c[2]];
const PASS_SOFT: Rgb = [222, 238, 229];
const PASS: Rgb = [40, 110, 76];

/**
 * Draws the cover on the current (first) page, keeping room for a contents list of
 * `sectionCount` lines above the tables (which may run on to another page when a design has
 * many power states or rails); returns where that list goes.
 */
export function drawCover(ctx: Ctx, report: Report, design: Design, sectionCount: number): number {
  const { doc } = ctx;
  const left = MARGIN.left;
  const width = contentWidth(doc);
  let y = 56;

  doc.setFont(ctx.fonts.sans, 'bold');
  doc.setFontSize(8);
  setText(doc, ACCENT);
  doc.text('RAILCROSS  ·  SIGNAL-LEVEL CHECK REPORT', left, y);
  setDraw(doc, ACCENT);
  doc.setLineWidth(1.2);
  doc.line(left, y + 6, left + width, y + 6);
  y += 34;

  doc.setFontSize(SIZE.title);
  setText(doc, INK);
  const title = doc.splitTextToSize(
    report.design.title === '' ? '(untitled design)' : report.design.title,
    width,
  ) as string[];
  for (const line of title.slice(0, 4)) {
    doc.text(line, left, y);
    y += SIZE.title * 1.2;
  }
  y += 4;

  const facts: [string, string][] = [
    ['Generated', displayTime(report.generatedAt)],
    ['Tool', report.tool],
    ['Design', designLine(report)],
    ['Settings', settingsLine(report)],
  ];
  doc.setFontSize(SIZE.body);
  for (const [key, value] of facts) {
    doc.setFont(ctx.fonts.sans, 'bold');
    setText(doc, MUTED);
    doc.text(key, left, y);
    doc.setFont(ctx.fonts.sans, 'normal');
    setText(doc, INK);
    const lines = doc.splitTextToSize(value, width - 70) as string[];
    lines.forEach((line, k) => {
      doc.text(line, left + 70, y + k * 12);
    });
    y += 12 * lines.length + 3;
  }
  y += 10;

  // The verdict: a box with a bar and a mark in its colour, so that it reads in greyscale too.
  const v = verdict(report);
  doc.setFont(ctx.fonts.sans, 'bold');
  doc.setFontSize(11);
  const lines = doc.splitTextToSize(v.line, width - 40) as string[];
  const boxH = 16 + lines.length * 14;
  setFill(doc, v.fails ? ERROR_SOFT : PASS_SOFT);
  doc.rect(left, y, width, boxH, 'F');
  setFill(doc, v.fails ? STATUS_COLOUR.error : PASS);
  doc.rect(left, y, 4, boxH, 'F');
  if (v.fails) drawSeverityMark(doc, 'error', left + 18, y + 8 + 10 - 3.5, 10);
  else {
    setDraw(doc, PASS);
    doc.setLineWidth(1.6);
    doc.line(left + 13, y + 14, left + 17, y + 18);
    doc.line(left + 17, y + 18, left + 24, y + 9);
  }
  setText(doc, v.fails ? STATUS_COLOUR.error : PASS);
  lines.forEach((line, k) => {
    doc.text(line, left + 32, y + 8 + 10 + k * 14);
  });
  y += boxH + 14;

  // Counts of unwaived findings, and the waived ones.
  const s = report.summary;
  const tiles: [string, number, Rgb][] = [
    ['errors', s.error, STATUS_COLOUR.error],
    ['warnings', s.warning, STATUS_COLOUR.warning],
    ['info', s.info, STATUS_COLOUR.info],
    ['waived', s.waived, MUTED],
  ];
  const gap = 8;
  const tileW = (width - gap * 3) / 4;
  tiles.forEach(([label, n, colour], k) => {
    const x = left + k * (tileW + gap);
    setDraw(doc, HAIRLINE);
    doc.setLineWidth(0.6);
    setFill(doc, WHITE);
    doc.rect(x, y, tileW, 44, 'FD');
    doc.setFont(ctx.fonts.sans, 'bold');
    doc.setFontSize(18);
    setText(doc, n > 0 ? colour : MUTED);
    doc.text(String(n), x + 10, y + 24);
    doc.setFont(ctx.fonts.sans, 'normal');
    doc.setFontSize(SIZE.small);
    setText(doc, INK_2);
    doc.text(label, x + 10, y + 36);
  });
  y += 44 + 8;
  doc.setFontSize(SIZE.small);
  setText(doc, MUTED);
  doc.text('Unwaived findings over every power state checked; a waived finding counts only as waived.', left, y + 6);
  y += 26;
  const contentsY = y;
  y += 18 + sectionCount * 14 + 14;

  const table = (
    title: string,
    head: string[],
    body: string[][],
    widths: Record<number, number | 'auto'>,
    swatches?: (Rgb | undefined)[],
  ) => {
    doc.setFont(ctx.fonts.sans, 'bold');
    doc.setFontSize(SIZE.h2);
    setText(doc, INK);
    doc.text(title, left, y);
    autoTable(doc, {
      startY: y + 5,
      theme: 'plain',
      margin: { left, right: MARGIN.right, top: MARGIN.top, bottom: MARGIN.bottom },
      head: [head],
      body,
      styles: {
        font: ctx.fonts.sans,
        fontSize: SIZE.table,
        textColor: rgb(INK),
        cellPadding: 3,
        lineColor: rgb(HAIRLINE),
        lineWidth: { bottom: 0.4 },
        overflow: 'linebreak',
      },
      headStyles: { fontStyle: 'bold', fillColor: rgb(PANEL), lineColor: rgb(INK_2), lineWidth: { bottom: 0.7 } },
      columnStyles: Object.fromEntries(
        Object.entries(widths).map(([k, w]) => [k, { cellWidth: w, ...(k === '0' ? { font: ctx.fonts.mono } : {}) }]),
      ),
      didParseCell: (data) => {
        if (swatches !== undefined && data.section === 'body' && data.column.index === 0)
          data.cell.styles.cellPadding = { top: 3, bottom: 3, left: 14, right: 3 };
      },
      didDrawCell: (data) => {
        const colour = swatches?.[data.row.index];
        if (data.section !== 'body' || data.column.index !== 0 || colour === undefined) return;
        setFill(doc, colour);
        doc.rect(data.cell.x + 4, data.cell.y + 4, 6, 6, 'F');
      },
    });
    y = (doc as unknown as { lastAutoTable: { finalY: number } }).lastAutoTable.finalY + 16;
  };

  table(
    'Power states checked',
    ['Id', 'Label', 'Rails off'],
    report.scenarios.map((st) => [st.id, st.label, st.off.length === 0 ? 'none' : st.off.join(', ')]),
    { 0: 90, 1: 'auto', 2: 150 },
  );
  if (design.rails.length > 0) {
    table(
      'Rails',
      ['Id', 'Label', 'Nominal', 'Range checked'],
      design.rails.map((r) => {
        const range = railRange(r);
        return [
          r.id,
          r.label,
          formatQuantity(r.nominal, 'V'),
          `${formatQuantity(range.min, 'V')} to ${formatQuantity(range.max, 'V')}`,
        ];
      }),
      { 0: 90, 1: 'auto', 2: 60, 3: 110 },
      design.rails.map((r) => parseHexColour(r.colour) ?? RAIL_DEFAULT),
    );
  }
  return contentsY;
}

/** The contents list at `y` on the cover, once every section's page is known. */
export function drawContents(ctx: Ctx, y: number): void {
  const { doc } = ctx;
  doc.setPage(1);
  const left = MARGIN.left;
  const right = left + contentWidth(doc);
  doc.setFont(ctx.fonts.sans, 'bold');
  doc.setFontSize(SIZE.h2);
  setText(doc, INK);
  doc.text('Contents', left, y);
  doc.setFontSize(SIZE.body);
  let at = y + 15;
  for (const { title, page } of ctx.sections) {
    doc.setFont(ctx.fonts.sans, 'normal');
    setText(doc, INK);
    doc.text(title, left, at);
    const number = String(page);
    doc.text(number, right, at, { align: 'right' });
    setDraw(doc, HAIRLINE);
    doc.setLineWidth(0.5);
    doc.setLineDashPattern([0.8, 2.2], 0);
    doc.line(left + doc.getTextWidth(title) + 6, at - 1, right - doc.getTextWidth(number) - 6, at - 1);
    doc.setLineDashPattern([], 0);
    at += 14;
  }
}
