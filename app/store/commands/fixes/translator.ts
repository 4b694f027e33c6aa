/**
 * Insert a dual-rail translator into a net that crosses rails: the net is split in two, the
 * side on rail A (the driver's, or the source's) keeps the net's id and waivers, the side on
 * rail B gets a new net, and a translator part joins them with one pin on each rail.
 */
import type { Draft } from 'immer';
import type { Design, Net, Part, Pin, Pull } from '../../../../rules/model/schema.ts';
import { GROUND } from '../../../../rules/model/references.ts';
import { freshId, refuse, splitPinKey, type Refusal } from '../command.ts';
import { driveOfPin, findNet, netName, pinAt, railOfPin, uniqueId } from './lookup.ts';
import type { QuickFix } from './types.ts';

/** Built-in translator side profiles (rules/profiles/translators.ts). */
export const TRANSLATOR_PUSH_PULL = 'xlat-side';
export const TRANSLATOR_OPEN_DRAIN = 'xlat-od';

/** A pull for an open-drain side that had none: a usual general-purpose value (common practice). */
export const DEFAULT_PULL_OHMS = 10e3;

/** Which way the translator passes the signal. */
export type Direction = 'a-to-b' | 'b-to-a' | 'both' | 'open-drain';

export interface TranslatorPlan {
  readonly net: string;
  /** The driver's (or the offending source's) rail: the translator part's own rail. */
  readonly railA: string;
  /** The rail of the pins moved to the new net: the translator's B pin is on it. */
  readonly railB: string;
}

/** Where everything goes; computed from the design as it is when the fix is offered and again when applied. */
export interface TranslatorLayout {
  readonly net: Net;
  readonly aPins: readonly string[];
  readonly bPins: readonly string[];
  readonly direction: Direction;
  readonly partId: string;
  readonly newNetId: string;
  readonly newNetLabel: string;
}

/** The layout of a translator for `plan`, or why there is none. Reads only: works on a draft too. */
export function layoutTranslator(design: Design, plan: TranslatorPlan): TranslatorLayout | Refusal {
  const net = findNet(design, plan.net);
  if (net === undefined) return refuse(`There is no net ${plan.net}.`);
  if (plan.railA === plan.railB) return refuse('A translator joins two different rails.');
  const aPins: string[] = [];
  const bPins: string[] = [];
  let aDrives = false;
  let bDrives = false;
  let drivers = 0;
  let openDrain = 0;
  for (const key of net.pins) {
    const at = pinAt(design, key);
    if (at === undefined) return refuse(`Net ${plan.net} names a pin that does not exist: ${key}.`);
    const onB = railOfPin(at) === plan.railB;
    (onB ? bPins : aPins).push(key);
    const drive = driveOfPin(at.pin);
    if (drive === undefined) continue;
    drivers++;
    if (drive === 'open-drain') openDrain++;
    if (onB) bDrives = true;
    else aDrives = true;
  }
  if (aPins.length === 0 || bPins.length === 0) return refuse(`Net ${plan.net} has no pins on both sides of the crossing.`);
  const direction: Direction =
    drivers > 0 && openDrain === drivers ? 'open-drain' : aDrives && bDrives ? 'both' : bDrives ? 'b-to-a' : 'a-to-b';
  const partId = freshId('U', design.parts.map((p) => p.id));
  const newNetId = uniqueId(`${net.id}_${plan.railB}`, design.nets.map((n) => n.id));
  return { net, aPins, bPins, direction, partId, newNetId, newNetLabel: `${netName(net)}_${plan.railB}` };
}

function isRefusal(x: TranslatorLayout | Refusal): x is Refusal {
  return 'refused' in x;
}

function centre(design: Design, keys: readonly string[]): { x: number; y: number } {
  const parts = new Set(keys.map((k) => splitPinKey(k).part));
  let x = 0;
  let y = 0;
  let n = 0;
  for (const p of design.parts) {
    if (!parts.has(p.id)) continue;
    x += p.position?.x ?? 0;
    y += p.position?.y ?? 0;
    n++;
  }
  return n === 0 ? { x: 0, y: 0 } : { x: x / n, y: y / n };
}

/** Halfway between the two sides' parts, moved down clear of any part already sitting exactly there. */
function placeBetween(design: Design, layout: TranslatorLayout): { position: { x: number; y: number }; bOnRight: boolean } {
  const a = centre(design, layout.aPins);
  const b = centre(design, layout.bPins);
  const x = Math.round((a.x + b.x) / 2);
  let y = Math.round((a.y + b.y) / 2);
  const taken = new Set(design.parts.map((p) => `${p.position?.x ?? 0},${p.position?.y ?? 0}`));
  while (taken.has(`${x},${y}`)) y += 80;
  return { position: { x, y }, bOnRight: b.x >= a.x };
}

function translatorPart(design: Design, plan: TranslatorPlan, layout: TranslatorLayout): Part {
  const { position, bOnRight } = placeBetween(design, layout);
  const aSide = bOnRight ? 'left' : 'right';
  const bSide = bOnRight ? 'right' : 'left';
  const pin = (id: 'A' | 'B', role: Pin['role'], drive?: Pin['drive']): Pin => ({
    id, role, ...(drive === undefined ? {} : { drive }), ...(id === 'B' ? { rail: plan.railB } : {}), side: id === 'A' ? aSide : bSide,
  });
  const pins: Pin[] =
    layout.direction === 'open-drain' ? [pin('A', 'bidir', 'open-drain'), pin('B', 'bidir', 'open-drain')]
    : layout.direction === 'both' ? [pin('A', 'bidir'), pin('B', 'bidir')]
    : layout.direction === 'b-to-a' ? [pin('A', 'output'), pin('B', 'input')]
    : [pin('A', 'input'), pin('B', 'output')];
  return {
    id: layout.partId,
    label: `Dual-rail translator for ${netName(layout.net)}`,
    rail: plan.railA,
    profile: layout.direction === 'open-drain' ? TRANSLATOR_OPEN_DRAIN : TRANSLATOR_PUSH_PULL,
    position,
    pins,
  };
}

/**
 * The route of each half: wires within a side stay; a wire that crossed now ends on the
 * translator's pin of each side. None when the net had no route (the editor then draws a chain).
 */
function splitRoute(net: Net, bSet: ReadonlySet<string>, xa: string, xb: string): { a?: [string, string][]; b?: [string, string][] } {
  if (net.route === undefined) return {};
  const a: [string, string][] = [];
  const b: [string, string][] = [];
  const add = (list: [string, string][], p: string, q: string) => {
    if (!list.some(([x, y]) => (x === p && y === q) || (x === q && y === p))) list.push([p, q]);
  };
  for (const [p, q] of net.route) {
    const pb = bSet.has(p);
    const qb = bSet.has(q);
    if (pb && qb) add(b, p, q);
    else if (!pb && !qb) add(a, p, q);
    else {
      add(a, pb ? q : p, xa);
      add(b, xb, pb ? p : q);
    }
  }
  return { a, b };
}

/** The pulls of each half: an open-drain side needs its own pull-up to its own rail. */
function splitPulls(net: Net, plan: TranslatorPlan, direction: Direction): { a?: Pull; b?: Pull } {
  const pull = net.pull;
  if (direction === 'open-drain') {
    const ohms = pull !== undefined && pull.to !== GROUND ? pull.ohms : DEFAULT_PULL_OHMS;
    return {
      a: pull !== undefined && pull.to === plan.railA ? pull : { to: plan.railA, ohms },
      b: { to: plan.railB, ohms },
    };
  }
  if (pull === undefined) return {};
  return pull.to === plan.railB ? { b: pull } : { a: pull };
}

/** Split the net and insert the translator into a draft. */
export function insertTranslator(draft: Draft<Design>, plan: TranslatorPlan): Refusal | void {
  const design = draft as Design;
  const layout = layoutTranslator(design, plan);
  if (isRefusal(layout)) return layout;
  const part = translatorPart(design, plan, layout);
  const xa = `${part.id}.A`;
  const xb = `${part.id}.B`;
  const net = draft.nets.find((n) => n.id === plan.net)!;
  const route = splitRoute(net, new Set(layout.bPins), xa, xb);
  const pulls = splitPulls(net, plan, layout.direction);
  const half: Net = {
    id: layout.newNetId,
    label: layout.newNetLabel,
    pins: [xb, ...layout.bPins],
    ...(pulls.b === undefined ? {} : { pull: { ...pulls.b } }),
    ...(net.wiringCapacitance === undefined ? {} : { wiringCapacitance: net.wiringCapacitance }),
    ...(net.maxRiseTime === undefined ? {} : { maxRiseTime: net.maxRiseTime }),
    ...(route.b === undefined || route.b.length === 0 ? {} : { route: route.b }),
  };
  draft.parts.push(part);
  net.pins = [...layout.aPins, xa];
  if (pulls.a === undefined) delete net.pull;
  else if (pulls.a !== net.pull) net.pull = { ...pulls.a };
  if (route.a !== undefined) {
    if (route.a.length > 0) net.route = route.a;
    else delete net.route;
  }
  const at = draft.nets.indexOf(net);
  draft.nets.splice(at + 1, 0, half);
}

const DIRECTION_TEXT: Readonly<Record<Direction, string>> = {
  'a-to-b': 'one-way',
  'b-to-a': 'one-way',
  both: 'bidirectional (its direction must be controlled)',
  'open-drain': 'bidirectional open-drain',
};

/** The fix that inserts a translator, or undefined when the net cannot be split that way. */
export function translatorFix(design: Design, finding: string, plan: TranslatorPlan, why: string): QuickFix | undefined {
  const layout = layoutTranslator(design, plan);
  if (isRefusal(layout)) return undefined;
  const pulled = layout.direction === 'open-drain' ? ', each side pulled up to its own rail' : '';
  return {
    id: 'translator',
    finding,
    title: `Insert translator ${layout.partId} on ${netName(layout.net)}`,
    sentence:
      `Inserts ${layout.partId}, a ${DIRECTION_TEXT[layout.direction]} dual-rail translator with side A on ${plan.railA} ` +
      `and side B on ${plan.railB}, and moves ${layout.bPins.join(', ')} to a new net ${layout.newNetLabel}${pulled}, ` +
      `so that ${why}.`,
    apply: (draft) => insertTranslator(draft, plan),
  };
}
