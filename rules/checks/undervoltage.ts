/**
 * undervoltage: a powered pin whose `viMin` (e.g. −0.5 V for a clamped CMOS input) is passed by
 * the lowest voltage the net's other sources can put on it, judged as overvoltage judges `viMax`
 * (version 2).
 */
import { levelAt } from '../levels/level.ts';
import { below } from '../levels/compare.ts';
import { corners } from '../levels/rails.ts';
import { pullEndVoltage } from '../engine/netMath.ts';
import { pathExposure } from '../engine/paths.ts';
import { GROUND } from '../engine/powerStates.ts';
import { defineRule } from './defineRule.ts';
import { volts } from './format.ts';
import { partsOfPins as partsOf } from '../model/pinKeys.ts';

interface Data {
  pin: string;
  vNet: number;
  viMin: number;
  from: string;
  pinVdd: number;
}

export default defineRule({
  id: 'undervoltage',
  meta: {
    title: 'No pin is pulled below what it may take',
    severity: { error: '' },
    explanation:
      'Every pin on a powered rail that has a viMin is compared with the lowest voltage any other source ' +
      'on its net can apply: each powered push-pull or three-state driver at the lower of 0 V and its ' +
      'rail (a driver on a negative rail swings below ground), each pull resistor at its rail or 0 V for ' +
      'ground, and sources on other nets through series resistors at the voltage the network leaves ' +
      "on the pin's net; at every corner of the rails involved. Below viMin a clamped input's diode " +
      'to ground conducts.',
    hint: "Clamp or divide the signal before the input, add a series resistor sized for the input's injection limit, or use a receiver made for the line's swing.",
    messages: {
      tooLow: (d: Data) =>
        `${d.from} can pull ${d.pin} to ${volts(d.vNet)}, below its limit of ${volts(d.viMin)} at its supply of ${volts(d.pinVdd)}.`,
    },
  },
  checkNet(view, report) {
    for (const pin of view.pins) {
      const viMin = pin.params.viMin;
      if (!pin.powered || viMin === undefined) continue;
      let worst: { v: number; limit: number; from: string; pinVdd: number; excess: number } | undefined;
      const consider = (v: number, pinVdd: number, from: string) => {
        const limit = levelAt(viMin, pinVdd);
        const excess = limit - v;
        // A number that is not finite wins: it must be reported, not lost in a comparison.
        if (worst === undefined || excess > worst.excess || !Number.isFinite(excess)) {
          if (worst === undefined || Number.isFinite(worst.excess)) worst = { v, limit, from, pinVdd, excess };
        }
      };
      for (const d of view.drivers) {
        if (d.key === pin.key || d.drive === 'open-drain') continue;
        for (const c of corners([d.rail, pin.rail], view.rails.ranges))
          consider(Math.min(0, c.get(d.rail) ?? 0), c.get(pin.rail) ?? 0, d.key);
      }
      for (const p of view.pulls) {
        const rails = p.to === GROUND ? [pin.rail] : [p.to, pin.rail];
        const to = view.names.rail(p.to);
        const from = p.origin === 'net' ? `The net's pull to ${to}` : `The pull of ${p.origin} to ${to}`;
        for (const c of corners(rails, view.rails.ranges)) consider(pullEndVoltage(p, c), c.get(pin.rail) ?? 0, from);
      }
      if (view.path !== undefined) {
        const far = pathExposure(view.path, pin, view.rails, (vdd) => levelAt(viMin, vdd), 'low');
        if (far !== undefined)
          consider(far.vNet, far.pinVdd, far.source === 'pulls' ? 'The pulls across the series resistors' : far.source);
      }
      const w = worst as { v: number; limit: number; from: string; pinVdd: number } | undefined;
      if (w === undefined || (Number.isFinite(w.v) && Number.isFinite(w.limit) && !below(w.v, w.limit))) continue;
      report({
        messageId: 'tooLow',
        data: { pin: pin.key, vNet: w.v, viMin: w.limit, from: w.from, pinVdd: w.pinVdd },
        severity: 'error',
        pins: [pin.key],
        parts: partsOf(pin.key),
        suffix: pin.key,
        values: { vNet: w.v, viMin: w.limit, pin: pin.key, source: w.from, pinVdd: w.pinVdd },
      });
    }
  },
});
