/**
 * The one registry of rules, in the catalogue's order (rules-catalogue.md); reports sort by it.
 * Adding a rule: its module, its test table, its documentation paragraph, and one line here.
 */
import type { AnyRule } from './defineRule.ts';
import levelHigh from './level-high.ts';
import levelLow from './level-low.ts';
import overvoltage from './overvoltage.ts';
import backPower from './back-power.ts';
import driveLoad from './drive-load.ts';
import edgeRate from './edge-rate.ts';
import contention from './contention.ts';
import floatingInput from './floating-input.ts';
import missingPull from './missing-pull.ts';
import pullRange from './pull-range.ts';
import railRange from './rail-range.ts';
import railCrossing from './rail-crossing.ts';
import interfacePower from './interface-power.ts';

export const RULES: readonly AnyRule[] = [
  levelHigh,
  levelLow,
  overvoltage,
  backPower,
  driveLoad,
  edgeRate,
  contention,
  floatingInput,
  missingPull,
  pullRange,
  railRange,
  railCrossing,
  interfacePower,
];
