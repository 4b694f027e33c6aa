/**
 * SARIF 2.1.0: the log validates against the standard's JSON Schema (vendored in
 * test/support/schemas/, source named there), and carries one result per finding, the rules'
 * help, nets and pins as logical locations and waivers as suppressions.
 */
import { readFileSync } from 'node:fs';
import Ajv from 'ajv';
import { describe, expect, it } from 'vitest';
import { RULES } from '../../rules/checks/index.ts';
import { check } from '../../rules/check/check.ts';
import type { Design } from '../../rules/model/schema.ts';
import { baselineOf } from '../../rules/report/baseline.ts';
import { buildReport } from '../../rules/report/buildReport.ts';
import type { Report } from '../../rules/report/reportSchema.ts';
import { fileUri, renderSarif, ruleName, toSarif } from '../../rules/report/sarif.ts';
import { FIXED_TIME, greenhouse } from './fixtures.ts';

const NOTE = 'U3 reads EN through a 5 V-tolerant buffer fitted later | rev C';

const schema = JSON.parse(
  readFileSync(new URL('../support/schemas/sarif-2.1.0-rtm.5.json', import.meta.url), 'utf8'),
) as Record<string, unknown>;
// A draft-04 schema: ajv reads it as draft-07 once `id` is spelled `$id` and the draft-04
// meta-schema reference is dropped (its keywords are otherwise the same for this schema).
const { id, $schema: _draft04, ...rest } = schema;
// unicodeRegExp off: the schema's language-tag pattern holds a lone `]`, which JSON Schema's
// ECMA-262 patterns allow but JavaScript's `u` flag refuses.
const ajv = new Ajv({ allErrors: true, strict: false, unicodeRegExp: false });
// The schema's formats, checked as the standard defines them (RFC 3339 date-time, RFC 3986 URIs).
ajv.addFormat(
  'date-time',
  (s: string) => /^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\d(\.\d+)?(Z|[+-]\d\d:\d\d)$/.test(s) && !Number.isNaN(Date.parse(s)),
);
ajv.addFormat('uri', (s: string) => /^[A-Za-z][A-Za-z0-9+.-]*:[^\s]*$/.test(s));
ajv.addFormat('uri-reference', (s: string) => /^[^\s%]*(%[0-9A-Fa-f]{2}[^\s%]*)*$/.test(s));
const validate = ajv.compile({ ...rest, $id: id as string });

function waived(): Design {
  const d = greenhouse();
  return {
    ...d,
    nets: d.nets.map((n) =>
      n.id === 'VALVE_EN' ? { ...n, waivers: [{ rule: 'level-high' as const, note: NOTE }] } : n,
    ),
  };
}
const reportOf = (d: Design): Report => buildReport(d, check(d), { failOn: 'error', generatedAt: FIXED_TIME });

interface SarifResult {
  ruleId: string;
  ruleIndex: number;
  level: string;
  message: { text: string };
  locations: {
    physicalLocation: { artifactLocation: { uri: string } };
    logicalLocations: { name: string; kind: string }[];
  }[];
  partialFingerprints: Record<string, string>;
  suppressions?: { kind: string; status: string; justification: string }[];
  baselineState?: string;
}
interface SarifLog {
  version: string;
  runs: {
    tool: {
      driver: { name: string; rules: { id: string; help: { text: string }; fullDescription: { text: string } }[] };
    };
    results: SarifResult[];
  }[];
}

const cases: [string, Report, Parameters<typeof toSarif>[1]][] = [
  ['the example', reportOf(greenhouse()), { file: 'greenhouse.json' }],
  [
    'the example with a waiver, from a path with spaces',
    reportOf(waived()),
    { file: 'boards/rev b/green house#2.json' },
  ],
  ['against a baseline', reportOf(waived()), { file: 'a.json', baseline: baselineOf(reportOf(greenhouse())) }],
];

describe.each(cases)('SARIF of %s', (_name, report, options) => {
  const text = renderSarif(report, options);
  const log = JSON.parse(text) as SarifLog;
  const run = log.runs[0]!;

  it('validates against the SARIF 2.1.0 JSON Schema', () => {
    expect(validate(log), JSON.stringify(validate.errors?.slice(0, 3))).toBe(true);
    expect(log.version).toBe('2.1.0');
  });

  it("has one result per finding, in the report's order, with its id as fingerprint", () => {
    expect(run.results.length).toBe(report.findings.length);
    expect(run.results.map((r) => r.partialFingerprints['railcrossFindingId/v1'])).toEqual(
      report.findings.map((f) => f.id),
    );
    expect(run.results.map((r) => r.message.text)).toEqual(report.findings.map((f) => f.message));
  });

  it('maps severities to SARIF levels (info is a note)', () => {
    const level = { error: 'error', warning: 'warning', info: 'note' };
    expect(run.results.map((r) => r.level)).toEqual(report.findings.map((f) => level[f.severity]));
  });

  it('describes every rule with its help text, and each result points at its rule', () => {
    expect(run.tool.driver.rules.map((r) => r.id)).toEqual(RULES.map((r) => r.id));
    for (const [k, rule] of RULES.entries()) {
      expect(run.tool.driver.rules[k]!.help.text).toContain(rule.meta.hint);
      expect(run.tool.driver.rules[k]!.fullDescription.text).toBe(rule.meta.explanation);
    }
    for (const r of run.results) expect(run.tool.driver.rules[r.ruleIndex]!.id).toBe(r.ruleId);
  });

  it('locates each finding in the design file, at its net and pins', () => {
    for (const [k, r] of run.results.entries()) {
      const f = report.findings[k]!;
      const loc = r.locations[0]!;
      expect(loc.physicalLocation.artifactLocation.uri).toBe(fileUri(options.file));
      const names = loc.logicalLocations.map((l) => `${l.kind}:${l.name}`);
      if (f.net !== null) expect(names).toContain(`net:${f.net}`);
      for (const pin of f.pins) expect(names).toContain(`pin:${pin}`);
      expect(names.length).toBeGreaterThan(0);
    }
  });

  it('carries waived findings as accepted suppressions with the note, and no others', () => {
    for (const [k, r] of run.results.entries()) {
      const f = report.findings[k]!;
      if (f.waived === undefined) expect(r.suppressions).toBeUndefined();
      else expect(r.suppressions).toEqual([{ kind: 'inSource', status: 'accepted', justification: f.waived }]);
    }
  });
});

describe('SARIF details', () => {
  it("the waiver case is not vacuous: VALVE_EN's level-high findings are suppressed with the note", () => {
    const log = toSarif(reportOf(waived()), { file: 'a.json' }) as unknown as SarifLog;
    const suppressed = log.runs[0]!.results.filter((r) => r.suppressions !== undefined);
    expect(suppressed.length).toBe(2); // all-on and standby
    expect(suppressed.every((r) => r.ruleId === 'level-high' && r.suppressions![0]!.justification === NOTE)).toBe(true);
  });

  it('with a baseline, results the baseline holds are unchanged and others new', () => {
    const base = reportOf(greenhouse());
    const d = greenhouse();
    // A stronger SDA pull-up (2.2 kΩ): U1's low level at the larger sink current leaves NML below 0.2 V, a new warning.
    const without = { ...d, nets: d.nets.map((n) => (n.id === 'SDA' ? { ...n, pull: { to: '3v3', ohms: 2200 } } : n)) };
    const log = toSarif(reportOf(without), { file: 'a.json', baseline: baselineOf(base) }) as unknown as SarifLog;
    const known = new Set(base.findings.map((f) => f.id));
    for (const r of log.runs[0]!.results) {
      const id = r.partialFingerprints['railcrossFindingId/v1']!;
      expect(r.baselineState).toBe(known.has(id) ? 'unchanged' : 'new');
    }
    expect(log.runs[0]!.results.some((r) => r.baselineState === 'new')).toBe(true);
  });

  it('the schema check can fail: a level SARIF does not define is refused', () => {
    const log = toSarif(reportOf(greenhouse()), { file: 'a.json' }) as unknown as SarifLog;
    log.runs[0]!.results[0]!.level = 'fatal';
    expect(validate(log)).toBe(false);
  });

  it.each([
    ['level-high', 'LevelHigh'],
    ['floating-input', 'FloatingInput'],
    ['overvoltage', 'Overvoltage'],
  ])('ruleName: %s → %s', (id, name) => {
    expect(ruleName(id)).toBe(name);
  });

  it.each([
    ['plain', 'greenhouse.json', 'greenhouse.json'],
    ['folders', 'boards/a.json', 'boards/a.json'],
    ['a space and a hash', 'rev b/x#2.json', 'rev%20b/x%232.json'],
    ['a backslash separator', 'boards\\a.json', 'boards/a.json'],
    ['a percent sign', '100%.json', '100%25.json'],
  ])('fileUri: %s', (_name, file, uri) => {
    expect(fileUri(file)).toBe(uri);
  });
});
