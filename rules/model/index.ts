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
