/**
 * The engine's prepared views and results. Everything here lives outside the design document:
 * the document stays plain (architecture.md, "The engine's contract").
 */
import type {
  Design,
  Discrete,
  DiodeShifter,
  FetShifter,
  Net,
  Params,
  Pin,
  PinDrive,
  PinRole,
  PinState,
  Profile,
  Pull,
  Rail,
  Scenario,
  Waiver,
} from '../model/schema.ts';
import type { RuleId } from '../model/ruleIds.ts';
import type { Range } from '../levels/rails.ts';
import type { FindingValues } from './values.ts';
import type { Names } from './names.ts';

export type Severity = 'error' | 'warning' | 'info';

/** Where an effective parameter came from. */
export type ParamOrigin = 'pin' | 'part' | 'profile';

/** A pin with every parameter resolved key by key (pin params, then part params, then profile). */
export interface ResolvedPin {
  /** `PART.PIN` */
  readonly key: string;
  readonly partId: string;
  readonly pin: Pin;
  readonly role: PinRole;
  /** Effective drive for outputs and bidir pins; undefined for inputs. */
  readonly drive: PinDrive | undefined;
  readonly rail: string;
  readonly profileId: string;
  readonly profile: Profile | undefined;
  readonly params: Params;
  readonly origin: Readonly<Partial<Record<keyof Params, ParamOrigin>>>;
  readonly pull: Pull | undefined;
}

/** A power state: `all-on`, or a scenario of the design. */
export interface PowerState {
  readonly id: string;
  readonly label: string;
  readonly off: ReadonlySet<string>;
  /** Pins whose role, drive or internal pull differ in this state, by `PART.PIN`. */
  readonly pins: ReadonlyMap<string, PinState>;
  readonly scenario: Scenario | undefined;
}

/** A pin in a power state. */
export interface PinView extends ResolvedPin {
  readonly powered: boolean;
}

/** A pull resistor of a net: the net's own, or a pin's internal one. */
export interface PullSource {
  readonly ohms: number;
  /** The ends of its range, Ω (both `ohms` unless the pull gives a tolerance or min/max). */
  readonly min: number;
  readonly max: number;
  /** Rail id, or `ground`. */
  readonly to: string;
  /**
   * `net` for the net's own pull, the pin key `PART.PIN` whose internal pull it is, or the id of a
   * resistor (a discrete part) with one end on the net and the other tied to a rail or ground.
   */
  readonly origin: string;
  /** A resistor part's tolerance (fraction); a `pull` field is taken as exact. */
  readonly tolerance?: number;
  /** True for a resistor part: an external pull, as the net's own `pull` is. */
  readonly resistor?: boolean;
}

/** A net joined to others by discrete parts: one node of a signal path. */
export interface PathNode {
  readonly netId: string;
  readonly pins: readonly PinView[];
  readonly pulls: readonly PullSource[];
  /** Σ cin of the net's pins + its wiring capacitance, F. */
  readonly capacitance: number;
}

/** A resistor in series between two nodes of a path (indices into `nodes`). */
export interface SeriesResistor {
  readonly id: string;
  readonly a: number;
  readonly b: number;
  readonly ohms: number;
  readonly tolerance: number;
}

/** The nets joined to a net by series resistors, solved together by nodal analysis. */
export interface ResistorPath {
  readonly nodes: readonly PathNode[];
  readonly resistors: readonly SeriesResistor[];
  /** The index of the net being judged. */
  readonly self: number;
}

/** A FET or diode shifter between the net being judged and another net. */
export interface ShifterLink {
  readonly part: FetShifter | DiodeShifter;
  /** The shifter's pin on the net being judged (`S`, `D`, `K` or `A`). */
  readonly pin: string;
  /** The net on its other pin; this net's own node is `self`. */
  readonly other: PathNode;
  readonly self: PathNode;
  /**
   * The nets joined to the other side by series resistors, with the other side as its `self`:
   * a driver on them reaches this net through the resistors and then the shifter.
   */
  readonly otherPath?: ResistorPath;
}

/** The 10–90 % edge at a net reached through series resistors from a driver on another net. */
export interface PathEdge {
  readonly driver: string;
  /** Ω, the Thévenin resistance seen from the net with the driver's node and every rail at 0 V, resistors at their largest. */
  readonly resistance: number;
  readonly capacitance: number;
  readonly riseTime: number;
  /** V, the driver rail's lowest voltage. */
  readonly swing: number;
}

/** Rail ranges in one power state (an off rail is 0 V). */
export interface RailStates {
  readonly ranges: ReadonlyMap<string, Range>;
  /** The ranges with every rail on, for limits stated "at the rail's lowest voltage". */
  readonly onRanges: ReadonlyMap<string, Range>;
  readonly off: ReadonlySet<string>;
}

/** Settings with defaults applied. */
export interface EffectiveSettings {
  readonly minMargin: number;
  readonly defaultWiringCapacitance: number;
}

/** One net prepared once per power state: what every net rule receives. */
export interface NetView {
  readonly net: Net;
  /** How messages name nets, rails and profiles: by their labels. */
  readonly names: Names;
  readonly settings: EffectiveSettings;
  readonly rails: RailStates;
  /** Every pin on the net, powered or not, in the net's order. */
  readonly pins: readonly PinView[];
  /** Powered outputs and bidir pins. */
  readonly drivers: readonly PinView[];
  /** Powered inputs and bidir pins. */
  readonly receivers: readonly PinView[];
  /** Pins on an off rail. */
  readonly unpowered: readonly PinView[];
  readonly pulls: readonly PullSource[];
  /** Σ cin of the net's pins + wiring capacitance, F. */
  readonly capacitance: number;
  /** Every powered driver is open-drain, there is one, and a pull goes to a rail. */
  readonly highFromPull: boolean;
  /** Load currents on each powered driver (bounds, A), by pin key. */
  readonly loads: ReadonlyMap<string, DriverLoad>;
  /** Distinct rails of the net's pins (pull rails excluded), in order of first appearance. */
  readonly pinRails: readonly string[];
  /** The level analysis of every driver/receiver pair. */
  readonly analysis: NetAnalysis;
  /** The nets joined to this one by series resistors (version 2), when there are any. */
  readonly path?: ResistorPath;
  /** FET and diode shifters with a pin on this net (version 2). */
  readonly shifters: readonly ShifterLink[];
  /** Powered drivers on other nets that reach this one through resistors or shifters. */
  readonly remoteDrivers: readonly PinView[];
  /** The slowest edge arriving through series resistors, when a driver reaches the net only that way. */
  readonly pathEdge?: PathEdge;
  /** Distinct rails of the pins on this net and on every net joined to it (for the crossing table). */
  readonly pathRails: readonly string[];
  /**
   * Powered drivers that reach this net only through a chain the pair analysis does not solve
   * (series resistors and shifters mixed, or more than one shifter), with the parts on the way.
   */
  readonly unjudged: readonly UnjudgedChain[];
}

/** A driver reaching a net through a chain of parts between chips that is not solved (paths.ts). */
export interface UnjudgedChain {
  readonly driver: string;
  readonly via: readonly string[];
  /** The driver's rail and the gate rails of the FETs on the way. */
  readonly rails: readonly string[];
}

export interface DriverLoad {
  readonly high: number;
  readonly low: number;
}

/** A pin on no net, in one power state (`floating-input` judges unused inputs). */
export interface LonePinView {
  readonly pin: PinView;
  readonly names: Names;
  readonly settings: EffectiveSettings;
  /** The states of the pin's own rail and of its internal pull's rail: nothing else. */
  readonly rails: RailStates;
}

/** The pins on one rail that use one profile (`rail-range`, judged once, in `all-on`). */
export interface RailView {
  readonly rail: Rail;
  readonly names: Names;
  /** The rail's range with every rail on. */
  readonly range: Range;
  readonly profile: string;
  /** The distinct resolved `vddRange`s among the group's pins (the engine keeps them counted). */
  readonly vddRanges: readonly (readonly [number, number])[];
  /** The keys of the group's pins that have a `vddRange`, sorted; built only when asked for. */
  readonly pinKeys: () => string[];
  /** The distinct parts of those pins, in the order the keys name them first. */
  readonly partIds: () => string[];
  readonly settings: EffectiveSettings;
}

/** The clamp currents into one rail in one power state (`rail-injection`). */
export interface InjectionView {
  readonly rail: Rail;
  readonly names: Names;
  /** Each input's clamp current, sorted by pin key. */
  readonly injected: readonly { readonly pin: string; readonly net: string; readonly current: number }[];
  readonly state: PowerState;
  readonly settings: EffectiveSettings;
}

export type PairStatus = 'pass' | 'warning' | 'fail';

/** One side (high or low) of a driver/receiver pair at its worst corner. */
export interface LevelSide {
  /** VOH (high) or VOL (low), V. */
  readonly out: number;
  /** VIH (high) or VIL (low), V. */
  readonly threshold: number;
  /** NMH = VOH − VIH, or NML = VIL − VOL. */
  readonly margin: number;
  readonly driverVdd: number | null;
  readonly receiverVdd: number;
  /** Thévenin voltage of the pulls at the corner, when the high level comes from the pull-up. */
  readonly vpull?: number;
  readonly estimate: boolean;
  readonly status: PairStatus;
  /** The load current the level was selected for, A. */
  readonly load: number;
  /** Through a discrete part: the quantities its level came from (resistances, currents, k). */
  readonly detail?: Readonly<Record<string, number>>;
}

export interface PairAnalysis {
  readonly driver: string;
  readonly receiver: string;
  /** How the driver reaches the receiver: on one net, or through a discrete part (its id). */
  readonly via?: string;
  readonly high: LevelSide | null;
  readonly low: LevelSide | null;
}

export interface NetAnalysis {
  readonly pairs: readonly PairAnalysis[];
  /** Worst NMH / NML over the pairs, null when no pair has that side. */
  readonly worstHigh: number | null;
  readonly worstLow: number | null;
}

/** What every finding has, whatever its rule (report-format.md, "Finding"). */
interface FindingBase {
  readonly id: string;
  readonly severity: Severity;
  readonly scenario: string;
  readonly net: string | null;
  /** Where it sits: the net's id, the pin's key (a pin on no net) or the rail's id. Not reported. */
  readonly place: string;
  /** The part of the id after the power state, when a rule reports more than one per place. Not reported. */
  readonly suffix?: string;
  readonly pins: readonly string[];
  readonly parts: readonly string[];
  readonly message: string;
  /** The rule's message, or `undecidable` when a number met on the way was not finite. */
  readonly messageId: string;
  readonly hint: string;
  readonly waived?: string;
}

/** A finding of one rule, with that rule's values (rules/engine/values.ts). */
export type FindingOf<I extends RuleId> = FindingBase & { readonly rule: I; readonly values: FindingValues<I> };

/** A finding: a union discriminated by `rule`, so that reading `values` narrows by rule. */
export type Finding = { [I in RuleId]: FindingOf<I> }[RuleId];

/** Results of one net in one power state. */
export interface NetResult {
  readonly net: Net;
  readonly view: NetView;
  readonly findings: readonly Finding[];
}

export interface Summary {
  readonly error: number;
  readonly warning: number;
  readonly info: number;
  readonly waived: number;
}

export interface CheckResult {
  /** The design this result belongs to (the incremental check compares against it). */
  readonly design: Design;
  readonly states: readonly PowerState[];
  /** Per power state id, per net id. */
  readonly nets: ReadonlyMap<string, ReadonlyMap<string, NetResult>>;
  /** Findings on pins that are on no net, per power state id, per pin key. */
  readonly lonePins: ReadonlyMap<string, ReadonlyMap<string, readonly Finding[]>>;
  /** Findings on rails (judged once, in `all-on`), per (rail, profile) group. */
  readonly railFindings: ReadonlyMap<string, readonly Finding[]>;
  /** Findings on the clamp current into each rail, per power state id (version 2). */
  readonly injectionFindings: ReadonlyMap<string, readonly Finding[]>;
  /** Every finding, in the report's order (built when first read). */
  readonly findings: readonly Finding[];
  readonly summary: Summary;
  readonly stats: CheckStats;
}

export interface CheckStats {
  /** Nets prepared and checked by this call, counted once per power state. */
  readonly netsChecked: number;
  /** Whether this call re-checked only what changed. */
  readonly incremental: boolean;
  readonly ms: number;
}

export type { Waiver, Discrete };
