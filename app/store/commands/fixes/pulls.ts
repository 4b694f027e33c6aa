/**
 * Fixes with a resistor: a pull-up for an open-drain net (sized the way `pull-range` sizes it),
 * a pull-up value moved into its range, and a tie for a floating input.
 */
import type { Draft } from 'immer';
import { check } from '../../../../rules/check/index.ts';
import type { CheckResult, Finding } from '../../../../rules/engine/index.ts';
import { choosePull } from '../../../../rules/levels/index.ts';
import { formatQuantity } from '../../../../rules/levels/index.ts';
import { GROUND } from '../../../../rules/model/index.ts';
import type { Design, Pull } from '../../../../rules/model/index.ts';
import { refuse, type Refusal } from '../command.ts';
import { findNet, lowestRail, netName, pinAt, railName, railOfPin } from './lookup.ts';
import { newErrors, tryOn } from './preview.ts';
import { DEFAULT_PULL_OHMS } from './translator.ts';
import type { QuickFix } from './types.ts';
import { railOf } from '../../../../rules/model/index.ts';

const ohms = (r: number) => formatQuantity(r, 'Ω');

/** Tie values tried for a floating net that has drivers, smallest first: the first that loads no driver beyond its rating wins. */
const TIE_VALUES = [10e3, 22e3, 47e3, 100e3];

/** A tie for an input: 10 kΩ, a usual general-purpose value (common practice). */
export const TIE_OHMS = 10e3;

function setNetPull(draft: Draft<Design>, netId: string, pull: Pull): Refusal | undefined {
  const net = draft.nets.find((n) => n.id === netId);
  if (net === undefined) return refuse(`There is no net ${netId}.`);
  net.pull = { to: pull.to, ohms: pull.ohms };
}

/**
 * The value `pull-range` advises in every power state (README, "Pull-up advice"): the advice
 * ranges of the net's `pull-range` findings intersected (the largest low end, the smallest high
 * end; each already shrunk by the tolerance, guarded and capped), then the same choice the rule
 * makes, the E12 value nearest the middle, else E24. Undefined when no finding advises, a state
 * leaves no value (a range empty, or the pins' own pulls already too strong), or the ranges
 * leave none together.
 */
export function pullValueFrom(
  findings: readonly Finding[],
  net: string,
): { ohms: number; rMin: number; rMax: number | null; to: string | null } | undefined {
  let lo = 0;
  let hi = Infinity;
  let seen = false;
  let to: string | null = null;
  for (const f of findings) {
    if (f.rule !== 'pull-range' || f.net !== net) continue;
    seen = true;
    const { adviceMin, adviceMax, suggested, adviceTo } = f.values;
    if (typeof suggested !== 'number' || typeof adviceMin !== 'number') return undefined;
    lo = Math.max(lo, adviceMin);
    if (typeof adviceMax === 'number') hi = Math.min(hi, adviceMax);
    if (typeof adviceTo === 'string') to ??= adviceTo;
  }
  if (!seen || !(lo <= hi)) return undefined;
  const r = choosePull(lo, hi).suggested;
  return r === null ? undefined : { ohms: r, rMin: lo, rMax: hi === Infinity ? null : hi, to };
}

function rangeText(v: { rMin: number; rMax: number | null }): string {
  return v.rMax === null ? `${ohms(v.rMin)} and above` : `${ohms(v.rMin)}–${ohms(v.rMax)}`;
}

/** missing-pull: add the net's pull-up to the lowest rail of its receivers, sized on a trial check. */
export function addPullFix(design: Design, finding: Finding): QuickFix | undefined {
  const net = finding.net === null ? undefined : findNet(design, finding.net);
  if (net === undefined) return undefined;
  const receiving: string[] = [];
  const all: string[] = [];
  for (const key of net.pins) {
    const at = pinAt(design, key);
    if (at === undefined) continue;
    all.push(railOfPin(at));
    if (at.pin.role !== 'output') receiving.push(railOfPin(at));
  }
  const to = lowestRail(design, receiving.length > 0 ? receiving : all);
  if (to === undefined) return undefined;
  const trial = tryOn(design, (d) => setNetPull(d, net.id, { to, ohms: DEFAULT_PULL_OHMS }));
  const value = pullValueFrom(check(trial.design).findings, net.id);
  if (value === undefined) return undefined;
  const pull: Pull = { to, ohms: value.ohms };
  return {
    id: 'pull-up',
    finding: finding.id,
    title: `Pull ${netName(net)} up to ${railName(design, to)} with ${ohms(value.ohms)}`,
    sentence:
      `Adds a ${ohms(value.ohms)} pull-up from ${netName(net)} to ${railName(design, to)}, the standard value nearest the middle of ` +
      `${rangeText(value)} (the allowed range within its tolerance), so that the open-drain drivers have a high level to release to.`,
    apply: (draft) => setNetPull(draft, net.id, pull),
  };
}

/**
 * pull-range outside its range: set the net's own pull-up to the value the rule advises in every
 * power state, or add one when the pins' internal pulls were all the net had.
 */
export function pullValueFix(design: Design, finding: Finding, result: CheckResult): QuickFix | undefined {
  const net = finding.net === null ? undefined : findNet(design, finding.net);
  if (net === undefined) return undefined;
  const value = pullValueFrom(result.findings, net.id);
  if (value === undefined) return undefined;
  const pull = net.pull !== undefined && net.pull.to !== GROUND ? net.pull : undefined;
  const to = pull?.to ?? value.to;
  if (to === null || (pull !== undefined && value.ohms === pull.ohms)) return undefined;
  const next: Pull = { to, ohms: value.ohms };
  return {
    id: 'pull-value',
    finding: finding.id,
    title:
      pull === undefined
        ? `Pull ${netName(net)} up to ${railName(design, to)} with ${ohms(value.ohms)}`
        : `Change the pull-up of ${netName(net)} to ${ohms(value.ohms)}`,
    sentence:
      `${pull === undefined ? `Adds a ${ohms(value.ohms)} pull-up to ${railName(design, to)} beside the pins' own pulls` : `Replaces the ${ohms(pull.ohms)} pull-up to ${railName(design, pull.to)} by ${ohms(value.ohms)}`}, ` +
      `the standard value nearest the middle of ${rangeText(value)}, the range its drivers, receivers and rise time allow within its tolerance.`,
    apply: (draft) => setNetPull(draft, net.id, next),
  };
}

/**
 * floating-input on a net: a pull-up to the receivers' lowest rail, and a pull-down. Where the
 * net has (three-state) drivers, the smallest of the tie values that overloads none of them.
 */
export function tieNetFixes(design: Design, finding: Finding, result: CheckResult): QuickFix[] {
  const net = finding.net === null ? undefined : findNet(design, finding.net);
  if (net === undefined) return [];
  const receiving: string[] = [];
  let drivers = 0;
  for (const key of net.pins) {
    const at = pinAt(design, key);
    if (at === undefined) continue;
    if (at.pin.role !== 'output') receiving.push(railOfPin(at));
    if (at.pin.role !== 'input') drivers++;
  }
  const rail = lowestRail(design, receiving);
  const ends: { id: string; to: string; up: boolean }[] = [
    ...(rail === undefined ? [] : [{ id: 'pull-up', to: rail, up: true }]),
    { id: 'pull-down', to: GROUND, up: false },
  ];
  const fixes: QuickFix[] = [];
  for (const end of ends) {
    const value =
      drivers === 0
        ? TIE_OHMS
        : TIE_VALUES.find((r) => {
            const trial = tryOn(design, (d) => setNetPull(d, net.id, { to: end.to, ohms: r }));
            return newErrors(result.findings, check(trial.design).findings).length === 0;
          });
    if (value === undefined) continue;
    const pull: Pull = { to: end.to, ohms: value };
    fixes.push({
      id: end.id,
      finding: finding.id,
      title: end.up
        ? `Pull ${netName(net)} up to ${railName(design, end.to)} with ${ohms(value)}`
        : `Pull ${netName(net)} down with ${ohms(value)}`,
      sentence: end.up
        ? `Adds a ${ohms(value)} pull-up from ${netName(net)} to ${railName(design, end.to)}, so that its inputs read high whenever nothing drives the net.`
        : `Adds a ${ohms(value)} pull-down from ${netName(net)} to ground, so that its inputs read low whenever nothing drives the net.`,
      apply: (draft) => setNetPull(draft, net.id, pull),
    });
  }
  return fixes;
}

/** floating-input on an unused input (on no net): the pin's own pull, to its rail or to ground. */
export function tiePinFixes(design: Design, finding: Finding): QuickFix[] {
  const key = finding.pins[0];
  const at = key === undefined ? undefined : pinAt(design, key);
  if (key === undefined || at === undefined) return [];
  const rail = railOfPin(at);
  return [
    { id: 'pull-up', to: rail, text: `high to ${railName(design, rail)}` },
    { id: 'pull-down', to: GROUND, text: 'low to ground' },
  ].map((end) => ({
    id: end.id,
    finding: finding.id,
    title: `Tie ${key} ${end.text}`,
    sentence: `Gives the unused input ${key} a ${ohms(TIE_OHMS)} pull ${end.text} (its own pull), so that it never floats.`,
    apply(draft: Draft<Design>) {
      const now = pinAt(draft as Design, key);
      if (now === undefined) return refuse(`There is no pin ${key}.`);
      const pin = draft.parts.find((p) => p.id === now.part.id)!.pins.find((p) => p.id === now.pin.id)!;
      pin.pull = { to: end.to, ohms: TIE_OHMS };
    },
  }));
}

/** An input named active-low (`RESET_N`, `CS#`): tied high, so that an unused one never asserts. */
export function isActiveLowName(pinId: string): boolean {
  return /(_N|#)$/i.test(pinId);
}

/**
 * The part's inputs that are on no net and have no pull of their own: the ones that float
 * unused; an input whose floating the engineer has accepted (a waiver in the pin) is left be.
 */
export function unusedInputsOf(design: Design, partId: string): string[] {
  const part = design.parts.find((p) => p.id === partId);
  if (part === undefined) return [];
  const onNets = new Set<string>();
  for (const n of design.nets) for (const k of n.pins) onNets.add(k);
  return part.pins
    .filter(
      (p) =>
        p.role === 'input' &&
        p.pull === undefined &&
        !onNets.has(`${part.id}.${p.id}`) &&
        !(p.waivers ?? []).some((w) => w.rule === 'floating-input'),
    )
    .map((p) => p.id);
}

/**
 * floating-input on an unused input: tie every unused input of its part at once (one undo
 * step), each through its own pull as the single tie does. Unused CMOS inputs go to a defined
 * level, low to ground, except inputs named active-low, which go high to the part's rail so
 * that they never assert (common practice). Offered when the part has two or more.
 */
export function tieUnusedInputsFix(design: Design, finding: Finding): QuickFix | undefined {
  const key = finding.pins[0];
  const at = key === undefined ? undefined : pinAt(design, key);
  if (at === undefined) return undefined;
  const partId = at.part.id;
  const pins = unusedInputsOf(design, partId);
  if (pins.length < 2) return undefined;
  const rail = at.part.rail;
  const railLabel = design.rails.find((r) => r.id === rail)?.label ?? rail;
  const high = pins.filter(isActiveLowName);
  const low = pins.filter((p) => !isActiveLowName(p));
  const list = (ids: string[]) => ids.join(', ');
  const partName = at.part.label === '' ? partId : `${at.part.label} (${partId})`;
  return {
    id: 'tie-unused-inputs',
    finding: finding.id,
    title: `Tie all ${pins.length} unused inputs of ${partId} to defined levels`,
    sentence:
      `Gives each unused input of ${partName} a ${ohms(TIE_OHMS)} pull of its own, in one step: ` +
      (low.length > 0 ? `${list(low)} low to ground` : '') +
      (low.length > 0 && high.length > 0 ? '; ' : '') +
      (high.length > 0 ? `${list(high)} (active-low) high to ${railLabel}` : '') +
      '. An unused CMOS input left open drifts and draws current; tied, it reads a fixed level.',
    apply(draft: Draft<Design>) {
      const part = draft.parts.find((p) => p.id === partId);
      if (part === undefined) return refuse(`There is no part ${partId}.`);
      const now = unusedInputsOf(draft as Design, partId);
      if (now.length === 0) return refuse(`${partId} has no unused input left to tie.`);
      for (const id of now) {
        const pin = part.pins.find((p) => p.id === id)!;
        const to = isActiveLowName(id) ? railOf(part, pin) : GROUND;
        pin.pull = { to, ohms: TIE_OHMS };
      }
    },
  };
}
