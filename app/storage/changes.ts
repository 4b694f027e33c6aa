/**
 * What changed in a revision: the names of the commands applied since the revision before it
 * (every command has a verb-first name, the undo step's), as the revision list shows them.
 */

/** The most entries a revision keeps; the rest are counted in a last entry. */
export const MAX_CHANGES = 60;

/**
 * The names in order, a run of the same name written once with its count (`Move U3 ×4`: a drag
 * and its nudges), at most `MAX_CHANGES` entries, the last then saying how many more there were.
 */
export function summarizeChanges(names: readonly string[]): string[] {
  const runs: { name: string; times: number }[] = [];
  for (const name of names) {
    const last = runs[runs.length - 1];
    if (last !== undefined && last.name === name) last.times++;
    else runs.push({ name, times: 1 });
  }
  const text = runs.map((r) => (r.times === 1 ? r.name : `${r.name} ×${r.times}`));
  if (text.length <= MAX_CHANGES) return text;
  const more = runs.slice(MAX_CHANGES - 1).reduce((n, r) => n + r.times, 0);
  return [...text.slice(0, MAX_CHANGES - 1), `… and ${more} more`];
}

/** A stored list of changes, or undefined for a revision written before they were kept (or a damaged one). */
export function changesOf(value: unknown): readonly string[] | undefined {
  return Array.isArray(value) && value.every((v) => typeof v === 'string') ? value : undefined;
}
