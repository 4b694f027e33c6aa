/**
 * level-high: the high-level noise margin NMH = VOH(worst) − VIH(worst) of each powered
 * driver/receiver pair on different parts (rules-catalogue.md).
 */
import { defineRule } from './defineRule.ts';
import { cornerText, marginVolts, volts } from './format.ts';
import { partsOfPins as partsOf } from '../model/pinKeys.ts';

interface Data {
  driver: string;
  receiver: string;
  voh: number;
  vih: number;
  margin: number;
  minMargin: number;
  driverVdd: number | null;
  receiverVdd: number;
  vpull?: number;
  estimate: boolean;
}

function source(d: Data): string {
  if (d.vpull !== undefined) return `the pull-up brings the net to ${volts(d.voh)} (Thévenin ${volts(d.vpull)})`;
  return `${d.driver} guarantees ${d.estimate ? 'only an estimated ' : ''}${volts(d.voh)} high`;
}

export default defineRule({
  id: 'level-high',
  meta: {
    title: 'High level reaches the receiver',
    severity: { error: 'when NMH < 0', warning: 'when NMH < minMargin' },
    explanation:
      'For every powered driver and receiver on different parts, the lowest guaranteed output-high ' +
      "level (at the load the net puts on the driver, or the pull-up's level for an open-drain net) " +
      "is compared with the highest input-high threshold, at every combination of the rails' ends.",
    hint:
      'Use a receiver with TTL-compatible thresholds, a dual-supply level translator, or raise the ' +
      "driver's supply; for an open-drain net, pull up to the receiver's rail.",
    messages: {
      highFails: (d: Data) =>
        `${source(d)} but ${d.receiver} needs ${volts(d.vih)} to read high: NMH ${marginVolts(d.margin)} (${cornerText(d.driverVdd, d.receiverVdd)}).`,
      highMarginLow: (d: Data) =>
        `${source(d)} against ${d.receiver}'s VIH of ${volts(d.vih)}: NMH ${marginVolts(d.margin)} is below the ${volts(d.minMargin)} wanted (${cornerText(d.driverVdd, d.receiverVdd)}).`,
    },
  },
  checkNet(view, report) {
    for (const pair of view.analysis.pairs) {
      const side = pair.high;
      if (side === null || side.status === 'pass') continue;
      const data: Data = {
        driver: pair.driver,
        receiver: pair.receiver,
        voh: side.out,
        vih: side.threshold,
        margin: side.margin,
        minMargin: view.settings.minMargin,
        driverVdd: side.driverVdd,
        receiverVdd: side.receiverVdd,
        estimate: side.estimate,
        ...(side.vpull === undefined ? {} : { vpull: side.vpull }),
      };
      report({
        messageId: side.status === 'fail' ? 'highFails' : 'highMarginLow',
        data,
        severity: side.status === 'fail' ? 'error' : 'warning',
        pins: [pair.driver, pair.receiver],
        parts: partsOf(pair.driver, pair.receiver),
        suffix: `${pair.driver}>${pair.receiver}`,
        values: {
          voh: side.out,
          vih: side.threshold,
          margin: side.margin,
          driver: pair.driver,
          receiver: pair.receiver,
          driverVdd: side.driverVdd,
          receiverVdd: side.receiverVdd,
          ...(side.vpull === undefined ? {} : { vpull: side.vpull }),
          ...(side.estimate ? { estimate: true } : {}),
        },
      });
    }
  },
});
