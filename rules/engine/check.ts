/**
 * `check(design, previous?)`: the engine's one entry point (architecture.md, "The engine's
 * contract"). It takes the plain v1 document as the editor holds it and never validates it.
 */
import type { Design } from '../model/schema.ts';
import { RULES } from '../checks/index.ts';
import type { AnyRule } from '../checks/defineRule.ts';
import { ALL_ON, effectiveSettings, powerStates, railStates } from './powerStates.ts';
import { indexPins, pinView, prepareNet, type PrepareContext } from './prepare.ts';
import { completeFinding, sortFindings, summarize } from './findings.ts';
import type { CheckResult, Finding, NetResult, PinView, StateView } from './types.ts';

// The engine runs in Node and the browser alike; both have a monotonic clock here.
const clock = (globalThis as { performance?: { now(): number } }).performance;
function now(): number {
  return clock !== undefined ? clock.now() : Date.now();
}

/**
 * Checks every rule of the catalogue on every net in every power state.
 *
 * `previous` (the result for an earlier version of the same design) lets a later version of
 * the engine re-check only what changed; a full check is always correct.
 */
export function check(design: Design, previous?: CheckResult, rules: readonly AnyRule[] = RULES): CheckResult {
  void previous;
  const started = now();
  const states = powerStates(design);
  const settings = effectiveSettings(design);
  const pinIndex = indexPins(design);
  const onNet = new Set<string>();
  for (const net of design.nets) for (const key of net.pins) onNet.add(key);

  const nets = new Map<string, Map<string, NetResult>>();
  const stateFindings = new Map<string, Finding[]>();
  const all: Finding[] = [];
  let netsChecked = 0;

  for (const state of states) {
    const rails = railStates(design, state);
    const ctx: PrepareContext = { design, state, rails, settings, pinIndex };
    const perNet = new Map<string, NetResult>();
    design.nets.forEach((net, netIndex) => {
      const view = prepareNet(ctx, net, netIndex);
      const findings: Finding[] = [];
      for (const rule of rules) {
        if (rule.checkNet === undefined || (rule.once === true && state.id !== ALL_ON)) continue;
        rule.checkNet(view, (draft) => findings.push(completeFinding(rule, draft, state, net)));
      }
      perNet.set(net.id, { net, view, findings });
      all.push(...findings);
      netsChecked++;
    });
    nets.set(state.id, perNet);

    const allPins: PinView[] = [];
    const unconnected: PinView[] = [];
    for (const part of design.parts) {
      for (const pin of part.pins) {
        const v = pinView(design, part, pin, rails);
        allPins.push(v);
        if (!onNet.has(v.key)) unconnected.push(v);
      }
    }
    const stateView: StateView = { design, state, settings, rails, unconnected, allPins };
    const found: Finding[] = [];
    for (const rule of rules) {
      if (rule.checkState === undefined || (rule.once === true && state.id !== ALL_ON)) continue;
      rule.checkState(stateView, (draft) => found.push(completeFinding(rule, draft, state, null)));
    }
    stateFindings.set(state.id, found);
    all.push(...found);
  }

  const stateOrder = new Map(states.map((s, k) => [s.id, k]));
  const netOrder = new Map(design.nets.map((n, k) => [n.id, k]));
  const findings = sortFindings(all, stateOrder, netOrder);
  return {
    design,
    states,
    nets,
    stateFindings,
    findings,
    summary: summarize(findings),
    stats: { netsChecked, ms: now() - started },
  };
}
