/**
 * The one shape of a rule (house-style.md): metadata plus behaviour. A rule reports drafts that
 * carry a message id, typed data and the values it used; the engine turns them into findings
 * (ids, power state, net, waivers, order).
 */
import type { RuleId } from '../model/ruleIds.ts';
import type { InjectionView, LonePinView, NetView, RailView, Severity } from './types.ts';
import type { RuleValues } from './values.ts';

// eslint-style message functions: each takes the data a finding carries and writes one sentence.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
// biome-ignore lint/suspicious/noExplicitAny: each message takes its own data type; the registry only needs them callable
export type MessageFns = Record<string, (data: any) => string>;

/**
 * The severities a rule may give, each with when it gives it, in words ('' when always): the
 * documentation prints them, the types hold every draft to them, the rule tester checks them.
 */
export type SeverityPolicy<S extends Severity> = { readonly [K in S]: string };

const SEVERITY_ORDER: readonly Severity[] = ['error', 'warning', 'info'];

/** The policy in one line: `error when NMH < 0; warning when NMH < minMargin`. */
export function severityText(policy: Partial<Record<Severity, string>>): string {
  return SEVERITY_ORDER.filter((s) => policy[s] !== undefined)
    .map((s) => (policy[s] === '' ? s : `${s} ${policy[s]}`))
    .join('; ');
}

/** The severities a policy declares. */
export function declaredSeverities(policy: Partial<Record<Severity, string>>): Severity[] {
  return SEVERITY_ORDER.filter((s) => policy[s] !== undefined);
}

export interface RuleMeta<M extends MessageFns, S extends Severity = Severity> {
  /** One line, for tables. */
  readonly title: string;
  /** Which severities the rule gives, and when. */
  readonly severity: SeverityPolicy<S>;
  /** What it finds and how, for the report and the documentation. */
  readonly explanation: string;
  /** The usual remedy, the default hint of its findings. */
  readonly hint: string;
  readonly messages: M;
}

/** What a rule reports; the engine completes it into a Finding. */
export type Draft<M extends MessageFns, S extends Severity = Severity, I extends RuleId = RuleId> = {
  [K in keyof M & string]: {
    readonly messageId: K;
    readonly data: Parameters<M[K]>[0];
    readonly severity: S;
    readonly pins: readonly string[];
    readonly parts: readonly string[];
    /** The numbers used, as the report's values table lists them for this rule. */
    readonly values: RuleValues[I];
    /** Appended to the finding id (`:DRIVER>RECEIVER`, `:PART.PIN`, `:PROFILE`). */
    readonly suffix?: string;
    /** For findings with no net: what stands in the net's place in the id (`PART.PIN`, a rail id). */
    readonly subject?: string;
    /** A remedy more specific than the rule's usual one. */
    readonly hint?: string;
  };
}[keyof M & string];

export type Reporter<M extends MessageFns, S extends Severity = Severity, I extends RuleId = RuleId> = (
  draft: Draft<M, S, I>,
) => void;

export interface Rule<M extends MessageFns = MessageFns, S extends Severity = Severity, I extends RuleId = RuleId> {
  readonly id: I;
  readonly meta: RuleMeta<M, S>;
  /** Judges one prepared net in one power state. */
  readonly checkNet?: (net: NetView, report: Reporter<M, S, I>) => void;
  /** Judges a pin that is on no net, in one power state. */
  readonly checkPin?: (pin: LonePinView, report: Reporter<M, S, I>) => void;
  /** Judges a rail and the pins on it, once (in `all-on`). */
  readonly checkRail?: (rail: RailView, report: Reporter<M, S, I>) => void;
  /** Judges the clamp currents flowing into one rail, in each power state (version 2). */
  readonly checkInjection?: (view: InjectionView, report: Reporter<M, S, I>) => void;
}

/** Declares a rule; the identity function, there for the types. */
export function defineRule<M extends MessageFns, S extends Severity, I extends RuleId>(
  rule: Rule<M, S, I>,
): Rule<M, S, I> {
  return rule;
}

/** A rule of any message set, as the registry and the engine hold them. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
// biome-ignore lint/suspicious/noExplicitAny: a list of rules of every data and message type (a rule's own types stay checked in defineRule)
export type AnyRule = Rule<any, any>;

/** A rule of the given id, as the registry holds it. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
// biome-ignore lint/suspicious/noExplicitAny: as AnyRule, keyed by id
export type RuleOf<I extends RuleId> = Rule<any, any, I>;
