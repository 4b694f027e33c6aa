/**
 * back-power: in a scenario, a pin on an off rail whose unpowered limit is exceeded by the
 * highest voltage the net's sources can put on it; current then flows through the pin into the
 * unpowered chip and its dead rail (rules-catalogue.md).
 */
import { levelAt } from '../levels/level.ts';
import { exceeds } from '../levels/compare.ts';
import { netSources, worstExposure, type NetSource } from '../engine/netMath.ts';
import { pathExposure } from '../engine/paths.ts';
import type { PinView, RailStates } from '../engine/types.ts';
import type { Names } from '../engine/names.ts';
import { defineRule } from './defineRule.ts';
import { amps, volts } from './format.ts';
import { partsOfPins as partsOf } from '../model/pinKeys.ts';

/**
 * An unpowered CMOS pin's clamp diode to its own rail starts to conduct around half a volt
 * above that rail, here 0 V (common practice).
 */
export const CLAMP_CONDUCTS = 0.5;

/** Which limit applies to an unpowered pin, and why. */
type Limit =
  | { readonly kind: 'viMaxOff'; readonly v: number }
  | { readonly kind: 'viMax'; readonly v: number; readonly railMin: number }
  | { readonly kind: 'clamp'; readonly v: number };

interface Data {
  pin: string;
  rail: string;
  vNet: number;
  viMax: number;
  from: string;
  /** The rail's lowest voltage when on, where `viMax` was taken (abovePoweredLimit). */
  railMin?: number;
}

/** The catalogue's unpowered limit; undefined for an unpowered-safe pin without `viMax`. */
function unpoweredLimit(pin: PinView, rails: RailStates): Limit | undefined {
  const { viMaxOff, unpoweredSafe, viMax } = pin.params;
  if (viMaxOff !== undefined) return { kind: 'viMaxOff', v: viMaxOff };
  if (unpoweredSafe !== true) return { kind: 'clamp', v: CLAMP_CONDUCTS };
  const on = rails.onRanges.get(pin.rail);
  if (viMax === undefined || on === undefined) return undefined;
  return { kind: 'viMax', v: levelAt(viMax, on.min), railMin: on.min };
}

function sourceText(source: NetSource, names: Names): string {
  if (source.kind === 'driver') return source.from;
  return source.from === 'net'
    ? `The net's pull-up to ${names.rail(source.rail)}`
    : `${source.from}'s internal pull-up`;
}

const MESSAGE_OF = { viMaxOff: 'aboveOffLimit', viMax: 'abovePoweredLimit', clamp: 'clampConducts' } as const;

export default defineRule({
  id: 'back-power',
  meta: {
    title: 'No current into unpowered chips',
    severity: { error: '' },
    explanation:
      'When a rail is off, the chips on it sit at 0 V but their pins stay on the nets. Each such pin ' +
      "is compared with the highest voltage the net's live sources can apply (powered push-pull and " +
      "three-state drivers' rails, pull resistors' rails). A pin rated for voltage while unpowered " +
      'is held to that rating (viMaxOff); a pin declared unpowered-safe without one is held to its ' +
      "powered limit at its rail's lowest voltage; any other pin to 0.5 V, where its clamp diode " +
      'starts to feed the dead rail and can half-power the chip. A source on another net that reaches the ' +
      "pin through series resistors is judged at the voltage the network leaves on the pin's net, and " +
      'the finding gives the current the resistors then let into the dead rail (the clamp held at 0 V).',
    hint:
      'Use a part specified for partial power-down (pins that may carry voltage at VDD = 0), a buffer ' +
      'or switch that isolates the net while the rail is off, a pull-up to the switched rail, or power ' +
      'the rails together; a series resistor only limits the clamp current.',
    messages: {
      clampConducts: (d: Data) =>
        `${d.from} can put ${volts(d.vNet)} on ${d.pin} while ${d.rail} is off: above ${volts(d.viMax)} its clamp diode feeds the dead rail.`,
      aboveOffLimit: (d: Data) =>
        `${d.from} can put ${volts(d.vNet)} on ${d.pin} while ${d.rail} is off, more than the ${volts(d.viMax)} it may carry unpowered.`,
      abovePoweredLimit: (d: Data) =>
        `${d.from} can put ${volts(d.vNet)} on ${d.pin} while ${d.rail} is off, above its limit of ${volts(d.viMax)} (viMax at ${volts(d.railMin ?? 0)}).`,
    },
  },
  checkNet(view, report) {
    for (const pin of view.pins) {
      if (!view.rails.off.has(pin.rail)) continue;
      const limit = unpoweredLimit(pin, view.rails);
      if (limit === undefined) continue;
      const sources = netSources(pin, view.drivers, view.pulls);
      const direct = worstExposure(pin, sources, view.rails, () => limit.v);
      let worst: { vNet: number; limit: number; from: string; source: string; current?: number } | undefined =
        direct === undefined
          ? undefined
          : {
              vNet: direct.vNet,
              limit: direct.limit,
              from: sourceText(direct.source, view.names),
              source: direct.source.from,
            };
      if ((worst === undefined || !exceeds(worst.vNet, worst.limit)) && view.path !== undefined) {
        const far = pathExposure(view.path, pin, view.rails, () => limit.v, 'high');
        if (far !== undefined) {
          worst = {
            vNet: far.vNet,
            limit: far.limit,
            source: far.source,
            current: far.current,
            from: `${far.source === 'pulls' ? 'The pull-ups' : far.source} through series resistance (${amps(far.current)} into the dead rail)`,
          };
        }
      }
      if (worst === undefined || !exceeds(worst.vNet, worst.limit)) continue;
      const data: Data = {
        pin: pin.key,
        rail: view.names.rail(pin.rail),
        vNet: worst.vNet,
        viMax: limit.v,
        from: worst.from,
        ...(limit.kind === 'viMax' ? { railMin: limit.railMin } : {}),
      };
      report({
        messageId: MESSAGE_OF[limit.kind],
        data,
        severity: 'error',
        pins: [pin.key],
        parts: partsOf(pin.key),
        suffix: pin.key,
        values: {
          vNet: worst.vNet,
          viMax: limit.v,
          pin: pin.key,
          source: worst.source,
          limit: limit.kind,
          ...(worst.current === undefined ? {} : { current: worst.current }),
        },
      });
    }
  },
});
