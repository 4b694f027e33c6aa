import { partOfPin } from '../../../rules/model/index.ts';
import type { Draft } from 'immer';
import type { Design, Part } from '../../../rules/model/index.ts';
import { resolveProfile } from '../../../rules/profiles/index.ts';
import { partProblem } from './partEdit.ts';
import { refuse, type Command } from './command.ts';
import { netWires } from './netGraph.ts';

/** Place a new part (a template or the pin table made it, with a fresh designator). */
export function addPart(part: Part): Command {
  return {
    name: `Add ${part.id}`,
    recipe(design) {
      const problem = partProblem(design as Design, part);
      if (problem !== undefined) return refuse(problem);
      design.parts.push(structuredClone(part));
    },
  };
}

export interface Move {
  readonly id: string;
  readonly x: number;
  readonly y: number;
}

/** Move parts: one drag of one or several parts is one step. Positions are kept to whole units. */
export function moveParts(moves: readonly Move[]): Command {
  return {
    name: moves.length === 1 ? `Move ${moves[0]!.id}` : `Move ${moves.length} parts`,
    recipe(design) {
      for (const m of moves) {
        // A part between chips moves as a chip does.
        const part = design.parts.find((p) => p.id === m.id) ?? design.discretes?.find((d) => d.id === m.id);
        if (part === undefined || !Number.isFinite(m.x) || !Number.isFinite(m.y)) continue;
        const x = Math.round(m.x);
        const y = Math.round(m.y);
        if (part.position?.x === x && part.position.y === y) continue;
        part.position = { x, y };
      }
    },
  };
}

/** Move parts by a step (arrow keys): one key press is one undo step. */
export function nudgeParts(ids: readonly string[], dx: number, dy: number): Command {
  return {
    name: ids.length === 1 ? `Nudge ${ids[0]}` : `Nudge ${ids.length} parts`,
    recipe(design) {
      const chosen = new Set(ids);
      let moved = 0;
      for (const part of design.parts) {
        if (!chosen.has(part.id)) continue;
        const at = part.position ?? { x: 0, y: 0 };
        part.position = { x: Math.round(at.x + dx), y: Math.round(at.y + dy) };
        moved++;
      }
      if (moved === 0) return refuse('Select a part to move it.');
    },
  };
}

function findPart(design: Draft<Design>, id: string) {
  return design.parts.find((p) => p.id === id);
}

export function setPartLabel(id: string, label: string): Command {
  return {
    name: `Rename ${id}`,
    recipe(design) {
      const part = findPart(design, id);
      if (part === undefined) return refuse(`There is no part ${id}.`);
      part.label = label;
    },
  };
}

export function setPartRail(id: string, rail: string): Command {
  return {
    name: `Put ${id} on rail ${rail}`,
    recipe(design) {
      const part = findPart(design, id);
      if (part === undefined) return refuse(`There is no part ${id}.`);
      if (!design.rails.some((r) => r.id === rail)) return refuse(`There is no rail ${rail}.`);
      part.rail = rail;
    },
  };
}

export function setPartProfile(id: string, profile: string): Command {
  return {
    name: `Give ${id} profile ${profile}`,
    recipe(design) {
      const part = findPart(design, id);
      if (part === undefined) return refuse(`There is no part ${id}.`);
      if (resolveProfile(design, profile) === undefined) return refuse(`There is no profile ${profile}.`);
      part.profile = profile;
    },
  };
}

/**
 * Remove parts and take their pins off every net. A net left with one pin goes; the others
 * stay whole (the copper between the remaining pins is still there), their route keeping the
 * wires that remain, the drawing joining what those leave apart.
 */
export function removeParts(design: Draft<Design>, ids: readonly string[]): void {
  const gone = new Set(ids);
  const isGone = (key: string) => gone.has(partOfPin(key));
  design.parts = design.parts.filter((p) => !gone.has(p.id));
  // Parts between chips go the same way.
  if (design.discretes?.some((d) => gone.has(d.id))) {
    design.discretes = design.discretes.filter((d) => !gone.has(d.id));
    if (design.discretes.length === 0) delete design.discretes;
  }
  for (const s of design.scenarios ?? []) {
    if (s.pins === undefined || !s.pins.some((p) => isGone(p.pin))) continue;
    s.pins = s.pins.filter((p) => !isGone(p.pin));
    if (s.pins.length === 0) delete s.pins;
  }
  for (let k = design.nets.length - 1; k >= 0; k--) {
    const net = design.nets[k]!;
    if (!net.pins.some(isGone)) continue;
    const pins = net.pins.filter((p) => !isGone(p));
    if (pins.length < 2) {
      design.nets.splice(k, 1);
      continue;
    }
    const route = netWires(net).filter(([a, b]) => !isGone(a) && !isGone(b));
    net.pins = pins;
    if (route.length > 0) net.route = route.map(([a, b]) => [a, b]);
    else delete net.route;
  }
}
