/**
 * Nodal analysis of a small resistor network (version 2's signal paths): nodes held at a voltage
 * (a driver's output, a clamp) and free nodes, conductances between nodes and to fixed voltages
 * (pulls to rails), and currents injected into nodes (input currents). Kirchhoff's current law at
 * every free node gives G·v = i, solved by Gaussian elimination with partial pivoting.
 */

export interface Network {
  /** Number of nodes. */
  readonly n: number;
  /** The voltage a node is held at, or undefined for a free node. */
  readonly fixed: readonly (number | undefined)[];
  /** Conductances between two nodes, S. */
  readonly links: readonly { readonly a: number; readonly b: number; readonly g: number }[];
  /** Conductances from a node to a fixed voltage (a pull to a rail or ground), S and V. */
  readonly ties: readonly { readonly a: number; readonly g: number; readonly v: number }[];
  /** Current injected into each node, A (negative: drawn out of it). */
  readonly inject: readonly number[];
}

/**
 * The voltage of every node: a fixed node's own, a free node's from the network, undefined for a
 * free node that no conductance path joins to a fixed voltage (its level is not defined).
 */
export function solve(net: Network): (number | undefined)[] {
  const { n, fixed, links, ties, inject } = net;
  // A number that is not finite (a resistance of NaN Ω, an infinite rail) decides nothing: every
  // node comes out NaN, so that the rules report the path as undecidable rather than skip it.
  const bad = (x: number | undefined) => x !== undefined && !Number.isFinite(x);
  if (links.some((l) => bad(l.g)) || ties.some((t) => bad(t.g) || bad(t.v)) || fixed.some(bad) || inject.some(bad)) {
    return new Array<number>(n).fill(Number.NaN);
  }
  // Which free nodes are anchored: reached from a fixed node or a tie through conductances.
  const anchored = new Array<boolean>(n).fill(false);
  const adjacent: number[][] = Array.from({ length: n }, () => []);
  for (const l of links) {
    if (!(l.g > 0)) continue;
    adjacent[l.a]!.push(l.b);
    adjacent[l.b]!.push(l.a);
  }
  const queue: number[] = [];
  for (let k = 0; k < n; k++)
    if (fixed[k] !== undefined) {
      anchored[k] = true;
      queue.push(k);
    }
  for (const t of ties)
    if (t.g > 0 && !anchored[t.a]) {
      anchored[t.a] = true;
      queue.push(t.a);
    }
  while (queue.length > 0) {
    const k = queue.pop()!;
    for (const j of adjacent[k]!)
      if (!anchored[j]) {
        anchored[j] = true;
        queue.push(j);
      }
  }

  const free: number[] = [];
  const slot = new Array<number>(n).fill(-1);
  for (let k = 0; k < n; k++)
    if (fixed[k] === undefined && anchored[k]) {
      slot[k] = free.length;
      free.push(k);
    }
  const m = free.length;
  const G: number[][] = Array.from({ length: m }, () => new Array<number>(m + 1).fill(0));
  for (const k of free) G[slot[k]!]![m] = inject[k] ?? 0;
  for (const l of links) {
    if (!(l.g > 0)) continue;
    for (const [x, y] of [
      [l.a, l.b],
      [l.b, l.a],
    ] as const) {
      const sx = slot[x]!;
      if (sx < 0) continue;
      const row = G[sx]!;
      row[sx] = row[sx]! + l.g;
      const fy = fixed[y];
      const sy = slot[y]!;
      if (fy !== undefined) row[m] = row[m]! + l.g * fy;
      else if (sy >= 0) row[sy] = row[sy]! - l.g;
    }
  }
  for (const t of ties) {
    const s = slot[t.a]!;
    if (s < 0 || !(t.g > 0)) continue;
    const row = G[s]!;
    row[s] = row[s]! + t.g;
    row[m] = row[m]! + t.g * t.v;
  }
  const x = gauss(G, m);
  const out: (number | undefined)[] = new Array(n).fill(undefined);
  for (let k = 0; k < n; k++) {
    if (fixed[k] !== undefined) out[k] = fixed[k];
    else if (slot[k]! >= 0) out[k] = x[slot[k]!];
  }
  return out;
}

/** Solves the augmented m × (m + 1) system in place; a singular system gives NaN (never a guess). */
function gauss(A: number[][], m: number): number[] {
  for (let c = 0; c < m; c++) {
    let p = c;
    for (let r = c + 1; r < m; r++) if (Math.abs(A[r]![c]!) > Math.abs(A[p]![c]!)) p = r;
    if (!(Math.abs(A[p]![c]!) > 0)) return new Array<number>(m).fill(Number.NaN);
    if (p !== c) [A[p], A[c]] = [A[c]!, A[p]!];
    const row = A[c]!;
    for (let r = c + 1; r < m; r++) {
      const f = A[r]![c]! / row[c]!;
      if (f === 0) continue;
      const target = A[r]!;
      for (let k = c; k <= m; k++) target[k]! -= f * row[k]!;
    }
  }
  const x = new Array<number>(m).fill(0);
  for (let r = m - 1; r >= 0; r--) {
    let s = A[r]![m]!;
    for (let k = r + 1; k < m; k++) s -= A[r]![k]! * x[k]!;
    x[r] = s / A[r]![r]!;
  }
  return x;
}

/**
 * The current that flows out of node `k` into the network's conductances (links and ties), A,
 * with every node at `v`. For a fixed node this is what its source delivers (before the node's own
 * injected current).
 */
export function currentOut(
  net: Network,
  v: readonly (number | undefined)[],
  k: number,
  only?: (linkIndex: number) => boolean,
): number {
  const vk = v[k];
  if (vk === undefined) return 0;
  let i = 0;
  net.links.forEach((l, idx) => {
    if (only !== undefined && !only(idx)) return;
    const other = l.a === k ? l.b : l.b === k ? l.a : -1;
    if (other < 0) return;
    const vo = v[other];
    if (vo !== undefined) i += (vk - vo) * l.g;
  });
  if (only === undefined) for (const t of net.ties) if (t.a === k) i += (vk - t.v) * t.g;
  return i;
}
