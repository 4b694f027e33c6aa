/**
 * The report as plain text for a terminal: what `railcross check FILE` prints. Findings are
 * grouped by severity, then by rule (in the catalogue's order), so that the errors come first
 * and a rule's usual remedy is said once for its group; info findings are collapsed to a count
 * unless asked for. Every finding shown keeps its full message (the numbers are never cut).
 */
import { RULES } from '../checks/index.ts';
import { netNameIn, railNameIn } from './reportNames.ts';
import { formatQuantity } from '../levels/units.ts';
import { designLine, marginText, settingsLine, stateText } from './describe.ts';
import type { Report, ReportFinding } from './reportSchema.ts';
import { plural, verdict, type Verdict } from './verdict.ts';

export interface TextOptions {
  /** List info findings one by one too (by default they are a count). */
  readonly verbose?: boolean;
  /** The verdict to print, when the caller judges otherwise (a baseline); by default the report's own. */
  readonly verdict?: Verdict;
  /** Marks findings the caller calls new (against a baseline) with `NEW`. */
  readonly isNew?: (f: ReportFinding) => boolean;
}

/**
 * The widest a column is padded to. A longer cell is printed whole and pushes the rest of its
 * own row along, rather than widening every row of the table: one 10,000-character label must
 * not pad a thousand rows to its width (output growing as rows × longest cell).
 */
const MAX_COLUMN = 40;

/** Left-aligned columns, two spaces apart; numeric columns right-aligned. */
function table(
  head: readonly string[],
  rows: readonly (readonly string[])[],
  right: ReadonlySet<number> = new Set(),
): string[] {
  // A loop, not `Math.max(...rows)`: spreading thousands of rows overflows the stack.
  const width = head.map((h) => h.length);
  for (const r of rows)
    head.forEach((_, k) => {
      width[k] = Math.min(MAX_COLUMN, Math.max(width[k]!, (r[k] ?? '').length));
    });
  const line = (cells: readonly string[]) =>
    cells
      .map((c, k) => (right.has(k) ? c.padStart(width[k]!) : c.padEnd(width[k]!)))
      .join('  ')
      .trimEnd();
  return [line(head), ...rows.map(line)].map((l) => `  ${l}`);
}

const TITLES = new Map(RULES.map((r) => [r.id as string, r.meta.title]));
const RULE_ORDER = new Map(RULES.map((r, k) => [r.id as string, k]));

type Group = 'error' | 'warning' | 'info' | 'waived';
const GROUPS: readonly [Group, string][] = [
  ['error', 'Errors'],
  ['warning', 'Warnings'],
  ['waived', 'Waived'],
  ['info', 'Info'],
];
const groupOf = (f: ReportFinding): Group => (f.waived === undefined ? f.severity : 'waived');

/** `net SDA [standby]` or `(no net) [all-on]`, with the pins when the rule names some. */
function where(f: ReportFinding, report: Report): string {
  return `${f.net === null ? '(no net)' : `net ${netNameIn(report, f.net)}`} [${f.scenario}]`;
}

/**
 * One rule's findings of one group: its title and count, its usual remedy once, then a line per
 * finding. A finding whose hint differs from the group's shared one keeps its own.
 */
function ruleLines(
  report: Report,
  rule: string,
  findings: readonly ReportFinding[],
  group: Group,
  options: TextOptions,
): string[] {
  const counts = new Map<string, number>();
  for (const f of findings) counts.set(f.hint, (counts.get(f.hint) ?? 0) + 1);
  const shared = [...counts].sort((a, b) => b[1] - a[1])[0]![0];
  const out = [`  ${rule}: ${TITLES.get(rule) ?? rule} (${findings.length})`, `    Hint: ${shared}`];
  for (const f of findings) {
    const mark = options.isNew?.(f) ? 'NEW ' : '';
    const severity = group === 'waived' ? `${f.severity}, ` : '';
    out.push(`    ${mark}${severity}${where(f, report)}: ${f.message}`);
    if (f.waived !== undefined) out.push(`      Waived: ${f.waived}`);
    if (f.hint !== shared) out.push(`      Hint: ${f.hint}`);
  }
  return out;
}

function findingLines(report: Report, options: TextOptions): string[] {
  const out: string[] = [];
  const byGroup = new Map<Group, ReportFinding[]>();
  for (const f of report.findings) {
    const g = groupOf(f);
    const list = byGroup.get(g);
    if (list === undefined) byGroup.set(g, [f]);
    else list.push(f);
  }
  if (report.findings.length === 0) return ['', 'Findings: none'];
  for (const [group, heading] of GROUPS) {
    const list = byGroup.get(group) ?? [];
    if (list.length === 0) continue;
    if (group === 'info' && options.verbose !== true) {
      out.push('', `Info: ${plural(list.length, 'finding')}, not listed (--verbose lists them)`);
      continue;
    }
    out.push('', `${heading} (${list.length})`);
    const byRule = new Map<string, ReportFinding[]>();
    for (const f of list) {
      const same = byRule.get(f.rule);
      if (same === undefined) byRule.set(f.rule, [f]);
      else same.push(f);
    }
    // The report's own order within a rule: power state, then net in the file's order.
    const rules = [...byRule.keys()].sort((a, b) => (RULE_ORDER.get(a) ?? 0) - (RULE_ORDER.get(b) ?? 0));
    for (const rule of rules) out.push(...ruleLines(report, rule, byRule.get(rule)!, group, options));
  }
  return out;
}

/** The report as readable text, ending with a newline. */
export function renderText(report: Report, options: TextOptions = {}): string {
  const out: string[] = [];
  out.push(`Railcross check: ${report.design.title}`);
  out.push(`${report.tool}, ${report.generatedAt}`);
  out.push(`${designLine(report)}; ${settingsLine(report)}`);
  out.push(`Power states: ${report.scenarios.map((s) => stateText(s, report)).join(', ')}`);
  out.push('');
  const s = report.summary;
  out.push(
    ...table(
      ['errors', 'warnings', 'info', 'waived'],
      [[s.error, s.warning, s.info, s.waived].map(String)],
      new Set([0, 1, 2, 3]),
    ),
  );
  out.push('');
  out.push((options.verdict ?? verdict(report)).line);

  out.push(...findingLines(report, options));

  out.push('', `Rail crossings (${report.crossings.length})`);
  if (report.crossings.length === 0) out.push('  none: no net joins pins of different rails');
  else {
    out.push(
      ...table(
        ['net', 'label', 'rails', 'state', 'worst NMH', 'worst NML', 'worst'],
        report.crossings.map((c) => [
          c.net,
          c.label,
          c.rails.map((r) => railNameIn(report, r)).join(', '),
          c.scenario,
          marginText(c.marginHigh),
          marginText(c.marginLow),
          c.worst,
        ]),
        new Set([4, 5]),
      ),
    );
  }

  if (report.interfacePower.length > 0) {
    out.push('', 'Extra supply current of inputs held high below their supply (interface-power)');
    out.push(
      ...table(
        ['state', 'rail', 'current', 'inputs'],
        report.interfacePower.map((r) => [
          r.scenario,
          railNameIn(report, r.rail),
          formatQuantity(r.current, 'A'),
          r.pins.join(', '),
        ]),
        new Set([2]),
      ),
    );
  }

  out.push('', 'Profiles used');
  if (report.profiles.length === 0) out.push('  none');
  for (const p of report.profiles) out.push(`  ${p.id}: ${p.label}`, `      source: ${p.source}`);

  out.push('', 'Cautions');
  for (const c of report.cautions) out.push(`  ${c}`);
  return `${out.join('\n')}\n`;
}
