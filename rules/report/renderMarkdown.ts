/**
 * The report as GitHub-flavoured Markdown, for a review or a pull request. Ids go in code
 * spans; prose is escaped, so that a `|` or a `*` in a title or a note cannot break a table
 * or start emphasis.
 */
import { formatQuantity } from '../levels/units.ts';
import { netNameIn, railNameIn } from './reportNames.ts';
import { designLine, marginText, settingsLine, severityText, stateText } from './describe.ts';
import type { Report } from './reportSchema.ts';
import { verdict, type Verdict } from './verdict.ts';

const SPACE = /\s/;
const isSpace = (c: string) => SPACE.test(c);
const isBreak = (c: string) => c === '\n' || c === '\r';

/**
 * Every line break, with the white space around it, as one space. A scan rather than the
 * regular expression `\s*[\r\n]+\s*`, which backtracks over every position of a long run of
 * spaces without a break (quadratic: a 200,000-space title took a minute). Each character is
 * looked at a bounded number of times: linear in the text.
 */
export function oneLine(s: string): string {
  if (!s.includes('\n') && !s.includes('\r')) return s;
  const parts: string[] = [];
  let start = 0;
  let i = 0;
  while (i < s.length) {
    if (!isBreak(s[i]!)) {
      i++;
      continue;
    }
    let from = i;
    while (from > start && isSpace(s[from - 1]!)) from--;
    let to = i;
    while (to < s.length && isSpace(s[to]!)) to++;
    parts.push(s.slice(start, from), ' ');
    start = to;
    i = to;
  }
  parts.push(s.slice(start));
  return parts.join('');
}

/** The length of the longest run of backticks (a loop: `Math.max(...runs)` overflows the stack). */
function longestBacktickRun(s: string): number {
  let longest = 0;
  let run = 0;
  for (let i = 0; i < s.length; i++) {
    run = s.charCodeAt(i) === 96 ? run + 1 : 0;
    if (run > longest) longest = run;
  }
  return longest;
}

/** Prose in a heading, paragraph or table cell. */
export function escapeMarkdown(s: string): string {
  return (
    oneLine(s)
      .replace(/[\\`*<>[\]|&~#]/g, (c) => `\\${c}`)
      // An underscore inside a word never starts emphasis (GFM): leave `VALVE_EN` readable.
      .replace(/(?<![\p{L}\p{N}])_|_(?![\p{L}\p{N}])/gu, '\\_')
  );
}

/** An id or other literal in a code span; `|` still needs its escape inside a table. */
export function codeSpan(s: string): string {
  const text = oneLine(s).replace(/\|/g, '\\|');
  const fence = '`'.repeat(longestBacktickRun(text) + 1);
  // A space keeps a backtick at either end apart from the fence; CommonMark strips one each side.
  const pad = text.startsWith('`') || text.endsWith('`') ? ' ' : '';
  return `${fence}${pad}${text}${pad}${fence}`;
}

function table(
  head: readonly string[],
  rows: readonly (readonly string[])[],
  align?: readonly ('l' | 'r')[],
): string[] {
  const rule = head.map((_, k) => (align?.[k] === 'r' ? '---:' : '---'));
  const row = (cells: readonly string[]) => `| ${cells.join(' | ')} |`;
  return [row(head), row(rule), ...rows.map(row)];
}

/** The report as Markdown, ending with a newline. */
export function renderMarkdown(report: Report, options: { readonly verdict?: Verdict } = {}): string {
  const out: string[] = [];
  const v = options.verdict ?? verdict(report);
  out.push(`# Railcross check: ${escapeMarkdown(report.design.title)}`, '');
  out.push(
    `${escapeMarkdown(report.tool)}, generated ${escapeMarkdown(report.generatedAt)}. ${escapeMarkdown(designLine(report))}; ${escapeMarkdown(settingsLine(report))}.`,
    '',
  );
  out.push(`Power states: ${report.scenarios.map((s) => escapeMarkdown(stateText(s, report))).join(', ')}.`, '');
  const [word, ...rest] = v.line.split(':');
  out.push(`**${word}**:${escapeMarkdown(rest.join(':'))}`, '');
  const s = report.summary;
  out.push(
    ...table(
      ['Errors', 'Warnings', 'Info', 'Waived'],
      [[s.error, s.warning, s.info, s.waived].map(String)],
      ['r', 'r', 'r', 'r'],
    ),
    '',
  );

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
          f.net === null ? '—' : escapeMarkdown(netNameIn(report, f.net)),
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
          c.rails.map((r) => escapeMarkdown(railNameIn(report, r))).join(', '),
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
        report.interfacePower.map((r) => [
          codeSpan(r.scenario),
          escapeMarkdown(railNameIn(report, r.rail)),
          formatQuantity(r.current, 'A'),
          r.pins.map(codeSpan).join(', '),
        ]),
        ['l', 'l', 'r', 'l'],
      ),
    );
    out.push('');
  }

  out.push('## Profiles used', '');
  if (report.profiles.length === 0) out.push('None.');
  else
    out.push(
      ...table(
        ['Profile', 'Label', 'Source'],
        report.profiles.map((p) => [codeSpan(p.id), escapeMarkdown(p.label), escapeMarkdown(p.source)]),
      ),
    );
  out.push('');

  out.push('## Cautions', '');
  for (const c of report.cautions) out.push(escapeMarkdown(c), '');
  return `${out.join('\n').trimEnd()}\n`;
}
