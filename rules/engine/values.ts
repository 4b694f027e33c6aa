/**
 * The numbers each rule reports with a finding, one type per rule: the report format's table of
 * `values` keys (report-format.md, "Finding"), made types so that a rule that drops or renames a
 * key fails to compile, and so do the quick fixes, the details panel and the PDF that read it.
 * SI units throughout. Keys beyond the report format's table are the ones the rules have added
 * since (a corner, the driver a bound came from).
 */
import type { RuleId } from '../model/ruleIds.ts';

/** Rail id → supply voltage at the corner a bound was found at. */
export type CornerValues = Readonly<Record<string, number>>;

export interface LevelHighValues {
  readonly voh: number;
  readonly vih: number;
  readonly margin: number;
  readonly driver: string;
  readonly receiver: string;
  /** Null for an open-drain driver (its high level is the pull-up's). */
  readonly driverVdd: number | null;
  readonly receiverVdd: number;
  readonly vpull?: number;
  readonly estimate?: true;
}

export interface LevelLowValues {
  readonly vol: number;
  readonly vil: number;
  readonly margin: number;
  readonly driver: string;
  readonly receiver: string;
  readonly driverVdd: number | null;
  readonly receiverVdd: number;
  readonly estimate?: true;
}

export interface OvervoltageValues {
  readonly vNet: number;
  readonly viMax: number;
  readonly pin: string;
  /**
   * A driver's pin key, `net` (the net's pull) or the pin key whose internal pull it is; through
   * series resistors, the driver's key or `pulls`.
   */
  readonly source: string;
  readonly pinVdd: number;
  /** Through series resistors (version 2): the clamp current, A, and each resistor's value in the worst case, Ω. */
  readonly current?: number;
  readonly resistors?: Readonly<Record<string, number>>;
}

export interface BackPowerValues {
  readonly vNet: number;
  readonly viMax: number;
  readonly pin: string;
  readonly source: string;
  readonly limit: 'viMaxOff' | 'viMax' | 'clamp';
  /** Through series resistors (version 2): the current into the dead rail, A. */
  readonly current?: number;
}

export interface DriveLoadValues {
  readonly driver: string;
  readonly loadHigh: number | null;
  readonly loadLow: number;
  readonly ratedHigh: number | null;
  readonly ratedLow: number | null;
  readonly ioMax: number | null;
}

export interface RiseTimeValues {
  readonly riseTime: number;
  readonly span: '30-70' | '10-90';
  readonly capacitance: number;
  readonly resistance: number;
  readonly limit: number;
  readonly driver: string | null;
}

export interface RampValues {
  readonly ramp: number;
  readonly maxInputRamp: number;
  readonly pin: string;
  readonly driver: string | null;
  readonly t1090: number;
  readonly swing: number;
  readonly resistance: number;
  readonly capacitance: number;
}

export interface ContentionValues {
  readonly drivers: readonly string[];
  readonly kinds: readonly string[];
}

export interface FloatingInputValues {
  readonly pins: readonly string[];
  readonly drivers?: readonly string[];
}

export interface MissingPullValues {
  readonly drivers: readonly string[];
}

/** The advice for the net's own pull-up (README, "Pull-up advice"). */
export interface PullAdviceValues {
  readonly suggested: number | null;
  readonly suggestedSeries: string | null;
  /** The largest value inside the range (lowest power), offered beside the suggestion. */
  readonly lowestPower: number | null;
  readonly adviceTo: string;
  readonly adviceMin: number | null;
  readonly adviceMax: number | null;
  readonly adviceTolerance: number;
  readonly adviceCap: number | null;
  readonly riseGuard: number | null;
  readonly othersOhms: number | null;
  readonly suggestedRise: number | null;
  readonly suggestedHigh: number | null;
  readonly suggestedLow: number | null;
  readonly suggestedSink: number | null;
}

export interface PullRangeValues extends Partial<PullAdviceValues> {
  /** Every pull-up to a powered rail together (parallel), nominal; and at the strong and weak ends. */
  readonly ohms: number;
  readonly ohmsMin: number;
  readonly ohmsMax: number;
  /** Null when the drivers cannot sink the loads at all. */
  readonly rMin: number | null;
  /** Null when nothing bounds it from above. */
  readonly rMax: number | null;
  readonly empty: boolean;
  readonly suggested: number | null;
  readonly lowestPower: number | null;
  readonly rMinDriver: string | null;
  readonly rMinCorner: CornerValues | null;
  readonly rMaxBy: 'level' | 'rise-time' | null;
  readonly rMaxCorner: CornerValues | null;
  readonly capacitance: number;
}

export interface RailRangeValues {
  readonly rail: string;
  readonly railMin: number;
  readonly railMax: number;
  readonly profileMin: number;
  readonly profileMax: number;
  readonly profile: string;
}

export interface RailCrossingValues {
  readonly rails: readonly string[];
  readonly marginHigh: number | null;
  readonly marginLow: number | null;
}

export interface ClampCurrentValues {
  readonly pin: string;
  readonly rail: string;
  readonly source: string;
  readonly vNet: number;
  readonly viMax: number;
  readonly pinVdd: number;
  readonly current: number;
  readonly injectionMax: number;
  readonly resistors: Readonly<Record<string, number>>;
}

export interface RailInjectionValues {
  readonly rail: string;
  readonly total: number;
  readonly minLoad: number | null;
  readonly currents: readonly { readonly pin: string; readonly net: string; readonly current: number }[];
}

export interface UndervoltageValues {
  readonly vNet: number;
  readonly viMin: number;
  readonly pin: string;
  readonly source: string;
  readonly pinVdd: number;
}

export interface FetTurnOnValues {
  readonly fet: string;
  readonly driver: string;
  readonly vgate: number;
  readonly vol: number;
  readonly vgs: number;
  readonly vgsTh: number;
}

export interface FetSinkValues {
  readonly fet: string;
  readonly driver: string;
  readonly iLow: number;
  readonly iHigh: number;
  readonly total: number;
  readonly rated: number;
}

export interface FetSideValues {
  readonly fet: string;
  readonly side: 'low' | 'high';
  readonly net: string;
}

export interface FetGateValues {
  readonly fet: string;
  readonly gate: string;
  readonly gateMax: number;
  readonly pullRail: string;
  readonly pullMin: number;
}

export interface TranslatorPullValues {
  readonly pin: string;
  readonly pull: string;
  readonly ohms: number;
  readonly minExternalPull: number;
}

export interface TranslatorLowValues {
  readonly pin: string;
  readonly receiver: string;
  readonly vlow: number;
  readonly vil: number;
  readonly rs: number;
  readonly rpu: number;
  readonly vpull: number;
}

export interface TranslatorLoadValues {
  readonly pin: string;
  readonly capacitance: number;
  readonly maxLoadCapacitance: number;
}

export interface BusHoldValues {
  readonly pull: string;
  readonly ohms: number;
  readonly rMax: number;
  readonly overdrive: number;
  readonly toward: 'high' | 'low';
}

export interface MixedPathValues {
  readonly driver: string;
  /** The parts between chips from the driver's net to this one, in order. */
  readonly via: readonly string[];
  /** The powered receivers on this net whose pairs with the driver are not judged. */
  readonly receivers: readonly string[];
}

export interface InterfacePowerValues {
  readonly pin: string;
  readonly driver: string;
  readonly rail: string;
  /** ΔICC, the extra supply current of the input, A. */
  readonly current: number;
  /** How far below its supply the input must be held for ΔICC to flow, V. */
  readonly drop: number;
  readonly high: number;
  readonly threshold: number;
  readonly corner: CornerValues;
}

/** Every rule's values, by rule id: the compiler holds this table complete. */
export interface RuleValues {
  readonly 'level-high': LevelHighValues;
  readonly 'level-low': LevelLowValues;
  readonly overvoltage: OvervoltageValues;
  readonly 'back-power': BackPowerValues;
  readonly 'clamp-current': ClampCurrentValues;
  readonly 'rail-injection': RailInjectionValues;
  readonly undervoltage: UndervoltageValues;
  readonly 'drive-load': DriveLoadValues;
  readonly 'edge-rate': RiseTimeValues | RampValues;
  readonly contention: ContentionValues;
  readonly 'floating-input': FloatingInputValues;
  readonly 'missing-pull': MissingPullValues;
  readonly 'pull-range': PullRangeValues;
  readonly 'fet-shifter': FetTurnOnValues | FetSinkValues | FetSideValues | FetGateValues;
  readonly 'mixed-path': MixedPathValues;
  readonly 'translator-pull': TranslatorPullValues | TranslatorLowValues | TranslatorLoadValues;
  readonly 'bus-hold': BusHoldValues;
  readonly 'rail-range': RailRangeValues;
  readonly 'rail-crossing': RailCrossingValues;
  readonly 'interface-power': InterfacePowerValues;
}

// A new rule id without its values type fails here.
type Complete<T extends { readonly [I in RuleId]: object }> = T;
export type CheckedRuleValues = Complete<RuleValues>;

/**
 * What a finding carries: its rule's values, where any number may be null when the check could
 * not decide (a NaN or ±∞ met on the way: rules/engine/undecidable.ts), with the keys that did
 * not come out listed under `undecidable`.
 */
export type FindingValues<I extends RuleId> = Undecided<RuleValues[I]>;

/** Each number of `T` possibly null, spread over a union (edge-rate has two shapes). */
type Undecided<T> = T extends unknown
  ? { readonly [K in keyof T]: T[K] extends number ? number | null : T[K] } & {
      readonly undecidable?: readonly string[];
    }
  : never;
