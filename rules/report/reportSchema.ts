/**
 * The rule report, version 1 (report-format.md): the one zod schema. The `Report` type and
 * rules/schema/report.schema.json are both derived from it.
 */
import { z } from 'zod';
import { RULE_IDS } from '../model/ruleIds.ts';

// zod would otherwise compile validators with `new Function`, which a strict CSP forbids
// (the editor validates reports it builds, in the browser).
z.config({ jitless: true });

export const REPORT_FORMAT_ID = 'railcross.report';
export const REPORT_FORMAT_VERSION = 1;

const count = z.number().int().min(0);
const severity = z.enum(['error', 'warning', 'info']);

export const FailOnSchema = z.enum(['error', 'warning']).meta({
  id: 'FailOn',
  description: 'The least severity of an unwaived finding that makes the check fail',
});

export const ReportFindingSchema = z
  .strictObject({
    id: z.string().min(1).meta({
      description: 'Stable and unique: rule:NET:SCENARIO, with a pin, pair or profile appended by some rules',
    }),
    rule: z.enum(RULE_IDS),
    severity,
    scenario: z.string().min(1).meta({ description: '"all-on" or a scenario id of the design' }),
    net: z
      .string()
      .nullable()
      .meta({ description: 'Net id, or null for findings on no net (rail-range, a pin on no net)' }),
    pins: z.array(z.string()).meta({ description: 'PART.PIN keys the finding concerns' }),
    parts: z.array(z.string()),
    message: z.string().meta({ description: 'One sentence with the numbers, in engineering notation' }),
    values: z
      .record(z.string(), z.unknown())
      .meta({ description: 'The numbers used, in SI units (V, A, Ω, F, s), and the corner' }),
    hint: z.string().meta({ description: 'The usual remedy' }),
    waived: z.string().optional().meta({ description: 'Present when a waiver of the net matches: its note' }),
  })
  .meta({ id: 'Finding', description: 'One finding of one rule in one power state' });

export const CrossingSchema = z
  .strictObject({
    net: z.string(),
    label: z.string(),
    rails: z
      .array(z.string())
      .min(2)
      .meta({ description: "Distinct rails of the net's pins (pull resistors' rails excluded)" }),
    scenario: z.string(),
    marginHigh: z.number().nullable().meta({
      description:
        "Worst NMH over the net's driver/receiver pairs, V; null when there is no pair, or when it could not be computed (worst is then error)",
    }),
    marginLow: z.number().nullable().meta({
      description:
        "Worst NML over the net's driver/receiver pairs, V; null when there is no pair, or when it could not be computed (worst is then error)",
    }),
    worst: z.enum(['error', 'warning', 'ok']).meta({
      description: 'The most severe unwaived finding of any rule on the net in this power state; info counts as ok',
    }),
  })
  .meta({ id: 'Crossing', description: 'A net that joins pins of different rails, in one power state' });

export const InterfacePowerSchema = z
  .strictObject({
    scenario: z.string(),
    rail: z.string(),
    current: z.number().min(0).meta({ description: "Σ ΔICC of the rail's inputs held high below their supply, A" }),
    pins: z.array(z.string()).min(1),
  })
  .meta({
    id: 'InterfacePower',
    description: 'The extra supply current of one rail in one power state (interface-power findings summed)',
  });

export const ReportSchema = z.strictObject({
  format: z.literal(REPORT_FORMAT_ID),
  version: z.literal(REPORT_FORMAT_VERSION),
  tool: z
    .string()
    .regex(/^railcross \d+\.\d+\.\d+/)
    .meta({ description: 'railcross and its version' }),
  generatedAt: z.iso.datetime().meta({ description: 'When the report was made (SOURCE_DATE_EPOCH when set)' }),
  design: z.strictObject({ title: z.string(), parts: count, nets: count, rails: count }),
  settings: z.strictObject({
    minMargin: z.number().meta({ description: 'V' }),
    defaultWiringCapacitance: z.number().min(0).meta({ description: 'F' }),
    failOn: FailOnSchema,
  }),
  scenarios: z
    .array(z.strictObject({ id: z.string(), label: z.string(), off: z.array(z.string()) }))
    .meta({ description: "The power states checked: all-on first, then the design's scenarios in order" }),
  summary: z.strictObject({ error: count, warning: count, info: count, waived: count }).meta({
    description: 'Unwaived findings by severity over all power states reported; waived counts the waived ones',
  }),
  findings: z.array(ReportFindingSchema),
  crossings: z.array(CrossingSchema),
  interfacePower: z.array(InterfacePowerSchema),
  profiles: z
    .array(z.strictObject({ id: z.string(), label: z.string(), source: z.string() }))
    .meta({ description: 'The profiles the design uses (built-in or design-local) and where their numbers come from' }),
  cautions: z.array(z.string()).min(1),
  names: z
    .strictObject({
      nets: z.record(z.string(), z.string()).meta({ description: 'Net id → label, for the nets whose label differs' }),
      rails: z.record(z.string(), z.string()).meta({ description: 'Rail id → label' }),
    })
    .optional()
    .meta({
      description:
        'The labels people read, by id: the text, Markdown and PDF name nets and rails by them (ids stay in the machine fields); absent from reports written before it',
    }),
});

export type Report = z.infer<typeof ReportSchema>;
export type ReportFinding = z.infer<typeof ReportFindingSchema>;
export type Crossing = z.infer<typeof CrossingSchema>;
export type InterfacePower = z.infer<typeof InterfacePowerSchema>;
export type FailOn = z.infer<typeof FailOnSchema>;
