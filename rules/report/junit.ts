/**
 * The report as JUnit XML, the test-result format most CI systems display: a test suite per
 * power state, a test case per net in it (and one for findings on no net), and a failure for
 * each case holding an unwaived finding at the fail-on level (beyond the baseline, when one is
 * given). Other findings of the case are listed in its system-out, so nothing is hidden.
 */
import { inBaseline, reaches, type Baseline } from './baseline.ts';
import type { Report, ReportFinding } from './reportSchema.ts';

export interface JunitOptions {
  /** Findings the baseline holds do not fail their case. */
  readonly baseline?: Baseline;
  /** The design's net ids in the file's order: each is a case even when nothing was found on it. */
  readonly nets?: readonly string[];
}

/**
 * Text for XML 1.0 content or a double-quoted attribute: the five markup characters escaped,
 * characters XML 1.0 cannot carry at all (C0 controls but tab and line breaks, lone
 * surrogates, U+FFFE/U+FFFF) replaced by U+FFFD.
 */
export function escapeXml(text: string): string {
  return text
    .replace(
      // biome-ignore lint/suspicious/noControlCharactersInRegex: these are the characters XML 1.0 cannot carry, removed on purpose
      /[\u0000-\u0008\u000B\u000C\u000E-\u001F\uFFFE\uFFFF]|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/g,
      '\uFFFD',
    )
    .replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&apos;' })[c]!);
}

const NO_NET = '(no net)';

function line(f: ReportFinding): string {
  const waived = f.waived === undefined ? '' : ` (waived: ${f.waived})`;
  return `${f.severity.toUpperCase()} ${f.rule} [${f.id}]: ${f.message}${waived}\n  Hint: ${f.hint}`;
}

interface Case {
  name: string;
  findings: ReportFinding[];
}

/** The report as a JUnit XML document, ending with a newline. */
export function renderJunit(report: Report, options: JunitOptions = {}): string {
  const failOn = report.settings.failOn;
  const failing = (f: ReportFinding) =>
    reaches(f, failOn) && (options.baseline === undefined || !inBaseline(f, options.baseline));
  const suites: string[] = [];
  let tests = 0;
  let failures = 0;
  for (const state of report.scenarios) {
    // Every net is a case in every power state, found or not, in the file's order; without the
    // design's list, the nets the report names (crossings and findings) stand in for it.
    const cases = new Map<string, Case>();
    const caseOf = (name: string) => {
      let c = cases.get(name);
      if (c === undefined) cases.set(name, (c = { name, findings: [] }));
      return c;
    };
    for (const net of options.nets ?? []) caseOf(net);
    for (const c of report.crossings) if (c.scenario === state.id) caseOf(c.net);
    for (const f of report.findings) if (f.scenario === state.id) caseOf(f.net ?? NO_NET).findings.push(f);
    const body: string[] = [];
    let suiteFailures = 0;
    for (const c of cases.values()) {
      const fails = c.findings.filter(failing);
      const name = c.name === NO_NET ? 'pins on no net and rails' : `net ${c.name}`;
      const out = [`    <testcase classname="railcross.${escapeXml(state.id)}" name="${escapeXml(name)}">`];
      if (fails.length > 0) {
        suiteFailures++;
        const message =
          fails.length === 1
            ? fails[0]!.message
            : `${fails.length} findings at the fail-on level (${failOn}): ${fails.map((f) => f.rule).join(', ')}`;
        out.push(
          `      <failure message="${escapeXml(message)}" type="${escapeXml(fails[0]!.rule)}">${escapeXml(fails.map(line).join('\n'))}</failure>`,
        );
      }
      const others = c.findings.filter((f) => !fails.includes(f));
      if (others.length > 0) out.push(`      <system-out>${escapeXml(others.map(line).join('\n'))}</system-out>`);
      out.push('    </testcase>');
      body.push(out.join('\n'));
    }
    tests += cases.size;
    failures += suiteFailures;
    const label = `${state.id} (${state.label})`;
    suites.push(
      [
        `  <testsuite name="${escapeXml(label)}" tests="${cases.size}" failures="${suiteFailures}" errors="0" skipped="0" timestamp="${escapeXml(report.generatedAt.replace(/\.\d+Z$/, ''))}">`,
        ...body,
        '  </testsuite>',
      ].join('\n'),
    );
  }
  return [
    '<?xml version="1.0" encoding="UTF-8"?>',
    `<testsuites name="${escapeXml(`railcross check: ${report.design.title}`)}" tests="${tests}" failures="${failures}" errors="0">`,
    ...suites,
    '</testsuites>',
    '',
  ].join('\n');
}
