/**
 * drive-load: a powered driver whose high or low load current exceeds the largest test current
 * of its `voh`/`vol` (DC fan-out exceeded: its levels are no longer guaranteed), or its `ioMax`
 * (rules-catalogue.md).
 */
import { exceeds } from '../levels/compare.ts';
import { largestTestCurrent } from '../levels/output.ts';
import { defineRule } from './defineRule.ts';
import { amps } from './format.ts';
import { partsOfPins as partsOf } from '../model/pinKeys.ts';

/** One side of a driver that is overloaded: its load and the limit it passes. */
interface Overload {
  load: number;
  limit: number;
  /** `test`: the largest test current of the level list; `ioMax`: the part's current rating. */
  by: 'test' | 'ioMax';
}

interface Data {
  driver: string;
  high?: Overload;
  low?: Overload;
}

function past(o: Overload, list: 'voh' | 'vol'): string {
  return o.by === 'ioMax' ? `its ioMax of ${amps(o.limit)}` : `the ${amps(o.limit)} of its largest ${list} test point`;
}

const sources = (o: Overload) => `sources ${amps(o.load)} when high, beyond ${past(o, 'voh')}`;
const sinks = (o: Overload) => `sinks ${amps(o.load)} when low, beyond ${past(o, 'vol')}`;

/** Passing ioMax overloads the part itself; passing a test current only voids the level's guarantee. */
function consequence(d: Data, levels: string): string {
  return d.high?.by === 'ioMax' || d.low?.by === 'ioMax' ? 'the output is loaded past its rating' : levels;
}

/**
 * The side's verdict: undefined when neither limit is exceeded. Passing `ioMax` is named first,
 * being an absolute rating; otherwise the guarantee of the level list is what is lost.
 */
function judge(load: number, rated: number | undefined, ioMax: number | undefined): Overload | undefined {
  if (ioMax !== undefined && exceeds(load, ioMax)) return { load, limit: ioMax, by: 'ioMax' };
  if (rated !== undefined && exceeds(load, rated)) return { load, limit: rated, by: 'test' };
  return undefined;
}

export default defineRule({
  id: 'drive-load',
  meta: {
    title: 'Drivers carry no more than their rated load',
    severity: { error: '' },
    explanation:
      'Every other pin on a net draws its input current from the driver (iih when high, iil when low), ' +
      'and pull resistors add what flows through them, also those reached through series resistors and ' +
      "shifters (a shifter's far-side pull-ups, with RDS(on) and Vf taken as 0, the worst case). A driver's " +
      'output levels are guaranteed only up ' +
      'to the largest test current of its voh and vol rows, and it must never carry more than its ioMax. ' +
      'A load beyond the test currents is DC fan-out exceeded: the levels the other rules use become ' +
      'estimates; a load beyond ioMax overloads the output itself. ' +
      'An open-drain driver has no high drive; only its low side is judged.',
    hint:
      'Split the loads with a buffer, drive fewer inputs, use a stronger driver, or use a larger pull ' + 'resistor.',
    messages: {
      highOverload: (d: Data) =>
        `${d.driver} ${sources(d.high!)}: ${consequence(d, 'its high level is no longer guaranteed')}.`,
      lowOverload: (d: Data) =>
        `${d.driver} ${sinks(d.low!)}: ${consequence(d, 'its low level is no longer guaranteed')}.`,
      bothOverload: (d: Data) =>
        `${d.driver} ${sources(d.high!)}, and ${sinks(d.low!)}: ${consequence(d, 'neither level is guaranteed')}.`,
    },
  },
  checkNet(view, report) {
    for (const driver of view.drivers) {
      const load = view.loads.get(driver.key);
      if (load === undefined) continue;
      const { ioMax } = driver.params;
      const canDriveHigh = driver.drive !== 'open-drain';
      // Rows tabulated from some supply up count only when the rail's lowest voltage reaches it.
      const vddLow = view.rails.ranges.get(driver.rail)?.min ?? 0;
      const ratedHigh = canDriveHigh ? (largestTestCurrent(driver.params.voh, vddLow) ?? null) : null;
      const ratedLow = largestTestCurrent(driver.params.vol, vddLow) ?? null;
      const high = canDriveHigh ? judge(load.high, ratedHigh ?? undefined, ioMax) : undefined;
      const low = judge(load.low, ratedLow ?? undefined, ioMax);
      if (high === undefined && low === undefined) continue;
      report({
        messageId:
          high !== undefined && low !== undefined
            ? 'bothOverload'
            : high !== undefined
              ? 'highOverload'
              : 'lowOverload',
        data: { driver: driver.key, ...(high === undefined ? {} : { high }), ...(low === undefined ? {} : { low }) },
        severity: 'error',
        pins: [driver.key],
        parts: partsOf(driver.key),
        suffix: driver.key,
        values: {
          driver: driver.key,
          loadHigh: canDriveHigh ? load.high : null,
          loadLow: load.low,
          ratedHigh,
          ratedLow,
          ioMax: ioMax ?? null,
        },
      });
    }
  },
});
