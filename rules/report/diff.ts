/**
 * What a change did to a design's findings (`railcross diff OLD NEW`): findings that are new,
 * gone, or changed (a severity, a waiver, a margin or another number that moved), matched by
 * their stable ids. Renders as text, Markdown for a review comment, and JSON.
 */
import { formatMargin, formatQuantity } from '../levels/units.ts';
import { reaches } from './baseline.ts';
import { codeSpan, escapeMarkdown } from './renderMarkdown.ts';
import type { FailOn, Report, ReportFinding } from './reportSchema.ts';
import { plural } from './verdict.ts';
import { netNameIn } from './reportNames.ts';

export const DIFF_FORMAT_ID = 'railcross.diff';
export const DIFF_FORMAT_VERSION = 1;

/** One field of a finding that differs: `severity`, `waived`, or `values.KEY`. */
export interface FieldChange {
  readonly key: string;
  readonly before: unknown;
  readonly after: unknown;
}

export interface ChangedFinding {
  readonly id: string;
  readonly before: ReportFinding;
  readonly after: ReportFinding;
  readonly changes: readonly FieldChange[];
}

export interface DiffSide {
  readonly file: string;
  readonly title: string;
  readonly tool: string;
  /** The report's labels by id, when it carries them: the text names nets by them. */
  readonly names?: Report['names'];
}

export interface ReportDiff {
  readonly format: typeof DIFF_FORMAT_ID;
  readonly version: typeof DIFF_FORMAT_VERSION;
  readonly from: DiffSide;
  readonly to: DiffSide;
  readonly failOn: FailOn;
  readonly summary: {
    readonly new: number;
    readonly gone: number;
    readonly changed: number;
    readonly unchanged: number;
    readonly regressions: number;
  };
  readonly new: readonly ReportFinding[];
  readonly gone: readonly ReportFinding[];
  readonly changed: readonly ChangedFinding[];
}

/**
 * Two numbers differ when they are not the same to 1 part in 10⁹ (the report's numbers come from
 * the same arithmetic, so only a real change moves them more than rounding could).
 */
function sameNumber(a: number, b: number): boolean {
  if (a === b || (Number.isNaN(a) && Number.isNaN(b))) return true;
  return Math.abs(a - b) <= 1e-9 * Math.max(Math.abs(a), Math.abs(b));
}

function sameValue(a: unknown, b: unknown): boolean {
  if (typeof a === 'number' && typeof b === 'number') return sameNumber(a, b);
  return JSON.stringify(a) === JSON.stringify(b);
}

/** The fields in which one finding, seen in two reports, differs. */
export function fieldChanges(before: ReportFinding, after: ReportFinding): FieldChange[] {
  const changes: FieldChange[] = [];
  if (before.severity !== after.severity)
    changes.push({ key: 'severity', before: before.severity, after: after.severity });
  if (before.waived !== after.waived)
    changes.push({ key: 'waived', before: before.waived ?? null, after: after.waived ?? null });
  const keys = new Set([...Object.keys(before.values), ...Object.keys(after.values)]);
  for (const key of keys) {
    const a = before.values[key] ?? null;
    const b = after.values[key] ?? null;
    if (!sameValue(a, b)) changes.push({ key: `values.${key}`, before: a, after: b });
  }
  return changes;
}

/** Fails where it did not: a new finding at the fail-on level, or one that rose to it (or lost its waiver). */
function regressed(before: ReportFinding | undefined, after: ReportFinding, failOn: FailOn): boolean {
  return reaches(after, failOn) && (before === undefined || !reaches(before, failOn));
}

/** Compares two reports; `failOn` says which new or changed findings count as regressions. */
export function diffReports(from: Report, to: Report, files: { from: string; to: string }, failOn: FailOn): ReportDiff {
  const before = new Map(from.findings.map((f) => [f.id, f]));
  const after = new Set(to.findings.map((f) => f.id));
  const added: ReportFinding[] = [];
  const changed: ChangedFinding[] = [];
  let unchanged = 0;
  let regressions = 0;
  for (const f of to.findings) {
    const old = before.get(f.id);
    if (regressed(old, f, failOn)) regressions++;
    if (old === undefined) {
      added.push(f);
      continue;
    }
    const changes = fieldChanges(old, f);
    if (changes.length === 0) unchanged++;
    else changed.push({ id: f.id, before: old, after: f, changes });
  }
  const gone = from.findings.filter((f) => !after.has(f.id));
  const side = (r: Report, file: string): DiffSide => ({
    file,
    title: r.design.title,
    tool: r.tool,
    ...(r.names === undefined ? {} : { names: r.names }),
  });
  return {
    format: DIFF_FORMAT_ID,
    version: DIFF_FORMAT_VERSION,
    from: side(from, files.from),
    to: side(to, files.to),
    failOn,
    summary: { new: added.length, gone: gone.length, changed: changed.length, unchanged, regressions },
    new: added,
    gone,
    changed,
  };
}

/** Units of the values' keys that carry one (report-format.md: SI units). */
const UNITS: Readonly<Record<string, string>> = {
  voh: 'V',
  vih: 'V',
  vol: 'V',
  vil: 'V',
  margin: 'V',
  marginHigh: 'V',
  marginLow: 'V',
  driverVdd: 'V',
  receiverVdd: 'V',
  vpull: 'V',
  vNet: 'V',
  viMax: 'V',
  railMin: 'V',
  railMax: 'V',
  profileMin: 'V',
  profileMax: 'V',
  loadHigh: 'A',
  loadLow: 'A',
  ratedHigh: 'A',
  ratedLow: 'A',
  riseTime: 's',
  limit: 's',
  capacitance: 'F',
  resistance: 'Ω',
  ohms: 'Ω',
  rMin: 'Ω',
  rMax: 'Ω',
  suggested: 'Ω',
  ramp: 's/V',
  maxInputRamp: 's/V',
  pinVdd: 'V',
  ioMax: 'A',
  t1090: 's',
  swing: 'V',
  ohmsMin: 'Ω',
  ohmsMax: 'Ω',
  lowestPower: 'Ω',
  adviceMin: 'Ω',
  adviceMax: 'Ω',
  adviceCap: 'Ω',
  othersOhms: 'Ω',
  suggestedRise: 's',
  suggestedHigh: 'V',
  suggestedLow: 'V',
  suggestedSink: 'A',
  current: 'A',
  drop: 'V',
  high: 'V',
  threshold: 'V',
  // Version 2: parts between chips.
  injectionMax: 'A',
  total: 'A',
  minLoad: 'A',
  viMin: 'V',
  vgate: 'V',
  vgs: 'V',
  vgsTh: 'V',
  iLow: 'A',
  iHigh: 'A',
  rated: 'A',
  gateMax: 'V',
  pullMin: 'V',
  minExternalPull: 'Ω',
  vlow: 'V',
  rs: 'Ω',
  rpu: 'Ω',
  maxLoadCapacitance: 'F',
  overdrive: 'A',
};

/** Value keys that are plain numbers (fractions, factors): printed as they are. */
export const UNITLESS_VALUE_KEYS: ReadonlySet<string> = new Set(['adviceTolerance', 'riseGuard']);

/** The unit of a values key, if it has one. */
export function unitOfValue(key: string): string | undefined {
  return UNITS[key];
}

function valueText(key: string, value: unknown): string {
  if (value === null || value === undefined) return '—';
  const unit = UNITS[key.replace(/^values\./, '')];
  if (typeof value === 'number') {
    if (unit === undefined) return String(value);
    // A margin is a difference of two levels: three digits, as everywhere else.
    return /^values\.margin/.test(key) ? formatMargin(value) : formatQuantity(value, unit);
  }
  return typeof value === 'string' ? value : JSON.stringify(value);
}

/** `margin -0.759 V → -0.2 V`, `severity error → warning`, `waived — → "note"`. */
export function changeText(c: FieldChange): string {
  return `${c.key.replace(/^values\./, '')} ${valueText(c.key, c.before)} → ${valueText(c.key, c.after)}`;
}

const where = (f: ReportFinding, side: DiffSide) =>
  `${f.net === null ? '(no net)' : `net ${netNameIn(side, f.net)}`} [${f.scenario}]`;
const severityOf = (f: ReportFinding) => (f.waived === undefined ? f.severity : `${f.severity}, waived`);

function summaryLine(d: ReportDiff): string {
  const s = d.summary;
  const regress =
    s.regressions === 0
      ? `none fails where it did not (fail on ${d.failOn})`
      : `${plural(s.regressions, 'finding')} now fail${s.regressions === 1 ? 's' : ''} at the fail-on level (${d.failOn})`;
  return `${s.new} new, ${s.gone} gone, ${s.changed} changed, ${s.unchanged} unchanged; ${regress}.`;
}

/** The comparison as plain text, ending with a newline. */
export function renderDiffText(d: ReportDiff): string {
  const out = [
    `Railcross diff: ${d.from.file} → ${d.to.file}`,
    `${d.from.title} (${d.from.tool}) → ${d.to.title} (${d.to.tool})`,
    '',
    summaryLine(d),
  ];
  // A gone finding is named as the older report named it; the others as the newer one does.
  const list = (heading: string, findings: readonly ReportFinding[], side: DiffSide) => {
    if (findings.length === 0) return;
    out.push('', `${heading} (${findings.length})`);
    for (const f of findings)
      out.push(`  ${severityOf(f).toUpperCase()}  ${f.rule}  ${where(f, side)}`, `      ${f.message}`);
  };
  list('New', d.new, d.to);
  list('Gone', d.gone, d.from);
  if (d.changed.length > 0) {
    out.push('', `Changed (${d.changed.length})`);
    for (const c of d.changed)
      out.push(
        `  ${severityOf(c.after).toUpperCase()}  ${c.after.rule}  ${where(c.after, d.to)}`,
        `      ${c.changes.map(changeText).join('; ')}`,
        `      ${c.after.message}`,
      );
  }
  return `${out.join('\n')}\n`;
}

/** The comparison as GitHub-flavoured Markdown for a review comment, ending with a newline. */
export function renderDiffMarkdown(d: ReportDiff): string {
  const out = [
    `## Railcross diff: ${escapeMarkdown(d.from.title)} → ${escapeMarkdown(d.to.title)}`,
    '',
    `${codeSpan(d.from.file)} → ${codeSpan(d.to.file)}. ${escapeMarkdown(summaryLine(d))}`,
  ];
  const row = (cells: readonly string[]) => `| ${cells.join(' | ')} |`;
  const table = (heading: string, findings: readonly ReportFinding[], side: DiffSide) => {
    if (findings.length === 0) return;
    out.push(
      '',
      `### ${heading} (${findings.length})`,
      '',
      row(['Severity', 'Rule', 'Net', 'Power state', 'Message']),
      row(['---', '---', '---', '---', '---']),
    );
    for (const f of findings)
      out.push(
        row([
          severityOf(f),
          codeSpan(f.rule),
          f.net === null ? '—' : escapeMarkdown(netNameIn(side, f.net)),
          codeSpan(f.scenario),
          escapeMarkdown(f.message),
        ]),
      );
  };
  table('New', d.new, d.to);
  table('Gone', d.gone, d.from);
  if (d.changed.length > 0) {
    out.push(
      '',
      `### Changed (${d.changed.length})`,
      '',
      row(['Severity', 'Rule', 'Net', 'Power state', 'What changed', 'Message now']),
      row(['---', '---', '---', '---', '---', '---']),
    );
    for (const c of d.changed) {
      const f = c.after;
      out.push(
        row([
          severityOf(f),
          codeSpan(f.rule),
          f.net === null ? '—' : escapeMarkdown(netNameIn(d.to, f.net)),
          codeSpan(f.scenario),
          escapeMarkdown(c.changes.map(changeText).join('; ')),
          escapeMarkdown(f.message),
        ]),
      );
    }
  }
  return `${out.join('\n')}\n`;
}

/** The comparison as JSON, ending with a newline. */
export function renderDiffJson(d: ReportDiff): string {
  return `${JSON.stringify(d, null, 2)}\n`;
}
