/**
 * mixed-path: a driver that reaches a net's receivers only through a chain of parts between
 * chips that the pair analysis does not solve (version 2): a series resistor between a shifter
 * and the receiver, or more than one shifter. Its pairs are not judged, and that is said as an error rather than
 * passed in silence (paths.ts `unjudgedChains`).
 */
import { defineRule } from './defineRule.ts';
import { partsOfPins as partsOf } from '../model/pinKeys.ts';

interface Data {
  driver: string;
  via: string;
  net: string;
  receivers: string;
}

export default defineRule({
  id: 'mixed-path',
  meta: {
    title: 'Chains of resistors and shifters are reported, not passed',
    severity: { error: '' },
    explanation:
      'The pair analysis solves a signal path of series resistors by nodal analysis, a shifter next to ' +
      "the receiver's net with the driver on its other side, and series resistors before such a shifter " +
      "(the shifter's near side solved with the far side's pull-up current fed in). A driver that reaches " +
      'a receiver only through more than that (a series resistor beyond the shifter, between it and the ' +
      'receiver, or two shifters) is not solved, so none of its levels, margins or loads at that ' +
      'receiver is judged. Each such driver is reported once per receiving net with the parts on the ' +
      'way, as an error: a check that could not decide must not pass. A FET shifter counts while its ' +
      "gate rail is on; a diode shifter only from its cathode's net to its anode's.",
    hint:
      'Work the levels through the chain by hand and waive this with a note that gives them, or ' +
      'redraw the circuit so that each shifter joins two nets without series resistors between ' +
      'the shifter and the driver or the receiver.',
    messages: {
      notSolved: (d: Data) =>
        `${d.driver} reaches ${d.receivers} on ${d.net} only through ${d.via}, a chain of series resistors and ` +
        'shifters whose levels are not solved: the pairs are not judged.',
    },
  },
  checkNet(view, report) {
    if (view.unjudged.length === 0) return;
    const receivers = view.receivers.filter((p) => p.powered).map((p) => p.key);
    if (receivers.length === 0) return;
    for (const c of view.unjudged) {
      report({
        messageId: 'notSolved',
        data: {
          driver: c.driver,
          via: c.via.join(' → '),
          net: view.names.net(view.net.id),
          receivers: receivers.join(', '),
        },
        severity: 'error',
        pins: [c.driver, ...receivers],
        parts: partsOf(c.driver, ...receivers),
        suffix: c.driver,
        values: { driver: c.driver, via: c.via, receivers },
      });
    }
  },
});
