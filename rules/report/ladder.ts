/**
 * The voltage ladder of a net in one power state: one vertical voltage axis with each driver's
 * guaranteed output bands, each receiver's thresholds and limits, and the noise margins between
 * them. A model only (no drawing): the editor's ladder and any report can draw it. Every number
 * of a driver/receiver pair is the engine's analysis number, unchanged.
 */
import { levelAt } from '../levels/level.ts';
import { outputLevel } from '../levels/output.ts';
import { corners, type Range } from '../levels/rails.ts';
import { highThreshold, lowThreshold } from '../engine/resolve.ts';
import { pullRails, thevenin } from '../engine/netMath.ts';
import type { LevelSide, NetView, PairAnalysis, PairStatus, PinView, PowerState } from '../engine/types.ts';
import type { PinDrive, PinRole } from '../model/schema.ts';

/** A rail the net touches (its pins' or its pulls'), in this power state. */
export interface LadderRail {
  readonly id: string;
  readonly min: number;
  readonly max: number;
  readonly off: boolean;
}

/** Where a band's or a threshold's numbers come from. */
export interface LadderOrigin {
  /** The pair analysed at the worst corner whose numbers these are; undefined when the pin is in no pair. */
  readonly pair?: { readonly driver: string; readonly receiver: string };
}

/** The guaranteed high band: from VOH (or the pulled-up level) up to the driver's supply (or Vpull). */
export interface LadderHighBand extends LadderOrigin {
  readonly from: number;
  readonly to: number;
  /** The driver's supply at that corner; null when the high level comes from the pull-up. */
  readonly driverVdd: number | null;
  readonly vpull?: number;
  /** The load current the level was selected for, A. */
  readonly load: number;
  readonly estimate: boolean;
}

/** The guaranteed low band: from 0 V up to VOL. */
export interface LadderLowBand extends LadderOrigin {
  readonly from: 0;
  readonly to: number;
  readonly driverVdd: number;
  readonly load: number;
  readonly estimate: boolean;
}

/** A powered driver: its guaranteed bands at the corner of its worst pair. */
export interface LadderDriver {
  readonly pin: string;
  readonly part: string;
  readonly rail: string;
  readonly drive: PinDrive;
  readonly high: LadderHighBand | null;
  readonly low: LadderLowBand | null;
}

/** A threshold at the supply of its worst corner. */
export interface LadderThreshold extends LadderOrigin {
  readonly volts: number;
  readonly receiverVdd: number;
}

/** A powered receiver: its thresholds at the corner of its worst pair, its rail and its limit. */
export interface LadderReceiver {
  readonly pin: string;
  readonly part: string;
  readonly rail: string;
  /** VIH (vtPlus for a Schmitt input) at its worst corner. */
  readonly vih: LadderThreshold | null;
  /** VIL (vtMinus for a Schmitt input) at its worst corner. */
  readonly vil: LadderThreshold | null;
  readonly schmitt: boolean;
  /** The rail's range in this power state. */
  readonly railRange: Range;
  /** The highest voltage the pin may see, at its rail's lowest voltage (as `overvoltage` takes it). */
  readonly viMax: { readonly volts: number; readonly vdd: number } | null;
}

/** One noise margin of a pair: NMH from VOH down to VIH, or NML from VIL down to VOL. */
export interface LadderMargin {
  readonly kind: 'nmh' | 'nml';
  readonly driver: string;
  readonly receiver: string;
  /** VOH (nmh) or VIL (nml), V. */
  readonly upper: number;
  /** VIH (nmh) or VOL (nml), V. */
  readonly lower: number;
  /** `upper − lower`: negative when the pair fails. */
  readonly margin: number;
  readonly status: PairStatus;
  readonly driverVdd: number | null;
  readonly receiverVdd: number;
  readonly vpull?: number;
  readonly estimate: boolean;
}

/** The voltage ladder of one net in one power state. */
export interface Ladder {
  readonly net: string;
  readonly label: string;
  readonly state: { readonly id: string; readonly label: string; readonly off: readonly string[] };
  readonly minMargin: number;
  /** The axis runs from 0 V to `top`, a round value a little above everything drawn. */
  readonly top: number;
  /** Round values for the axis' marks, 0 and `top` included. */
  readonly ticks: readonly number[];
  readonly rails: readonly LadderRail[];
  readonly drivers: readonly LadderDriver[];
  readonly receivers: readonly LadderReceiver[];
  readonly margins: readonly LadderMargin[];
  /** Pins on an off rail: drawn as unpowered. */
  readonly unpowered: readonly { readonly pin: string; readonly rail: string; readonly role: PinRole }[];
  readonly worstHigh: number | null;
  readonly worstLow: number | null;
}

/** The side of the pairs that has the smallest margin, with its pair. */
function worstSide(
  pairs: readonly PairAnalysis[],
  side: 'high' | 'low',
): { pair: PairAnalysis; s: LevelSide } | undefined {
  let best: { pair: PairAnalysis; s: LevelSide } | undefined;
  for (const pair of pairs) {
    const s = pair[side];
    if (s !== null && (best === undefined || s.margin < best.s.margin)) best = { pair, s };
  }
  return best;
}

const ZERO: Range = { min: 0, max: 0 };

function railRangeOf(view: NetView, rail: string): Range {
  return view.rails.ranges.get(rail) ?? ZERO;
}

/** The pulled-up level of an open-drain net at its lowest corner, for a driver in no pair. */
function pulledHigh(view: NetView): { v: number; vpull: number; load: number } | undefined {
  if (!view.highFromPull) return undefined;
  let sumIih = 0;
  for (const p of view.pins) sumIih += p.params.iih ?? 0;
  let worst: { v: number; vpull: number; load: number } | undefined;
  for (const c of corners(pullRails(view.pulls), view.rails.ranges)) {
    const th = thevenin(view.pulls, c);
    if (th === undefined) continue;
    const v = th.v - th.r * sumIih;
    if (worst === undefined || v < worst.v) worst = { v, vpull: th.v, load: sumIih };
  }
  return worst;
}

function driverOf(view: NetView, d: PinView): LadderDriver {
  const mine = view.analysis.pairs.filter((p) => p.driver === d.key);
  const wh = worstSide(mine, 'high');
  const wl = worstSide(mine, 'low');
  const range = railRangeOf(view, d.rail);
  const load = view.loads.get(d.key);
  let high: LadderHighBand | null = null;
  if (wh !== undefined) {
    const s = wh.s;
    high = {
      from: s.out,
      to: s.vpull ?? s.driverVdd ?? s.out,
      driverVdd: s.driverVdd,
      ...(s.vpull === undefined ? {} : { vpull: s.vpull }),
      load: s.load,
      estimate: s.estimate,
      pair: { driver: wh.pair.driver, receiver: wh.pair.receiver },
    };
  } else if (d.drive === 'open-drain') {
    const up = pulledHigh(view);
    if (up !== undefined)
      high = { from: up.v, to: up.vpull, driverVdd: null, vpull: up.vpull, load: up.load, estimate: false };
  } else {
    // In no pair: its own rail's lowest supply is its worst corner.
    const level = outputLevel(d.params.voh, load?.high ?? 0, range.min, 'high');
    if (level !== undefined)
      high = { from: level.v, to: range.min, driverVdd: range.min, load: load?.high ?? 0, estimate: level.estimate };
  }
  let low: LadderLowBand | null = null;
  if (wl !== undefined) {
    const s = wl.s;
    low = {
      from: 0,
      to: s.out,
      driverVdd: s.driverVdd ?? 0,
      load: s.load,
      estimate: s.estimate,
      pair: { driver: wl.pair.driver, receiver: wl.pair.receiver },
    };
  } else {
    const level = outputLevel(d.params.vol, load?.low ?? 0, range.max, 'low');
    if (level !== undefined)
      low = { from: 0, to: level.v, driverVdd: range.max, load: load?.low ?? 0, estimate: level.estimate };
  }
  return { pin: d.key, part: d.partId, rail: d.rail, drive: d.drive ?? 'push-pull', high, low };
}

function receiverOf(view: NetView, r: PinView): LadderReceiver {
  const mine = view.analysis.pairs.filter((p) => p.receiver === r.key);
  const wh = worstSide(mine, 'high');
  const wl = worstSide(mine, 'low');
  const range = railRangeOf(view, r.rail);
  const hi = highThreshold(r);
  const lo = lowThreshold(r);
  const pairOf = (w: { pair: PairAnalysis }) => ({ driver: w.pair.driver, receiver: w.pair.receiver });
  // In no pair: VIH is worst at the rail's highest supply, VIL at its lowest.
  const vih: LadderThreshold | null =
    wh !== undefined
      ? { volts: wh.s.threshold, receiverVdd: wh.s.receiverVdd, pair: pairOf(wh) }
      : hi === undefined
        ? null
        : { volts: levelAt(hi, range.max), receiverVdd: range.max };
  const vil: LadderThreshold | null =
    wl !== undefined
      ? { volts: wl.s.threshold, receiverVdd: wl.s.receiverVdd, pair: pairOf(wl) }
      : lo === undefined
        ? null
        : { volts: levelAt(lo, range.min), receiverVdd: range.min };
  const viMax = r.params.viMax === undefined ? null : { volts: levelAt(r.params.viMax, range.min), vdd: range.min };
  return {
    pin: r.key,
    part: r.partId,
    rail: r.rail,
    vih,
    vil,
    schmitt: r.params.schmitt !== undefined,
    railRange: range,
    viMax,
  };
}

function marginsOf(view: NetView): LadderMargin[] {
  const out: LadderMargin[] = [];
  for (const pair of view.analysis.pairs) {
    const h = pair.high;
    if (h !== null) {
      out.push({
        kind: 'nmh',
        driver: pair.driver,
        receiver: pair.receiver,
        upper: h.out,
        lower: h.threshold,
        margin: h.margin,
        status: h.status,
        driverVdd: h.driverVdd,
        receiverVdd: h.receiverVdd,
        ...(h.vpull === undefined ? {} : { vpull: h.vpull }),
        estimate: h.estimate,
      });
    }
    const l = pair.low;
    if (l !== null) {
      out.push({
        kind: 'nml',
        driver: pair.driver,
        receiver: pair.receiver,
        upper: l.threshold,
        lower: l.out,
        margin: l.margin,
        status: l.status,
        driverVdd: l.driverVdd,
        receiverVdd: l.receiverVdd,
        estimate: l.estimate,
      });
    }
  }
  return out;
}

/** Steps the axis may use, volts: the smallest that needs at most {@link MAX_STEPS} marks wins. */
const STEPS = [0.1, 0.25, 0.5, 1, 2, 5, 10];
const MAX_STEPS = 14;
/** Room above the highest value drawn, as a fraction of it. */
const HEADROOM = 0.05;

/**
 * The highest axis drawn, volts. Levels come from the design's numbers, and a VOH extrapolated
 * from test points of absurd currents can be astronomically large: the axis stops here and
 * such a level sits at its top (ladderLayout.ts, `onAxis`), its label printing the number.
 */
const AXIS_CEILING = 1e6;

/** A 1-2-5 step of the right decade when the fixed ones would need too many marks. */
function decadeStep(want: number): number {
  const decade = 10 ** Math.floor(Math.log10(want / MAX_STEPS));
  return [1, 2, 5, 10].map((m) => m * decade).find((s) => Math.ceil(want / s - 1e-9) <= MAX_STEPS) ?? 10 * decade;
}

/** The axis' top and marks for values up to `highest`. */
export function ladderAxis(highest: number): { top: number; ticks: number[] } {
  const want = Math.min(Math.max(Number.isNaN(highest) ? 0 : highest, 0.1), AXIS_CEILING) * (1 + HEADROOM);
  const step = STEPS.find((s) => Math.ceil(want / s - 1e-9) <= MAX_STEPS) ?? decadeStep(want);
  const n = Math.ceil(want / step - 1e-9);
  // Multiples built from integers, so that 0.1 × 3 prints as 0.3.
  const ticks = Array.from({ length: n + 1 }, (_, k) => Number((k * step).toFixed(2)));
  return { top: ticks[n]!, ticks };
}

/** The voltage ladder of the net of `view`, in its power state. */
/** The ladder of one net's view in the power state it was prepared for (views carry no state: a
 * view judged alike in several states is shared by them). */
export function ladderFor(view: NetView, state: PowerState): Ladder {
  const rails: LadderRail[] = [...view.rails.ranges].map(([id, r]) => ({
    id,
    min: r.min,
    max: r.max,
    off: view.rails.off.has(id),
  }));
  const drivers = view.drivers.map((d) => driverOf(view, d));
  const receivers = view.receivers.map((r) => receiverOf(view, r));
  let highest = 0;
  for (const r of rails) highest = Math.max(highest, r.max);
  for (const d of drivers) highest = Math.max(highest, d.high?.to ?? 0, d.high?.from ?? 0, d.low?.to ?? 0);
  for (const r of receivers) highest = Math.max(highest, r.viMax?.volts ?? 0, r.vih?.volts ?? 0);
  const { top, ticks } = ladderAxis(highest);
  return {
    net: view.net.id,
    label: view.net.label ?? view.net.id,
    state: { id: state.id, label: state.label, off: [...state.off] },
    minMargin: view.settings.minMargin,
    top,
    ticks,
    rails,
    drivers,
    receivers,
    margins: marginsOf(view),
    unpowered: view.unpowered.map((p) => ({ pin: p.key, rail: p.rail, role: p.role })),
    worstHigh: view.analysis.worstHigh,
    worstLow: view.analysis.worstLow,
  };
}
