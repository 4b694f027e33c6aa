/**
 * The bidirectional N-MOSFET shifter as a quick fix (design format version 2): an open-drain
 * net that joins pins of two rails, where the higher rail's pull-up reaches the lower rail's
 * pins, is split in two at a FET shifter (the I2C-bus specification's level-shifting circuit):
 * the low-rail pins keep a new net with a pull-up to their rail, the others the old net with a
 * pull-up to theirs, the gate on the low rail. Both pull-ups are sized on a trial check by
 * pull-range (its largest E24 value inside the range), as the pull-up fix sizes one.
 */
import type { Draft } from 'immer';
import { check } from '../../../../rules/check/index.ts';
import type { Finding } from '../../../../rules/engine/index.ts';
import { formatQuantity } from '../../../../rules/levels/index.ts';
import type { Design, Discrete } from '../../../../rules/model/index.ts';
import { freshId, refuse, type Refusal } from '../command.ts';
import { takenIds } from '../discretes.ts';
import { findNet, lowestRail, netName, pinAt, railName, railOfPin, uniqueId } from './lookup.ts';
import { driveOf } from '../../../../rules/model/index.ts';
import { tryOn } from './preview.ts';
import { pullValueFrom } from './pulls.ts';
import type { QuickFix } from './types.ts';

/** The FET's starting values: a logic-level part (VGS(th) ≤ 1 V, RDS(on) ≤ 5 Ω), invented, to be checked against the chosen part. */
const FET = { vgsThMax: 1, rdsOnMax: 5 } as const;
/** The pull-ups' tolerance (fraction): 1 % parts, common practice for sized pull-ups. */
const PULL_TOLERANCE = 0.01;
/** The trial value before pull-range sizes each side. */
const TRIAL_OHMS = 4.7e3;

interface Plan {
  readonly net: string;
  readonly lowNet: string;
  readonly low: string;
  readonly high: string;
  readonly lowPins: readonly string[];
  readonly fet: string;
  readonly lowPull: string;
  readonly highPull: string;
  readonly at: { x: number; y: number };
}

function split(draft: Draft<Design>, plan: Plan, lowOhms: number, highOhms: number): Refusal | undefined {
  const net = draft.nets.find((n) => n.id === plan.net);
  if (net === undefined) return refuse(`There is no net ${plan.net}.`);
  if (takenIds(draft as Design).some((id) => id === plan.fet || id === plan.lowPull || id === plan.highPull))
    return refuse('The designators the fix would take are in use.');
  if (draft.nets.some((n) => n.id === plan.lowNet)) return refuse(`There is already a net ${plan.lowNet}.`);
  const low = new Set(plan.lowPins);
  if (!plan.lowPins.every((k) => net.pins.includes(k)))
    return refuse(`${plan.net} has changed since the fix was offered.`);
  net.pins = [...net.pins.filter((k) => !low.has(k)), `${plan.fet}.D`, `${plan.highPull}.1`];
  delete net.pull;
  delete net.route;
  draft.nets.push({
    id: plan.lowNet,
    ...(net.label === undefined ? {} : { label: `${net.label}_${plan.low}` }),
    pins: [...plan.lowPins, `${plan.fet}.S`, `${plan.lowPull}.1`],
  });
  const parts: Discrete[] = [
    { id: plan.fet, kind: 'fet-shifter', label: `${netName(net)} shifter`, gate: plan.low, ...FET, position: plan.at },
    {
      id: plan.highPull,
      kind: 'resistor',
      label: `${netName(net)} pull-up, ${plan.high} side`,
      ohms: highOhms,
      tolerance: PULL_TOLERANCE,
      tie: { '2': plan.high },
      position: { x: plan.at.x + 140, y: plan.at.y },
    },
    {
      id: plan.lowPull,
      kind: 'resistor',
      label: `${netName(net)} pull-up, ${plan.low} side`,
      ohms: lowOhms,
      tolerance: PULL_TOLERANCE,
      tie: { '2': plan.low },
      position: { x: plan.at.x - 140, y: plan.at.y },
    },
  ];
  draft.discretes = [...(draft.discretes ?? []), ...parts];
}

/**
 * overvoltage / back-power on an open-drain net whose pins sit on exactly two rails: split it at
 * a FET shifter. Undefined where it does not apply (a push-pull driver, one rail, three rails).
 */
export function fetShifterFix(design: Design, finding: Finding): QuickFix | undefined {
  const net = finding.net === null ? undefined : findNet(design, finding.net);
  if (net === undefined) return undefined;
  const rails = new Map<string, string[]>();
  let openDrain = 0;
  const xs: number[] = [];
  const ys: number[] = [];
  for (const key of net.pins) {
    const at = pinAt(design, key);
    if (at === undefined) return undefined; // already joined to a part between chips
    const drive = driveOf(at.pin);
    if (drive !== undefined && drive !== 'open-drain') return undefined;
    if (drive === 'open-drain') openDrain++;
    const rail = railOfPin(at);
    rails.set(rail, [...(rails.get(rail) ?? []), key]);
    xs.push(at.part.position?.x ?? 0);
    ys.push(at.part.position?.y ?? 0);
  }
  if (openDrain === 0 || rails.size !== 2) return undefined;
  const low = lowestRail(design, rails.keys())!;
  const high = [...rails.keys()].find((r) => r !== low)!;
  const taken = takenIds(design);
  const fet = freshId('Q', taken);
  const lowPull = freshId('R', taken);
  const highPull = freshId('R', [...taken, lowPull]);
  const plan: Plan = {
    net: net.id,
    lowNet: uniqueId(
      `${net.id}_${low}`,
      design.nets.map((n) => n.id),
    ),
    low,
    high,
    lowPins: rails.get(low)!,
    fet,
    lowPull,
    highPull,
    at: {
      x: Math.round(xs.reduce((a, b) => a + b, 0) / xs.length),
      y: Math.round(ys.reduce((a, b) => a + b, 0) / ys.length) + 120,
    },
  };
  // Size both pull-ups by pull-range on a trial with the usual value.
  const trial = tryOn(design, (d) => split(d, plan, TRIAL_OHMS, TRIAL_OHMS));
  if (trial.refused !== undefined) return undefined;
  const findings = check(trial.design).findings;
  const lowValue = pullValueFrom(findings, plan.lowNet);
  const highValue = pullValueFrom(findings, plan.net);
  if (lowValue === undefined || highValue === undefined) return undefined;
  // Offered only when the sized circuit itself passes: each driver sinks both pull-ups, the FET turns on.
  const sized = tryOn(design, (d) => split(d, plan, lowValue.ohms, highValue.ohms));
  if (
    check(sized.design).findings.some(
      (f) => f.rule === 'fet-shifter' && f.severity === 'error' && f.parts.includes(fet),
    )
  )
    return undefined;
  const ohms = (r: number) => formatQuantity(r, 'Ω');
  const lowName = railName(design, low);
  const highName = railName(design, high);
  return {
    id: 'fet-shifter',
    finding: finding.id,
    title: `Insert FET shifter ${fet} on ${netName(net)}`,
    sentence:
      `Splits ${netName(net)} at a bidirectional N-MOSFET shifter ${fet} (gate on ${lowName}, VGS(th) ≤ 1 V, RDS(on) ≤ 5 Ω to be checked against the chosen part): ` +
      `${plan.lowPins.join(', ')} on the ${lowName} side with ${lowPull} ${ohms(lowValue.ohms)} to ${lowName}, the rest on the ${highName} side with ${highPull} ${ohms(highValue.ohms)} to ${highName} ` +
      `(each the largest E24 value pull-range allows), so that no pin sees the other rail.`,
    apply: (draft) => split(draft, plan, lowValue.ohms, highValue.ohms),
  };
}
