/** Power states and the rail ranges that hold in each. */
import type { Design, PinState } from '../model/schema.ts';
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
  const onRanges = new Map<string, Range>();
  const ranges = new Map<string, Range>();
  for (const rail of design.rails) {
    const r = railRange(rail);
    onRanges.set(rail.id, r);
    ranges.set(rail.id, state.off.has(rail.id) ? OFF : r);
  }
  return { ranges, onRanges, off: state.off };
}

/** The design's settings with the format's defaults filled in. */
export function effectiveSettings(design: Design): EffectiveSettings {
  return {
    minMargin: design.settings?.minMargin ?? DEFAULT_MIN_MARGIN,
    defaultWiringCapacitance: design.settings?.defaultWiringCapacitance ?? DEFAULT_WIRING_CAPACITANCE,
  };
}

/** The far end of a pull to ground (design-format.md, Pull): one constant with the reader's. */
export { GROUND } from '../model/references.ts';
