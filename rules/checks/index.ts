/**
 * The one registry of rules, keyed by rule id: the compiler checks that every id of the
 * catalogue (rules/model/ruleIds.ts, which waivers also name) has exactly its rule. The order
 * of `RULES`, the catalogue's, comes from that list; reports sort by it.
 * Adding a rule: its module, its test table, its id in ruleIds.ts, and one line here.
 */
import { RULE_IDS, type RuleId } from '../model/ruleIds.ts';
import type { AnyRule, RuleOf } from './defineRule.ts';
import levelHigh from './level-high.ts';
import levelLow from './level-low.ts';
import overvoltage from './overvoltage.ts';
import backPower from './back-power.ts';
import clampCurrent from './clamp-current.ts';
import railInjection from './rail-injection.ts';
import undervoltage from './undervoltage.ts';
import driveLoad from './drive-load.ts';
import edgeRate from './edge-rate.ts';
import contention from './contention.ts';
import floatingInput from './floating-input.ts';
import missingPull from './missing-pull.ts';
import pullRange from './pull-range.ts';
import fetShifter from './fet-shifter.ts';
import mixedPath from './mixed-path.ts';
import translatorPull from './translator-pull.ts';
import busHold from './bus-hold.ts';
import railRange from './rail-range.ts';
import railCrossing from './rail-crossing.ts';
import interfacePower from './interface-power.ts';

const REGISTRY: { readonly [I in RuleId]: RuleOf<I> } = {
  'level-high': levelHigh,
  'level-low': levelLow,
  overvoltage,
  'back-power': backPower,
  'clamp-current': clampCurrent,
  'rail-injection': railInjection,
  undervoltage,
  'drive-load': driveLoad,
  'edge-rate': edgeRate,
  contention,
  'floating-input': floatingInput,
  'missing-pull': missingPull,
  'pull-range': pullRange,
  'fet-shifter': fetShifter,
  'mixed-path': mixedPath,
  'translator-pull': translatorPull,
  'bus-hold': busHold,
  'rail-range': railRange,
  'rail-crossing': railCrossing,
  'interface-power': interfacePower,
};

/** Every rule, in the catalogue's order. */
export const RULES: readonly AnyRule[] = RULE_IDS.map((id) => REGISTRY[id]);

/** The rule of an id. */
export function ruleOf<I extends RuleId>(id: I): RuleOf<I> {
  return REGISTRY[id];
}
