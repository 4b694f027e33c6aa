/**
 * The report as SARIF 2.1.0 (the OASIS Static Analysis Results Interchange Format), which CI
 * systems read to show findings beside a change: one run, the rules with their help text, one
 * result per finding, nets and pins as logical locations (a design has no lines to point at),
 * waived findings as accepted suppressions carrying the waiver's note.
 */
import { RULES } from '../checks/index.ts';
import { RULE_IDS } from '../model/ruleIds.ts';
import { inBaseline, type Baseline } from './baseline.ts';
import type { Report, ReportFinding } from './reportSchema.ts';
import { TOOL_VERSION } from './version.ts';

export const SARIF_SCHEMA_URI = 'https://json.schemastore.org/sarif-2.1.0.json';

export interface SarifOptions {
  /** The design file as the command was given it: every result's artifact. */
  readonly file: string;
  /** With a baseline, each result carries `baselineState` (new or unchanged). */
  readonly baseline?: Baseline;
}

/** SARIF's levels: `note` is its word for an informational result. */
const LEVEL = { error: 'error', warning: 'warning', info: 'note' } as const;

/**
 * A file name as a URI reference (RFC 3986): `/` separators, each segment percent-encoded, so
 * that a name with spaces, `#` or `%` stays one valid relative reference.
 */
export function fileUri(file: string): string {
  return file.replace(/\\/g, '/').split('/').map(encodeURIComponent).join('/');
}

function logicalLocations(f: ReportFinding): { name: string; fullyQualifiedName: string; kind: string }[] {
  const out = [];
  if (f.net !== null) out.push({ name: f.net, fullyQualifiedName: `net:${f.net}`, kind: 'net' });
  for (const pin of f.pins) out.push({ name: pin, fullyQualifiedName: `pin:${pin}`, kind: 'pin' });
  const rail = f.values.rail;
  if (typeof rail === 'string') out.push({ name: rail, fullyQualifiedName: `rail:${rail}`, kind: 'rail' });
  if (out.length === 0)
    for (const part of f.parts) out.push({ name: part, fullyQualifiedName: `part:${part}`, kind: 'part' });
  return out;
}

/** A rule's name as SARIF wants it, an identifier without spaces: `level-high` → `LevelHigh`. */
export function ruleName(id: string): string {
  return id
    .split('-')
    .map((w) => w.charAt(0).toUpperCase() + w.slice(1))
    .join('');
}

/** The report as a SARIF log object (serialize it with JSON.stringify). */
export function toSarif(report: Report, options: SarifOptions): Record<string, unknown> {
  const ruleIndex = new Map<string, number>(RULE_IDS.map((id, k) => [id, k]));
  const rules = RULES.map((rule) => ({
    id: rule.id,
    name: ruleName(rule.id),
    shortDescription: { text: rule.meta.title },
    fullDescription: { text: rule.meta.explanation },
    help: { text: `${rule.meta.hint}\n\nSeverity: ${rule.meta.severity}` },
    properties: { severityPolicy: rule.meta.severity },
  }));
  const results = report.findings.map((f) => ({
    ruleId: f.rule,
    ruleIndex: ruleIndex.get(f.rule) ?? 0,
    level: LEVEL[f.severity],
    message: { text: f.message },
    locations: [
      {
        physicalLocation: { artifactLocation: { uri: fileUri(options.file), index: 0 } },
        logicalLocations: logicalLocations(f),
      },
    ],
    partialFingerprints: { 'railcrossFindingId/v1': f.id },
    ...(f.waived === undefined
      ? {}
      : { suppressions: [{ kind: 'inSource', status: 'accepted', justification: f.waived }] }),
    ...(options.baseline === undefined ? {} : { baselineState: inBaseline(f, options.baseline) ? 'unchanged' : 'new' }),
    properties: { findingId: f.id, scenario: f.scenario, hint: f.hint, values: f.values, pins: f.pins, parts: f.parts },
  }));
  return {
    $schema: SARIF_SCHEMA_URI,
    version: '2.1.0',
    runs: [
      {
        tool: { driver: { name: 'railcross', version: TOOL_VERSION, semanticVersion: TOOL_VERSION, rules } },
        invocations: [{ executionSuccessful: true, endTimeUtc: report.generatedAt }],
        artifacts: [{ location: { uri: fileUri(options.file) }, mimeType: 'application/json' }],
        results,
        properties: {
          design: report.design,
          settings: report.settings,
          summary: report.summary,
          scenarios: report.scenarios,
        },
      },
    ],
  };
}

/** The SARIF log as text, ending with a newline. */
export function renderSarif(report: Report, options: SarifOptions): string {
  return `${JSON.stringify(toSarif(report, options), null, 2)}\n`;
}
