/**
 * The command line, callable in-process: `main(argv, io)` returns the exit status, and every
 * effect goes through `io`, so that tests need no child process. rules/cli/node.ts supplies
 * the real io; rules/cli/bin.ts is the entry of the built `bin` (dist-cli/railcross.mjs).
 */
import { readDesign } from '../model/reader.ts';
import { MAX_VOLTS } from '../model/limits.ts';
import type { Design } from '../model/schema.ts';
import { check } from '../check/check.ts';
import { ALL_ON } from '../engine/powerStates.ts';
import { parseQuantity } from '../levels/units.ts';
import { BUILTIN_PROFILES } from '../profiles/index.ts';
import { buildReport } from '../report/buildReport.ts';
import { describeProfile } from '../report/describeProfile.ts';
import { baselineOf, baselineVerdict, inBaseline, type Baseline } from '../report/baseline.ts';
import { diffReports, renderDiffJson, renderDiffMarkdown, renderDiffText } from '../report/diff.ts';
import { renderJunit } from '../report/junit.ts';
import { renderMarkdown } from '../report/renderMarkdown.ts';
import { renderText } from '../report/renderText.ts';
import { REPORT_FORMAT_ID, ReportSchema, type FailOn, type Report } from '../report/reportSchema.ts';
import { renderSarif } from '../report/sarif.ts';
import type { PdfFonts } from '../report/pdf/fonts.ts';
import type { Paper } from '../report/pdf/theme.ts';
import { plural, verdict, type Verdict } from '../report/verdict.ts';
import { TOOL_NAME } from '../report/version.ts';
import { parseArgs } from './args.ts';
import { USAGE } from './usage.ts';

/** Everything the command line touches outside itself. */
export interface CliIo {
  /** Writes text to standard output as given (the caller ends lines). */
  stdout(text: string): void;
  stderr(text: string): void;
  /** Reads a UTF-8 file; throws when it cannot. */
  readFile(path: string): string;
  /** Writes a file, text as UTF-8; throws when it cannot. */
  writeFile(path: string, data: string | Uint8Array): void;
  /** The TrueType fonts the PDF report embeds; throws when they cannot be read. */
  loadPdfFonts(): PdfFonts;
  env: Record<string, string | undefined>;
}

/** Exit statuses (report-format.md, "Command line"). */
export const EXIT_PASS = 0;
export const EXIT_FAIL = 1;
export const EXIT_UNCHECKED = 2;

const FORMATS = ['text', 'json', 'md', 'sarif', 'junit'] as const;
type Format = (typeof FORMATS)[number];
const DIFF_FORMATS = ['text', 'json', 'md'] as const;
type DiffFormat = (typeof DIFF_FORMATS)[number];

/** A refusal: the message goes to stderr and the status is 2. */
class Refusal {
  constructor(readonly lines: readonly string[]) {}
}

const refuse = (message: string, ...more: string[]) => new Refusal([`railcross: ${message}`, ...more]);
const SEE_HELP = 'Run "railcross --help" for the usage.';

/** `SOURCE_DATE_EPOCH` (whole seconds since 1970, reproducible-builds.org) or now. */
function generatedAt(env: CliIo['env']): string | Refusal {
  const epoch = env.SOURCE_DATE_EPOCH;
  if (epoch === undefined || epoch === '') return new Date().toISOString();
  const time = /^\d{1,15}$/.test(epoch) ? new Date(Number(epoch) * 1000) : undefined;
  if (time === undefined || Number.isNaN(time.getTime())) {
    return refuse(`SOURCE_DATE_EPOCH is "${epoch}": expected whole seconds since 1970-01-01 (e.g. 1767225600)`);
  }
  return time.toISOString();
}

function reportJson(report: Report): string {
  return `${JSON.stringify(report, null, 2)}\n`;
}

interface CheckOptions {
  file: string;
  format: Format;
  quiet: boolean;
  verbose: boolean;
  baseline: string | undefined;
  out: string | undefined;
  pdf: string | undefined;
  paper: Paper;
  scenario: string | undefined;
  minMargin: number | undefined;
  failOn: FailOn;
}

function checkOptions(args: readonly string[]): CheckOptions | Refusal {
  const parsed = parseArgs(
    args,
    {
      json: 'flag',
      format: 'value',
      out: 'value',
      pdf: 'value',
      paper: 'value',
      scenario: 'value',
      'min-margin': 'value',
      'fail-on': 'value',
      baseline: 'value',
      quiet: 'flag',
      verbose: 'flag',
    },
    'check',
  );
  if (!parsed.ok) return refuse(parsed.error, SEE_HELP);
  const { positional, options } = parsed;
  const value = (name: string) => options.get(name) as string | undefined;
  if (positional.length === 0) return refuse('check needs a design file: railcross check FILE', SEE_HELP);
  if (positional.length > 1)
    return refuse(`check takes one design file, found ${positional.length}: ${positional.join(', ')}`, SEE_HELP);

  const format = value('format') ?? (options.has('json') ? 'json' : 'text');
  if (!isOneOf(format, FORMATS)) return refuse(`--format is "${format}": expected text, json, md, sarif or junit`);
  if (options.has('json') && format !== 'json')
    return refuse(`--json and --format ${format} contradict each other: give one`);
  const quiet = options.has('quiet');
  const verbose = options.has('verbose');
  if (quiet && verbose) return refuse('--quiet and --verbose contradict each other: give one');
  if ((quiet || verbose) && format !== 'text')
    return refuse(`--${quiet ? 'quiet' : 'verbose'} shapes the text report: it cannot go with --format ${format}`);

  const failOn = value('fail-on') ?? 'error';
  if (failOn !== 'error' && failOn !== 'warning') return refuse(`--fail-on is "${failOn}": expected error or warning`);

  let minMargin: number | undefined;
  const margin = value('min-margin');
  if (margin !== undefined) {
    const q = parseQuantity(margin, 'V');
    if (!q.ok) return refuse(`--min-margin is "${margin}": ${q.error} (e.g. 0.3, 300m or "300 mV")`);
    if (q.value < 0) return refuse(`--min-margin is "${margin}": expected a margin of 0 V or more`);
    if (!(q.value <= MAX_VOLTS))
      return refuse(`--min-margin is "${margin}": expected a margin of at most ${MAX_VOLTS / 1000} kV`);
    minMargin = q.value;
  }

  const paper = value('paper') ?? 'a4';
  if (paper !== 'a4' && paper !== 'letter') return refuse(`--paper is "${paper}": expected a4 or letter`);
  if (options.has('paper') && !options.has('pdf'))
    return refuse("--paper sets the PDF report's page size: give --pdf PATH as well");

  return {
    file: positional[0]!,
    format,
    quiet,
    verbose,
    baseline: value('baseline'),
    out: value('out'),
    pdf: value('pdf'),
    paper,
    scenario: value('scenario'),
    minMargin,
    failOn,
  };
}

function isOneOf<T extends string>(value: string, list: readonly T[]): value is T {
  return (list as readonly string[]).includes(value);
}

function readText(file: string, io: CliIo): string | Refusal {
  try {
    return io.readFile(file);
  } catch (error) {
    return refuse(`cannot read ${file}: ${error instanceof Error ? error.message : String(error)}`);
  }
}

function loadDesign(file: string, io: CliIo, given?: string): Design | Refusal {
  const text = given ?? readText(file, io);
  if (text instanceof Refusal) return text;
  const read = readDesign(text);
  if (!read.ok) {
    const n = read.errors.length;
    return new Refusal([
      `railcross: ${file} is not a valid design (${n} problem${n === 1 ? '' : 's'}):`,
      ...read.errors.map((e) => `${e.path}: ${e.message}`),
    ]);
  }
  return read.design;
}

/** What a report is built with besides the design: the CLI's options that shape it. */
interface ReportSettings {
  failOn: FailOn;
  generatedAt: string;
  scenario?: string | undefined;
  minMargin?: number | undefined;
}

/** Checks a design as `check` does, with a power state and a minimum margin when asked. */
function reportFor(
  design: Design,
  file: string,
  settings: ReportSettings,
  timing?: Timing,
): { design: Design; result: ReturnType<typeof check>; report: Report } | Refusal {
  const states = [ALL_ON, ...(design.scenarios ?? []).map((s) => s.id)];
  if (settings.scenario !== undefined && !states.includes(settings.scenario)) {
    return refuse(
      `--scenario "${settings.scenario}" is not a power state of ${file}: expected one of ${states.join(', ')}`,
    );
  }
  const checked =
    settings.minMargin === undefined
      ? design
      : { ...design, settings: { ...design.settings, minMargin: settings.minMargin } };
  const result = check(checked);
  timing?.mark('check');
  const report = buildReport(checked, result, {
    failOn: settings.failOn,
    generatedAt: settings.generatedAt,
    ...(settings.scenario === undefined ? {} : { scenario: settings.scenario }),
  });
  timing?.mark('report');
  return { design: checked, result, report };
}

/**
 * A report from a file that holds either a report (`railcross.report`, as `--out` writes it),
 * taken as it is, or a design, checked here with `settings`.
 */
function loadReport(file: string, io: CliIo, settings: ReportSettings): Report | Refusal {
  const text = readText(file, io);
  if (text instanceof Refusal) return text;
  let doc: unknown;
  try {
    doc = JSON.parse(text);
  } catch {
    doc = undefined; // the design reader says where the JSON breaks
  }
  if (typeof doc === 'object' && doc !== null && (doc as { format?: unknown }).format === REPORT_FORMAT_ID) {
    const parsed = ReportSchema.safeParse(doc);
    if (parsed.success) return parsed.data;
    const problems = parsed.error.issues.map(
      (i) => `${i.path.length === 0 ? '(root)' : i.path.join('.')}: ${i.message}`,
    );
    return new Refusal([
      `railcross: ${file} is not a valid report (${plural(problems.length, 'problem')}):`,
      ...problems.slice(0, 20),
    ]);
  }
  const design = loadDesign(file, io, text);
  if (design instanceof Refusal) return design;
  const built = reportFor(design, file, settings);
  return built instanceof Refusal ? built : built.report;
}

/**
 * With `RAILCROSS_TIMING=1`, the command says on stderr how long each stage took (ms since the
 * previous mark), so that a benchmark can see each stage as a cold process pays it.
 */
class Timing {
  private last = performance.now();
  private readonly stages: string[] = [];
  constructor(private readonly on: boolean) {}
  mark(stage: string): void {
    if (!this.on) return;
    const now = performance.now();
    this.stages.push(`${stage}=${(now - this.last).toFixed(1)}`);
    this.last = now;
  }
  flush(io: CliIo): void {
    if (this.on) io.stderr(`railcross: timing ms ${this.stages.join(' ')}\n`);
  }
}

/** Writes `data` to `path`, or the refusal that says why it could not. */
function write(io: CliIo, path: string, data: string | Uint8Array): Refusal | undefined {
  try {
    io.writeFile(path, data);
    return undefined;
  } catch (error) {
    return refuse(`cannot write ${path}: ${error instanceof Error ? error.message : String(error)}`);
  }
}

/** The PDF report's bytes; jsPDF is loaded only when a PDF is asked for (it is large, and slow to load). */
async function pdfBytes(
  io: CliIo,
  design: Design,
  result: ReturnType<typeof check>,
  report: Report,
  paper: Paper,
  timing: Timing,
): Promise<Uint8Array | Refusal> {
  let fonts: PdfFonts;
  try {
    fonts = io.loadPdfFonts();
  } catch (error) {
    return refuse(
      `cannot read the PDF report's fonts (the dejavu-fonts-ttf package): ${error instanceof Error ? error.message : String(error)}`,
    );
  }
  timing.mark('pdf-read-fonts');
  const { writeReportPdf } = await import('../report/pdf/index.ts');
  timing.mark('pdf-load');
  return writeReportPdf({ report, design, result, fonts, paper, mark: (stage) => timing.mark(`pdf-${stage}`) });
}

/** `1.2 kB`, `205 kB`: a written file's size for the note that says so. */
function sizeText(bytes: number): string {
  return bytes < 1000 ? plural(bytes, 'byte') : `${Number((bytes / 1000).toPrecision(3))} kB`;
}

async function runCheck(args: readonly string[], io: CliIo): Promise<number | Refusal> {
  const options = checkOptions(args);
  if (options instanceof Refusal) return options;
  const time = generatedAt(io.env);
  if (time instanceof Refusal) return time;
  const timing = new Timing(io.env.RAILCROSS_TIMING === '1');
  const text = readText(options.file, io);
  if (text instanceof Refusal) return text;
  timing.mark('read');
  const design = loadDesign(options.file, io, text);
  if (design instanceof Refusal) return design;
  timing.mark('validate');
  const settings: ReportSettings = {
    failOn: options.failOn,
    generatedAt: time,
    scenario: options.scenario,
    minMargin: options.minMargin,
  };
  const built = reportFor(design, options.file, settings, timing);
  if (built instanceof Refusal) return built;
  const { report, result } = built;

  let baseline: Baseline | undefined;
  if (options.baseline !== undefined) {
    const old = loadReport(options.baseline, io, settings);
    if (old instanceof Refusal) return old;
    baseline = baselineOf(old);
  }
  const judged: Verdict = baseline === undefined ? verdict(report) : baselineVerdict(report, baseline);

  // What was written is said on stderr, since stdout carries the report; with --quiet, stdout
  // carries only the verdict, and the notes join it there.
  const notes: string[] = [];
  const json = options.out !== undefined || options.format === 'json' ? reportJson(report) : '';
  if (options.out !== undefined) {
    const failed = write(io, options.out, json);
    if (failed !== undefined) return failed;
    notes.push(
      `railcross: wrote the JSON report to ${options.out} (${sizeText(new TextEncoder().encode(json).length)})`,
    );
  }
  // Written whatever the verdict: a failing design is when the PDF is most wanted.
  if (options.pdf !== undefined) {
    const bytes = await pdfBytes(io, built.design, result, report, options.paper, timing);
    if (bytes instanceof Refusal) return bytes;
    const failed = write(io, options.pdf, bytes);
    if (failed !== undefined) return failed;
    notes.push(`railcross: wrote the PDF report to ${options.pdf} (${sizeText(bytes.length)})`);
  }
  const note = notes.length === 0 ? '' : `${notes.join('\n')}\n`;
  if (options.quiet) {
    io.stdout(`${judged.line}\n${note}`);
  } else {
    if (note !== '') io.stderr(note);
    io.stdout(options.format === 'json' ? json : render(report, options, judged, baseline, design));
  }
  timing.mark('render');
  timing.flush(io);
  return judged.fails ? EXIT_FAIL : EXIT_PASS;
}

function render(
  report: Report,
  options: CheckOptions,
  judged: Verdict,
  baseline: Baseline | undefined,
  design: Design,
): string {
  switch (options.format) {
    case 'json':
      return reportJson(report);
    case 'md':
      return renderMarkdown(report, { verdict: judged });
    case 'sarif':
      return renderSarif(report, { file: options.file, ...(baseline === undefined ? {} : { baseline }) });
    case 'junit':
      return renderJunit(report, {
        nets: design.nets.map((n) => n.id),
        ...(baseline === undefined ? {} : { baseline }),
      });
    case 'text':
      return renderText(report, {
        verbose: options.verbose,
        verdict: judged,
        ...(baseline === undefined ? {} : { isNew: (f) => !inBaseline(f, baseline) }),
      });
  }
}

async function runDiff(args: readonly string[], io: CliIo): Promise<number | Refusal> {
  const parsed = parseArgs(args, { format: 'value', 'fail-on': 'value', json: 'flag' }, 'diff');
  if (!parsed.ok) return refuse(parsed.error, SEE_HELP);
  const { positional, options } = parsed;
  if (positional.length !== 2)
    return refuse(`diff compares two files, found ${positional.length}: railcross diff OLD NEW`, SEE_HELP);
  const format = (options.get('format') as string | undefined) ?? (options.has('json') ? 'json' : 'text');
  if (!isOneOf(format, DIFF_FORMATS)) return refuse(`--format is "${format}": expected text, json or md`);
  if (options.has('json') && format !== 'json')
    return refuse(`--json and --format ${format} contradict each other: give one`);
  const failOn = (options.get('fail-on') as string | undefined) ?? 'error';
  if (failOn !== 'error' && failOn !== 'warning') return refuse(`--fail-on is "${failOn}": expected error or warning`);
  const time = generatedAt(io.env);
  if (time instanceof Refusal) return time;
  const [oldFile, newFile] = positional as [string, string];
  const settings: ReportSettings = { failOn, generatedAt: time };
  const before = loadReport(oldFile, io, settings);
  if (before instanceof Refusal) return before;
  const after = loadReport(newFile, io, settings);
  if (after instanceof Refusal) return after;
  const d = diffReports(before, after, { from: oldFile, to: newFile }, failOn);
  const render: Record<DiffFormat, () => string> = {
    text: () => renderDiffText(d),
    md: () => renderDiffMarkdown(d),
    json: () => renderDiffJson(d),
  };
  io.stdout(render[format]());
  return d.summary.regressions > 0 ? EXIT_FAIL : EXIT_PASS;
}

function runProfiles(args: readonly string[], io: CliIo): number | Refusal {
  const parsed = parseArgs(args, { json: 'flag' }, 'profiles');
  if (!parsed.ok) return refuse(parsed.error, SEE_HELP);
  if (parsed.positional.length > 0)
    return refuse(`profiles takes no arguments, found: ${parsed.positional.join(', ')}`, SEE_HELP);
  if (parsed.options.has('json')) {
    io.stdout(`${JSON.stringify({ tool: TOOL_NAME, profiles: BUILTIN_PROFILES }, null, 2)}\n`);
    return EXIT_PASS;
  }
  const lines = [
    `Built-in profiles (${BUILTIN_PROFILES.length}). Levels are volts or expressions of the pin's supply VDD;`,
    `a design overrides any of them per part or pin, or declares its own profile.`,
  ];
  for (const profile of BUILTIN_PROFILES) lines.push('', ...describeProfile(profile));
  io.stdout(`${lines.join('\n')}\n`);
  return EXIT_PASS;
}

const HELP = new Set(['help', '--help', '-h']);

/**
 * Runs the command line with `argv` (the arguments after the program name) and returns the
 * exit status: 0 pass, 1 an unwaived finding at the `--fail-on` level, 2 nothing checked.
 */
export async function main(argv: readonly string[], io: CliIo): Promise<number> {
  const [command, ...rest] = argv;
  const end = rest.indexOf('--');
  const options = end < 0 ? rest : rest.slice(0, end);
  let status: number | Refusal;
  if (command === undefined) {
    io.stderr(USAGE);
    return EXIT_UNCHECKED;
  } else if (HELP.has(command) || options.some((a) => a === '--help' || a === '-h')) {
    io.stdout(USAGE);
    return EXIT_PASS;
  } else if (command === '--version') {
    io.stdout(`${TOOL_NAME}\n`);
    return EXIT_PASS;
  } else if (command === 'check') {
    status = await runCheck(rest, io);
  } else if (command === 'diff') {
    status = await runDiff(rest, io);
  } else if (command === 'profiles') {
    status = runProfiles(rest, io);
  } else {
    status = refuse(`unknown command "${command}": expected check, diff or profiles`, SEE_HELP);
  }
  if (status instanceof Refusal) {
    io.stderr(`${status.lines.join('\n')}\n`);
    return EXIT_UNCHECKED;
  }
  return status;
}
