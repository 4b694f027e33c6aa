/**
 * Preparing a net once per power state: its pins resolved, drivers and receivers by kind, pulls,
 * capacitance, load currents and the level analysis. Every rule reads this one view.
 */
import { driveOf } from '../model/pinDefaults.ts';
import type { Design, Discrete, Net, PinState, Pull } from '../model/schema.ts';
import { pullEnds } from '../model/pullRange.ts';
import { analyseNet } from './analyse.ts';
import {
  linkedRails,
  linksOf,
  nodeOf,
  pathEdgeOf,
  pathLoad,
  remoteDriversOf,
  unjudgedChains,
  remotePairs,
  shifterLoad,
  shiftersBeyond,
  type PathSource,
} from './paths.ts';
import { driverLoad } from './netMath.ts';
import { GROUND } from './powerStates.ts';
import { viewOf } from './resolve.ts';
import type { PinEntry } from './designIndex.ts';
import type { Names } from './names.ts';
import type { Range } from '../levels/rails.ts';
import type { DriverLoad, EffectiveSettings, NetView, PinView, PowerState, PullSource, RailStates } from './types.ts';

/** Where each `PART.PIN` of the design lives, with its resolution (the engine's index). */
export type PinIndex = ReadonlyMap<string, PinEntry>;

/**
 * A pin in a power state: powered unless its rail is off (or unknown to the design), with the
 * role, drive and internal pull the state gives it (a controller's pins at reset).
 */
export function pinView(at: PinEntry, rails: RailStates, state?: PowerState): PinView {
  const view = viewOf(at, !rails.off.has(at.rail) && rails.ranges.has(at.rail));
  const set = state?.pins.get(view.key);
  return set === undefined ? view : withState(view, set);
}

function withState(view: PinView, set: PinState): PinView {
  const role = set.role ?? view.role;
  // A state that gives only a drive keeps the role; one that gives a role takes the format's
  // default drive for it unless it names one.
  const drive =
    role === 'input'
      ? undefined
      : (set.drive ?? (set.role === undefined ? view.drive : driveOf({ role, drive: view.pin.drive })));
  const pull = set.pull === undefined ? view.pull : set.pull === null ? undefined : set.pull;
  return { ...view, role, drive, pull };
}

export interface PrepareContext {
  readonly design: Design;
  readonly state: PowerState;
  readonly rails: RailStates;
  readonly settings: EffectiveSettings;
  readonly pinIndex: PinIndex;
  readonly names: Names;
  /** The design's discretes and nets, for nets joined by them (version 2). */
  readonly links?: {
    readonly discretes: ReadonlyMap<string, Discrete>;
    readonly linksOfNet: ReadonlyMap<string, ReadonlySet<string>>;
    readonly netOfPin: ReadonlyMap<string, string>;
    readonly nets: ReadonlyMap<string, Net>;
  };
}

/** A pull as the engine sees it: its value and the ends of its range. */
export function pullSource(pull: Pull, origin: string): PullSource {
  const ends = pullEnds(pull);
  return { ohms: pull.ohms, min: ends.min, max: ends.max, to: pull.to, origin };
}

const NONE: readonly never[] = Object.freeze([]);

/** A shifter's pin on the other side. */
const OTHER_PIN: Readonly<Record<string, string>> = { S: 'D', D: 'S', K: 'A', A: 'K' };

function pinsOfNet(ctx: PrepareContext, net: Net): PinView[] {
  const pins: PinView[] = [];
  for (const key of net.pins) {
    const at = ctx.pinIndex.get(key);
    if (at !== undefined) pins.push(pinView(at, ctx.rails, ctx.state));
  }
  return pins;
}

/** The prepared view of one net in one power state. */
export function prepareNet(ctx: PrepareContext, net: Net): NetView {
  const links = ctx.links;
  if (links?.linksOfNet.has(net.id)) return prepareLinkedNet(ctx, net);
  const { settings } = ctx;
  const pins = pinsOfNet(ctx, net);
  // One pass over the pins for everything that is per pin (this runs for every net of every
  // power state; three filters and four loops cost measurably more).
  const drivers: PinView[] = [];
  const receivers: PinView[] = [];
  const unpowered: PinView[] = [];
  const pulls: PullSource[] = [];
  if (net.pull !== undefined) pulls.push(pullSource(net.pull, 'net'));
  let capacitance = net.wiringCapacitance ?? settings.defaultWiringCapacitance;
  const pinRails: string[] = [];
  let allOpenDrain = true;
  for (const p of pins) {
    if (p.powered) {
      if (p.role !== 'input') {
        drivers.push(p);
        if (p.drive !== 'open-drain') allOpenDrain = false;
      }
      if (p.role !== 'output') receivers.push(p);
    } else unpowered.push(p);
    if (p.pull !== undefined) pulls.push(pullSource(p.pull, p.key));
    capacitance += p.params.cin ?? 0;
    if (!pinRails.includes(p.rail)) pinRails.push(p.rail);
  }

  let pullsUp = false;
  for (const p of pulls) if (p.to !== GROUND) pullsUp = true;
  const highFromPull = drivers.length > 0 && allOpenDrain && pullsUp;

  const rails = netRails(ctx.rails, pins, pulls);
  const loads = new Map<string, DriverLoad>();
  for (const d of drivers) loads.set(d.key, driverLoad(d, pins, pulls, rails));

  const analysis = analyseNet({ pins, drivers, receivers, pulls, highFromPull, loads, rails, settings });
  return {
    net,
    names: ctx.names,
    settings,
    rails,
    pins,
    drivers,
    receivers,
    unpowered,
    pulls,
    capacitance,
    highFromPull,
    loads,
    pinRails,
    analysis,
    shifters: NONE,
    remoteDrivers: NONE,
    pathRails: pinRails,
    unjudged: NONE,
  };
}

/**
 * A net that discrete parts join to others: its own pulls include the resistors tied to a rail,
 * its analysis adds the pairs whose driver reaches it through series resistors or a shifter, and
 * its loads the currents a driver here delivers through them.
 */
function prepareLinkedNet(ctx: PrepareContext, net: Net): NetView {
  const { settings } = ctx;
  const links = ctx.links!;
  const src: PathSource = {
    ...links,
    pinsOf: (n) => pinsOfNet(ctx, n),
    wiring: settings.defaultWiringCapacitance,
  };
  const self = nodeOf(net, src);
  const { pins, pulls, capacitance } = self;
  const { path, shifters } = linksOf(net, self, src);
  const drivers = pins.filter((p) => p.powered && p.role !== 'input');
  const receivers = pins.filter((p) => p.powered && p.role !== 'output');
  const unpowered = pins.filter((p) => !p.powered);
  const highFromPull =
    drivers.length > 0 && drivers.every((d) => d.drive === 'open-drain') && pulls.some((p) => p.to !== GROUND);

  const ids: string[] = [];
  for (const p of pins) if (!ids.includes(p.rail)) ids.push(p.rail);
  for (const p of pulls) if (p.to !== GROUND && !ids.includes(p.to)) ids.push(p.to);
  const beyond = path === undefined ? NONE : shiftersBeyond(path, src);
  for (const id of linkedRails(path, shifters, beyond)) if (!ids.includes(id)) ids.push(id);
  const chains = receivers.length === 0 ? NONE : unjudgedChains(net, src, ctx.rails);
  for (const c of chains) for (const id of c.rails) if (!ids.includes(id)) ids.push(id);
  const rails = railsOf(ctx.rails, ids);

  const loads = new Map<string, DriverLoad>();
  for (const d of drivers) {
    const own = driverLoad(d, pins, pulls, rails);
    const through = path === undefined ? { high: 0, low: 0 } : pathLoad(path, d, rails, beyond);
    let low = own.low + through.low;
    for (const s of shifters) low += shifterLoad(s, d, rails);
    loads.set(d.key, { high: own.high + through.high, low });
  }
  // Drivers on other nets, each with its load as its own net would give it.
  const remoteLoad = (d: PinView): DriverLoad => {
    const node = path?.nodes.find((n) => n.pins.includes(d)) ?? shifters.find((s) => s.other.pins.includes(d))?.other;
    if (node === undefined) return { high: 0, low: 0 };
    const own = driverLoad(d, node.pins, node.pulls, rails);
    let high = own.high;
    let low = own.low;
    if (path?.nodes.includes(node)) {
      const through = pathLoad({ ...path, self: path.nodes.indexOf(node) }, d, rails, beyond);
      high += through.high;
      low += through.low;
    }
    const link = shifters.find((s) => s.other === node);
    if (link !== undefined)
      low += shifterLoad(
        {
          part: link.part,
          pin: OTHER_PIN[link.pin]!,
          other: link.self,
          self: link.other,
          ...(path === undefined ? {} : { otherPath: path }),
        },
        d,
        rails,
      );
    return { high, low };
  };

  const pinRails: string[] = [];
  for (const p of pins) if (!pinRails.includes(p.rail)) pinRails.push(p.rail);
  const pathRails = [...pinRails];
  for (const n of [...(path?.nodes ?? []), ...shifters.flatMap((s) => [s.other, ...(s.otherPath?.nodes ?? [])])]) {
    for (const p of n.pins) if (!pathRails.includes(p.rail)) pathRails.push(p.rail);
  }

  const local = analyseNet({ pins, drivers, receivers, pulls, highFromPull, loads, rails, settings });
  const remote = remotePairs(path, shifters, rails, settings, remoteLoad);
  let { worstHigh, worstLow } = local;
  for (const pair of remote) {
    if (pair.high !== null && (worstHigh === null || pair.high.margin < worstHigh)) worstHigh = pair.high.margin;
    if (pair.low !== null && (worstLow === null || pair.low.margin < worstLow)) worstLow = pair.low.margin;
  }
  const analysis = remote.length === 0 ? local : { pairs: [...local.pairs, ...remote], worstHigh, worstLow };
  const pathEdge = path === undefined ? undefined : pathEdgeOf(path, rails);
  return {
    net,
    names: ctx.names,
    settings,
    rails,
    pins,
    drivers,
    receivers,
    unpowered,
    pulls,
    capacitance,
    highFromPull,
    loads,
    pinRails,
    analysis,
    ...(path === undefined ? {} : { path }),
    shifters,
    remoteDrivers: remoteDriversOf(path, shifters, rails),
    ...(pathEdge === undefined ? {} : { pathEdge }),
    pathRails,
    unjudged: chains,
  };
}

/**
 * The rail states a pin on no net depends on: its own rail and its internal pull's. A lone pin's
 * rules see nothing else, so that in a power state where neither is off it is judged exactly as
 * with every rail on (check.ts re-stamps its findings).
 */
export function loneRails(all: RailStates, pin: PinView): RailStates {
  return railsOf(
    all,
    pin.pull === undefined || pin.pull.to === GROUND || pin.pull.to === pin.rail ? [pin.rail] : [pin.rail, pin.pull.to],
  );
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
