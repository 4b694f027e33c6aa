import { current, type Draft } from 'immer';
import { DEFAULT_WIRING_CAPACITANCE, type Design, type Net, type Waiver } from '../../../rules/model/index.ts';
import { freshId, hasPin, refuse, type Command } from './command.ts';
import { netWires, type Pair } from './netGraph.ts';

function sameWaiver(x: Waiver, y: Waiver): boolean {
  return x.rule === y.rule && x.scenario === y.scenario && x.note === y.note;
}

/**
 * Merge `gone` into `keep` (which keeps its id). A label, pull or rise-time limit missing on
 * `keep` comes from `gone`; waivers are united; the rise-time limit is the stricter of the two.
 * Wiring capacitance adds up, since both runs of wire are now one net: when either net states
 * its own, the other counts with the design's default.
 */
function mergeInto(design: Draft<Design>, keep: Draft<Net>, gone: Net, pair: Pair): void {
  const wires = [...netWires(keep), ...netWires(gone), pair];
  keep.pins.push(...gone.pins);
  keep.route = wires.map(([a, b]) => [a, b]);
  if (keep.label === undefined && gone.label !== undefined) keep.label = gone.label;
  if (keep.pull === undefined && gone.pull !== undefined) keep.pull = { ...gone.pull };
  if (keep.wiringCapacitance !== undefined || gone.wiringCapacitance !== undefined) {
    const dflt = design.settings?.defaultWiringCapacitance ?? DEFAULT_WIRING_CAPACITANCE;
    // Twelve digits: a sum of two picofarad values keeps no binary dust (5.5000000000000004e-11).
    keep.wiringCapacitance = Number(
      ((keep.wiringCapacitance ?? dflt) + (gone.wiringCapacitance ?? dflt)).toPrecision(12),
    );
  }
  if (gone.maxRiseTime !== undefined) {
    keep.maxRiseTime = Math.min(keep.maxRiseTime ?? Infinity, gone.maxRiseTime);
  }
  if (gone.waivers !== undefined && gone.waivers.length > 0) {
    const all = [...(keep.waivers ?? [])];
    for (const w of gone.waivers) if (!all.some((x) => sameWaiver(x, w))) all.push({ ...w });
    keep.waivers = all;
  }
}

/**
 * Wire pin `from` to pin `to` (both `PART.PIN`). Two nets merge, and the net of `from` keeps
 * its id; a pin on no net joins the other's net; two pins on no net start a new net `N<k>`.
 * Refused: a pin to itself, an unknown pin, two pins already on one net.
 */
export function connectPins(from: string, to: string): Command {
  return {
    name: `Connect ${from} to ${to}`,
    recipe(design) {
      if (from === to) return refuse(`${from} cannot be connected to itself.`);
      for (const key of [from, to]) if (!hasPin(design, key)) return refuse(`There is no pin ${key}.`);
      const netA = design.nets.find((n) => n.pins.includes(from));
      const netB = design.nets.find((n) => n.pins.includes(to));
      const pair: Pair = [from, to];
      if (netA !== undefined && netA === netB) {
        return refuse(`${from} and ${to} are already on net ${netA.label ?? netA.id}.`);
      }
      if (netA !== undefined && netB !== undefined) {
        mergeInto(design, netA, current(netB), pair);
        design.nets.splice(design.nets.indexOf(netB), 1);
      } else if (netA !== undefined || netB !== undefined) {
        const net = (netA ?? netB)!;
        const wires = netWires(net);
        net.route = [...wires.map(([a, b]): [string, string] => [a, b]), [from, to]];
        net.pins.push(netA === undefined ? from : to);
      } else {
        const id = freshId(
          'N',
          design.nets.map((n) => n.id),
        );
        design.nets.push({ id, pins: [from, to], route: [[from, to]] });
      }
    },
  };
}
