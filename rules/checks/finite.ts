/** Whether every number given is finite: a check that meets one that is not must report it (the engine makes it undecidable). */
export function allFinite(...xs: readonly number[]): boolean {
  for (const x of xs) if (!Number.isFinite(x)) return false;
  return true;
}
