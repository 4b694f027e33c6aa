/**
 * The clamp current each input of a net takes from sources on other nets through series
 * resistors (the quantity clamp-current judges per pin and rail-injection sums per rail).
 * Cached by the net's view: a view never changes.
 */
import { levelAt } from '../levels/level.ts';
import { exceeds } from '../levels/compare.ts';
import { netSources, worstExposure } from './netMath.ts';
import { pathExposure } from './paths.ts';
import type { NetView } from './types.ts';

export interface Injection {
  readonly pin: string;
  readonly rail: string;
  readonly current: number;
}

const cache = new WeakMap<NetView, readonly Injection[]>();

/** The inputs of a net that series resistors drive past their viMax, with their clamp currents. */
export function injectionsOf(view: NetView): readonly Injection[] {
  let hit = cache.get(view);
  if (hit !== undefined) return hit;
  const out: Injection[] = [];
  if (view.path !== undefined) {
    for (const pin of view.pins) {
      const viMax = pin.params.viMax;
      if (!pin.powered || viMax === undefined) continue;
      const limit = (vdd: number) => levelAt(viMax, vdd);
      const direct = worstExposure(pin, netSources(pin, view.drivers, view.pulls), view.rails, limit);
      if (direct !== undefined && exceeds(direct.vNet, direct.limit)) continue;
      const far = pathExposure(view.path, pin, view.rails, limit, 'high', `viMax:${String(viMax)}`);
      const undecided = far !== undefined && (!Number.isFinite(far.vNet) || !Number.isFinite(far.current));
      if (far !== undefined && (undecided || (exceeds(far.vNet, far.limit) && far.current > 0)))
        out.push({ pin: pin.key, rail: pin.rail, current: far.current });
    }
  }
  hit = out;
  cache.set(view, hit);
  return hit;
}
