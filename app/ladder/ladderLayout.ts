/**
 * Where the parts of a voltage ladder go: one voltage scale for the whole drawing, then
 * columns left to right: the axis, the drivers, one lane per driver/receiver pair for its
 * margins, the receivers.
 */
import type { Ladder, LadderMargin } from '../../rules/report/ladder.ts';
import { formatQuantity } from '../../rules/levels/units.ts';

export const AXIS_WIDTH = 64;
export const DRIVER_WIDTH = 180;
export const LANE_WIDTH = 110;
export const RECEIVER_WIDTH = 170;
export const HEADER = 54;
export const FOOTER = 34;
export const BAND_WIDTH = 40;

export interface Lane {
  readonly driver: string;
  readonly receiver: string;
  readonly x: number;
  readonly margins: readonly LadderMargin[];
}

export interface LadderLayout {
  readonly width: number;
  readonly height: number;
  /** The y of a voltage. */
  readonly y: (volts: number) => number;
  readonly plotTop: number;
  readonly plotBottom: number;
  readonly driverX: readonly number[];
  readonly lanes: readonly Lane[];
  readonly receiverX: readonly number[];
}

export function layoutLadder(ladder: Ladder, height: number): LadderLayout {
  const plotTop = HEADER;
  const plotBottom = height - FOOTER;
  const span = plotBottom - plotTop;
  const y = (v: number) => plotTop + ((ladder.top - v) / ladder.top) * span;
  const driverX = ladder.drivers.map((_, k) => AXIS_WIDTH + k * DRIVER_WIDTH);
  const lanesStart = AXIS_WIDTH + ladder.drivers.length * DRIVER_WIDTH;
  const pairs: { driver: string; receiver: string; margins: LadderMargin[] }[] = [];
  for (const m of ladder.margins) {
    let lane = pairs.find((p) => p.driver === m.driver && p.receiver === m.receiver);
    if (lane === undefined) {
      lane = { driver: m.driver, receiver: m.receiver, margins: [] };
      pairs.push(lane);
    }
    lane.margins.push(m);
  }
  const lanes = pairs.map((p, k) => ({ ...p, x: lanesStart + k * LANE_WIDTH }));
  const receiversStart = lanesStart + lanes.length * LANE_WIDTH;
  const receiverX = ladder.receivers.map((_, k) => receiversStart + k * RECEIVER_WIDTH);
  const width = Math.max(receiversStart + ladder.receivers.length * RECEIVER_WIDTH + 16, 360);
  return { width, height, y, plotTop, plotBottom, driverX, lanes, receiverX };
}

/** Text baselines at least `gap` apart, each as close to its wish as that allows, in the order of the wishes. */
export function separate(wishes: readonly number[], gap = 13): number[] {
  const order = wishes.map((y, k) => ({ y, k })).sort((a, b) => a.y - b.y);
  const placed: number[] = new Array<number>(wishes.length);
  let last = -Infinity;
  for (const { y, k } of order) {
    last = Math.max(y, last + gap);
    placed[k] = last;
  }
  return placed;
}

/** A level as the drawing prints it: engineering notation, four digits (a rail's 3.135 V stays 3.135 V). */
export function volts(v: number): string {
  return formatQuantity(v, 'V', 4);
}

/** A margin as the drawing prints it: three digits are enough for a difference. */
export function marginVolts(v: number): string {
  return formatQuantity(v, 'V', 3);
}

/** Status in words, so that the drawing reads without colour. */
export const STATUS_TEXT = { pass: 'pass', warning: 'WARN', fail: 'FAIL' } as const;
