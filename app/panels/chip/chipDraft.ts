/**
 * The pin table's working copy of a chip: edited freely in the dialog, committed as one
 * command (a new part, or an edit of one). Each row remembers the pin it came from, so that a
 * renamed pin keeps its nets.
 */
import type { Design, Part, Pin } from '../../../rules/model/index.ts';
import { freshId } from '../../store/commands/index.ts';

export interface PinRow {
  /** React's key: stable while the row lives. */
  readonly key: number;
  /** The pin's id in the design before this edit; null for a row added here. */
  readonly orig: string | null;
  readonly pin: Pin;
}

export interface ChipDraft {
  /** The part being edited; null for a new chip. */
  readonly orig: string | null;
  readonly part: Omit<Part, 'pins'>;
  readonly rows: readonly PinRow[];
  /** The part's pin ids before this edit. */
  readonly origPins: readonly string[];
}

let serial = 0;
const nextKey = () => ++serial;

/** A new chip: the next free `U` designator, on the 3.3 V rail if there is one, with the editable MCU profile. */
export function newChipDraft(design: Design): ChipDraft {
  const rail = design.rails.find((r) => Math.abs(r.nominal - 3.3) < 0.05) ?? design.rails[0];
  return {
    orig: null,
    part: {
      id: freshId(
        'U',
        design.parts.map((p) => p.id),
      ),
      label: 'Custom chip',
      rail: rail?.id ?? '',
      profile: 'mcu-gpio',
    },
    rows: [],
    origPins: [],
  };
}

export function draftOf(part: Part): ChipDraft {
  const { pins, ...rest } = part;
  return {
    orig: part.id,
    part: structuredClone(rest),
    rows: pins.map((pin) => ({ key: nextKey(), orig: pin.id, pin: structuredClone(pin) })),
    origPins: pins.map((p) => p.id),
  };
}

/** A new row: the next free `P<k>`, an input. */
export function addRow(draft: ChipDraft): ChipDraft {
  const id = freshId(
    'P',
    draft.rows.map((r) => r.pin.id),
  );
  return { ...draft, rows: [...draft.rows, { key: nextKey(), orig: null, pin: { id, role: 'input' } }] };
}

/** Drop the keys of a pin set to undefined: the file never holds them. */
function tidy<T extends object>(value: T): T {
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(value)) if (v !== undefined) out[k] = v;
  return out as T;
}

export function setRow(draft: ChipDraft, key: number, patch: Partial<Pin>): ChipDraft {
  return { ...draft, rows: draft.rows.map((r) => (r.key === key ? { ...r, pin: tidy({ ...r.pin, ...patch }) } : r)) };
}

export function removeRow(draft: ChipDraft, key: number): ChipDraft {
  return { ...draft, rows: draft.rows.filter((r) => r.key !== key) };
}

export function moveRow(draft: ChipDraft, key: number, delta: -1 | 1): ChipDraft {
  const k = draft.rows.findIndex((r) => r.key === key);
  const j = k + delta;
  if (k < 0 || j < 0 || j >= draft.rows.length) return draft;
  const rows = [...draft.rows];
  [rows[k], rows[j]] = [rows[j]!, rows[k]!];
  return { ...draft, rows };
}

export function setPartFields(draft: ChipDraft, patch: Partial<Omit<Part, 'pins'>>): ChipDraft {
  return { ...draft, part: tidy({ ...draft.part, ...patch }) };
}

/** The part the draft describes, and what became of each old pin (for `editPart`). */
export function partFromDraft(draft: ChipDraft): { part: Part; pinMap: Record<string, string | null> } {
  const part: Part = { ...draft.part, id: draft.part.id.trim(), pins: draft.rows.map((r) => r.pin) };
  // A pin whose row was removed leaves its nets, even if a new row takes its id.
  const pinMap: Record<string, string | null> = Object.fromEntries(draft.origPins.map((id) => [id, null]));
  for (const r of draft.rows) if (r.orig !== null) pinMap[r.orig] = r.pin.id;
  return { part, pinMap };
}

/** Problems of single rows, shown beside them before anything is committed. */
export function rowProblems(draft: ChipDraft): ReadonlyMap<number, string> {
  const out = new Map<number, string>();
  const count = new Map<string, number>();
  for (const r of draft.rows) count.set(r.pin.id, (count.get(r.pin.id) ?? 0) + 1);
  for (const r of draft.rows) {
    const id = r.pin.id;
    if (id.trim() === '') out.set(r.key, 'A pin needs an id.');
    else if (/[.:>]/.test(id)) out.set(r.key, 'No ".", ":" or ">" in a pin id.');
    else if ((count.get(id) ?? 0) > 1) out.set(r.key, `${id} is used twice.`);
  }
  return out;
}
