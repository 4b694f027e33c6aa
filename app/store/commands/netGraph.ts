/**
 * A net as the editor draws it: a set of wires (pin pairs) joining all its pins.
 *
 * The wires are the net's `route` pairs when it has them. Pins the route leaves apart (a file
 * written by hand or by another tool may give no route, or a partial one) are joined by a
 * chain in the net's pin order: for a net with no route, pins[0]–pins[1], pins[1]–pins[2], …
 * A chain rather than a star, because it keeps every wire short when the pins are listed
 * along the board, and a star from one pin would pile n−1 wires on one handle.
 */
import { isDraft } from 'immer';
import type { Net } from '../../../rules/model/schema.ts';

export type Pair = readonly [string, string];

/** Union-find over string keys. */
export class Components {
  private readonly parent = new Map<string, string>();

  constructor(keys: Iterable<string>) {
    for (const k of keys) this.parent.set(k, k);
  }

  find(k: string): string {
    let root = k;
    while (this.parent.get(root) !== root && this.parent.has(root)) root = this.parent.get(root)!;
    // Path compression keeps long chains cheap.
    let cur = k;
    while (cur !== root) {
      const next = this.parent.get(cur)!;
      this.parent.set(cur, root);
      cur = next;
    }
    return root;
  }

  union(a: string, b: string): boolean {
    const ra = this.find(a);
    const rb = this.find(b);
    if (ra === rb) return false;
    this.parent.set(rb, ra);
    return true;
  }

  /** The groups, each in the order of `order`, groups ordered by their first member. */
  groups(order: readonly string[]): string[][] {
    const byRoot = new Map<string, string[]>();
    for (const k of order) {
      const r = this.find(k);
      const g = byRoot.get(r);
      if (g === undefined) byRoot.set(r, [k]);
      else g.push(k);
    }
    return [...byRoot.values()];
  }
}

export function samePair(p: Pair, a: string, b: string): boolean {
  return (p[0] === a && p[1] === b) || (p[0] === b && p[1] === a);
}

const cache = new WeakMap<Net, readonly Pair[]>();

/**
 * The wires drawn for a net (see the module comment). Cached per net object; an immer draft
 * is read afresh, since it changes in place.
 */
export function netWires(net: Net): readonly Pair[] {
  const cacheable = !isDraft(net);
  const hit = cacheable ? cache.get(net) : undefined;
  if (hit !== undefined) return hit;
  const onNet = new Set(net.pins);
  const comps = new Components(net.pins);
  const wires: Pair[] = [];
  for (const [a, b] of net.route ?? []) {
    if (a === b || !onNet.has(a) || !onNet.has(b)) continue;
    if (wires.some((w) => samePair(w, a, b))) continue;
    wires.push([a, b]);
    comps.union(a, b);
  }
  const first = net.pins[0];
  for (let k = 1; k < net.pins.length; k++) {
    const p = net.pins[k]!;
    // Every earlier pin is already joined to the first one, so the previous pin is a safe end.
    if (first !== undefined && comps.find(p) !== comps.find(first)) {
      wires.push([net.pins[k - 1]!, p]);
      comps.union(first, p);
    }
  }
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
