/** Pin keys (`PART.PIN`) and the parts they name. */

/** The part id of a `PART.PIN` key (ids contain no `.`). */
export function partOf(pinKey: string): string {
  const dot = pinKey.indexOf('.');
  return dot < 0 ? pinKey : pinKey.slice(0, dot);
}

/** The distinct part ids of some pin keys, in order of first appearance. */
export function partsOf(...pinKeys: readonly string[]): string[] {
  // A Set keeps first-appearance order; a rail-range finding may list thousands of pins.
  const out = new Set<string>();
  for (const k of pinKeys) out.add(partOf(k));
  return [...out];
}
