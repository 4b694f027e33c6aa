/**
 * Where the diagram puts things, in the design's own canvas units: part boxes at their
 * `position`, pin anchors on the box sides, and each net's wires as right-angled polylines.
 * The box geometry takes the editor's chip measures (app/canvas/chipLayout.ts; rules/ cannot
 * import app/), so that parts the editor shows apart are apart on paper too. Pure: no jsPDF.
 */
import { DISCRETE_PINS, type Design, type Discrete, type Net, type Part, type Pin } from '../../model/schema.ts';
import { sideOf, type Side } from '../../model/pinDefaults.ts';
import { netWires } from '../../model/wiring.ts';
import { STUB } from '../../routing/channels.ts';
import { hopPolyline, markRoutes } from '../../routing/marks.ts';
import type { Box, WireSpec } from '../../routing/types.ts';
import {
  BODY_PADDING,
  BOTTOM_BORDER,
  CHIP_WIDTH,
  DISCRETE_SIZE,
  HEADER_HEIGHT,
  ROW_HEIGHT,
  STRIP_HEIGHT,
} from '../../routing/chipMeasures.ts';
import { routeOnce } from '../../routing/wireRouter.ts';

export {
  BoxIndex,
  normalOf,
  routePoints,
  routeWire,
  spreadChannels,
  STUB,
  type Route,
} from '../../routing/channels.ts';

/**
 * The editor's chip measures, canvas units (rules/routing/chipMeasures.ts: the body's padding
 * split above and below the rows, the bottom border).
 */
export const CHIP = {
  width: CHIP_WIDTH,
  header: HEADER_HEIGHT,
  row: ROW_HEIGHT,
  strip: STRIP_HEIGHT,
  pad: BODY_PADDING / 2,
  border: BOTTOM_BORDER,
} as const;

export type { Point } from '../../routing/types.ts';
import type { Point } from '../../routing/types.ts';

export interface PinPlace {
  /** `PART.PIN` */
  readonly key: string;
  readonly pin: Pin;
  readonly side: Side;
  /** The anchor on the box edge. */
  readonly at: Point;
}

export interface PartBox {
  readonly part: Part;
  readonly x: number;
  readonly y: number;
  readonly width: number;
  readonly height: number;
  /** Top of the header (below the top pin strip, if any). */
  readonly headerTop: number;
  readonly pins: readonly PinPlace[];
}

export interface Bounds {
  readonly minX: number;
  readonly minY: number;
  readonly maxX: number;
  readonly maxY: number;
}

/**
 * The editor's measures of a part between chips (app/canvas/deriveFlow.ts DISCRETE_SIZE), canvas
 * units. Placed at its position as a chip's box is (the editor's node margin shifts both alike).
 */
export const DISCRETE = DISCRETE_SIZE;

/** The two pins of each kind, left then right, as the canvas draws them. */
export const DISCRETE_ENDS = DISCRETE_PINS as Readonly<Record<Discrete['kind'], readonly [string, string]>>;

/** A part between chips: its box and the anchors of its untied pins (at mid-height on each side). */
export interface DiscreteBox {
  readonly discrete: Discrete;
  readonly x: number;
  readonly y: number;
  readonly width: number;
  readonly height: number;
  readonly pins: readonly PinPlace[];
}

/** A part between chips' box and pin anchors; a resistor's end tied to a rail or ground has none. */
export function discreteBox(d: Discrete): DiscreteBox {
  const x = onCanvas(d.position?.x ?? 0);
  const y = onCanvas(d.position?.y ?? 0);
  const mid = y + DISCRETE.height / 2;
  const pins: PinPlace[] = [];
  DISCRETE_ENDS[d.kind].forEach((id, k) => {
    if (d.kind === 'resistor' && d.tie?.[id as '1' | '2'] !== undefined) return;
    const side: Side = k === 0 ? 'left' : 'right';
    pins.push({
      key: `${d.id}.${id}`,
      pin: { id, role: 'bidir' },
      side,
      at: { x: k === 0 ? x : x + DISCRETE.width, y: mid },
    });
  });
  return { discrete: d, x, y, width: DISCRETE.width, height: DISCRETE.height, pins };
}

/**
 * How far from the origin the diagram places a part: a design may put one anywhere a finite
 * number allows, but a box at 1e308 would overflow its own far edge to Infinity, and with it the
 * drawing's scale. Such a part is drawn at this distance instead (a billion canvas units: far
 * beyond any real drawing, so the placement of every sane design is untouched).
 */
const FARTHEST = 1e9;

const onCanvas = (v: number): number => Math.max(-FARTHEST, Math.min(FARTHEST, v));

/** A part's box and its pin anchors. */
export function partBox(part: Part): PartBox {
  const by: Record<Side, Pin[]> = { left: [], right: [], top: [], bottom: [] };
  for (const pin of part.pins) by[sideOf(pin)].push(pin);
  const rows = Math.max(by.left.length, by.right.length, 1);
  const topStrip = by.top.length > 0 ? CHIP.strip : 0;
  const bottomStrip = by.bottom.length > 0 ? CHIP.strip : 0;
  const x = onCanvas(part.position?.x ?? 0);
  const y = onCanvas(part.position?.y ?? 0);
  const width = CHIP.width;
  const height = topStrip + CHIP.header + CHIP.pad + rows * CHIP.row + CHIP.pad + CHIP.border + bottomStrip;
  const rowY = (k: number) => y + topStrip + CHIP.header + CHIP.pad + (k + 0.5) * CHIP.row;
  const spread = (k: number, n: number) => x + (width * (k + 0.5)) / n;
  const pins: PinPlace[] = [];
  const place = (pin: Pin, side: Side, at: Point) => pins.push({ key: `${part.id}.${pin.id}`, pin, side, at });
  by.left.forEach((pin, k) => {
    place(pin, 'left', { x, y: rowY(k) });
  });
  by.right.forEach((pin, k) => {
    place(pin, 'right', { x: x + width, y: rowY(k) });
  });
  by.top.forEach((pin, k) => {
    place(pin, 'top', { x: spread(k, by.top.length), y });
  });
  by.bottom.forEach((pin, k) => {
    place(pin, 'bottom', { x: spread(k, by.bottom.length), y: y + height });
  });
  return { part, x, y, width, height, headerTop: y + topStrip, pins };
}

/** One wire of a net, ready to draw. */
export interface Wire {
  readonly net: Net;
  /** The route: right angles only, from pin to pin. */
  readonly points: readonly Point[];
  /** As drawn: the route with a hop (a half circle of chords) over each wire of another net it crosses. */
  readonly drawn: readonly Point[];
}

/** Everything the diagram draws, in canvas units. */
export interface DiagramLayout {
  readonly boxes: readonly PartBox[];
  /** The parts between chips (design format version 2). */
  readonly discretes: readonly DiscreteBox[];
  readonly wires: readonly Wire[];
  /** Where a net branches: a dot is drawn there. */
  readonly junctions: readonly { net: Net; at: Point }[];
  /** Each net's first placed pin, where its name is written. */
  readonly netLabels: readonly { net: Net; pin: PinPlace }[];
  /** Everything drawn, with room for stubs and net names; null for a design without parts. */
  readonly bounds: Bounds | null;
}

/** Room beside the drawing for net names written outside the outermost pins. */
const LABEL_ROOM = { x: 70, y: 24 };

/** Lays out the design's parts and wires. Pins a net names that do not exist are skipped. */
export function layoutDiagram(design: Design): DiagramLayout {
  const boxes = design.parts.map(partBox);
  const discretes = (design.discretes ?? []).map(discreteBox);
  const all: { id: string; x: number; y: number; width: number; height: number; pins: readonly PinPlace[] }[] = [
    ...boxes.map((b) => ({ ...b, id: b.part.id })),
    ...discretes.map((b) => ({ ...b, id: b.discrete.id })),
  ];
  // The editor's router (rules/routing): the same routes, runs of different nets kept apart.
  const bodies: Box[] = all.map((b) => ({
    id: b.id,
    x: b.x,
    y: b.y,
    width: b.width,
    height: b.height,
    pins: b.pins.map((p) => ({ key: p.key, side: p.side, x: p.at.x, y: p.at.y })),
  }));
  const anchors = new Map<string, PinPlace>();
  for (const box of all) for (const p of box.pins) anchors.set(p.key, p);
  const specs: WireSpec[] = [];
  const netOf = new Map<string, Net>();
  const netLabels: { net: Net; pin: PinPlace }[] = [];
  for (const net of design.nets) {
    netOf.set(net.id, net);
    const first = net.pins.map((k) => anchors.get(k)).find((p) => p !== undefined);
    if (first !== undefined) netLabels.push({ net, pin: first });
    netWires(net).forEach(([a, b], k) => {
      specs.push({ id: `${net.id}\u0000${k}`, net: net.id, a, b });
    });
  }
  const routes = routeOnce(bodies, specs);
  const marks = markRoutes(routes.values());
  const wires: Wire[] = [];
  for (const spec of specs) {
    const r = routes.get(spec.id);
    if (r !== undefined)
      wires.push({
        net: netOf.get(spec.net)!,
        points: r.points,
        drawn: hopPolyline(r.points, marks.hops.get(spec.id)),
      });
  }
  const junctions = marks.junctions.map((j) => ({ net: netOf.get(j.net)!, at: j.at }));
  if (all.length === 0) return { boxes, discretes, wires, junctions, netLabels, bounds: null };
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const b of all) {
    minX = Math.min(minX, b.x - STUB - LABEL_ROOM.x);
    minY = Math.min(minY, b.y - STUB - LABEL_ROOM.y);
    maxX = Math.max(maxX, b.x + b.width + STUB + LABEL_ROOM.x);
    maxY = Math.max(maxY, b.y + b.height + STUB + LABEL_ROOM.y);
  }
  return { boxes, discretes, wires, junctions, netLabels, bounds: { minX, minY, maxX, maxY } };
}
