/**
 * A net as the editor draws it: the wires of rules/model/wiring.ts (the report's diagram draws
 * the same), cached per net object here, where an edit re-reads them on every frame.
 */
import { isDraft } from 'immer';
import { Components, netWires as wiresOf, type Pair } from '../../../rules/model/index.ts';

export { Components, samePair, type Pair } from '../../../rules/model/index.ts';

const cache = new WeakMap<object, readonly Pair[]>();

/** The wires drawn for a net, cached per net object; an immer draft is read afresh, since it changes in place. */
export function netWires(net: Parameters<typeof wiresOf>[0]): readonly Pair[] {
  const cacheable = !isDraft(net);
  const hit = cacheable ? cache.get(net) : undefined;
  if (hit !== undefined) return hit;
  const wires = wiresOf(net);
  if (cacheable) cache.set(net, wires);
  return wires;
}

/** The groups of pins the wires join, largest first; ties keep the net's pin order. */
export function wireGroups(pins: readonly string[], wires: readonly Pair[]): string[][] {
  const comps = new Components(pins);
  for (const [a, b] of wires) comps.union(a, b);
  // Array.prototype.sort is stable: equal sizes keep the order of their first pins.
  return comps.groups(pins).sort((x, y) => y.length - x.length);
}

/** The id of the wire `a`–`b` of net `net`: net and pin ids never contain ":" (design-format.md). */
export function wireId(net: string, a: string, b: string): string {
  return `${net}:${a}:${b}`;
}

/** The net and pins of a wire id, or undefined for anything else. */
export function parseWireId(id: string): { net: string; a: string; b: string } | undefined {
  const parts = id.split(':');
  if (parts.length !== 3 || parts.some((p) => p === '')) return undefined;
  return { net: parts[0]!, a: parts[1]!, b: parts[2]! };
}
