/**
 * rail-crossing: every net that joins pins of different rails, with its worst margins, as one
 * row of the crossing table in each power state (rules-catalogue.md).
 */
import { crossingRails } from '../engine/paths.ts';
import { defineRule } from './defineRule.ts';
import { marginVolts } from './format.ts';
import { partsOfPins as partsOf } from '../model/pinKeys.ts';

interface Data {
  net: string;
  rails: string[];
  marginHigh: number | null;
  marginLow: number | null;
}

const margin = (m: number | null) => (m === null ? 'no driver/receiver pair' : marginVolts(m));

export default defineRule({
  id: 'rail-crossing',
  meta: {
    title: 'Nets that cross rails',
    severity: { info: '' },
    explanation:
      'Every net whose pins sit on more than one rail is listed in each power state with its worst ' +
      'high and low margins, so that a review sees every crossing, passing or not. A pull ' +
      "resistor's rail does not make a crossing. A net that a driver reaches through a series resistor " +
      'or a shifter counts the rails of the pins on every net so joined.',
    hint: 'Review each crossing: margins, over-voltage and the unpowered cases are checked by the other rules.',
    messages: {
      crosses: (d: Data) =>
        `${d.net} joins rails ${d.rails.join(', ')}: worst NMH ${margin(d.marginHigh)}, worst NML ${margin(d.marginLow)}.`,
    },
  },
  checkNet(view, report) {
    const rails = crossingRails(view);
    if (rails === undefined) return;
    const { worstHigh, worstLow } = view.analysis;
    const keys = view.pins.map((p) => p.key);
    report({
      messageId: 'crosses',
      data: {
        net: view.names.net(view.net.id),
        rails: rails.map((r) => view.names.rail(r)),
        marginHigh: worstHigh,
        marginLow: worstLow,
      },
      severity: 'info',
      pins: keys,
      parts: partsOf(...keys),
      values: { rails: [...rails], marginHigh: worstHigh, marginLow: worstLow },
    });
  },
});
