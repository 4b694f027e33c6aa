import type { Pull } from './schema.ts';

/** A pull resistor's resolved range, Ω. */
export interface PullEnds {
  readonly min: number;
  readonly max: number;
}

/**
 * A pull's range as design-format.md defines it: `ohms × (1 ± tolerance)`, exact when no
 * tolerance is given (a value typed in is judged as typed), an explicit `min` or `max` winning
 * for its end (a datasheet's internal pull of 30–50 kΩ).
 */
export function pullEnds(pull: Pick<Pull, 'ohms' | 'tolerance' | 'min' | 'max'>): PullEnds {
  const t = pull.tolerance ?? 0;
  return { min: pull.min ?? pull.ohms * (1 - t), max: pull.max ?? pull.ohms * (1 + t) };
}

/**
 * The relative tolerance a pull's range stands for, the larger of its two sides: a given
 * `tolerance`, or the spread of `min`/`max` around `ohms`; `fallback` when the pull gives neither.
 */
export function pullTolerance(pull: Pick<Pull, 'ohms' | 'tolerance' | 'min' | 'max'>, fallback: number): number {
  if (pull.tolerance === undefined && pull.min === undefined && pull.max === undefined) return fallback;
  const ends = pullEnds(pull);
  return Math.max((pull.ohms - ends.min) / pull.ohms, (ends.max - pull.ohms) / pull.ohms);
}
