/** The rule contract lives with the engine that runs it (rules/engine/rule.ts); rules import it from here. */
export * from '../engine/rule.ts';
