/**
 * Design-local profiles: made from a built-in one, then edited. Each must say where its
 * numbers come from (`source`, design-format.md "Profile"), so that a report can print it.
 */
import type { Draft } from 'immer';
import { ParamsSchema, ProfileSchema, type Design, type Params, type Profile } from '../../../rules/model/index.ts';
import { builtinProfile } from '../../../rules/profiles/index.ts';
import { refuse, type Command } from './command.ts';
import { withParam, type ParamKey } from '../paramFields.ts';

function findProfile(design: Draft<Design>, id: string) {
  return design.profiles?.find((p) => p.id === id);
}

/** The first of `base-local`, `base-local2`, … that no design-local profile uses. */
export function localProfileId(design: Design, base: string): string {
  const taken = new Set((design.profiles ?? []).map((p) => p.id));
  for (let k = 1; ; k++) {
    const id = `${base}-local${k === 1 ? '' : k}`;
    if (!taken.has(id)) return id;
  }
}

/**
 * A design-local copy of built-in profile `base` with id `id`, its parameters to be edited.
 * Refused without a source: an edited profile's numbers must say where they come from.
 */
export function addProfile(base: string, id: string, label: string, source: string): Command {
  return {
    name: `Add profile ${id}`,
    recipe(design) {
      const from = builtinProfile(base);
      if (from === undefined) return refuse(`There is no built-in profile ${base}.`);
      if (source.trim() === '')
        return refuse('Say where the numbers come from (a datasheet table, a measurement, "from memory").');
      if (design.profiles?.some((p) => p.id === id)) return refuse(`This design already has a profile ${id}.`);
      const profile: Profile = {
        id,
        label: label.trim() === '' ? `${from.label} (this design)` : label.trim(),
        source: source.trim(),
        params: structuredClone(from.params),
      };
      const read = ProfileSchema.safeParse(profile);
      if (!read.success) return refuse(`${read.error.issues[0]!.path.join(' ')}: ${read.error.issues[0]!.message}.`);
      if (design.profiles === undefined) design.profiles = [profile];
      else design.profiles.push(profile);
    },
  };
}

export function setProfileLabel(id: string, label: string): Command {
  return {
    name: `Rename profile ${id}`,
    recipe(design) {
      const p = findProfile(design, id);
      if (p === undefined) return refuse(`There is no design-local profile ${id}.`);
      p.label = label;
    },
  };
}

export function setProfileSource(id: string, source: string): Command {
  return {
    name: `Set the source of profile ${id}`,
    recipe(design) {
      const p = findProfile(design, id);
      if (p === undefined) return refuse(`There is no design-local profile ${id}.`);
      if (source.trim() === '') return refuse('A profile needs a source: where its numbers come from.');
      p.source = source.trim();
    },
  };
}

/** Set one parameter of a design-local profile, or take it away (`undefined`). */
export function setProfileParam(id: string, key: ParamKey, value: unknown): Command {
  return {
    name: `Set ${key} of profile ${id}`,
    recipe(design) {
      const p = findProfile(design, id);
      if (p === undefined) return refuse(`There is no design-local profile ${id}.`);
      const params: Params = withParam(p.params as Params, key, value) ?? {};
      const read = ParamsSchema.safeParse(params);
      if (!read.success) return refuse(`${key}: ${read.error.issues[0]!.message}.`);
      if (value === undefined) delete p.params[key];
      else (p.params as Record<string, unknown>)[key] = structuredClone(value);
    },
  };
}

/** Delete a design-local profile that no part or pin names. */
export function deleteProfile(id: string): Command {
  return {
    name: `Delete profile ${id}`,
    recipe(design) {
      if (findProfile(design, id) === undefined) return refuse(`There is no design-local profile ${id}.`);
      // A built-in profile of the same id would take over silently: say so rather than switch families.
      const user = design.parts.find((p) => p.profile === id || p.pins.some((q) => q.profile === id));
      if (user !== undefined) return refuse(`Profile ${id} is still used by ${user.id}.`);
      design.profiles = design.profiles!.filter((p) => p.id !== id);
      if (design.profiles.length === 0) delete design.profiles;
    },
  };
}
