/**
 * A net as it is drawn: a set of wires (pin pairs) joining all its pins, the same on the canvas
 * and in the report's diagram.
 *
 * The wires are the net's `route` pairs when it has them. Pins the route leaves apart (a file
 * written by hand or by another tool may give no route, or a partial one) are joined by a chain
 * in the net's pin order: for a net with no route, pins[0]–pins[1], pins[1]–pins[2], … A chain
 * rather than a star, because it keeps every wire short when the pins are listed along the
 * board, and a star from one pin would pile n−1 wires on one handle.
 */
import type { Net } from './schema.ts';

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

/** Whether a pair joins `a` and `b`, in either order. */
export function samePair(p: Pair, a: string, b: string): boolean {
  return (p[0] === a && p[1] === b) || (p[0] === b && p[1] === a);
}

/** The wires drawn for a net (see the module comment), made afresh on each call. */
export function netWires(net: Net): Pair[] {
  const onNet = new Set(net.pins);
  const comps = new Components(net.pins);
  const seen = new Set<string>();
  const wires: Pair[] = [];
  for (const [a, b] of net.route ?? []) {
    if (a === b || !onNet.has(a) || !onNet.has(b)) continue;
    const key = a < b ? `${a}\u0000${b}` : `${b}\u0000${a}`;
    if (seen.has(key)) continue;
    seen.add(key);
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
  return wires;
}
