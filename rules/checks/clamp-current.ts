/**
 * clamp-current: a powered pin that a source on another net drives above its `viMax` through
 * series resistance, whose clamp diode then carries the current the resistors let through,
 * against the pin's injection-current limit (version 2).
 */
import { levelAt } from '../levels/level.ts';
import { exceeds } from '../levels/compare.ts';
import { netSources, worstExposure } from '../engine/netMath.ts';
import { pathExposure } from '../engine/paths.ts';
import { defineRule } from './defineRule.ts';
import { amps, volts } from './format.ts';
import { partsOfPins as partsOf } from '../model/pinKeys.ts';
import { allFinite } from './finite.ts';

interface Data {
  pin: string;
  from: string;
  vNet: number;
  viMax: number;
  current: number;
  injectionMax: number;
  pinVdd: number;
}

export default defineRule({
  id: 'clamp-current',
  meta: {
    title: "Clamp currents through series resistors stay within the pin's limit",
    severity: { error: "above the pin's injection-current limit", info: 'with the current when within it' },
    explanation:
      'When a source on another net reaches a powered input only through resistance and would lift it ' +
      "above its viMax, the input's protection diode conducts into its rail. The current is taken with " +
      "the diode's drop at 0 V, the worst case: I = (Vsrc,max − VDD,rx,min)/R for one series resistor, " +
      'and in general the current the resistor network pushes into the pin held at its supply, the ' +
      "largest over the rails' corners and the resistors' tolerance ends. It is compared with the " +
      "pin's injectionMax (datasheets give it, often a few mA). A pin without injectionMax is left to " +
      'overvoltage, which then reports the over-voltage as an error.',
    hint:
      "Raise the series resistance so that the clamp current stays within the pin's injection limit " +
      '(R ≥ (Vsrc,max − VDD,rx,min)/Iinj), or use a divider or an input that tolerates the voltage.',
    messages: {
      overLimit: (d: Data) =>
        `${d.from} drives ${d.pin} to ${volts(d.vNet)} through series resistance, above its ${volts(d.viMax)} limit: ` +
        `its clamp carries up to ${amps(d.current)}, more than the ${amps(d.injectionMax)} it may take.`,
      withinLimit: (d: Data) =>
        `${d.from} would drive ${d.pin} to ${volts(d.vNet)} through series resistance; its clamp carries at most ` +
        `${amps(d.current)}, within its ${amps(d.injectionMax)} limit.`,
    },
  },
  checkNet(view, report) {
    if (view.path === undefined) return;
    for (const pin of view.pins) {
      const viMax = pin.params.viMax;
      const injectionMax = pin.params.injectionMax;
      if (!pin.powered || viMax === undefined || injectionMax === undefined) continue;
      const limit = (vdd: number) => levelAt(viMax, vdd);
      // A source on the pin's own net has no resistance to limit it: overvoltage's to judge.
      const direct = worstExposure(pin, netSources(pin, view.drivers, view.pulls), view.rails, limit);
      if (direct !== undefined && exceeds(direct.vNet, direct.limit)) continue;
      const far = pathExposure(view.path, pin, view.rails, limit, 'high', `viMax:${String(viMax)}`);
      if (far === undefined) continue;
      const decided = allFinite(far.vNet, far.limit, far.current, injectionMax);
      if (decided && !exceeds(far.vNet, far.limit)) continue;
      const over = !decided || exceeds(far.current, injectionMax);
      const from = far.source === 'pulls' ? 'The pull-ups across the series resistors' : far.source;
      report({
        messageId: over ? 'overLimit' : 'withinLimit',
        data: {
          pin: pin.key,
          from,
          vNet: far.vNet,
          viMax: far.limit,
          current: far.current,
          injectionMax,
          pinVdd: far.pinVdd,
        },
        severity: over ? 'error' : 'info',
        pins: [pin.key],
        parts: partsOf(pin.key),
        suffix: pin.key,
        ...(over ? {} : { hint: 'Nothing to change; the rail must still absorb the current (rail-injection).' }),
        values: {
          pin: pin.key,
          rail: pin.rail,
          source: far.source,
          vNet: far.vNet,
          viMax: far.limit,
          pinVdd: far.pinVdd,
          current: far.current,
          injectionMax,
          resistors: far.resistors,
        },
      });
    }
  },
});
