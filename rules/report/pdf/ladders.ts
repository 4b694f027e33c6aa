/**
 * The "Voltage ladders" section: for each net that joins pins of different rails, its ladder
 * (rules/report/ladder.ts) drawn as vectors, four to a portrait page. One voltage axis per
 * ladder; the drivers' guaranteed bands on the left, the pairs' noise margins in the middle,
 * the receivers' thresholds on the right, and a key naming the pins below. Pass, warning and
 * fail differ by pattern and by word as well as by colour, so that a greyscale print reads.
 */
import type { jsPDF } from 'jspdf';
import { railNameIn } from '../reportNames.ts';
import type { CheckResult } from '../../engine/types.ts';
import { ladderFor, type Ladder, type LadderDriver, type LadderMargin, type LadderReceiver } from '../ladder.ts';
import { marginVolts, onAxis, separate, STATUS_TEXT, volts } from '../ladderLayout.ts';
import type { Crossing, Report } from '../reportSchema.ts';
import { addPage, bottomLimit, contentWidth, fitText, paragraph, sectionHeading, type Ctx } from './page.ts';
import {
  ACCENT,
  ERROR_SOFT,
  HAIRLINE,
  INK,
  INK_2,
  MARGIN,
  MUTED,
  PANEL,
  STATUS_COLOUR,
  WARNING_SOFT,
  WHITE,
  drawSeverityMark,
  setDraw,
  setFill,
  setText,
  type Rgb,
} from './theme.ts';

/** At most this many ladders: a large design's section stays a few pages (the margin table lists every net). */
export const LADDER_CAP = 40;

const PASS: Rgb = [40, 110, 76];
const PASS_SOFT: Rgb = [222, 238, 229];
const BAND_SOFT: Rgb = [214, 230, 238];

/** Height of one ladder's cell, points: two rows fit under the section's heading on A4 and Letter. */
const CELL_H = 300;
const GAP = 12;
/** Columns drawn per ladder; more pins or pairs are named in the key as not drawn. */
const MAX_DRIVERS = 2;
const MAX_RECEIVERS = 2;
const MAX_LANES = 3;
const MAX_KEY_LINES = 9;
const FONT = 5.6;
const KEY_STEP = 7.4;

const RANK: Readonly<Record<Crossing['worst'], number>> = { ok: 0, warning: 1, error: 2 };
const smallest = (c: Crossing): number => Math.min(c.marginHigh ?? Infinity, c.marginLow ?? Infinity);

/**
 * The crossings that get a ladder: each net in its first power state, and again in any later
 * state where its worst finding or either worst margin differs from every state already drawn
 * (an unchanged ladder would only repeat itself). Beyond `cap`, the worst `cap` of them (worst
 * finding, then smallest margin), still in the report's order.
 */
export function ladderRows(rows: readonly Crossing[], cap = LADDER_CAP): { rows: Crossing[]; total: number } {
  const seen = new Map<string, string[]>();
  const chosen: Crossing[] = [];
  for (const c of rows) {
    const key = `${c.worst}|${c.marginHigh}|${c.marginLow}`;
    const keys = seen.get(c.net) ?? [];
    if (keys.includes(key)) continue;
    keys.push(key);
    seen.set(c.net, keys);
    chosen.push(c);
  }
  if (chosen.length <= cap) return { rows: chosen, total: chosen.length };
  const worst = chosen
    .map((c, k) => ({ c, k }))
    .sort((a, b) => RANK[b.c.worst] - RANK[a.c.worst] || smallest(a.c) - smallest(b.c) || a.k - b.k)
    .slice(0, cap)
    .sort((a, b) => a.k - b.k);
  return { rows: worst.map((w) => w.c), total: chosen.length };
}

/** 45° hatching inside a rectangle; `cross` adds the other diagonal. */
function hatch(doc: jsPDF, x: number, y: number, w: number, h: number, step: number, cross: boolean): void {
  // Drawn areas are on the page (onAxis); anything else would make this loop run away.
  if (!(w > 0 && h > 0 && step > 0 && (w + h) / step < 10_000)) return;
  for (let t = -h; t < w; t += step) {
    const lo = Math.max(0, -t);
    const hi = Math.min(h, w - t);
    if (hi <= lo) continue;
    doc.line(x + t + lo, y + h - lo, x + t + hi, y + h - hi);
    if (cross) doc.line(x + t + lo, y + lo, x + t + hi, y + hi);
  }
}

interface Label {
  readonly y: number;
  readonly lines: readonly { text: string; colour: Rgb; bold?: boolean }[];
}

/** Labels at their wished baselines, pushed apart so that none overlaps, cut to `width`. */
function drawLabels(ctx: Ctx, x: number, width: number, labels: readonly Label[], top: number, bottom: number): void {
  const { doc } = ctx;
  const step = FONT * 1.15;
  // Two-line labels need room for both lines: separate by the tallest block.
  const tallest = Math.max(1, ...labels.map((l) => l.lines.length));
  const gap = step * tallest + 1;
  const ys = separate(
    labels.map((l) => Math.max(l.y, top)),
    gap,
  );
  // Pushed below the plot: move the lowest back up, each keeping its gap to the next.
  const last = bottom - step * (tallest - 1);
  let limit = last;
  for (const k of ys.map((_, k) => k).sort((a, b) => ys[b]! - ys[a]!)) {
    ys[k] = Math.min(ys[k]!, limit);
    limit = ys[k]! - gap;
  }
  doc.setFontSize(FONT);
  labels.forEach((label, k) => {
    label.lines.forEach((line, i) => {
      doc.setFont(ctx.fonts.sans, line.bold === true ? 'bold' : 'normal');
      setText(doc, line.colour);
      doc.text(fitText(doc, line.text, width), x, ys[k]! + i * step);
    });
  });
}

const marginStatus = (m: LadderMargin): 'clean' | 'warning' | 'error' =>
  m.status === 'pass' ? 'clean' : m.status === 'fail' ? 'error' : 'warning';

function marginBar(doc: jsPDF, m: LadderMargin, x: number, yTop: number, yBottom: number): void {
  const h = Math.max(1, yBottom - yTop);
  const c = m.status === 'pass' ? PASS : STATUS_COLOUR[marginStatus(m)];
  doc.setLineDashPattern([], 0);
  setFill(doc, m.status === 'pass' ? PASS_SOFT : m.status === 'fail' ? ERROR_SOFT : WARNING_SOFT);
  doc.rect(x, yTop, 6, h, 'F');
  if (m.status !== 'pass') {
    setDraw(doc, c);
    doc.setLineWidth(0.35);
    hatch(doc, x, yTop, 6, h, m.status === 'fail' ? 2.2 : 2.6, m.status === 'fail');
  }
  setDraw(doc, c);
  doc.setLineWidth(m.status === 'fail' ? 0.9 : 0.6);
  doc.rect(x, yTop, 6, h, 'S');
}

type YOf = (volts: number) => number;

function driverLabels(d: LadderDriver, pre: string, yOf: YOf): Label[] {
  const out: Label[] = [];
  if (d.high !== null) {
    out.push({
      y: yOf(d.high.to) + 2,
      lines: [{ text: `${pre}${d.high.vpull === undefined ? 'VDD' : 'Vpull'} ${volts(d.high.to)}`, colour: MUTED }],
    });
    out.push({
      y: yOf(d.high.from) + 2,
      lines: [{ text: `${pre}VOH ≥ ${volts(d.high.from)}${d.high.estimate ? ' est.' : ''}`, colour: INK }],
    });
  }
  if (d.low !== null)
    out.push({
      y: yOf(d.low.to) + 2,
      lines: [{ text: `${pre}VOL ≤ ${volts(d.low.to)}${d.low.estimate ? ' est.' : ''}`, colour: INK }],
    });
  return out;
}

function receiverLabels(r: LadderReceiver, pre: string, yOf: YOf): Label[] {
  const out: Label[] = [];
  if (r.viMax !== null)
    out.push({ y: yOf(r.viMax.volts) + 2, lines: [{ text: `${pre}max ${volts(r.viMax.volts)}`, colour: INK_2 }] });
  if (r.vih !== null)
    out.push({
      y: yOf(r.vih.volts) + 2,
      lines: [{ text: `${pre}${r.schmitt ? 'VT+' : 'VIH'} ${volts(r.vih.volts)}`, colour: INK }],
    });
  if (r.vil !== null)
    out.push({
      y: yOf(r.vil.volts) + 2,
      lines: [{ text: `${pre}${r.schmitt ? 'VT−' : 'VIL'} ${volts(r.vil.volts)}`, colour: INK }],
    });
  return out;
}

/** A margin's label: its number, then its word (and its lane's letter when there are several). */
function marginLabel(m: LadderMargin, pre: string, yOf: YOf): Label {
  const colour = m.status === 'pass' ? PASS : STATUS_COLOUR[marginStatus(m)];
  return {
    y: (yOf(m.upper) + yOf(m.lower)) / 2,
    lines: [
      { text: `${m.kind === 'nmh' ? 'NMH' : 'NML'} ${marginVolts(m.margin)}`, colour: INK, bold: m.status === 'fail' },
      { text: `${pre}${STATUS_TEXT[m.status]}`, colour, bold: m.status !== 'pass' },
    ],
  };
}

/** Draws one ladder in the cell at (x0, y0), `w` wide and {@link CELL_H} tall. */
function drawLadder(ctx: Ctx, report: Report, ladder: Ladder, row: Crossing, x0: number, y0: number, w: number): void {
  const rail = (id: string) => railNameIn(report, id);
  const { doc } = ctx;
  setDraw(doc, HAIRLINE);
  doc.setLineWidth(0.5);
  doc.setLineDashPattern([], 0);
  doc.rect(x0, y0, w, CELL_H, 'S');

  // Heading: the net and its power state, its worst finding as a mark on the right.
  const status = row.worst === 'ok' ? 'clean' : row.worst;
  drawSeverityMark(doc, status, x0 + w - 9, y0 + 10, 7);
  doc.setFont(ctx.fonts.sans, 'bold');
  doc.setFontSize(8.5);
  setText(doc, INK);
  const title = fitText(doc, ladder.label, w * 0.55);
  doc.text(title, x0 + 6, y0 + 13);
  const titleW = doc.getTextWidth(title);
  doc.setFont(ctx.fonts.sans, 'normal');
  doc.setFontSize(7);
  setText(doc, INK_2);
  doc.text(fitText(doc, `· ${ladder.state.label} (${ladder.state.id})`, w - titleW - 28), x0 + 10 + titleW, y0 + 13);
  doc.setFontSize(FONT);
  setText(doc, MUTED);
  const worstText = row.worst === 'ok' ? 'no finding' : `worst finding: ${row.worst}`;
  const netId = ladder.label === ladder.net ? '' : `net ${ladder.net} · `;
  doc.text(fitText(doc, `${netId}rails ${row.rails.map(rail).join(', ')} · ${worstText}`, w - 12), x0 + 6, y0 + 22);

  // The worst pairs get the lanes; the pins of those pairs are drawn first.
  const pairs: { driver: string; receiver: string; margins: LadderMargin[] }[] = [];
  for (const m of ladder.margins) {
    let lane = pairs.find((p) => p.driver === m.driver && p.receiver === m.receiver);
    if (lane === undefined) pairs.push((lane = { driver: m.driver, receiver: m.receiver, margins: [] }));
    lane.margins.push(m);
  }
  const worstOf = (p: { margins: LadderMargin[] }) => Math.min(...p.margins.map((m) => m.margin));
  pairs.sort((a, b) => worstOf(a) - worstOf(b));
  const lanes = pairs.slice(0, MAX_LANES);
  const first = (pin: string, ends: readonly string[]) => (ends.includes(pin) ? 0 : 1);
  const allDrivers = [...ladder.drivers].sort(
    (a, b) =>
      first(
        a.pin,
        lanes.map((l) => l.driver),
      ) -
      first(
        b.pin,
        lanes.map((l) => l.driver),
      ),
  );
  const allReceivers = [...ladder.receivers].sort(
    (a, b) =>
      first(
        a.pin,
        lanes.map((l) => l.receiver),
      ) -
      first(
        b.pin,
        lanes.map((l) => l.receiver),
      ),
  );
  const drivers = allDrivers.slice(0, MAX_DRIVERS);
  const receivers = allReceivers.slice(0, MAX_RECEIVERS);
  const many = { d: ladder.drivers.length > 1, r: ladder.receivers.length > 1, l: pairs.length > 1 };
  const dName = (pin: string) => `D${allDrivers.findIndex((d) => d.pin === pin) + 1}`;
  const rName = (pin: string) => `R${allReceivers.findIndex((r) => r.pin === pin) + 1}`;
  const laneName = (k: number) => String.fromCharCode(97 + k);

  // The key: every pin and pair, named as the drawing names them.
  const key: { text: string; colour: Rgb }[] = [];
  const driverLine = (k: number) => {
    const d = allDrivers[k]!;
    return {
      text: `D${k + 1}  ${d.pin} · drives · ${rail(d.rail)} · ${d.drive}${k >= MAX_DRIVERS ? ' (not drawn)' : ''}`,
      colour: INK_2,
    };
  };
  const receiverLine = (k: number) => {
    const r = allReceivers[k]!;
    const range = `${volts(r.railRange.min)}–${volts(r.railRange.max)}`;
    return {
      text: `R${k + 1}  ${r.pin} · receives · ${rail(r.rail)} ${range}${r.schmitt ? ' · Schmitt' : ''}${k >= MAX_RECEIVERS ? ' (not drawn)' : ''}`,
      colour: INK_2,
    };
  };
  drivers.forEach((_, k) => {
    key.push(driverLine(k));
  });
  receivers.forEach((_, k) => {
    key.push(receiverLine(k));
  });
  if (many.l) {
    pairs.forEach((p, k) => {
      const text = p.margins
        .map((m) => `${m.kind === 'nmh' ? 'NMH' : 'NML'} ${marginVolts(m.margin)} ${STATUS_TEXT[m.status]}`)
        .join(', ');
      key.push({
        text: `${k < MAX_LANES ? laneName(k) : '(not drawn)'}  ${dName(p.driver)} → ${rName(p.receiver)}: ${text}`,
        colour: INK_2,
      });
    });
  }
  for (let k = drivers.length; k < allDrivers.length; k++) key.push(driverLine(k));
  for (let k = receivers.length; k < allReceivers.length; k++) key.push(receiverLine(k));
  for (const p of ladder.unpowered) key.push({ text: `unpowered: ${p.pin} (${rail(p.rail)} off)`, colour: MUTED });
  if (ladder.drivers.length === 0) key.push({ text: 'no powered driver: no margin to draw', colour: MUTED });
  const shown =
    key.length > MAX_KEY_LINES
      ? [...key.slice(0, MAX_KEY_LINES - 1), { text: `+ ${key.length - MAX_KEY_LINES + 1} more lines`, colour: MUTED }]
      : key;

  const plotTop = y0 + 40;
  const plotBottom = y0 + CELL_H - 10 - shown.length * KEY_STEP - 6;
  const yOf = (v: number) => plotTop + ((ladder.top - onAxis(v, ladder.top)) / ladder.top) * (plotBottom - plotTop);

  // The labels first: their widths set the columns.
  const dLabels = drivers.flatMap((d, k) => driverLabels(d, many.d ? `D${k + 1} ` : '', yOf));
  const rLabels = receivers.flatMap((r, k) => receiverLabels(r, many.r ? `R${k + 1} ` : '', yOf));
  const worstLabelled = (kind: LadderMargin['kind']) =>
    lanes
      .flatMap((l) => l.margins)
      .filter((m) => m.kind === kind)
      .reduce<LadderMargin | undefined>((a, m) => (a === undefined || m.margin < a.margin ? m : a), undefined);
  const shownWorst = [worstLabelled('nmh'), worstLabelled('nml')];
  const labelled = (m: LadderMargin) => lanes.length <= 2 || shownWorst.includes(m);
  // Beyond two lanes only the worst NMH and NML are labelled in the plot; the key gives every pair's.
  const mLabels = lanes.flatMap((lane, k) =>
    lane.margins.filter(labelled).map((m) => marginLabel(m, many.l ? `${laneName(k)} ` : '', yOf)),
  );
  doc.setFontSize(FONT);
  const widest = (labels: readonly Label[], least: number) =>
    Math.max(
      least,
      ...labels.flatMap((l) =>
        l.lines.map((line) => {
          doc.setFont(ctx.fonts.sans, line.bold === true ? 'bold' : 'normal');
          return doc.getTextWidth(line.text);
        }),
      ),
    ) + 3;

  // Columns, left to right; the receivers' labels take what is left.
  const ax = x0 + 30;
  const dx = ax + 6;
  const dLabelX = dx + Math.max(1, drivers.length) * 11 + 2;
  const lx = dLabelX + widest(dLabels, 20);
  const mLabelX = lx + Math.max(1, lanes.length) * 10 + 1;
  const rx = mLabelX + widest(mLabels, 24);
  const rLabelX = rx + Math.max(1, receivers.length) * 11 + 2;
  const right = x0 + w - 4;

  // Column heads.
  doc.setFont(ctx.fonts.sans, 'bold');
  doc.setFontSize(FONT);
  setText(doc, MUTED);
  doc.text('drivers', dx, plotTop - 9);
  doc.text('margins', lx, plotTop - 9);
  doc.text('receivers', rx, plotTop - 9);
  doc.setFont(ctx.fonts.sans, 'normal');
  if (many.d)
    drivers.forEach((_, k) => {
      doc.text(`D${k + 1}`, dx + k * 11, plotTop - 2);
    });
  if (many.l)
    lanes.forEach((_, k) => {
      doc.text(laneName(k), lx + k * 10 + 1.5, plotTop - 2);
    });
  if (many.r)
    receivers.forEach((_, k) => {
      doc.text(`R${k + 1}`, rx + k * 11, plotTop - 2);
    });

  // The axis and its grid.
  doc.setFontSize(FONT);
  for (const t of ladder.ticks) {
    const y = yOf(t);
    setDraw(doc, PANEL);
    doc.setLineWidth(0.4);
    doc.line(ax, y, right, y);
    setDraw(doc, INK_2);
    doc.line(ax - 3, y, ax, y);
    setText(doc, INK_2);
    doc.text(volts(t), ax - 4, y + 2, { align: 'right' });
  }
  setDraw(doc, INK_2);
  doc.setLineWidth(0.7);
  doc.line(ax, yOf(0), ax, yOf(ladder.top));

  // Drivers: the guaranteed high band up to the supply (or Vpull), the low band up from 0 V.
  drivers.forEach((d, k) => {
    const bx = dx + k * 11;
    setDraw(doc, ACCENT);
    doc.setLineWidth(0.6);
    setFill(doc, BAND_SOFT);
    if (d.high !== null) {
      const top = yOf(d.high.to);
      doc.rect(bx, top, 9, Math.max(1, yOf(d.high.from) - top), 'FD');
      doc.setLineWidth(1.1);
      doc.line(bx - 1.5, top, bx + 10.5, top);
    }
    if (d.low !== null) {
      doc.setLineWidth(0.6);
      setFill(doc, BAND_SOFT);
      const top = yOf(d.low.to);
      doc.rect(bx, top, 9, Math.max(1, yOf(0) - top), 'FD');
    }
  });
  drawLabels(ctx, dLabelX, lx - dLabelX - 2, dLabels, plotTop, plotBottom + 2);

  // Receivers: reads-low zone, the undefined zone hatched, reads-high zone; the rail's range beside.
  receivers.forEach((r, k) => {
    const bx = rx + k * 11;
    const ceiling = Math.max(r.viMax?.volts ?? r.railRange.max, r.vih?.volts ?? 0);
    setFill(doc, PANEL);
    if (r.vih !== null) doc.rect(bx, yOf(ceiling), 9, Math.max(0.5, yOf(r.vih.volts) - yOf(ceiling)), 'F');
    if (r.vil !== null) doc.rect(bx, yOf(r.vil.volts), 9, Math.max(0.5, yOf(0) - yOf(r.vil.volts)), 'F');
    if (r.vih !== null && r.vil !== null && r.vih.volts > r.vil.volts) {
      setDraw(doc, MUTED);
      doc.setLineWidth(0.3);
      hatch(doc, bx, yOf(r.vih.volts), 9, yOf(r.vil.volts) - yOf(r.vih.volts), 2.4, false);
    }
    setDraw(doc, INK);
    doc.setLineWidth(1);
    if (r.vih !== null) doc.line(bx - 1.5, yOf(r.vih.volts), bx + 10.5, yOf(r.vih.volts));
    if (r.vil !== null) doc.line(bx - 1.5, yOf(r.vil.volts), bx + 10.5, yOf(r.vil.volts));
    setDraw(doc, MUTED);
    doc.setLineWidth(1.2);
    doc.line(bx - 1, yOf(r.railRange.max), bx - 1, yOf(r.railRange.min));
    if (r.viMax !== null) {
      setDraw(doc, STATUS_COLOUR.error);
      doc.setLineWidth(0.8);
      doc.setLineDashPattern([2, 1.2], 0);
      doc.line(bx - 2, yOf(r.viMax.volts), bx + 11, yOf(r.viMax.volts));
      doc.setLineDashPattern([], 0);
    }
  });
  drawLabels(ctx, rLabelX, right - rLabelX, rLabels, plotTop, plotBottom + 2);

  // Margins: one lane per pair, a bar from the upper level to the lower one, its number and its word.
  lanes.forEach((lane, k) => {
    const bx = lx + k * 10 + 1;
    for (const m of lane.margins) {
      const yTop = yOf(Math.max(m.upper, m.lower));
      const yBottom = yOf(Math.min(m.upper, m.lower));
      marginBar(doc, m, bx, yTop, yBottom);
    }
  });
  if (pairs.length === 0) {
    doc.setFontSize(FONT);
    setText(doc, MUTED);
    doc.text('no pair', lx, (plotTop + plotBottom) / 2);
  }
  drawLabels(ctx, mLabelX, rx - mLabelX - 2, mLabels, plotTop, plotBottom + 2);

  // The key.
  doc.setFontSize(FONT);
  doc.setFont(ctx.fonts.sans, 'normal');
  let ky = plotBottom + 12;
  for (const line of shown) {
    setText(doc, line.colour);
    doc.text(fitText(doc, line.text, w - 12), x0 + 6, ky);
    ky += KEY_STEP;
  }
  setFill(doc, WHITE);
}

/**
 * The section, from a new page: its heading, how to read a ladder, then the ladders two by two.
 * Returns the y below the last row.
 */
export function laddersSection(ctx: Ctx, y: number, report: Report, result: CheckResult): number {
  const { doc } = ctx;
  const { rows, total } = ladderRows(report.crossings);
  if (rows.length === 0) {
    const at = sectionHeading(ctx, y, 'Voltage ladders');
    return paragraph(ctx, at, 'No net joins pins of different rails: there is no ladder to draw.', { colour: INK_2 });
  }
  let at = sectionHeading(ctx, addPage(ctx), 'Voltage ladders');
  const capped =
    total > rows.length
      ? ` This design has ${total} such ladders; the ${rows.length} with the worst findings and the smallest margins are drawn, in net order (the margin table lists every net).`
      : '';
  at = paragraph(
    ctx,
    at,
    'One ladder for each net that joins pins of different rails, in the first power state and again in any other state where its worst finding or margins change. ' +
      "On one voltage axis: each powered driver's guaranteed bands (VOH up to its supply or pull-up, 0 V up to VOL), each powered receiver's thresholds " +
      "(VIH and VIL, the undefined zone between them hatched, its rail's range as a grey bar, its highest allowed input dashed), and between them the noise margin " +
      'of every driver/receiver pair at its worst corner: a plain bar passes, a hatched bar is a warning, a cross-hatched bar fails, each with its word.' +
      capped,
    { colour: INK_2 },
  );
  const w = (contentWidth(doc) - GAP) / 2;
  rows.forEach((row, k) => {
    const column = k % 2;
    if (column === 0 && k > 0) at += CELL_H + GAP;
    if (column === 0 && at + CELL_H > bottomLimit(doc)) at = addPage(ctx);
    const view = result.nets.get(row.scenario)?.get(row.net)?.view;
    const state = result.states.find((s) => s.id === row.scenario);
    if (view === undefined || state === undefined) return;
    drawLadder(ctx, report, ladderFor(view, state), row, MARGIN.left + column * (w + GAP), at, w);
  });
  return at + CELL_H + GAP;
}
