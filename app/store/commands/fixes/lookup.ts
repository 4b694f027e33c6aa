/** Reading a design (or a draft of one) by id: what the fixes need to find their targets. */
import type { Design, Net, Part, Pin } from '../../../../rules/model/index.ts';
import { railRange, type Range } from '../../../../rules/levels/index.ts';
import { resolvePin } from '../../../../rules/engine/index.ts';
import { namesOf, netLabel } from '../../../../rules/engine/index.ts';
import type { ResolvedPin } from '../../../../rules/engine/index.ts';
import { splitPinKey } from '../command.ts';
import { railOf } from '../../../../rules/model/index.ts';

export interface PinAt {
  readonly part: Part;
  readonly pin: Pin;
}

/** The part and pin a `PART.PIN` key names. */
export function pinAt(design: Design, key: string): PinAt | undefined {
  const { part: partId, pin: pinId } = splitPinKey(key);
  const part = design.parts.find((p) => p.id === partId);
  const pin = part?.pins.find((p) => p.id === pinId);
  return part === undefined || pin === undefined ? undefined : { part, pin };
}

/** The pin with its effective parameters (the engine's own resolution). Plain designs only, not drafts. */
export function resolvedPin(design: Design, key: string): ResolvedPin | undefined {
  const at = pinAt(design, key);
  return at === undefined ? undefined : resolvePin(design, at.part, at.pin);
}

/** The rail a pin sits on: its own, else its part's. */
export function railOfPin(at: PinAt): string {
  return railOf(at.part, at.pin);
}

/** The net with this id. */
export function findNet(design: Design, id: string): Net | undefined {
  return design.nets.find((n) => n.id === id);
}

/** A rail's range with it powered, or undefined for an unknown rail. */
export function rangeOfRail(design: Design, id: string): Range | undefined {
  const rail = design.rails.find((r) => r.id === id);
  return rail === undefined ? undefined : railRange(rail);
}

/** The rail among `ids` with the lowest highest voltage: a pull-up there overdrives none of the others. */
export function lowestRail(design: Design, ids: Iterable<string>): string | undefined {
  let best: { id: string; max: number } | undefined;
  for (const id of ids) {
    const r = rangeOfRail(design, id);
    if (r !== undefined && (best === undefined || r.max < best.max)) best = { id, max: r.max };
  }
  return best?.id;
}

/** `base`, or `base2`, `base3`, … : the first not among `taken`. */
export function uniqueId(base: string, taken: Iterable<string>): string {
  const used = new Set(taken);
  if (!used.has(base)) return base;
  for (let k = 2; ; k++) if (!used.has(`${base}${k}`)) return `${base}${k}`;
}

/** A rail's display name: its label (ids stay in the file). */
export function railName(design: Design, id: string): string {
  return namesOf(design).rail(id);
}

/** The net's display name. */
export function netName(net: Net): string {
  return netLabel(net);
}
