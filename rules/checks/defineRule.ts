/**
 * The one shape of a rule (house-style.md): metadata plus behaviour. A rule reports drafts that
 * carry a message id, typed data and the values it used; the engine turns them into findings
 * (ids, power state, net, waivers, order).
 */
import type { RuleId } from '../model/ruleIds.ts';
import type { InjectionView, LonePinView, NetView, RailView, Severity } from '../engine/types.ts';

// eslint-style message functions: each takes the data a finding carries and writes one sentence.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export type MessageFns = Record<string, (data: any) => string>;

export interface RuleMeta<M extends MessageFns> {
  /** One line, for tables. */
  readonly title: string;
  /** When the rule gives which severity, in words. */
  readonly severity: string;
  /** What it finds and how, for the report and the documentation. */
  readonly explanation: string;
  /** The usual remedy, the default hint of its findings. */
  readonly hint: string;
  readonly messages: M;
}

/** What a rule reports; the engine completes it into a Finding. */
export type Draft<M extends MessageFns> = {
  [K in keyof M & string]: {
    readonly messageId: K;
    readonly data: Parameters<M[K]>[0];
    readonly severity: Severity;
    readonly pins: readonly string[];
    readonly parts: readonly string[];
    readonly values: Readonly<Record<string, unknown>>;
    /** Appended to the finding id (`:DRIVER>RECEIVER`, `:PART.PIN`, `:PROFILE`). */
    readonly suffix?: string;
    /** For findings with no net: what stands in the net's place in the id (`PART.PIN`, a rail id). */
    readonly subject?: string;
    /** A remedy more specific than the rule's usual one. */
    readonly hint?: string;
  };
}[keyof M & string];

export type Reporter<M extends MessageFns> = (draft: Draft<M>) => void;

export interface Rule<M extends MessageFns = MessageFns> {
  readonly id: RuleId;
  readonly meta: RuleMeta<M>;
  /** Judges one prepared net in one power state. */
  readonly checkNet?: (net: NetView, report: Reporter<M>) => void;
  /** Judges a pin that is on no net, in one power state. */
  readonly checkPin?: (pin: LonePinView, report: Reporter<M>) => void;
  /** Judges a rail and the pins on it, once (in `all-on`). */
  readonly checkRail?: (rail: RailView, report: Reporter<M>) => void;
  /** Judges the clamp currents flowing into one rail, in each power state (version 2). */
  readonly checkInjection?: (view: InjectionView, report: Reporter<M>) => void;
}

/** Declares a rule; the identity function, there for the types. */
export function defineRule<M extends MessageFns>(rule: Rule<M>): Rule<M> {
  return rule;
}

/** A rule of any message set, as the registry and the engine hold them. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export type AnyRule = Rule<any>;
