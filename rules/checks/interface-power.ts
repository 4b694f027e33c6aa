/**
 * interface-power: an input held high below its own supply by more than its datasheet's ΔICC
 * test offset (a 3.3 V output into a 5 V TTL-input CMOS part) draws that extra supply current,
 * reported per pin as info; the report sums it per rail (rules/report/interfacePower.ts).
 */
import { outputLevel } from '../levels/output.ts';
import { below, lowerScore } from '../levels/compare.ts';
import { pullRails, thevenin, worstCorner } from '../engine/netMath.ts';
import type { Corner } from '../levels/rails.ts';
import type { NetView, PinView } from '../engine/types.ts';
import { defineRule } from './defineRule.ts';
import { amps, volts } from './format.ts';
import { partsOfPins as partsOf } from '../model/pinKeys.ts';

interface Data {
  pin: string;
  driver: string;
  high: number;
  threshold: number;
  current: number;
  rail: string;
}

/** The driver's high level at a corner: its voh at its high load, or the pull-up's level on an open-drain net. */
function highAt(view: NetView, driver: PinView, c: Corner, sumIih: number): number | undefined {
  if (driver.drive === 'open-drain') {
    if (!view.highFromPull) return undefined;
    const th = thevenin(view.pulls, c, 'max')!;
    return th.v - th.r * sumIih;
  }
  const voh = driver.params.voh;
  if (voh === undefined || voh.length === 0) return undefined;
  return outputLevel(voh, view.loads.get(driver.key)?.high ?? 0, c.get(driver.rail) ?? 0, 'high')?.v;
}

export default defineRule({
  id: 'interface-power',
  meta: {
    title: 'Inputs held high below their supply',
    severity: { info: '(the extra supply current per input, summed per rail in the report)' },
    explanation:
      'A CMOS input whose datasheet gives an extra supply current (ΔICC) for an input held at its supply ' +
      'less a test offset (commonly VCC − 2.1 V for TTL-input CMOS) draws that current whenever a driver ' +
      'holds it high below that level: a 3.3 V output into a 5 V TTL-input CMOS part does. The lowest high ' +
      "level of the net's drivers is compared with the receiver's supply at its highest less the offset, at " +
      "every combination of the rails' ends; each such input is reported with its ΔICC, and the report " +
      'sums them per rail and power state, so that a board relying on many such inputs sees the cost.',
    hint:
      'Drive the input from its own supply (a translator or a buffer on that rail), or accept the current in ' +
      "the rail's budget.",
    messages: {
      belowSupply: (d: Data) =>
        `${d.pin} is held high at ${volts(d.high)} by ${d.driver}, below ${volts(d.threshold)} (its supply less the ` +
        `ΔICC test offset): it draws about ${amps(d.current)} more from ${d.rail}.`,
    },
  },
  checkNet(view, report) {
    let sumIih = 0;
    for (const p of view.pins) sumIih += p.params.iih ?? 0;
    for (const receiver of view.receivers) {
      const { deltaIcc, deltaIccDrop } = receiver.params;
      // Only a ΔICC that is 0 (or none) means no extra current; one that is not a number goes on and fails.
      if (deltaIcc === undefined || deltaIccDrop === undefined || deltaIcc <= 0) continue;
      let worst:
        | { driver: string; high: number; threshold: number; score: number; corner: Record<string, number> }
        | undefined;
      for (const driver of view.drivers) {
        if (driver.partId === receiver.partId) continue;
        const railIds =
          driver.drive === 'open-drain' ? [...pullRails(view.pulls), receiver.rail] : [driver.rail, receiver.rail];
        const w = worstCorner(railIds, view.rails, (c) => {
          const high = highAt(view, driver, c, sumIih);
          if (high === undefined) return undefined;
          const threshold = (c.get(receiver.rail) ?? 0) - deltaIccDrop;
          return { driver: driver.key, high, threshold, score: high - threshold, corner: Object.fromEntries(c) };
        });
        if (w !== undefined && (worst === undefined || lowerScore(w.score, worst.score))) worst = w;
      }
      if (worst === undefined || !below(worst.high, worst.threshold)) continue;
      report({
        messageId: 'belowSupply',
        data: {
          pin: receiver.key,
          driver: worst.driver,
          high: worst.high,
          threshold: worst.threshold,
          current: deltaIcc,
          rail: view.names.rail(receiver.rail),
        },
        severity: 'info',
        pins: [receiver.key, worst.driver],
        parts: partsOf(receiver.key, worst.driver),
        suffix: receiver.key,
        values: {
          pin: receiver.key,
          driver: worst.driver,
          rail: receiver.rail,
          current: deltaIcc,
          drop: deltaIccDrop,
          high: worst.high,
          threshold: worst.threshold,
          corner: worst.corner,
        },
      });
    }
  },
});
