/** The public face of rules/levels/ for the editor. */
export { below, exceeds } from './compare.ts';
export { levelAt, parseLevel } from './level.ts';
export type { Level } from './level.ts';
export { largestTestCurrent, outputLevel } from './output.ts';
export { choosePull } from './pullAdvice.ts';
export { railRange } from './rails.ts';
export type { Range } from './rails.ts';
export { RISE_10_90 } from './rc.ts';
export { E24, seriesValuesBetween } from './series.ts';
export { formatMargin, formatQuantity, parseQuantity } from './units.ts';
export type { QuantityResult, Unit } from './units.ts';
