import { readFileSync } from 'node:fs';
import Ajv2020 from 'ajv/dist/2020.js';
import { describe, expect, it } from 'vitest';
import { check } from '../../rules/check/check.ts';
import { buildReport } from '../../rules/report/buildReport.ts';
import { ReportSchema, type Report } from '../../rules/report/reportSchema.ts';
import { reportJsonSchema, SCHEMA_FILES, schemaText } from '../../rules/schema/schemas.ts';
import { FIXED_TIME, greenhouse } from './fixtures.ts';

const committedText = readFileSync(new URL('../../rules/schema/report.schema.json', import.meta.url), 'utf8');
const committed = JSON.parse(committedText) as Record<string, unknown>;

// The JSON Schema is draft 2020-12 (zod's output). Its date-time pattern already pins the
// ISO format, so ajv's optional format plug-in is not needed.
const ajv = new Ajv2020({ allErrors: true, strict: true, validateFormats: false });
const validateJson = ajv.compile(committed);

function exampleReport(scenario?: string): Report {
  const design = greenhouse();
  return buildReport(design, check(design), {
    failOn: 'error',
    generatedAt: FIXED_TIME,
    ...(scenario ? { scenario } : {}),
  });
}

/** A report after a JSON round trip, as a file holds it. */
const asJson = (r: unknown) => JSON.parse(JSON.stringify(r)) as Record<string, unknown>;

describe('the committed JSON Schema files', () => {
  it.each(SCHEMA_FILES.map((f) => [f.file, f] as const))(
    '%s is current: `npm run schema` would write the same text',
    (file, { build }) => {
      expect(readFileSync(new URL(`../../rules/schema/${file}`, import.meta.url), 'utf8')).toBe(schemaText(build()));
    },
  );

  it('include report.schema.json', () => {
    expect(committedText).toBe(schemaText(reportJsonSchema()));
  });
});

describe('report.schema.json', () => {
  it('identifies itself', () => {
    expect([committed.$id, committed.$schema]).toEqual([
      'urn:railcross:schema:report:1',
      'https://json-schema.org/draft/2020-12/schema',
    ]);
  });
});

describe('the example report validates', () => {
  const report = asJson(exampleReport());

  it.each([
    ['zod ReportSchema', () => ReportSchema.safeParse(report).success],
    ['committed JSON Schema (ajv)', () => validateJson(report)],
  ])('against the %s', (_name, valid) => {
    expect(valid(), JSON.stringify(validateJson.errors)).toBe(true);
  });

  it('and is not vacuous: the example has findings and crossings', () => {
    expect((report.findings as unknown[]).length).toBeGreaterThan(0);
    expect((report.crossings as unknown[]).length).toBeGreaterThan(0);
  });
});

// biome-ignore lint/suspicious/noExplicitAny: mutations reach into any part of a report on purpose
type Mutation = (r: Record<string, any>) => void;

describe('both schemas refuse what report-format.md does not allow', () => {
  const cases: [string, Mutation][] = [
    ['an engine message id in a finding', (r) => (r.findings[0].messageId = 'overLimit')],
    ['an unknown rule id', (r) => (r.findings[0].rule = 'level-mid')],
    ['severity "fatal"', (r) => (r.findings[0].severity = 'fatal')],
    ['a crossing worst of "info"', (r) => (r.crossings[0].worst = 'info')],
    ['a crossing with one rail', (r) => (r.crossings[0].rails = ['3v3'])],
    ['no cautions', (r) => (r.cautions = [])],
    ['format of a design', (r) => (r.format = 'railcross.design')],
    ['version 2', (r) => (r.version = 2)],
    ['a tool without version', (r) => (r.tool = 'railcross')],
    ['a local time', (r) => (r.generatedAt = '2026-01-01 12:00')],
    ['failOn "info"', (r) => (r.settings.failOn = 'info')],
    ['a fractional count', (r) => (r.summary.error = 1.5)],
    ['an extra top-level key', (r) => (r.extra = true)],
    ['a profile without source', (r) => delete r.profiles[0].source],
    ['a net that is neither string nor null', (r) => (r.findings[0].net = 3)],
  ];

  it.each(cases)('%s', (_name, mutate) => {
    const r = asJson(exampleReport());
    mutate(r);
    expect([ReportSchema.safeParse(r).success, validateJson(r)]).toEqual([false, false]);
  });
});
