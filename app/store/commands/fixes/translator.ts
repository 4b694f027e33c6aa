/**
 * Insert a dual-rail translator into a net that crosses rails: the net is split in two, the
 * side on rail A (the driver's, or the source's) keeps the net's id and waivers, the side on
 * rail B gets a new net, and a translator part joins them with one pin on each rail.
 */
import type { Draft } from 'immer';
import type { Design, Net, Part, Pin, Pull } from '../../../../rules/model/index.ts';
import { GROUND } from '../../../../rules/model/index.ts';
import { freshId, refuse, splitPinKey, type Refusal } from '../command.ts';
import { findNet, netName, pinAt, railName, railOfPin, uniqueId } from './lookup.ts';
import { driveOf } from '../../../../rules/model/index.ts';
import { chipSize } from '../../../canvas/chipLayout.ts';
import { freePlace } from '../../../canvas/freeSpot.ts';
import type { QuickFix } from './types.ts';

/** Built-in translator side profiles (rules/profiles/translators.ts). */
export const TRANSLATOR_PUSH_PULL = 'xlat-side';
export const TRANSLATOR_OPEN_DRAIN = 'xlat-od';

/** A pull for an open-drain side that had none: a usual general-purpose value (common practice). */
export const DEFAULT_PULL_OHMS = 10e3;

/**
 * The most channels a translator part is given by adding channels: eight, as in the octal
 * parts of the trade (common practice). Channel 1 is pins A and B, channel k is Ak and Bk.
 */
export const MAX_CHANNELS = 8;

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
  /** The channel's pin ids on the translator: `A`/`B` for a new part, `Ak`/`Bk` for channel k of one already there. */
  readonly a: string;
  readonly b: string;
  /** The channel's number, and whether the part is already in the design. */
  readonly channel: number;
  readonly existing: boolean;
  readonly newNetId: string;
  readonly newNetLabel: string;
}

const profileFor = (direction: Direction) =>
  direction === 'open-drain' ? TRANSLATOR_OPEN_DRAIN : TRANSLATOR_PUSH_PULL;

/** How many channels a translator part has: its pins `A`, `A2`, `A3`, … */
function channelsOf(part: Part): number {
  let n = 0;
  while (part.pins.some((p) => p.id === (n === 0 ? 'A' : `A${n + 1}`))) n++;
  return n;
}

/**
 * A translator part made by this fix that joins the same rails for the same kind of signal and
 * has room for one more channel: the first such part, in the design's order.
 */
export function translatorWithRoom(design: Design, plan: TranslatorPlan, direction: Direction): Part | undefined {
  return design.parts.find((part) => {
    if (part.profile !== profileFor(direction) || part.rail !== plan.railA) return false;
    const b = part.pins.find((p) => p.id === 'B');
    if (b === undefined || b.rail !== plan.railB) return false;
    const n = channelsOf(part);
    return n >= 1 && n < MAX_CHANNELS && !part.pins.some((p) => p.id === `A${n + 1}` || p.id === `B${n + 1}`);
  });
}

/**
 * The layout of a translator for `plan`, or why there is none. With `into`, the signal takes the
 * next channel of that translator part instead of a new part. Reads only: works on a draft too.
 */
export function layoutTranslator(design: Design, plan: TranslatorPlan, into?: string): TranslatorLayout | Refusal {
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
    const drive = driveOf(at.pin);
    if (drive === undefined) continue;
    drivers++;
    if (drive === 'open-drain') openDrain++;
    if (onB) bDrives = true;
    else aDrives = true;
  }
  if (aPins.length === 0 || bPins.length === 0)
    return refuse(`Net ${plan.net} has no pins on both sides of the crossing.`);
  const direction: Direction =
    drivers > 0 && openDrain === drivers ? 'open-drain' : aDrives && bDrives ? 'both' : bDrives ? 'b-to-a' : 'a-to-b';
  const newNetId = uniqueId(
    `${net.id}_${plan.railB}`,
    design.nets.map((n) => n.id),
  );
  const halves = { net, aPins, bPins, direction, newNetId, newNetLabel: `${netName(net)}_${plan.railB}` };
  if (into === undefined) {
    return {
      ...halves,
      partId: freshId(
        'U',
        design.parts.map((p) => p.id),
      ),
      a: 'A',
      b: 'B',
      channel: 1,
      existing: false,
    };
  }
  const host = translatorWithRoom(design, plan, direction);
  if (host === undefined || host.id !== into)
    return refuse(`Translator ${into} has no free channel between ${plan.railA} and ${plan.railB} for this net.`);
  const channel = channelsOf(host) + 1;
  return { ...halves, partId: host.id, a: `A${channel}`, b: `B${channel}`, channel, existing: true };
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

/** The two pins of one channel: A on the part's rail, B on rail B; roles from the direction. */
function channelPins(layout: TranslatorLayout, railB: string, aSide: Pin['side'], bSide: Pin['side']): [Pin, Pin] {
  const pin = (id: string, onB: boolean, role: Pin['role'], drive?: Pin['drive']): Pin => ({
    id,
    role,
    ...(drive === undefined ? {} : { drive }),
    ...(onB ? { rail: railB } : {}),
    side: onB ? bSide : aSide,
  });
  const { a, b } = layout;
  switch (layout.direction) {
    case 'open-drain':
      return [pin(a, false, 'bidir', 'open-drain'), pin(b, true, 'bidir', 'open-drain')];
    case 'both':
      return [pin(a, false, 'bidir'), pin(b, true, 'bidir')];
    case 'b-to-a':
      return [pin(a, false, 'output'), pin(b, true, 'input')];
    default:
      return [pin(a, false, 'input'), pin(b, true, 'output')];
  }
}

const LABEL_PREFIX = 'Dual-rail translator for ';

/**
 * A new translator part: side B faces the parts it moves to the new net; the chip goes near the
 * middle between the two sides' parts, on the first spot nearby where it overlaps none
 * (chipLayout's search, as the palette places chips).
 */
function translatorPart(design: Design, plan: TranslatorPlan, layout: TranslatorLayout): Part {
  const a = centre(design, layout.aPins);
  const b = centre(design, layout.bPins);
  const bOnRight = b.x >= a.x;
  const pins = channelPins(layout, plan.railB, bOnRight ? 'left' : 'right', bOnRight ? 'right' : 'left');
  const middle = { x: Math.round((a.x + b.x) / 2), y: Math.round((a.y + b.y) / 2) };
  return {
    id: layout.partId,
    label: `${LABEL_PREFIX}${netName(layout.net)}`,
    rail: plan.railA,
    profile: profileFor(layout.direction),
    position: freePlace(design, middle, chipSize({ id: layout.partId, label: '', rail: '', profile: '', pins })),
    pins,
  };
}

/** Adds the layout's channel to a translator part already in the draft, its pins on the sides of channel 1's. */
function addChannel(part: Draft<Part>, plan: TranslatorPlan, layout: TranslatorLayout): void {
  const sideOf = (id: string) => part.pins.find((p) => p.id === id)?.side;
  part.pins.push(...channelPins(layout, plan.railB, sideOf('A') ?? 'left', sideOf('B') ?? 'right'));
  // A label this fix wrote names the nets it carries; one the user wrote is left alone.
  if (part.label.startsWith(LABEL_PREFIX)) part.label = `${part.label}, ${netName(layout.net)}`;
}

/**
 * The route of each half: wires within a side stay; a wire that crossed now ends on the
 * translator's pin of each side. None when the net had no route (the editor then draws a chain).
 */
function splitRoute(
  net: Net,
  bSet: ReadonlySet<string>,
  xa: string,
  xb: string,
): { a?: [string, string][]; b?: [string, string][] } {
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

/** Split the net and insert the translator (or, with `into`, a new channel of that one) into a draft. */
export function insertTranslator(draft: Draft<Design>, plan: TranslatorPlan, into?: string): Refusal | undefined {
  const design = draft as Design;
  const layout = layoutTranslator(design, plan, into);
  if (isRefusal(layout)) return layout;
  const xa = `${layout.partId}.${layout.a}`;
  const xb = `${layout.partId}.${layout.b}`;
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
  if (layout.existing) addChannel(draft.parts.find((p) => p.id === layout.partId)!, plan, layout);
  else draft.parts.push(translatorPart(design, plan, layout));
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

/**
 * The fixes that put a translator into the net: the next channel of a translator the design
 * already has between the same rails (first: one part rather than many), and a new translator
 * part. None when the net cannot be split that way.
 */
export function translatorFixes(design: Design, finding: string, plan: TranslatorPlan, why: string): QuickFix[] {
  const layout = layoutTranslator(design, plan);
  if (isRefusal(layout)) return [];
  const pulled = layout.direction === 'open-drain' ? ', each side pulled up to its own rail' : '';
  const moves = `moves ${layout.bPins.join(', ')} to a new net ${layout.newNetLabel}${pulled}, so that ${why}.`;
  const fixes: QuickFix[] = [];
  const host = translatorWithRoom(design, plan, layout.direction);
  const channel = host === undefined ? undefined : layoutTranslator(design, plan, host.id);
  if (host !== undefined && channel !== undefined && !isRefusal(channel)) {
    fixes.push({
      id: 'translator-channel',
      finding,
      title: `Use channel ${channel.channel} of translator ${host.id} on ${netName(layout.net)}`,
      sentence:
        `Adds channel ${channel.channel} (${channel.a} on ${railName(design, plan.railA)}, ${channel.b} on ${railName(design, plan.railB)}) to ${host.id}, ` +
        `the ${DIRECTION_TEXT[layout.direction]} translator already between these rails, and ${moves}`,
      apply: (draft) => insertTranslator(draft, plan, host.id),
    });
  }
  fixes.push({
    id: 'translator',
    finding,
    title: `Insert translator ${layout.partId} on ${netName(layout.net)}`,
    sentence:
      `Inserts ${layout.partId}, a ${DIRECTION_TEXT[layout.direction]} dual-rail translator with side A on ${railName(design, plan.railA)} ` +
      `and side B on ${railName(design, plan.railB)}, and ${moves}`,
    apply: (draft) => insertTranslator(draft, plan),
  });
  return fixes;
}
