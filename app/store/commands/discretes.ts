/**
 * Parts between chips (design format version 2): a resistor, a FET shifter, a diode shifter.
 * Each is placed with values of our own choosing as a start (the engineer edits them), and wired
 * with ordinary nets through its pins (`R1.1`, `Q1.S`, `D1.K`).
 */
import { DISCRETE_PINS, type Design, type Discrete, type DiscreteKind } from '../../../rules/model/index.ts';
import { freshId, refuse, type Command } from './command.ts';

/** The designator prefix of each kind (common practice: R for resistors, Q for transistors, D for diodes). */
export const DISCRETE_PREFIX: Readonly<Record<DiscreteKind, string>> = {
  resistor: 'R',
  'fet-shifter': 'Q',
  'diode-shifter': 'D',
};

/** Every id of parts and discretes: they share one namespace. */
export function takenIds(design: Design): string[] {
  return [...design.parts.map((p) => p.id), ...(design.discretes ?? []).map((d) => d.id)];
}

/**
 * A new discrete of a kind at a place, with a starting value: 10 kΩ ±5 % (a common pull-up),
 * a logic-level FET (VGS(th) ≤ 1 V, RDS(on) ≤ 5 Ω) with its gate on `gate`, a small Schottky
 * (Vf ≤ 0.45 V, leakage ≤ 5 µA). Invented starting values, not any part's.
 */
export function newDiscrete(design: Design, kind: DiscreteKind, at: { x: number; y: number }, gate?: string): Discrete {
  const id = freshId(DISCRETE_PREFIX[kind], takenIds(design));
  const position = { x: Math.round(at.x), y: Math.round(at.y) };
  if (kind === 'resistor') return { id, kind, ohms: 10e3, tolerance: 0.05, position };
  if (kind === 'fet-shifter')
    return {
      id,
      kind,
      gate: gate ?? design.rails[design.rails.length - 1]?.id ?? '',
      vgsThMax: 1,
      rdsOnMax: 5,
      position,
    };
  return { id, kind, vfMax: 0.45, leakageMax: 5e-6, position };
}

/** Add a discrete part (its id must be free among parts and discretes). */
export function addDiscrete(part: Discrete): Command {
  return {
    name: `Add ${part.id}`,
    recipe(design) {
      if (takenIds(design as Design).includes(part.id)) return refuse(`${part.id} is already taken.`);
      if (part.kind === 'fet-shifter' && !design.rails.some((r) => r.id === part.gate))
        return refuse(`There is no rail ${part.gate} for ${part.id}'s gate.`);
      design.discretes = [...(design.discretes ?? []), structuredClone(part)];
    },
  };
}

/** The keys each kind may change (not its id or kind). */
const EDITABLE: Readonly<Record<DiscreteKind, readonly string[]>> = {
  resistor: ['label', 'ohms', 'tolerance', 'tie'],
  'fet-shifter': ['label', 'gate', 'vgsThMax', 'rdsOnMax'],
  'diode-shifter': ['label', 'vfMax', 'leakageMax'],
};

/** Change a discrete's values; a key set to undefined is taken away. Refused: a key its kind has not. */
export function setDiscrete(id: string, change: Readonly<Record<string, unknown>>): Command {
  return {
    name: `Edit ${id}`,
    recipe(design) {
      const d = design.discretes?.find((x) => x.id === id);
      if (d === undefined) return refuse(`There is no part ${id}.`);
      const rec = d as unknown as Record<string, unknown>;
      for (const [k, v] of Object.entries(change)) {
        if (!EDITABLE[d.kind].includes(k)) return refuse(`A ${d.kind} has no ${k}.`);
        if (k === 'tie' && v !== undefined) {
          for (const end of Object.keys(v as object)) {
            const key = `${id}.${end}`;
            const on = design.nets.find((n) => n.pins.includes(key));
            if (on !== undefined)
              return refuse(`${key} is on net ${on.label ?? on.id}: take it off the net before tying it to a rail.`);
          }
        }
        if (v === undefined) delete rec[k];
        else rec[k] = structuredClone(v);
      }
    },
  };
}

/** Remove a discrete and take its pins off their nets. */
export function removeDiscrete(id: string): Command {
  return {
    name: `Delete ${id}`,
    recipe(design) {
      const list = design.discretes ?? [];
      const k = list.findIndex((x) => x.id === id);
      if (k < 0) return refuse(`There is no part ${id}.`);
      const keys = new Set(DISCRETE_PINS[list[k]!.kind].map((p) => `${id}.${p}`));
      for (const net of design.nets) {
        net.pins = net.pins.filter((p) => !keys.has(p));
        if (net.route !== undefined) net.route = net.route.filter(([a, b]) => !keys.has(a) && !keys.has(b));
      }
      list.splice(k, 1);
      if (list.length === 0) delete design.discretes;
    },
  };
}
