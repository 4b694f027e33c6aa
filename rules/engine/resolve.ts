/**
 * Effective pin parameters, resolved key by key: the pin's `params`, then the part's, then the
 * pin's profile (or the part's). Lists and objects are taken whole, never merged.
 * Results are cached by the identity of the objects they came from, outside the document.
 */
import type { Design, Params, Part, Pin, Profile } from '../model/schema.ts';
import { builtinProfile } from '../profiles/index.ts';
import type { ParamOrigin, ResolvedPin } from './types.ts';

const PARAM_KEYS: readonly (keyof Params)[] = [
  'vih', 'vil', 'schmitt', 'iih', 'iil', 'cin', 'viMax', 'unpoweredSafe', 'viMaxOff',
  'voh', 'vol', 'ioMax', 'maxInputRamp', 'vddRange',
];

const localProfileMaps = new WeakMap<readonly Profile[], ReadonlyMap<string, Profile>>();

/** The profile an id names in this design: a design-local one shadows a built-in one. */
export function lookupProfile(design: Design, id: string): Profile | undefined {
  const local = design.profiles;
  if (local !== undefined && local.length > 0) {
    let map = localProfileMaps.get(local);
    if (map === undefined) {
      map = new Map(local.map((p) => [p.id, p]));
      localProfileMaps.set(local, map);
    }
    const hit = map.get(id);
    if (hit !== undefined) return hit;
  }
  return builtinProfile(id);
}

interface CacheEntry {
  readonly partId: string;
  readonly partRail: string;
  readonly partParams: Params | undefined;
  readonly profile: Profile | undefined;
  readonly resolved: ResolvedPin;
}

const cache = new WeakMap<Pin, CacheEntry>();

/**
 * The pin with its effective parameters. Cached while the pin, the part's id, rail and params and
 * the profile are unchanged: a part that only moved keeps its pins' resolution.
 */
export function resolvePin(design: Design, part: Part, pin: Pin): ResolvedPin {
  const profileId = pin.profile ?? part.profile;
  const profile = lookupProfile(design, profileId);
  const hit = cache.get(pin);
  if (
    hit !== undefined && hit.profile === profile && hit.partId === part.id && hit.partRail === part.rail &&
    hit.partParams === part.params
  ) {
    return hit.resolved;
  }

  const params: Record<string, unknown> = {};
  const origin: Partial<Record<keyof Params, ParamOrigin>> = {};
  for (const key of PARAM_KEYS) {
    if (pin.params?.[key] !== undefined) {
      params[key] = pin.params[key];
      origin[key] = 'pin';
    } else if (part.params?.[key] !== undefined) {
      params[key] = part.params[key];
      origin[key] = 'part';
    } else if (profile?.params[key] !== undefined) {
      params[key] = profile.params[key];
      origin[key] = 'profile';
    }
  }
  const drive =
    pin.role === 'input' ? undefined : (pin.drive ?? (pin.role === 'bidir' ? 'three-state' : 'push-pull'));
  const resolved: ResolvedPin = {
    key: `${part.id}.${pin.id}`,
    partId: part.id,
    pin,
    role: pin.role,
    drive,
    rail: pin.rail ?? part.rail,
    profileId,
    profile,
    params: params as Params,
    origin,
    pull: pin.pull,
  };
  cache.set(pin, { partId: part.id, partRail: part.rail, partParams: part.params, profile, resolved });
  return resolved;
}

/** The VIH a receiver is judged by: `schmitt.vtPlus` for a Schmitt input, else `vih`. */
export function highThreshold(p: ResolvedPin) {
  return p.params.schmitt?.vtPlus ?? p.params.vih;
}

/** The VIL a receiver is judged by: `schmitt.vtMinus` for a Schmitt input, else `vil`. */
export function lowThreshold(p: ResolvedPin) {
  return p.params.schmitt?.vtMinus ?? p.params.vil;
}
