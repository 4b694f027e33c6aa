import { partOfPin } from '../../../rules/model/index.ts';
import type { Design } from '../../../rules/model/index.ts';
import { refuse, type Command } from './command.ts';
import { removeParts } from './parts.ts';
import { removeWire } from './disconnectWire.ts';
import type { Pair } from './netGraph.ts';

export function setTitle(title: string): Command {
  return {
    name: 'Rename the design',
    recipe(design) {
      design.title = title;
    },
  };
}

/** Replace the whole design (New design, Open example): one step, so that undo brings the old one back. */
export function replaceDesign(next: Design, name = 'Replace the design'): Command {
  return { name, recipe: () => structuredClone(next) };
}

/** What Delete removes: parts (with their pins' places on nets) and wires. */
export interface Deletion {
  readonly parts: readonly string[];
  readonly wires: readonly Pair[];
}

/**
 * Delete parts and wires in one step. Parts go first; a wire that went with a part is not
 * looked for again.
 */
export function deleteSelection(what: Deletion): Command {
  return {
    name: 'Delete',
    recipe(design) {
      if (what.parts.length === 0 && what.wires.length === 0) return refuse('Nothing is selected.');
      removeParts(design, what.parts);
      const gone = new Set(what.parts);
      for (const [a, b] of what.wires) {
        if (gone.has(partOfPin(a)) || gone.has(partOfPin(b))) continue;
        removeWire(design, a, b);
      }
    },
  };
}
