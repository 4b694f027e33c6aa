/** Storage failures in words a user can act on. */

/** Why a write or an open failed, from an IndexedDB or Dexie error. */
export function storageProblem(error: unknown): string {
  const name = error instanceof Error ? error.name : '';
  const inner = (error as { inner?: { name?: unknown } } | null)?.inner?.name;
  const names = `${name} ${typeof inner === 'string' ? inner : ''}`;
  if (/Quota/i.test(names)) return "the browser's storage for this site is full";
  if (/DatabaseClosed|VersionChange/i.test(names)) {
    return 'another tab opened a newer version of Railcross, which closed the database here: reload this page';
  }
  if (/MissingAPI|InvalidState|Security|Unknown/i.test(names)) {
    return 'this browser does not allow this page to store data (a private window may refuse it)';
  }
  const message = error instanceof Error ? error.message : String(error);
  return message === '' ? 'the browser refused to store the design' : message;
}
