/**
 * `check(design, previous?)`: the engine's one entry point (architecture.md, "The engine's
 * contract"). It takes the plain v1 document as the editor holds it and never validates it.
 *
 * A result is a value: nothing a later `check` does changes it. Its tables are maps made of
 * shared buckets (chunkedMap.ts): an incremental check copies the few buckets it re-checks and
 * shares the rest with the result it came from, so keeping both costs little. Measured with
 * `npm run bench`: the copy is a small part of an edit's time (README, "Performance").
 *
 * With `previous` (the result for an earlier version of the same document, sharing the objects
 * that did not change, as immer does) it re-checks only what an edit touched, in three stages:
 * what changed (a diff to a dirty set), re-check the dirty nets, lone pins and rail groups
 * (`all-on` first, since a scenario re-stamps from it), and keep every clean entry as it was.
 * The result is the same as a full check; a property test holds the two together.
 */
import type { Design, Discrete, Net, Part, Rail } from '../model/schema.ts';
import { RULES } from '../checks/index.ts';
import type { AnyRule, Draft, MessageFns } from '../engine/rule.ts';
import { ALL_ON, effectiveSettings, powerStates, railStates } from '../engine/powerStates.ts';
import { namesOf } from '../engine/names.ts';
import { loneRails, pinView, prepareNet, type PrepareContext } from '../engine/prepare.ts';
import { completeFinding, restampFinding, sortFindings } from '../engine/findings.ts';
import { DesignIndex, groupKey, splitGroupKey } from '../engine/designIndex.ts';
import { changedById } from '../engine/diff.ts';
import { ChunkedMap, tallyOf } from '../engine/chunkedMap.ts';
import { type Injection, injectionsOf } from '../engine/injection.ts';
import type { CheckResult, CheckStats, Finding, NetResult, PinView, PowerState, Summary } from '../engine/types.ts';

// The engine runs in Node and the browser alike; both have a monotonic clock here.
const clock = (globalThis as { performance?: { now(): number } }).performance;
const now = (): number => (clock !== undefined ? clock.now() : Date.now());

/**
 * What a result keeps for the next incremental check, outside the result itself. The index is
 * brought up to date in place by the next check, so it serves one successor: a result handed to
 * `check` a second time gives a full check (correct, only slower).
 */
interface Internals {
  readonly index: DesignIndex;
  readonly rules: readonly AnyRule[];
  consumed: boolean;
}

const internals = new WeakMap<CheckResult, Internals>();

type NetTable = ChunkedMap<NetResult>;
type LoneTable = ChunkedMap<readonly Finding[]>;

/** A result's tables: values, never changed once made. */
interface Tables {
  readonly nets: ReadonlyMap<string, NetTable>;
  readonly lonePins: ReadonlyMap<string, LoneTable>;
  readonly railFindings: LoneTable;
  /** Per power state: the findings on clamp current into rails, derived from the net tables. */
  readonly injection: ReadonlyMap<string, readonly Finding[]>;
}

// ---------------------------------------------------------------------------------------------
// The summary, derived from the tables. A full check counts every finding. An edit counts only
// the entries it replaced: each table change passes through `Tally.replace` with the entry it
// had and the entry it has, so the summary is the earlier one plus what those entries add and
// take away (a finding's severity and waiver are its own, so an entry kept is counted as it was).

type Counts = { error: number; warning: number; info: number; waived: number };
const zero = (): Counts => ({ error: 0, warning: 0, info: 0, waived: 0 });
const add = (into: Counts, part: Counts): void => {
  into.error += part.error;
  into.warning += part.warning;
  into.info += part.info;
  into.waived += part.waived;
};
function countInto(into: Counts, findings: readonly Finding[], sign: 1 | -1 = 1): void {
  for (const f of findings) {
    if (f.waived !== undefined) into.waived += sign;
    else into[f.severity] += sign;
  }
}

/** The counts an edit's replaced entries change the summary by. */
class Tally {
  readonly counts = zero();

  replace(was: readonly Finding[] | undefined, now: readonly Finding[] | undefined): void {
    if (was === now) return;
    if (was !== undefined) countInto(this.counts, was, -1);
    if (now !== undefined) countInto(this.counts, now, 1);
  }

  /** A whole table replaced (a power state judged whole, added or gone). */
  replaceTables(
    was: Pick<StateTables, 'nets' | 'lone'> | undefined,
    now: Pick<StateTables, 'nets' | 'lone'> | undefined,
  ): void {
    // Bucket by bucket: a generator's entries cost an object each, and this walks every net.
    if (was !== undefined) {
      for (const b of was.nets.chunks()) for (const r of b.values()) this.replace(r.findings, undefined);
      for (const b of was.lone.chunks()) for (const f of b.values()) this.replace(f, undefined);
    }
    if (now !== undefined) {
      for (const b of now.nets.chunks()) for (const r of b.values()) this.replace(undefined, r.findings);
      for (const b of now.lone.chunks()) for (const f of b.values()) this.replace(undefined, f);
    }
  }

  /** The summary `was` moved by these counts. */
  applyTo(was: Summary): Summary {
    const total: Counts = { error: was.error, warning: was.warning, info: was.info, waived: was.waived };
    add(total, this.counts);
    return total;
  }
}

/** Every finding of the tables counted: a full check's summary. */
export function summarise(t: Tables): Summary {
  const tally = new Tally();
  for (const [state, nets] of t.nets) tally.replaceTables(undefined, { nets, lone: t.lonePins.get(state)! });
  for (const f of t.railFindings.values()) tally.replace(undefined, f);
  for (const f of t.injection.values()) tally.replace(undefined, f);
  return tally.applyTo(zero());
}

// ---------------------------------------------------------------------------------------------
// Clamp current per rail, derived from the net tables: each bucket's currents are cached by the
// bucket's identity, so an edit measures again only the buckets it copied.

type Injected = { pin: string; net: string; current: number };
type InjectionTally = Map<string, Injected[]>;
const injectionTallies = new WeakMap<object, InjectionTally>();
const measureInjection = (bucket: ReadonlyMap<string, NetResult>): InjectionTally => {
  const out: InjectionTally = new Map();
  for (const r of bucket.values()) {
    if (r.view.path === undefined) continue;
    for (const x of injectionsOf(r.view)) {
      let list = out.get(x.rail);
      if (list === undefined) out.set(x.rail, (list = []));
      list.push({ pin: x.pin, net: r.net.id, current: x.current });
    }
  }
  return out;
};
const addInjection = (into: InjectionTally, part: InjectionTally): void => {
  for (const [rail, list] of part) {
    const have = into.get(rail);
    if (have === undefined) into.set(rail, [...list]);
    else have.push(...list);
  }
};

/** The findings on clamp current into each rail in one power state. */
function injectionFindings(ctx: StateContext, index: DesignIndex, nets: NetTable): Finding[] {
  const rules = ctx.rules.filter((r) => r.checkInjection !== undefined);
  if (rules.length === 0 || index.discretes.size === 0) return [];
  const tally = tallyOf(nets, injectionTallies, measureInjection, addInjection, () => new Map());
  const found: Finding[] = [];
  for (const rail of ctx.design.rails) {
    const list = tally.get(rail.id);
    if (list === undefined || list.length === 0) continue;
    const injected = [...list].sort((a, b) => (a.pin < b.pin ? -1 : a.pin > b.pin ? 1 : 0));
    for (const rule of rules) {
      rule.checkInjection!({ rail, names: ctx.names, injected, state: ctx.state, settings: ctx.settings }, (draft) =>
        found.push(completeFinding(rule, draft, ctx.state, null, undefined, ctx.names)),
      );
    }
  }
  return found;
}

// ---------------------------------------------------------------------------------------------
// Judging one net, one lone pin, one (rail, profile) group.

/** The per-state context every preparation needs. */
interface StateContext extends PrepareContext {
  readonly rules: readonly AnyRule[];
}

function contextFor(design: Design, state: PowerState, index: DesignIndex, rules: readonly AnyRule[]): StateContext {
  return {
    design,
    state,
    rails: railStates(design, state),
    settings: effectiveSettings(design),
    pinIndex: index.pins,
    names: namesOf(design, index.nets),
    rules,
    ...(index.discretes.size === 0 ? {} : { links: index }),
  };
}

/**
 * One net in one power state. In a scenario, a net none of whose rails (its pins' and its pulls')
 * is off sees exactly what it sees in `all-on`: its result there is re-stamped for this state.
 */
function checkNet(ctx: StateContext, net: Net, allOn?: NetResult): NetResult {
  if (
    allOn !== undefined &&
    allOn.net === net &&
    ctx.state.id !== ALL_ON &&
    !touchesOff(allOn, ctx.state) &&
    !setsPins(net, ctx.state)
  ) {
    return {
      net,
      view: allOn.view,
      findings: allOn.findings.map((f) => restampFinding(f, ctx.state, net)),
    };
  }
  const view = prepareNet(ctx, net);
  const findings: Finding[] = [];
  // One report function for every rule of the net (a closure per rule and net was 180,000 of them
  // in a check of 10,000 parts): it files the draft under the rule being run.
  let rule: AnyRule = ctx.rules[0]!;
  const report = (draft: Draft<MessageFns>) => {
    findings.push(completeFinding(rule, draft, ctx.state, net));
  };
  for (const r of ctx.rules) {
    if (r.checkNet === undefined) continue;
    rule = r;
    r.checkNet(view, report);
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

function checkLonePin(ctx: StateContext, pin: PinView): readonly Finding[] {
  // One view and one report function for every rule, as for a net: thousands of lone pins.
  const view = { pin, names: ctx.names, settings: ctx.settings, rails: loneRails(ctx.rails, pin) };
  let found: Finding[] | undefined;
  let rule: AnyRule = ctx.rules[0]!;
  const report = (draft: Draft<MessageFns>) => {
    (found ??= []).push(completeFinding(rule, draft, ctx.state, null, pin.key, ctx.names, pin.pin.waivers));
  };
  for (const r of ctx.rules) {
    if (r.checkPin === undefined) continue;
    rule = r;
    r.checkPin(view, report);
  }
  return found ?? NO_FINDINGS;
}

const NO_FINDINGS: readonly Finding[] = Object.freeze([]);

/**
 * A lone pin in one power state. In a scenario, a pin none of whose rails (its own, its pull's)
 * is off, and whose role, drive and pull the state leaves alone, is judged as in `all-on`: its
 * findings there are re-stamped (none there, none here).
 */
function judgeLonePin(
  ctx: StateContext,
  index: DesignIndex,
  key: string,
  allOn: LoneTable | undefined,
): readonly Finding[] {
  const at = index.pins.get(key)!;
  const off = ctx.state.off;
  if (
    allOn !== undefined &&
    !off.has(at.rail) &&
    (at.pullTo === undefined || !off.has(at.pullTo)) &&
    !ctx.state.pins.has(key)
  ) {
    const had = allOn.get(key);
    return had === undefined ? NO_FINDINGS : had.map((f) => restampFinding(f, ctx.state, null, at.pin.waivers));
  }
  return checkLonePin(ctx, pinView(at, ctx.rails, ctx.state));
}

/** One (rail, profile) group, judged in `all-on`. */
function checkGroup(ctx: StateContext, index: DesignIndex, rail: Rail, profile: string): Finding[] {
  const range = ctx.rails.onRanges.get(rail.id)!;
  const group = index.groups.get(groupKey(rail.id, profile));
  if (group === undefined) return [];
  const vddRanges = [...group.ranges.values()].map((slot) => slot.range);
  const pinKeys = () => index.rangedPins(group).keys();
  const partIds = () => index.rangedPins(group).parts();
  const found: Finding[] = [];
  for (const rule of ctx.rules) {
    if (rule.checkRail === undefined) continue;
    rule.checkRail(
      { rail, names: ctx.names, range, profile, vddRanges, pinKeys, partIds, settings: ctx.settings },
      (draft) => found.push(completeFinding(rule, draft, ctx.state, null, undefined, ctx.names)),
    );
  }
  return found;
}

// ---------------------------------------------------------------------------------------------
// A whole power state, and a full check.

interface StateTables {
  readonly nets: NetTable;
  readonly lone: LoneTable;
  readonly checked: number;
  /**
   * The state's clamp-current findings when an edit could not have changed them (kept from the
   * earlier result); undefined when they must be derived again from the net tables.
   */
  readonly injection?: readonly Finding[];
}

/** Every net and lone pin of one power state; `allOn` is that state's tables in a scenario. */
function checkState(ctx: StateContext, index: DesignIndex, allOn: StateTables | undefined): StateTables {
  const nets: [string, NetResult][] = [];
  for (const net of ctx.design.nets) nets.push([net.id, checkNet(ctx, net, allOn?.nets.get(net.id))]);
  const lone: [string, readonly Finding[]][] = [];
  for (const key of index.lone) {
    const found = judgeLonePin(ctx, index, key, allOn?.lone);
    if (found.length > 0) lone.push([key, found]);
  }
  return { nets: ChunkedMap.from(nets), lone: ChunkedMap.from(lone), checked: nets.length };
}

/** Every (rail, profile) group of the design. */
function checkGroups(
  ctx: StateContext,
  index: DesignIndex,
  keys: Iterable<string>,
  railFindings: LoneTable,
  tally?: Tally,
): LoneTable {
  const railById = new Map(ctx.design.rails.map((r) => [r.id, r]));
  const changes: [string, readonly Finding[] | undefined][] = [];
  for (const group of keys) {
    const [railId, profile] = splitGroupKey(group);
    const rail = railById.get(railId);
    const found = rail === undefined || !index.groups.has(group) ? [] : checkGroup(ctx, index, rail, profile);
    const now = found.length > 0 ? found : undefined;
    tally?.replace(railFindings.get(group), now);
    changes.push([group, now]);
  }
  return railFindings.with(changes);
}

function makeResult(
  design: Design,
  states: readonly PowerState[],
  t: Tables,
  stats: CheckStats,
  summary: Summary,
): CheckResult {
  let sorted: Finding[] | undefined;
  const result = {
    design,
    states,
    nets: t.nets,
    lonePins: t.lonePins,
    railFindings: t.railFindings,
    injectionFindings: t.injection,
    summary,
    stats,
  } as Omit<CheckResult, 'findings'> as CheckResult;
  // The ordered list is built when first read: an edit changes a few entries of the tables,
  // and the editor reads them per net; re-sorting every finding on every keystroke is waste.
  // It reads this result's own tables, which nothing changes afterwards.
  Object.defineProperty(result, 'findings', {
    enumerable: true,
    get(): readonly Finding[] {
      if (sorted === undefined) {
        const all: Finding[] = [];
        for (const s of states) {
          for (const r of t.nets.get(s.id)?.values() ?? []) all.push(...r.findings);
          for (const f of t.lonePins.get(s.id)?.values() ?? []) all.push(...f);
          all.push(...(t.injection.get(s.id) ?? []));
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

/** `all-on` (always the first power state) and the scenarios, each named for what it is. */
function splitStates(states: readonly PowerState[]): { allOn: PowerState; scenarios: readonly PowerState[] } {
  const allOn = states.find((s) => s.id === ALL_ON);
  if (allOn === undefined) throw new Error('internal: every design has the all-on power state');
  return { allOn, scenarios: states.filter((s) => s !== allOn) };
}

/**
 * Every power state's tables: `all-on` first (a scenario re-stamps from it), then each scenario,
 * each judged by `judge` (whole, or only what an edit dirtied), with the rail injection of each.
 */
function judgeStates(
  design: Design,
  states: readonly PowerState[],
  index: DesignIndex,
  rules: readonly AnyRule[],
  judge: (ctx: StateContext, allOn: StateTables | undefined) => StateTables,
) {
  const { allOn, scenarios } = splitStates(states);
  const allOnCtx = contextFor(design, allOn, index, rules);
  const base = judge(allOnCtx, undefined);
  const nets = new Map<string, NetTable>([[ALL_ON, base.nets]]);
  const lonePins = new Map<string, LoneTable>([[ALL_ON, base.lone]]);
  const injection = new Map<string, readonly Finding[]>([
    [ALL_ON, base.injection ?? injectionFindings(allOnCtx, index, base.nets)],
  ]);
  let checked = base.checked;
  for (const state of scenarios) {
    const ctx = contextFor(design, state, index, rules);
    const s = judge(ctx, base);
    nets.set(state.id, s.nets);
    lonePins.set(state.id, s.lone);
    injection.set(state.id, s.injection ?? injectionFindings(ctx, index, s.nets));
    checked += s.checked;
  }
  return { allOnCtx, nets, lonePins, injection, checked };
}

function fullCheck(design: Design, rules: readonly AnyRule[], started: number): CheckResult {
  const states = powerStates(design);
  const index = DesignIndex.build(design);
  const { allOnCtx, nets, lonePins, injection, checked } = judgeStates(design, states, index, rules, (ctx, allOn) =>
    checkState(ctx, index, allOn),
  );
  const railFindings = checkGroups(allOnCtx, index, index.groups.keys(), ChunkedMap.empty());
  const tables: Tables = { nets, lonePins, railFindings, injection };
  const result = makeResult(
    design,
    states,
    tables,
    { netsChecked: checked, incremental: false, ms: now() - started },
    summarise(tables),
  );
  internals.set(result, { index, rules, consumed: false });
  return result;
}

// ---------------------------------------------------------------------------------------------
// Stage 1: what changed.

/** What changed between two versions of a design, as the sets of things to re-check. */
interface Dirty {
  readonly nets: Set<string>;
  /** Pins whose own data changed (the pin, its part, its profile): nets, groups, lone status. */
  readonly pins: Set<string>;
  /** Pins whose net or rail state changed: their lone status is judged again. */
  readonly lone: Set<string>;
  /** (rail, profile) group keys. */
  readonly groups: Set<string>;
  /** Power states re-checked whole (new or changed scenarios). */
  readonly states: Set<string>;
}

interface Change {
  readonly dirty: Dirty;
  readonly states: readonly PowerState[];
  readonly parts: readonly [Part | undefined, Part | undefined][];
  readonly nets: readonly [Net | undefined, Net | undefined][];
  /** Discretes that changed other than by moving (version 2). */
  readonly discretes: readonly [Discrete | undefined, Discrete | undefined][];
  /** Discretes that only moved or were relabelled: the index takes the new object. */
  readonly movedDiscretes: readonly Discrete[];
  /** Pins whose design-local profile changed (their part did not). */
  readonly profilePins: ReadonlySet<string>;
}

/** True when a part changed only where the rules do not look (position, label). */
function movedOnly(old: Part, now: Part): boolean {
  return old.rail === now.rail && old.profile === now.profile && old.params === now.params && old.pins === now.pins;
}

const sameStrings = (a: readonly string[], b: readonly string[]): boolean =>
  a === b || (a.length === b.length && a.every((x, k) => x === b[k]));

/** What an edit from `prev.design` to `design` changed, read against the previous index. */
function whatChanged(design: Design, prev: CheckResult, index: DesignIndex): Change {
  const before = prev.design;
  const dirty: Dirty = { nets: new Set(), pins: new Set(), lone: new Set(), groups: new Set(), states: new Set() };

  // Power states: a new scenario, or one whose rails or label changed, is re-checked whole; one
  // whose pin states alone changed re-checks the pins it sets or set (their nets, or alone) in
  // every state. States come back in the file's order.
  const states = before.scenarios === design.scenarios ? prev.states : powerStates(design);
  if (states !== prev.states) {
    const old = new Map(prev.states.map((s) => [s.id, s]));
    for (const s of states) {
      const was = old.get(s.id)?.scenario;
      const now = s.scenario;
      if (was === now) continue;
      if (was === undefined || now === undefined || was.label !== now.label || !sameStrings(was.off, now.off)) {
        dirty.states.add(s.id);
        continue;
      }
      const unchanged = new Set(was.pins ?? []);
      for (const p of now.pins ?? []) if (!unchanged.delete(p)) dirty.pins.add(p.pin);
      for (const p of unchanged) dirty.pins.add(p.pin);
    }
  }

  // Rails: everything on a changed rail, or pulled to it.
  const oldRails = new Map<string, Rail>();
  if (before.rails !== design.rails) for (const r of before.rails) oldRails.set(r.id, r);
  changedById(
    before.rails,
    design.rails,
    (id) => oldRails.get(id),
    (old, now) => {
      const id = (now ?? old)!.id;
      for (const g of index.groupsOfRail.get(id) ?? []) dirty.groups.add(g);
      index.touchingRail(id, dirty.nets, dirty.lone);
      // A pin that a power state pulls to this rail depends on it too.
      for (const sc of design.scenarios ?? [])
        for (const p of sc.pins ?? []) if (p.pull?.to === id) dirty.pins.add(p.pin);
    },
  );

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

  // Parts: a part that only moved or was relabelled changes nothing the rules see; a part whose
  // pins alone changed dirties those pins; anything else dirties every pin it had or has.
  const parts: [Part | undefined, Part | undefined][] = [];
  changedById(
    before.parts,
    design.parts,
    (id) => index.parts.get(id),
    (old, now) => {
      parts.push([old, now]);
      if (
        old !== undefined &&
        now !== undefined &&
        old.rail === now.rail &&
        old.profile === now.profile &&
        old.params === now.params
      ) {
        const oldPins = new Map(old.pins.map((p) => [p.id, p]));
        for (const pin of now.pins) if (oldPins.get(pin.id) !== pin) dirty.pins.add(`${now.id}.${pin.id}`);
        const ids = new Set(now.pins.map((p) => p.id));
        for (const pin of old.pins) if (!ids.has(pin.id)) dirty.pins.add(`${old.id}.${pin.id}`);
        return;
      }
      for (const part of [old, now])
        if (part !== undefined) for (const pin of part.pins) dirty.pins.add(`${part.id}.${pin.id}`);
    },
  );

  // Nets: changed ones directly, and every pin that joins or leaves one.
  const nets: [Net | undefined, Net | undefined][] = [];
  changedById(
    before.nets,
    design.nets,
    (id) => index.nets.get(id),
    (old, now) => {
      nets.push([old, now]);
      dirty.nets.add((now ?? old)!.id);
      for (const key of old?.pins ?? []) dirty.lone.add(key);
      for (const key of now?.pins ?? []) dirty.lone.add(key);
    },
  );

  // Discretes: a changed one dirties the nets of its pins (and, below, every net joined to them).
  const discretes: [Discrete | undefined, Discrete | undefined][] = [];
  const movedDiscretes: Discrete[] = [];
  changedById(
    before.discretes ?? NO_DISCRETES,
    design.discretes ?? NO_DISCRETES,
    (id) => index.discretes.get(id),
    (old, now) => {
      if (old !== undefined && now !== undefined && discreteMovedOnly(old, now)) {
        movedDiscretes.push(now);
        return;
      }
      discretes.push([old, now]);
      if (old !== undefined) for (const n of index.netsOfDiscrete(old)) if (n !== undefined) dirty.nets.add(n);
    },
  );

  spreadPins(index, dirty);
  spreadPaths(index, dirty);
  return { dirty, states, parts, nets, discretes, movedDiscretes, profilePins };
}

const NO_DISCRETES: readonly Discrete[] = [];

/** True when a discrete changed only where the rules do not look (position, label). */
function discreteMovedOnly(old: Discrete, now: Discrete): boolean {
  const { position: _p, label: _l, ...a } = old;
  const { position: _q, label: _m, ...b } = now;
  return JSON.stringify(a) === JSON.stringify(b);
}

/** A dirty net re-checks every net that discretes join to it: each sees the others' pins. */
function spreadPaths(index: DesignIndex, dirty: Dirty): void {
  if (index.linksOfNet.size === 0) return;
  const all = new Set<string>();
  for (const n of dirty.nets) if (index.linksOfNet.has(n)) index.componentOf(n, all);
  for (const n of all) dirty.nets.add(n);
}

/** A changed pin re-checks the net it is on, its (rail, profile) group, and itself if alone. */
function spreadPins(index: DesignIndex, dirty: Dirty): void {
  for (const key of dirty.pins) {
    dirty.lone.add(key);
    const n = index.netOfPin.get(key);
    if (n !== undefined) dirty.nets.add(n);
    const at = index.pins.get(key);
    if (at !== undefined) dirty.groups.add(groupKey(at.rail, at.profile));
  }
}

/** Brings the index from the old design to the new one; the dirty set then spreads to new places. */
function advanceIndex(index: DesignIndex, design: Design, change: Change): void {
  // Discretes leave while the nets are still the old ones, and come back once the new nets are in.
  for (const [old] of change.discretes) if (old !== undefined) index.removeDiscrete(old);
  for (const d of change.movedDiscretes) index.discretes.set(d.id, d);
  for (const [old, now] of change.parts) {
    if (old !== undefined && now !== undefined && movedOnly(old, now)) index.retargetPart(now);
    else {
      if (old !== undefined) index.removePart(old);
      if (now !== undefined) index.addPart(design, now);
    }
  }
  for (const key of change.profilePins) index.refreshPin(design, key);
  for (const [old] of change.nets) if (old !== undefined) index.removeNet(old);
  for (const [, now] of change.nets) if (now !== undefined) index.addNet(now);
  for (const [, now] of change.discretes) {
    if (now === undefined) continue;
    index.addDiscrete(now);
    for (const n of index.netsOfDiscrete(now)) if (n !== undefined) change.dirty.nets.add(n);
  }
  spreadPins(index, change.dirty);
  spreadPaths(index, change.dirty);
}

// ---------------------------------------------------------------------------------------------
// Stages 2 and 3: re-check what is dirty, keep what is clean.

/**
 * Whether two results of one net (one id, so the `net` of each current is the same) put the same
 * clamp currents into the same rails through the same pins.
 */
function sameInjections(was: NetResult | undefined, now: NetResult | undefined): boolean {
  const a = was?.view.path === undefined ? NO_INJECTIONS : injectionsOf(was.view);
  const b = now?.view.path === undefined ? NO_INJECTIONS : injectionsOf(now.view);
  if (a.length !== b.length) return false;
  for (let k = 0; k < a.length; k++) {
    const x = a[k]!;
    const y = b[k]!;
    if (x.pin !== y.pin || x.rail !== y.rail || !Object.is(x.current, y.current)) return false;
  }
  return true;
}

const NO_INJECTIONS: readonly Injection[] = [];

/** One power state after an edit: its dirty nets and lone pins judged again, the rest kept. */
function recheckState(
  ctx: StateContext,
  index: DesignIndex,
  dirty: Dirty,
  was: StateTables,
  allOn: StateTables | undefined,
  injectionWas: readonly Finding[] | undefined,
  tally: Tally,
): StateTables {
  const netChanges: [string, NetResult | undefined][] = [];
  // Clamp current flows only through the paths of parts between chips: an edit whose re-checked
  // nets inject what they injected before (none, for a net without such a path) leaves the
  // state's injection findings as they were.
  let injectionChanged = false;
  for (const id of dirty.nets) {
    const net = index.nets.get(id);
    const now = net === undefined ? undefined : checkNet(ctx, net, allOn?.nets.get(id));
    const before = was.nets.get(id);
    if (!injectionChanged && !sameInjections(before, now)) injectionChanged = true;
    tally.replace(before?.findings, now?.findings);
    netChanges.push([id, now]);
  }
  const loneChanges: [string, readonly Finding[] | undefined][] = [];
  for (const key of dirty.lone) {
    const alone = index.pins.has(key) && !index.netOfPin.has(key);
    const found = alone ? judgeLonePin(ctx, index, key, allOn?.lone) : [];
    const now = found.length > 0 ? found : undefined;
    tally.replace(was.lone.get(key), now);
    loneChanges.push([key, now]);
  }
  return {
    nets: was.nets.with(netChanges),
    lone: was.lone.with(loneChanges),
    checked: netChanges.length,
    ...(injectionChanged || injectionWas === undefined ? {} : { injection: injectionWas }),
  };
}

function incrementalCheck(design: Design, prev: CheckResult, inner: Internals, started: number): CheckResult {
  const { index, rules } = inner;
  inner.consumed = true;
  const change = whatChanged(design, prev, index);
  advanceIndex(index, design, change);
  const { dirty, states } = change;

  const previous = (id: string): StateTables | undefined => {
    const nets = prev.nets.get(id) as NetTable | undefined;
    const lone = prev.lonePins.get(id) as LoneTable | undefined;
    return nets === undefined || lone === undefined ? undefined : { nets, lone, checked: 0 };
  };
  const tally = new Tally();
  const { allOnCtx, nets, lonePins, injection, checked } = judgeStates(design, states, index, rules, (ctx, allOn) => {
    // all-on always has tables to re-check from; a new or changed scenario is judged whole.
    const was = previous(ctx.state.id);
    // Kept only while the rails (their minimum loads, labels and ranges) are the same objects.
    const injectionWas = design.rails === prev.design.rails ? prev.injectionFindings.get(ctx.state.id) : undefined;
    if (allOn !== undefined && (dirty.states.has(ctx.state.id) || was === undefined)) {
      const whole = checkState(ctx, index, allOn);
      tally.replaceTables(was, whole);
      return whole;
    }
    return recheckState(ctx, index, dirty, was!, allOn, injectionWas, tally);
  });
  // Power states gone with the edit take their findings with them.
  for (const s of prev.states) {
    if (nets.has(s.id)) continue;
    tally.replaceTables(previous(s.id), undefined);
    tally.replace(prev.injectionFindings.get(s.id), undefined);
  }
  for (const [state, found] of injection) tally.replace(prev.injectionFindings.get(state), found);
  const railFindings = checkGroups(allOnCtx, index, dirty.groups, prev.railFindings as LoneTable, tally);
  const result = makeResult(
    design,
    states,
    { nets, lonePins, railFindings, injection },
    { netsChecked: checked, incremental: true, ms: now() - started },
    tally.applyTo(prev.summary),
  );
  internals.set(result, { index, rules, consumed: false });
  return result;
}

/**
 * Checks every rule of the catalogue on every net in every power state.
 *
 * `previous` is read, never changed: it stays a valid result of its own design. Its index is
 * brought forward for the new result, so a result handed to `check` a second time gives a
 * full check.
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
