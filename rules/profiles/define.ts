import type { Profile } from '../model/schema.ts';

/** Freeze a value and everything reachable from it, so that shared library data cannot be edited in place. */
export function deepFreeze<T>(value: T): T {
  if (value !== null && typeof value === 'object' && !Object.isFrozen(value)) {
    Object.freeze(value);
    for (const key of Object.keys(value)) deepFreeze((value as Record<string, unknown>)[key]);
  }
  return value;
}

/**
 * Declare a built-in profile. The library is shared by every design and every check, so the
 * profile is deep-frozen here, where it is made, whichever module imports it first.
 */
export function defineProfile(profile: Profile): Profile {
  return deepFreeze(profile);
}
