/**
 * level-low: the low-level noise margin NML = VIL(worst) − VOL(worst) of each powered
 * driver/receiver pair on different parts (rules-catalogue.md).
 */
import { defineRule } from './defineRule.ts';
import { cornerText, marginVolts, volts } from './format.ts';
import { partsOfPins as partsOf } from '../model/pinKeys.ts';

interface Data {
  driver: string;
  receiver: string;
  vol: number;
  vil: number;
  margin: number;
  minMargin: number;
  driverVdd: number;
  receiverVdd: number;
  estimate: boolean;
}

const lead = (d: Data) => `${d.driver} guarantees ${d.estimate ? 'only an estimated ' : ''}${volts(d.vol)} low`;

export default defineRule({
  id: 'level-low',
  meta: {
    title: 'Low level reaches the receiver',
    severity: { error: 'when NML < 0', warning: 'when NML < minMargin' },
    explanation:
      'For every powered driver and receiver on different parts, the highest guaranteed output-low ' +
      "level (at the current the net's inputs and pull-ups push into the driver) is compared with the " +
      "lowest input-low threshold, at every combination of the rails' ends.",
    hint:
      'Reduce the low-level load (fewer inputs, a weaker pull-up), use a stronger driver, or a ' +
      'level translator whose outputs suit the receiver.',
    messages: {
      lowFails: (d: Data) =>
        `${lead(d)} but ${d.receiver} reads low only below ${volts(d.vil)}: NML ${marginVolts(d.margin)} (${cornerText(d.driverVdd, d.receiverVdd)}).`,
      lowMarginLow: (d: Data) =>
        `${lead(d)} against ${d.receiver}'s VIL of ${volts(d.vil)}: NML ${marginVolts(d.margin)} is below the ${volts(d.minMargin)} wanted (${cornerText(d.driverVdd, d.receiverVdd)}).`,
    },
  },
  checkNet(view, report) {
    for (const pair of view.analysis.pairs) {
      const side = pair.low;
      if (side === null || side.status === 'pass') continue;
      const driverVdd = side.driverVdd ?? 0;
      report({
        messageId: side.status === 'fail' ? 'lowFails' : 'lowMarginLow',
        data: {
          driver: pair.driver,
          receiver: pair.receiver,
          vol: side.out,
          vil: side.threshold,
          margin: side.margin,
          minMargin: view.settings.minMargin,
          driverVdd,
          receiverVdd: side.receiverVdd,
          estimate: side.estimate,
        },
        severity: side.status === 'fail' ? 'error' : 'warning',
        pins: [pair.driver, pair.receiver],
        parts: partsOf(pair.driver, pair.receiver),
        suffix: `${pair.driver}>${pair.receiver}`,
        values: {
          vol: side.out,
          vil: side.threshold,
          margin: side.margin,
          driver: pair.driver,
          receiver: pair.receiver,
          driverVdd,
          receiverVdd: side.receiverVdd,
          ...(side.estimate ? { estimate: true } : {}),
        },
      });
    }
  },
});
