/**
 * Preparing a net once per power state: its pins resolved, drivers and receivers by kind, pulls,
 * capacitance, load currents and the level analysis. Every rule reads this one view.
 */
import type { Design, Net, Part, Pin } from '../model/schema.ts';
import { analyseNet } from './analyse.ts';
import { driverLoad } from './netMath.ts';
import { GROUND } from './powerStates.ts';
import { resolvedView } from './resolve.ts';
import type { Range } from '../levels/rails.ts';
import type { DriverLoad, EffectiveSettings, NetView, PinView, PowerState, PullSource, RailStates } from './types.ts';

/** Where each `PART.PIN` of the design lives. */
export type PinIndex = ReadonlyMap<string, { readonly part: Part; readonly pin: Pin }>;

/** The pin index of a design. */
export function indexPins(design: Design): PinIndex {
  const index = new Map<string, { part: Part; pin: Pin }>();
  for (const part of design.parts) {
    for (const pin of part.pins) index.set(`${part.id}.${pin.id}`, { part, pin });
  }
  return index;
}

/** A pin in a power state: powered unless its rail is off (or unknown to the design). */
export function pinView(design: Design, part: Part, pin: Pin, rails: RailStates): PinView {
  const rail = pin.rail ?? part.rail;
  return resolvedView(design, part, pin, !rails.off.has(rail) && rails.ranges.has(rail));
}

export interface PrepareContext {
  readonly design: Design;
  readonly state: PowerState;
  readonly rails: RailStates;
  readonly settings: EffectiveSettings;
  readonly pinIndex: PinIndex;
}

/** The prepared view of one net in one power state. */
export function prepareNet(ctx: PrepareContext, net: Net): NetView {
  const { design, settings } = ctx;
  const pins: PinView[] = [];
  for (const key of net.pins) {
    const at = ctx.pinIndex.get(key);
    if (at !== undefined) pins.push(pinView(design, at.part, at.pin, ctx.rails));
  }
  const drivers = pins.filter((p) => p.powered && p.role !== 'input');
  const receivers = pins.filter((p) => p.powered && p.role !== 'output');
  const unpowered = pins.filter((p) => !p.powered);

  const pulls: PullSource[] = [];
  if (net.pull !== undefined) pulls.push({ ohms: net.pull.ohms, to: net.pull.to, origin: 'net' });
  for (const p of pins) if (p.pull !== undefined) pulls.push({ ohms: p.pull.ohms, to: p.pull.to, origin: p.key });

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
    net, state: ctx.state, settings, rails, pins, drivers, receivers, unpowered, pulls,
    capacitance, highFromPull, loads, pinRails, analysis,
  };
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
