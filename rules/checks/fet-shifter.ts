/**
 * fet-shifter: a bidirectional N-MOSFET level shifter (the I2C-bus specification's level-shifting
 * section): the FET must turn on for every driver's low, each driver must sink both sides'
 * pull-ups, each side needs its own pull-up, and the gate's rail must not exceed the high side's
 * pull rail (version 2). The far side's levels are level-low's and level-high's to judge.
 */
import { levelAt } from '../levels/level.ts';
import { below, exceeds } from '../levels/compare.ts';
import { corners } from '../levels/rails.ts';
import { sortedPoints } from '../levels/output.ts';
import { pullEndVoltage } from '../engine/netMath.ts';
import { fetOn } from '../engine/paths.ts';
import { GROUND } from '../engine/powerStates.ts';
import type { FetShifter } from '../model/schema.ts';
import type { PathNode, PinView } from '../engine/types.ts';
import { defineRule } from './defineRule.ts';
import { amps, volts } from './format.ts';
import { partsOfPins as partsOf } from '../model/pinKeys.ts';

interface TurnOn {
  fet: string;
  driver: string;
  vgate: number;
  vol: number;
  vgs: number;
  vgsTh: number;
}

interface Sink {
  fet: string;
  driver: string;
  iLow: number;
  iHigh: number;
  total: number;
  rated: number;
}

interface Side {
  fet: string;
  side: 'low' | 'high';
  net: string;
}

interface Gate {
  fet: string;
  gate: string;
  gateMax: number;
  pullRail: string;
  pullMin: number;
}

/** The driver's largest `vol` test point: its level at a supply and its current. */
function topVol(d: PinView): { v: (vdd: number) => number; i: number } | undefined {
  const points = d.params.vol;
  if (points === undefined || points.length === 0) return undefined;
  const top = sortedPoints(points)[points.length - 1]!;
  return { v: (vdd) => levelAt(top.v, vdd), i: top.i };
}

/** The pull-ups' current into a low at `vol`, each resistor at its low end, at the corner. */
function pullUpCurrent(node: PathNode, corner: ReadonlyMap<string, number>, vol: number): number {
  let i = 0;
  for (const p of node.pulls) {
    if (p.to === GROUND) continue;
    const end = pullEndVoltage(p, corner);
    if (end > vol) i += (end - vol) / p.min;
  }
  return i;
}

const pullRailsOf = (n: PathNode) => [...new Set(n.pulls.filter((p) => p.to !== GROUND).map((p) => p.to))];

export default defineRule({
  id: 'fet-shifter',
  meta: {
    title: 'FET level shifters turn on and their drivers carry both pull-ups',
    severity: { error: '' },
    explanation:
      'A bidirectional N-MOSFET shifter joins a low-side net (its source) and a high-side net (its drain), ' +
      "each with its own pull-up, the gate on the low side's rail. A driver pulling either side low must " +
      "turn the FET on: VGS = Vgate,min − VOL must reach the FET's largest VGS(th). It then sinks both " +
      'pull-ups: I = (Vpull,L,max − VOL)/R_L,min + (Vpull,H,max − VOL)/R_H,min, each resistor at its low ' +
      'tolerance end, which must not exceed its rated IOL (the current of its largest vol test point). Each ' +
      "side needs a pull-up to a rail, and the gate's rail must not exceed the high side's pull rail " +
      "(else the FET never turns off). The far side's low, VOL + I_far·RDS(on), and each side's high " +
      "are judged by level-low and level-high on the receiver's net; rise time and pull-up range per " +
      'side by edge-rate and pull-range.',
    hint:
      'Use a FET with a lower VGS(th) (logic-level), larger pull-ups on the side that is not the weak ' +
      "driver's, a gate on the low side's rail, or a dedicated two-wire bus translator.",
    messages: {
      mayNotTurnOn: (d: TurnOn) =>
        `${d.fet} may not turn on when ${d.driver} pulls low: VGS = ${volts(d.vgate)} − ${volts(d.vol)} = ${volts(d.vgs)}, below its VGS(th) of up to ${volts(d.vgsTh)}.`,
      sinksBoth: (d: Sink) =>
        `${d.driver} must sink both pull-ups through ${d.fet}: ${amps(d.iLow)} + ${amps(d.iHigh)} = ${amps(d.total)}, more than its rated ${amps(d.rated)}.`,
      sideWithoutPull: (d: Side) =>
        `The ${d.side} side of ${d.fet} (net ${d.net}) has no pull-up to a rail: nothing lifts it when every driver lets go.`,
      gateAboveHighSide: (d: Gate) =>
        `${d.fet}'s gate rail ${d.gate} (up to ${volts(d.gateMax)}) can exceed the high side's pull rail ${d.pullRail} (${volts(d.pullMin)}): the FET may never turn off.`,
    },
  },
  checkNet(view, report) {
    for (const link of view.shifters) {
      if (link.part.kind !== 'fet-shifter' || link.pin !== 'S') continue;
      const fet: FetShifter = link.part;
      if (!fetOn(fet, view.rails)) continue;
      const low = link.self;
      const high = link.other;
      const keys = [`${fet.id}.S`, `${fet.id}.D`];
      for (const [side, node] of [
        ['low', low],
        ['high', high],
      ] as const) {
        if (node.pulls.some((p) => p.to !== GROUND)) continue;
        report({
          messageId: 'sideWithoutPull',
          data: { fet: fet.id, side, net: view.names.net(node.netId) },
          severity: 'error',
          pins: keys,
          parts: [fet.id],
          suffix: `${fet.id}:${side}`,
          values: { fet: fet.id, side, net: node.netId },
        });
      }
      for (const rail of pullRailsOf(high)) {
        const g = view.rails.ranges.get(fet.gate);
        const r = view.rails.ranges.get(rail);
        if (g === undefined || r === undefined || rail === fet.gate || !exceeds(g.max, r.min)) continue;
        report({
          messageId: 'gateAboveHighSide',
          data: {
            fet: fet.id,
            gate: view.names.rail(fet.gate),
            gateMax: g.max,
            pullRail: view.names.rail(rail),
            pullMin: r.min,
          },
          severity: 'error',
          pins: keys,
          parts: [fet.id],
          suffix: `${fet.id}:gate:${rail}`,
          values: { fet: fet.id, gate: fet.gate, gateMax: g.max, pullRail: rail, pullMin: r.min },
        });
      }
      for (const [node, other] of [
        [low, high],
        [high, low],
      ] as const) {
        for (const d of node.pins) {
          if (!d.powered || d.role === 'input') continue;
          const top = topVol(d);
          if (top === undefined) continue;
          // Turn-on: the lowest gate voltage against the highest VOL.
          let turn: TurnOn | undefined;
          for (const c of corners([fet.gate, d.rail], view.rails.ranges)) {
            const vgate = c.get(fet.gate) ?? 0;
            const vol = top.v(c.get(d.rail) ?? 0);
            const vgs = vgate - vol;
            if (turn === undefined || vgs < turn.vgs || !Number.isFinite(vgs))
              turn = { fet: fet.id, driver: d.key, vgate, vol, vgs, vgsTh: fet.vgsThMax };
          }
          if (
            turn !== undefined &&
            (!Number.isFinite(turn.vgs) || !Number.isFinite(fet.vgsThMax) || below(turn.vgs, fet.vgsThMax))
          ) {
            report({
              messageId: 'mayNotTurnOn',
              data: turn,
              severity: 'error',
              pins: [d.key, ...keys],
              parts: partsOf(d.key, fet.id),
              suffix: `${fet.id}:${d.key}`,
              values: { ...turn },
            });
          }
          // Both pull-ups at their rails' highest, the resistors at their low ends, at the driver's VOL.
          let sink: Sink | undefined;
          for (const c of corners([d.rail, ...pullRailsOf(node), ...pullRailsOf(other)], view.rails.ranges)) {
            const vol = top.v(c.get(d.rail) ?? 0);
            const iLow = pullUpCurrent(node === low ? node : other, c, vol);
            const iHigh = pullUpCurrent(node === low ? other : node, c, vol);
            const total = iLow + iHigh;
            if (sink === undefined || total > sink.total || !Number.isFinite(total))
              sink = { fet: fet.id, driver: d.key, iLow, iHigh, total, rated: top.i };
          }
          if (
            sink !== undefined &&
            (!Number.isFinite(sink.total) || !Number.isFinite(sink.rated) || exceeds(sink.total, sink.rated))
          ) {
            report({
              messageId: 'sinksBoth',
              data: sink,
              severity: 'error',
              pins: [d.key, ...keys],
              parts: partsOf(d.key, fet.id),
              suffix: `${fet.id}:${d.key}:sink`,
              values: { ...sink },
            });
          }
        }
      }
    }
  },
});
