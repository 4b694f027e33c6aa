/**
 * bus-hold: a net with bus-hold inputs and a strap resistor (a pull) that must overdrive them
 * when nothing else drives the net (version 2). A bus-hold input keeps the net at its last level
 * with a weak latch; to set a level, the strap must push past the latch's overdrive current
 * while still leaving the input beyond its threshold: R ≤ (Vpull,min − VIH)/ΣI_overdrive for a
 * strap up, R ≤ VIL/ΣI_overdrive for a strap to ground.
 */
import { levelAt } from '../levels/level.ts';
import { exceeds } from '../levels/compare.ts';
import { corners } from '../levels/rails.ts';
import { highThreshold, lowThreshold } from '../engine/resolve.ts';
import { pullEndVoltage } from '../engine/netMath.ts';
import { GROUND } from '../engine/powerStates.ts';
import { defineRule } from './defineRule.ts';
import { amps, ohms } from './format.ts';
import { partsOfPins as partsOf } from '../model/pinKeys.ts';

interface Data {
  net: string;
  pull: string;
  ohms: number;
  rMax: number;
  overdrive: number;
  toward: 'high' | 'low';
}

export default defineRule({
  id: 'bus-hold',
  meta: {
    title: 'Straps overdrive bus-hold inputs',
    severity: { error: '' },
    explanation:
      'A bus-hold input is never floating: a weak latch keeps the net at its last level (so floating-input ' +
      'does not report it). A strap resistor meant to set the level while nothing drives the net must ' +
      'overdrive every latch on the net: R ≤ (Vpull,min − VIH,max)/ΣI_overdrive,max for a strap to a ' +
      "rail, R ≤ VIL,min/ΣI_overdrive,max for a strap to ground, VIH and VIL the bus-hold inputs' worst at " +
      "the rails' ends and each resistor at its high tolerance end. Judged on nets with no powered " +
      'push-pull driver.',
    hint: 'Use a smaller strap resistor (at most the bound), or drive the net actively.',
    messages: {
      strapTooWeak: (d: Data) =>
        `The strap (${d.pull}, ${ohms(d.ohms)}) cannot overdrive the bus-hold inputs on ${d.net} (${amps(d.overdrive)} in all) ${d.toward}: it must be at most ${ohms(d.rMax)}.`,
    },
  },
  checkNet(view, report) {
    const holders = view.pins.filter((p) => p.powered && p.params.busHold !== undefined);
    if (holders.length === 0 || view.pulls.length === 0) return;
    if (view.drivers.some((d) => d.drive === 'push-pull') || view.remoteDrivers.some((d) => d.drive === 'push-pull'))
      return;
    let overdrive = 0;
    for (const h of holders) overdrive += h.params.busHold!.overdrive;
    if (overdrive === 0) return;
    for (const p of view.pulls) {
      const up = p.to !== GROUND;
      const railIds = [...(up ? [p.to] : []), ...holders.map((h) => h.rail)];
      let rMax = Infinity;
      for (const c of corners(railIds, view.rails.ranges)) {
        for (const h of holders) {
          const th = up ? highThreshold(h) : lowThreshold(h);
          if (th === undefined) continue;
          const t = levelAt(th, c.get(h.rail) ?? 0);
          const r = up ? (pullEndVoltage(p, c) - t) / overdrive : t / overdrive;
          rMax = Number.isNaN(r) || Number.isNaN(rMax) ? Number.NaN : Math.min(rMax, r);
        }
      }
      // No threshold at all: nothing to overdrive against (rMax stays +∞); NaN is undecided.
      if (rMax === Infinity) continue;
      const high = p.max;
      if (Number.isFinite(rMax) && Number.isFinite(high) && !exceeds(high, rMax)) continue;
      const pull =
        p.origin === 'net'
          ? `the net's pull to ${view.names.rail(p.to)}`
          : p.resistor === true
            ? p.origin
            : `${p.origin}'s internal pull`;
      const keys = holders.map((h) => h.key);
      report({
        messageId: 'strapTooWeak',
        data: {
          net: view.names.net(view.net.id),
          pull,
          ohms: high,
          rMax: Math.max(0, rMax),
          overdrive,
          toward: up ? 'high' : 'low',
        },
        severity: 'error',
        pins: keys,
        parts: partsOf(...keys),
        suffix: p.origin,
        values: { pull: p.origin, ohms: high, rMax, overdrive, toward: up ? 'high' : 'low' },
      });
    }
  },
});
