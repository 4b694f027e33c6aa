/**
 * A pin's defaults as the design format states them (design-format.md, "Pin"), in one place for
 * the engine, the report and the editor: the drive an output or bidir pin has when it names
 * none, the rail and profile it takes from its part, the side it is drawn on.
 */
import type { Part, Pin, PinDrive, PinRole } from './schema.ts';

export type Side = NonNullable<Pin['side']>;

/** The drive of a pin of this role: undefined for an input; push-pull for an output, three-state for a bidir pin unless given. */
export function driveOf(pin: { readonly role: PinRole; readonly drive?: PinDrive | undefined }): PinDrive | undefined {
  if (pin.role === 'input') return undefined;
  return pin.drive ?? (pin.role === 'bidir' ? 'three-state' : 'push-pull');
}

/** The rail a pin sits on: its own, else its part's. */
export function railOf(part: Pick<Part, 'rail'>, pin: Pick<Pin, 'rail'>): string {
  return pin.rail ?? part.rail;
}

/** The profile a pin takes its numbers from: its own, else its part's. */
export function profileIdOf(part: Pick<Part, 'profile'>, pin: Pick<Pin, 'profile'>): string {
  return pin.profile ?? part.profile;
}

/** The side the design gives, else inputs left and outputs and bidir pins right. */
export function sideOf(pin: Pick<Pin, 'side' | 'role'>): Side {
  return pin.side ?? (pin.role === 'input' ? 'left' : 'right');
}
