/**
 * The level analysis of a net: every powered driver/receiver pair on different parts, each side
 * (high, low) at its worst corner, with the level that the actual load selects. The level rules,
 * the report's margin table and the editor all read this one analysis.
 */
import { levelAt } from '../levels/level.ts';
import { type OutputPoint, outputLevel, outputVolts } from '../levels/output.ts';
import { corners, pairCorners } from '../levels/rails.ts';
import type { Level } from '../levels/level.ts';
import { below, lowerScore } from '../levels/compare.ts';
import { highThreshold, lowThreshold } from './resolve.ts';
import { pullRails, thevenin } from './netMath.ts';
import type {
  DriverLoad,
  EffectiveSettings,
  LevelSide,
  NetAnalysis,
  PairAnalysis,
  PairStatus,
  PinView,
  PullSource,
  RailStates,
} from './types.ts';

export interface AnalysisInput {
  readonly pins: readonly PinView[];
  readonly drivers: readonly PinView[];
  readonly receivers: readonly PinView[];
  readonly pulls: readonly PullSource[];
  readonly highFromPull: boolean;
  readonly loads: ReadonlyMap<string, DriverLoad>;
  readonly rails: RailStates;
  readonly settings: EffectiveSettings;
}

/**
 * Pass, warning or fail for the level that must be higher (`better`) against the one it must
 * clear; `below` answers true for a value that is not finite, so such a pair fails.
 */
function judge(better: number, worse: number, minMargin: number): PairStatus {
  // Compare the levels themselves, never their difference with 0 (rules-catalogue.md).
  if (below(better, worse)) return 'fail';
  if (below(better, worse + minMargin)) return 'warning';
  return 'pass';
}

function highSide(input: AnalysisInput, driver: PinView, receiver: PinView, sumIih: number): LevelSide | null {
  const vih = highThreshold(receiver);
  if (vih === undefined) return null;
  const { rails, settings } = input;
  if (driver.drive === 'open-drain') {
    if (!input.highFromPull) return null;
    const railIds = [...pullRails(input.pulls), receiver.rail];
    // Scored with numbers, as a push-pull side is: one object for the worst corner.
    let found = false;
    let out = 0;
    let threshold = 0;
    let receiverVdd = 0;
    let vpull = 0;
    for (const c of corners(railIds, rails.ranges)) {
      // The pulls at the top of their ranges: the weakest pull-up gives the lowest high level.
      const th = thevenin(input.pulls, c, 'max')!;
      const o = th.v - th.r * sumIih;
      const rv = c.get(receiver.rail) ?? 0;
      const t = levelAt(vih, rv);
      if (found && !lowerScore(o - t, out - threshold)) continue;
      found = true;
      out = o;
      threshold = t;
      receiverVdd = rv;
      vpull = th.v;
    }
    if (!found) return null;
    return {
      out,
      threshold,
      margin: out - threshold,
      driverVdd: null,
      receiverVdd,
      vpull,
      estimate: false,
      status: judge(out, threshold, settings.minMargin),
      load: sumIih,
    };
  }
  const voh = driver.params.voh;
  if (voh === undefined || voh.length === 0) return null;
  return drivenSide(input, driver, receiver, voh, vih, input.loads.get(driver.key)?.high ?? 0, 'high');
}

function lowSide(input: AnalysisInput, driver: PinView, receiver: PinView): LevelSide | null {
  const vil = lowThreshold(receiver);
  const vol = driver.params.vol;
  if (vil === undefined || vol === undefined || vol.length === 0) return null;
  return drivenSide(input, driver, receiver, vol, vil, input.loads.get(driver.key)?.low ?? 0, 'low');
}

/**
 * A push-pull driver's side at its worst corner, as `worstCorner` would choose it (the first
 * corner of the lowest margin, a non-finite one first). The corners are scored with numbers and
 * one object is made, for the corner that wins: this runs for every pair of every net.
 */
function drivenSide(
  input: AnalysisInput,
  driver: PinView,
  receiver: PinView,
  points: readonly OutputPoint[],
  level: Level,
  load: number,
  sense: 'high' | 'low',
): LevelSide | null {
  let found = false;
  let margin = 0;
  let out = 0;
  let threshold = 0;
  let driverVdd = 0;
  let receiverVdd = 0;
  for (const c of pairCorners(driver.rail, receiver.rail, input.rails.ranges)) {
    const dv = c.get(driver.rail) ?? 0;
    const rv = c.get(receiver.rail) ?? 0;
    const v = outputVolts(points, load, dv, sense);
    const th = levelAt(level, rv);
    const m = sense === 'high' ? v - th : th - v;
    if (found && !lowerScore(m, margin)) continue;
    found = true;
    margin = m;
    out = v;
    threshold = th;
    driverVdd = dv;
    receiverVdd = rv;
  }
  if (!found) return null;
  const estimate = outputLevel(points, load, driverVdd, sense)!.estimate;
  const minMargin = input.settings.minMargin;
  return {
    out,
    threshold,
    margin,
    driverVdd,
    receiverVdd,
    estimate,
    status: sense === 'high' ? judge(out, threshold, minMargin) : judge(threshold, out, minMargin),
    load,
  };
}

/** The analysis of one net in one power state. */
export function analyseNet(input: AnalysisInput): NetAnalysis {
  const pairs: PairAnalysis[] = [];
  let sumIih = 0;
  for (const p of input.pins) sumIih += p.params.iih ?? 0;
  let worstHigh: number | null = null;
  let worstLow: number | null = null;
  for (const driver of input.drivers) {
    for (const receiver of input.receivers) {
      if (driver.partId === receiver.partId) continue;
      const high = highSide(input, driver, receiver, sumIih);
      const low = lowSide(input, driver, receiver);
      if (high === null && low === null) continue;
      if (high !== null && (worstHigh === null || lowerScore(high.margin, worstHigh))) worstHigh = high.margin;
      if (low !== null && (worstLow === null || lowerScore(low.margin, worstLow))) worstLow = low.margin;
      pairs.push({ driver: driver.key, receiver: receiver.key, high, low });
    }
  }
  return { pairs, worstHigh, worstLow };
}
