/**
 * Design file, version 2 (rules/schema/design-format.md): the one zod schema. The TypeScript types below
 * and rules/schema/design.schema.json are both derived from it.
 *
 * The schema checks shape and local values; references between records (a net naming a pin,
 * a part naming a rail) are checked by the reader (reader.ts), which reports both kinds with
 * the same JSON paths.
 */
import { z } from 'zod';
import { parseLevel } from '../levels/level.ts';
import { RULE_IDS } from './ruleIds.ts';
import { describeValue } from './schemaIssues.ts';
import { RAIL_COLOUR_PATTERN } from './colour.ts';
import {
  MAX_AMPS,
  MAX_FARADS,
  MAX_OHMS,
  MAX_RAMP,
  MAX_SECONDS,
  MAX_TOLERANCE,
  MAX_VDD_FACTOR,
  MAX_VOLTS,
  MIN_AMPS,
  MIN_FARADS,
  MIN_OHMS,
  MIN_RAMP,
  MIN_SECONDS,
  limitText,
  rangeText,
} from './limits.ts';

// zod would otherwise compile validators with `new Function`, which a strict CSP forbids.
z.config({ jitless: true });

export const FORMAT_ID = 'railcross.design';
export const FORMAT_VERSION = 2;

/**
 * A magnitude in `unit`: 0, or between `floor` and `max` (limits.ts says why each). The JSON
 * Schema carries 0 … max; the floor, which keeps denormal numbers out, is in its description.
 */
const magnitude = (what: string, unit: string, floor: number, max: number) =>
  z
    .number()
    .min(0, { message: `expected a ${what} (${unit}) of 0 or more` })
    .max(max, { message: `expected a ${what} (${unit}) of at most ${limitText(max, unit)}` })
    .refine((v) => v === 0 || v >= floor, {
      message: `expected a ${what} (${unit}) of 0 or ${rangeText(floor, max, unit)}`,
    })
    .meta({ description: `${what} (${unit}): 0, or ${rangeText(floor, max, unit)}` });

const current = () => magnitude('current', 'A', MIN_AMPS, MAX_AMPS);
const resistance = () =>
  z
    .number()
    .min(MIN_OHMS, { message: `expected a resistance (Ω) ${rangeText(MIN_OHMS, MAX_OHMS, 'Ω')}` })
    .max(MAX_OHMS, { message: `expected a resistance (Ω) ${rangeText(MIN_OHMS, MAX_OHMS, 'Ω')}` });
const capacitance = () => magnitude('capacitance', 'F', MIN_FARADS, MAX_FARADS);

/** Volts, anywhere in the file: within ±MAX_VOLTS. */
const volts = (what = 'voltage') =>
  z
    .number()
    .min(-MAX_VOLTS, { message: `expected a ${what} (V) of at least ${-MAX_VOLTS / 1000} kV` })
    .max(MAX_VOLTS, { message: `expected a ${what} (V) of at most ${MAX_VOLTS / 1000} kV` });

/** A fraction of a value, 0 or more and below 1 (0.05 for ±5 %). */
const fraction = () =>
  z
    .number()
    .min(0, { message: 'expected a tolerance (a fraction of nominal) of 0 or more' })
    .lt(MAX_TOLERANCE, { message: 'expected a tolerance (a fraction of nominal, 0.05 for ±5 %) below 1' });

/** A record id. Finding ids are built as `rule:NET:SCENARIO:PART.PIN`, hence the forbidden characters. */
const id = (kind: string, allowDot: boolean) =>
  z
    .string()
    .min(1, { message: `expected a non-empty ${kind} id` })
    .refine((s) => !s.includes(':') && !s.includes('>'), {
      message: `expected a ${kind} id without ":" or ">"`,
    })
    .refine((s) => allowDot || !s.includes('.'), { message: `expected a ${kind} id without "."` });

const DECIMAL = '(?:[0-9]+(?:\\.[0-9]+)?|\\.[0-9]+)';
const TIMES = ' *\\* *';
const TERM = `-? *(?:${DECIMAL}(?:${TIMES}${DECIMAL})*(?:${TIMES}VDD(?:${TIMES}${DECIMAL})*)?|VDD(?:${TIMES}${DECIMAL})*)`;

/**
 * The Level grammar as a regular expression, for the published JSON Schema only (other tools
 * can check Levels with it); the reader itself uses `parseLevel`, and a test holds the two
 * together.
 */
export const LEVEL_PATTERN = `^ *${TERM}(?: *[-+] *${TERM})* *$`;

export const LevelSchema = z
  .union(
    [
      volts('Level'),
      z
        .string()
        .superRefine((s, ctx) => {
          const r = parseLevel(s);
          if (!r.ok) {
            ctx.addIssue({
              code: 'custom',
              message: `expected a Level such as "2.0", "0.7*VDD" or "VDD-0.45": ${r.error} at character ${r.at + 1} of "${s}"`,
            });
          } else if (Math.abs(r.level.a) > MAX_VOLTS || Math.abs(r.level.b) > MAX_VDD_FACTOR) {
            ctx.addIssue({
              code: 'custom',
              message: `expected a Level whose volts lie within ±${MAX_VOLTS / 1000} kV and whose factor of VDD within ±${MAX_VDD_FACTOR}, found "${s}"`,
            });
          }
        })
        .meta({ pattern: LEVEL_PATTERN }),
    ],
    {
      error: (iss) =>
        iss.input === undefined
          ? 'missing: expected a Level, volts (a number) or a string such as "0.7*VDD"'
          : `expected a Level: volts (a number) or a string such as "0.7*VDD", found ${describeValue(iss.input)}`,
    },
  )
  .meta({
    id: 'Level',
    description: 'Volts, or a linear expression of the pin\'s supply VDD, e.g. "0.7*VDD", "VDD-0.45"',
  });

const OutputPointSchema = z
  .strictObject({
    v: LevelSchema,
    i: current(),
    vddMin: volts('supply').optional(),
  })
  .meta({
    id: 'OutputPoint',
    description:
      'A guaranteed output level v (Level) at a load current i (A, magnitude), from the supply vddMin (V) up when given',
  });

const VddRangeSchema = z
  .tuple([volts(), volts()])
  .refine(([lo, hi]) => lo <= hi, { message: 'expected vddRange [min, max] with min ≤ max' });

export const ParamsSchema = z
  .strictObject({
    vih: LevelSchema.optional(),
    vil: LevelSchema.optional(),
    schmitt: z.strictObject({ vtPlus: LevelSchema, vtMinus: LevelSchema }).optional(),
    iih: current().optional(),
    iil: current().optional(),
    cin: capacitance().optional(),
    viMax: LevelSchema.optional(),
    unpoweredSafe: z.boolean().optional(),
    viMaxOff: volts().optional(),
    voh: z.array(OutputPointSchema).optional(),
    vol: z.array(OutputPointSchema).optional(),
    ioMax: current().optional(),
    maxInputRamp: magnitude('ramp', 's/V', MIN_RAMP, MAX_RAMP).optional(),
    vddRange: VddRangeSchema.optional(),
    deltaIcc: current().optional(),
    deltaIccDrop: volts().optional(),
    // Version 2.
    viMin: LevelSchema.optional(),
    injectionMax: current().optional(),
    busHold: z.strictObject({ hold: current(), overdrive: current() }).optional(),
    seriesResistance: resistance().optional(),
    minExternalPull: resistance().optional(),
    maxLoadCapacitance: capacitance().optional(),
  })
  .meta({
    id: 'Params',
    description: 'Electrical parameters of a pin; each key is resolved on its own: pin params, part params, profile',
  });

export const PullSchema = z
  .strictObject({
    to: z.string().min(1, { message: 'expected a rail id or "ground"' }),
    ohms: resistance(),
    tolerance: z
      .number()
      .min(0, { message: 'expected a tolerance (a fraction of the value) of 0 or more' })
      .lt(MAX_TOLERANCE, { message: 'expected a tolerance (a fraction of the value, 0.05 for ±5 %) below 1' })
      .optional(),
    min: resistance().optional(),
    max: resistance().optional(),
  })
  .refine((p) => !(p.min !== undefined && p.min > p.ohms) && !(p.max !== undefined && p.max < p.ohms), {
    message: 'expected min ≤ ohms ≤ max',
  })
  .meta({
    id: 'Pull',
    description:
      'A pull resistor to a rail or to ground; its range ohms × (1 ± tolerance), exact unless given, an explicit min or max winning for its end',
  });

const PositionSchema = z.strictObject({ x: z.number(), y: z.number() });

export const RailSchema = z
  .strictObject({
    id: id('rail', true),
    label: z.string(),
    nominal: volts(),
    tolerance: z
      .number()
      .min(0, { message: 'expected a tolerance (a fraction of nominal) of 0 or more' })
      .lt(MAX_TOLERANCE, { message: 'expected a tolerance (a fraction of nominal, 0.05 for ±5 %) below 1' })
      .optional(),
    min: volts().optional(),
    max: volts().optional(),
    colour: z
      .string()
      .regex(new RegExp(RAIL_COLOUR_PATTERN), { message: 'expected a colour "#rgb" or "#rrggbb" (hexadecimal digits)' })
      .optional(),
    minLoad: current().optional(),
  })
  .meta({
    id: 'Rail',
    description: 'A supply domain; range nominal × (1 ± tolerance), an explicit min or max wins for its end',
  });

/**
 * A pin's state in a power state before firmware runs: its role, drive and internal pull there
 * (`pull: null` for none), each key given replacing the pin's own.
 */
export const PinStateSchema = z
  .strictObject({
    pin: z.string().min(1, { message: 'expected a pin written PART.PIN' }),
    role: z.enum(['input', 'output', 'bidir']).optional(),
    drive: z.enum(['push-pull', 'three-state', 'open-drain']).optional(),
    pull: PullSchema.nullable().optional(),
  })
  .meta({
    id: 'PinState',
    description: "A pin's role, drive and internal pull in one power state (e.g. GPIO pins as inputs at reset)",
  });

export const ScenarioSchema = z
  .strictObject({
    id: id('scenario', true).refine((s) => s !== 'all-on', {
      message: 'expected a scenario id other than "all-on" (reserved for the state with every rail on)',
    }),
    label: z.string(),
    off: z.array(z.string()),
    pins: z.array(PinStateSchema).optional(),
  })
  .meta({
    id: 'Scenario',
    description: 'A power state: the rails listed in off are at 0 V; pins may take another role, drive or pull there',
  });

export const ProfileSchema = z
  .strictObject({
    id: id('profile', true),
    label: z.string(),
    // A refinement, not .trim(): the reader returns the document's own values, never altered ones.
    source: z
      .string()
      .refine((v) => v.trim() !== '', { message: 'expected a non-empty source (where the numbers come from)' }),
    params: ParamsSchema,
  })
  .meta({ id: 'Profile', description: 'A design-local logic-family profile' });

export const WaiverSchema = z
  .strictObject({
    rule: z.enum(RULE_IDS, { message: `expected a rule id: ${RULE_IDS.join(', ')}` }),
    scenario: z.string().optional(),
    note: z.string(),
  })
  .meta({ id: 'Waiver', description: 'A finding the engineer has reviewed and accepted, with the reason' });

export const PinSchema = z
  .strictObject({
    id: id('pin', false),
    role: z.enum(['input', 'output', 'bidir']),
    drive: z.enum(['push-pull', 'three-state', 'open-drain']).optional(),
    rail: z.string().optional(),
    profile: z.string().optional(),
    params: ParamsSchema.optional(),
    pull: PullSchema.optional(),
    side: z.enum(['left', 'right', 'top', 'bottom']).optional(),
    // Findings on this pin while it is on no net (an unused input), accepted with the reason;
    // a pin on a net is judged with its net, whose waivers hold.
    waivers: z.array(WaiverSchema).optional(),
  })
  .meta({ id: 'Pin', description: 'A signal pin; nets name it PART.PIN' });

export const PartSchema = z
  .strictObject({
    id: id('part', false),
    label: z.string(),
    rail: z.string(),
    profile: z.string(),
    params: ParamsSchema.optional(),
    position: PositionSchema.optional(),
    pins: z.array(PinSchema),
  })
  .meta({ id: 'Part', description: 'A chip or an off-board connector' });

/** Where a resistor's end may go instead of a net: a rail id or `ground`. */
const TieSchema = z.string().min(1, { message: 'expected a rail id or "ground"' });

const DiscreteBase = {
  id: id('part', false),
  label: z.string().optional(),
  position: PositionSchema.optional(),
};

export const ResistorSchema = z
  .strictObject({
    ...DiscreteBase,
    kind: z.literal('resistor'),
    ohms: resistance(),
    tolerance: fraction().optional(),
    tie: z.strictObject({ '1': TieSchema.optional(), '2': TieSchema.optional() }).optional(),
  })
  .meta({
    id: 'Resistor',
    description: 'A resistor with pins 1 and 2; an end in tie goes to a rail or ground instead of a net',
  });

export const FetShifterSchema = z
  .strictObject({
    ...DiscreteBase,
    kind: z.literal('fet-shifter'),
    gate: z.string().min(1, { message: 'expected a rail id' }),
    vgsThMax: volts('threshold voltage').gt(0, { message: 'expected a positive threshold voltage (V)' }),
    rdsOnMax: z
      .number()
      .min(0, { message: 'expected a resistance (Ω) of 0 or more' })
      .max(MAX_OHMS, { message: `expected a resistance (Ω) of at most ${limitText(MAX_OHMS, 'Ω')}` }),
  })
  .meta({
    id: 'FetShifter',
    description:
      'A bidirectional N-MOSFET level shifter: pin S on the low side, pin D on the high side, the gate on a rail',
  });

export const DiodeShifterSchema = z
  .strictObject({
    ...DiscreteBase,
    kind: z.literal('diode-shifter'),
    vfMax: volts('forward voltage').min(0, { message: 'expected a forward voltage (V) of 0 or more' }),
    leakageMax: current(),
  })
  .meta({
    id: 'DiodeShifter',
    description:
      "A Schottky diode shifter: cathode K on the driver's net, anode A on the receiver's net, which has its own pull-up",
  });

export const DiscreteSchema = z
  .discriminatedUnion('kind', [ResistorSchema, FetShifterSchema, DiodeShifterSchema], {
    error: (iss) =>
      iss.input === undefined
        ? 'missing: expected "resistor", "fet-shifter" or "diode-shifter"'
        : `expected "resistor", "fet-shifter" or "diode-shifter", found ${describeValue(iss.input)}`,
  })
  .meta({ id: 'Discrete', description: 'A part between chips: a resistor, a FET shifter or a diode shifter' });

export const NetSchema = z
  .strictObject({
    id: id('net', false),
    label: z.string().optional(),
    pins: z.array(z.string()),
    pull: PullSchema.optional(),
    wiringCapacitance: capacitance().optional(),
    maxRiseTime: magnitude('time', 's', MIN_SECONDS, MAX_SECONDS).optional(),
    waivers: z.array(WaiverSchema).optional(),
    route: z.array(z.tuple([z.string(), z.string()])).optional(),
  })
  .meta({ id: 'Net', description: 'An electrical connection between pins' });

export const SettingsSchema = z.strictObject({
  minMargin: volts('margin').optional(),
  defaultWiringCapacitance: capacitance().optional(),
});

export const DesignSchema = z.strictObject({
  format: z.literal(FORMAT_ID, { message: `expected "${FORMAT_ID}": this is not a Railcross design file` }),
  version: z.literal(FORMAT_VERSION, { message: `expected version ${FORMAT_VERSION}` }),
  title: z.string(),
  settings: SettingsSchema.optional(),
  rails: z.array(RailSchema),
  scenarios: z.array(ScenarioSchema).optional(),
  profiles: z.array(ProfileSchema).optional(),
  parts: z.array(PartSchema),
  discretes: z.array(DiscreteSchema).optional(),
  nets: z.array(NetSchema),
});

export type Design = z.infer<typeof DesignSchema>;
export type Rail = z.infer<typeof RailSchema>;
export type Scenario = z.infer<typeof ScenarioSchema>;
export type Profile = z.infer<typeof ProfileSchema>;
export type Part = z.infer<typeof PartSchema>;
export type Pin = z.infer<typeof PinSchema>;
export type Net = z.infer<typeof NetSchema>;
export type Params = z.infer<typeof ParamsSchema>;

/** The parameter keys in the format's order (resolution takes each whole; the writer keeps this order). */
export const PARAM_KEYS = Object.keys(ParamsSchema.shape) as readonly (keyof Params)[];
export type Pull = z.infer<typeof PullSchema>;
export type Waiver = z.infer<typeof WaiverSchema>;
export type PinState = z.infer<typeof PinStateSchema>;
export type Discrete = z.infer<typeof DiscreteSchema>;
export type Resistor = z.infer<typeof ResistorSchema>;
export type FetShifter = z.infer<typeof FetShifterSchema>;
export type DiodeShifter = z.infer<typeof DiodeShifterSchema>;
export type DiscreteKind = Discrete['kind'];

/** The pins of each kind of discrete part, as nets name them (`R1.1`, `Q1.S`, `D1.K`). */
export const DISCRETE_PINS: Readonly<Record<DiscreteKind, readonly string[]>> = {
  resistor: ['1', '2'],
  'fet-shifter': ['S', 'D'],
  'diode-shifter': ['K', 'A'],
};

/** A resistor's tolerance when none is given (fraction). */
export const DEFAULT_RESISTOR_TOLERANCE = 0.05;
export type OutputPoint = z.infer<typeof OutputPointSchema>;
export type Settings = z.infer<typeof SettingsSchema>;
export type PinRole = Pin['role'];
export type PinDrive = NonNullable<Pin['drive']>;

/** Defaults of `settings` (design-format.md). */
export const DEFAULT_MIN_MARGIN = 0.2;
export const DEFAULT_WIRING_CAPACITANCE = 5e-12;
export { DEFAULT_TOLERANCE } from '../levels/rails.ts';
