import type { Design, Params } from '../../../rules/model/index.ts';
import { resolveProfile } from '../../../rules/profiles/index.ts';
import { formatParam, type ParamKey } from '../../store/paramFields.ts';
import type { Fallback } from '../ParamEditor.tsx';

/**
 * What a pin gets for `key` without its own override: the part's override, else its profile's
 * value (design-format.md, "Params": each key from the first that has it).
 */
export function inheritedParam(
  design: Design,
  partParams: Params | undefined,
  profileId: string,
  key: ParamKey,
): Fallback | undefined {
  const fromPart = partParams?.[key];
  if (fromPart !== undefined) return { text: formatParam(key, fromPart), from: 'part override' };
  return profileParam(design, profileId, key);
}

/** The profile's value for `key`, named by the profile. */
export function profileParam(design: Design, profileId: string, key: ParamKey): Fallback | undefined {
  const profile = resolveProfile(design, profileId);
  const value = profile?.params[key];
  return value === undefined ? undefined : { text: formatParam(key, value), from: `profile ${profile!.label}` };
}
