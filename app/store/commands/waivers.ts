/**
 * Waivers: a finding the engineer has reviewed and accepted, written with the reason into its
 * net, or into its pin when the pin is on no net (design-format.md, "Net" and "Pin"). A waived
 * finding stays in the results, marked, and no longer colours its wire.
 */
import type { Draft } from 'immer';
import type { Design, Waiver } from '../../../rules/model/index.ts';
import { RULE_IDS, type RuleId } from '../../../rules/model/index.ts';
import { ALL_ON } from '../../../rules/engine/index.ts';
import { refuse, splitPinKey, type Command, type Refusal } from './command.ts';

/** Where a waiver is written: a net, or a pin on no net (`PART.PIN`). */
export type WaiverPlace =
  | { readonly net: string; readonly pin?: undefined }
  | { readonly pin: string; readonly net?: undefined };

/**
 * The finding a waiver covers: its rule in one power state, or in every one (`scenario`
 * undefined: the default, so that a power state added later does not bring it back).
 */
export type WaiverTarget = WaiverPlace & {
  readonly rule: RuleId;
  readonly scenario?: string | undefined;
};

/** Does `w` cover findings of `rule` in power state `state`? The engine's own matching (findings.ts). */
export function covers(w: Waiver, rule: string, state: string): boolean {
  return w.rule === rule && (w.scenario === undefined || w.scenario === state);
}

/** Where a finding's waiver goes: its net, else the lone pin it is on. */
export function waiverPlaceOf(f: { readonly net: string | null; readonly place: string }): WaiverPlace {
  return f.net === null ? { pin: f.place } : { net: f.net };
}

const placeText = (p: WaiverPlace) => (p.net !== undefined ? `net ${p.net}` : `pin ${p.pin}`);

/** The draft object holding the waivers of `place` (a net, or a pin on no net), or why there is none. */
function holderOf(design: Draft<Design>, place: WaiverPlace, adding = true): { waivers?: Waiver[] } | Refusal {
  if (place.net !== undefined)
    return design.nets.find((n) => n.id === place.net) ?? refuse(`There is no net ${place.net}.`);
  const { part, pin } = splitPinKey(place.pin);
  const found = design.parts.find((p) => p.id === part)?.pins.find((q) => q.id === pin);
  if (found === undefined) return refuse(`There is no pin ${place.pin}.`);
  // A waiver is added only where it holds; one left in a pin that joined a net may still go.
  if (adding && design.nets.some((n) => n.pins.includes(place.pin)))
    return refuse(`Pin ${place.pin} is on a net: its findings are waived on the net.`);
  return found;
}

const isRefused = (x: object): x is Refusal => 'refused' in x;

/**
 * Accept findings of a rule on a net or a lone pin, with a note. A waiver for the same rule and
 * scope is replaced (its note changes), never doubled.
 */
export function addWaiver(target: WaiverTarget, note: string): Command {
  const text = note.trim();
  return {
    name: `Waive ${target.rule} on ${placeText(target)}`,
    recipe(design) {
      const holder = holderOf(design, target);
      if (isRefused(holder)) return holder;
      if (!(RULE_IDS as readonly string[]).includes(target.rule)) return refuse(`There is no rule ${target.rule}.`);
      if (text === '') return refuse('A waiver needs a note: why this finding is acceptable.');
      const scenario = target.scenario;
      if (scenario !== undefined && scenario !== ALL_ON && !(design.scenarios ?? []).some((s) => s.id === scenario)) {
        return refuse(`There is no power state ${scenario}.`);
      }
      const waiver: Waiver = { rule: target.rule, ...(scenario === undefined ? {} : { scenario }), note: text };
      const list = holder.waivers ?? [];
      const same = list.findIndex((w) => w.rule === target.rule && w.scenario === scenario);
      if (same >= 0) list[same]!.note = text;
      else if (holder.waivers === undefined) holder.waivers = [waiver];
      else holder.waivers.push(waiver);
    },
  };
}

/**
 * Withdraw the waiver that covers findings of `rule` at `place` (a net id, or a `{pin}` on no
 * net) in power state `state` (the first, as the engine matches).
 */
export function removeWaiverFor(place: string | WaiverPlace, rule: string, state: string): Command {
  const where: WaiverPlace = typeof place === 'string' ? { net: place } : place;
  return {
    name: `Withdraw the waiver of ${rule} on ${placeText(where)}`,
    recipe(design) {
      const holder = holderOf(design, where, false);
      const k = isRefused(holder) ? -1 : (holder.waivers?.findIndex((w) => covers(w, rule, state)) ?? -1);
      if (isRefused(holder) || k < 0)
        return refuse(`No waiver of ${rule} on ${placeText(where)} covers this power state.`);
      holder.waivers!.splice(k, 1);
      if (holder.waivers!.length === 0) delete holder.waivers;
    },
  };
}

/** Withdraw a waiver of a net (by id) or of a lone pin (`{pin}`) by its place in the list. */
export function removeWaiverAt(place: string | WaiverPlace, index: number): Command {
  const where: WaiverPlace = typeof place === 'string' ? { net: place } : place;
  const text = where.net !== undefined ? `Net ${where.net}` : `Pin ${where.pin}`;
  return {
    name: `Withdraw a waiver on ${placeText(where)}`,
    recipe(design) {
      const holder = holderOf(design, where, false);
      if (isRefused(holder) || holder.waivers?.[index] === undefined)
        return refuse(`${text} has no waiver ${index + 1}.`);
      holder.waivers.splice(index, 1);
      if (holder.waivers.length === 0) delete holder.waivers;
    },
  };
}
