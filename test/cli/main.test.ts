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

const FILES = {
  'greenhouse.json': GREENHOUSE_TEXT,
  'quiet.json': JSON.stringify(quiet),
  'invalid.json': invalid,
  'notjson.json': '{"format": "railcross.design",',
  'list.json': '[1, 2]',
};
const EPOCH = { SOURCE_DATE_EPOCH: '1767225600' }; // 2026-01-01T00:00:00Z

async function run(argv: string[], env: Record<string, string | undefined> = EPOCH): Promise<{ code: number; io: FakeIo }> {
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
    ['--fail-on error (the default) ignores warnings', ['check', 'quiet.json', '--min-margin', '0.8'], 0, { out: /PASS/ }],
    ['--fail-on warning flips the exit on those warnings', ['check', 'quiet.json', '--min-margin', '0.8', '--fail-on', 'warning'], 1, { out: /FAIL/ }],
    ['--fail-on=warning, no warnings', ['check', 'quiet.json', '--fail-on=warning'], 0, {}],
    ['--scenario of the design', ['check', 'quiet.json', '--scenario', 'b-off'], 0, { out: /b-off/ }],
    ['--scenario all-on', ['check', 'greenhouse.json', '--scenario=all-on'], 1, {}],
    ['-- before the file name', ['check', '--', 'quiet.json'], 0, {}],
    // formats
    ['--format md', ['check', 'quiet.json', '--format', 'md'], 0, { out: /^# Railcross check: test\n/ }],
    ['--format text', ['check', 'quiet.json', '--format', 'text'], 0, { out: /^Railcross check: test\n/ }],
    ['--format json', ['check', 'quiet.json', '--format', 'json'], 0, { out: /^\{\n {2}"format": "railcross.report",/ }],
    ['--json', ['check', 'quiet.json', '--json'], 0, { out: /^\{\n {2}"format": "railcross.report",/ }],
    ['--json with --format json', ['check', 'quiet.json', '--json', '--format', 'json'], 0, { out: /"railcross.report"/ }],
    // refusals: exit 2, nothing on stdout
    ['an unreadable file', ['check', 'missing.json'], 2, { err: /cannot read missing\.json: ENOENT/, noOut: true }],
    ['an invalid design names the JSON path', ['check', 'invalid.json'], 2, { err: /^nets\[0\]\.pins\[1\]: .*"Z"/m, noOut: true }],
    ['a file that is not JSON', ['check', 'notjson.json'], 2, { err: /^\(root\): Not JSON/m, noOut: true }],
    ['a JSON file that is not a design', ['check', 'list.json'], 2, { err: /^\(root\): .*not a Railcross design/m, noOut: true }],
    ['an unknown scenario', ['check', 'quiet.json', '--scenario', 'pump-off'], 2, { err: /"pump-off" is not a power state.*all-on, b-off/, noOut: true }],
    ['an unknown option', ['check', 'quiet.json', '--colour'], 2, { err: /unknown option --colour/, noOut: true }],
    ['a single-dash option', ['check', 'quiet.json', '-j'], 2, { err: /unknown option -j/, noOut: true }],
    ['an option given twice', ['check', 'quiet.json', '--fail-on', 'error', '--fail-on', 'warning'], 2, { err: /given twice/, noOut: true }],
    ['an option without its value', ['check', 'quiet.json', '--out'], 2, { err: /--out needs a value/, noOut: true }],
    ['a value that is another option', ['check', 'quiet.json', '--out', '--json'], 2, { err: /--out needs a value/, noOut: true }],
    ['a flag with a value', ['check', 'quiet.json', '--json=yes'], 2, { err: /takes no value/, noOut: true }],
    ['--format xml', ['check', 'quiet.json', '--format', 'xml'], 2, { err: /expected text, json or md/, noOut: true }],
    ['--json and --format md', ['check', 'quiet.json', '--json', '--format', 'md'], 2, { err: /contradict/, noOut: true }],
    ['--fail-on info', ['check', 'quiet.json', '--fail-on', 'info'], 2, { err: /expected error or warning/, noOut: true }],
    ['--min-margin not a number', ['check', 'quiet.json', '--min-margin', 'lots'], 2, { err: /--min-margin is "lots"/, noOut: true }],
    ['--min-margin in amperes', ['check', 'quiet.json', '--min-margin', '3 mA'], 2, { err: /found a value in A/, noOut: true }],
    ['--min-margin negative', ['check', 'quiet.json', '--min-margin', '-0.1'], 2, { err: /0 V or more/, noOut: true }],
    ['--min-margin beyond a double', ['check', 'quiet.json', '--min-margin', '1e400'], 2, { err: /too large/, noOut: true }],
    ['--min-margin of 20 kV', ['check', 'quiet.json', '--min-margin', '20 kV'], 2, { err: /at most 10 kV/, noOut: true }],
    ['--paper without --pdf', ['check', 'quiet.json', '--paper', 'letter'], 2, { err: /--paper sets the PDF report's page size: give --pdf PATH/, noOut: true }],
    ['--paper a3', ['check', 'quiet.json', '--pdf', 'r.pdf', '--paper', 'a3'], 2, { err: /--paper is "a3": expected a4 or letter/, noOut: true }],
    ['--pdf without its path', ['check', 'quiet.json', '--pdf'], 2, { err: /--pdf needs a value/, noOut: true }],
    ['no file', ['check'], 2, { err: /needs a design file/, noOut: true }],
    ['two files', ['check', 'quiet.json', 'greenhouse.json'], 2, { err: /one design file, found 2/, noOut: true }],
    ['an unknown command', ['lint', 'quiet.json'], 2, { err: /unknown command "lint"/, noOut: true }],
    ['no command: the usage on stderr', [], 2, { err: USAGE, noOut: true }],
    // help, version, profiles
    ['--help', ['--help'], 0, { out: USAGE, noErr: true }],
    ['help', ['help'], 0, { out: USAGE, noErr: true }],
    ['-h after a command', ['check', '-h'], 0, { out: USAGE, noErr: true }],
    ['--version', ['--version'], 0, { out: `${TOOL_NAME}\n`, noErr: true }],
    ['profiles', ['profiles'], 0, { out: /^ttl: Standard TTL/m, noErr: true }],
    ['profiles --json', ['profiles', '--json'], 0, { out: /^\{\n {2}"tool": "railcross /, noErr: true }],
    ['profiles with an unknown option', ['profiles', '--all'], 2, { err: /unknown option --all for "profiles"/, noOut: true }],
    ['profiles with an argument', ['profiles', 'ttl'], 2, { err: /takes no arguments/, noOut: true }],
  ];

  it.each(cases)('%s', async (_name, argv, code, expected) => {
    const { code: actual, io } = await run(argv);
    expect(actual, io.err).toBe(code);
    const match = (text: string, m: RegExp | string) => (typeof m === 'string' ? expect(text).toBe(m) : expect(text).toMatch(m));
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

  it('without it, the design\'s own setting', async () => {
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

describe('--pdf', () => {
  const PDF_MAGIC = '%PDF-';
  const head = (bytes: Uint8Array | undefined) => (bytes === undefined ? '' : String.fromCharCode(...bytes.subarray(0, 5)));

  it.each<[string, string[], number]>([
    ['a failing design: the PDF is written and the exit is still 1', ['check', 'greenhouse.json', '--pdf', 'r.pdf'], 1],
    ['a passing design: exit 0', ['check', 'quiet.json', '--pdf', 'r.pdf'], 0],
    ['with --paper letter', ['check', 'quiet.json', '--pdf=r.pdf', '--paper=letter'], 0],
    ['with --scenario and --json', ['check', 'greenhouse.json', '--scenario', 'standby', '--json', '--pdf', 'r.pdf'], 1],
    ['with --fail-on warning', ['check', 'quiet.json', '--min-margin', '0.8', '--fail-on', 'warning', '--pdf', 'r.pdf'], 1],
  ])('%s', async (_name, argv, code) => {
    const { code: actual, io } = await run(argv);
    expect(actual, io.err).toBe(code);
    expect(head(io.binaries.get('r.pdf'))).toBe(PDF_MAGIC);
    expect(io.err).toBe('');
    // stdout still carries the report in the asked format
    expect(io.out).toMatch(argv.includes('--json') ? /^\{/ : /^Railcross check: /);
  });

  it('letter and a4 give different page sizes', async () => {
    const a4 = (await run(['check', 'quiet.json', '--pdf', 'r.pdf'])).io.binaries.get('r.pdf')!;
    const letter = (await run(['check', 'quiet.json', '--pdf', 'r.pdf', '--paper', 'letter'])).io.binaries.get('r.pdf')!;
    const box = (b: Uint8Array) => /\/MediaBox \[0 0 ([\d.]+) /.exec(Buffer.from(b).toString('latin1'))?.[1];
    expect(Number(box(a4))).toBeCloseTo(595.28, 1); // ISO 216 A4: 210 mm = 595.28 pt
    expect(Number(box(letter))).toBe(612); // US Letter: 8.5 in = 612 pt
  });

  it('with SOURCE_DATE_EPOCH two runs write the same bytes', async () => {
    const a = (await run(['check', 'greenhouse.json', '--pdf', 'r.pdf'])).io.binaries.get('r.pdf')!;
    const b = (await run(['check', 'greenhouse.json', '--pdf', 'r.pdf'])).io.binaries.get('r.pdf')!;
    expect(Buffer.from(a).equals(Buffer.from(b))).toBe(true);
  });

  it('writes the JSON report too with --out', async () => {
    const { io } = await run(['check', 'greenhouse.json', '--out', 'r.json', '--pdf', 'r.pdf']);
    expect(reportOf(io.files.get('r.json')!).findings.length).toBeGreaterThan(0);
    expect(head(io.binaries.get('r.pdf'))).toBe(PDF_MAGIC);
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
    const bad = JSON.stringify({ ...quiet, rails: [{ id: 'r', label: 'x', nominal: 'five' }], nets: [{ id: 'N', pins: [7] }] });
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
