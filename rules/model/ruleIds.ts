/**
 * The rule ids of the catalogue (rules-catalogue.md, then `interface-power`), in catalogue order. The design
 * format needs them (a waiver names one, even of a rule not built yet); the check registry
 * must agree with this list (test/checks/registry.test.ts holds the two together).
 */
export const RULE_IDS = [
  'level-high',
  'level-low',
  'overvoltage',
  'back-power',
  'drive-load',
  'edge-rate',
  'contention',
  'floating-input',
  'missing-pull',
  'pull-range',
  'rail-range',
  'rail-crossing',
  'interface-power',
] as const;

export type RuleId = (typeof RULE_IDS)[number];
