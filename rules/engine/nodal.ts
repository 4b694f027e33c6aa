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
 *
 * Solved for every corner and tolerance case of every path, so it is written with plain loops
 * and number arrays (no closures or pairs per link); the arithmetic is done in the same order as
 * ever, so the volts come out to the same bits.
 */
export function solve(net: Network): (number | undefined)[] {
  const { n, fixed, links, ties, inject } = net;
  // A number that is not finite (a resistance of NaN Ω, an infinite rail) decides nothing: every
  // node comes out NaN, so that the rules report the path as undecidable rather than skip it.
  if (hasBadNumber(net)) return new Array<number>(n).fill(Number.NaN);
  // Which free nodes are anchored: reached from a fixed node or a tie through conductances.
  const anchored = new Uint8Array(n);
  const queue: number[] = [];
  for (let k = 0; k < n; k++)
    if (fixed[k] !== undefined) {
      anchored[k] = 1;
      queue.push(k);
    }
  for (let t = 0; t < ties.length; t++) {
    const tie = ties[t]!;
    if (tie.g > 0 && anchored[tie.a] === 0) {
      anchored[tie.a] = 1;
      queue.push(tie.a);
    }
  }
  while (queue.length > 0) {
    const k = queue.pop()!;
    for (let l = 0; l < links.length; l++) {
      const link = links[l]!;
      if (!(link.g > 0)) continue;
      const j = link.a === k ? link.b : link.b === k ? link.a : -1;
      if (j >= 0 && anchored[j] === 0) {
        anchored[j] = 1;
        queue.push(j);
      }
    }
  }

  const slot = new Int32Array(n).fill(-1);
  let m = 0;
  for (let k = 0; k < n; k++) if (fixed[k] === undefined && anchored[k] === 1) slot[k] = m++;
  const G: Float64Array[] = [];
  for (let r = 0; r < m; r++) G.push(new Float64Array(m + 1));
  for (let k = 0; k < n; k++) if (slot[k]! >= 0) G[slot[k]!]![m] = inject[k] ?? 0;
  for (let l = 0; l < links.length; l++) {
    const link = links[l]!;
    if (!(link.g > 0)) continue;
    stamp(G, m, slot, fixed, link.a, link.b, link.g);
    stamp(G, m, slot, fixed, link.b, link.a, link.g);
  }
  for (let t = 0; t < ties.length; t++) {
    const tie = ties[t]!;
    const s = slot[tie.a]!;
    if (s < 0 || !(tie.g > 0)) continue;
    const row = G[s]!;
    row[s] = row[s]! + tie.g;
    row[m] = row[m]! + tie.g * tie.v;
  }
  const x = gauss(G, m);
  const out: (number | undefined)[] = new Array(n).fill(undefined);
  for (let k = 0; k < n; k++) {
    if (fixed[k] !== undefined) out[k] = fixed[k];
    else if (slot[k]! >= 0) out[k] = x[slot[k]!];
  }
  return out;
}

/** A link's conductance `g` from node `x` to node `y`, in the row of `x` when `x` is free. */
function stamp(
  G: Float64Array[],
  m: number,
  slot: Int32Array,
  fixed: readonly (number | undefined)[],
  x: number,
  y: number,
  g: number,
): void {
  const sx = slot[x]!;
  if (sx < 0) return;
  const row = G[sx]!;
  row[sx] = row[sx]! + g;
  const fy = fixed[y];
  const sy = slot[y]!;
  if (fy !== undefined) row[m] = row[m]! + g * fy;
  else if (sy >= 0) row[sy] = row[sy]! - g;
}

const bad = (x: number | undefined): boolean => x !== undefined && !Number.isFinite(x);

function hasBadNumber({ fixed, links, ties, inject }: Network): boolean {
  for (let k = 0; k < links.length; k++) if (bad(links[k]!.g)) return true;
  for (let k = 0; k < ties.length; k++) if (bad(ties[k]!.g) || bad(ties[k]!.v)) return true;
  for (let k = 0; k < fixed.length; k++) if (bad(fixed[k])) return true;
  for (let k = 0; k < inject.length; k++) if (bad(inject[k])) return true;
  return false;
}

/** Solves the augmented m × (m + 1) system in place; a singular system gives NaN (never a guess). */
function gauss(A: Float64Array[], m: number): number[] {
  for (let c = 0; c < m; c++) {
    let p = c;
    for (let r = c + 1; r < m; r++) if (Math.abs(A[r]![c]!) > Math.abs(A[p]![c]!)) p = r;
    if (!(Math.abs(A[p]![c]!) > 0)) return new Array<number>(m).fill(Number.NaN);
    if (p !== c) {
      const swap = A[p]!;
      A[p] = A[c]!;
      A[c] = swap;
    }
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
