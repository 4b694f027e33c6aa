/**
 * The built-in logic-family library and profile lookup. Every number of the library names its
 * source beside it in the family modules; each profile's `source` is printed in reports.
 */
import type { Profile } from '../model/schema.ts';
import { BUILTIN_PROFILE_IDS } from '../model/profileIds.ts';
import { BUILTIN_PROFILES } from './builtins.ts';

export { BUILTIN_PROFILES, BUILTIN_PROFILE_IDS };

const byId: ReadonlyMap<string, Profile> = new Map(BUILTIN_PROFILES.map((p) => [p.id, p]));

/** The built-in profile with this id, or undefined. */
export function builtinProfile(id: string): Profile | undefined {
  return byId.get(id);
}

/**
 * The profile a part or pin names: a design-local profile (`design.profiles`) shadows a
 * built-in one of the same id. Undefined when neither exists. Takes a `Design` or any object
 * with its `profiles`.
 */
export function resolveProfile(
  design: { readonly profiles?: readonly Profile[] | undefined },
  id: string,
): Profile | undefined {
  // A design holds few local profiles (a handful): a scan costs less than keeping an index of
  // them in step with edits, and reads an editor's draft as it is now.
  return design.profiles?.find((p) => p.id === id) ?? byId.get(id);
}
