/**
 * Custom chips and their later edits: the pin table's result checked as a whole (shape by the
 * design schema, references against the design), a designator rename that follows every
 * `PART.PIN` reference, and pin renames and removals that follow the nets.
 */
import type { Draft } from 'immer';
import { PartSchema, type Design, type Part } from '../../../rules/model/index.ts';
import { GROUND } from '../../../rules/model/index.ts';
import { resolveProfile } from '../../../rules/profiles/index.ts';
import { refuse, type Command } from './command.ts';
import { netWires } from './netGraph.ts';

const BAD_ID = /[.:>]/;

/** A designator the format accepts: not empty, no ".", ":" or ">" (design-format.md). */
export function designatorProblem(id: string): string | undefined {
  return id === '' || BAD_ID.test(id) ? `"${id}" cannot be a designator (no ".", ":" or ">").` : undefined;
}

function where(part: Part, path: readonly PropertyKey[]): string {
  const [head, index, ...rest] = path;
  if (head === 'pins' && typeof index === 'number') {
    const pin = part.pins[index];
    return [`pin ${pin?.id === undefined || pin.id === '' ? `#${index + 1}` : pin.id}`, ...rest.map(String)].join(' ');
  }
  return path.map(String).join(' ');
}

/**
 * Why `part` cannot go into `design`, or undefined: a shape the format refuses (a bad id, a
 * Level that does not parse, a negative current), a pin id used twice, an unknown rail or
 * profile, a designator in use (other than by `replacing`, the part being edited).
 */
export function partProblem(design: Design, part: Part, replacing?: string): string | undefined {
  const bad = designatorProblem(part.id);
  if (bad !== undefined) return bad;
  if (part.id !== replacing && design.parts.some((p) => p.id === part.id)) return `There is already a part ${part.id}.`;
  if ((design.discretes ?? []).some((d) => d.id === part.id))
    return `There is already a part ${part.id} (between chips).`;
  const read = PartSchema.safeParse(part);
  if (!read.success) {
    const issue = read.error.issues[0]!;
    return `${where(part, issue.path)}: ${issue.message}.`;
  }
  const seen = new Set<string>();
  for (const pin of part.pins) {
    if (seen.has(pin.id)) return `Pin ${pin.id} is listed twice.`;
    seen.add(pin.id);
  }
  const hasRail = (id: string) => design.rails.some((r) => r.id === id);
  if (!hasRail(part.rail)) return `There is no rail ${part.rail}: add a rail first.`;
  if (resolveProfile(design, part.profile) === undefined) return `There is no profile ${part.profile}.`;
  for (const pin of part.pins) {
    if (pin.rail !== undefined && !hasRail(pin.rail)) return `Pin ${pin.id}: there is no rail ${pin.rail}.`;
    if (pin.profile !== undefined && resolveProfile(design, pin.profile) === undefined)
      return `Pin ${pin.id}: there is no profile ${pin.profile}.`;
    if (pin.pull !== undefined && pin.pull.to !== GROUND && !hasRail(pin.pull.to))
      return `Pin ${pin.id}: there is no rail ${pin.pull.to} for its pull.`;
  }
  return undefined;
}

/**
 * Rewrite the nets' references to part `from`: its pins become `to.<pinMap(pin)>`, or leave
 * their net where `pinMap` gives null. A net left with one pin goes; a net losing pins keeps
 * the wires that remain (as deleting a part does).
 */
export function rewirePart(
  design: Draft<Design>,
  from: string,
  to: string,
  pinMap: (pin: string) => string | null,
): void {
  const prefix = `${from}.`;
  const mapKey = (key: string): string | null => {
    if (!key.startsWith(prefix)) return key;
    const pin = pinMap(key.slice(prefix.length));
    return pin === null ? null : `${to}.${pin}`;
  };
  // Power states' pin states follow the pins too, or go with them.
  for (const s of design.scenarios ?? []) {
    if (s.pins === undefined || !s.pins.some((p) => p.pin.startsWith(prefix))) continue;
    const kept = s.pins.flatMap((p) => {
      const key = mapKey(p.pin);
      return key === null ? [] : [{ ...p, pin: key }];
    });
    if (kept.length > 0) s.pins = kept;
    else delete s.pins;
  }
  for (let k = design.nets.length - 1; k >= 0; k--) {
    const net = design.nets[k]!;
    if (!net.pins.some((p) => p.startsWith(prefix))) continue;
    const mapped = net.pins.map(mapKey);
    const pins = mapped.filter((p): p is string => p !== null);
    if (pins.length < 2) {
      design.nets.splice(k, 1);
      continue;
    }
    if (pins.every((p, i) => p === net.pins[i]) && pins.length === net.pins.length) continue;
    const lost = pins.length < net.pins.length;
    // A net drawn by its pin order needs no route while it loses nothing; otherwise keep the wires that remain.
    const source = lost || net.route !== undefined ? netWires(net) : [];
    const route = source
      .map(([a, b]) => [mapKey(a), mapKey(b)])
      .filter((w): w is [string, string] => w[0] !== null && w[1] !== null);
    net.pins = pins;
    if (route.length > 0) net.route = route;
    else delete net.route;
  }
}

function sameJson(a: unknown, b: unknown): boolean {
  return JSON.stringify(a) === JSON.stringify(b);
}

/**
 * Replace part `id` by `next` (the pin table's result): designator, label, rail, profile,
 * part overrides and pins. `pinMap` says what became of each old pin (its new id, or null
 * for a pin taken away); an old pin it does not name keeps its id if `next` still has it.
 * The nets follow; the part keeps its place on the canvas. One undo step.
 */
export function editPart(id: string, next: Part, pinMap: Readonly<Record<string, string | null>> = {}): Command {
  return {
    name: next.id === id ? `Edit ${id}` : `Edit ${id} (now ${next.id})`,
    recipe(design) {
      const part = design.parts.find((p) => p.id === id);
      if (part === undefined) return refuse(`There is no part ${id}.`);
      const problem = partProblem(design as Design, next, id);
      if (problem !== undefined) return refuse(problem);
      const ids = new Set(next.pins.map((p) => p.id));
      const fate = (pin: string): string | null => {
        const to = pin in pinMap ? pinMap[pin]! : pin;
        return to !== null && ids.has(to) ? to : null;
      };
      const moved = part.pins.some((p) => fate(p.id) !== p.id);
      if (next.label !== part.label) part.label = next.label;
      if (next.rail !== part.rail) part.rail = next.rail;
      if (next.profile !== part.profile) part.profile = next.profile;
      if (!sameJson(next.params, part.params)) {
        if (next.params === undefined) delete part.params;
        else part.params = structuredClone(next.params);
      }
      if (!sameJson(next.pins, part.pins)) part.pins = structuredClone(next.pins);
      if (next.id !== id || moved) rewirePart(design, id, next.id, fate);
      if (next.id !== id) part.id = next.id;
    },
  };
}

/** Give part `id` the designator `to`; every net's `PART.PIN` reference follows. */
export function renamePart(id: string, to: string): Command {
  const target = to.trim();
  return {
    name: `Rename ${id} to ${target}`,
    recipe(design) {
      const part = design.parts.find((p) => p.id === id);
      if (part === undefined) return refuse(`There is no part ${id}.`);
      if (target === id) return;
      const bad = designatorProblem(target);
      if (bad !== undefined) return refuse(bad);
      if (design.parts.some((p) => p.id === target) || (design.discretes ?? []).some((d) => d.id === target))
        return refuse(`There is already a part ${target}.`);
      part.id = target;
      rewirePart(design, id, target, (pin) => pin);
    },
  };
}
