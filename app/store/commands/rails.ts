import type { Draft } from 'immer';
import type { Design, Rail } from '../../../rules/model/index.ts';
import { railRange } from '../../../rules/levels/index.ts';
import { isRailColour } from '../../../rules/model/index.ts';
import { MAX_VOLTS } from '../../../rules/model/index.ts';
import { freshId, refuse, type Command } from './command.ts';

function findRail(design: Draft<Design>, id: string) {
  return design.rails.find((r) => r.id === id);
}

/** A new rail at 3.3 V ±5 %, with the given id or `rail<k>`. */
export function addRail(id: string = '', colour = '#5b6b7f'): Command {
  return {
    name: 'Add a rail',
    recipe(design) {
      const railId =
        id === ''
          ? freshId(
              'rail',
              design.rails.map((r) => r.id),
            )
          : id;
      if (design.rails.some((r) => r.id === railId)) return refuse(`There is already a rail ${railId}.`);
      const rail: Rail = { id: railId, label: 'New rail', nominal: 3.3, tolerance: 0.05, colour };
      design.rails.push(rail);
    },
  };
}

export function setRailLabel(id: string, label: string): Command {
  return {
    name: `Rename rail ${id}`,
    recipe(design) {
      const rail = findRail(design, id);
      if (rail === undefined) return refuse(`There is no rail ${id}.`);
      rail.label = label;
    },
  };
}

/** The rail's nominal voltage, V. An explicit `min` or `max` of the rail still wins for its end. */
export function setRailVoltage(id: string, nominal: number): Command {
  return {
    name: `Set rail ${id} to ${nominal} V`,
    recipe(design) {
      const rail = findRail(design, id);
      if (rail === undefined) return refuse(`There is no rail ${id}.`);
      if (!(nominal > 0 && nominal <= MAX_VOLTS))
        return refuse('A rail needs a nominal voltage above 0 V, up to 10 kV.');
      const range = railRange({ ...rail, nominal });
      if (range.min > range.max) {
        return refuse(
          `With an explicit ${rail.min !== undefined ? 'minimum' : 'maximum'} of ${rail.min ?? rail.max} V, rail ${id} cannot be ${nominal} V.`,
        );
      }
      rail.nominal = nominal;
    },
  };
}

/** Tolerance as a fraction (0.05 for ±5 %). */
export function setRailTolerance(id: string, tolerance: number): Command {
  return {
    name: `Set the tolerance of rail ${id}`,
    recipe(design) {
      const rail = findRail(design, id);
      if (rail === undefined) return refuse(`There is no rail ${id}.`);
      if (!(Number.isFinite(tolerance) && tolerance >= 0 && tolerance < 1)) {
        return refuse('A tolerance is between 0 % and 100 %.');
      }
      const range = railRange({ ...rail, tolerance });
      if (range.min > range.max) return refuse(`That tolerance would give rail ${id} a minimum above its maximum.`);
      rail.tolerance = tolerance;
    },
  };
}

export function setRailColour(id: string, colour: string): Command {
  return {
    name: `Colour rail ${id}`,
    recipe(design) {
      const rail = findRail(design, id);
      if (rail === undefined) return refuse(`There is no rail ${id}.`);
      if (!isRailColour(colour))
        return refuse(`"${colour}" is not a colour such as #2f8f6b or #2f8 (only hexadecimal colours are allowed).`);
      rail.colour = colour;
    },
  };
}

/** Delete a rail no part, pin or pull uses; power states forget it. */
export function deleteRail(id: string): Command {
  return {
    name: `Delete rail ${id}`,
    recipe(design) {
      if (findRail(design, id) === undefined) return refuse(`There is no rail ${id}.`);
      const user =
        design.parts.find((p) => p.rail === id || p.pins.some((q) => q.rail === id || q.pull?.to === id))?.id ??
        design.nets.find((n) => n.pull?.to === id)?.id ??
        design.discretes?.find(
          (d) =>
            (d.kind === 'fet-shifter' && d.gate === id) ||
            (d.kind === 'resistor' && (d.tie?.['1'] === id || d.tie?.['2'] === id)),
        )?.id ??
        design.scenarios?.find((s) => s.pins?.some((p) => p.pull?.to === id))?.id;
      if (user !== undefined) return refuse(`Rail ${id} is still used by ${user}.`);
      design.rails = design.rails.filter((r) => r.id !== id);
      for (const s of design.scenarios ?? []) s.off = s.off.filter((r) => r !== id);
    },
  };
}
