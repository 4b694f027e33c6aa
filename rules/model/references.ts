/**
 * The reader's checks across records: unique ids, references that must name something in the
 * design (a rail, a profile, a pin, a scenario), a pin on one net at most, rail ranges.
 *
 * They run on the document as it came in, alongside the schema rather than after it, so that
 * one reading lists every problem. Anything of the wrong shape is skipped here: the schema
 * reports it.
 */
import { splitPinKey } from './pinKeys.ts';
import { formatPath, type LocatedError, type PathSegment } from './paths.ts';
import { resolveRailRange } from './railRange.ts';

type Rec = Record<string, unknown>;

const own = (o: Rec, k: string): unknown => (Object.hasOwn(o, k) ? o[k] : undefined);
const asRecord = (x: unknown): Rec | undefined =>
  typeof x === 'object' && x !== null && !Array.isArray(x) ? (x as Rec) : undefined;
const asList = (x: unknown): readonly unknown[] => (Array.isArray(x) ? x : []);
const asString = (x: unknown): string | undefined => (typeof x === 'string' ? x : undefined);
const asFinite = (x: unknown): number | undefined => (typeof x === 'number' && Number.isFinite(x) ? x : undefined);

/** The ground a pull resistor may go to instead of a rail. */
export const GROUND = 'ground';

/** At most this many ids are listed in a message about an unknown reference. */
const LISTED_IDS = 12;

function listIds(ids: Iterable<string>): string {
  const all = [...ids];
  if (all.length === 0) return 'none defined';
  const shown = all.slice(0, LISTED_IDS).join(', ');
  return all.length > LISTED_IDS ? `${shown}, …` : shown;
}

interface Context {
  errors: LocatedError[];
  /**
   * The design's rail ids; undefined when `rails` is missing or not a list. The schema then
   * reports that one cause, and every rail reference is left unchecked: otherwise each part
   * would add an "unknown rail" line and bury the cause under the list's limit.
   */
  railIds: Set<string> | undefined;
}

function fail(ctx: Context, segments: readonly PathSegment[], message: string): void {
  ctx.errors.push({ segments, message });
}

/** Report ids that repeat among `items` (the second and later ones); returns each id's first index. */
function uniqueIds(
  ctx: Context,
  items: readonly unknown[],
  at: readonly PathSegment[],
  kind: string,
  scope: string,
): Map<string, number> {
  const first = new Map<string, number>();
  items.forEach((item, i) => {
    const rec = asRecord(item);
    const id = rec && asString(own(rec, 'id'));
    if (id === undefined) return;
    const prior = first.get(id);
    if (prior === undefined) first.set(id, i);
    else
      fail(
        ctx,
        [...at, i, 'id'],
        `duplicate ${kind} id ${JSON.stringify(id)} (first at ${formatPath([...at, prior])}): expected ids unique ${scope}`,
      );
  });
  return first;
}

function checkRailRef(ctx: Context, value: unknown, at: readonly PathSegment[]): void {
  const id = asString(value);
  if (ctx.railIds !== undefined && id !== undefined && !ctx.railIds.has(id)) {
    fail(ctx, at, `unknown rail ${JSON.stringify(id)}: expected a rail id of this design (${listIds(ctx.railIds)})`);
  }
}

function checkPull(ctx: Context, pull: unknown, at: readonly PathSegment[]): void {
  const rec = asRecord(pull);
  if (rec === undefined) return;
  const to = asString(own(rec, 'to'));
  if (ctx.railIds !== undefined && to !== undefined && to !== GROUND && !ctx.railIds.has(to)) {
    fail(
      ctx,
      [...at, 'to'],
      `unknown rail ${JSON.stringify(to)}: expected "ground" or a rail id of this design (${listIds(ctx.railIds)})`,
    );
  }
}

function checkRails(ctx: Context, rails: readonly unknown[]): void {
  rails.forEach((item, i) => {
    const rail = asRecord(item);
    if (rail === undefined) return;
    if (own(rail, 'id') === GROUND) {
      fail(ctx, ['rails', i, 'id'], `expected a rail id other than "ground": a pull's "to" uses it for 0 V`);
    }
    const nominal = asFinite(own(rail, 'nominal'));
    const tolerance = own(rail, 'tolerance');
    const min = own(rail, 'min');
    const max = own(rail, 'max');
    const fine = (x: unknown) => x === undefined || asFinite(x) !== undefined;
    if (nominal === undefined || !fine(tolerance) || !fine(min) || !fine(max)) return;
    if (typeof tolerance === 'number' && tolerance < 0) return;
    const range = resolveRailRange({
      nominal,
      tolerance: tolerance as number | undefined,
      min: min as number | undefined,
      max: max as number | undefined,
    });
    if (range.min > range.max) {
      const where: PathSegment[] = ['rails', i];
      if (min !== undefined) where.push('min');
      else if (max !== undefined) where.push('max');
      const hint =
        nominal < 0 && (min === undefined || max === undefined)
          ? '; a negative rail needs an explicit min and max'
          : '';
      fail(
        ctx,
        where,
        `expected the rail's minimum ≤ its maximum, found ${range.min} V > ${range.max} V (an explicit min or max wins over nominal × (1 ± tolerance) for its end${hint})`,
      );
    }
  });
}

function checkProfileRef(
  ctx: Context,
  value: unknown,
  at: readonly PathSegment[],
  profileIds: ReadonlySet<string> | undefined,
): void {
  const id = asString(value);
  if (profileIds !== undefined && id !== undefined && !profileIds.has(id)) {
    fail(
      ctx,
      at,
      `unknown profile ${JSON.stringify(id)}: expected a built-in profile id or one of this design's profiles (${listIds(profileIds)})`,
    );
  }
}

/** Check the parts; returns each part id's pin ids (first part of each id only). */
function checkParts(
  ctx: Context,
  parts: readonly unknown[],
  profileIds: ReadonlySet<string> | undefined,
  scenarioIds: ReadonlySet<string> | undefined,
): Map<string, Set<string>> {
  const pinsOf = new Map<string, Set<string>>();
  parts.forEach((item, i) => {
    const part = asRecord(item);
    if (part === undefined) return;
    const at = ['parts', i] as const;
    checkRailRef(ctx, own(part, 'rail'), [...at, 'rail']);
    checkProfileRef(ctx, own(part, 'profile'), [...at, 'profile'], profileIds);
    const pins = asList(own(part, 'pins'));
    const partId = asString(own(part, 'id'));
    const ids = uniqueIds(
      ctx,
      pins,
      [...at, 'pins'],
      'pin',
      partId === undefined ? 'within the part' : `within part ${partId}`,
    );
    if (partId !== undefined && !pinsOf.has(partId)) pinsOf.set(partId, new Set(ids.keys()));
    pins.forEach((p, j) => {
      const pin = asRecord(p);
      if (pin === undefined) return;
      checkRailRef(ctx, own(pin, 'rail'), [...at, 'pins', j, 'rail']);
      checkProfileRef(ctx, own(pin, 'profile'), [...at, 'pins', j, 'profile'], profileIds);
      checkPull(ctx, own(pin, 'pull'), [...at, 'pins', j, 'pull']);
      checkWaivers(ctx, own(pin, 'waivers'), [...at, 'pins', j, 'waivers'], scenarioIds);
    });
  });
  return pinsOf;
}

/** The pins of each discrete kind (schema.ts `DISCRETE_PINS`, repeated to keep this file free of zod). */
const DISCRETE_PIN_IDS: Readonly<Record<string, readonly string[]>> = {
  resistor: ['1', '2'],
  'fet-shifter': ['S', 'D'],
  'diode-shifter': ['K', 'A'],
};

/**
 * Check the discretes (version 2): ids unique among parts and discretes, the rails a resistor's
 * tie or a FET's gate names. Adds each discrete's pins to `pinsOf`; returns the pins a resistor
 * ties to a rail (no net may also name them), with their places.
 */
function checkDiscretes(
  ctx: Context,
  discretes: readonly unknown[],
  parts: readonly unknown[],
  pinsOf: Map<string, Set<string>> | undefined,
): Map<string, string> {
  const tied = new Map<string, string>();
  const partIds = new Map<string, number>();
  parts.forEach((p, i) => {
    const id = asString(asRecord(p) && own(asRecord(p)!, 'id'));
    if (id !== undefined && !partIds.has(id)) partIds.set(id, i);
  });
  const seen = new Map<string, number>();
  discretes.forEach((item, i) => {
    const d = asRecord(item);
    if (d === undefined) return;
    const at = ['discretes', i] as const;
    const id = asString(own(d, 'id'));
    const kind = asString(own(d, 'kind'));
    if (id !== undefined) {
      if (partIds.has(id)) {
        fail(
          ctx,
          [...at, 'id'],
          `duplicate id ${JSON.stringify(id)} (a part at parts[${partIds.get(id)}]): expected ids unique among parts and discretes`,
        );
      } else if (seen.has(id)) {
        fail(
          ctx,
          [...at, 'id'],
          `duplicate id ${JSON.stringify(id)} (first at discretes[${seen.get(id)}]): expected ids unique among parts and discretes`,
        );
      } else {
        seen.set(id, i);
        const pins = kind === undefined ? undefined : DISCRETE_PIN_IDS[kind];
        if (pins !== undefined && pinsOf !== undefined) pinsOf.set(id, new Set(pins));
      }
    }
    if (kind === 'fet-shifter') checkRailRef(ctx, own(d, 'gate'), [...at, 'gate']);
    const tie = asRecord(own(d, 'tie'));
    if (kind === 'resistor' && tie !== undefined) {
      for (const end of ['1', '2']) {
        const to = asString(own(tie, end));
        if (to === undefined) continue;
        if (ctx.railIds !== undefined && to !== GROUND && !ctx.railIds.has(to)) {
          fail(
            ctx,
            [...at, 'tie', end],
            `unknown rail ${JSON.stringify(to)}: expected "ground" or a rail id of this design (${listIds(ctx.railIds)})`,
          );
        }
        if (id !== undefined) tied.set(`${id}.${end}`, formatPath([...at, 'tie', end]));
      }
    }
  });
  return tied;
}

function checkNets(
  ctx: Context,
  nets: readonly unknown[],
  pinsOf: ReadonlyMap<string, ReadonlySet<string>> | undefined,
  scenarioIds: ReadonlySet<string> | undefined,
  tied: ReadonlyMap<string, string> = new Map(),
): void {
  const placed = new Map<string, string>();
  nets.forEach((item, i) => {
    const net = asRecord(item);
    if (net === undefined) return;
    const at = ['nets', i] as const;
    const netId = asString(own(net, 'id'));
    const netName = netId === undefined ? 'this net' : `net ${JSON.stringify(netId)}`;
    checkPull(ctx, own(net, 'pull'), [...at, 'pull']);
    const names = new Set<string>();
    asList(own(net, 'pins')).forEach((value, j) => {
      const ref = asString(value);
      if (ref === undefined) return;
      names.add(ref);
      const where = [...at, 'pins', j];
      if (!ref.includes('.')) {
        fail(ctx, where, `expected a pin written PART.PIN (e.g. "U3.TX"), found ${JSON.stringify(ref)}`);
        return;
      }
      const { part: partId, pin: pinId } = splitPinKey(ref);
      if (pinsOf === undefined) return;
      const pins = pinsOf.get(partId);
      if (pins === undefined) {
        fail(
          ctx,
          where,
          `unknown part ${JSON.stringify(partId)} in ${JSON.stringify(ref)}: expected PART.PIN naming a part of this design (${listIds(pinsOf.keys())})`,
        );
        return;
      }
      if (!pins.has(pinId)) {
        fail(
          ctx,
          where,
          `part ${partId} has no pin ${JSON.stringify(pinId)}: expected one of its pins (${listIds(pins)})`,
        );
        return;
      }
      const tiedAt = tied.get(ref);
      if (tiedAt !== undefined) {
        fail(ctx, where, `pin ${ref} is tied at ${tiedAt}: expected a resistor's end on a net or tied, not both`);
        return;
      }
      const prior = placed.get(ref);
      if (prior !== undefined) {
        fail(ctx, where, `pin ${ref} is named twice in nets (already at ${prior}): expected a pin on one net at most`);
        return;
      }
      placed.set(ref, `nets[${i}].pins[${j}]`);
    });
    asList(own(net, 'route')).forEach((pair, k) => {
      asList(pair).forEach((value, end) => {
        const ref = asString(value);
        if (ref !== undefined && !names.has(ref)) {
          fail(
            ctx,
            [...at, 'route', k, end],
            `${JSON.stringify(ref)} is not on ${netName}: expected a pin of its "pins"`,
          );
        }
      });
    });
    checkWaivers(ctx, own(net, 'waivers'), [...at, 'waivers'], scenarioIds);
  });
}

/** A waiver's power state (a net's or a lone pin's) must be `all-on` or a scenario of the design. */
function checkWaivers(
  ctx: Context,
  waivers: unknown,
  at: readonly PathSegment[],
  scenarioIds: ReadonlySet<string> | undefined,
): void {
  asList(waivers).forEach((w, k) => {
    const waiver = asRecord(w);
    const scenario = waiver && asString(own(waiver, 'scenario'));
    if (scenarioIds !== undefined && scenario !== undefined && !scenarioIds.has(scenario)) {
      fail(
        ctx,
        [...at, k, 'scenario'],
        `unknown scenario ${JSON.stringify(scenario)}: expected "all-on" or a scenario id of this design (${listIds(scenarioIds)})`,
      );
    }
  });
}

/**
 * Check the references and uniqueness rules of design-format.md on a (possibly malformed)
 * document. `builtinProfileIds` are the profile ids usable without a design-local profile.
 */
export function checkReferences(doc: unknown, builtinProfileIds: ReadonlySet<string>): LocatedError[] {
  const root = asRecord(doc);
  if (root === undefined) return [];
  // A list that should be there but is not (or is not a list) is the schema's one error; the
  // references into it are then not checked, so that the cause is not buried under its echoes.
  const listOr = (key: string, optional: boolean): readonly unknown[] | undefined => {
    const value = own(root, key);
    if (Array.isArray(value)) return value;
    return optional && value === undefined ? [] : undefined;
  };
  const rails = listOr('rails', false);
  const scenarios = listOr('scenarios', true);
  const profiles = listOr('profiles', true);
  const parts = listOr('parts', false);
  const nets = asList(own(root, 'nets'));
  const ctx: Context = { errors: [], railIds: undefined };

  if (rails !== undefined) {
    ctx.railIds = new Set(uniqueIds(ctx, rails, ['rails'], 'rail', 'among rails').keys());
    checkRails(ctx, rails);
  }

  const scenarioIds =
    scenarios && new Set(['all-on', ...uniqueIds(ctx, scenarios, ['scenarios'], 'scenario', 'among scenarios').keys()]);
  scenarios?.forEach((s, i) => {
    const rec = asRecord(s);
    if (rec !== undefined)
      asList(own(rec, 'off')).forEach((r, j) => {
        checkRailRef(ctx, r, ['scenarios', i, 'off', j]);
      });
  });

  const profileIds =
    profiles &&
    new Set([...builtinProfileIds, ...uniqueIds(ctx, profiles, ['profiles'], 'profile', 'among profiles').keys()]);

  let pinsOf: Map<string, Set<string>> | undefined;
  if (parts !== undefined) {
    uniqueIds(ctx, parts, ['parts'], 'part', 'among parts');
    pinsOf = checkParts(ctx, parts, profileIds, scenarioIds);
  }
  const discretes = listOr('discretes', true);
  const tied =
    discretes === undefined ? new Map<string, string>() : checkDiscretes(ctx, discretes, parts ?? [], pinsOf);
  scenarios?.forEach((s, i) => {
    const rec = asRecord(s);
    if (rec === undefined) return;
    const named = new Set<string>();
    asList(own(rec, 'pins')).forEach((p, j) => {
      const state = asRecord(p);
      if (state === undefined) return;
      const at = ['scenarios', i, 'pins', j] as const;
      checkPull(ctx, own(state, 'pull'), [...at, 'pull']);
      const ref = asString(own(state, 'pin'));
      if (ref === undefined) return;
      const dot = ref.indexOf('.');
      const pins = dot < 0 ? undefined : pinsOf?.get(ref.slice(0, dot));
      if (pinsOf !== undefined && (pins === undefined || !pins.has(ref.slice(dot + 1)))) {
        fail(ctx, [...at, 'pin'], `unknown pin ${JSON.stringify(ref)}: expected PART.PIN naming a pin of this design`);
      } else if (named.has(ref)) {
        fail(ctx, [...at, 'pin'], `pin ${ref} is named twice in this power state: expected one state per pin`);
      }
      named.add(ref);
    });
  });

  uniqueIds(ctx, nets, ['nets'], 'net', 'among nets');
  checkNets(ctx, nets, pinsOf, scenarioIds, tied);
  return ctx.errors;
}
