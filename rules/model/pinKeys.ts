/**
 * Pin keys: a net names its pins `PART.PIN` (design-format.md). Part ids contain no `.`, so the
 * first dot splits a key; a pin id may contain dots. Every reader of a key, in the engine, the
 * report and the editor, goes through here.
 */

/** `PART.PIN` of a part id and a pin id. */
export function pinKey(part: string, pin: string): string {
  return `${part}.${pin}`;
}

/** A key split at its first dot; a key with no dot is all part (`pin` empty). */
export function splitPinKey(key: string): { part: string; pin: string } {
  const dot = key.indexOf('.');
  return dot < 0 ? { part: key, pin: '' } : { part: key.slice(0, dot), pin: key.slice(dot + 1) };
}

/** The part id of a pin key. */
export function partOfPin(key: string): string {
  const dot = key.indexOf('.');
  return dot < 0 ? key : key.slice(0, dot);
}

/** The distinct part ids of some pin keys, in order of first appearance. */
export function partsOfPins(...keys: readonly string[]): string[] {
  // A Set keeps first-appearance order; a rail-range finding may list thousands of pins.
  const out = new Set<string>();
  for (const k of keys) out.add(partOfPin(k));
  return [...out];
}
