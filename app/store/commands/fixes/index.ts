/**
 * Quick fixes ("Explain and fix"): for a finding, the edits that usually resolve it, each a
 * pure recipe that the store applies as one undoable command (`applyFix`). `previewFix`
 * re-checks a copy so that the panel can show what a fix removes and what it brings.
 */
import type { CheckResult, Finding, FindingOf } from '../../../../rules/engine/index.ts';
import type { Design } from '../../../../rules/model/index.ts';
import { GROUND } from '../../../../rules/model/index.ts';
import type { Command } from '../command.ts';
import { addWaiver } from '../waivers.ts';
import { markTolerantFix, markUnpoweredSafeFix, tolerantFamilyFixes, ttlInputsFix } from './family.ts';
import { findNet, netName, pinAt, railName, railOfPin } from './lookup.ts';
import { driveOf } from '../../../../rules/model/index.ts';
import { addPullFix, pullValueFix, tieNetFixes, tiePinFixes, tieUnusedInputsFix } from './pulls.ts';
import { translatorFixes } from './translator.ts';
import { fetShifterFix } from './shifter.ts';
import { seriesResistorFix } from './series.ts';
import { dividerFix } from './divider.ts';
import type { QuickFix } from './types.ts';

export type { FixFigure, QuickFix } from './types.ts';
export { previewFix, findingsAdded, newErrors, type FixPreview } from './preview.ts';
export {
  layoutTranslator,
  insertTranslator,
  TRANSLATOR_OPEN_DRAIN,
  TRANSLATOR_PUSH_PULL,
  type TranslatorPlan,
} from './translator.ts';
export { pullValueFrom } from './pulls.ts';

/** The placeholder note of a contention waiver: the user completes it with how the enables are kept apart. */
export const CONTENTION_NOTE = 'enables are mutually exclusive: <complete>';

/** The rail of a pin key in the design, if the pin exists. */
function railOf(design: Design, key: string): string | undefined {
  const at = pinAt(design, key);
  return at === undefined ? undefined : railOfPin(at);
}

/** level-high / level-low between pins on different rails: a translator from the driver's rail to the receiver's. */
function levelTranslator(design: Design, f: FindingOf<'level-high'> | FindingOf<'level-low'>): QuickFix[] {
  const railA = railOf(design, f.values.driver);
  const railB = railOf(design, f.values.receiver);
  if (f.net === null || railA === undefined || railB === undefined || railA === railB) return [];
  return translatorFixes(
    design,
    f.id,
    { net: f.net, railA, railB },
    `${f.values.receiver} is driven from its own rail`,
  );
}

/**
 * overvoltage / back-power: a translator between the offending source's rail and the exposed
 * pin's rail. The source is a driver's pin key, `net` (the net's pull) or the pin key whose
 * internal pull it is.
 */
function exposureTranslator(design: Design, f: FindingOf<'overvoltage'> | FindingOf<'back-power'>): QuickFix[] {
  const { pin, source } = f.values;
  if (f.net === null) return [];
  // A pin's own internal pull moves with it: no translator helps there.
  if (source === pin) return [];
  const railB = railOf(design, pin);
  const railA = source === 'net' ? findNet(design, f.net)?.pull?.to : sourceRail(design, source);
  if (railA === undefined || railB === undefined || railA === GROUND || railA === railB) return [];
  const why =
    f.rule === 'back-power'
      ? `${pin} is isolated while ${railName(design, railB)} is off`
      : `${pin} only sees its own rail's levels`;
  return translatorFixes(design, f.id, { net: f.net, railA, railB }, why);
}

function contentionWaiver(design: Design, f: FindingOf<'contention'>): QuickFix | undefined {
  if (f.net === null || f.messageId !== 'enablesNeeded') return undefined;
  const net = f.net;
  const found = findNet(design, net);
  const label = found === undefined ? net : netName(found);
  const command = addWaiver({ net, rule: 'contention' }, CONTENTION_NOTE);
  return {
    id: 'waive-contention',
    finding: f.id,
    title: `Waive the shared enables on ${label}`,
    sentence:
      `Adds a waiver of contention on ${label} with a note to complete, for when the design guarantees that ` +
      `at most one of ${f.values.drivers.join(', ')} is enabled at a time.`,
    followUp: { kind: 'complete-waiver-note', net, rule: 'contention' },
    apply: (draft) => command.recipe(draft) as ReturnType<QuickFix['apply']>,
  };
}

/** The rail a source puts on the net: a driving pin's own rail, else (an input's or open-drain pin's internal pull) its pull's. */
function sourceRail(design: Design, key: string): string | undefined {
  const at = pinAt(design, key);
  if (at === undefined) return undefined;
  const drive = driveOf(at.pin);
  return drive !== undefined && drive !== 'open-drain' ? railOfPin(at) : at.pin.pull?.to;
}

const present = <T>(x: T | undefined): x is T => x !== undefined;

/**
 * The quick fixes for a finding, most specific first. `design` and `result` are the current
 * document and its check (the result is only read). A waived finding has none; so has a rule
 * without a mechanical remedy (drive-load, edge-rate, rail-range, a push-pull fight).
 */
export function fixesFor(finding: Finding, design: Design, result: CheckResult): QuickFix[] {
  if (!mayHaveFixes(finding)) return [];
  switch (finding.rule) {
    case 'level-high':
      return [ttlInputsFix(design, finding), ...levelTranslator(design, finding)].filter(present);
    case 'level-low':
      return levelTranslator(design, finding);
    case 'overvoltage':
      return [
        ...tolerantFamilyFixes(design, finding),
        ...exposureTranslator(design, finding),
        fetShifterFix(design, finding),
        seriesResistorFix(design, finding),
        dividerFix(design, finding, result),
        markTolerantFix(design, finding),
      ].filter(present);
    case 'back-power':
      return [
        ...exposureTranslator(design, finding),
        fetShifterFix(design, finding),
        markUnpoweredSafeFix(design, finding),
      ].filter(present);
    case 'missing-pull':
      return [addPullFix(design, finding)].filter(present);
    case 'pull-range':
      return [pullValueFix(design, finding, result)].filter(present);
    case 'floating-input':
      return finding.net === null
        ? [tieUnusedInputsFix(design, finding), ...tiePinFixes(design, finding)].filter(present)
        : tieNetFixes(design, finding, result);
    case 'contention':
      return [contentionWaiver(design, finding)].filter(present);
    default:
      return [];
  }
}

/**
 * Whether a finding may have a quick fix, decided without working any out (the findings list
 * asks for every row; `fixesFor` does the work when a menu opens). The one place that says so:
 * `fixesFor` returns nothing where this says no.
 */
export function mayHaveFixes(finding: Finding): boolean {
  if (finding.waived !== undefined) return false;
  switch (finding.rule) {
    case 'level-high':
    case 'level-low':
    case 'overvoltage':
    case 'back-power':
    case 'missing-pull':
    case 'floating-input':
      return true;
    // Only a pull-up outside its range has a remedy; the in-range info has none.
    case 'pull-range':
      return finding.severity === 'error';
    // Only between three-state drivers (a waiver once the enables are known to be exclusive);
    // two push-pull outputs on one net need a design change.
    case 'contention':
      return finding.messageId === 'enablesNeeded';
    default:
      return false;
  }
}

/** A fix as the store's command: one undo step named by the fix's title. */
export function applyFix(fix: QuickFix): Command {
  return { name: fix.title, recipe: (draft) => fix.apply(draft) };
}
