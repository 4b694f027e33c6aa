/** The design file, version 1: schema and types, reader, writer, migration, new designs. */
export * from './schema.ts';
export { RULE_IDS, type RuleId } from './ruleIds.ts';
export { readDesign, validateDesign, MAX_ERRORS, type ReadResult, type ReadOptions } from './reader.ts';
export { formatPath, ROOT_PATH, type DesignError, type PathSegment } from './paths.ts';
export { migrate, CURRENT_VERSION } from './migrate.ts';
export { writeDesign } from './writer.ts';
export { newDesign } from './newDesign.ts';
export { resolveRailRange, type RailRange, type RailRangeInput } from './railRange.ts';
export { GROUND } from './references.ts';
export { isRailColour, longRailColour } from './colour.ts';
export { MAX_FARADS, MAX_OHMS, MAX_SECONDS, MAX_VOLTS, MIN_FARADS, MIN_OHMS, MIN_SECONDS } from './limits.ts';
export { driveOf, profileIdOf, railOf, sideOf } from './pinDefaults.ts';
export type { Side } from './pinDefaults.ts';
export { partOfPin, pinKey, splitPinKey } from './pinKeys.ts';
export { Components, netWires, samePair } from './wiring.ts';
export type { Pair } from './wiring.ts';
