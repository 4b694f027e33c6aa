/**
 * Signal paths through the parts between chips (design format version 2).
 *
 * - Series resistors join nets into one path, solved by nodal analysis (nodal.ts): a driver is a
 *   source at its guaranteed level, pulls are conductances to their rails, input currents are
 *   current sources at their worst sign (iih drawn out of a high net, iil fed into a low one).
 *   Every quantity is the worst over the corners of the rails involved and over each resistor's
 *   tolerance ends (2^k cases for k resistors with a tolerance).
 * - A bidirectional N-MOSFET shifter passes a low from either side: the far side sits at
 *   VOL + I_far·RDS(on), I_far the far side's pull-up current at VOL (the I2C-bus specification's
 *   level-shifter section); each side's high comes from its own pull-up.
 * - A Schottky diode shifter passes a low from its cathode side only: VOL + Vf at the anode;
 *   the anode side's high is its pull-up less the pull resistance times the input currents and the
 *   diode's reverse leakage.
 *
 * A path's pairs are reported on the receiver's net, so that each net keeps its own findings.
 */
import type { Net, Pull } from '../model/schema.ts';
import { pullEnds } from '../model/pullRange.ts';
import { DEFAULT_RESISTOR_TOLERANCE, type DiodeShifter, type Discrete, type FetShifter } from '../model/schema.ts';
import type { Corner, Range } from '../levels/rails.ts';
import { corners } from '../levels/rails.ts';
import { type Level, levelAt } from '../levels/level.ts';
import { outputLevel, sortedPoints } from '../levels/output.ts';
import { below } from '../levels/compare.ts';
import { RISE_10_90 } from '../levels/rc.ts';
import { highThreshold, lowThreshold } from './resolve.ts';
import { currentOut, solve, type Network } from './nodal.ts';
import { pullEndVoltage } from './netMath.ts';
import { GROUND } from './powerStates.ts';
import type {
  DriverLoad,
  EffectiveSettings,
  LevelSide,
  NetView,
  PairAnalysis,
  PairStatus,
  PathEdge,
  PathNode,
  PinView,
  PullSource,
  RailStates,
  ResistorPath,
  SeriesResistor,
  ShifterLink,
  UnjudgedChain,
} from './types.ts';

/** More resistors with a tolerance than this in one path are judged at their ends all together. */
export const MAX_TOLERANT = 10;

// ---------------------------------------------------------------------------------------------
// Building a path from the design.

/** What building a path needs from the engine: nets by id, a net's pins in this power state. */
export interface PathSource {
  readonly discretes: ReadonlyMap<string, Discrete>;
  readonly linksOfNet: ReadonlyMap<string, ReadonlySet<string>>;
  readonly netOfPin: ReadonlyMap<string, string>;
  readonly nets: ReadonlyMap<string, Net>;
  /** The pins of a net in the power state (chip pins only). */
  readonly pinsOf: (net: Net) => PinView[];
  readonly wiring: number;
}

/** A resistor's pull on a net: one end on the net, the other tied to a rail or ground. */
function tiedPull(d: Discrete, end: '1' | '2', netId: string, src: PathSource): PullSource | undefined {
  if (d.kind !== 'resistor') return undefined;
  const other = end === '1' ? '2' : '1';
  const to = d.tie?.[other];
  if (to === undefined || src.netOfPin.get(`${d.id}.${end}`) !== netId) return undefined;
  const tolerance = d.tolerance ?? DEFAULT_RESISTOR_TOLERANCE;
  return {
    ohms: d.ohms,
    min: d.ohms * (1 - tolerance),
    max: d.ohms * (1 + tolerance),
    to,
    origin: d.id,
    tolerance,
    resistor: true,
  };
}

/** A `pull` field as the engine sees it (prepare.ts `pullSource`, repeated: prepare imports this module). */
function fieldPull(pull: Pull, origin: string): PullSource {
  const ends = pullEnds(pull);
  return { ohms: pull.ohms, min: ends.min, max: ends.max, to: pull.to, origin };
}

/** The pulls that resistor parts put on a net (empty for a net without discretes). */
export function resistorPulls(netId: string, src: PathSource): PullSource[] {
  const out: PullSource[] = [];
  for (const id of src.linksOfNet.get(netId) ?? []) {
    const d = src.discretes.get(id);
    if (d === undefined || d.kind !== 'resistor') continue;
    for (const end of ['1', '2'] as const) {
      const p = tiedPull(d, end, netId, src);
      if (p !== undefined) out.push(p);
    }
  }
  return out;
}

/** A net as a node of a path: its pins, all of its pulls, its capacitance. */
export function nodeOf(net: Net, src: PathSource): PathNode {
  const pins = src.pinsOf(net);
  const pulls: PullSource[] = [];
  if (net.pull !== undefined) pulls.push(fieldPull(net.pull, 'net'));
  for (const p of pins) if (p.pull !== undefined) pulls.push(fieldPull(p.pull, p.key));
  pulls.push(...resistorPulls(net.id, src));
  let capacitance = net.wiringCapacitance ?? src.wiring;
  for (const p of pins) capacitance += p.params.cin ?? 0;
  return { netId: net.id, pins, pulls, capacitance };
}

/** The other pin's net of a two-pin discrete, from the side of `netId`. */
function across(d: Discrete, netId: string, src: PathSource): { pin: string; other: string } | undefined {
  const pins = d.kind === 'resistor' ? ['1', '2'] : d.kind === 'fet-shifter' ? ['S', 'D'] : ['K', 'A'];
  const a = src.netOfPin.get(`${d.id}.${pins[0]}`);
  const b = src.netOfPin.get(`${d.id}.${pins[1]}`);
  if (a === undefined || b === undefined || a === b) return undefined;
  if (a === netId) return { pin: pins[0]!, other: b };
  if (b === netId) return { pin: pins[1]!, other: a };
  return undefined;
}

/** The nets joined to `net` (whose node is `self`) by series resistors; undefined when none is. */
function resistorPathOf(net: Net, self: PathNode, src: PathSource): ResistorPath | undefined {
  const nodes: PathNode[] = [self];
  const index = new Map<string, number>([[net.id, 0]]);
  const resistors: SeriesResistor[] = [];
  const seen = new Set<string>();
  const nodeFor = (id: string): number => {
    let k = index.get(id);
    if (k === undefined) {
      k = nodes.length;
      index.set(id, k);
      nodes.push(nodeOf(src.nets.get(id)!, src));
    }
    return k;
  };
  for (let k = 0; k < nodes.length; k++) {
    const here = nodes[k]!.netId;
    for (const id of [...(src.linksOfNet.get(here) ?? [])].sort()) {
      const d = src.discretes.get(id);
      if (d === undefined || d.kind !== 'resistor' || seen.has(id)) continue;
      const x = across(d, here, src);
      if (x === undefined || !src.nets.has(x.other)) continue;
      seen.add(id);
      const b = nodeFor(x.other);
      resistors.push({ id, a: k, b, ohms: d.ohms, tolerance: d.tolerance ?? DEFAULT_RESISTOR_TOLERANCE });
    }
  }
  return resistors.length === 0 ? undefined : { nodes, resistors, self: 0 };
}

/**
 * The resistor path and the shifters of a net: undefined path when no series resistor joins it
 * to another net. `self` is the net's own node, made by the caller.
 */
export function linksOf(
  net: Net,
  self: PathNode,
  src: PathSource,
): { path: ResistorPath | undefined; shifters: ShifterLink[] } {
  const path = resistorPathOf(net, self, src);
  const shifters: ShifterLink[] = [];
  for (const id of [...(src.linksOfNet.get(net.id) ?? [])].sort()) {
    const d = src.discretes.get(id);
    if (d === undefined || d.kind === 'resistor') continue;
    const x = across(d, net.id, src);
    if (x === undefined || !src.nets.has(x.other)) continue;
    // Only what the rules read: a shifter that moved on the canvas leaves its nets' views alone.
    const { position: _p, label: _l, ...core } = d;
    const otherNet = src.nets.get(x.other)!;
    const other = nodeOf(otherNet, src);
    const otherPath = resistorPathOf(otherNet, other, src);
    shifters.push({ part: core, pin: x.pin, other, self, ...(otherPath === undefined ? {} : { otherPath }) });
  }
  return { path, shifters };
}

/** A shifter on a node of a resistor path (`node`, its index): its far side hangs off the path. */
export interface BeyondShifter {
  readonly node: number;
  readonly link: ShifterLink;
}

/**
 * The shifters on every node of a path, each with the node it sits on: a driver on another node
 * of the path reaches them through the series resistors and sinks their far side's pull-ups when
 * low. A shifter whose other net is on the path itself is left out (no far side).
 */
export function shiftersBeyond(path: ResistorPath, src: PathSource): BeyondShifter[] {
  const out: BeyondShifter[] = [];
  const onPath = new Set(path.nodes.map((n) => n.netId));
  path.nodes.forEach((node, k) => {
    for (const id of [...(src.linksOfNet.get(node.netId) ?? [])].sort()) {
      const d = src.discretes.get(id);
      if (d === undefined || d.kind === 'resistor') continue;
      const x = across(d, node.netId, src);
      if (x === undefined || !src.nets.has(x.other) || onPath.has(x.other)) continue;
      const { position: _p, label: _l, ...core } = d;
      out.push({ node: k, link: { part: core, pin: x.pin, other: nodeOf(src.nets.get(x.other)!, src), self: node } });
    }
  });
  return out;
}

/** Rails a path and its shifters depend on: pins' rails, pulls' rails, FET gates. */
export function linkedRails(
  path: ResistorPath | undefined,
  shifters: readonly ShifterLink[],
  beyond: readonly BeyondShifter[] = [],
): string[] {
  const ids: string[] = [];
  const addNode = (n: PathNode) => {
    for (const p of n.pins) if (!ids.includes(p.rail)) ids.push(p.rail);
    for (const p of n.pulls) if (p.to !== GROUND && !ids.includes(p.to)) ids.push(p.to);
  };
  for (const n of path?.nodes ?? []) addNode(n);
  for (const s of shifters) {
    addNode(s.other);
    for (const n of s.otherPath?.nodes ?? []) addNode(n);
    if (s.part.kind === 'fet-shifter' && !ids.includes(s.part.gate)) ids.push(s.part.gate);
  }
  for (const { link } of beyond) {
    addNode(link.other);
    if (link.part.kind === 'fet-shifter' && !ids.includes(link.part.gate)) ids.push(link.part.gate);
  }
  return ids;
}

// ---------------------------------------------------------------------------------------------
// Cases: rail corners × tolerance ends.

interface Tolerant {
  readonly lo: number;
  readonly hi: number;
}

/** The resistances of one case: series resistors, then each node's pulls in order. */
interface CaseOhms {
  readonly series: readonly number[];
  readonly pulls: readonly (readonly number[])[];
}

/**
 * Every combination of the tolerance ends (resistors without a tolerance take their value); with
 * more than `MAX_TOLERANT` of them, every resistor at its low end and every one at its high end.
 * `only` keeps just one of those two.
 */
function toleranceCases(path: ResistorPath, only?: 'min' | 'max'): CaseOhms[] {
  const items: Tolerant[] = [];
  for (const r of path.resistors) items.push({ lo: r.ohms * (1 - r.tolerance), hi: r.ohms * (1 + r.tolerance) });
  for (const n of path.nodes) for (const p of n.pulls) items.push({ lo: p.min, hi: p.max });
  const varying = items.map((t, k) => (t.hi !== t.lo ? k : -1)).filter((k) => k >= 0);
  const split = (ohms: number[]): CaseOhms => {
    let at = path.resistors.length;
    const series = ohms.slice(0, at);
    const pulls = path.nodes.map((n) => {
      const row = ohms.slice(at, at + n.pulls.length);
      at += n.pulls.length;
      return row;
    });
    return { series, pulls };
  };
  const allAt = (up: boolean) => split(items.map((t) => (up ? t.hi : t.lo)));
  if (only !== undefined) return [allAt(only === 'max')];
  if (varying.length > MAX_TOLERANT) return [allAt(false), allAt(true)];
  const out: CaseOhms[] = [];
  for (let mask = 0; mask < 1 << varying.length; mask++) {
    const ohms = items.map((t) => t.lo);
    varying.forEach((k, j) => {
      const t = items[k]!;
      ohms[k] = ((mask >> j) & 1) === 1 ? t.hi : t.lo;
    });
    out.push(split(ohms));
  }
  return out;
}

const caseMemo = new WeakMap<ResistorPath, CaseOhms[]>();
function casesOf(path: ResistorPath): CaseOhms[] {
  let c = caseMemo.get(path);
  if (c === undefined) {
    c = toleranceCases(path);
    caseMemo.set(path, c);
  }
  return c;
}

/** The rails of every pin and pull of a path, for the corner enumeration. */
function pathRails(path: ResistorPath): string[] {
  const ids: string[] = [];
  for (const n of path.nodes) {
    for (const p of n.pins) if (!ids.includes(p.rail)) ids.push(p.rail);
    for (const p of n.pulls) if (p.to !== GROUND && !ids.includes(p.to)) ids.push(p.to);
  }
  return ids;
}

/** The network of one case: `fixed` nodes, input currents of the given sense (or none). */
function network(
  path: ResistorPath,
  corner: Corner,
  ohms: CaseOhms,
  fixed: (number | undefined)[],
  sense: 'high' | 'low' | 'none',
  except?: PinView,
  ground = false,
): Network {
  const links = path.resistors.map((r, k) => ({ a: r.a, b: r.b, g: 1 / ohms.series[k]! }));
  const ties: { a: number; g: number; v: number }[] = [];
  const inject: number[] = [];
  path.nodes.forEach((n, k) => {
    n.pulls.forEach((p, j) => {
      ties.push({ a: k, g: 1 / ohms.pulls[k]![j]!, v: ground ? 0 : pullEndVoltage(p, corner) });
    });
    let i = 0;
    if (sense !== 'none') {
      for (const p of n.pins) {
        if (p === except) continue;
        i += sense === 'high' ? -(p.params.iih ?? 0) : (p.params.iil ?? 0);
      }
    }
    inject.push(i);
  });
  return { n: path.nodes.length, fixed, links, ties, inject };
}

function volAtTop(d: PinView, vdd: number): number | undefined {
  const points = d.params.vol;
  if (points === undefined || points.length === 0) return undefined;
  const sorted = sortedPoints(points);
  return levelAt(sorted[sorted.length - 1]!.v, vdd);
}

// ---------------------------------------------------------------------------------------------
// Loads on a driver through the path's series resistors and through shifters.

/**
 * The current a driver on the path's own node delivers into the series resistors when high (its
 * output at its rail's value) and takes from them when low (at its largest `vol` test point),
 * the largest over corners and tolerance ends; bounds, as the catalogue's load currents are.
 * When low it also sinks the far side of every shifter on another node of the path (`beyond`):
 * that side's pull-up current, taken at the driver's VOL (each pull at its low end, its rail at
 * the corner; the node it feeds sits at VOL or above, so this is a bound), fed into the shifter's
 * node, through the series resistors at their tolerance ends, into the driver; a FET's only when
 * its gate rail is on, a diode's only into its cathode (Vf = 0, the worst case), as shifterLoad.
 */
export function pathLoad(
  path: ResistorPath,
  driver: PinView,
  rails: RailStates,
  beyond: readonly BeyondShifter[] = [],
): DriverLoad {
  const d = path.self;
  let high = 0;
  let low = 0;
  const far = beyond.filter((b) => b.node !== d && conducts(b.link, rails));
  const railIds = [driver.rail, ...pathPullRails(path)];
  for (const b of far) for (const id of nodePullRails(b.link.other)) if (!railIds.includes(id)) railIds.push(id);
  for (const c of corners(railIds, rails.ranges)) {
    const vdd = c.get(driver.rail) ?? 0;
    for (const ohms of casesOf(path)) {
      const fixed: (number | undefined)[] = path.nodes.map(() => undefined);
      if (driver.drive !== 'open-drain') {
        fixed[d] = vdd;
        const net = network(path, c, ohms, fixed, 'high', driver);
        high = Math.max(
          high,
          currentOut(net, solve(net), d, () => true),
        );
      }
      const vol = volAtTop(driver, vdd);
      if (vol !== undefined) {
        fixed[d] = vol;
        let net = network(path, c, ohms, fixed, 'low', driver);
        for (const b of far) net = withInjected(net, b.node, pullCurrentAt(b.link.other, c, vol));
        low = Math.max(low, -currentOut(net, solve(net), d, () => true));
      }
    }
  }
  return { high, low };
}

/** The pull-up current of a node at a low level `v`, with each resistor at its low end, A. */
function pullCurrentAt(node: PathNode, corner: Corner, v: number): number {
  let i = 0;
  for (const p of node.pulls) {
    const end = pullEndVoltage(p, corner);
    if (end > v) i += (end - v) / p.min;
  }
  for (const p of node.pins) i += p.params.iil ?? 0;
  return i;
}

/** Rails of a node's pulls. */
function nodePullRails(node: PathNode): string[] {
  const ids: string[] = [];
  for (const p of node.pulls) if (p.to !== GROUND && !ids.includes(p.to)) ids.push(p.to);
  return ids;
}

/** Whether a FET shifter conducts in this power state (its gate rail is on). */
export function fetOn(part: FetShifter, rails: RailStates): boolean {
  return !rails.off.has(part.gate) && rails.ranges.has(part.gate);
}

/** Whether a shifter passes a low from the side of `link.pin` (a FET with its gate on, a diode into its cathode). */
function conducts(link: ShifterLink, rails: RailStates): boolean {
  if (link.part.kind === 'fet-shifter') return fetOn(link.part, rails);
  return link.pin === 'K';
}

/**
 * The current a low driver on this net sinks from the far side of a shifter: a FET's far pull-ups
 * (and input currents) at the driver's VOL, a diode's anode-side pull-ups with Vf = 0 (the worst
 * case). Where series resistors join the far side to other nets (`otherPath`), their pull-ups
 * count too: that path solved by nodal analysis with the far side held at the driver's VOL
 * (RDS(on) and Vf taken as 0, the worst case), each resistor at its tolerance ends. Largest over
 * the corners.
 */
export function shifterLoad(link: ShifterLink, driver: PinView, rails: RailStates): number {
  if (!conducts(link, rails)) return 0;
  const far = link.otherPath;
  let worst = 0;
  const railIds = [driver.rail, ...(far === undefined ? nodePullRails(link.other) : pathPullRails(far))];
  for (const c of corners(railIds, rails.ranges)) {
    const vol = volAtTop(driver, c.get(driver.rail) ?? 0);
    if (vol === undefined) continue;
    if (far === undefined) {
      worst = Math.max(worst, pullCurrentAt(link.other, c, vol));
      continue;
    }
    let iil = 0;
    for (const p of link.other.pins) iil += p.params.iil ?? 0;
    for (const ohms of casesOf(far)) {
      const fixed: (number | undefined)[] = far.nodes.map(() => undefined);
      fixed[far.self] = vol;
      const net = network(far, c, ohms, fixed, 'low');
      worst = Math.max(worst, iil - currentOut(net, solve(net), far.self));
    }
  }
  return worst;
}

// ---------------------------------------------------------------------------------------------
// Level pairs from drivers on other nets to receivers on this one.

function judge(better: number, worse: number, minMargin: number): PairStatus {
  if (below(better, worse)) return 'fail';
  if (below(better, worse + minMargin)) return 'warning';
  return 'pass';
}

type Scored = LevelSide & { score: number };

function keepWorst(worst: Scored | undefined, next: Scored): Scored {
  return worst === undefined || next.score < worst.score ? next : worst;
}

function strip(s: Scored | undefined): LevelSide | null {
  if (s === undefined) return null;
  const { score: _score, ...side } = s;
  return side;
}

/** Loads of the drivers of a path, each on its own node: own net's plus the series currents. */
export type LoadOf = (driver: PinView) => DriverLoad;

function resistorPairs(
  path: ResistorPath,
  rails: RailStates,
  settings: EffectiveSettings,
  loadOf: LoadOf,
  out: PairAnalysis[],
): void {
  const self = path.nodes[path.self]!;
  const receivers = self.pins.filter((p) => p.powered && p.role !== 'output');
  if (receivers.length === 0) return;
  const cases = casesOf(path);
  const pullRailIds = pathPullRails(path);
  const hasPullUp = path.nodes.some((n) => n.pulls.some((p) => p.to !== GROUND && !rails.off.has(p.to)));
  const via = path.resistors.map((r) => r.id).join('+');
  path.nodes.forEach((node, d) => {
    if (d === path.self) return;
    for (const driver of node.pins) {
      if (!driver.powered || driver.role === 'input') continue;
      const rxs = receivers.filter((rx) => rx.partId !== driver.partId);
      if (rxs.length === 0) continue;
      const load = loadOf(driver);
      const high: (Scored | undefined)[] = rxs.map(() => undefined);
      const low: (Scored | undefined)[] = rxs.map(() => undefined);
      const railIds = [driver.rail, ...rxs.map((rx) => rx.rail), ...pullRailIds];
      const canHigh =
        driver.drive === 'open-drain' ? hasPullUp : driver.params.voh !== undefined && driver.params.voh.length > 0;
      for (const c of corners(railIds, rails.ranges)) {
        const driverVdd = c.get(driver.rail) ?? 0;
        const vohLevel =
          driver.drive === 'open-drain' ? undefined : outputLevel(driver.params.voh, load.high, driverVdd, 'high');
        const volLevel = outputLevel(driver.params.vol, load.low, driverVdd, 'low');
        for (const ohms of cases) {
          // One solve per case serves every receiver on the net: they share its voltage.
          let vHigh: number | undefined;
          if (canHigh) {
            const fixed: (number | undefined)[] = path.nodes.map(() => undefined);
            if (vohLevel !== undefined) fixed[d] = vohLevel.v;
            vHigh = solve(network(path, c, ohms, fixed, 'high', driver))[path.self];
          }
          let vLow: number | undefined;
          if (volLevel !== undefined) {
            const fixed: (number | undefined)[] = path.nodes.map(() => undefined);
            fixed[d] = volLevel.v;
            vLow = solve(network(path, c, ohms, fixed, 'low', driver))[path.self];
          }
          rxs.forEach((rx, k) => {
            const receiverVdd = c.get(rx.rail) ?? 0;
            const vih = highThreshold(rx);
            const vil = lowThreshold(rx);
            if (vih !== undefined && vHigh !== undefined) {
              const v = vHigh;
              const threshold = levelAt(vih, receiverVdd);
              if (high[k] === undefined || v - threshold < high[k]!.score) {
                high[k] = {
                  out: v,
                  threshold,
                  margin: v - threshold,
                  driverVdd: vohLevel === undefined ? null : driverVdd,
                  receiverVdd,
                  estimate: vohLevel?.estimate ?? false,
                  status: judge(v, threshold, settings.minMargin),
                  load: load.high,
                  detail: { vSource: vohLevel?.v ?? 0, ...seriesDetail(path, ohms) },
                  score: v - threshold,
                };
              }
            }
            if (vil !== undefined && vLow !== undefined && volLevel !== undefined) {
              const v = vLow;
              const threshold = levelAt(vil, receiverVdd);
              if (low[k] === undefined || threshold - v < low[k]!.score) {
                low[k] = {
                  out: v,
                  threshold,
                  margin: threshold - v,
                  driverVdd,
                  receiverVdd,
                  estimate: volLevel.estimate,
                  status: judge(threshold, v, settings.minMargin),
                  load: load.low,
                  detail: { vSource: volLevel.v, ...seriesDetail(path, ohms) },
                  score: threshold - v,
                };
              }
            }
          });
        }
      }
      rxs.forEach((rx, k) => {
        if (high[k] === undefined && low[k] === undefined) return;
        out.push({ driver: driver.key, receiver: rx.key, via, high: strip(high[k]), low: strip(low[k]) });
      });
    }
  });
}

/** The rails of a path's pulls. */
function pathPullRails(path: ResistorPath): string[] {
  const ids: string[] = [];
  for (const n of path.nodes) for (const p of n.pulls) if (p.to !== GROUND && !ids.includes(p.to)) ids.push(p.to);
  return ids;
}

/** Each series resistor's value in the case, keyed `R:<id>`, Ω. */
function seriesDetail(path: ResistorPath, ohms: CaseOhms): Record<string, number> {
  const out: Record<string, number> = {};
  path.resistors.forEach((r, k) => {
    out[`R:${r.id}`] = ohms.series[k]!;
  });
  path.nodes.forEach((n, k) => {
    n.pulls.forEach((p, j) => {
      if (p.resistor === true) out[`R:${p.origin}`] = ohms.pulls[k]![j]!;
    });
  });
  return out;
}

/** A node's pulled-up level across a shifter at one corner: a diode's leakage is drawn through its pull. */
function pulledAcross(
  part: Discrete,
  node: PathNode,
  corner: Corner,
): { v: number; r: number; vpull: number } | undefined {
  return pulledHigh(node, corner, part.kind === 'diode-shifter' ? part.leakageMax : 0);
}

/**
 * A receiver's high across a shifter: its own node's pull-up level against its VIH (the driver
 * only lets go, so the driver's supply plays no part), with the quantities it came from: the
 * pull's resistance and, for a diode, the reverse leakage drawn through that pull. One function
 * for a driver beside the shifter and for one beyond series resistors, so that both judge and
 * name the same.
 */
function pulledHighSide(
  part: Discrete,
  pulled: { v: number; r: number; vpull: number },
  vih: Level,
  receiverVdd: number,
  minMargin: number,
): Scored {
  const threshold = levelAt(vih, receiverVdd);
  return {
    out: pulled.v,
    threshold,
    margin: pulled.v - threshold,
    driverVdd: null,
    receiverVdd,
    vpull: pulled.vpull,
    estimate: false,
    status: judge(pulled.v, threshold, minMargin),
    load: 0,
    detail:
      part.kind === 'diode-shifter'
        ? { pullResistance: pulled.r, leakage: part.leakageMax }
        : { pullResistance: pulled.r },
    score: pulled.v - threshold,
  };
}

/** The high level a node's own pull-ups give it: Thévenin of the pulls (each at its high end) less the input currents' drop. */
function pulledHigh(
  node: PathNode,
  corner: Corner,
  extraCurrent: number,
): { v: number; r: number; vpull: number } | undefined {
  if (!node.pulls.some((p) => p.to !== GROUND)) return undefined;
  let g = 0;
  let i = 0;
  for (const p of node.pulls) {
    const r = p.max;
    g += 1 / r;
    i += pullEndVoltage(p, corner) / r;
  }
  const r = 1 / g;
  const vpull = r * i;
  let iih = extraCurrent;
  for (const p of node.pins) iih += p.params.iih ?? 0;
  return { v: vpull - r * iih, r, vpull };
}

function shifterPairs(
  link: ShifterLink,
  rails: RailStates,
  settings: EffectiveSettings,
  loadOf: LoadOf,
  out: PairAnalysis[],
): void {
  const { part } = link;
  if (part.kind === 'fet-shifter' && !fetOn(part, rails)) return;
  // A diode passes a low from its cathode to its anode only.
  if (part.kind === 'diode-shifter' && link.pin !== 'A') return;
  const receivers = link.self.pins.filter((p) => p.powered && p.role !== 'output');
  const pullRailIds = nodePullRails(link.self);
  for (const driver of link.other.pins) {
    if (!driver.powered || driver.role === 'input') continue;
    const load = loadOf(driver);
    for (const rx of receivers) {
      if (rx.partId === driver.partId) continue;
      const vih = highThreshold(rx);
      const vil = lowThreshold(rx);
      let high: Scored | undefined;
      let low: Scored | undefined;
      for (const c of corners([driver.rail, rx.rail, ...pullRailIds], rails.ranges)) {
        const driverVdd = c.get(driver.rail) ?? 0;
        const receiverVdd = c.get(rx.rail) ?? 0;
        const pulled = pulledAcross(part, link.self, c);
        if (vih !== undefined && pulled !== undefined)
          high = keepWorst(high, pulledHighSide(part, pulled, vih, receiverVdd, settings.minMargin));
        const vol = outputLevel(driver.params.vol, load.low, driverVdd, 'low');
        if (vil !== undefined && vol !== undefined) {
          let v: number;
          let detail: Record<string, number>;
          if (part.kind === 'fet-shifter') {
            const iFar = pullCurrentAt(link.self, c, vol.v);
            v = vol.v + iFar * part.rdsOnMax;
            detail = { vol: vol.v, iFar, rdsOn: part.rdsOnMax };
          } else {
            v = vol.v + part.vfMax;
            detail = { vol: vol.v, vf: part.vfMax };
          }
          const threshold = levelAt(vil, receiverVdd);
          low = keepWorst(low, {
            out: v,
            threshold,
            margin: threshold - v,
            driverVdd,
            receiverVdd,
            estimate: vol.estimate,
            status: judge(threshold, v, settings.minMargin),
            load: load.low,
            detail,
            score: threshold - v,
          });
        }
      }
      if (high === undefined && low === undefined) continue;
      out.push({ driver: driver.key, receiver: rx.key, via: part.id, high: strip(high), low: strip(low) });
    }
  }
  if (link.otherPath !== undefined) throughPathPairs(link, link.otherPath, receivers, rails, settings, out);
}

/** The network with `i` more current fed into node `k`. */
function withInjected(net: Network, k: number, i: number): Network {
  return { ...net, inject: net.inject.map((x, j) => (j === k ? x + i : x)) };
}

/**
 * Drivers that reach the shifter's other side through series resistors, receivers on this side.
 * The other side's low is solved by nodal analysis with the driver at its VOL and this side's
 * pull-up current flowing in through the shifter, taken at 0 V (its largest: a bound); the
 * driver's VOL is read at the current it sinks with its pin at 0 V (its largest, again a bound).
 * A FET must then turn on, VGS = Vgate − V_other ≥ VGS(th),max; where it is not guaranteed to, the
 * receiver's side stays at its pulled-up level and the low fails. This side's low is V_other +
 * I·RDS(on) (FET) or V_other + Vf (diode); its high is its own pull-up's, as for a driver on the
 * other side. Worst over the rails' corners and the resistors' tolerance ends.
 */
function throughPathPairs(
  link: ShifterLink,
  path: ResistorPath,
  receivers: readonly PinView[],
  rails: RailStates,
  settings: EffectiveSettings,
  out: PairAnalysis[],
): void {
  const { part } = link;
  const near = path.self;
  const via = [...path.resistors.map((r) => r.id), part.id].join('+');
  const railIds = [...pathRails(path), ...nodePullRails(link.self)];
  if (part.kind === 'fet-shifter' && !railIds.includes(part.gate)) railIds.push(part.gate);
  const cases = casesOf(path);
  path.nodes.forEach((node, k) => {
    if (k === near) return;
    for (const driver of node.pins) {
      if (!driver.powered || driver.role === 'input') continue;
      for (const rx of receivers) {
        if (rx.partId === driver.partId) continue;
        const vih = highThreshold(rx);
        const vil = lowThreshold(rx);
        let high: Scored | undefined;
        let low: Scored | undefined;
        for (const c of corners([driver.rail, rx.rail, ...railIds], rails.ranges)) {
          const driverVdd = c.get(driver.rail) ?? 0;
          const receiverVdd = c.get(rx.rail) ?? 0;
          const pulled = pulledAcross(part, link.self, c);
          if (vih !== undefined && pulled !== undefined)
            high = keepWorst(high, pulledHighSide(part, pulled, vih, receiverVdd, settings.minMargin));
          if (vil === undefined || driver.params.vol === undefined || driver.params.vol.length === 0) continue;
          const iFar = pullCurrentAt(link.self, c, 0);
          const threshold = levelAt(vil, receiverVdd);
          for (const ohms of cases) {
            const fixed: (number | undefined)[] = path.nodes.map(() => undefined);
            fixed[k] = 0;
            const atZero = withInjected(network(path, c, ohms, fixed, 'low', driver), near, iFar);
            const load = -currentOut(atZero, solve(atZero), k);
            const vol = outputLevel(driver.params.vol, load, driverVdd, 'low');
            if (vol === undefined) continue;
            fixed[k] = vol.v;
            const net = withInjected(network(path, c, ohms, fixed, 'low', driver), near, iFar);
            const vNear = solve(net)[near] ?? Number.NaN;
            let v: number;
            let detail: Record<string, number> = { vol: vol.v, vNear, iFar, ...seriesDetail(path, ohms) };
            if (part.kind === 'fet-shifter') {
              const vgs = (c.get(part.gate) ?? 0) - vNear;
              detail = { ...detail, vgs, rdsOn: part.rdsOnMax };
              // Not guaranteed to turn on: this side keeps its pulled-up level.
              v = below(vgs, part.vgsThMax) ? (pulled?.v ?? Number.NaN) : vNear + iFar * part.rdsOnMax;
            } else {
              v = vNear + part.vfMax;
              detail = { ...detail, vf: part.vfMax };
            }
            low = keepWorst(low, {
              out: v,
              threshold,
              margin: threshold - v,
              driverVdd,
              receiverVdd,
              estimate: vol.estimate,
              status: judge(threshold, v, settings.minMargin),
              load,
              detail,
              score: threshold - v,
            });
          }
        }
        if (high === undefined && low === undefined) continue;
        out.push({ driver: driver.key, receiver: rx.key, via, high: strip(high), low: strip(low) });
      }
    }
  });
}

/** Pairs whose driver sits on another net of the path or across a shifter, receiver on this net. */
export function remotePairs(
  path: ResistorPath | undefined,
  shifters: readonly ShifterLink[],
  rails: RailStates,
  settings: EffectiveSettings,
  loadOf: LoadOf,
): PairAnalysis[] {
  const out: PairAnalysis[] = [];
  if (path !== undefined) resistorPairs(path, rails, settings, loadOf, out);
  for (const s of shifters) shifterPairs(s, rails, settings, loadOf, out);
  return out;
}

/** Powered drivers on other nets that reach this one (series resistors, shifters that pass to it). */
export function remoteDriversOf(
  path: ResistorPath | undefined,
  shifters: readonly ShifterLink[],
  rails: RailStates,
): PinView[] {
  const out: PinView[] = [];
  path?.nodes.forEach((n, k) => {
    if (k !== path.self) for (const p of n.pins) if (p.powered && p.role !== 'input') out.push(p);
  });
  for (const s of shifters) {
    if (s.part.kind === 'fet-shifter' && !fetOn(s.part, rails)) continue;
    if (s.part.kind === 'diode-shifter' && s.pin !== 'A') continue;
    for (const p of s.other.pins) if (p.powered && p.role !== 'input' && !out.includes(p)) out.push(p);
    for (const n of s.otherPath?.nodes ?? [])
      for (const p of n.pins) if (p.powered && p.role !== 'input' && !out.includes(p)) out.push(p);
  }
  return out;
}

// ---------------------------------------------------------------------------------------------
// Exposure of a pin to sources on other nets of its path.

export interface PathExposure {
  /** The open-circuit voltage of the pin's net at the worst case, V. */
  readonly vNet: number;
  readonly limit: number;
  /** The driver's key, or `pulls` when the path's pull resistors alone do it. */
  readonly source: string;
  readonly pinVdd: number;
  /**
   * The largest current into the pin with its net held at the clamp voltage (its own supply in
   * that case, Vf = 0: the worst case), A; 0 when the exposure does not exceed the limit.
   */
  readonly current: number;
  /** The series resistors' values in the worst case, Ω, keyed by id. */
  readonly resistors: Readonly<Record<string, number>>;
}

/**
 * The worst exposure of `pin` (on the path's own node) to each powered push-pull or three-state
 * driver on another node at its rail's value (`high`) or at min(0, its rail) (`low`), and to the
 * path's pulls alone. `excess` is how far the net passes the limit (positive: beyond it).
 */
export function pathExposure(
  path: ResistorPath,
  pin: PinView,
  rails: RailStates,
  limit: (pinVdd: number) => number,
  sense: 'high' | 'low',
  /** Names the limit, so that rules judging the same limit share one computation. */
  limitKey?: string,
): PathExposure | undefined {
  if (limitKey === undefined) return exposureOf(path, pin, rails, limit, sense);
  let memo = exposureMemo.get(path);
  if (memo === undefined) exposureMemo.set(path, (memo = new Map()));
  const key = `${pin.key}\u0000${sense}\u0000${limitKey}`;
  if (memo.has(key)) return memo.get(key);
  const made = exposureOf(path, pin, rails, limit, sense);
  memo.set(key, made);
  return made;
}

const exposureMemo = new WeakMap<ResistorPath, Map<string, PathExposure | undefined>>();

function exposureOf(
  path: ResistorPath,
  pin: PinView,
  rails: RailStates,
  limit: (pinVdd: number) => number,
  sense: 'high' | 'low',
): PathExposure | undefined {
  // With no input currents a free node lies between its sources' voltages: when no source can
  // pass the limit at the pin rail's worst end, nothing needs solving.
  const pinRange = rails.ranges.get(pin.rail) ?? { min: 0, max: 0 };
  const limLow = Math.min(limit(pinRange.min), limit(pinRange.max));
  const limHigh = Math.max(limit(pinRange.min), limit(pinRange.max));
  let extreme = 0;
  const see = (r: Range | undefined) => {
    if (r === undefined) return;
    extreme = sense === 'high' ? Math.max(extreme, r.max) : Math.min(extreme, r.min);
  };
  path.nodes.forEach((n, k) => {
    for (const p of n.pulls) if (p.to !== GROUND) see(rails.ranges.get(p.to));
    if (k !== path.self)
      for (const p of n.pins)
        if (p.powered && p.role !== 'input' && p.drive !== 'open-drain') see(rails.ranges.get(p.rail));
  });
  // A number that is not finite is never short-cut: it must come out as undecidable.
  const finite = Number.isFinite(extreme) && Number.isFinite(limLow) && Number.isFinite(limHigh);
  if (finite && (sense === 'high' ? !(extreme > limLow) : !(extreme < limHigh))) return undefined;
  const self = path.self;
  const sources: { key: string; node: number; rail: string | undefined }[] = [];
  path.nodes.forEach((n, k) => {
    if (k === self) return;
    for (const p of n.pins)
      if (p.powered && p.role !== 'input' && p.drive !== 'open-drain')
        sources.push({ key: p.key, node: k, rail: p.rail });
  });
  const remotePull = path.nodes.some((n, k) => k !== self && n.pulls.some((p) => p.to !== GROUND));
  if (remotePull || sources.length === 0) sources.push({ key: 'pulls', node: -1, rail: undefined });
  const railIds = pathRails(path);
  if (!railIds.includes(pin.rail)) railIds.push(pin.rail);
  let worst: (PathExposure & { excess: number; sourceNode: number; sourceRail: string | undefined }) | undefined;
  for (const s of sources) {
    for (const c of corners(railIds, rails.ranges)) {
      const pinVdd = c.get(pin.rail) ?? 0;
      const lim = limit(pinVdd);
      for (const ohms of casesOf(path)) {
        const fixed: (number | undefined)[] = path.nodes.map(() => undefined);
        if (s.node >= 0) {
          const v = c.get(s.rail!) ?? 0;
          fixed[s.node] = sense === 'high' ? v : Math.min(0, v);
        }
        const v = solve(network(path, c, ohms, fixed, 'none'))[self];
        if (v === undefined) continue;
        const excess = sense === 'high' ? v - lim : lim - v;
        if (worst === undefined || excess > worst.excess || !Number.isFinite(excess)) {
          worst = {
            vNet: v,
            limit: lim,
            source: s.key,
            pinVdd,
            current: 0,
            resistors: seriesDetail(path, ohms),
            excess,
            sourceNode: s.node,
            sourceRail: s.rail,
          };
        }
      }
    }
  }
  if (worst === undefined) return undefined;
  let current = 0;
  if ((worst.excess > 0 || !Number.isFinite(worst.excess)) && sense === 'high') {
    // The clamp holds the pin at its supply (Vf = 0): the current the path then pushes into it.
    for (const c of corners(railIds, rails.ranges)) {
      for (const ohms of casesOf(path)) {
        const fixed: (number | undefined)[] = path.nodes.map(() => undefined);
        if (worst.sourceNode >= 0) fixed[worst.sourceNode] = c.get(worst.sourceRail!) ?? 0;
        fixed[self] = c.get(pin.rail) ?? 0;
        const net = network(path, c, ohms, fixed, 'none');
        current = Math.max(current, -currentOut(net, solve(net), self));
      }
    }
  }
  const { excess: _e, sourceNode: _n, sourceRail: _r, ...exposure } = worst;
  return { ...exposure, current };
}

// ---------------------------------------------------------------------------------------------
// The edge at a net reached through series resistors.

/**
 * For a net with no powered push-pull or three-state driver of its own, the slowest 10–90 % edge
 * from a driver on another node: ln 9 · Rth · C, Rth the resistance seen from this net with the
 * driver's node and every pull's rail at 0 V and each resistor at its high end, C this net's
 * capacitance (the other nodes' capacitance is left out: a single-pole estimate).
 */
export function pathEdgeOf(path: ResistorPath, rails: RailStates): PathEdge | undefined {
  const self = path.nodes[path.self]!;
  if (self.pins.some((p) => p.powered && p.role !== 'input' && p.drive !== 'open-drain')) return undefined;
  const ohms = toleranceCases(path, 'max')[0]!;
  let slowest: PathEdge | undefined;
  path.nodes.forEach((n, k) => {
    if (k === path.self) return;
    for (const d of n.pins) {
      if (!d.powered || d.role === 'input' || d.drive === 'open-drain') continue;
      const fixed: (number | undefined)[] = path.nodes.map(() => undefined);
      fixed[k] = 0;
      const net = network(path, new Map(), ohms, fixed, 'none', undefined, true);
      const inject = net.inject.map((_, j) => (j === path.self ? 1 : 0));
      const r = solve({ ...net, inject })[path.self];
      if (r === undefined || !Number.isFinite(r)) continue;
      // The swing at this net: the driver at its rail's lowest, every rail at its lowest.
      const low = new Map<string, number>();
      for (const [id, range] of rails.ranges as ReadonlyMap<string, Range>) low.set(id, range.min);
      const at = path.nodes.map((): number | undefined => undefined);
      at[k] = low.get(d.rail) ?? 0;
      const swing = solve(network(path, low, toleranceCases(path, 'min')[0]!, at, 'none'))[path.self] ?? 0;
      const edge: PathEdge = {
        driver: d.key,
        resistance: r,
        capacitance: self.capacitance,
        riseTime: RISE_10_90 * r * self.capacitance,
        swing,
      };
      if (slowest === undefined || edge.riseTime > slowest.riseTime) slowest = edge;
    }
  });
  return slowest;
}

/**
 * The rails a net crosses, for the crossing table: its own pins' when they differ, else, when a
 * driver reaches it through a part between chips, those of every pin so joined; undefined when it
 * crosses none.
 */
export function crossingRails(view: NetView): readonly string[] | undefined {
  if (view.pinRails.length >= 2) return view.pinRails;
  if (view.pathRails.length >= 2 && view.analysis.pairs.some((p) => p.via !== undefined)) return view.pathRails;
  return undefined;
}

export type { FetShifter, DiodeShifter };

// ---------------------------------------------------------------------------------------------
// Chains the analysis does not solve.

/**
 * How a net was reached, walking out from the net being judged: through series resistors only
 * (`R`, solved by nodal analysis), across one shifter next to it (`S`, solved per shifter), across
 * that shifter and then series resistors (`SR`: the shifter's near side solved by nodal analysis
 * with the far side's pull-up current), or otherwise (`X`: a shifter beyond a resistor, two
 * shifters).
 */
type Reach = 'R' | 'S' | 'SR' | 'X';

/**
 * Every powered driver that reaches `net` through parts between chips by a chain that mixes
 * series resistors and shifters other than resistors before one shifter next to the receiver's
 * net, or crosses more than one shifter: the pair analysis solves nothing else, so such a
 * driver's pairs would otherwise go unjudged. A FET passes while its gate rail is on; a diode passes from
 * its cathode's net to its anode's. Each driver once, with the first chain found (breadth first).
 */
export function unjudgedChains(net: Net, src: PathSource, rails: RailStates): UnjudgedChain[] {
  const seen = new Set<string>();
  const out: UnjudgedChain[] = [];
  const reported = new Set<string>();
  const queue: { net: string; reach: Reach | 'start'; via: string[]; gates: string[] }[] = [
    { net: net.id, reach: 'start', via: [], gates: [] },
  ];
  seen.add(`${net.id}\u0000start`);
  for (let k = 0; k < queue.length; k++) {
    const at = queue[k]!;
    if (at.reach === 'X') {
      for (const p of src.pinsOf(src.nets.get(at.net)!)) {
        if (!p.powered || p.role === 'input' || reported.has(p.key)) continue;
        reported.add(p.key);
        out.push({ driver: p.key, via: at.via, rails: [p.rail, ...at.gates] });
      }
    }
    for (const id of [...(src.linksOfNet.get(at.net) ?? [])].sort()) {
      const d = src.discretes.get(id);
      if (d === undefined || at.via.includes(id)) continue;
      const x = across(d, at.net, src);
      if (x === undefined || !src.nets.has(x.other)) continue;
      let reach: Reach;
      const gates = [...at.gates];
      if (d.kind === 'resistor') reach = at.reach === 'start' || at.reach === 'R' ? 'R' : at.reach === 'X' ? 'X' : 'SR';
      else {
        if (d.kind === 'fet-shifter') {
          if (!fetOn(d, rails)) continue;
          gates.push(d.gate);
        }
        // A diode passes towards its anode: this net must be on A.
        if (d.kind === 'diode-shifter' && x.pin !== 'A') continue;
        reach = at.reach === 'start' ? 'S' : 'X';
      }
      const key = `${x.other}\u0000${reach}`;
      if (seen.has(key) || x.other === net.id) continue;
      seen.add(key);
      queue.push({ net: x.other, reach, via: [id, ...at.via], gates });
    }
  }
  return out;
}
