/**
 * The electrical arithmetic shared by the engine and the rules: pull-resistor Thévenin
 * equivalents, load currents on a driver, and the worst-corner search.
 */
import type { Corner, Range } from '../levels/rails.ts';
import { corners, pairCorners } from '../levels/rails.ts';
import { levelAt } from '../levels/level.ts';
import { rowsAt } from '../levels/output.ts';
import { higherScore, lowerScore } from '../levels/compare.ts';
import type { DriverLoad, PinView, PullSource, RailStates } from './types.ts';
import { GROUND } from './powerStates.ts';

/** The voltage at a pull's far end in a corner (0 V for ground or an off rail). */
export function pullEndVoltage(pull: PullSource, corner: Corner): number {
  if (pull.to === GROUND) return 0;
  return corner.get(pull.to) ?? 0;
}

/** The rails a set of pulls goes to (ground excluded). */
export function pullRails(pulls: readonly PullSource[]): string[] {
  const out: string[] = [];
  for (const p of pulls) if (p.to !== GROUND && !out.includes(p.to)) out.push(p.to);
  return out;
}

export interface Thevenin {
  /** Ω */
  readonly r: number;
  /** V */
  readonly v: number;
}

/** Which value of each pull's range: as given, or the end that is worst for the check at hand. */
export type PullEnd = 'ohms' | 'min' | 'max';

/**
 * `R = 1/Σ(1/Rk)`, `Vpull = R × Σ(Vk/Rk)`, each Vk at the corner. `R` is taken at the pulls'
 * `end` (the largest for a high level or a rise time); `Vpull` at their given values, since a
 * spread of the resistors hardly moves it. Undefined without pulls.
 */
export function thevenin(pulls: readonly PullSource[], corner: Corner, end: PullEnd = 'ohms'): Thevenin | undefined {
  if (pulls.length === 0) return undefined;
  let g = 0;
  let i = 0;
  for (const p of pulls) {
    g += 1 / p.ohms;
    i += pullEndVoltage(p, corner) / p.ohms;
  }
  const r = 1 / g;
  return { r: end === 'ohms' ? r : parallelResistance(pulls, end)!, v: r * i };
}

/** The parallel resistance of the pulls at the given end of their ranges, Ω (undefined without pulls). */
export function parallelResistance(pulls: readonly PullSource[], end: PullEnd = 'ohms'): number | undefined {
  if (pulls.length === 0) return undefined;
  let g = 0;
  for (const p of pulls) g += 1 / p[end];
  return 1 / g;
}

function rangeOf(rails: RailStates, rail: string): Range {
  return rails.ranges.get(rail) ?? { min: 0, max: 0 };
}

/** Lowest and highest voltage a pull's far end can take in this power state. */
function pullEndRange(pull: PullSource, rails: RailStates): Range {
  return pull.to === GROUND ? { min: 0, max: 0 } : rangeOf(rails, pull.to);
}

/**
 * Load currents on a driver (rules-catalogue.md, "Load currents on a driver"): bounds taken at
 * the rails' ends, not per corner.
 */
export function driverLoad(
  driver: PinView,
  pins: readonly PinView[],
  pulls: readonly PullSource[],
  rails: RailStates,
): DriverLoad {
  let high = 0;
  let low = 0;
  for (const p of pins) {
    if (p === driver) continue;
    high += p.params.iih ?? 0;
    low += p.params.iil ?? 0;
  }
  const own = rangeOf(rails, driver.rail);
  const volPoints = driver.params.vol;
  let volAtTop = 0;
  if (volPoints !== undefined && volPoints.length > 0) {
    const sorted = rowsAt(volPoints, own.min);
    if (sorted.length > 0) volAtTop = levelAt(sorted[sorted.length - 1]!.v, own.max);
  }
  for (const pull of pulls) {
    const end = pullEndRange(pull, rails);
    // A pull whose end can sit below the driver's rail draws current from a high output.
    const below = pull.to === GROUND || rails.off.has(pull.to) || end.min < own.max;
    // Currents are bounds: each pull at the low end of its range.
    if (below && pull.to !== driver.rail) high += (own.max - end.min) / pull.min;
    // A pull to a powered rail feeds current into a low output.
    if (pull.to !== GROUND && !rails.off.has(pull.to)) low += (end.max - volAtTop) / pull.min;
  }
  return { high, low };
}

/**
 * The worst of a function over every corner of the given rails: the corner whose score is
 * lowest (for a margin) is kept; a corner whose score is not finite is the worst of all
 * (lowerScore), so that a failed computation is never hidden by a finite corner. Returns
 * undefined when `score` gives undefined everywhere.
 */
export function worstCorner<T extends { score: number }>(
  railIds: Iterable<string>,
  rails: RailStates,
  evaluate: (corner: Corner) => T | undefined,
): T | undefined {
  let worst: T | undefined;
  for (const c of corners(railIds, rails.ranges)) {
    const r = evaluate(c);
    if (r !== undefined && (worst === undefined || lowerScore(r.score, worst.score))) worst = r;
  }
  return worst;
}

/** Something that can put a voltage on a net: a powered driver's rail, or a pull's rail. */
export interface NetSource {
  /** The driver's pin key, or the pull's origin (`net` or the pin key). */
  readonly from: string;
  readonly kind: 'driver' | 'pull';
  readonly rail: string;
}

/**
 * The sources other than `pin` itself that can put a voltage on the net: every powered driver's
 * rail (open-drain drivers excepted: they only pull low) and every pull resistor's rail, the
 * pin's own internal pull included (rules-catalogue.md, `overvoltage`, `back-power`).
 */
export function netSources(pin: PinView, drivers: readonly PinView[], pulls: readonly PullSource[]): NetSource[] {
  const out: NetSource[] = [];
  for (const d of drivers) {
    if (d.key === pin.key || d.drive === 'open-drain') continue;
    out.push({ from: d.key, kind: 'driver', rail: d.rail });
  }
  for (const p of pulls) {
    if (p.to === GROUND) continue;
    out.push({ from: p.origin, kind: 'pull', rail: p.to });
  }
  return out;
}

export interface Exposure {
  /** The highest voltage on the net at the worst corner, V. */
  readonly vNet: number;
  /** The pin's limit at that corner, V. */
  readonly limit: number;
  readonly source: NetSource;
  /** The corner's supply of the pin's rail (0 for an off rail). */
  readonly pinVdd: number;
}

/**
 * The worst exposure of a pin to the net's sources: over every source and every corner of the
 * source's rail and the pin's rail (shared when they are the same rail), the largest excess of
 * the source's voltage over `limit(pinVdd)`; an excess that is not finite is the worst.
 */
export function worstExposure(
  pin: PinView,
  sources: readonly NetSource[],
  rails: RailStates,
  limit: (pinVdd: number) => number,
): Exposure | undefined {
  // Scored with numbers, one object made for the worst: this runs for every input of every net.
  let found: NetSource | undefined;
  let vNet = 0;
  let lim = 0;
  let pinVdd = 0;
  let excess = 0;
  for (const source of sources) {
    for (const c of pairCorners(source.rail, pin.rail, rails.ranges)) {
      const v = c.get(source.rail) ?? 0;
      const p = c.get(pin.rail) ?? 0;
      const l = limit(p);
      const e = v - l;
      if (found !== undefined && !higherScore(e, excess)) continue;
      found = source;
      vNet = v;
      lim = l;
      pinVdd = p;
      excess = e;
    }
  }
  return found === undefined ? undefined : { vNet, limit: lim, source: found, pinVdd };
}
