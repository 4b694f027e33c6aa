/**
 * Waivers: a finding the engineer has reviewed and accepted, written into its net with the
 * reason (design-format.md, "Net"). A waived finding stays in the results, marked, and no
 * longer colours its wire.
 */
import type { Waiver } from '../../../rules/model/schema.ts';
import { RULE_IDS, type RuleId } from '../../../rules/model/ruleIds.ts';
import { ALL_ON } from '../../../rules/engine/powerStates.ts';
import { refuse, type Command } from './command.ts';

/** The finding a waiver covers: its rule in one power state, or in every one (`scenario` undefined). */
export interface WaiverTarget {
  readonly net: string;
  readonly rule: RuleId;
  readonly scenario?: string | undefined;
}

/** Does `w` cover findings of `rule` in power state `state`? The engine's own matching (findings.ts). */
export function covers(w: Waiver, rule: string, state: string): boolean {
  return w.rule === rule && (w.scenario === undefined || w.scenario === state);
}

/**
 * Accept findings of a rule on a net, with a note. A waiver for the same rule and scope is
 * replaced (its note changes), never doubled.
 */
export function addWaiver(target: WaiverTarget, note: string): Command {
  const text = note.trim();
  return {
    name: `Waive ${target.rule} on net ${target.net}`,
    recipe(design) {
      const net = design.nets.find((n) => n.id === target.net);
      if (net === undefined) return refuse(`There is no net ${target.net}.`);
      if (!(RULE_IDS as readonly string[]).includes(target.rule)) return refuse(`There is no rule ${target.rule}.`);
      if (text === '') return refuse('A waiver needs a note: why this finding is acceptable.');
      const scenario = target.scenario;
      if (scenario !== undefined && scenario !== ALL_ON && !(design.scenarios ?? []).some((s) => s.id === scenario)) {
        return refuse(`There is no power state ${scenario}.`);
      }
      const waiver: Waiver = { rule: target.rule, ...(scenario === undefined ? {} : { scenario }), note: text };
      const list = net.waivers ?? [];
      const same = list.findIndex((w) => w.rule === target.rule && w.scenario === scenario);
      if (same >= 0) list[same]!.note = text;
      else if (net.waivers === undefined) net.waivers = [waiver];
      else net.waivers.push(waiver);
    },
  };
}

/** Withdraw the waiver that covers findings of `rule` on `net` in power state `state` (the first, as the engine matches). */
export function removeWaiverFor(net: string, rule: string, state: string): Command {
  return {
    name: `Withdraw the waiver of ${rule} on net ${net}`,
    recipe(design) {
      const n = design.nets.find((x) => x.id === net);
      const k = n?.waivers?.findIndex((w) => covers(w, rule, state)) ?? -1;
      if (n === undefined || k < 0) return refuse(`No waiver of ${rule} on net ${net} covers this power state.`);
      n.waivers!.splice(k, 1);
      if (n.waivers!.length === 0) delete n.waivers;
    },
  };
}

/** Withdraw a net's waiver by its place in the list. */
export function removeWaiverAt(net: string, index: number): Command {
  return {
    name: `Withdraw a waiver on net ${net}`,
    recipe(design) {
      const n = design.nets.find((x) => x.id === net);
      if (n?.waivers?.[index] === undefined) return refuse(`Net ${net} has no waiver ${index + 1}.`);
      n.waivers.splice(index, 1);
      if (n.waivers.length === 0) delete n.waivers;
    },
  };
}
