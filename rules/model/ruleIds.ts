/**
 * The rule ids of the catalogue (rules-catalogue.md, then `interface-power`, and version 2's
 * parts between chips), in catalogue order. The design
 * format needs them (a waiver names one, even of a rule not built yet); the check registry
 * must agree with this list (test/checks/registry.test.ts holds the two together).
 */
export const RULE_IDS = [
  'level-high',
  'level-low',
  'overvoltage',
  'back-power',
  'clamp-current',
  'rail-injection',
  'undervoltage',
  'drive-load',
  'edge-rate',
  'contention',
  'floating-input',
  'missing-pull',
  'pull-range',
  'fet-shifter',
  'mixed-path',
  'translator-pull',
  'bus-hold',
  'rail-range',
  'rail-crossing',
  'interface-power',
] as const;

export type RuleId = (typeof RULE_IDS)[number];
