/**
 * translator-pull: the external pulls and load on a pin of an auto-direction translator
 * (version 2). Two classes, told apart by their parameters: (a) weak push-pull buffers with a
 * series output resistance Rs (`seriesResistance`), which a strong external pull-up overpowers,
 * and (b) open-drain pass types with one-shot edge accelerators and internal pulls. Both state the
 * smallest external pull they tolerate (`minExternalPull`) and may state the largest load
 * capacitance (`maxLoadCapacitance`); class (b)'s VIL of 0.15 V is the pin's `vil`, judged by
 * level-low.
 */
import { levelAt } from '../levels/level.ts';
import { below, exceeds } from '../levels/compare.ts';
import { corners } from '../levels/rails.ts';
import { lowThreshold } from '../engine/resolve.ts';
import { pullEndVoltage } from '../engine/netMath.ts';
import { GROUND } from '../engine/powerStates.ts';
import type { PullSource } from '../engine/types.ts';
import type { Names } from '../engine/names.ts';
import { defineRule } from './defineRule.ts';
import { farads, ohms, volts } from './format.ts';
import { partsOfPins as partsOf } from '../model/pinKeys.ts';

interface PullData {
  pin: string;
  pull: string;
  ohms: number;
  minExternalPull: number;
}

interface LowData {
  pin: string;
  receiver: string;
  vlow: number;
  vil: number;
  rs: number;
  rpu: number;
  vpull: number;
}

interface CapData {
  pin: string;
  capacitance: number;
  maxLoadCapacitance: number;
}

/** External pulls: the net's own and resistor parts, not pins' internal ones. */
const external = (p: PullSource) => p.origin === 'net' || p.resistor === true;
const lowEnd = (p: PullSource) => p.min;
const pullName = (p: PullSource, names: Names) =>
  p.origin === 'net' ? `the net's pull to ${names.rail(p.to)}` : `${p.origin} to ${names.rail(p.to)}`;

export default defineRule({
  id: 'translator-pull',
  meta: {
    title: 'Auto-direction translator pins get the pulls and load they allow',
    severity: { error: '' },
    explanation:
      'An auto-direction translator senses the direction from the signal itself, so what hangs on its ' +
      "pins matters. Each external pull on the net (the net's own or a resistor part; each at its low " +
      "tolerance end) must be at least the pin's minExternalPull. For a weak push-pull type with a series " +
      "output resistance Rs, a pull-up Rpu divides its low level: VCC·Rs/(Rpu + Rs) at the pull rail's " +
      "highest and Rpu at its low end, which must stay at or below every other receiver's VIL. The net's " +
      "capacitance must not exceed the pin's maxLoadCapacitance where one is stated. An open-drain pass " +
      "type's internal pulls are its pins' pulls: they add to every driver's sink current (drive-load, " +
      'pull-range), and its VIL (about 0.15 V) is judged by level-low.',
    hint:
      'Remove or enlarge the external pull-up (these translators need none or a weak one), shorten the ' +
      'wiring, or use a translator with a direction pin or a FET shifter for an open-drain bus.',
    messages: {
      pullTooStrong: (d: PullData) =>
        `${d.pull} (${ohms(d.ohms)} at its low end) is stronger than the ${ohms(d.minExternalPull)} ${d.pin} allows as an external pull.`,
      lowLevelLost: (d: LowData) =>
        `${d.pin}'s series resistance (${ohms(d.rs)}) against the ${ohms(d.rpu)} pull-up leaves its low at ` +
        `${volts(d.vpull)}·Rs/(Rpu + Rs) = ${volts(d.vlow)}, above ${d.receiver}'s VIL of ${volts(d.vil)}.`,
      loadTooLarge: (d: CapData) =>
        `The net loads ${d.pin} with ${farads(d.capacitance)}, more than the ${farads(d.maxLoadCapacitance)} it drives reliably.`,
    },
  },
  checkNet(view, report) {
    for (const pin of view.pins) {
      if (!pin.powered) continue;
      const { minExternalPull, seriesResistance: rs, maxLoadCapacitance } = pin.params;
      if (minExternalPull === undefined && rs === undefined && maxLoadCapacitance === undefined) continue;
      const pulls = view.pulls.filter(external);
      if (minExternalPull !== undefined) {
        for (const p of pulls) {
          if (Number.isFinite(lowEnd(p)) && Number.isFinite(minExternalPull) && !below(lowEnd(p), minExternalPull))
            continue;
          report({
            messageId: 'pullTooStrong',
            data: { pin: pin.key, pull: pullName(p, view.names), ohms: lowEnd(p), minExternalPull },
            severity: 'error',
            pins: [pin.key],
            parts: partsOf(pin.key),
            suffix: `${pin.key}:${p.origin}`,
            values: { pin: pin.key, pull: p.origin, ohms: lowEnd(p), minExternalPull },
          });
        }
      }
      const ups = pulls.filter((p) => p.to !== GROUND && !view.rails.off.has(p.to));
      if (rs !== undefined && pin.role !== 'input' && ups.length > 0) {
        let worst: (LowData & { score: number }) | undefined;
        const pullRails = [...new Set(ups.map((p) => p.to))];
        for (const rx of view.receivers) {
          const vil = lowThreshold(rx);
          if (rx.partId === pin.partId || vil === undefined) continue;
          for (const c of corners([...pullRails, rx.rail], view.rails.ranges)) {
            // The pull-ups' Thévenin equivalent, each at its low end: the strongest pull.
            let g = 0;
            let i = 0;
            for (const p of ups) {
              g += 1 / lowEnd(p);
              i += pullEndVoltage(p, c) / lowEnd(p);
            }
            const rpu = 1 / g;
            const vpull = rpu * i;
            const vlow = (vpull * rs) / (rpu + rs);
            const th = levelAt(vil, c.get(rx.rail) ?? 0);
            const score = th - vlow;
            if (worst === undefined || score < worst.score || !Number.isFinite(score))
              worst = { pin: pin.key, receiver: rx.key, vlow, vil: th, rs, rpu, vpull, score };
          }
        }
        if (
          worst !== undefined &&
          (!Number.isFinite(worst.vlow) || !Number.isFinite(worst.vil) || exceeds(worst.vlow, worst.vil))
        ) {
          const { score: _s, ...data } = worst;
          report({
            messageId: 'lowLevelLost',
            data,
            severity: 'error',
            pins: [pin.key, data.receiver],
            parts: partsOf(pin.key, data.receiver),
            suffix: `${pin.key}>${data.receiver}`,
            values: { ...data },
          });
        }
      }
      if (
        maxLoadCapacitance !== undefined &&
        (!Number.isFinite(view.capacitance) ||
          !Number.isFinite(maxLoadCapacitance) ||
          exceeds(view.capacitance, maxLoadCapacitance))
      ) {
        report({
          messageId: 'loadTooLarge',
          data: { pin: pin.key, capacitance: view.capacitance, maxLoadCapacitance },
          severity: 'error',
          pins: [pin.key],
          parts: partsOf(pin.key),
          suffix: `${pin.key}:load`,
          values: { pin: pin.key, capacitance: view.capacitance, maxLoadCapacitance },
        });
      }
    }
  },
});
