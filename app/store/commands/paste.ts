import { partOfPin } from '../../../rules/model/index.ts';
import type { Design, Net, Part } from '../../../rules/model/index.ts';
import { GROUND } from '../../../rules/model/index.ts';
import { refuse, type Command } from './command.ts';
import { partProblem } from './partEdit.ts';

/**
 * Add parts and the nets among them in one step (a paste, a duplicate). Refused whole when a
 * part names a rail or profile this design lacks (a clip taken from another design).
 */
export function insertParts(
  parts: readonly Part[],
  nets: readonly Net[],
  name = `Paste ${parts.length} ${parts.length === 1 ? 'part' : 'parts'}`,
): Command {
  return {
    name,
    recipe(design) {
      if (parts.length === 0) return refuse('Nothing to paste.');
      const ids = new Set<string>();
      for (const part of parts) {
        const problem = partProblem(design as Design, part);
        if (problem !== undefined) return refuse(problem);
        if (ids.has(part.id)) return refuse(`Part ${part.id} is pasted twice.`);
        ids.add(part.id);
      }
      const netIds = new Set(design.nets.map((n) => n.id));
      for (const net of nets) {
        if (netIds.has(net.id)) return refuse(`There is already a net ${net.id}.`);
        netIds.add(net.id);
        if (net.pull !== undefined && net.pull.to !== GROUND && !design.rails.some((r) => r.id === net.pull!.to)) {
          return refuse(`There is no rail ${net.pull.to} for the pull of a pasted net.`);
        }
        if (!net.pins.every((k) => ids.has(partOfPin(k))))
          return refuse(`Net ${net.id} names a pin outside the pasted parts.`);
      }
      design.parts.push(...structuredClone(parts as Part[]));
      design.nets.push(...structuredClone(nets as Net[]));
    },
  };
}
