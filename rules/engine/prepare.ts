/**
 * Preparing a net once per power state: its pins resolved, drivers and receivers by kind, pulls,
 * capacitance, load currents and the level analysis. Every rule reads this one view.
 */
import type { Design, Net, PinState, Pull } from '../model/schema.ts';
import { pullEnds } from '../model/pullRange.ts';
import { analyseNet } from './analyse.ts';
import { driverLoad } from './netMath.ts';
import { GROUND } from './powerStates.ts';
import { viewOf } from './resolve.ts';
import type { PinEntry } from './designIndex.ts';
import type { Range } from '../levels/rails.ts';
import type { DriverLoad, EffectiveSettings, NetView, PinView, PowerState, PullSource, RailStates } from './types.ts';

/** Where each `PART.PIN` of the design lives, with its resolution (the engine's index). */
export type PinIndex = ReadonlyMap<string, PinEntry>;

/**
 * A pin in a power state: powered unless its rail is off (or unknown to the design), with the
 * role, drive and internal pull the state gives it (a controller's pins at reset).
 */
export function pinView(at: PinEntry, rails: RailStates, state?: PowerState): PinView {
  const view = viewOf(at.resolution, !rails.off.has(at.rail) && rails.ranges.has(at.rail));
  const set = state?.pins.get(view.key);
  return set === undefined ? view : withState(view, set);
}

function withState(view: PinView, set: PinState): PinView {
  const role = set.role ?? view.role;
  const drive = role === 'input' ? undefined : set.drive ?? (set.role === undefined ? view.drive : view.pin.drive ?? (role === 'output' ? 'push-pull' : 'three-state'));
  const pull = set.pull === undefined ? view.pull : set.pull === null ? undefined : set.pull;
  return { ...view, role, drive, pull };
}

export interface PrepareContext {
  readonly design: Design;
  readonly state: PowerState;
  readonly rails: RailStates;
  readonly settings: EffectiveSettings;
  readonly pinIndex: PinIndex;
}

function pullSource(pull: Pull, origin: string): PullSource {
  const ends = pullEnds(pull);
  return { ohms: pull.ohms, min: ends.min, max: ends.max, to: pull.to, origin };
}

/** The prepared view of one net in one power state. */
export function prepareNet(ctx: PrepareContext, net: Net): NetView {
  const { settings } = ctx;
  const pins: PinView[] = [];
  for (const key of net.pins) {
    const at = ctx.pinIndex.get(key);
    if (at !== undefined) pins.push(pinView(at, ctx.rails, ctx.state));
  }
  const drivers = pins.filter((p) => p.powered && p.role !== 'input');
  const receivers = pins.filter((p) => p.powered && p.role !== 'output');
  const unpowered = pins.filter((p) => !p.powered);

  const pulls: PullSource[] = [];
  if (net.pull !== undefined) pulls.push(pullSource(net.pull, 'net'));
  for (const p of pins) if (p.pull !== undefined) pulls.push(pullSource(p.pull, p.key));

  let capacitance = net.wiringCapacitance ?? settings.defaultWiringCapacitance;
  for (const p of pins) capacitance += p.params.cin ?? 0;

  const highFromPull =
    drivers.length > 0 && drivers.every((d) => d.drive === 'open-drain') && pulls.some((p) => p.to !== GROUND);

  const rails = netRails(ctx.rails, pins, pulls);
  const loads = new Map<string, DriverLoad>();
  for (const d of drivers) loads.set(d.key, driverLoad(d, pins, pulls, rails));

  const pinRails: string[] = [];
  for (const p of pins) if (!pinRails.includes(p.rail)) pinRails.push(p.rail);

  const analysis = analyseNet({ pins, drivers, receivers, pulls, highFromPull, loads, rails, settings });
  return {
    net, settings, rails, pins, drivers, receivers, unpowered, pulls,
    capacitance, highFromPull, loads, pinRails, analysis,
  };
}

/**
 * The rail states a pin on no net depends on: its own rail and its internal pull's. A lone pin's
 * rules see nothing else, so that in a power state where neither is off it is judged exactly as
 * with every rail on (check.ts re-stamps its findings).
 */
export function loneRails(all: RailStates, pin: PinView): RailStates {
  return railsOf(all, pin.pull === undefined || pin.pull.to === GROUND || pin.pull.to === pin.rail ? [pin.rail] : [pin.rail, pin.pull.to]);
}

/**
 * The rail states a net depends on: its pins' rails and its pulls' rails, nothing else, so that
 * a net's view changes only when something it depends on changes.
 */
function netRails(all: RailStates, pins: readonly PinView[], pulls: readonly PullSource[]): RailStates {
  // Nets on the same rails share one object: most nets of a board sit on one or two rails.
  const ids: string[] = [];
  for (const p of pins) if (!ids.includes(p.rail)) ids.push(p.rail);
  for (const p of pulls) if (p.to !== GROUND && !ids.includes(p.to)) ids.push(p.to);
  return railsOf(all, ids);
}

/** `all` restricted to the rails `ids` (sorted here); one object per set of rails. */
function railsOf(all: RailStates, ids: string[]): RailStates {
  ids.sort();
  const key = ids.join('\u0000');
  let memo = netRailsMemo.get(all);
  if (memo === undefined) {
    memo = new Map();
    netRailsMemo.set(all, memo);
  }
  const hit = memo.get(key);
  if (hit !== undefined) return hit;
  const made = restrictRails(all, ids);
  memo.set(key, made);
  return made;
}

const netRailsMemo = new WeakMap<RailStates, Map<string, RailStates>>();

function restrictRails(all: RailStates, ids: readonly string[]): RailStates {
  const ranges = new Map<string, Range>();
  const onRanges = new Map<string, Range>();
  const off = new Set<string>();
  const take = (id: string) => {
    if (ranges.has(id)) return;
    const r = all.ranges.get(id);
    if (r === undefined) return;
    ranges.set(id, r);
    onRanges.set(id, all.onRanges.get(id)!);
    if (all.off.has(id)) off.add(id);
  };
  for (const id of ids) take(id);
  return { ranges, onRanges, off };
}
