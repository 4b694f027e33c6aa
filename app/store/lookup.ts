import type { Part } from '../../rules/model/index.ts';

const byId = new WeakMap<readonly Part[], ReadonlyMap<string, Part>>();

/**
 * The part with this designator, in O(1): the index is built once per parts array (immer gives
 * a new array only when a part changes), so that a thousand chips each reading their own part
 * on every store change cost a thousand map lookups, not a million comparisons.
 */
export function partById(parts: readonly Part[], id: string): Part | undefined {
  let map = byId.get(parts);
  if (map === undefined) {
    map = new Map(parts.map((p) => [p.id, p]));
    byId.set(parts, map);
  }
  return map.get(id);
}
