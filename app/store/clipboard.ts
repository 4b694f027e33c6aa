/**
 * Copy and paste of parts with the nets among them. A copy keeps the parts and, of each net,
 * the pins on copied parts when there are two or more of them (the wires between those kept
 * as drawn); a connection to a part left out is not copied. A paste gives every part a fresh
 * designator of the same letters and every net a fresh id, and lands the copies together on
 * the nearest spot where they cover no chip and no part between chips.
 */
import type { Design, Net, Part } from '../../rules/model/index.ts';
import { freshId, splitPinKey } from './commands/command.ts';
import { netWires } from './commands/netGraph.ts';
import { bodiesOf, nearestFreeOffset, partRect } from '../canvas/freeSpot.ts';

export interface Clip {
  readonly parts: readonly Part[];
  readonly nets: readonly Net[];
}

/** The parts `ids` of `design` and the nets among them, or undefined when none of them exists. */
export function copyParts(design: Design, ids: readonly string[]): Clip | undefined {
  const chosen = new Set(ids);
  // A pin's waivers judged that part's unused input: like a net's, they do not go with a copy.
  const parts = design.parts
    .filter((p) => chosen.has(p.id))
    .map((p) => structuredClone({ ...p, pins: p.pins.map(({ waivers: _w, ...pin }) => pin) }));
  if (parts.length === 0) return undefined;
  const inside = (key: string) => chosen.has(splitPinKey(key).part);
  const nets: Net[] = [];
  for (const net of design.nets) {
    const pins = net.pins.filter(inside);
    if (pins.length < 2) continue;
    // A net drawn in its pin order stays so when it is copied whole; otherwise the wires kept are the ones drawn.
    const whole = pins.length === net.pins.length && net.route === undefined;
    const route = whole
      ? []
      : netWires(net)
          .filter(([a, b]) => inside(a) && inside(b))
          .map(([a, b]): [string, string] => [a, b]);
    // A net's label names a signal of the board and its waivers judged that net: neither goes with a copy.
    nets.push({
      id: net.id,
      pins,
      ...(route.length > 0 ? { route } : {}),
      ...(net.pull === undefined ? {} : { pull: { ...net.pull } }),
      ...(net.wiringCapacitance === undefined ? {} : { wiringCapacitance: net.wiringCapacitance }),
      ...(net.maxRiseTime === undefined ? {} : { maxRiseTime: net.maxRiseTime }),
    });
  }
  return { parts, nets };
}

/** The letters of a designator before its number: `U` of `U12`, `J` of `J3`; `U` when nothing is left. */
export function designatorPrefix(id: string): string {
  const letters = id.replace(/\d+$/, '');
  return letters === '' ? 'U' : letters;
}

/**
 * The clip as it would land in `design`: fresh designators and net ids, moved by `offset`, then
 * as a whole by the shortest step that keeps every copy clear of every body already placed.
 */
export function planPaste(
  design: Design,
  clip: Clip,
  offset: { x: number; y: number },
): { parts: Part[]; nets: Net[] } {
  const takenParts = design.parts.map((p) => p.id);
  const renamed = new Map<string, string>();
  for (const p of clip.parts) {
    const id = freshId(designatorPrefix(p.id), takenParts);
    takenParts.push(id);
    renamed.set(p.id, id);
  }
  const key = (k: string) => {
    const { part, pin } = splitPinKey(k);
    return `${renamed.get(part) ?? part}.${pin}`;
  };
  const moved = (p: Part, by: { x: number; y: number }): Part => {
    const at = p.position ?? { x: 0, y: 0 };
    return { ...p, position: { x: Math.round(at.x + by.x), y: Math.round(at.y + by.y) } };
  };
  const asked = clip.parts.map((p) => moved(p, offset));
  const { dx, dy } = nearestFreeOffset(bodiesOf(design), asked.map(partRect));
  const parts = asked.map((p): Part => ({ ...structuredClone(moved(p, { x: dx, y: dy })), id: renamed.get(p.id)! }));
  const takenNets = design.nets.map((n) => n.id);
  const nets = clip.nets.map((n): Net => {
    const id = freshId('N', takenNets);
    takenNets.push(id);
    return {
      ...structuredClone(n),
      id,
      pins: n.pins.map(key),
      ...(n.route === undefined ? {} : { route: n.route.map(([a, b]): [string, string] => [key(a), key(b)]) }),
    };
  });
  return { parts, nets };
}
