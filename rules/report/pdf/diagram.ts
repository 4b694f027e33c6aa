/**
 * The block diagram page: the design drawn as vectors from its own data, fitted to one page
 * (landscape when that gives the larger scale). Wires take the look of their net's worst
 * unwaived finding in the first power state reported: heavy, solid and cased for an error,
 * dashed for a warning, thin for clean; the net's name carries the same mark.
 */
import type { jsPDF } from 'jspdf';
import type { Design, Part, Pin, Rail } from '../../model/schema.ts';
import { formatQuantity } from '../../levels/units.ts';
import type { Report } from '../reportSchema.ts';
import { pullLabel } from '../pullLabel.ts';
import { discreteValue } from '../discreteValue.ts';
import { addPage, contentWidth, fitText, pageHeight, sectionHeading, type Ctx } from './page.ts';
import {
  CHIP,
  DISCRETE_ENDS,
  type DiscreteBox,
  layoutDiagram,
  normalOf,
  type DiagramLayout,
  type PartBox,
  type PinPlace,
  type Point,
} from './diagramLayout.ts';
import {
  ERROR_SOFT,
  HAIRLINE,
  INK,
  INK_2,
  MARGIN,
  MUTED,
  PANEL,
  PAPER,
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
  type Status,
} from './theme.ts';

const RANK: Readonly<Record<Status, number>> = { clean: 0, warning: 1, error: 2 };

/** Worst unwaived severity per net in one power state; info counts as clean. */
export function netStatus(report: Report, state: string): Map<string, Status> {
  const out = new Map<string, Status>();
  for (const f of report.findings) {
    if (f.scenario !== state || f.net === null || f.waived !== undefined || f.severity === 'info') continue;
    const was = out.get(f.net) ?? 'clean';
    if (RANK[f.severity] > RANK[was]) out.set(f.net, f.severity);
  }
  return out;
}

/** Page-space transform of canvas units. */
interface View {
  readonly s: number;
  readonly x: (u: number) => number;
  readonly y: (v: number) => number;
}

const clamp = (v: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, v));

/**
 * Pen of each wire style, in points at scale `s`: in proportion to the drawing, with floors
 * that keep a wire visible on paper without smearing a dense, small drawing.
 */
function pen(status: Status, s: number): { width: number; dash: number[]; casing: number } {
  if (status === 'error') return { width: clamp(1.9 * s, 0.2, 1.7), dash: [], casing: clamp(4.2 * s, 0.4, 3.6) };
  if (status === 'warning')
    return { width: clamp(1.4 * s, 0.15, 1.3), dash: [clamp(6 * s, 0.6, 5), clamp(3.5 * s, 0.4, 3)], casing: 0 };
  return { width: clamp(0.9 * s, 0.1, 0.8), dash: [], casing: 0 };
}

function polyline(doc: jsPDF, v: View, points: readonly Point[]): void {
  doc.moveTo(v.x(points[0]!.x), v.y(points[0]!.y));
  for (let k = 1; k < points.length; k++) doc.lineTo(v.x(points[k]!.x), v.y(points[k]!.y));
  doc.stroke();
}

function drawWires(doc: jsPDF, v: View, layout: DiagramLayout, status: ReadonlyMap<string, Status>): void {
  doc.setLineJoin('round');
  // Errors last, so that no clean wire hides one where they share a channel.
  for (const level of ['clean', 'warning', 'error'] as const) {
    const p = pen(level, v.s);
    const wires = layout.wires.filter((w) => (status.get(w.net.id) ?? 'clean') === level);
    if (wires.length === 0) continue;
    if (p.casing > 0) {
      setDraw(doc, ERROR_SOFT);
      doc.setLineWidth(p.casing);
      doc.setLineDashPattern([], 0);
      for (const w of wires) polyline(doc, v, w.drawn);
    }
    setDraw(doc, STATUS_COLOUR[level]);
    doc.setLineWidth(p.width);
    doc.setLineDashPattern(p.dash, 0);
    for (const w of wires) polyline(doc, v, w.drawn);
  }
  doc.setLineDashPattern([], 0);
  // A dot where a net branches, in its wires' colour, so that a branch is never taken for a crossing.
  for (const j of layout.junctions) {
    setFill(doc, STATUS_COLOUR[status.get(j.net.id) ?? 'clean']);
    doc.circle(v.x(j.at.x), v.y(j.at.y), clamp(2.6 * v.s, 0.5, 2.2), 'F');
  }
}

type MarkKind = 'output' | 'input' | 'bidir';

/**
 * A pin's mark, just inside the box edge: outputs a triangle pointing out, inputs one pointing
 * in, bidirectional pins a diamond; open-drain ones hollow (they only ever pull low).
 */
function drawPinMark(doc: jsPDF, v: View, place: PinPlace): void {
  const n = normalOf(place.side);
  const kind: MarkKind = place.pin.role;
  const hollow = place.pin.drive === 'open-drain' || kind === 'input';
  const len = 7;
  const half = 3.2;
  const { x, y } = place.at;
  // Along the inward direction d = -n, across it t.
  const at = (along: number, across: number) => ({
    x: v.x(x - n.x * along + -n.y * across),
    y: v.y(y - n.y * along + n.x * across),
  });
  let shape: { x: number; y: number }[];
  if (kind === 'output') shape = [at(0, 0), at(len, half), at(len, -half)];
  else if (kind === 'input') shape = [at(len, 0), at(0, half), at(0, -half)];
  else shape = [at(0, 0), at(len / 2, half), at(len, 0), at(len / 2, -half)];
  setDraw(doc, INK_2);
  setFill(doc, hollow ? WHITE : INK_2);
  doc.setLineWidth(clamp(0.7 * v.s, 0.1, 0.6));
  doc.moveTo(shape[0]!.x, shape[0]!.y);
  for (const p of shape.slice(1)) doc.lineTo(p.x, p.y);
  doc.close();
  doc.fillStroke();
}

function railColour(rails: ReadonlyMap<string, Rail>, id: string): Rgb {
  return parseHexColour(rails.get(id)?.colour) ?? RAIL_DEFAULT;
}

function drawPinName(
  ctx: Ctx,
  v: View,
  box: PartBox,
  place: PinPlace,
  count: number,
  rails: ReadonlyMap<string, Rail>,
): void {
  const { doc } = ctx;
  const size = 9 * v.s;
  doc.setFont(ctx.fonts.mono, 'normal');
  doc.setFontSize(size);
  setText(doc, INK);
  const { x, y } = place.at;
  const ownRail = place.pin.rail !== undefined && place.pin.rail !== box.part.rail ? place.pin.rail : undefined;
  const swatch = ownRail === undefined ? 0 : 8;
  let room: number;
  let tx: number;
  let ty: number;
  let align: 'left' | 'right' | 'center';
  if (place.side === 'left' || place.side === 'right') {
    room = (CHIP.width / 2 - 14 - swatch) * v.s;
    tx = place.side === 'left' ? x + 10 : x - 10;
    ty = y + 3.2;
    align = place.side === 'left' ? 'left' : 'right';
  } else {
    room = (CHIP.width / count - 6) * v.s;
    tx = x;
    ty = place.side === 'top' ? y + 19 : y - 10;
    align = 'center';
  }
  // A pin's own pull (an internal one) follows its name: `RAIN ↑47K`.
  const pull = place.pin.pull === undefined ? '' : ` ${pullLabel(place.pin.pull, [...rails.values()]).split(' ')[0]}`;
  const name = fitText(doc, `${place.pin.id}${pull}`, room);
  doc.text(name, v.x(tx), v.y(ty), { align });
  if (ownRail !== undefined) {
    const w = doc.getTextWidth(name) / v.s;
    const sx = align === 'left' ? tx + w + 3 : align === 'right' ? tx - w - 8 : tx + w / 2 + 3;
    setFill(doc, railColour(rails, ownRail));
    doc.rect(v.x(sx), v.y(ty - 5), 5 * v.s, 5 * v.s, 'F');
  }
}

function drawBox(ctx: Ctx, v: View, box: PartBox, rails: ReadonlyMap<string, Rail>, family: (p: Part) => string): void {
  const { doc } = ctx;
  const s = v.s;
  const rail = rails.get(box.part.rail);
  setFill(doc, WHITE);
  setDraw(doc, INK_2);
  doc.setLineWidth(clamp(0.9 * s, 0.12, 0.8));
  doc.rect(v.x(box.x), v.y(box.y), box.width * s, box.height * s, 'FD');
  // The rail's colour as a band across the top of the header, as in the editor.
  setFill(doc, railColour(rails, box.part.rail));
  doc.rect(v.x(box.x), v.y(box.headerTop), box.width * s, 3.5 * s, 'F');
  setFill(doc, PANEL);
  doc.rect(v.x(box.x), v.y(box.headerTop + 3.5), box.width * s, (CHIP.header - 3.5) * s, 'F');
  setDraw(doc, HAIRLINE);
  doc.setLineWidth(clamp(0.6 * s, 0.08, 0.5));
  doc.line(v.x(box.x), v.y(box.headerTop + CHIP.header), v.x(box.x + box.width), v.y(box.headerTop + CHIP.header));

  const left = box.x + 8;
  const room = (box.width - 16) * s;
  doc.setFont(ctx.fonts.sans, 'bold');
  doc.setFontSize(11 * s);
  setText(doc, INK);
  const id = fitText(doc, box.part.id, room * 0.45);
  doc.text(id, v.x(left), v.y(box.headerTop + 19));
  const idWidth = doc.getTextWidth(id);
  doc.setFont(ctx.fonts.sans, 'normal');
  doc.setFontSize(10 * s);
  setText(doc, INK_2);
  doc.text(fitText(doc, box.part.label, room - idWidth - 6 * s), v.x(left) + idWidth + 6 * s, v.y(box.headerTop + 19));
  doc.setFontSize(8.5 * s);
  setText(doc, MUTED);
  // The rail as the canvas's badge gives it, by its nominal voltage (the id is the file's business).
  const railText = rail === undefined ? box.part.rail : formatQuantity(rail.nominal, 'V');
  doc.text(fitText(doc, `${railText} · ${family(box.part)}`, room), v.x(left), v.y(box.headerTop + 35));

  const counts = { left: 0, right: 0, top: 0, bottom: 0 };
  for (const p of box.pins) counts[p.side]++;
  for (const p of box.pins) {
    drawPinMark(doc, v, p);
    drawPinName(ctx, v, box, p, counts[p.side], rails);
  }
}

/**
 * The symbols of the parts between chips, as the canvas draws them (DiscreteNode.tsx), in its
 * 64 × 24 units: line segments, a capsule (the resistor's body) and a filled wedge (the diode's).
 */
const SYMBOL: Readonly<
  Record<DiscreteBox['discrete']['kind'], { lines: readonly (readonly number[])[]; capsule?: boolean; wedge?: boolean }>
> = {
  resistor: {
    lines: [
      [0, 12, 14, 12],
      [50, 12, 64, 12],
      [24, 6, 24, 18],
      [32, 6, 32, 18],
      [40, 6, 40, 18],
    ],
    capsule: true,
  },
  'fet-shifter': {
    lines: [
      [0, 14, 20, 14],
      [44, 14, 64, 14],
      [20, 14, 20, 10],
      [20, 10, 44, 10],
      [44, 10, 44, 14],
      [32, 10, 32, 2],
      [24, 20, 40, 20],
      [24, 20, 27, 18],
      [24, 20, 27, 22],
      [40, 20, 37, 18],
      [40, 20, 37, 22],
    ],
  },
  'diode-shifter': {
    lines: [
      [0, 12, 24, 12],
      [40, 12, 64, 12],
      [24, 5, 24, 19],
    ],
    wedge: true,
  },
};

/** A part between chips: its box, designator, symbol, value, and the rail of a tied end or a gate. */
function drawDiscrete(ctx: Ctx, v: View, box: DiscreteBox): void {
  const { doc } = ctx;
  const s = v.s;
  const d = box.discrete;
  setFill(doc, WHITE);
  setDraw(doc, INK_2);
  doc.setLineWidth(clamp(0.7 * s, 0.1, 0.6));
  doc.roundedRect(v.x(box.x), v.y(box.y), box.width * s, box.height * s, 6 * s, 6 * s, 'FD');
  // The symbol, centred, from the box's two pin anchors inwards.
  const sx = box.x + (box.width - 64) / 2;
  const sy = box.y + 20;
  const mid = box.y + box.height / 2;
  const sym = SYMBOL[d.kind];
  doc.setLineWidth(clamp(1.4 * s, 0.15, 1.2));
  doc.setLineCap('round');
  const seg = (x1: number, y1: number, x2: number, y2: number) => doc.line(v.x(x1), v.y(y1), v.x(x2), v.y(y2));
  for (const [x1, y1, x2, y2] of sym.lines) seg(sx + x1!, sy + y1!, sx + x2!, sy + y2!);
  // The leads from the box's edges to the symbol, so that a wire (or a tied end's rail) visibly ends on the part.
  const leadY = sy + (d.kind === 'fet-shifter' ? 14 : 12);
  for (const side of ['left', 'right'] as const) {
    if (side === 'left') {
      seg(box.x, mid, sx, mid);
      if (mid !== leadY) seg(sx, mid, sx, leadY);
    } else {
      seg(sx + 64, mid, box.x + box.width, mid);
      if (mid !== leadY) seg(sx + 64, mid, sx + 64, leadY);
    }
  }
  if (sym.capsule === true) doc.roundedRect(v.x(sx + 14), v.y(sy + 6), 36 * s, 12 * s, 6 * s, 6 * s, 'S');
  if (sym.wedge === true) {
    setFill(doc, INK_2);
    doc.triangle(v.x(sx + 40), v.y(sy + 5), v.x(sx + 25), v.y(sy + 12), v.x(sx + 40), v.y(sy + 19), 'F');
  }
  doc.setLineCap('butt');
  const room = (box.width - 8) * s;
  doc.setFont(ctx.fonts.sans, 'bold');
  doc.setFontSize(9 * s);
  setText(doc, INK);
  const head = d.kind === 'fet-shifter' ? `${d.id}  gate ${d.gate}` : d.id;
  doc.text(fitText(doc, head, room), v.x(box.x + box.width / 2), v.y(box.y + 14), { align: 'center' });
  doc.setFont(ctx.fonts.mono, 'normal');
  doc.setFontSize(8.5 * s);
  doc.text(fitText(doc, discreteValue(d), room), v.x(box.x + box.width / 2), v.y(box.y + 56), { align: 'center' });
  // A resistor's end tied to a rail or ground: the rail's name where its wire would be.
  if (d.kind === 'resistor') {
    doc.setFont(ctx.fonts.sans, 'normal');
    doc.setFontSize(8 * s);
    setText(doc, MUTED);
    DISCRETE_ENDS.resistor.forEach((end, k) => {
      const to = d.tie?.[end as '1' | '2'];
      if (to === undefined) return;
      const x = k === 0 ? box.x - 3 : box.x + box.width + 3;
      doc.text(to, v.x(x), v.y(mid + 3), { align: k === 0 ? 'right' : 'left' });
    });
  }
}

function drawNetLabels(
  ctx: Ctx,
  v: View,
  layout: DiagramLayout,
  status: ReadonlyMap<string, Status>,
  rails: readonly Rail[],
): void {
  const { doc } = ctx;
  const size = 8.5 * v.s;
  doc.setFont(ctx.fonts.mono, 'normal');
  doc.setFontSize(size);
  for (const { net, pin } of layout.netLabels) {
    const st = status.get(net.id) ?? 'clean';
    const mark = st === 'clean' ? 0 : 9;
    const n = normalOf(pin.side);
    // The net's pull resistor, value and rail, beside its name (as on the canvas).
    const text = net.pull === undefined ? net.id : `${net.id}  ${pullLabel(net.pull, rails)}`;
    const w = doc.getTextWidth(text) / v.s + mark;
    // Beside the stub, above it for left and right pins, to its right for top and bottom ones.
    const x0 = pin.side === 'left' ? pin.at.x - 4 - w : pin.side === 'right' ? pin.at.x + 4 : pin.at.x + 4;
    const y0 = n.y === 0 ? pin.at.y - 3.5 : pin.side === 'top' ? pin.at.y - 5 : pin.at.y + 12;
    // A white ground under the name keeps it readable where it sits over another wire.
    setFill(doc, WHITE);
    doc.rect(v.x(x0 - 1), v.y(y0 - 7.5), (w + 2) * v.s, 9.5 * v.s, 'F');
    if (st !== 'clean') drawSeverityMark(doc, st, v.x(x0 + 3.5), v.y(y0 - 3), 7 * v.s);
    setText(doc, st === 'clean' ? INK_2 : STATUS_COLOUR[st]);
    doc.text(text, v.x(x0 + mark), v.y(y0));
  }
}

const LEGEND_HEIGHT = 40;

function drawLegend(ctx: Ctx, top: number, rails: readonly Rail[], stateLabel: string): void {
  const { doc } = ctx;
  const left = MARGIN.left;
  let x = left;
  const y = top + 12;
  doc.setFontSize(SIZE.small);
  doc.setFont(ctx.fonts.sans, 'bold');
  setText(doc, INK);
  doc.text(`Wires, by their net's worst unwaived finding in ${stateLabel}:`, x, y);
  x = left;
  const row = y + 13;
  doc.setFont(ctx.fonts.sans, 'normal');
  const sample = (status: Status, label: string) => {
    const p = pen(status, 0.8);
    if (p.casing > 0) {
      setDraw(doc, ERROR_SOFT);
      doc.setLineWidth(p.casing);
      doc.line(x, row - 2.5, x + 26, row - 2.5);
    }
    setDraw(doc, STATUS_COLOUR[status]);
    doc.setLineWidth(p.width);
    doc.setLineDashPattern(p.dash, 0);
    doc.line(x, row - 2.5, x + 26, row - 2.5);
    doc.setLineDashPattern([], 0);
    x += 30;
    if (status !== 'clean') {
      drawSeverityMark(doc, status, x + 3, row - 2.5, 6);
      x += 9;
    }
    setText(doc, INK_2);
    doc.text(label, x, row);
    x += doc.getTextWidth(label) + 14;
  };
  sample('error', 'error: heavy, solid, cased');
  sample('warning', 'warning: dashed');
  sample('clean', 'no error or warning (info only)');

  const pins = row + 13;
  x = left;
  doc.setFont(ctx.fonts.sans, 'bold');
  setText(doc, INK);
  doc.text('Pins:', x, pins);
  x += doc.getTextWidth('Pins:') + 6;
  doc.setFont(ctx.fonts.sans, 'normal');
  const unit: View = { s: 0.8, x: (u) => u, y: (v) => v };
  const pinKey = (pin: Pin, label: string) => {
    drawPinMark(doc, unit, { key: '', pin, side: 'right', at: { x: x + 6, y: pins - 2.5 } });
    setText(doc, INK_2);
    doc.text(label, x + 9, pins);
    x += 9 + doc.getTextWidth(label) + 12;
  };
  pinKey({ id: '', role: 'output' }, 'output');
  pinKey({ id: '', role: 'input' }, 'input');
  pinKey({ id: '', role: 'bidir' }, 'bidirectional');
  pinKey({ id: '', role: 'output', drive: 'open-drain' }, 'open-drain (hollow)');

  if (rails.length > 0) {
    x += 6;
    doc.setFont(ctx.fonts.sans, 'bold');
    setText(doc, INK);
    doc.text('Rails:', x, pins);
    x += doc.getTextWidth('Rails:') + 6;
    doc.setFont(ctx.fonts.sans, 'normal');
    const end = left + contentWidth(doc);
    for (const rail of rails) {
      const label = `${rail.id} ${formatQuantity(rail.nominal, 'V')}`;
      const w = 10 + doc.getTextWidth(label) + 10;
      if (x + w > end) {
        doc.text('…', x, pins);
        break;
      }
      setFill(doc, parseHexColour(rail.colour) ?? RAIL_DEFAULT);
      doc.rect(x, pins - 6, 7, 5, 'F');
      setText(doc, INK_2);
      doc.text(label, x + 10, pins);
      x += w;
    }
  }
}

/** Options of {@link drawDiagram}. */
export interface DiagramOptions {
  /** The power state whose findings colour the wires, and its label. */
  readonly state: { readonly id: string; readonly label: string };
  /** A part's family, as the header's second line shows it. */
  readonly family: (part: Part) => string;
}

/** The largest scale at which the drawing fits the page in this orientation, and the area. */
function fitOnPage(ctx: Ctx, layout: DiagramLayout, orientation: 'portrait' | 'landscape') {
  const [a, b] = PAPER[ctx.paper];
  const [w, h] = orientation === 'portrait' ? [a, b] : [b, a];
  const area = {
    x: MARGIN.left,
    y: MARGIN.top + 44,
    w: w - MARGIN.left - MARGIN.right,
    h: h - MARGIN.top - 44 - MARGIN.bottom - LEGEND_HEIGHT - 6,
  };
  const bounds = layout.bounds;
  if (bounds === null) return { scale: 1, area };
  const scale = Math.min(0.85, area.w / (bounds.maxX - bounds.minX), area.h / (bounds.maxY - bounds.minY));
  return { scale, area };
}

/** Draws the diagram on a page of its own. */
export function drawDiagram(ctx: Ctx, design: Design, report: Report, options: DiagramOptions): void {
  const { doc } = ctx;
  const layout = layoutDiagram(design);
  const portrait = fitOnPage(ctx, layout, 'portrait');
  const landscape = fitOnPage(ctx, layout, 'landscape');
  const orientation = landscape.scale > portrait.scale ? 'landscape' : 'portrait';
  const { scale, area } = orientation === 'landscape' ? landscape : portrait;
  let y = addPage(ctx, orientation);
  y = sectionHeading(ctx, y, 'Block diagram');
  const rails = new Map(design.rails.map((r) => [r.id, r]));
  const bounds = layout.bounds;
  doc.setFont(ctx.fonts.sans, 'normal');
  doc.setFontSize(SIZE.small);
  setText(doc, MUTED);
  const small = bounds !== null && 9 * scale < 4;
  const caption =
    bounds === null
      ? 'The design has no parts yet.'
      : `${design.parts.length} part${design.parts.length === 1 ? '' : 's'}` +
        (layout.discretes.length === 0
          ? ''
          : ` and ${layout.discretes.length} between them (resistors with their IEC 60062 values, shifters)`) +
        ` at their positions in the design, ${layout.wires.length} wire${layout.wires.length === 1 ? '' : 's'}` +
        (small ? '. Drawn small to fit one page: it is a vector drawing, so zoom in to read the names.' : '.');
  doc.text(caption, MARGIN.left, y + 2);
  setDraw(doc, HAIRLINE);
  doc.setLineWidth(0.5);
  doc.rect(area.x, area.y, area.w, area.h, 'S');
  if (bounds !== null) {
    const ox = area.x + (area.w - (bounds.maxX - bounds.minX) * scale) / 2;
    const oy = area.y + (area.h - (bounds.maxY - bounds.minY) * scale) / 2;
    const view: View = { s: scale, x: (u) => ox + (u - bounds.minX) * scale, y: (v) => oy + (v - bounds.minY) * scale };
    const status = netStatus(report, options.state.id);
    drawWires(doc, view, layout, status);
    for (const box of layout.boxes) drawBox(ctx, view, box, rails, options.family);
    for (const box of layout.discretes) drawDiscrete(ctx, view, box);
    drawNetLabels(ctx, view, layout, status, design.rails);
  }
  drawLegend(
    ctx,
    pageHeight(doc) - MARGIN.bottom - LEGEND_HEIGHT,
    design.rails,
    `${options.state.label} (${options.state.id})`,
  );
}
