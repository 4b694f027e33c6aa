import { describe, expect, it } from 'vitest';
import { main } from '../../rules/cli/main.ts';
import { USAGE } from '../../rules/cli/usage.ts';
import type { Design } from '../../rules/model/schema.ts';
import { BUILTIN_PROFILE_IDS, BUILTIN_PROFILES } from '../../rules/profiles/index.ts';
import { ReportSchema, type Report } from '../../rules/report/reportSchema.ts';
import { TOOL_NAME } from '../../rules/report/version.ts';
import { design, input, net, output, part, scenario } from '../support/build.ts';
import { GREENHOUSE_TEXT } from '../report/fixtures.ts';
import { fakeIo, type FakeIo } from './fakeIo.ts';

/*
 * quiet.json: mcu-gpio to mcu-gpio on one 3.3 V ± 5 % rail (common practice: VIH 0.7·VDD,
 * VOH VDD−0.2, VIL 0.3·VDD, VOL 0.2 V). Worst NMH = NML = 0.3 × 3.135 − 0.2 = 0.7405 V:
 * it passes the default 0.2 V, and gives two warnings at a minimum margin of 0.8 V.
 */
const quiet: Design = design({
  parts: [part('A', '3v3', 'mcu-gpio', [output('Y')]), part('B', '3v3', 'mcu-gpio', [input('X')])],
  nets: [net('N', ['A.Y', 'B.X'])],
  scenarios: [scenario('b-off', ['1v8'], 'Sensor supply off')],
});

const invalid = JSON.stringify({ ...quiet, nets: [{ id: 'N', pins: ['A.Y', 'Z.Q'] }] });

/**
 * The example with FLOW's planted pull-range error fixed: the report's suggested 4.7 kΩ pull-up on
 * the net, beside the controller pin's own 40 kΩ (4.21 kΩ together, inside 3.07 kΩ–7.84 kΩ), which
 * also ends FLOW's edge-rate warnings.
 */
const flowFixed = (() => {
  const d = JSON.parse(GREENHOUSE_TEXT) as Design;
  return JSON.stringify({
    ...d,
    nets: d.nets.map((n) => (n.id === 'FLOW' ? { ...n, pull: { to: '3v3', ohms: 4700 } } : n)),
  });
})();

/** quiet.json asking for 0.8 V of margin: its NMH and NML of 0.7405 V each warn (all-on). */
const quietTight = JSON.stringify({ ...quiet, settings: { minMargin: 0.8 } });

/** A saved report of the example (as --out writes it), and one whose summary is not a report's. */
const greenhouseReport = await (async () => {
  const io = fakeIo({ 'g.json': GREENHOUSE_TEXT }, { SOURCE_DATE_EPOCH: '1767225600' });
  await main(['check', 'g.json', '--json'], io);
  return io.out;
})();
const badReport = JSON.stringify({ ...(JSON.parse(greenhouseReport) as object), summary: { error: -1 } });
/** The example's own counts, from its report: the verdict lines must carry them. */
const { summary: G, findings: gFindings } = JSON.parse(greenhouseReport) as Report;

const FILES = {
  'greenhouse.json': GREENHOUSE_TEXT,
  'greenhouse-report.json': greenhouseReport,
  'badreport.json': badReport,
  'flow-fixed.json': flowFixed,
  'quiet.json': JSON.stringify(quiet),
  'quiet-tight.json': quietTight,
  'invalid.json': invalid,
  'notjson.json': '{"format": "railcross.design",',
  'list.json': '[1, 2]',
};
const EPOCH = { SOURCE_DATE_EPOCH: '1767225600' }; // 2026-01-01T00:00:00Z

async function run(
  argv: string[],
  env: Record<string, string | undefined> = EPOCH,
): Promise<{ code: number; io: FakeIo }> {
  const io = fakeIo(FILES, env);
  const code = await main(argv, io);
  return { code, io };
}

const reportOf = (text: string) => ReportSchema.parse(JSON.parse(text)) as Report;

type Expect = { out?: RegExp | string; err?: RegExp | string; noOut?: true; noErr?: true };

describe('exit status and output', () => {
  const cases: [string, string[], number, Expect][] = [
    // check: verdicts
    ['the example fails (errors)', ['check', 'greenhouse.json'], 1, { out: /FAIL/, noErr: true }],
    ['a passing design', ['check', 'quiet.json'], 0, { out: /PASS/, noErr: true }],
    [
      '--fail-on error (the default) ignores warnings',
      ['check', 'quiet.json', '--min-margin', '0.8'],
      0,
      { out: /PASS/ },
    ],
    [
      '--fail-on warning flips the exit on those warnings',
      ['check', 'quiet.json', '--min-margin', '0.8', '--fail-on', 'warning'],
      1,
      { out: /FAIL/ },
    ],
    ['--fail-on=warning, no warnings', ['check', 'quiet.json', '--fail-on=warning'], 0, {}],
    ['--scenario of the design', ['check', 'quiet.json', '--scenario', 'b-off'], 0, { out: /b-off/ }],
    ['--scenario all-on', ['check', 'greenhouse.json', '--scenario=all-on'], 1, {}],
    ['-- before the file name', ['check', '--', 'quiet.json'], 0, {}],
    // formats
    ['--format md', ['check', 'quiet.json', '--format', 'md'], 0, { out: /^# Railcross check: test\n/ }],
    ['--format text', ['check', 'quiet.json', '--format', 'text'], 0, { out: /^Railcross check: test\n/ }],
    [
      '--format json',
      ['check', 'quiet.json', '--format', 'json'],
      0,
      { out: /^\{\n {2}"format": "railcross.report",/ },
    ],
    ['--json', ['check', 'quiet.json', '--json'], 0, { out: /^\{\n {2}"format": "railcross.report",/ }],
    [
      '--json with --format json',
      ['check', 'quiet.json', '--json', '--format', 'json'],
      0,
      { out: /"railcross.report"/ },
    ],
    // refusals: exit 2, nothing on stdout
    ['an unreadable file', ['check', 'missing.json'], 2, { err: /cannot read missing\.json: ENOENT/, noOut: true }],
    [
      'an invalid design names the JSON path',
      ['check', 'invalid.json'],
      2,
      { err: /^nets\[0\]\.pins\[1\]: .*"Z"/m, noOut: true },
    ],
    ['a file that is not JSON', ['check', 'notjson.json'], 2, { err: /^\(root\): Not JSON/m, noOut: true }],
    [
      'a JSON file that is not a design',
      ['check', 'list.json'],
      2,
      { err: /^\(root\): .*not a Railcross design/m, noOut: true },
    ],
    [
      'an unknown scenario',
      ['check', 'quiet.json', '--scenario', 'pump-off'],
      2,
      { err: /"pump-off" is not a power state.*all-on, b-off/, noOut: true },
    ],
    ['an unknown option', ['check', 'quiet.json', '--colour'], 2, { err: /unknown option --colour/, noOut: true }],
    ['a single-dash option', ['check', 'quiet.json', '-j'], 2, { err: /unknown option -j/, noOut: true }],
    [
      'an option given twice',
      ['check', 'quiet.json', '--fail-on', 'error', '--fail-on', 'warning'],
      2,
      { err: /given twice/, noOut: true },
    ],
    ['an option without its value', ['check', 'quiet.json', '--out'], 2, { err: /--out needs a value/, noOut: true }],
    [
      'a value that is another option',
      ['check', 'quiet.json', '--out', '--json'],
      2,
      { err: /--out needs a value/, noOut: true },
    ],
    ['a flag with a value', ['check', 'quiet.json', '--json=yes'], 2, { err: /takes no value/, noOut: true }],
    [
      '--format xml',
      ['check', 'quiet.json', '--format', 'xml'],
      2,
      { err: /expected text, json, md, sarif or junit/, noOut: true },
    ],
    [
      '--format sarif',
      ['check', 'greenhouse.json', '--format', 'sarif'],
      1,
      {
        out: /^\{\n {2}"\$schema": "https:\/\/json\.schemastore\.org\/sarif-2\.1\.0\.json",\n {2}"version": "2\.1\.0"/,
        noErr: true,
      },
    ],
    [
      '--format junit',
      ['check', 'greenhouse.json', '--format', 'junit'],
      1,
      { out: /^<\?xml version="1\.0" encoding="UTF-8"\?>\n<testsuites /, noErr: true },
    ],
    [
      '--format junit, passing',
      ['check', 'quiet.json', '--format=junit'],
      0,
      { out: /<testsuites [^>]*tests="2" failures="0"/, noErr: true },
    ],
    [
      '--quiet: the verdict alone',
      ['check', 'greenhouse.json', '--quiet'],
      1,
      {
        out: new RegExp(`^FAIL: unwaived findings at the fail-on level \\(error\\): ${G.error} errors\\.\\n$`),
        noErr: true,
      },
    ],
    ['--quiet, passing', ['check', 'quiet.json', '--quiet'], 0, { out: /^PASS: [^\n]*\n$/, noErr: true }],
    [
      '--verbose lists info findings',
      ['check', 'greenhouse.json', '--verbose'],
      1,
      { out: new RegExp(`^Info \\(${G.info}\\)\\n {2}clamp-current: `, 'm'), noErr: true },
    ],
    [
      'without --verbose, info is a count',
      ['check', 'greenhouse.json'],
      1,
      { out: new RegExp(`^Info: ${G.info} findings, not listed \\(--verbose lists them\\)$`, 'm'), noErr: true },
    ],
    [
      '--quiet with --verbose',
      ['check', 'quiet.json', '--quiet', '--verbose'],
      2,
      { err: /--quiet and --verbose contradict/, noOut: true },
    ],
    [
      '--quiet with --format json',
      ['check', 'quiet.json', '--quiet', '--json'],
      2,
      { err: /--quiet shapes the text report: it cannot go with --format json/, noOut: true },
    ],
    [
      '--verbose with --format md',
      ['check', 'quiet.json', '--verbose', '--format', 'md'],
      2,
      { err: /--verbose shapes the text report/, noOut: true },
    ],
    [
      '--baseline of itself: passes despite the errors',
      ['check', 'greenhouse.json', '--baseline', 'greenhouse.json'],
      0,
      {
        out: new RegExp(
          `^PASS: no unwaived finding at the fail-on level \\(error\\) beyond the baseline; ${G.error} findings`,
          'm',
        ),
        noErr: true,
      },
    ],
    [
      '--baseline, a saved report',
      ['check', 'greenhouse.json', '--baseline', 'greenhouse-report.json', '--quiet'],
      0,
      { out: /^PASS: .*beyond the baseline/ },
    ],
    [
      "--baseline of a passing design: the example's errors are new",
      ['check', 'greenhouse.json', '--baseline', 'quiet.json', '--quiet'],
      1,
      { out: new RegExp(`^FAIL: .* not in the baseline: ${G.error} errors; 0 findings`) },
    ],
    [
      "--baseline with --format md: the baseline's verdict",
      ['check', 'greenhouse.json', '--baseline', 'greenhouse.json', '--format', 'md'],
      0,
      { out: /^\*\*PASS\*\*: no unwaived finding at the fail-on level \(error\) beyond the baseline/m, noErr: true },
    ],
    [
      '--baseline with --format sarif: every result unchanged',
      ['check', 'greenhouse.json', '--baseline', 'greenhouse.json', '--format', 'sarif'],
      0,
      { out: /"baselineState": "unchanged"/, noErr: true },
    ],
    [
      '--baseline with --format junit: no failure',
      ['check', 'greenhouse.json', '--baseline', 'greenhouse.json', '--format', 'junit'],
      0,
      { out: /<testsuites [^>]* failures="0"/, noErr: true },
    ],
    [
      '--baseline that cannot be read',
      ['check', 'quiet.json', '--baseline', 'nope.json'],
      2,
      { err: /cannot read nope\.json/, noOut: true },
    ],
    [
      '--baseline, a report that is not valid',
      ['check', 'quiet.json', '--baseline', 'badreport.json'],
      2,
      {
        err: /^railcross: badreport\.json is not a valid report \(4 problems\):\nsummary\.error: Too small/,
        noOut: true,
      },
    ],
    [
      '--baseline, not JSON',
      ['check', 'quiet.json', '--baseline', 'notjson.json'],
      2,
      { err: /notjson\.json is not a valid design/, noOut: true },
    ],
    // diff
    [
      'diff of a design with itself',
      ['diff', 'greenhouse.json', 'greenhouse.json'],
      0,
      {
        out: new RegExp(`^0 new, 0 gone, 0 changed, ${gFindings.length} unchanged; none fails where it did not`, 'm'),
        noErr: true,
      },
    ],
    // FLOW's pull-range finding drops from error to info in each of the 3 power states, its 3 edge-rate warnings go
    [
      'diff: the FLOW pull-up fixed',
      ['diff', 'greenhouse.json', 'flow-fixed.json'],
      0,
      { out: /^0 new, 3 gone, 3 changed,/m, noErr: true },
    ],
    [
      'diff: the FLOW pull-up broken again',
      ['diff', 'flow-fixed.json', 'greenhouse.json'],
      1,
      { out: /^3 new, 0 gone, 3 changed, .*; 3 findings now fail at the fail-on level \(error\)/m, noErr: true },
    ],
    [
      'diff: a saved report against a design',
      ['diff', 'greenhouse-report.json', 'flow-fixed.json', '--format', 'md'],
      0,
      { out: /^## Railcross diff: /, noErr: true },
    ],
    [
      'diff --json',
      ['diff', 'greenhouse.json', 'flow-fixed.json', '--json'],
      0,
      { out: /^\{\n {2}"format": "railcross.diff",/, noErr: true },
    ],
    [
      'diff --fail-on warning',
      ['diff', 'quiet.json', 'quiet-tight.json', '--fail-on', 'warning'],
      1,
      { out: /^4 new, .*; 4 findings now fail/m },
    ],
    [
      'diff --fail-on error: warnings pass',
      ['diff', 'quiet.json', 'quiet-tight.json'],
      0,
      { out: /^4 new, .*; none fails/m },
    ],
    ['diff with one file', ['diff', 'quiet.json'], 2, { err: /diff compares two files, found 1/, noOut: true }],
    [
      'diff --format sarif',
      ['diff', 'quiet.json', 'quiet.json', '--format', 'sarif'],
      2,
      { err: /expected text, json or md/, noOut: true },
    ],
    [
      'diff with an invalid design',
      ['diff', 'quiet.json', 'invalid.json'],
      2,
      { err: /invalid\.json is not a valid design/, noOut: true },
    ],
    [
      'diff with an unknown option',
      ['diff', 'quiet.json', 'quiet.json', '--quiet'],
      2,
      { err: /unknown option --quiet for "diff"/, noOut: true },
    ],
    [
      '--json and --format md',
      ['check', 'quiet.json', '--json', '--format', 'md'],
      2,
      { err: /contradict/, noOut: true },
    ],
    [
      '--fail-on info',
      ['check', 'quiet.json', '--fail-on', 'info'],
      2,
      { err: /expected error or warning/, noOut: true },
    ],
    [
      '--min-margin not a number',
      ['check', 'quiet.json', '--min-margin', 'lots'],
      2,
      { err: /--min-margin is "lots"/, noOut: true },
    ],
    [
      '--min-margin in amperes',
      ['check', 'quiet.json', '--min-margin', '3 mA'],
      2,
      { err: /found a value in A/, noOut: true },
    ],
    ['--min-margin negative', ['check', 'quiet.json', '--min-margin', '-0.1'], 2, { err: /0 V or more/, noOut: true }],
    [
      '--min-margin beyond a double',
      ['check', 'quiet.json', '--min-margin', '1e400'],
      2,
      { err: /too large/, noOut: true },
    ],
    [
      '--min-margin of 20 kV',
      ['check', 'quiet.json', '--min-margin', '20 kV'],
      2,
      { err: /at most 10 kV/, noOut: true },
    ],
    [
      '--paper without --pdf',
      ['check', 'quiet.json', '--paper', 'letter'],
      2,
      { err: /--paper sets the PDF report's page size: give --pdf PATH/, noOut: true },
    ],
    [
      '--paper a3',
      ['check', 'quiet.json', '--pdf', 'r.pdf', '--paper', 'a3'],
      2,
      { err: /--paper is "a3": expected a4 or letter/, noOut: true },
    ],
    ['--pdf without its path', ['check', 'quiet.json', '--pdf'], 2, { err: /--pdf needs a value/, noOut: true }],
    ['no file', ['check'], 2, { err: /needs a design file/, noOut: true }],
    ['two files', ['check', 'quiet.json', 'greenhouse.json'], 2, { err: /one design file, found 2/, noOut: true }],
    [
      'an unknown command',
      ['lint', 'quiet.json'],
      2,
      { err: /unknown command "lint": expected check, diff or profiles/, noOut: true },
    ],
    ['no command: the usage on stderr', [], 2, { err: USAGE, noOut: true }],
    // help, version, profiles
    ['--help', ['--help'], 0, { out: USAGE, noErr: true }],
    ['help', ['help'], 0, { out: USAGE, noErr: true }],
    ['-h after a command', ['check', '-h'], 0, { out: USAGE, noErr: true }],
    ['--version', ['--version'], 0, { out: `${TOOL_NAME}\n`, noErr: true }],
    ['profiles', ['profiles'], 0, { out: /^ttl: Standard TTL/m, noErr: true }],
    ['profiles --json', ['profiles', '--json'], 0, { out: /^\{\n {2}"tool": "railcross /, noErr: true }],
    [
      'profiles with an unknown option',
      ['profiles', '--all'],
      2,
      { err: /unknown option --all for "profiles"/, noOut: true },
    ],
    ['profiles with an argument', ['profiles', 'ttl'], 2, { err: /takes no arguments/, noOut: true }],
  ];

  it.each(cases)('%s', async (_name, argv, code, expected) => {
    const { code: actual, io } = await run(argv);
    expect(actual, io.err).toBe(code);
    const match = (text: string, m: RegExp | string) =>
      typeof m === 'string' ? expect(text).toBe(m) : expect(text).toMatch(m);
    if (expected.out !== undefined) match(io.out, expected.out);
    if (expected.err !== undefined) match(io.err, expected.err);
    if (expected.noOut) expect(io.out).toBe('');
    if (expected.noErr) expect(io.err).toBe('');
  });
});

describe('--min-margin', () => {
  it.each([['0.3'], ['300m'], ['300 mV'], ['0.3 V'], ['300mV']])('accepts %s as 0.3 V and records it', async (text) => {
    const { io } = await run(['check', 'quiet.json', '--json', '--min-margin', text]);
    expect(reportOf(io.out).settings.minMargin).toBeCloseTo(0.3, 12);
  });

  it.each([
    ['0.7', 0], // 0.7405 V ≥ 0.7 V: no warning
    ['0.75', 2], // 0.7405 V < 0.75 V: NMH and NML both warn
  ])('at %s V the quiet design has %i warnings', async (text, warnings) => {
    const { io } = await run(['check', 'quiet.json', '--json', '--scenario', 'all-on', '--min-margin', text]);
    expect(reportOf(io.out).summary.warning).toBe(warnings);
  });

  it("without it, the design's own setting", async () => {
    const { io } = await run(['check', 'greenhouse.json', '--json']);
    expect(reportOf(io.out).settings.minMargin).toBe(0.2); // the example's settings.minMargin
  });
});

describe('--out', () => {
  it.each([['text'], ['md'], ['json']])('writes the JSON report while stdout gets %s', async (format) => {
    const { code, io } = await run(['check', 'greenhouse.json', '--format', format, '--out', 'report.json']);
    expect(code).toBe(1);
    const written = io.files.get('report.json')!;
    expect(reportOf(written).findings.length).toBeGreaterThan(0);
    if (format === 'json') expect(io.out).toBe(written);
    else expect(io.out.startsWith('{')).toBe(false);
    expect(io.err).toBe(
      `railcross: wrote the JSON report to report.json (${Number((Buffer.byteLength(written) / 1000).toPrecision(3))} kB)\n`,
    );
  });

  it('a file that cannot be written: exit 2', async () => {
    const io = fakeIo(FILES, EPOCH);
    io.readOnly.add('ro/report.json');
    expect(await main(['check', 'quiet.json', '--out', 'ro/report.json'], io)).toBe(2);
    expect(io.err).toMatch(/cannot write ro\/report\.json: EACCES/);
  });

  it('nothing is written when the design is invalid', async () => {
    const { io } = await run(['check', 'invalid.json', '--out', 'report.json']);
    expect(io.files.has('report.json')).toBe(false);
  });
});

// Each PDF is a few hundred milliseconds of CPU on an idle machine; on a loaded one many times
// that, so the block has a generous timeout, and uses the small quiet.json design (2 pages of
// tables) wherever the example's 10 pages add nothing to what a case checks.
describe('--pdf', { timeout: 120_000 }, () => {
  const PDF_MAGIC = '%PDF-';
  const head = (bytes: Uint8Array | undefined) =>
    bytes === undefined ? '' : String.fromCharCode(...bytes.subarray(0, 5));
  const WROTE = /^railcross: wrote the PDF report to r\.pdf \(\d+(\.\d+)? kB\)\n$/;

  it.each<[string, string[], number]>([
    [
      'a failing design: the PDF is written and the exit is still 1',
      ['check', 'quiet-tight.json', '--fail-on', 'warning', '--pdf', 'r.pdf'],
      1,
    ],
    ['a passing design: exit 0', ['check', 'quiet.json', '--pdf', 'r.pdf'], 0],
    ['with --paper letter', ['check', 'quiet.json', '--pdf=r.pdf', '--paper=letter'], 0],
    ['with --scenario and --json', ['check', 'quiet.json', '--scenario', 'b-off', '--json', '--pdf', 'r.pdf'], 0],
    [
      'with --fail-on warning',
      ['check', 'quiet.json', '--min-margin', '0.8', '--fail-on', 'warning', '--pdf', 'r.pdf'],
      1,
    ],
  ])('%s', async (_name, argv, code) => {
    const { code: actual, io } = await run(argv);
    expect(actual, io.err).toBe(code);
    expect(head(io.binaries.get('r.pdf'))).toBe(PDF_MAGIC);
    // stdout carries the report in the asked format, so the note on what was written goes to stderr
    expect(io.err).toMatch(WROTE);
    expect(io.out).toMatch(argv.includes('--json') ? /^\{/ : /^Railcross check: /);
  });

  it('the example (10 pages): written, and the exit follows its errors', async () => {
    const { code, io } = await run(['check', 'greenhouse.json', '--pdf', 'r.pdf', '--quiet']);
    expect(code).toBe(1);
    expect(head(io.binaries.get('r.pdf'))).toBe(PDF_MAGIC);
    // --quiet: stdout carries the verdict alone, and the note joins it there
    expect(io.out).toMatch(/^FAIL: [^\n]*\nrailcross: wrote the PDF report to r\.pdf \(\d+(\.\d+)? kB\)\n$/);
    expect(io.err).toBe('');
  });

  it('letter and a4 give different page sizes', async () => {
    const a4 = (await run(['check', 'quiet.json', '--pdf', 'r.pdf'])).io.binaries.get('r.pdf')!;
    const letter = (await run(['check', 'quiet.json', '--pdf', 'r.pdf', '--paper', 'letter'])).io.binaries.get(
      'r.pdf',
    )!;
    const box = (b: Uint8Array) => /\/MediaBox \[0 0 ([\d.]+) /.exec(Buffer.from(b).toString('latin1'))?.[1];
    expect(Number(box(a4))).toBeCloseTo(595.28, 1); // ISO 216 A4: 210 mm = 595.28 pt
    expect(Number(box(letter))).toBe(612); // US Letter: 8.5 in = 612 pt
  });

  it('with SOURCE_DATE_EPOCH two runs write the same bytes', async () => {
    const a = (await run(['check', 'quiet-tight.json', '--pdf', 'r.pdf'])).io.binaries.get('r.pdf')!;
    const b = (await run(['check', 'quiet-tight.json', '--pdf', 'r.pdf'])).io.binaries.get('r.pdf')!;
    expect(Buffer.from(a).equals(Buffer.from(b))).toBe(true);
  });

  it('writes the JSON report too with --out, and says so for both', async () => {
    const { io } = await run(['check', 'quiet-tight.json', '--out', 'r.json', '--pdf', 'r.pdf']);
    expect(reportOf(io.files.get('r.json')!).findings.length).toBeGreaterThan(0);
    expect(head(io.binaries.get('r.pdf'))).toBe(PDF_MAGIC);
    expect(io.err).toMatch(
      /^railcross: wrote the JSON report to r\.json \(\d+(\.\d+)? kB\)\nrailcross: wrote the PDF report to r\.pdf /,
    );
  });

  it('a PDF that cannot be written: exit 2', async () => {
    const io = fakeIo(FILES, EPOCH);
    io.readOnly.add('ro/r.pdf');
    expect(await main(['check', 'quiet.json', '--pdf', 'ro/r.pdf'], io)).toBe(2);
    expect(io.err).toMatch(/cannot write ro\/r\.pdf: EACCES/);
  });

  it('fonts that cannot be read: exit 2, naming the package', async () => {
    const io = fakeIo(FILES, EPOCH);
    io.loadPdfFonts = () => {
      throw new Error("Cannot find module 'dejavu-fonts-ttf/ttf/DejaVuSans.ttf'");
    };
    expect(await main(['check', 'quiet.json', '--pdf', 'r.pdf'], io)).toBe(2);
    expect(io.err).toMatch(/cannot read the PDF report's fonts \(the dejavu-fonts-ttf package\): Cannot find module/);
    expect(io.binaries.has('r.pdf')).toBe(false);
  });

  it('nothing is written when the design is invalid', async () => {
    const { code, io } = await run(['check', 'invalid.json', '--pdf', 'r.pdf']);
    expect(code).toBe(2);
    expect(io.binaries.has('r.pdf')).toBe(false);
  });
});

describe('reports', () => {
  it('--json prints the report and a newline, and it validates', async () => {
    const { io } = await run(['check', 'greenhouse.json', '--json']);
    const report = reportOf(io.out);
    expect(io.out).toBe(`${JSON.stringify(report, null, 2)}\n`);
    expect(report.tool).toBe(TOOL_NAME);
  });

  it.each([['json'], ['md'], ['text']])('with SOURCE_DATE_EPOCH, two runs are byte-identical (%s)', async (format) => {
    const a = await run(['check', 'greenhouse.json', '--format', format]);
    const b = await run(['check', 'greenhouse.json', '--format', format]);
    expect(a.io.out).toBe(b.io.out);
    expect(a.io.out).toContain('2026-01-01T00:00:00.000Z');
  });

  it('without SOURCE_DATE_EPOCH, the time of the run', async () => {
    const before = Date.now();
    const { io } = await run(['check', 'quiet.json', '--json'], {});
    const t = Date.parse(reportOf(io.out).generatedAt);
    expect(t >= before - 1000 && t <= Date.now() + 1000).toBe(true);
  });

  it.each([['soon'], ['1.5'], ['-1']])('a malformed SOURCE_DATE_EPOCH (%s): exit 2', async (epoch) => {
    const { code, io } = await run(['check', 'quiet.json'], { SOURCE_DATE_EPOCH: epoch });
    expect(code).toBe(2);
    expect(io.err).toMatch(/SOURCE_DATE_EPOCH/);
  });

  it('--scenario reports that power state alone', async () => {
    const { io } = await run(['check', 'quiet.json', '--json', '--scenario', 'b-off']);
    const report = reportOf(io.out);
    expect(report.scenarios.map((s) => s.id)).toEqual(['b-off']);
    expect(report.findings.every((f) => f.scenario === 'b-off')).toBe(true);
  });

  it('an invalid design lists every problem on its own line', async () => {
    const bad = JSON.stringify({
      ...quiet,
      rails: [{ id: 'r', label: 'x', nominal: 'five' }],
      nets: [{ id: 'N', pins: [7] }],
    });
    const io = fakeIo({ 'bad.json': bad }, EPOCH);
    expect(await main(['check', 'bad.json'], io)).toBe(2);
    const lines = io.err.trimEnd().split('\n');
    expect(lines[0]).toMatch(/^railcross: bad\.json is not a valid design \(\d+ problems\):$/);
    expect(lines).toContainEqual(expect.stringMatching(/^rails\[0\]\.nominal: /));
    expect(lines).toContainEqual(expect.stringMatching(/^nets\[0\]\.pins\[0\]: /));
  });
});

describe('profiles', () => {
  it('lists every built-in profile with its source', async () => {
    const { io } = await run(['profiles']);
    for (const p of BUILTIN_PROFILES) {
      expect(io.out).toContain(`${p.id}: ${p.label}`);
      expect(io.out).toContain(p.source);
    }
  });

  it('shows parameters in engineering notation (standard TTL: VOL 0.4 V at 16 mA, handbook)', async () => {
    const { io } = await run(['profiles']);
    const ttl = io.out.slice(io.out.indexOf('ttl: '), io.out.indexOf('74ls: '));
    expect(ttl).toMatch(/VOL\s+0\.4 V at 16 mA/);
    expect(ttl).toMatch(/IIL\s+1\.6 mA/);
  });

  it('--json gives the library as design-local profiles would be written', async () => {
    const { io } = await run(['profiles', '--json']);
    const parsed = JSON.parse(io.out) as { tool: string; profiles: { id: string; source: string; params: object }[] };
    expect(parsed.tool).toBe(TOOL_NAME);
    expect(parsed.profiles.map((p) => p.id)).toEqual([...BUILTIN_PROFILE_IDS]);
    expect(parsed.profiles).toEqual(JSON.parse(JSON.stringify(BUILTIN_PROFILES)));
  });
});
