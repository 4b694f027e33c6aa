/**
 * The report as plain text for a terminal: what `railcross check FILE` prints. Every finding
 * keeps its full message (the numbers are never cut), so nothing is wrapped or truncated.
 */
import { formatQuantity } from '../levels/units.ts';
import { designLine, marginText, settingsLine, stateText } from './describe.ts';
import type { Report, ReportFinding } from './reportSchema.ts';
import { verdict } from './verdict.ts';

/** Left-aligned columns, two spaces apart; numeric columns right-aligned. */
function table(head: readonly string[], rows: readonly (readonly string[])[], right: ReadonlySet<number> = new Set()): string[] {
  const width = head.map((h, k) => Math.max(h.length, ...rows.map((r) => (r[k] ?? '').length)));
  const line = (cells: readonly string[]) =>
    cells
      .map((c, k) => (right.has(k) ? c.padStart(width[k]!) : c.padEnd(width[k]!)))
      .join('  ')
      .trimEnd();
  return [line(head), ...rows.map(line)].map((l) => `  ${l}`);
}

function findingLines(f: ReportFinding): string[] {
  const severity = f.severity.toUpperCase() + (f.waived === undefined ? '' : ' (waived)');
  const lines = [`  ${severity}  ${f.rule}  ${f.net === null ? '(no net)' : `net ${f.net}`}  [${f.scenario}]`, `      ${f.message}`];
  if (f.waived !== undefined) lines.push(`      Waived: ${f.waived}`);
  lines.push(`      Hint: ${f.hint}`);
  return lines;
}

/** The report as readable text, ending with a newline. */
export function renderText(report: Report): string {
  const out: string[] = [];
  out.push(`Railcross check: ${report.design.title}`);
  out.push(`${report.tool}, ${report.generatedAt}`);
  out.push(`${designLine(report)}; ${settingsLine(report)}`);
  out.push(`Power states: ${report.scenarios.map(stateText).join(', ')}`);
  out.push('');
  const s = report.summary;
  out.push(...table(['errors', 'warnings', 'info', 'waived'], [[s.error, s.warning, s.info, s.waived].map(String)], new Set([0, 1, 2, 3])));
  out.push('');
  out.push(verdict(report).line);

  out.push('', `Findings (${report.findings.length})`);
  if (report.findings.length === 0) out.push('  none');
  for (const f of report.findings) out.push(...findingLines(f));

  out.push('', `Rail crossings (${report.crossings.length})`);
  if (report.crossings.length === 0) out.push('  none: no net joins pins of different rails');
  else {
    out.push(
      ...table(
        ['net', 'label', 'rails', 'state', 'worst NMH', 'worst NML', 'worst'],
        report.crossings.map((c) => [c.net, c.label, c.rails.join(', '), c.scenario, marginText(c.marginHigh), marginText(c.marginLow), c.worst]),
        new Set([4, 5]),
      ),
    );
  }

  if (report.interfacePower.length > 0) {
    out.push('', 'Extra supply current of inputs held high below their supply (interface-power)');
    out.push(
      ...table(
        ['state', 'rail', 'current', 'inputs'],
        report.interfacePower.map((r) => [r.scenario, r.rail, formatQuantity(r.current, 'A'), r.pins.join(', ')]),
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
