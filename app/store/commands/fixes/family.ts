/**
 * Fixes that change what a receiver is: a family with TTL-level inputs (so a lower-rail driver
 * reaches VIH), a family whose inputs tolerate the net's voltage, or, for a pin that is no
 * library family (a microcontroller's, a design-local profile's), a recorded tolerance the
 * user confirms from the datasheet.
 */
import type { Draft } from 'immer';
import { namesOf } from '../../../../rules/engine/index.ts';
import type { Design } from '../../../../rules/model/index.ts';
import { levelAt, type Level } from '../../../../rules/levels/index.ts';
import { below } from '../../../../rules/levels/index.ts';
import { formatQuantity } from '../../../../rules/levels/index.ts';
import { resolveProfile } from '../../../../rules/profiles/index.ts';
import type { FindingOf, ResolvedPin } from '../../../../rules/engine/index.ts';
import { refuse, type Refusal } from '../command.ts';
import { pinAt, rangeOfRail, resolvedPin } from './lookup.ts';
import type { QuickFix } from './types.ts';

const volts = (v: number) => formatQuantity(v, 'V');

/** Each CMOS-input family and its variant with TTL-level inputs and the same outputs (common practice). */
export const TTL_INPUT_VARIANT: Readonly<Record<string, string>> = {
  '74hc': '74hct',
  '74ac': '74act',
  '74ahc': '74ahct',
};

/** Library ids that name a logic family, so that swapping the chip for another family is a real choice. */
const FAMILIES = new Set([
  'ttl',
  '74ls',
  '74hc',
  '74hct',
  '74ac',
  '74act',
  '74ahc',
  '74ahct',
  '74lvc',
  'lvttl33',
  'lvcmos33',
  'lvcmos25',
  'lvcmos18',
  'lvcmos15',
  'lvcmos12',
  'cmos4000',
]);

/** Families whose inputs tolerate more than their own supply, in the library (74LVC, 74AHC/AHCT: 5.5 V). */
const TOLERANT_FAMILIES = ['74lvc', '74ahct', '74ahc'];

/** Tolerances that parts commonly specify for inputs above their supply (common practice: 3.6 V and 5.5 V). */
const COMMON_TOLERANCES = [3.6, 5.5];

/** Where a profile change goes: the pin when it names its own profile, else its part. */
function profileTarget(r: ResolvedPin): 'pin' | 'part' {
  return r.pin.profile !== undefined ? 'pin' : 'part';
}

/** Switch the profile of a part, or of one pin, in a draft. */
function switchProfile(
  draft: Draft<Design>,
  key: string,
  target: 'pin' | 'part',
  from: string,
  to: string,
): Refusal | undefined {
  const at = pinAt(draft as Design, key);
  if (at === undefined) return refuse(`There is no pin ${key}.`);
  const part = draft.parts.find((p) => p.id === at.part.id)!;
  if (target === 'pin') {
    const pin = part.pins.find((p) => p.id === at.pin.id)!;
    if (pin.profile !== from) return refuse(`${key} no longer uses ${from}.`);
    pin.profile = to;
  } else {
    if (part.profile !== from) return refuse(`${part.id} no longer uses ${from}.`);
    part.profile = to;
  }
}

/** The supply range of the receiver's rail lies inside the profile's `vddRange` (none given: any). */
function railFits(design: Design, rail: string, vddRange: readonly [number, number] | undefined): boolean {
  const range = rangeOfRail(design, rail);
  if (range === undefined) return false;
  return vddRange === undefined || (!below(range.min, vddRange[0]) && !below(vddRange[1], range.max));
}

/**
 * level-high into a CMOS-input receiver (74HC, 74AC, 74AHC): the same family with TTL-level
 * inputs, when the driver's worst VOH clears that family's VIH.
 */
export function ttlInputsFix(design: Design, finding: FindingOf<'level-high'>): QuickFix | undefined {
  const { receiver: key, voh, receiverVdd } = finding.values;
  // A level that could not be decided (null) offers no family change.
  if (voh === null || receiverVdd === null) return undefined;
  const r = resolvedPin(design, key);
  if (r === undefined || r.params.schmitt !== undefined || r.origin.vih !== 'profile') return undefined;
  const to = TTL_INPUT_VARIANT[r.profileId];
  const variant = to === undefined ? undefined : resolveProfile(design, to);
  const vih = variant?.params.vih;
  if (to === undefined || variant === undefined || vih === undefined) return undefined;
  if (!railFits(design, r.rail, variant.params.vddRange)) return undefined;
  const newVih = levelAt(vih, receiverVdd);
  if (below(voh, newVih)) return undefined;
  const target = profileTarget(r);
  const what = target === 'pin' ? key : r.partId;
  const name = namesOf(design);
  return {
    id: 'ttl-inputs',
    finding: finding.id,
    title: `Use ${name.profile(to)} for ${what}`,
    sentence:
      `Changes ${what} from ${name.profile(r.profileId)} to ${name.profile(to)}, the same family with TTL-level inputs: its VIH of ` +
      `${volts(newVih)} is below the ${volts(voh)} that ${finding.values.driver} guarantees.`,
    apply: (draft) => switchProfile(draft, key, target, r.profileId, to),
  };
}

function fixedThreshold(level: Level | undefined): boolean {
  return typeof level === 'number';
}

/**
 * overvoltage on a library-family input: each family whose inputs tolerate the net's highest
 * voltage at this rail, those with the same kind of thresholds (fixed or scaled) first.
 */
export function tolerantFamilyFixes(design: Design, finding: FindingOf<'overvoltage'>): QuickFix[] {
  const { pin: key, vNet } = finding.values;
  if (vNet === null) return [];
  const r = resolvedPin(design, key);
  if (r === undefined || r.role === 'output' || !FAMILIES.has(r.profileId) || r.origin.viMax !== 'profile') return [];
  const range = rangeOfRail(design, r.rail);
  if (range === undefined) return [];
  const fixed = fixedThreshold(r.params.vih);
  const candidates = TOLERANT_FAMILIES.filter((id) => id !== r.profileId)
    .map((id) => resolveProfile(design, id))
    .filter((p) => p !== undefined && p.params.viMax !== undefined && railFits(design, r.rail, p.params.vddRange))
    .filter((p) => !below(levelAt(p!.params.viMax!, range.min), vNet))
    .sort((p, q) => Number(fixedThreshold(q!.params.vih) === fixed) - Number(fixedThreshold(p!.params.vih) === fixed));
  const target = profileTarget(r);
  const what = target === 'pin' ? key : r.partId;
  const name = namesOf(design);
  return candidates.map((p) => ({
    id: `tolerant-family:${p!.id}`,
    finding: finding.id,
    title: `Use ${name.profile(p!.id)} for ${what}`,
    sentence:
      `Changes ${what} from ${name.profile(r.profileId)} to ${name.profile(p!.id)}, whose inputs tolerate ` +
      `${volts(levelAt(p!.params.viMax!, range.min))} on this rail, above the ${volts(vNet)} that ${key} can see.`,
    apply: (draft: Draft<Design>) => switchProfile(draft, key, target, r.profileId, p!.id),
  }));
}

/**
 * overvoltage on a pin that is no library family (a microcontroller's GPIO, an off-board
 * signal, a design-local profile): record the input tolerance its datasheet may give, the
 * smallest common one that covers the voltage. Needs the user's confirmation.
 */
export function markTolerantFix(design: Design, finding: FindingOf<'overvoltage'>): QuickFix | undefined {
  const { pin: key, vNet } = finding.values;
  if (vNet === null) return undefined;
  const r = resolvedPin(design, key);
  if (r === undefined || r.role === 'output' || FAMILIES.has(r.profileId)) return undefined;
  const limit = COMMON_TOLERANCES.find((v) => !below(v, vNet));
  if (limit === undefined) return undefined;
  return {
    id: 'mark-tolerant',
    finding: finding.id,
    title: `Mark ${key} as tolerant to ${volts(limit)}`,
    sentence:
      `Records that ${key} tolerates ${volts(limit)} (its viMax), above the ${volts(vNet)} it can see; ` +
      `confirm in the part's datasheet that this pin really is specified so before applying.`,
    needsConfirmation: true,
    apply(draft) {
      const at = pinAt(draft as Design, key);
      if (at === undefined) return refuse(`There is no pin ${key}.`);
      const pin = draft.parts.find((p) => p.id === at.part.id)!.pins.find((p) => p.id === at.pin.id)!;
      pin.params = { ...pin.params, viMax: limit };
    },
  };
}

/**
 * back-power: declare the pin specified for partial power-down. Offered only where that is
 * enough: no `viMaxOff` (which would win) and a powered limit at the rail's lowest voltage that
 * covers the voltage. Needs the user's confirmation from the datasheet.
 */
export function markUnpoweredSafeFix(design: Design, finding: FindingOf<'back-power'>): QuickFix | undefined {
  const { pin: key, vNet } = finding.values;
  if (vNet === null) return undefined;
  const r = resolvedPin(design, key);
  if (
    r === undefined ||
    r.params.viMaxOff !== undefined ||
    r.params.unpoweredSafe === true ||
    r.params.viMax === undefined
  )
    return undefined;
  const range = rangeOfRail(design, r.rail);
  if (range === undefined) return undefined;
  const limit = levelAt(r.params.viMax, range.min);
  if (below(limit, vNet)) return undefined;
  return {
    id: 'mark-unpowered-safe',
    finding: finding.id,
    title: `Mark ${key} as specified for partial power-down`,
    sentence:
      `Records that ${key} may carry voltage while ${namesOf(design).rail(r.rail)} is off (partial power-down), holding it to its ` +
      `${volts(limit)} limit instead of 0.5 V; confirm in the part's datasheet that it is specified so before applying.`,
    needsConfirmation: true,
    apply(draft) {
      const at = pinAt(draft as Design, key);
      if (at === undefined) return refuse(`There is no pin ${key}.`);
      const pin = draft.parts.find((p) => p.id === at.part.id)!.pins.find((p) => p.id === at.pin.id)!;
      pin.params = { ...pin.params, unpoweredSafe: true };
    },
  };
}
