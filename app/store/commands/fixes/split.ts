/**
 * Splitting a net at a series resistor, shared by the series-resistor and divider fixes: the
 * inputs on the exposed pin's rail move to a new net on the resistor's far end, everything else
 * (the driver among it) keeps the old net on the near end. A divider adds a resistor from the new
 * net to ground.
 */
import type { Draft } from 'immer';
import type { Design, Discrete } from '../../../../rules/model/index.ts';
import { freshId, refuse, type Refusal } from '../command.ts';
import { takenIds } from '../discretes.ts';
import { findNet, netName, pinAt, railOfPin, uniqueId } from './lookup.ts';
import type { FindingOf } from '../../../../rules/engine/index.ts';
import { chipSize, DISCRETE_SIZE } from '../../../canvas/chipLayout.ts';
import { freePlace } from '../../../canvas/freeSpot.ts';

export interface SplitPlan {
  readonly net: string;
  /** The new net on the receiving side. */
  readonly rxNet: string;
  readonly rxRail: string;
  /** The pins that move to the new net. */
  readonly moved: readonly string[];
  /** The driver that the finding names. */
  readonly source: string;
  readonly series: string;
  /** The divider's lower resistor, to ground. */
  readonly shunt?: string;
  readonly at: { x: number; y: number };
  /** Where the divider's lower resistor goes. */
  readonly below?: { x: number; y: number };
}

export interface SplitValues {
  readonly series: number;
  readonly shunt?: number;
  readonly tolerance: number;
}

/**
 * The split an over-voltage by a driver on the same net calls for, or undefined where it does not
 * apply: the source is not a driving pin of the net, or the exposed pin is not an input. `shunt`
 * asks for a second designator.
 */
export function planSplit(
  design: Design,
  finding: FindingOf<'overvoltage'>,
  shunt: boolean,
): { plan: SplitPlan; rxRail: string } | undefined {
  if (finding.net === null || finding.messageId !== 'tooHigh') return undefined;
  const net = findNet(design, finding.net);
  const { pin, source } = finding.values;
  if (net === undefined || !net.pins.includes(source) || !net.pins.includes(pin)) return undefined;
  const src = pinAt(design, source);
  const rx = pinAt(design, pin);
  if (src === undefined || rx === undefined || src.pin.role === 'input' || rx.pin.role !== 'input') return undefined;
  const rxRail = railOfPin(rx);
  if (railOfPin(src) === rxRail) return undefined;
  const moved: string[] = [];
  for (const key of net.pins) {
    const at = pinAt(design, key);
    // Already joined to a part between chips: a split here would cut that part's path.
    if (at === undefined) return undefined;
    if (at.pin.role === 'input' && railOfPin(at) === rxRail) moved.push(key);
  }
  const taken = takenIds(design);
  const series = freshId('R', taken);
  const lower = shunt ? freshId('R', [...taken, series]) : undefined;
  // Midway between the driver's chip and the receiver's, clear of every chip.
  const sx = src.part.position?.x ?? 0;
  const rxX = rx.part.position?.x ?? 0;
  const [left, right] = sx <= rxX ? [src.part, rx.part] : [rx.part, src.part];
  const gapMid = ((left.position?.x ?? 0) + chipSize(left).width + (right.position?.x ?? 0)) / 2;
  const at = freePlace(
    design,
    {
      x: Math.round((gapMid - DISCRETE_SIZE.width / 2) / 10) * 10,
      y: Math.round(((src.part.position?.y ?? 0) + (rx.part.position?.y ?? 0)) / 20) * 10,
    },
    DISCRETE_SIZE,
  );
  const below = shunt ? freePlace(design, { x: at.x, y: at.y + 100 }, DISCRETE_SIZE) : undefined;
  return {
    rxRail,
    plan: {
      net: net.id,
      rxNet: uniqueId(
        `${net.id}_${rxRail}`,
        design.nets.map((n) => n.id),
      ),
      rxRail,
      moved,
      source,
      series,
      ...(lower === undefined ? {} : { shunt: lower }),
      at,
      ...(below === undefined ? {} : { below }),
    },
  };
}

/** Apply a split to a draft: one recipe, so one undo step. Reads everything by id. */
export function applySplit(draft: Draft<Design>, plan: SplitPlan, values: SplitValues): Refusal | undefined {
  const net = draft.nets.find((n) => n.id === plan.net);
  if (net === undefined) return refuse(`There is no net ${plan.net}.`);
  const ids = [plan.series, ...(plan.shunt === undefined ? [] : [plan.shunt])];
  if (takenIds(draft as Design).some((id) => ids.includes(id)))
    return refuse('The designators the fix would take are in use.');
  if (draft.nets.some((n) => n.id === plan.rxNet)) return refuse(`There is already a net ${plan.rxNet}.`);
  if (!plan.moved.every((k) => net.pins.includes(k)) || !net.pins.includes(plan.source))
    return refuse(`${plan.net} has changed since the fix was offered.`);
  const moved = new Set(plan.moved);
  net.pins = [...net.pins.filter((k) => !moved.has(k)), `${plan.series}.1`];
  delete net.route;
  draft.nets.push({
    id: plan.rxNet,
    ...(net.label === undefined ? {} : { label: `${net.label}_${plan.rxRail}` }),
    pins: [...plan.moved, `${plan.series}.2`, ...(plan.shunt === undefined ? [] : [`${plan.shunt}.1`])],
    // The edge that matters is the one at the receivers, now on the new net.
    ...(net.maxRiseTime === undefined ? {} : { maxRiseTime: net.maxRiseTime }),
  });
  const name = netName(net);
  const parts: Discrete[] = [
    {
      id: plan.series,
      kind: 'resistor',
      label: plan.shunt === undefined ? `${name} series resistor` : `${name} divider, upper`,
      ohms: values.series,
      tolerance: values.tolerance,
      position: plan.at,
    },
  ];
  if (plan.shunt !== undefined && values.shunt !== undefined)
    parts.push({
      id: plan.shunt,
      kind: 'resistor',
      label: `${name} divider, lower`,
      ohms: values.shunt,
      tolerance: values.tolerance,
      tie: { '2': 'ground' },
      position: plan.below ?? { x: plan.at.x, y: plan.at.y + 100 },
    });
  draft.discretes = [...(draft.discretes ?? []), ...parts];
}
