/**
 * edge-rate: (1) a net's rise time above its `maxRiseTime`, (2) a receiver's input ramp above
 * its `maxInputRamp` (rules-catalogue.md). Both are single-pole RC estimates with C the net's
 * capacitance and R the pulls' Thévenin resistance or the slowest driver's output resistance.
 */
import { exceeds, higherScore } from '../levels/compare.ts';
import { levelAt } from '../levels/level.ts';
import { corners } from '../levels/rails.ts';
import { rowsAt } from '../levels/output.ts';
import { parallelResistance, pullRails, thevenin } from '../engine/netMath.ts';
import type { NetView, PinView, RailStates } from '../engine/types.ts';
import { RISE_10_90, RISE_30_70 } from '../levels/rc.ts';
import { defineRule } from './defineRule.ts';
import { farads, ohms, rampUnit, seconds, volts } from './format.ts';
import { partsOfPins as partsOf } from '../model/pinKeys.ts';

/** What charges the net on a rising edge. */
interface EdgeSource {
  /** The driver's pin key; null when the pull-up makes the high level. */
  readonly driver: string | null;
  /** Ω: the pulls' Thévenin resistance, or the driver's output resistance. */
  readonly resistance: number;
  /** V: the lowest level the edge rises to (the driver's rail minimum, or the lowest Vpull). */
  readonly swing: number;
  /** The edge arrives through series resistors from a driver on another net. */
  readonly through?: boolean;
}

/**
 * A driver's output resistance `|Δv| / Δi` over its two largest `voh` test currents, at the end
 * of its rail giving the larger value; undefined without two distinct test currents.
 */
function outputResistance(driver: PinView, rails: RailStates): number | undefined {
  const voh = driver.params.voh;
  if (voh === undefined || voh.length < 2) return undefined;
  const sorted = rowsAt(voh, rails.ranges.get(driver.rail)?.min ?? 0);
  if (sorted.length < 2) return undefined;
  const a = sorted[sorted.length - 2]!;
  const b = sorted[sorted.length - 1]!;
  const di = b.i - a.i;
  if (!(di > 0)) return undefined;
  let worst: number | undefined;
  for (const c of corners([driver.rail], rails.ranges)) {
    const vdd = c.get(driver.rail) ?? 0;
    const r = Math.abs(levelAt(a.v, vdd) - levelAt(b.v, vdd)) / di;
    if (worst === undefined || higherScore(r, worst)) worst = r;
  }
  return worst;
}

/**
 * The source of the net's rising edge: the pull-up when the high level comes from it, else the
 * slowest powered driver able to drive high (`except` left out: a receiver is not its own source).
 */
function edgeSource(view: NetView, except?: string): EdgeSource | undefined {
  if (view.pathEdge !== undefined && !view.drivers.some((d) => d.drive !== 'open-drain')) {
    return {
      driver: view.pathEdge.driver,
      resistance: view.pathEdge.resistance,
      swing: view.pathEdge.swing,
      through: true,
    };
  }
  if (view.highFromPull) {
    // The pulls at the top of their ranges: the slowest edge.
    const resistance = parallelResistance(view.pulls, 'max')!;
    let swing = Infinity;
    for (const c of corners(pullRails(view.pulls), view.rails.ranges))
      swing = Math.min(swing, thevenin(view.pulls, c)!.v);
    return { driver: null, resistance, swing };
  }
  let slowest: EdgeSource | undefined;
  for (const d of view.drivers) {
    if (d.drive === 'open-drain' || d.key === except) continue;
    const r = outputResistance(d, view.rails);
    if (r === undefined || (slowest !== undefined && !higherScore(r, slowest.resistance))) continue;
    slowest = { driver: d.key, resistance: r, swing: view.rails.ranges.get(d.rail)?.min ?? 0 };
  }
  return slowest;
}

interface RiseData {
  driver: string | null;
  riseTime: number;
  resistance: number;
  capacitance: number;
  limit: number;
}

interface RampData {
  pin: string;
  driver: string | null;
  ramp: number;
  maxInputRamp: number;
  t1090: number;
  swing: number;
}

const limitText = (d: RiseData) => `beyond the net's limit of ${seconds(d.limit)}`;

export default defineRule({
  id: 'edge-rate',
  meta: {
    title: 'Edges are fast enough',
    severity: { warning: '' },
    explanation:
      "The rising edge is estimated as a single RC charge of the net's capacitance (the pins' cin plus " +
      "the wiring). On a net pulled high by resistors, R is the pulls' Thévenin resistance and the rise " +
      'time is taken from 30 % to 70 % (ln(7/3)·RC); on an actively driven net, R is the output resistance ' +
      'of the slowest driver, read from the slope between its two largest voh test points, and the rise ' +
      "time is taken from 10 % to 90 % (ln 9·RC). The rise time is compared with the net's maxRiseTime, " +
      'and each non-Schmitt receiver with a maxInputRamp is given the ramp of that 10–90 % edge over 80 % ' +
      'of the swing, in s/V. A net that a driver reaches only through series resistors is given the 10–90 % ' +
      "edge ln 9·Rth·C, Rth the resistance seen from the net with the driver's net and every rail at 0 V " +
      "(a divider's R1‖R2), each resistor at its high tolerance end, and C the net's own capacitance.",
    hint:
      'Lower the pull-up resistance or use a stronger driver, cut the capacitance (shorter wiring, fewer ' +
      'loads), or split the loads with a buffer.',
    messages: {
      pulledRiseSlow: (d: RiseData) =>
        `The pull-up (${ohms(d.resistance)}) charges ${farads(d.capacitance)} in ${seconds(d.riseTime)} from 30 % to 70 %, ${limitText(d)}.`,
      drivenRiseSlow: (d: RiseData) =>
        `${d.driver} (about ${ohms(d.resistance)} output resistance) charges ${farads(d.capacitance)} in ` +
        `${seconds(d.riseTime)} from 10 % to 90 %, ${limitText(d)}.`,
      pathRiseSlow: (d: RiseData) =>
        `The edge from ${d.driver} reaches the net through series resistors (${ohms(d.resistance)} seen from the net) and charges ` +
        `${farads(d.capacitance)} in ${seconds(d.riseTime)} from 10 % to 90 %, ${limitText(d)}.`,
      rampSlow: (d: RampData) =>
        `${d.pin} sees an input ramp of ${rampUnit(d.ramp)} (a ${seconds(d.t1090)} 10–90 % edge over ${volts(d.swing)} ` +
        `from ${d.driver ?? 'the pull-up'}), slower than the ${rampUnit(d.maxInputRamp)} it accepts.`,
    },
  },
  checkNet(view, report) {
    const c = view.capacitance;
    const source = edgeSource(view);
    const limit = view.net.maxRiseTime;
    // A source whose swing is 0 V (every pull rail off) makes no rising edge at all; a swing
    // that is not a number is judged (and fails), never skipped.
    if (source !== undefined && !(source.swing <= 0) && limit !== undefined) {
      const pulled = source.driver === null;
      const riseTime = (pulled ? RISE_30_70 : RISE_10_90) * source.resistance * c;
      if (exceeds(riseTime, limit)) {
        // A pulled edge starts when the open-drain drivers release the net.
        const pins = source.driver === null ? view.drivers.map((d) => d.key) : [source.driver];
        report({
          messageId: pulled ? 'pulledRiseSlow' : source.through === true ? 'pathRiseSlow' : 'drivenRiseSlow',
          data: { driver: source.driver, riseTime, resistance: source.resistance, capacitance: c, limit },
          severity: 'warning',
          pins,
          parts: partsOf(...pins),
          values: {
            riseTime,
            span: pulled ? '30-70' : '10-90',
            capacitance: c,
            resistance: source.resistance,
            limit,
            driver: source.driver,
          },
        });
      }
    }

    for (const rx of view.receivers) {
      const maxInputRamp = rx.params.maxInputRamp;
      if (maxInputRamp === undefined || rx.params.schmitt !== undefined) continue;
      const s = rx.role === 'bidir' ? edgeSource(view, rx.key) : source;
      if (s === undefined || s.swing <= 0) continue;
      const t1090 = RISE_10_90 * s.resistance * c;
      const ramp = t1090 / (0.8 * s.swing);
      if (!exceeds(ramp, maxInputRamp)) continue;
      const pins = s.driver === null ? [rx.key] : [rx.key, s.driver];
      report({
        messageId: 'rampSlow',
        data: { pin: rx.key, driver: s.driver, ramp, maxInputRamp, t1090, swing: s.swing },
        severity: 'warning',
        pins,
        parts: partsOf(...pins),
        suffix: rx.key,
        hint: 'Use a receiver with a Schmitt-trigger input, a stronger driver or pull-up, or less capacitance on the net.',
        values: {
          ramp,
          maxInputRamp,
          pin: rx.key,
          driver: s.driver,
          t1090,
          swing: s.swing,
          resistance: s.resistance,
          capacitance: c,
        },
      });
    }
  },
});
