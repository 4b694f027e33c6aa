/**
 * `check(design, previous?)`: the engine's one entry point (architecture.md, "The engine's
 * contract"). It takes the plain v1 document as the editor holds it and never validates it.
 *
 * With `previous` (the result for an earlier version of the same document, sharing the objects
 * that did not change, as immer does) it re-checks only the nets, lone pins and rails that a
 * changed part, pin, net, rail, profile or power state touches. The result is the same as a
 * full check; a property test holds the two together.
 */
import type { Design, Net, Part, Rail } from '../model/schema.ts';
import { RULES } from '../checks/index.ts';
import type { AnyRule } from '../checks/defineRule.ts';
import { ALL_ON, effectiveSettings, powerStates, railStates } from './powerStates.ts';
import { loneRails, pinView, prepareNet, type PrepareContext } from './prepare.ts';
import { completeFinding, restampFinding, sortFindings } from './findings.ts';
import { DesignIndex, groupKey, splitGroupKey } from './designIndex.ts';
import { changedById } from './diff.ts';
import type { CheckResult, CheckStats, Finding, NetResult, PinView, PowerState, RailStates, Summary } from './types.ts';

// The engine runs in Node and the browser alike; both have a monotonic clock here.
const clock = (globalThis as { performance?: { now(): number } }).performance;
const now = (): number => (clock !== undefined ? clock.now() : Date.now());

/** What a result keeps for the next incremental check, outside the result itself. */
interface Internals {
  readonly index: DesignIndex;
  readonly rules: readonly AnyRule[];
  /** A result's tables are handed on to the next result; a consumed result is not reused. */
  consumed: boolean;
}

const internals = new WeakMap<CheckResult, Internals>();

type NetTable = Map<string, NetResult>;
type LoneTable = Map<string, readonly Finding[]>;

/** Mutable tables behind a result. */
interface Tables {
  nets: Map<string, NetTable>;
  lonePins: Map<string, LoneTable>;
  railFindings: Map<string, readonly Finding[]>;
  summary: { error: number; warning: number; info: number; waived: number };
  netsChecked: number;
}

function count(summary: Tables['summary'], findings: readonly Finding[], sign: 1 | -1): void {
  for (const f of findings) {
    if (f.waived !== undefined) summary.waived += sign;
    else summary[f.severity] += sign;
  }
}

/** The per-state context every preparation needs. */
interface StateContext extends PrepareContext {
  readonly rules: readonly AnyRule[];
}

/**
 * One net in one power state. In a scenario, a net none of whose rails (its pins' and its pulls')
 * is off sees exactly what it sees in `all-on`: its result there is re-stamped for this state.
 */
function checkNet(ctx: StateContext, net: Net, allOn?: NetResult): NetResult {
  if (allOn !== undefined && allOn.net === net && ctx.state.id !== ALL_ON && !touchesOff(allOn, ctx.state) && !setsPins(net, ctx.state)) {
    return {
      net,
      view: { ...allOn.view, state: ctx.state },
      findings: allOn.findings.map((f) => restampFinding(f, ALL_ON, ctx.state, net.id, net)),
    };
  }
  const view = prepareNet(ctx, net);
  const findings: Finding[] = [];
  for (const rule of ctx.rules) {
    if (rule.checkNet === undefined) continue;
    rule.checkNet(view, (draft) => findings.push(completeFinding(rule, draft, ctx.state, net)));
  }
  return { net, view, findings };
}

/** Whether the state gives a pin of the net another role, drive or pull. */
function setsPins(net: Net, state: PowerState): boolean {
  if (state.pins.size === 0) return false;
  for (const key of net.pins) if (state.pins.has(key)) return true;
  return false;
}

function touchesOff(r: NetResult, state: PowerState): boolean {
  if (state.off.size === 0) return false;
  for (const rail of r.view.rails.ranges.keys()) if (state.off.has(rail)) return true;
  return false;
}

function checkLonePin(ctx: StateContext, pin: PinView): Finding[] {
  const found: Finding[] = [];
  for (const rule of ctx.rules) {
    if (rule.checkPin === undefined) continue;
    rule.checkPin({ pin, state: ctx.state, settings: ctx.settings, rails: loneRails(ctx.rails, pin) }, (draft) =>
      found.push(completeFinding(rule, draft, ctx.state, null)),
    );
  }
  return found;
}

/** One (rail, profile) group, judged in `all-on`. */
function checkGroup(ctx: StateContext, index: DesignIndex, rail: Rail, profile: string): Finding[] {
  const range = ctx.rails.onRanges.get(rail.id)!;
  const group = index.groups.get(groupKey(rail.id, profile));
  if (group === undefined) return [];
  const vddRanges = [...group.ranges.values()].map((slot) => slot.range);
  const pinKeys = () => [...group.pins].filter((k) => index.pins.get(k)?.vddRange !== undefined).sort();
  const found: Finding[] = [];
  for (const rule of ctx.rules) {
    if (rule.checkRail === undefined) continue;
    rule.checkRail({ rail, range, profile, vddRanges, pinKeys, state: ctx.state, settings: ctx.settings }, (draft) =>
      found.push(completeFinding(rule, draft, ctx.state, null)),
    );
  }
  return found;
}

/** Every net and lone pin of one power state. */
function checkState(ctx: StateContext, index: DesignIndex, t: Tables): void {
  const perNet: NetTable = new Map();
  const allOn = t.nets.get(ALL_ON);
  for (const net of ctx.design.nets) {
    const r = checkNet(ctx, net, allOn?.get(net.id));
    perNet.set(net.id, r);
    count(t.summary, r.findings, 1);
    t.netsChecked++;
  }
  t.nets.set(ctx.state.id, perNet);
  const lone: LoneTable = new Map();
  // As for nets: a lone pin none of whose rails is off in this state is judged as in all-on.
  const allOnLone = ctx.state.id === ALL_ON ? undefined : t.lonePins.get(ALL_ON);
  const off = ctx.state.off;
  for (const key of index.lone) {
    const at = index.pins.get(key)!;
    const asAllOn = allOnLone !== undefined && !off.has(at.rail) && (at.pullTo === undefined || !off.has(at.pullTo)) && !ctx.state.pins.has(key);
    const was = asAllOn ? allOnLone.get(key) : undefined;
    if (asAllOn && was === undefined) continue;
    // Re-stamped when each id is placed at the pin (`rule:PART.PIN:all-on…`), the place re-stamping writes.
    const found = was !== undefined && was.every((f) => f.id.startsWith(`${f.rule}:${key}:${ALL_ON}`))
      ? was.map((f) => restampFinding(f, ALL_ON, ctx.state, key, null))
      : checkLonePin(ctx, pinView(at, ctx.rails, ctx.state));
    if (found.length > 0) {
      lone.set(key, found);
      count(t.summary, found, 1);
    }
  }
  t.lonePins.set(ctx.state.id, lone);
}

function makeResult(design: Design, states: readonly PowerState[], t: Tables, stats: CheckStats): CheckResult {
  let sorted: Finding[] | undefined;
  const summary: Summary = { ...t.summary };
  const result = {
    design,
    states,
    nets: t.nets,
    lonePins: t.lonePins,
    railFindings: t.railFindings,
    summary,
    stats,
  } as Omit<CheckResult, 'findings'> as CheckResult;
  // The ordered list is built when first read: an edit changes a few entries of the tables,
  // and the editor reads them per net; re-sorting every finding on every keystroke is waste.
  Object.defineProperty(result, 'findings', {
    enumerable: true,
    get(): readonly Finding[] {
      if (sorted === undefined) {
        const all: Finding[] = [];
        for (const s of states) {
          for (const r of t.nets.get(s.id)?.values() ?? []) all.push(...r.findings);
          for (const f of t.lonePins.get(s.id)?.values() ?? []) all.push(...f);
        }
        for (const f of t.railFindings.values()) all.push(...f);
        sorted = sortFindings(
          all,
          new Map(states.map((s, k) => [s.id, k])),
          new Map(design.nets.map((n, k) => [n.id, k])),
        );
      }
      return sorted;
    },
  });
  return result;
}

function fullCheck(design: Design, rules: readonly AnyRule[], started: number): CheckResult {
  const states = powerStates(design);
  const settings = effectiveSettings(design);
  const index = DesignIndex.build(design);
  const t: Tables = {
    nets: new Map(), lonePins: new Map(), railFindings: new Map(),
    summary: { error: 0, warning: 0, info: 0, waived: 0 }, netsChecked: 0,
  };
  for (const state of states) {
    const ctx: StateContext = { design, state, rails: railStates(design, state), settings, pinIndex: index.pins, rules };
    checkState(ctx, index, t);
    if (state.id === ALL_ON) {
      for (const rail of design.rails) {
        for (const group of index.groupsOfRail.get(rail.id) ?? []) {
          const found = checkGroup(ctx, index, rail, splitGroupKey(group)[1]);
          if (found.length > 0) {
            t.railFindings.set(group, found);
            count(t.summary, found, 1);
          }
        }
      }
    }
  }
  const result = makeResult(design, states, t, { netsChecked: t.netsChecked, incremental: false, ms: now() - started });
  internals.set(result, { index, rules, consumed: false });
  return result;
}

/** What changed between two versions of a design, as the sets of things to re-check. */
interface Dirty {
  nets: Set<string>;
  /** Pins whose own data changed (the pin, its part, its profile): nets, groups, lone status. */
  pins: Set<string>;
  /** Pins whose net or rail state changed: their lone status is judged again. */
  lone: Set<string>;
  /** (rail, profile) group keys. */
  groups: Set<string>;
  states: Set<string>;
}

/** True when a part changed only where the rules do not look (position, label). */
function movedOnly(old: Part, now: Part): boolean {
  return old.rail === now.rail && old.profile === now.profile && old.params === now.params && old.pins === now.pins;
}

function markPinsOf(part: Part, dirty: Dirty): void {
  for (const pin of part.pins) dirty.pins.add(`${part.id}.${pin.id}`);
}

function incrementalCheck(design: Design, prev: CheckResult, inner: Internals, started: number): CheckResult {
  const before = prev.design;
  const { index, rules } = inner;
  const dirty: Dirty = { nets: new Set(), pins: new Set(), lone: new Set(), groups: new Set(), states: new Set() };

  // Power states: a changed scenario is re-checked whole; states come back in the file's order.
  const states = before.scenarios === design.scenarios ? prev.states : powerStates(design);
  const removedStates: string[] = [];
  if (states !== prev.states) {
    const old = new Map(prev.states.map((s) => [s.id, s]));
    for (const s of states) if (old.get(s.id)?.scenario !== s.scenario || !old.has(s.id)) dirty.states.add(s.id);
    const ids = new Set(states.map((s) => s.id));
    for (const s of prev.states) if (!ids.has(s.id)) removedStates.push(s.id);
  }

  // Rails: everything on a changed rail, or pulled to it.
  const oldRails = new Map<string, Rail>();
  if (before.rails !== design.rails) for (const r of before.rails) oldRails.set(r.id, r);
  changedById(before.rails, design.rails, (id) => oldRails.get(id), (old, now) => {
    const id = (now ?? old)!.id;
    for (const g of index.groupsOfRail.get(id) ?? []) dirty.groups.add(g);
    index.touchingRail(id, dirty.nets, dirty.lone);
    // A pin that a power state pulls to this rail depends on it too.
    for (const sc of design.scenarios ?? []) for (const p of sc.pins ?? []) if (p.pull?.to === id) dirty.pins.add(p.pin);
  });

  // Design-local profiles: every pin that uses a changed id.
  const profilePins = new Set<string>();
  if (before.profiles !== design.profiles) {
    const old = new Map((before.profiles ?? []).map((p) => [p.id, p]));
    const now = new Map((design.profiles ?? []).map((p) => [p.id, p]));
    for (const id of new Set([...old.keys(), ...now.keys()])) {
      if (old.get(id) === now.get(id)) continue;
      for (const key of index.pinsUsingProfile(id)) {
        dirty.pins.add(key);
        profilePins.add(key);
      }
    }
  }

  // Parts: a part that only moved or was relabelled changes nothing the rules see.
  const partChanges: [Part | undefined, Part | undefined][] = [];
  changedById(before.parts, design.parts, (id) => index.parts.get(id), (old, now) => {
    partChanges.push([old, now]);
    if (old !== undefined && now !== undefined && old.rail === now.rail && old.profile === now.profile && old.params === now.params) {
      if (old.pins === now.pins) return; // moved or relabelled
      const oldPins = new Map(old.pins.map((p) => [p.id, p]));
      for (const pin of now.pins) if (oldPins.get(pin.id) !== pin) dirty.pins.add(`${now.id}.${pin.id}`);
      const ids = new Set(now.pins.map((p) => p.id));
      for (const pin of old.pins) if (!ids.has(pin.id)) dirty.pins.add(`${old.id}.${pin.id}`);
      return;
    }
    if (old !== undefined) markPinsOf(old, dirty);
    if (now !== undefined) markPinsOf(now, dirty);
  });

  // Nets: changed ones directly, and every pin that joins or leaves one.
  const netChanges: [Net | undefined, Net | undefined][] = [];
  changedById(before.nets, design.nets, (id) => index.nets.get(id), (old, now) => {
    netChanges.push([old, now]);
    dirty.nets.add((now ?? old)!.id);
    for (const key of old?.pins ?? []) dirty.lone.add(key);
    for (const key of now?.pins ?? []) dirty.lone.add(key);
  });

  // A changed pin re-checks the net it was on, its (rail, profile) group, and itself if alone.
  const touch = () => {
    for (const key of dirty.pins) {
      const n = index.netOfPin.get(key);
      if (n !== undefined) dirty.nets.add(n);
      const at = index.pins.get(key);
      if (at !== undefined) dirty.groups.add(groupKey(at.rail, at.profile));
    }
  };
  touch();

  // Bring the index up to date.
  for (const [old, now] of partChanges) {
    if (old !== undefined && now !== undefined && movedOnly(old, now)) index.retargetPart(now);
    else {
      if (old !== undefined) index.removePart(old);
      if (now !== undefined) index.addPart(design, now);
    }
  }
  // Pins whose design-local profile changed keep their part: refresh what the index holds of them.
  for (const key of profilePins) index.refreshPin(design, key);
  for (const [old] of netChanges) if (old !== undefined) index.removeNet(old);
  for (const [, now] of netChanges) if (now !== undefined) index.addNet(now);
  touch();

  // Re-check, taking over the previous result's tables.
  inner.consumed = true;
  const t: Tables = {
    nets: prev.nets as Map<string, NetTable>,
    lonePins: prev.lonePins as Map<string, LoneTable>,
    railFindings: prev.railFindings as Map<string, readonly Finding[]>,
    summary: { ...prev.summary },
    netsChecked: 0,
  };
  for (const id of removedStates) {
    for (const r of t.nets.get(id)?.values() ?? []) count(t.summary, r.findings, -1);
    for (const f of t.lonePins.get(id)?.values() ?? []) count(t.summary, f, -1);
    t.nets.delete(id);
    t.lonePins.delete(id);
  }
  const settings = effectiveSettings(design);
  for (const state of states) {
    const rails: RailStates = railStates(design, state);
    const ctx: StateContext = { design, state, rails, settings, pinIndex: index.pins, rules };
    if (dirty.states.has(state.id)) {
      for (const r of t.nets.get(state.id)?.values() ?? []) count(t.summary, r.findings, -1);
      for (const f of t.lonePins.get(state.id)?.values() ?? []) count(t.summary, f, -1);
      checkState(ctx, index, t);
    } else {
      const perNet = t.nets.get(state.id)!;
      for (const id of dirty.nets) {
        const old = perNet.get(id);
        if (old !== undefined) count(t.summary, old.findings, -1);
        const net = index.nets.get(id);
        if (net === undefined) { perNet.delete(id); continue; }
        const r = checkNet(ctx, net, t.nets.get(ALL_ON)?.get(id));
        perNet.set(id, r);
        count(t.summary, r.findings, 1);
        t.netsChecked++;
      }
      const lone = t.lonePins.get(state.id)!;
      for (const key of dirty.pins) dirty.lone.add(key);
      for (const key of dirty.lone) {
        const old = lone.get(key);
        if (old !== undefined) { count(t.summary, old, -1); lone.delete(key); }
        const at = index.pins.get(key);
        if (at === undefined || index.netOfPin.has(key)) continue;
        const found = checkLonePin(ctx, pinView(at, rails, state));
        if (found.length > 0) { lone.set(key, found); count(t.summary, found, 1); }
      }
    }
    if (state.id === ALL_ON && dirty.groups.size > 0) {
      const railById = new Map(design.rails.map((r) => [r.id, r]));
      for (const group of dirty.groups) {
        const old = t.railFindings.get(group);
        if (old !== undefined) { count(t.summary, old, -1); t.railFindings.delete(group); }
        const [railId, profile] = splitGroupKey(group);
        const rail = railById.get(railId);
        if (rail === undefined || !index.groups.has(group)) continue;
        const found = checkGroup(ctx, index, rail, profile);
        if (found.length > 0) { t.railFindings.set(group, found); count(t.summary, found, 1); }
      }
    }
  }
  const result = makeResult(design, states, t, { netsChecked: t.netsChecked, incremental: true, ms: now() - started });
  internals.set(result, { index, rules, consumed: false });
  return result;
}

/**
 * Checks every rule of the catalogue on every net in every power state.
 *
 * `previous` is handed over: the new result takes over its tables, and `previous` must not be
 * read afterwards (passing a consumed result again simply gives a full check).
 */
export function check(design: Design, previous?: CheckResult, rules: readonly AnyRule[] = RULES): CheckResult {
  const started = now();
  if (previous !== undefined) {
    const inner = internals.get(previous);
    if (inner !== undefined && !inner.consumed && inner.rules === rules) {
      if (previous.design === design) return previous;
      if (previous.design.settings === design.settings && previous.design.format === design.format) {
        return incrementalCheck(design, previous, inner, started);
      }
    }
  }
  return fullCheck(design, rules, started);
}

