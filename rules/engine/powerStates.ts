/** Power states and the rail ranges that hold in each. */
import type { Design, PinState, Rail } from '../model/schema.ts';
import { DEFAULT_MIN_MARGIN, DEFAULT_WIRING_CAPACITANCE } from '../model/schema.ts';
import { railRange, type Range } from '../levels/rails.ts';
import type { EffectiveSettings, PowerState, RailStates } from './types.ts';

export const ALL_ON = 'all-on';
export const ALL_ON_LABEL = 'All rails on';

const NO_PINS: ReadonlyMap<string, PinState> = new Map();

/** `all-on` first, then the design's scenarios in the file's order. */
export function powerStates(design: Design): PowerState[] {
  const states: PowerState[] = [
    { id: ALL_ON, label: ALL_ON_LABEL, off: new Set(), pins: NO_PINS, scenario: undefined },
  ];
  for (const s of design.scenarios ?? []) {
    const pins = s.pins === undefined || s.pins.length === 0 ? NO_PINS : new Map(s.pins.map((p) => [p.pin, p]));
    states.push({ id: s.id, label: s.label, off: new Set(s.off), pins, scenario: s });
  }
  return states;
}

const OFF: Range = { min: 0, max: 0 };

/** Every rail's range in a power state: an off rail sits at 0 V. */
export function railStates(design: Design, state: PowerState): RailStates {
  // The same rails in the same power state give the same object: an edit that leaves both alone
  // then reuses every net's restricted rail states (prepare.ts keys them by this object).
  let byState = railStatesMemo.get(design.rails);
  if (byState === undefined) {
    byState = new WeakMap();
    railStatesMemo.set(design.rails, byState);
  }
  const hit = byState.get(state);
  if (hit !== undefined) return hit;
  const onRanges = new Map<string, Range>();
  const ranges = new Map<string, Range>();
  for (const rail of design.rails) {
    const r = railRange(rail);
    onRanges.set(rail.id, r);
    ranges.set(rail.id, state.off.has(rail.id) ? OFF : r);
  }
  const made: RailStates = { ranges, onRanges, off: state.off };
  byState.set(state, made);
  return made;
}

const railStatesMemo = new WeakMap<readonly Rail[], WeakMap<PowerState, RailStates>>();

/** The design's settings with the format's defaults filled in (one object per settings object). */
export function effectiveSettings(design: Design): EffectiveSettings {
  const key = design.settings ?? NO_SETTINGS;
  let made = settingsMemo.get(key);
  if (made === undefined) {
    made = {
      minMargin: design.settings?.minMargin ?? DEFAULT_MIN_MARGIN,
      defaultWiringCapacitance: design.settings?.defaultWiringCapacitance ?? DEFAULT_WIRING_CAPACITANCE,
    };
    settingsMemo.set(key, made);
  }
  return made;
}

const NO_SETTINGS = {};
const settingsMemo = new WeakMap<object, EffectiveSettings>();

/** The far end of a pull to ground (design-format.md, Pull): one constant with the reader's. */
export { GROUND } from '../model/references.ts';
