/**
 * The report's tables, drawn with jspdf-autotable: findings, rail crossings and the per-net
 * noise margins. Long names wrap inside their cells; the head repeats on every page.
 */
import type { jsPDF } from 'jspdf';
import { netNameIn, railNameIn } from '../reportNames.ts';
import { autoTable, type CellHookData, type RowInput, type Styles, type UserOptions } from 'jspdf-autotable';
import type { Design } from '../../model/schema.ts';
import type { CheckResult, LevelSide, NetAnalysis, PairAnalysis } from '../../engine/types.ts';
import { RULES } from '../../checks/index.ts';
import { formatMargin, formatQuantity } from '../../levels/units.ts';
import type { Report, ReportFinding } from '../reportSchema.ts';
import { plural } from '../verdict.ts';
import { paragraph, sectionHeading, type Ctx } from './page.ts';
import {
  ERROR_SOFT,
  HAIRLINE,
  INK,
  INK_2,
  MARGIN,
  MUTED,
  PANEL,
  SIZE,
  STATUS_COLOUR,
  WARNING_SOFT,
  drawSeverityMark,
  setText,
  type Rgb,
  type Status,
} from './theme.ts';

const rgb = (c: Rgb): [number, number, number] => [c[0], c[1], c[2]];

/** The look every table shares: hairlines between rows, a tinted head, text at the top of cells. */
export function baseTableOptions(ctx: Ctx, startY: number): UserOptions {
  return {
    startY,
    theme: 'plain',
    margin: { top: MARGIN.top, bottom: MARGIN.bottom, left: MARGIN.left, right: MARGIN.right },
    showHead: 'everyPage',
    rowPageBreak: 'avoid',
    styles: {
      font: ctx.fonts.sans,
      fontStyle: 'normal',
      fontSize: SIZE.table,
      textColor: rgb(INK),
      cellPadding: { top: 3, bottom: 3, left: 3.5, right: 3.5 },
      overflow: 'linebreak',
      valign: 'top',
      lineColor: rgb(HAIRLINE),
      lineWidth: { bottom: 0.4 },
    },
    headStyles: {
      font: ctx.fonts.sans,
      fontStyle: 'bold',
      fillColor: rgb(PANEL),
      textColor: rgb(INK),
      lineColor: rgb(INK_2),
      lineWidth: { bottom: 0.7 },
    },
  };
}

const finalY = (doc: jsPDF): number => (doc as unknown as { lastAutoTable: { finalY: number } }).lastAutoTable.finalY;

/**
 * The index in `body` of the row a hook is called for. A row taller than the space left on a
 * page is split by autotable into pieces, and a continuation piece carries index -1 but the
 * same raw row: look it up by that, so that a 5,000-character note or a 3,000-character name
 * continues on the next page instead of failing the whole report.
 */
function rowIndexer(body: readonly RowInput[]): (data: CellHookData) => number {
  const index = new Map<unknown, number>(body.map((r, k) => [r, k]));
  return (data) => (data.row.index >= 0 ? data.row.index : (index.get(data.row.raw) ?? -1));
}

/** True for the second and later pieces of a row split across pages. */
const continued = (data: CellHookData): boolean => data.row.index < 0;

/** The y below the table just drawn. */
function run(ctx: Ctx, options: UserOptions): number {
  autoTable(ctx.doc, options);
  return finalY(ctx.doc) + 6;
}

/** First baseline of a cell's text, as autotable places it (its top padding plus 0.85 em). */
function baseline(cell: CellHookData['cell']): { x: number; y: number; step: number } {
  const pos = cell.getTextPos();
  const size = cell.styles.fontSize;
  return { x: pos.x, y: pos.y + size * 0.85, step: size * 1.15 };
}

const TITLES: ReadonlyMap<string, string> = new Map(RULES.map((r) => [r.id, r.meta.title]));

const mono = (ctx: Ctx): Partial<Styles> => ({ font: ctx.fonts.mono });

/** The mark of a row that goes on from the previous page. */
export const CONTINUED = '(continued from the previous page)';

/** Room at the left of a status cell for its mark. */
const MARK_ROOM = 11;

function markCell(data: CellHookData, status: Status | 'info'): void {
  const { x, y } = baseline(data.cell);
  drawSeverityMark(data.doc as jsPDF, status, x - MARK_ROOM + 4.5, y - 2.6, 6);
}

/** The findings, in the report's order, or a line saying there are none. */
export function findingsTable(ctx: Ctx, y: number, report: Report): number {
  const findings = report.findings;
  let at = sectionHeading(ctx, y, `Findings (${findings.length})`);
  const s = report.summary;
  at = paragraph(
    ctx,
    at,
    findings.length === 0
      ? 'No rule found anything to report in the power states checked.'
      : `${plural(s.error, 'error')}, ${plural(s.warning, 'warning')}, ${s.info} info, ${s.waived} waived, over ${plural(report.scenarios.length, 'power state')}. ` +
          'Messages give the numbers at the worst corner; a waived finding keeps its place, with its note, and no longer counts.',
    { colour: INK_2 },
  );
  if (findings.length === 0) return at;
  const body: RowInput[] = findings.map((f) => [
    f.waived === undefined ? f.severity : `${f.severity}\nwaived`,
    `${f.rule}\n${TITLES.get(f.rule) ?? ''}`,
    f.net === null ? '—' : netNameIn(report, f.net),
    f.scenario,
    f.waived === undefined ? f.message : `${f.message}\nWaived: ${f.waived}`,
    f.hint,
  ]);
  const rowOf = rowIndexer(body);
  return run(ctx, {
    ...baseTableOptions(ctx, at),
    head: [['Severity', 'Rule', 'Net', 'Power state', 'Message', 'Hint']],
    body,
    columnStyles: {
      0: { cellWidth: 50, cellPadding: { top: 3, bottom: 3, left: 3.5 + MARK_ROOM, right: 2 } },
      1: { cellWidth: 84 },
      2: { cellWidth: 72, ...mono(ctx) },
      3: { cellWidth: 44, ...mono(ctx) },
      4: { cellWidth: 158 },
      5: { cellWidth: 'auto', textColor: rgb(INK_2) },
    },
    didParseCell: (data) => {
      if (data.section !== 'body') return;
      const f = findings[data.row.index]!;
      if (data.column.index === 0) {
        data.cell.styles.textColor = rgb(f.waived === undefined ? STATUS_COLOUR[f.severity] : MUTED);
        data.cell.styles.fontStyle = f.severity === 'error' && f.waived === undefined ? 'bold' : 'normal';
      }
      if (data.column.index === 1) data.cell.styles.fontSize = SIZE.table;
    },
    willDrawCell: (data) => {
      // The rule cell is drawn by hand: its id in the mono font, its title under it, muted.
      if (data.section === 'body' && data.column.index === 1) data.cell.text = [];
    },
    didDrawCell: (data) => {
      if (data.section !== 'body') return;
      const f: ReportFinding | undefined = findings[rowOf(data)];
      if (f === undefined) return;
      if (data.column.index === 0) markCell(data, f.waived === undefined ? f.severity : 'info');
      if (data.column.index === 1) drawRuleCell(ctx, data, f.rule, continued(data));
    },
  });
}

/** The rule cell: its id, and its title under it; on a continued row, "(continued)" instead. */
function drawRuleCell(ctx: Ctx, data: CellHookData, rule: string, isContinued: boolean): void {
  const doc = data.doc as jsPDF;
  const { x, y, step } = baseline(data.cell);
  const width = data.cell.width - data.cell.padding('horizontal');
  doc.setFontSize(SIZE.table);
  doc.setFont(ctx.fonts.mono, 'normal');
  setText(doc, INK);
  doc.text(rule, x, y);
  doc.setFont(ctx.fonts.sans, 'normal');
  setText(doc, MUTED);
  const title = doc.splitTextToSize(isContinued ? CONTINUED : (TITLES.get(rule) ?? ''), width) as string[];
  title.forEach((line, k) => {
    doc.text(line, x, y + step * (k + 1));
  });
}

const marginText = (m: number | null): string => (m === null ? '—' : formatMargin(m));

/**
 * The engine's own judgement of a net's worst pair on one side (it compares the levels with
 * their tolerance, so a margin of exactly 0 V is a warning): the worst status over the pairs.
 */
function sideStatus(analysis: NetAnalysis | undefined, side: 'high' | 'low'): Status {
  let worst: Status = 'clean';
  for (const pair of analysis?.pairs ?? []) {
    const st = pair[side]?.status;
    if (st === 'fail') return 'error';
    if (st === 'warning') worst = 'warning';
  }
  return worst;
}

function tint(data: CellHookData, status: Status): void {
  if (status === 'clean') return;
  data.cell.styles.fillColor = rgb(status === 'error' ? ERROR_SOFT : WARNING_SOFT);
  data.cell.styles.textColor = rgb(STATUS_COLOUR[status]);
  data.cell.styles.fontStyle = 'bold';
}

/** One row per net joining pins of different rails, per power state. */
export function crossingsTable(ctx: Ctx, y: number, report: Report, result: CheckResult): number {
  const rows = report.crossings;
  const analysis = rows.map((c) => result.nets.get(c.scenario)?.get(c.net)?.view.analysis);
  let at = sectionHeading(ctx, y, `Rail crossings (${rows.length})`);
  at = paragraph(
    ctx,
    at,
    rows.length === 0
      ? 'No net joins pins of different rails.'
      : "Every net that joins pins of different rails (a pull resistor's rail does not count), in every power state checked, with its worst noise margins and its worst unwaived finding.",
    { colour: INK_2 },
  );
  if (rows.length === 0) return at;
  const worst = (w: 'error' | 'warning' | 'ok'): Status => (w === 'ok' ? 'clean' : w);
  // The net by its label (its id beneath when the file calls it otherwise); the rails by label, one a line.
  const body: RowInput[] = rows.map((c) => [
    c.label === c.net ? c.net : `${c.label}\n(${c.net})`,
    c.rails.map((r) => railNameIn(report, r)).join('\n'),
    c.scenario,
    marginText(c.marginHigh),
    marginText(c.marginLow),
    c.worst,
  ]);
  const rowOf = rowIndexer(body);
  return run(ctx, {
    ...baseTableOptions(ctx, at),
    head: [['Net', 'Rails', 'Power state', 'Worst NMH', 'Worst NML', 'Worst']],
    body,
    columnStyles: {
      0: { cellWidth: 100, ...mono(ctx) },
      1: { cellWidth: 'auto' },
      2: { cellWidth: 56, ...mono(ctx) },
      3: { cellWidth: 56, halign: 'right' },
      4: { cellWidth: 56, halign: 'right' },
      5: { cellWidth: 58, cellPadding: { top: 3, bottom: 3, left: 3.5 + MARK_ROOM, right: 3.5 } },
    },
    didParseCell: (data) => {
      if (data.section !== 'body') return;
      const c = rows[data.row.index]!;
      if (data.column.index === 3) tint(data, sideStatus(analysis[data.row.index], 'high'));
      if (data.column.index === 4) tint(data, sideStatus(analysis[data.row.index], 'low'));
      if (data.column.index === 5 && c.worst !== 'ok') {
        data.cell.styles.textColor = rgb(STATUS_COLOUR[c.worst]);
        data.cell.styles.fontStyle = 'bold';
      }
    },
    didDrawCell: (data) => {
      const c = rows[rowOf(data)];
      if (data.section === 'body' && data.column.index === 5 && c !== undefined) markCell(data, worst(c.worst));
    },
  });
}

/** The pair with the worst margin on one side, `DRIVER → RECEIVER`. */
function worstPair(pairs: readonly PairAnalysis[], side: 'high' | 'low', worst: number | null): string {
  if (worst === null) return '';
  const hit = pairs.find((p) => (p[side] as LevelSide | null)?.margin === worst);
  return hit === undefined ? '' : `${hit.driver} → ${hit.receiver}`;
}

/** Worst high and low margin of every net in every power state reported, from the engine's analysis. */
export function marginsTable(ctx: Ctx, y: number, report: Report, design: Design, result: CheckResult): number {
  const minMargin = report.settings.minMargin;
  type Row = {
    net: string;
    label: string;
    state: string;
    pairs: number;
    high: number | null;
    low: number | null;
    atHigh: string;
    atLow: string;
    analysis: NetAnalysis;
  };
  const rows: Row[] = [];
  for (const state of report.scenarios) {
    const perNet = result.nets.get(state.id);
    if (perNet === undefined) continue;
    for (const net of design.nets) {
      const r = perNet.get(net.id);
      if (r === undefined) continue;
      const a = r.view.analysis;
      rows.push({
        net: net.id,
        label: net.label ?? '',
        state: state.id,
        pairs: a.pairs.length,
        high: a.worstHigh,
        low: a.worstLow,
        atHigh: worstPair(a.pairs, 'high', a.worstHigh),
        atLow: worstPair(a.pairs, 'low', a.worstLow),
        analysis: a,
      });
    }
  }
  let at = sectionHeading(ctx, y, 'Noise margins per net');
  at = paragraph(
    ctx,
    at,
    `The worst high-level margin (NMH = VOH − VIH) and low-level margin (NML = VIL − VOL) over each net's powered driver/receiver pairs on different parts, ` +
      `with the pair that sets it. Below 0 V is an error, below the minimum margin of ${formatQuantity(minMargin, 'V')} a warning; ` +
      '"—" marks a net with no such pair in that power state.',
    { colour: INK_2 },
  );
  if (rows.length === 0) return paragraph(ctx, at, 'The design has no nets.');
  return run(ctx, {
    ...baseTableOptions(ctx, at),
    head: [['Net', 'Label', 'Power state', 'Pairs', 'Worst NMH', 'Set by', 'Worst NML', 'Set by']],
    body: rows.map((r) => [
      r.net,
      r.label,
      r.state,
      String(r.pairs),
      marginText(r.high),
      r.atHigh,
      marginText(r.low),
      r.atLow,
    ]),
    columnStyles: {
      0: { cellWidth: 56, ...mono(ctx) },
      1: { cellWidth: 'auto' },
      2: { cellWidth: 44, ...mono(ctx) },
      3: { cellWidth: 31, halign: 'right' },
      4: { cellWidth: 46, halign: 'right' },
      5: { cellWidth: 104, ...mono(ctx), fontSize: 7, textColor: rgb(INK_2) },
      6: { cellWidth: 46, halign: 'right' },
      7: { cellWidth: 104, ...mono(ctx), fontSize: 7, textColor: rgb(INK_2) },
    },
    didParseCell: (data) => {
      if (data.section !== 'body') return;
      const r = rows[data.row.index]!;
      if (data.column.index === 4) tint(data, sideStatus(r.analysis, 'high'));
      if (data.column.index === 6) tint(data, sideStatus(r.analysis, 'low'));
    },
  });
}
