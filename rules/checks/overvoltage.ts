/**
 * overvoltage: a powered pin whose `viMax` is exceeded by the highest voltage that the net's other
 * sources can put on it, at the worst corner (rules-catalogue.md).
 */
import { levelAt } from '../levels/level.ts';
import { exceeds } from '../levels/compare.ts';
import { netSources, worstExposure } from '../engine/netMath.ts';
import { pathExposure } from '../engine/paths.ts';
import { defineRule } from './defineRule.ts';
import { amps, volts } from './format.ts';
import { partsOfPins as partsOf } from '../model/pinKeys.ts';

interface Data {
  pin: string;
  vNet: number;
  viMax: number;
  from: string;
  pinVdd: number;
}

interface PathData extends Data {
  current: number;
}

export default defineRule({
  id: 'overvoltage',
  meta: {
    title: 'No pin sees more than it may',
    severity: { error: '' },
    explanation:
      'Every pin on a powered rail that has a viMax is compared with the highest voltage any other ' +
      "source on its net can apply: each powered push-pull or three-state driver's rail, and each " +
      "pull resistor's rail (its own internal pull included), with the source's rail at its highest " +
      "and the pin's at its lowest. Above viMax a CMOS input's clamp diode conducts into its rail. " +
      'A source on another net that reaches the pin through series resistors is judged at the voltage ' +
      "the resistor network leaves on the pin's net (a divider's VDD·R2/(R1+R2) at the worst tolerance " +
      "ends, not the source's full rail); when that still passes viMax and the pin states an " +
      "injection-current limit, the clamp current is clamp-current's to judge, else it is an error here.",
    hint:
      'Use a receiver whose inputs tolerate the voltage (a 5 V-tolerant input), a dual-supply ' +
      "translator, or pull the net up to the receiver's own rail; a series resistor only limits the " +
      'clamp current.',
    messages: {
      tooHigh: (d: Data) =>
        `${d.from} can put ${volts(d.vNet)} on ${d.pin}, whose limit is ${volts(d.viMax)} at its supply of ${volts(d.pinVdd)}.`,
      throughResistance: (d: PathData) =>
        `${d.from} can put ${volts(d.vNet)} on ${d.pin} through series resistance, above its limit of ${volts(d.viMax)} at its supply of ${volts(d.pinVdd)}: ` +
        `its clamp diode would carry up to ${amps(d.current)}, and the pin states no injection-current limit.`,
    },
  },
  checkNet(view, report) {
    const sourcesOf = (pin: (typeof view.pins)[number]) => netSources(pin, view.drivers, view.pulls);
    for (const pin of view.pins) {
      const viMax = pin.params.viMax;
      if (!pin.powered || viMax === undefined) continue;
      const worst = worstExposure(pin, sourcesOf(pin), view.rails, (vdd) => levelAt(viMax, vdd));
      if (worst === undefined || !exceeds(worst.vNet, worst.limit)) {
        if (view.path === undefined || pin.params.injectionMax !== undefined) continue;
        const far = pathExposure(
          view.path,
          pin,
          view.rails,
          (vdd) => levelAt(viMax, vdd),
          'high',
          `viMax:${String(viMax)}`,
        );
        if (
          far === undefined ||
          (Number.isFinite(far.vNet) && Number.isFinite(far.limit) && !exceeds(far.vNet, far.limit))
        )
          continue;
        const from = far.source === 'pulls' ? 'The pull-ups across the series resistors' : far.source;
        report({
          messageId: 'throughResistance',
          data: { pin: pin.key, vNet: far.vNet, viMax: far.limit, from, pinVdd: far.pinVdd, current: far.current },
          severity: 'error',
          pins: [pin.key],
          parts: partsOf(pin.key),
          suffix: pin.key,
          hint: "State the pin's injection-current limit (injectionMax) so the series resistor can be judged, raise the series resistance, or use a divider or a tolerant input.",
          values: {
            vNet: far.vNet,
            viMax: far.limit,
            pin: pin.key,
            source: far.source,
            pinVdd: far.pinVdd,
            current: far.current,
            resistors: far.resistors,
          },
        });
        continue;
      }
      const from =
        worst.source.kind === 'driver'
          ? worst.source.from
          : worst.source.from === 'net'
            ? `The net's pull-up to ${view.names.rail(worst.source.rail)}`
            : `${worst.source.from}'s internal pull-up`;
      report({
        messageId: 'tooHigh',
        data: { pin: pin.key, vNet: worst.vNet, viMax: worst.limit, from, pinVdd: worst.pinVdd },
        severity: 'error',
        pins: [pin.key],
        parts: partsOf(pin.key),
        suffix: pin.key,
        values: { vNet: worst.vNet, viMax: worst.limit, pin: pin.key, source: worst.source.from, pinVdd: worst.pinVdd },
      });
    }
  },
});
