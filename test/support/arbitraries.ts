/**
 * fast-check arbitraries of valid designs, for the reader's property tests and, later, the
 * engine's. Every design drawn here passes the reader: parts on the design's rails with
 * built-in or design-local profiles, pins with roles and drives, nets of 2–6 distinct pins
 * (each pin on one net at most), optional pulls, scenarios turning rails off, waivers naming
 * catalogue rules and known scenarios. Values are invented, not taken from any datasheet.
 */
import fc from 'fast-check';
import { RULE_IDS } from '../../rules/model/ruleIds.ts';
import type {
  Design,
  Net,
  Params,
  Part,
  Pin,
  Profile,
  Pull,
  Rail,
  Scenario,
  Settings,
} from '../../rules/model/schema.ts';
import type { Level } from '../../rules/levels/level.ts';
import { BUILTIN_PROFILE_IDS } from '../../rules/model/profileIds.ts';

/** Options of `designArb`. */
export interface DesignArbOptions {
  maxParts?: number;
  maxPinsPerPart?: number;
  maxNets?: number;
  /** Draw ids such as `__proto__` and `constructor` among ordinary ones (default true). */
  awkwardIds?: boolean;
}

const optional = { requiredKeys: [] as [], noNullPrototype: true } as const;

/** Any label-like text, including non-ASCII code points. */
export const textArb = fc.string({ unit: 'binary', maxLength: 12 });

/** Volts with two decimals, −1 V … 6 V. */
export const voltsArb = fc.integer({ min: -100, max: 600 }).map((n) => n / 100);

const decimal = fc.integer({ min: 0, max: 999 }).map((n) => String(n / 100));

/** A Level: volts, a common form, or a generated linear expression of VDD. */
export const levelArb: fc.Arbitrary<Level> = fc.oneof(
  voltsArb,
  fc.constantFrom(
    '0.7*VDD',
    '0.3*VDD',
    'VDD-0.45',
    '0.65*VDD+0.1',
    '2.0',
    '0.8',
    'VDD',
    ' 0.5 * VDD - 0.1 ',
    '-0.2+VDD*0.9',
    '.5*VDD',
  ),
  fc.tuple(decimal, fc.constantFrom('+', '-'), decimal).map(([b, op, a]) => `${b}*VDD${op}${a}`),
);

/**
 * A non-negative quantity up to `max`; values below 1e-15 become 0, since the format refuses
 * denormal and other vanishing magnitudes (rules/model/limits.ts: 1 fA, 1 aF, 1 fs floors).
 */
const magnitude = (max: number) => fc.double({ min: 0, max, noNaN: true }).map((v) => (v < 1e-15 ? 0 : v));
const outputPointArb = fc.record({ v: levelArb, i: magnitude(0.05) }, { noNullPrototype: true });

/** Params with any subset of keys, every value valid. */
export const paramsArb: fc.Arbitrary<Params> = fc.record(
  {
    vih: levelArb,
    vil: levelArb,
    schmitt: fc.record({ vtPlus: levelArb, vtMinus: levelArb }, { noNullPrototype: true }),
    iih: magnitude(1e-3),
    iil: magnitude(2e-3),
    cin: magnitude(20e-12),
    viMax: levelArb,
    unpoweredSafe: fc.boolean(),
    viMaxOff: voltsArb,
    voh: fc.array(outputPointArb, { maxLength: 3 }),
    vol: fc.array(outputPointArb, { maxLength: 3 }),
    ioMax: magnitude(0.1),
    maxInputRamp: magnitude(1e-6),
    vddRange: fc.tuple(voltsArb, voltsArb).map(([a, b]): [number, number] => (a <= b ? [a, b] : [b, a])),
  },
  optional,
);

const RAIL_POOL = [
  { id: '5v0', nominal: 5 },
  { id: '3v3', nominal: 3.3 },
  { id: '2v5', nominal: 2.5 },
  { id: '1v8', nominal: 1.8 },
  { id: '1v2', nominal: 1.2 },
  { id: 'v.bat', nominal: 3.7 },
] as const;

/** A rail from a small pool; an explicit min or max, when drawn, widens the tolerance range. */
const railArb = (base: (typeof RAIL_POOL)[number]): fc.Arbitrary<Rail> =>
  fc
    .record(
      {
        label: textArb,
        tolerance: fc.integer({ min: 0, max: 10 }).map((n) => n / 100),
        widenMin: fc.integer({ min: 0, max: 20 }).map((n) => n / 100),
        widenMax: fc.integer({ min: 0, max: 20 }).map((n) => n / 100),
        colour: fc.constantFrom('#c0562b', '#2f8f6b', '#abc', '#ABCDEF'),
      },
      { requiredKeys: ['label'], noNullPrototype: true },
    )
    .map(({ label, tolerance, widenMin, widenMax, colour }) => {
      const t = tolerance ?? 0.05;
      const rail: Rail = { id: base.id, label, nominal: base.nominal };
      if (tolerance !== undefined) rail.tolerance = tolerance;
      if (widenMin !== undefined) rail.min = base.nominal * (1 - t - widenMin);
      if (widenMax !== undefined) rail.max = base.nominal * (1 + t + widenMax);
      if (colour !== undefined) rail.colour = colour;
      return rail;
    });

// Pulls exact as typed, with a tolerance, or with a datasheet's min/max around their value.
const pullArb = (railIds: readonly string[]): fc.Arbitrary<Pull> =>
  fc
    .record(
      {
        to: fc.constantFrom('ground', ...railIds),
        ohms: fc.double({ min: 1, max: 1e7, noNaN: true }),
        spread: fc.option(
          fc.tuple(fc.constantFrom('tolerance', 'ends'), fc.double({ min: 0, max: 0.5, noNaN: true })),
          { nil: undefined },
        ),
      },
      { noNullPrototype: true },
    )
    .map(({ to, ohms, spread }): Pull => {
      if (spread === undefined) return { to, ohms };
      const [kind, t] = spread;
      return kind === 'tolerance' ? { to, ohms, tolerance: t } : { to, ohms, min: ohms * (1 - t), max: ohms * (1 + t) };
    });

const PIN_IDS = ['A', 'B', 'Y', 'EN', 'TX', 'RX', 'SDA', 'SCL', 'IRQ_N', 'D0', 'D-1'];
const PART_IDS = ['U1', 'U2', 'U3', 'U4', 'U5', 'J1', 'J2', 'Q7'];
const AWKWARD = ['__proto__', 'constructor', 'toString'];

const pinArb = (id: string, railIds: readonly string[], profileIds: readonly string[]): fc.Arbitrary<Pin> =>
  fc.constantFrom('input', 'output', 'bidir').chain((role) =>
    fc
      .record(
        {
          drive: fc.constantFrom('push-pull', 'three-state', 'open-drain'),
          rail: fc.constantFrom(...railIds),
          profile: fc.constantFrom(...profileIds),
          params: paramsArb,
          pull: pullArb(railIds),
          side: fc.constantFrom('left', 'right', 'top', 'bottom'),
        },
        optional,
      )
      .map((rest): Pin => {
        // A drive only where the format gives it a meaning: outputs and bidir pins.
        const { drive, ...others } = rest;
        return role === 'input' || drive === undefined ? { id, role, ...others } : { id, role, drive, ...others };
      }),
  );

const partArb = (
  id: string,
  pinIds: readonly string[],
  railIds: readonly string[],
  profileIds: readonly string[],
  maxPins: number,
): fc.Arbitrary<Part> =>
  fc
    .tuple(
      fc.record(
        {
          label: textArb,
          rail: fc.constantFrom(...railIds),
          profile: fc.constantFrom(...profileIds),
          params: paramsArb,
          position: fc.record(
            { x: fc.double({ noNaN: true, noDefaultInfinity: true }), y: fc.integer() },
            { noNullPrototype: true },
          ),
        },
        { requiredKeys: ['label', 'rail', 'profile'], noNullPrototype: true },
      ),
      fc.uniqueArray(fc.constantFrom(...pinIds), { minLength: 1, maxLength: maxPins }),
    )
    .chain(([fields, ids]) =>
      fc.tuple(...ids.map((pinId) => pinArb(pinId, railIds, profileIds))).map((pins): Part => {
        const { label, rail, profile, params, position } = fields;
        return {
          id,
          label,
          rail,
          profile,
          ...(params === undefined ? {} : { params }),
          ...(position === undefined ? {} : { position }),
          pins,
        };
      }),
    );

const SOURCES = [
  'invented for a test',
  'measured on the bench',
  'from memory',
  'datasheet of the chosen part, table 4',
];

const profileArb = (id: string): fc.Arbitrary<Profile> =>
  fc.record(
    { id: fc.constant(id), label: textArb, source: fc.constantFrom(...SOURCES), params: paramsArb },
    { noNullPrototype: true },
  );

const scenarioArb = (id: string, railIds: readonly string[]): fc.Arbitrary<Scenario> =>
  fc.record({ id: fc.constant(id), label: textArb, off: fc.subarray([...railIds]) }, { noNullPrototype: true });

const netArb = (
  id: string,
  pins: readonly string[],
  railIds: readonly string[],
  scenarioIds: readonly string[],
): fc.Arbitrary<Net> =>
  fc
    .record(
      {
        label: textArb,
        pull: pullArb(railIds),
        wiringCapacitance: magnitude(100e-12),
        maxRiseTime: magnitude(1e-6),
        waivers: fc.array(
          fc.record(
            { rule: fc.constantFrom(...RULE_IDS), scenario: fc.constantFrom('all-on', ...scenarioIds), note: textArb },
            { requiredKeys: ['rule', 'note'], noNullPrototype: true },
          ),
          { maxLength: 2 },
        ),
        route: fc.array(fc.tuple(fc.constantFrom(...pins), fc.constantFrom(...pins)), { maxLength: 3 }),
      },
      optional,
    )
    .map((rest): Net => {
      const { label, ...more } = rest;
      return { id, ...(label === undefined ? {} : { label }), pins: [...pins], ...more };
    });

/** Split `refs` into consecutive groups of the drawn sizes, while enough remain. */
function chunk<T>(refs: readonly T[], sizes: readonly number[]): T[][] {
  const groups: T[][] = [];
  let at = 0;
  for (const size of sizes) {
    if (at + size > refs.length) break;
    groups.push(refs.slice(at, at + size));
    at += size;
  }
  return groups;
}

/** A random valid design. */
export function designArb(options: DesignArbOptions = {}): fc.Arbitrary<Design> {
  const { maxParts = 6, maxPinsPerPart = 6, maxNets = 10, awkwardIds = true } = options;
  const partIds = awkwardIds ? [...PART_IDS, ...AWKWARD] : PART_IDS;
  const pinIds = awkwardIds ? [...PIN_IDS, ...AWKWARD] : PIN_IDS;

  const railsArb = fc
    .uniqueArray(fc.constantFrom(...RAIL_POOL), { minLength: 1, maxLength: 4, selector: (r) => r.id })
    .chain((bases) => fc.tuple(...bases.map(railArb)));

  return railsArb.chain((rails) => {
    const railIds = rails.map((r) => r.id);
    const headArb = fc.record(
      {
        title: textArb,
        settings: fc.record(
          { minMargin: fc.double({ min: 0, max: 1, noNaN: true }), defaultWiringCapacitance: magnitude(50e-12) },
          optional,
        ) as fc.Arbitrary<Settings>,
        scenarios: fc
          .uniqueArray(fc.constantFrom('standby', 'sleep', 'sensors-off', 'v1.boot'), { maxLength: 3 })
          .chain((ids) => fc.tuple(...ids.map((id) => scenarioArb(id, railIds)))),
        profiles: fc
          .uniqueArray(fc.constantFrom('valve-driver', 'mcu-gpio', 'probe.front-end'), { maxLength: 2 })
          .chain((ids) => fc.tuple(...ids.map(profileArb))),
      },
      { requiredKeys: ['title'], noNullPrototype: true },
    );
    return headArb.chain((head) => {
      const profileIds = [...BUILTIN_PROFILE_IDS, ...(head.profiles ?? []).map((p) => p.id)];
      const scenarioIds = (head.scenarios ?? []).map((s) => s.id);
      const partsArb = fc
        .uniqueArray(fc.constantFrom(...partIds), { minLength: 1, maxLength: maxParts })
        .chain((ids) => fc.tuple(...ids.map((id) => partArb(id, pinIds, railIds, profileIds, maxPinsPerPart))));
      return partsArb.chain((parts) => {
        const refs = parts.flatMap((p) => p.pins.map((pin) => `${p.id}.${pin.id}`));
        const groupsArb = fc
          .tuple(
            // A permutation of every pin, cut into nets; the pins left over stay unconnected.
            fc.shuffledSubarray(refs, { minLength: refs.length }),
            fc.array(fc.integer({ min: 2, max: 6 }), { minLength: 1, maxLength: maxNets }),
          )
          .map(([picked, sizes]) => chunk(picked, sizes));
        return groupsArb.chain((groups) =>
          fc.tuple(...groups.map((pins, i) => netArb(`N${i + 1}`, pins, railIds, scenarioIds))).map(
            (nets): Design => ({
              format: 'railcross.design',
              version: 2,
              title: head.title,
              ...(head.settings === undefined ? {} : { settings: head.settings }),
              rails,
              ...(head.scenarios === undefined ? {} : { scenarios: head.scenarios }),
              ...(head.profiles === undefined ? {} : { profiles: head.profiles }),
              parts,
              nets,
            }),
          ),
        );
      });
    });
  });
}
