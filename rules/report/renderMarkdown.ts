/**
 * The report as GitHub-flavoured Markdown, for a review or a pull request. Ids go in code
 * spans; prose is escaped, so that a `|` or a `*` in a title or a note cannot break a table
 * or start emphasis.
 */
import { formatQuantity } from '../levels/units.ts';
import { designLine, marginText, settingsLine, severityText, stateText } from './describe.ts';
import type { Report } from './reportSchema.ts';
import { verdict } from './verdict.ts';

const oneLine = (s: string) => s.replace(/\s*[\r\n]+\s*/g, ' ');

/** Prose in a heading, paragraph or table cell. */
export function escapeMarkdown(s: string): string {
  return oneLine(s)
    .replace(/[\\`*<>[\]|&~#]/g, (c) => `\\${c}`)
    // An underscore inside a word never starts emphasis (GFM): leave `VALVE_EN` readable.
    .replace(/(?<![\p{L}\p{N}])_|_(?![\p{L}\p{N}])/gu, '\\_');
}

/** An id or other literal in a code span; `|` still needs its escape inside a table. */
export function codeSpan(s: string): string {
  const text = oneLine(s).replace(/\|/g, '\\|');
  const longest = Math.max(0, ...(text.match(/`+/g) ?? []).map((run) => run.length));
  const fence = '`'.repeat(longest + 1);
  // A space keeps a backtick at either end apart from the fence; CommonMark strips one each side.
  const pad = text.startsWith('`') || text.endsWith('`') ? ' ' : '';
  return `${fence}${pad}${text}${pad}${fence}`;
}

function table(head: readonly string[], rows: readonly (readonly string[])[], align?: readonly ('l' | 'r')[]): string[] {
  const rule = head.map((_, k) => (align?.[k] === 'r' ? '---:' : '---'));
  const row = (cells: readonly string[]) => `| ${cells.join(' | ')} |`;
  return [row(head), row(rule), ...rows.map(row)];
}

/** The report as Markdown, ending with a newline. */
export function renderMarkdown(report: Report): string {
  const out: string[] = [];
  const v = verdict(report);
  out.push(`# Railcross check: ${escapeMarkdown(report.design.title)}`, '');
  out.push(`${escapeMarkdown(report.tool)}, generated ${escapeMarkdown(report.generatedAt)}. ${escapeMarkdown(designLine(report))}; ${escapeMarkdown(settingsLine(report))}.`, '');
  out.push(`Power states: ${report.scenarios.map((s) => escapeMarkdown(stateText(s))).join(', ')}.`, '');
  const [word, ...rest] = v.line.split(':');
  out.push(`**${word}**:${escapeMarkdown(rest.join(':'))}`, '');
  const s = report.summary;
  out.push(...table(['Errors', 'Warnings', 'Info', 'Waived'], [[s.error, s.warning, s.info, s.waived].map(String)], ['r', 'r', 'r', 'r']), '');

  out.push('## Findings', '');
  if (report.findings.length === 0) out.push('None.');
  else {
    const waived = report.findings.some((f) => f.waived !== undefined);
    out.push(
      ...table(
        ['Severity', 'Rule', 'Net', 'Power state', 'Message', 'Hint', ...(waived ? ['Waiver'] : [])],
        report.findings.map((f) => [
          severityText(f),
          codeSpan(f.rule),
          f.net === null ? '—' : codeSpan(f.net),
          codeSpan(f.scenario),
          escapeMarkdown(f.message),
          escapeMarkdown(f.hint),
          ...(waived ? [f.waived === undefined ? '' : escapeMarkdown(f.waived)] : []),
        ]),
      ),
    );
  }
  out.push('');

  out.push('## Rail crossings', '');
  if (report.crossings.length === 0) out.push('No net joins pins of different rails.');
  else {
    out.push(
      ...table(
        ['Net', 'Label', 'Rails', 'Power state', 'Worst NMH', 'Worst NML', 'Worst'],
        report.crossings.map((c) => [
          codeSpan(c.net),
          escapeMarkdown(c.label),
          c.rails.map(codeSpan).join(', '),
          codeSpan(c.scenario),
          marginText(c.marginHigh),
          marginText(c.marginLow),
          c.worst,
        ]),
        ['l', 'l', 'l', 'l', 'r', 'r', 'l'],
      ),
    );
  }
  out.push('');

  if (report.interfacePower.length > 0) {
    out.push('## Extra supply current of inputs held high below their supply', '');
    out.push(
      ...table(
        ['Power state', 'Rail', 'Current', 'Inputs'],
        report.interfacePower.map((r) => [codeSpan(r.scenario), codeSpan(r.rail), formatQuantity(r.current, 'A'), r.pins.map(codeSpan).join(', ')]),
        ['l', 'l', 'r', 'l'],
      ),
    );
    out.push('');
  }

  out.push('## Profiles used', '');
  if (report.profiles.length === 0) out.push('None.');
  else out.push(...table(['Profile', 'Label', 'Source'], report.profiles.map((p) => [codeSpan(p.id), escapeMarkdown(p.label), escapeMarkdown(p.source)])));
  out.push('');

  out.push('## Cautions', '');
  for (const c of report.cautions) out.push(escapeMarkdown(c), '');
  return `${out.join('\n').trimEnd()}\n`;
}
