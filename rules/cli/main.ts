/**
 * The command line, callable in-process: `main(argv, io)` returns the exit status, and every
 * effect goes through `io`, so that tests need no child process. rules/cli/node.ts supplies
 * the real io; rules/cli/railcross.mjs is the `bin`.
 */
import { readDesign } from '../model/reader.ts';
import { MAX_VOLTS } from '../model/limits.ts';
import type { Design } from '../model/schema.ts';
import { check } from '../engine/check.ts';
import { ALL_ON } from '../engine/powerStates.ts';
import { parseQuantity } from '../levels/units.ts';
import { BUILTIN_PROFILES } from '../profiles/index.ts';
import { buildReport } from '../report/buildReport.ts';
import { describeProfile } from '../report/describeProfile.ts';
import { renderMarkdown } from '../report/renderMarkdown.ts';
import { renderText } from '../report/renderText.ts';
import type { FailOn, Report } from '../report/reportSchema.ts';
import type { PdfFonts } from '../report/pdf/fonts.ts';
import type { Paper } from '../report/pdf/theme.ts';
import { verdict } from '../report/verdict.ts';
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

type Format = 'text' | 'json' | 'md';

/** A refusal: the message goes to stderr and the status is 2. */
class Refusal {
  constructor(readonly lines: readonly string[]) {}
}

const refuse = (message: string, ...more: string[]) => new Refusal([`railcross: ${message}`, ...more]);
const SEE_HELP = 'Run "railcross --help" for the usage.';

/** `SOURCE_DATE_EPOCH` (whole seconds since 1970, reproducible-builds.org) or now. */
function generatedAt(env: CliIo['env']): string | Refusal {
  const epoch = env['SOURCE_DATE_EPOCH'];
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
    { json: 'flag', format: 'value', out: 'value', pdf: 'value', paper: 'value', scenario: 'value', 'min-margin': 'value', 'fail-on': 'value' },
    'check',
  );
  if (!parsed.ok) return refuse(parsed.error, SEE_HELP);
  const { positional, options } = parsed;
  const value = (name: string) => options.get(name) as string | undefined;
  if (positional.length === 0) return refuse('check needs a design file: railcross check FILE', SEE_HELP);
  if (positional.length > 1) return refuse(`check takes one design file, found ${positional.length}: ${positional.join(', ')}`, SEE_HELP);

  const format = value('format') ?? (options.has('json') ? 'json' : 'text');
  if (format !== 'text' && format !== 'json' && format !== 'md') return refuse(`--format is "${format}": expected text, json or md`);
  if (options.has('json') && format !== 'json') return refuse(`--json and --format ${format} contradict each other: give one`);

  const failOn = value('fail-on') ?? 'error';
  if (failOn !== 'error' && failOn !== 'warning') return refuse(`--fail-on is "${failOn}": expected error or warning`);

  let minMargin: number | undefined;
  const margin = value('min-margin');
  if (margin !== undefined) {
    const q = parseQuantity(margin, 'V');
    if (!q.ok) return refuse(`--min-margin is "${margin}": ${q.error} (e.g. 0.3, 300m or "300 mV")`);
    if (q.value < 0) return refuse(`--min-margin is "${margin}": expected a margin of 0 V or more`);
    if (!(q.value <= MAX_VOLTS)) return refuse(`--min-margin is "${margin}": expected a margin of at most ${MAX_VOLTS / 1000} kV`);
    minMargin = q.value;
  }

  const paper = value('paper') ?? 'a4';
  if (paper !== 'a4' && paper !== 'letter') return refuse(`--paper is "${paper}": expected a4 or letter`);
  if (options.has('paper') && !options.has('pdf')) return refuse('--paper sets the PDF report\'s page size: give --pdf PATH as well');

  return { file: positional[0]!, format, out: value('out'), pdf: value('pdf'), paper, scenario: value('scenario'), minMargin, failOn };
}

function loadDesign(file: string, io: CliIo): Design | Refusal {
  let text: string;
  try {
    text = io.readFile(file);
  } catch (error) {
    return refuse(`cannot read ${file}: ${error instanceof Error ? error.message : String(error)}`);
  }
  const read = readDesign(text);
  if (!read.ok) {
    const n = read.errors.length;
    return new Refusal([`railcross: ${file} is not a valid design (${n} problem${n === 1 ? '' : 's'}):`, ...read.errors.map((e) => `${e.path}: ${e.message}`)]);
  }
  return read.design;
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
async function pdfBytes(io: CliIo, design: Design, result: ReturnType<typeof check>, report: Report, paper: Paper): Promise<Uint8Array | Refusal> {
  let fonts: PdfFonts;
  try {
    fonts = io.loadPdfFonts();
  } catch (error) {
    return refuse(`cannot read the PDF report's fonts (the dejavu-fonts-ttf package): ${error instanceof Error ? error.message : String(error)}`);
  }
  const { writeReportPdf } = await import('../report/pdf/index.ts');
  return writeReportPdf({ report, design, result, fonts, paper });
}

async function runCheck(args: readonly string[], io: CliIo): Promise<number | Refusal> {
  const options = checkOptions(args);
  if (options instanceof Refusal) return options;
  const time = generatedAt(io.env);
  if (time instanceof Refusal) return time;
  let design = loadDesign(options.file, io);
  if (design instanceof Refusal) return design;

  const states = [ALL_ON, ...(design.scenarios ?? []).map((s) => s.id)];
  if (options.scenario !== undefined && !states.includes(options.scenario)) {
    return refuse(`--scenario "${options.scenario}" is not a power state of ${options.file}: expected one of ${states.join(', ')}`);
  }
  if (options.minMargin !== undefined) {
    design = { ...design, settings: { ...design.settings, minMargin: options.minMargin } };
  }

  const result = check(design);
  const report = buildReport(design, result, {
    failOn: options.failOn,
    generatedAt: time,
    ...(options.scenario === undefined ? {} : { scenario: options.scenario }),
  });
  const json = reportJson(report);
  if (options.out !== undefined) {
    const failed = write(io, options.out, json);
    if (failed !== undefined) return failed;
  }
  // Written whatever the verdict: a failing design is when the PDF is most wanted.
  if (options.pdf !== undefined) {
    const bytes = await pdfBytes(io, design, result, report, options.paper);
    if (bytes instanceof Refusal) return bytes;
    const failed = write(io, options.pdf, bytes);
    if (failed !== undefined) return failed;
  }
  io.stdout(options.format === 'json' ? json : options.format === 'md' ? renderMarkdown(report) : renderText(report));
  return verdict(report).fails ? EXIT_FAIL : EXIT_PASS;
}

function runProfiles(args: readonly string[], io: CliIo): number | Refusal {
  const parsed = parseArgs(args, { json: 'flag' }, 'profiles');
  if (!parsed.ok) return refuse(parsed.error, SEE_HELP);
  if (parsed.positional.length > 0) return refuse(`profiles takes no arguments, found: ${parsed.positional.join(', ')}`, SEE_HELP);
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
  } else if (command === 'profiles') {
    status = runProfiles(rest, io);
  } else {
    status = refuse(`unknown command "${command}": expected check or profiles`, SEE_HELP);
  }
  if (status instanceof Refusal) {
    io.stderr(`${status.lines.join('\n')}\n`);
    return EXIT_UNCHECKED;
  }
  return status;
}
