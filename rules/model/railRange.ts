import { railRange } from '../levels/rails.ts';

/** The fields of a rail that set its voltage range (a whole `Rail` will do). */
export interface RailRangeInput {
  nominal: number;
  tolerance?: number | undefined;
  min?: number | undefined;
  max?: number | undefined;
}

/** A rail's resolved supply range, volts. */
export interface RailRange {
  min: number;
  max: number;
}

/**
 * A rail's range as design-format.md defines it: nominal × (1 ± tolerance), tolerance 0.05
 * when omitted, an explicit `min` or `max` winning for its end. It is the engine's
 * `railRange` (rules/levels/rails.ts), so that the reader refuses exactly the rails the
 * engine could not use (min > max), on fields alone, without a whole `Rail`.
 */
export function resolveRailRange(rail: RailRangeInput): RailRange {
  return railRange(rail);
}
