/**
 * Rail ranges and the corner enumeration of rules-catalogue.md: a check that involves several
 * rails is evaluated at every combination of their ends, each distinct rail at its min or its
 * max and shared by every pin on it, so that two pins on one rail are never judged at
 * different supply voltages.
 */

/** A rail's tolerance when the file gives none (design-format.md); the schema re-exports it. */
export const DEFAULT_TOLERANCE = 0.05;

/**
 * The fields of a rail that set its range. The level math sits below the design model (the
 * model's schema uses it to parse levels), so it names the fields it reads rather than
 * importing the model's `Rail`, which has them all.
 */
export interface RailFields {
  readonly nominal: number;
  readonly tolerance?: number | undefined;
  readonly min?: number | undefined;
  readonly max?: number | undefined;
}

export interface Range {
  readonly min: number;
  readonly max: number;
}

/** The rail's resolved range: nominal × (1 ± tolerance), an explicit `min`/`max` winning for its end. */
export function railRange(rail: RailFields): Range {
  const tolerance = rail.tolerance ?? DEFAULT_TOLERANCE;
  return {
    min: rail.min ?? rail.nominal * (1 - tolerance),
    max: rail.max ?? rail.nominal * (1 + tolerance),
  };
}

/** One combination of rail ends: the supply voltage of each rail involved. */
export type Corner = ReadonlyMap<string, number>;

/**
 * Every combination of the ends of the given rails (duplicates are taken once). A rail whose
 * range is a single value (an off rail at 0 V, or min = max) contributes one value.
 * `ranges` maps a rail id to its range in the power state being checked.
 */
export function corners(railIds: Iterable<string>, ranges: ReadonlyMap<string, Range>): Corner[] {
  // The same few rail combinations come up on net after net: enumerate each once per ranges map.
  const ids = Array.isArray(railIds) ? (railIds as string[]) : [...railIds];
  const key = ids.join('\u0000');
  let memo = cornerMemo.get(ranges);
  if (memo === undefined) {
    memo = new Map();
    cornerMemo.set(ranges, memo);
  }
  let hit = memo.get(key);
  if (hit === undefined) {
    hit = enumerate(ids, ranges);
    memo.set(key, hit);
  }
  return hit;
}

const cornerMemo = new WeakMap<ReadonlyMap<string, Range>, Map<string, Corner[]>>();

/**
 * `corners([a, b], ranges)` for the two rails of a driver and a receiver, asked for every pair
 * of every net: found by the two ids in nested maps, without joining them into a key.
 */
export function pairCorners(a: string, b: string, ranges: ReadonlyMap<string, Range>): Corner[] {
  let byFirst = pairMemo.get(ranges);
  if (byFirst === undefined) {
    byFirst = new Map();
    pairMemo.set(ranges, byFirst);
  }
  let bySecond = byFirst.get(a);
  if (bySecond === undefined) {
    bySecond = new Map();
    byFirst.set(a, bySecond);
  }
  let hit = bySecond.get(b);
  if (hit === undefined) {
    hit = corners([a, b], ranges);
    bySecond.set(b, hit);
  }
  return hit;
}

const pairMemo = new WeakMap<ReadonlyMap<string, Range>, Map<string, Map<string, Corner[]>>>();

function enumerate(railIds: readonly string[], ranges: ReadonlyMap<string, Range>): Corner[] {
  let result: Map<string, number>[] = [new Map()];
  const seen = new Set<string>();
  for (const id of railIds) {
    if (seen.has(id)) continue;
    seen.add(id);
    const r = ranges.get(id);
    if (r === undefined) continue;
    const ends = r.min === r.max ? [r.min] : [r.min, r.max];
    const next: Map<string, number>[] = [];
    for (const c of result) {
      for (const v of ends) {
        const m = new Map(c);
        m.set(id, v);
        next.push(m);
      }
    }
    result = next;
  }
  return result;
}
