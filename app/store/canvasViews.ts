/** What each chip and each wire of the canvas shows, as keyed views of the store (keyedView.ts). */
import type { Severity } from '../../rules/engine/index.ts';
import type { Part, Rail } from '../../rules/model/index.ts';
import { resolveProfile } from '../../rules/profiles/index.ts';
import type { KeyedSpec } from './keyedView.ts';
import { partById } from './lookup.ts';

/** A wire's look: `severity|rule|highlighted`, one string so that a change is one comparison. */
export const WIRE_LOOK: KeyedSpec<string> = {
  relevant: (s, prev) => s.netStatus !== prev.netStatus || s.selection.net !== prev.selection.net,
  read: (s, net) => {
    const status = s.netStatus.get(net);
    return `${status?.severity ?? 'clean'}|${status?.rule ?? ''}|${s.selection.net === net ? 1 : 0}`;
  },
  same: (a, b) => a === b,
};

export function parseWireLook(look: string): { severity: Severity | 'clean'; rule: string; highlighted: boolean } {
  const [severity = 'clean', rule = '', highlighted] = look.split('|');
  return { severity: severity as Severity | 'clean', rule, highlighted: highlighted === '1' };
}

export interface ChipLook {
  readonly part: Part | undefined;
  readonly rail: Rail | undefined;
  readonly family: string;
}

/** A chip's part, its rail and its family's name. */
export const CHIP_LOOK: KeyedSpec<ChipLook> = {
  relevant: (s, prev) =>
    s.design.parts !== prev.design.parts ||
    s.design.rails !== prev.design.rails ||
    s.design.profiles !== prev.design.profiles,
  read: (s, id) => {
    const part = partById(s.design.parts, id);
    return {
      part,
      rail: part === undefined ? undefined : s.design.rails.find((r) => r.id === part.rail),
      family: part === undefined ? '' : (resolveProfile(s.design, part.profile)?.label ?? part.profile),
    };
  },
  same: (a, b) => a.part === b.part && a.rail === b.rail && a.family === b.family,
};
