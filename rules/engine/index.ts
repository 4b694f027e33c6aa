/** The rule engine's public face. */
export { ALL_ON, ALL_ON_LABEL, powerStates, railStates, effectiveSettings } from './powerStates.ts';
export { resolvePin } from './resolve.ts';
export type * from './types.ts';
export { labelOr, namesOf, netLabel } from './names.ts';
export { highThreshold, lowThreshold } from './resolve.ts';
