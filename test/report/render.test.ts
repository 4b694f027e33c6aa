import { describe, expect, it } from 'vitest';
import { check } from '../../rules/check/check.ts';
import type { Design } from '../../rules/model/schema.ts';
import { buildReport } from '../../rules/report/buildReport.ts';
import { codeSpan, escapeMarkdown, renderMarkdown } from '../../rules/report/renderMarkdown.ts';
import { renderText } from '../../rules/report/renderText.ts';
import type { Report } from '../../rules/report/reportSchema.ts';
import { FIXED_TIME, greenhouse, quantitiesIn } from './fixtures.ts';

const NOTE = 'U1 reads FAULT_N | only after a 10 ms delay';

/** The example with a scenario, a waiver and `|` in the title and a label (which the messages quote). */
function variant(): Design {
  const d = greenhouse();
  return {
    ...d,
    title: 'Greenhouse | rev B',
    scenarios: [{ id: 'valves-off', label: 'Valve supply off', off: ['5v0'] }],
    nets: d.nets.map((n) =>
      n.id === 'VALVE_EN' ? { ...n, label: 'VALVE|EN', waivers: [{ rule: 'level-high' as const, note: NOTE }] } : n,
    ),
  };
}

function reportOf(d: Design, failOn: 'error' | 'warning' = 'error'): Report {
  return buildReport(d, check(d), { failOn, generatedAt: FIXED_TIME });
}

const reports: [string, Report][] = [
  ['the example', reportOf(greenhouse())],
  ['the example with a scenario, a waiver and pipes', reportOf(variant())],
];
// Text with --verbose: every finding is listed (without it, info findings are a count).
const renderers: [string, (r: Report) => string][] = [
  ['text', (r) => renderText(r, { verbose: true })],
  ['Markdown', renderMarkdown],
];

describe.each(renderers)('%s rendering', (kind, render) => {
  const prose = (s: string) => (kind === 'text' ? s : escapeMarkdown(s));
  describe.each(reports)('of %s', (_name, report) => {
    const out = render(report);
    it('is not vacuous: its messages hold quantities in engineering notation', () => {
      expect(report.findings.length).toBeGreaterThan(5);
      expect(report.findings.flatMap((f) => quantitiesIn(f.message)).length).toBeGreaterThan(10);
    });

    it.each(report.findings.map((f) => [f.id, f] as const))(
      'carries %s: rule, net and every number of its message',
      (_id, f) => {
        expect(out).toContain(f.rule);
        if (f.net !== null) expect(out).toContain(f.net);
        expect(out).toContain(prose(f.message));
        for (const q of quantitiesIn(f.message)) expect(out).toContain(q);
      },
    );

    it('carries every profile and its source, and the cautions', () => {
      for (const p of report.profiles) {
        expect(out).toContain(p.id);
        expect(out).toContain(prose(p.source));
      }
      for (const c of report.cautions) expect(out).toContain(prose(c));
      expect(report.cautions.length).toBeGreaterThan(0);
    });

    it('ends with exactly one newline', () => {
      expect(out.endsWith('\n') && !out.endsWith('\n\n')).toBe(true);
    });
  });

  it.each([
    // VALVE_EN: U1's VOH VDD−0.2 at 3.135 V = 2.935 V against 74HC VIH 0.675 × 5.25 + 0.15 =
    // 3.69375 V (the library's JESD7 line): NMH −0.75875 V, printed to three digits.
    ['the VALVE_EN margin in engineering notation', '-0.759 V'],
    ['the verdict', 'FAIL'],
    ['the counts line of the example (4 errors)', '4'],
  ])('shows %s', (_name, text) => {
    expect(render(reports[0]![1])).toContain(text);
  });

  it('shows the waiver note', () => {
    const out = render(reports[1]![1]);
    expect(out).toContain(prose(NOTE));
  });

  it('says PASS when nothing reaches the fail-on level', () => {
    const d: Design = { ...greenhouse(), nets: [] };
    expect(render(reportOf(d))).toMatch(/PASS/);
  });
});

describe('text grouping', () => {
  const report = reports[1]![1];
  const text = renderText(report);
  const lines = text.split('\n');
  const headings = lines.filter((l) => /^(Errors|Warnings|Waived|Info)\b/.test(l));

  it('groups by severity, errors first, waived after warnings, info last as a count', () => {
    const s = report.summary;
    expect(headings).toEqual([
      `Errors (${s.error})`,
      `Warnings (${s.warning})`,
      `Waived (${s.waived})`,
      `Info: ${s.info} findings, not listed (--verbose lists them)`,
    ]);
    expect(s.error > 0 && s.warning > 0 && s.waived > 0 && s.info > 0).toBe(true);
  });

  it('lists no info finding unless verbose, and every other finding once', () => {
    for (const f of report.findings) {
      const shown = text.split(`[${f.scenario}]: ${f.message}`).length - 1;
      expect(shown, f.id).toBe(f.severity === 'info' && f.waived === undefined ? 0 : 1);
    }
  });

  it("says each rule's hint once per group, under the rule's heading", () => {
    const errors = text.slice(text.indexOf('Errors ('), text.indexOf('Warnings ('));
    for (const rule of new Set(
      report.findings.filter((f) => f.severity === 'error' && f.waived === undefined).map((f) => f.rule),
    )) {
      const hints = new Set(
        report.findings
          .filter((f) => f.rule === rule && f.severity === 'error' && f.waived === undefined)
          .map((f) => f.hint),
      );
      for (const hint of hints) expect(errors.split(`Hint: ${hint}`).length - 1, rule).toBe(1);
    }
  });

  it('orders rules within a group by the catalogue (level-high before overvoltage before floating-input)', () => {
    // Within one group: the errors (a rule may also head the warnings or the waived group).
    const errors = lines.slice(
      lines.findIndex((l) => l.startsWith('Errors (')),
      lines.findIndex((l) => l.startsWith('Warnings (')),
    );
    const at = (rule: string) => errors.findIndex((l) => l.startsWith(`  ${rule}: `));
    expect(at('level-low') < 0 || at('level-high') < at('level-low')).toBe(true);
    expect(at('overvoltage')).toBeLessThan(at('floating-input'));
    expect(at('overvoltage')).toBeGreaterThan(0);
  });

  it('--verbose lists the info findings under their rules', () => {
    const verbose = renderText(report, { verbose: true });
    expect(verbose).toContain(`Info (${report.summary.info})`);
    for (const f of report.findings.filter((x) => x.severity === 'info')) expect(verbose).toContain(f.message);
  });

  it("prints the verdict it is given (a baseline's) instead of the report's own", () => {
    const line =
      'PASS: no unwaived finding at the fail-on level (error) beyond the baseline; 3 findings at that level already in the baseline.';
    expect(renderText(report, { verdict: { fails: false, count: 0, line } }).split('\n')).toContain(line);
  });
});

describe('Markdown tables', () => {
  const md = renderMarkdown(reports[1]![1]);
  const rows = md.split('\n').filter((l) => l.startsWith('|'));
  const cells = (line: string) => line.split(/(?<!\\)\|/).length - 2;

  it('keep their column count when a cell holds "|"', () => {
    const tables: number[][] = [];
    let current: number[] = [];
    for (const line of md.split('\n')) {
      if (line.startsWith('|')) current.push(cells(line));
      else if (current.length > 0) {
        tables.push(current);
        current = [];
      }
    }
    expect(tables.length).toBe(5); // summary, findings, crossings, interface power (the example's display input), profiles
    for (const t of tables) expect(new Set(t).size).toBe(1);
    expect(rows.some((r) => r.includes('VALVE\\|EN'))).toBe(true);
  });

  it('escape the title in the heading', () => {
    expect(md.split('\n')[0]).toBe('# Railcross check: Greenhouse \\| rev B');
  });
});

describe('escapeMarkdown and codeSpan', () => {
  it.each([
    ['a pipe', 'a|b', 'a\\|b'],
    ['emphasis stars', '0.7*VDD and 0.3*VDD', '0.7\\*VDD and 0.3\\*VDD'],
    ['an underscore inside a word stays', 'VALVE_EN', 'VALVE_EN'],
    ['underscores at word edges', '_x_', '\\_x\\_'],
    ['HTML', '<b>', '\\<b\\>'],
    ['a link', '[a](b)', '\\[a\\](b)'],
    ['a line break', 'line\n  break', 'line break'],
    ['a backslash', 'a\\b', 'a\\\\b'],
  ])('escapeMarkdown: %s', (_name, input, expected) => {
    expect(escapeMarkdown(input)).toBe(expected);
  });

  it.each([
    ['plain', 'SDA', '`SDA`'],
    ['a pipe', 'A|B', '`A\\|B`'],
    ['a backtick', 'a`b', '``a`b``'],
    ['a leading backtick', '`a', '`` `a ``'],
  ])('codeSpan: %s', (_name, input, expected) => {
    expect(codeSpan(input)).toBe(expected);
  });
});
