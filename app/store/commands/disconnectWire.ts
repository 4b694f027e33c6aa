import type { Draft } from 'immer';
import type { Design, Net } from '../../../rules/model/index.ts';
import { freshId, refuse, type Command, type Refusal } from './command.ts';
import { netWires, samePair, wireGroups, type Pair } from './netGraph.ts';

function routeOf(wires: readonly Pair[], pins: readonly string[]): [string, string][] {
  const on = new Set(pins);
  return wires.filter(([a, b]) => on.has(a) && on.has(b)).map(([a, b]) => [a, b]);
}

/**
 * Split `net` into the groups `wires` join. The largest group keeps the net (id, label, pull,
 * wiring capacitance, waivers); each other group of two or more pins becomes a new net with a
 * fresh id and no waivers, keeping only the rise-time limit (a property of the signal, not of
 * one wire run). A pin left alone leaves the net: a net the editor cannot draw is no net.
 */
export function regroupNet(design: Draft<Design>, net: Draft<Net>, wires: readonly Pair[]): void {
  const groups = wireGroups(net.pins, wires);
  const [keep, ...rest] = groups;
  const at = design.nets.indexOf(net);
  if (keep === undefined || keep.length < 2) {
    design.nets.splice(at, 1);
    return;
  }
  net.pins = keep;
  const route = routeOf(wires, keep);
  if (route.length > 0) net.route = route;
  else delete net.route;
  const added: Net[] = [];
  for (const group of rest) {
    if (group.length < 2) continue;
    const id = freshId('N', [...design.nets.map((n) => n.id), ...added.map((n) => n.id)]);
    added.push({
      id,
      pins: group,
      route: routeOf(wires, group),
      ...(net.maxRiseTime === undefined ? {} : { maxRiseTime: net.maxRiseTime }),
    });
  }
  design.nets.splice(at + 1, 0, ...added);
}

/** Remove the wire between `a` and `b` from whatever net holds it, splitting that net if it falls apart. */
export function removeWire(design: Draft<Design>, a: string, b: string): Refusal | undefined {
  const net = design.nets.find((n) => n.pins.includes(a) && n.pins.includes(b));
  const wires = net === undefined ? [] : netWires(net);
  if (net === undefined || !wires.some((w) => samePair(w, a, b))) return refuse(`No wire joins ${a} and ${b}.`);
  regroupNet(
    design,
    net,
    wires.filter((w) => !samePair(w, a, b)),
  );
}

/** Delete the wire between pins `a` and `b` (see `regroupNet` for how a net splits). */
export function disconnectWire(a: string, b: string): Command {
  return { name: `Disconnect ${a} from ${b}`, recipe: (design) => removeWire(design, a, b) };
}
