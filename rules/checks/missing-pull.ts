/**
 * missing-pull: a powered open-drain driver on a net that has no pull resistor to a rail
 * (rules-catalogue.md). A pull to a rail that is off still counts: the dead pull-up is
 * level-high's to report, not this rule's.
 */
import { GROUND } from '../engine/powerStates.ts';
import { defineRule } from './defineRule.ts';
import { partsOfPins as partsOf } from '../model/pinKeys.ts';

interface Data {
  net: string;
  drivers: readonly string[];
  /** Pulls present, all of them to ground. */
  groundPulls: number;
}

const whose = (d: Data) =>
  d.drivers.length === 1
    ? `Open-drain driver ${d.drivers[0]} on net ${d.net} can only pull low`
    : `Open-drain drivers ${d.drivers.join(', ')} on net ${d.net} can only pull low`;

export default defineRule({
  id: 'missing-pull',
  meta: {
    title: 'Open-drain nets have a pull-up',
    severity: { error: '' },
    explanation:
      'An open-drain (or open-collector) output only sinks current; something else must lift the net ' +
      'when every driver lets go. A net with a powered open-drain driver needs a pull resistor to a ' +
      "rail: the net's own resistor or a pin's internal pull-up. A resistor to ground does not count, " +
      "and neither does nothing: without a pull-up the net's high level is undefined.",
    hint:
      "Fit a pull-up resistor from the net to the receivers' rail (sized by pull-range), or enable a " +
      "pin's internal pull-up where one is strong enough for the net.",
    messages: {
      noPull: (d: Data) => `${whose(d)}, and no resistor pulls the net up to a rail.`,
      onlyGroundPulls: (d: Data) =>
        `${whose(d)}, and its ${d.groundPulls === 1 ? 'only pull resistor goes' : `${d.groundPulls} pull resistors all go`} to ground: nothing lifts the net high.`,
    },
  },
  checkNet(view, report) {
    const drivers = view.drivers.filter((d) => d.drive === 'open-drain').map((d) => d.key);
    if (drivers.length === 0 || view.pulls.some((p) => p.to !== GROUND)) return;
    const groundPulls = view.pulls.length;
    report({
      messageId: groundPulls === 0 ? 'noPull' : 'onlyGroundPulls',
      data: { net: view.names.net(view.net.id), drivers, groundPulls },
      severity: 'error',
      pins: drivers,
      parts: partsOf(...drivers),
      values: { drivers },
    });
  },
});
