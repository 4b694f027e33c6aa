import type { Draft } from 'immer';
import { DISCRETE_PINS, type Design } from '../../../rules/model/index.ts';
import { pinKey, splitPinKey } from '../../../rules/model/index.ts';

/** Why a command was refused; nothing of the design changes. */
export interface Refusal {
  readonly refused: string;
}

/**
 * One edit of the design: a verb-first name and a recipe that mutates an immer draft. The
 * recipe may instead return a whole new design (New design, Open example) or a refusal.
 */
export interface Command {
  readonly name: string;
  readonly recipe: (draft: Draft<Design>) => Refusal | Design | undefined;
}

export function refuse(reason: string): Refusal {
  return { refused: reason };
}

export function isRefusal(value: unknown): value is Refusal {
  return typeof value === 'object' && value !== null && 'refused' in value;
}

export { pinKey, splitPinKey };

/** True when the design has that part and that pin. */
export function hasPin(design: Design, key: string): boolean {
  const { part, pin } = splitPinKey(key);
  if (design.parts.some((p) => p.id === part && p.pins.some((q) => q.id === pin))) return true;
  // A part between chips (version 2): its pins by kind; a resistor's tied end is not on a net.
  const d = design.discretes?.find((x) => x.id === part);
  if (d === undefined || !DISCRETE_PINS[d.kind].includes(pin)) return false;
  return !(d.kind === 'resistor' && d.tie?.[pin as '1' | '2'] !== undefined);
}

/** The smallest `${prefix}${k}` (k ≥ 1) not among `taken`. */
export function freshId(prefix: string, taken: Iterable<string>): string {
  const used = new Set(taken);
  for (let k = 1; ; k++) if (!used.has(`${prefix}${k}`)) return `${prefix}${k}`;
}
