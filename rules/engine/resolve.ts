/**
 * Effective pin parameters, resolved key by key: the pin's `params`, then the part's, then the
 * pin's profile (or the part's). Lists and objects are taken whole, never merged.
 * Results are cached by the identity of the objects they came from, outside the document.
 */
import { PARAM_KEYS, type Design, type Params, type Part, type Pin, type Profile } from '../model/schema.ts';
import { resolveProfile } from '../profiles/index.ts';
import { driveOf, profileIdOf, railOf } from '../model/pinDefaults.ts';
import type { ParamOrigin, PinView, ResolvedPin } from './types.ts';

/**
 * A pin's resolution and its views in the two power conditions, made once each. The engine's
 * index keeps it per pin, so that preparing a net reaches a pin's view without a cache lookup.
 */
export interface Resolution {
  /** The resolved pin, which is also its view when powered. */
  readonly resolved: PinView;
  /** The resolved pin as seen unpowered, made when first asked for. */
  unpowered: PinView | undefined;
}

interface CacheEntry extends Resolution {
  readonly partId: string;
  readonly partRail: string;
  readonly partParams: Params | undefined;
  readonly profileId: string;
  /** The design's local profiles when this was resolved: unchanged, the lookup gives the same profile. */
  readonly localProfiles: readonly Profile[] | undefined;
  readonly profile: Profile | undefined;
}

const cache = new WeakMap<Pin, CacheEntry>();

/**
 * The pin with its effective parameters. Cached while the pin, the part's id, rail and params and
 * the profile are unchanged: a part that only moved keeps its pins' resolution.
 */
export function resolvePin(design: Design, part: Part, pin: Pin): ResolvedPin {
  return entryOf(design, part, pin).resolved;
}

/** The pin's resolution, cached as `resolvePin`'s is. */
export function resolution(design: Design, part: Part, pin: Pin): Resolution {
  return entryOf(design, part, pin);
}

/** A resolution's view in a power state, powered or not: made once, then the same object while nothing it depends on changes. */
export function viewOf(entry: Resolution, powered: boolean): PinView {
  // The resolved pin is its own powered view (made with `powered: true`): one object per pin
  // where most pins of a board are powered in every state.
  if (powered) return entry.resolved;
  let view = entry.unpowered;
  if (view === undefined) {
    // A literal of the resolved pin's own shape: every view shares a hidden class, which keeps
    // the hot loops over pins monomorphic (an object spread does not).
    const r = entry.resolved;
    view = {
      key: r.key,
      partId: r.partId,
      pin: r.pin,
      role: r.role,
      drive: r.drive,
      rail: r.rail,
      profileId: r.profileId,
      profile: r.profile,
      params: r.params,
      origin: r.origin,
      pull: r.pull,
      powered: false,
    };
    entry.unpowered = view;
  }
  return view;
}

const NO_PARAMS: Params = Object.freeze({});
const NO_ORIGIN: Partial<Record<keyof Params, ParamOrigin>> = Object.freeze({});
const profileOrigins = new WeakMap<Profile, Partial<Record<keyof Params, ParamOrigin>>>();

function profileOrigin(profile: Profile): Partial<Record<keyof Params, ParamOrigin>> {
  let origin = profileOrigins.get(profile);
  if (origin === undefined) {
    origin = {};
    for (const key of PARAM_KEYS) if (profile.params[key] !== undefined) origin[key] = 'profile';
    profileOrigins.set(profile, Object.freeze(origin));
  }
  return origin;
}

/** Each key from the first of pin, part and profile that has it; lists and objects whole. */
function mergeParams(pin: Params | undefined, part: Params | undefined, profile: Params | undefined) {
  const params: Record<string, unknown> = {};
  const origin: Partial<Record<keyof Params, ParamOrigin>> = {};
  for (const key of PARAM_KEYS) {
    if (pin?.[key] !== undefined) {
      params[key] = pin[key];
      origin[key] = 'pin';
    } else if (part?.[key] !== undefined) {
      params[key] = part[key];
      origin[key] = 'part';
    } else if (profile?.[key] !== undefined) {
      params[key] = profile[key];
      origin[key] = 'profile';
    }
  }
  return { params, origin };
}

function entryOf(design: Design, part: Part, pin: Pin): CacheEntry {
  const profileId = profileIdOf(part, pin);
  const hit = cache.get(pin);
  if (
    hit !== undefined &&
    hit.partId === part.id &&
    hit.partRail === part.rail &&
    hit.partParams === part.params &&
    hit.profileId === profileId
  ) {
    // The built-in library never changes: with the same local profiles the lookup is the same.
    if (hit.localProfiles === design.profiles) return hit;
    if (hit.profile === resolveProfile(design, profileId)) return hit;
  }
  const entry = makeEntry(design, part, pin, profileId);
  cache.set(pin, entry);
  return entry;
}

/**
 * A pin resolved afresh, not cached: the engine's index keeps each pin's own (its entry is the
 * pin's `Resolution`) and makes it again when the pin, its part or its profile changes, so a
 * cache there would only cost (a weak map of every pin, which the garbage collector walks).
 */
export function makeResolved(design: Design, part: Part, pin: Pin): PinView {
  const profileId = profileIdOf(part, pin);
  return resolvedPin(part, pin, profileId, resolveProfile(design, profileId));
}

function makeEntry(design: Design, part: Part, pin: Pin, profileId: string): CacheEntry {
  const profile = resolveProfile(design, profileId);
  return {
    unpowered: undefined,
    partId: part.id,
    partRail: part.rail,
    partParams: part.params,
    profileId,
    localProfiles: design.profiles,
    profile,
    resolved: resolvedPin(part, pin, profileId, profile),
  };
}

function resolvedPin(part: Part, pin: Pin, profileId: string, profile: Profile | undefined): PinView {
  let params: Record<string, unknown>;
  let origin: Partial<Record<keyof Params, ParamOrigin>>;
  if (pin.params === undefined && part.params === undefined) {
    // Most pins take their family's numbers as they are: share the profile's own objects.
    params = (profile?.params ?? NO_PARAMS) as Record<string, unknown>;
    origin = profile === undefined ? NO_ORIGIN : profileOrigin(profile);
  } else {
    ({ params, origin } = mergeParams(pin.params, part.params, profile?.params));
  }
  return {
    key: `${part.id}.${pin.id}`,
    partId: part.id,
    pin,
    role: pin.role,
    drive: driveOf(pin),
    rail: railOf(part, pin),
    profileId,
    profile,
    params: params as Params,
    origin,
    pull: pin.pull,
    powered: true,
  };
}

/** The VIH a receiver is judged by: `schmitt.vtPlus` for a Schmitt input, else `vih`. */
export function highThreshold(p: ResolvedPin) {
  return p.params.schmitt?.vtPlus ?? p.params.vih;
}

/** The VIL a receiver is judged by: `schmitt.vtMinus` for a Schmitt input, else `vil`. */
export function lowThreshold(p: ResolvedPin) {
  return p.params.schmitt?.vtMinus ?? p.params.vil;
}
