/**
 * Text typed in a field and not yet committed (fields commit on Enter or on leaving them).
 * A page that is hidden or closed commits it first, so that what was typed is saved with the
 * rest; while any is held, leaving the page asks first.
 */
const held = new Set<() => void>();

/** Hold a field's commit while it has a draft; returns the release. */
export function holdDraft(commit: () => void): () => void {
  held.add(commit);
  return () => held.delete(commit);
}

export function hasDrafts(): boolean {
  return held.size > 0;
}

/** Commit every held draft (each field's own rules: a refused value stays in its field). */
export function commitDrafts(): void {
  for (const commit of [...held]) commit();
}
