/**
 * Where the parts of a voltage ladder go: one voltage scale for the whole drawing, then
 * columns left to right: the axis, the drivers, one lane per driver/receiver pair for its
 * margins, the receivers.
 */
import type { Ladder, LadderMargin } from '../../rules/report/index.ts';
import { onAxis } from '../../rules/report/index.ts';

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
  const y = (v: number) => plotTop + ((ladder.top - onAxis(v, ladder.top)) / ladder.top) * span;
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

// The labels' text and placement are shared with the PDF report's ladders.
export { marginVolts, separate, STATUS_TEXT, volts } from '../../rules/report/index.ts';
