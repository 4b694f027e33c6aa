/**
 * The PDF report, read back as a reader would: `pdftotext -layout` (poppler-utils) extracts
 * its text, and the tests look for what the report must carry. poppler-utils is installed here
 * and on CI (.ci/run); without it these tests are skipped with a message saying so.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { netNameIn, railNameIn } from '../../rules/report/reportNames.ts';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { loadDejaVuFonts } from '../../rules/cli/node.ts';
import { check } from '../../rules/check/check.ts';
import type { Design } from '../../rules/model/schema.ts';
import { buildReport } from '../../rules/report/buildReport.ts';
import { RULES } from '../../rules/checks/index.ts';
import { reportPdfFileName, writeReportPdf, type Paper } from '../../rules/report/pdf/index.ts';
import { toBase64, toBinaryString } from '../../rules/report/pdf/fonts.ts';
import type { Crossing, Report } from '../../rules/report/reportSchema.ts';
import { ladderFor } from '../../rules/report/ladder.ts';
import { marginVolts } from '../../rules/report/ladderLayout.ts';
import { ladderRows } from '../../rules/report/pdf/ladders.ts';
import { design, input, net, output, part, rail, scenario } from '../support/build.ts';
import { FIXED_TIME, greenhouse, quantitiesIn } from './fixtures.ts';

const HAVE_POPPLER = spawnSync('pdftotext', ['-v']).error === undefined;
if (!HAVE_POPPLER) {
  console.warn(
    'test/report/pdf.test.ts: pdftotext (poppler-utils) is not installed: the PDF text tests are SKIPPED. Install poppler-utils to run them.',
  );
}

const fonts = loadDejaVuFonts();
const dir = mkdtempSync(join(tmpdir(), 'railcross-pdf-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

interface Made {
  design: Design;
  report: Report;
  bytes: Uint8Array;
  file: string;
}

let serial = 0;
function make(d: Design, paper: Paper = 'a4'): Made {
  const result = check(d);
  const report = buildReport(d, result, { failOn: 'error', generatedAt: FIXED_TIME });
  const bytes = writeReportPdf({ report, design: d, result, fonts, paper });
  const file = join(dir, `report-${serial++}.pdf`);
  writeFileSync(file, bytes);
  return { design: d, report, bytes, file };
}

const textOf = (file: string): string => execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' });
const pagesOf = (file: string): number =>
  Number(/^Pages:\s+(\d+)/m.exec(execFileSync('pdfinfo', [file], { encoding: 'utf8' }))![1]);
const latin1 = (bytes: Uint8Array): string => Array.from(bytes, (b) => String.fromCharCode(b)).join('');

/**
 * Words of `text`: split at white space and at the en dash of a range (`1.04 kΩ–18.2 kΩ`),
 * with brackets and the punctuation that may end a sentence dropped.
 */
const words = (text: string): string[] =>
  text
    .split(/[\s–]+/)
    .filter((w) => w !== '')
    .map((w) => w.replace(/^\(|[.,;:)]+$/g, ''));

/**
 * Whether every word of `phrase` occurs in `text` in order. A table cell's lines come out of
 * `pdftotext -layout` interleaved with its neighbours' lines, so a wrapped cell is read back
 * as a sequence of words, not a substring.
 */
function wordsInOrder(text: string, phrase: string): boolean {
  const hay = words(text);
  let at = 0;
  for (const w of words(phrase)) {
    while (at < hay.length && hay[at] !== w) at++;
    if (at === hay.length) return false;
    at++;
  }
  return true;
}

/** The text from the heading `from` (a line of its own) to the heading `to`, or to the end. */
function section(text: string, from: RegExp, to?: RegExp): string {
  const start = text.search(from);
  expect(start, `heading ${from}`).toBeGreaterThanOrEqual(0);
  const rest = text.slice(start);
  const end = to === undefined ? -1 : rest.search(to);
  return end < 0 ? rest : rest.slice(0, end);
}

const escapeRe = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

describe.skipIf(!HAVE_POPPLER)("the example's PDF, read back with pdftotext", () => {
  const made = make(greenhouse());
  const text = textOf(made.file);
  const findings = section(text, /^Findings \(\d+\)$/m, /^Rail crossings \(\d+\)$/m);

  it('is a PDF', () => {
    expect(latin1(made.bytes.subarray(0, 5))).toBe('%PDF-');
  });

  it("has a finding row for every finding: severity, rule, net and power state on one line, in the report's order", () => {
    expect(made.report.findings.length).toBeGreaterThan(20);
    const lines = findings.split('\n');
    let at = 0;
    for (const f of made.report.findings) {
      const row = new RegExp(
        `^\\s*${f.severity}\\s+${escapeRe(f.rule)}\\s+${escapeRe(f.net === null ? '—' : netNameIn(made.report, f.net))}\\s+${escapeRe(f.scenario)}\\s`,
      );
      const k = lines.findIndex((l, i) => i >= at && row.test(l));
      expect(k, `row of ${f.id}`).toBeGreaterThanOrEqual(0);
      // The row's block runs to the next finding's row; its message and hint are in it, every number too.
      const next = lines.findIndex((l, i) => i > k && /^\s*(error|warning|info)\s+[a-z-]+\s/.test(l));
      const block = lines.slice(k, next < 0 ? undefined : next).join('\n');
      expect(wordsInOrder(block, f.message), `message of ${f.id}`).toBe(true);
      expect(wordsInOrder(block, f.hint), `hint of ${f.id}`).toBe(true);
      for (const q of quantitiesIn(f.message)) expect(wordsInOrder(block, q), `${q} in ${f.id}`).toBe(true);
      at = k + 1;
    }
  });

  it("gives each rule's title beside its id", () => {
    for (const rule of new Set(made.report.findings.map((f) => f.rule))) {
      const title = RULES.find((r) => r.id === rule)!.meta.title;
      expect(wordsInOrder(findings, `${rule} ${title}`), rule).toBe(true);
    }
  });

  it('has every rail-crossing row with its rails, state, margins and worst finding', () => {
    const crossings = section(text, /^Rail crossings \(\d+\)$/m, /^Noise margins per net$/m);
    expect(made.report.crossings.length).toBe(32); // 6 crossing nets × 3 power states, and the parts between chips' 6 in all-on and at reset, 2 in standby (its FET gates off)
    for (const c of made.report.crossings) {
      const margin = (m: number | null) => (m === null ? '—' : `${escapeRe(String(Number(m.toPrecision(3))))} V`);
      const row = new RegExp(
        `^\\s*${escapeRe(c.label)}\\s+${escapeRe(railNameIn(made.report, c.rails[0]!))}\\s+${escapeRe(c.scenario)}\\s+${margin(c.marginHigh)}\\s+${margin(c.marginLow)}\\s+${c.worst}\\s*$`,
        'm',
      );
      expect(crossings, `${c.net} in ${c.scenario}`).toMatch(row);
    }
  });

  it('has a margin row for every net in every power state, "—" where a net has no pair', () => {
    const margins = section(text, /^Noise margins per net$/m, /^Method and sources$/m);
    for (const state of made.report.scenarios) {
      for (const n of made.design.nets) {
        expect(margins, `${n.id} in ${state.id}`).toMatch(
          new RegExp(`^\\s*${escapeRe(n.id)}\\s+\\S.*\\s${escapeRe(state.id)}\\s+\\d+\\s`, 'm'),
        );
      }
    }
    // SLEEP has receivers and no driver: no pair, so both of its margins are "—" (the example's planted floating input).
    expect(margins).toMatch(/^\s*SLEEP\s+BOARD_SLEEP\s+all-on\s+0\s+—\s+—\s*$/m);
    // VALVE_EN: 2.93 V against 3.69 V, NMH -0.759 V (the example's planted level-high error), set by U1.VALVE_EN → U3.EN.
    expect(margins).toMatch(/^\s*VALVE_EN\s+VALVE_EN\s+all-on\s+1\s+-0\.759 V\s+U1\.VALVE_EN →/m);
  });

  it('names every profile the design uses, with its source', () => {
    const profiles = section(text, /^Profiles used \(\d+\)$/m, /^Rules applied$/m);
    expect(made.report.profiles.length).toBeGreaterThan(3);
    for (const p of made.report.profiles) {
      expect(profiles, p.id).toMatch(new RegExp(`^\\s*${escapeRe(p.id)}\\s`, 'm'));
      expect(wordsInOrder(profiles, p.source), `source of ${p.id}`).toBe(true);
    }
  });

  it('draws a voltage ladder for every crossing net, headed by its label and power state, with its NMH and NML as the ladder prints them', () => {
    const ladders = section(text, /^Voltage ladders$/m, /^Method and sources$/m);
    const result = check(made.design);
    const { rows } = ladderRows(made.report.crossings);
    // Every crossing net has a ladder in all-on; SDA and SCL again in standby, where their margins change (the sensor rail is off).
    expect(new Set(rows.map((r) => r.net))).toEqual(new Set(made.report.crossings.map((c) => c.net)));
    expect(rows.map((r) => `${r.net}@${r.scenario}`)).toEqual(expect.arrayContaining(['SDA@standby', 'SCL@standby']));
    for (const row of rows) {
      const state = made.report.scenarios.find((s) => s.id === row.scenario)!;
      expect(ladders, `${row.net} in ${row.scenario}`).toMatch(
        new RegExp(`${escapeRe(row.label)}\\s+· ${escapeRe(state.label)} \\(${escapeRe(row.scenario)}\\)`),
      );
      const ladder = ladderFor(
        result.nets.get(row.scenario)!.get(row.net)!.view,
        result.states.find((s) => s.id === row.scenario)!,
      );
      for (const m of ladder.margins)
        expect(ladders, `${m.kind} ${m.driver} → ${m.receiver}`).toContain(
          `${m.kind.toUpperCase()} ${marginVolts(m.margin)}`,
        );
    }
    // The example's planted level-high error: VOH 2.935 V against VIH 3.694 V is NMH -0.759 V, marked FAIL in words.
    expect(ladders).toContain('NMH -0.759 V');
    expect(ladders).toMatch(/^.*\bFAIL\b/m);
    expect(ladders).toContain('VOH ≥ 2.935 V');
    expect(ladders).toContain('VIH 3.694 V');
  });

  it('lists the ladders on the cover between the margin table and the method', () => {
    const contents = section(text, /^\s*Contents$/m, /^\s*Power states checked$/m);
    expect(contents).toMatch(/Noise margins per net[^\n]*\n\s*Voltage ladders[^\n]*\d+\s*\n\s*Method and sources/);
  });

  it('explains the worst-case method', () => {
    const method = section(text, /^Method and sources$/m, /^Profiles used/m);
    for (const phrase of [
      "every combination of those rails' ends",
      'share one supply voltage',
      'smallest test current',
      'NMH = VOH − VIH',
      '1e-9',
    ]) {
      expect(wordsInOrder(method, phrase), phrase).toBe(true);
    }
  });

  it('ends with the cautions, each one whole', () => {
    const cautions = section(text, /^Cautions$/m).replace(/\s+/g, ' ');
    expect(made.report.cautions.length).toBeGreaterThan(0);
    for (const c of made.report.cautions) expect(cautions).toContain(c);
  });

  it('puts the verdict, the counts and the power states on the cover', () => {
    const cover = text.slice(0, text.indexOf('page 1 of'));
    expect(cover).toContain('Greenhouse irrigation controller');
    // 9 planted all-on errors, 9 again in standby, and at reset 7 again plus the floating enable; the SCL2 shifter's 2 in all-on and at reset.
    expect(cover).toContain('FAIL: unwaived findings at the fail-on level (error): 30 errors.');
    expect(cover).toContain('2026-01-01 00:00 UTC');
    expect(cover).toContain('railcross 0.1.0');
    expect(cover).toMatch(/^\s*standby\s+Standby: sensor rail off\s+1v8\s*$/m);
    expect(cover).toMatch(/^\s*reset\s+Reset: controller pins are inputs\b/m);
  });

  it('numbers every page "page N of M" and repeats the title in the header after the cover', () => {
    const pages = pagesOf(made.file);
    expect(pages).toBeGreaterThanOrEqual(6);
    for (let k = 1; k <= pages; k++) expect(text).toContain(`page ${k} of ${pages}`);
    expect(text.split('Railcross report: Greenhouse irrigation controller').length - 1).toBe(pages - 1);
  });

  it("draws the diagram from the design: every part's designator and every net name is on it", () => {
    const diagram = section(text, /^Block diagram$/m, /^Findings \(\d+\)$/m);
    for (const p of made.design.parts) expect(diagram, p.id).toMatch(new RegExp(`\\b${escapeRe(p.id)}\\b`));
    for (const n of made.design.nets) expect(diagram, n.id).toMatch(new RegExp(`\\b${escapeRe(n.id)}\\b`));
    expect(diagram).toContain('error: heavy, solid, cased');
  });

  it('prints Ω, µ, ≤, – and → from the embedded fonts, and uses no other font', () => {
    for (const ch of ['kΩ', 'µs', 'VDD ≤ 2 V', 'kΩ–', '→']) expect(text, ch).toContain(ch);
    const fontsList = execFileSync('pdffonts', [made.file], { encoding: 'utf8' })
      .split('\n')
      .slice(2)
      .filter((l) => l.trim() !== '');
    expect(fontsList.length).toBeGreaterThan(0);
    for (const line of fontsList) expect(line, line).toMatch(/\sIdentity-H\s+yes\s/);
  });
});

describe.skipIf(!HAVE_POPPLER)('names with markup and unusual characters come out as text', () => {
  const LONG =
    'a very long label for the relay coil supply enable line that runs from the controller across the whole board to the far connector';
  const TITLE = 'Bench rig "B" <rev 2> & Ω-meter µC test';
  const d = design({
    title: TITLE,
    rails: [rail('5v0', 5, { tolerance: 0.05 }), rail('3v3', 3.3, { tolerance: 0.05 })],
    scenarios: [scenario('sleep', ['5v0'], 'Sleep: 5 V off ≤ 1 s')],
    parts: [
      part('U1', '3v3', 'lvcmos33', [output('Y'), output('Z')], { label: '<b>x</b> µC “main”' }),
      part('U2', '5v0', '74hct', [input('A'), input('B')], { label: "Driver 'Ω' stage", position: { x: 400, y: 0 } }),
    ],
    nets: [
      net('EN', ['U1.Y', 'U2.A'], {
        label: LONG,
        waivers: [{ rule: 'back-power', note: 'Reviewed: U2 <i>sleeps</i> — 10 kΩ series' }],
      }),
      net('N_2', ['U1.Z', 'U2.B']),
    ],
  });
  const made = make(d);
  const text = textOf(made.file);

  it.each([
    ['the title with quotes, angle brackets and &', TITLE],
    ['a label that looks like markup', '<b>x</b> µC “main”'],
    ['a label with Ω and quotes', "Driver 'Ω' stage"],
    ['a power state label with ≤', 'Sleep: 5 V off ≤ 1 s'],
  ])('%s', (_name, expected) => {
    expect(text).toContain(expected);
  });

  it('a waiver note with markup, kept beside its finding', () => {
    expect(made.report.findings.some((f) => f.waived !== undefined)).toBe(true);
    expect(wordsInOrder(text, 'Waived: Reviewed: U2 <i>sleeps</i> — 10 kΩ series')).toBe(true);
  });

  it('a very long label wraps inside its cell, every word kept', () => {
    const crossings = section(text, /^Rail crossings \(\d+\)$/m, /^Noise margins per net$/m);
    expect(wordsInOrder(crossings, LONG)).toBe(true);
  });
});

// Writing the example's PDF takes seconds of CPU on a loaded machine: a generous timeout, never the idle machine's 5 s.
describe.skipIf(!HAVE_POPPLER)('page size', { timeout: 120_000 }, () => {
  /** Every distinct MediaBox of the file, `w×h` in points to 0.01 pt. */
  const boxes = (bytes: Uint8Array) => [
    ...new Set(
      [...latin1(bytes).matchAll(/\/MediaBox \[0 0 ([\d.]+) ([\d.]+)\]/g)].map(
        (m) => `${Number(Number(m[1]).toFixed(2))}×${Number(Number(m[2]).toFixed(2))}`,
      ),
    ),
  ];

  it.each([
    // ISO 216 A4 is 210 × 297 mm = 595.28 × 841.89 pt; US Letter is 8.5 × 11 in = 612 × 792 pt.
    ['a4', '595.28×841.89', /Page size:\s+595\.28 x 841\.89 pts \(A4\)/],
    ['letter', '612×792', /Page size:\s+612 x 792 pts \(letter\)/],
  ] as const)('%s pages are %s (pdfinfo agrees)', (paper, size, info) => {
    const made = make(greenhouse(), paper);
    expect(boxes(made.bytes)).toContain(size);
    // The diagram page alone turns to landscape when the drawing is wider than tall.
    const [w, h] = size.split('×');
    expect(boxes(made.bytes).every((b) => b === size || b === `${h}×${w}`)).toBe(true);
    expect(execFileSync('pdfinfo', [made.file], { encoding: 'utf8' })).toMatch(info);
  });

  it('A4 and Letter differ', () => {
    expect(boxes(make(greenhouse(), 'a4').bytes)).not.toEqual(boxes(make(greenhouse(), 'letter').bytes));
  });
});

describe('writeReportPdf', { timeout: 120_000 }, () => {
  it('the same report gives the same bytes (reproducible with SOURCE_DATE_EPOCH)', () => {
    const d = greenhouse();
    const a = make(d).bytes;
    const b = make(d).bytes;
    expect(a.length).toBeGreaterThan(10_000);
    expect(Buffer.from(a).equals(Buffer.from(b))).toBe(true);
  });

  it.each([
    ['a design without parts', design({ title: 'empty', parts: [] })],
    [
      'parts without positions or nets',
      design({ parts: [part('A', '3v3', 'lvcmos33', [input('X')]), part('B', '3v3', 'lvcmos33', [])] }),
    ],
  ])('writes %s', (_name, d) => {
    const made = make(d);
    expect(latin1(made.bytes.subarray(0, 5))).toBe('%PDF-');
    if (HAVE_POPPLER) expect(textOf(made.file)).toContain('Cautions');
  });
});

describe('reportPdfFileName', () => {
  it.each([
    ['Greenhouse irrigation controller', 'greenhouse-irrigation-controller-report.pdf'],
    ['  Bench rig "B" <rev 2> & Ω-meter  ', 'bench-rig-b-rev-2-meter-report.pdf'],
    ['Café Müller/Øst', 'cafe-muller-st-report.pdf'],
    ['../../etc/passwd', 'etc-passwd-report.pdf'],
    ['', 'railcross-report.pdf'],
    ['µΩ≤', 'railcross-report.pdf'],
    ['x'.repeat(100), `${'x'.repeat(60)}-report.pdf`],
  ])('%j → %s', (title, expected) => {
    expect(reportPdfFileName(title)).toBe(expected);
  });
});

describe('toBase64', () => {
  // RFC 4648 §10 test vectors.
  it.each([
    ['', ''],
    ['f', 'Zg=='],
    ['fo', 'Zm8='],
    ['foo', 'Zm9v'],
    ['foob', 'Zm9vYg=='],
    ['fooba', 'Zm9vYmE='],
    ['foobar', 'Zm9vYmFy'],
  ])('%j → %j', (plain, encoded) => {
    expect(toBase64(new TextEncoder().encode(plain))).toBe(encoded);
  });

  it("matches Node's encoder on a font file", () => {
    expect(toBase64(fonts.bold)).toBe(Buffer.from(fonts.bold).toString('base64'));
  });
});

describe('toBinaryString', () => {
  it.each([
    ['empty', [], ''],
    [
      'every byte value keeps its code (0x00, 0x7F, 0x80, 0x9F, 0xFF)',
      [0, 0x7f, 0x80, 0x9f, 0xff],
      '\u0000\u007f\u0080\u009f\u00ff',
    ],
  ])('%s', (_name, bytes, text) => {
    expect(toBinaryString(new Uint8Array(bytes))).toBe(text);
  });

  it("matches Node's latin1 decoding on a font file longer than one slice", () => {
    expect(fonts.regular.length).toBeGreaterThan(8192 * 2);
    expect(toBinaryString(fonts.regular)).toBe(Buffer.from(fonts.regular).toString('latin1'));
  });

  it('the fonts are TrueType files (sfnt version 0x00010000), which jsPDF takes as binary strings', () => {
    for (const f of [fonts.regular, fonts.bold, fonts.mono!]) expect([...f.subarray(0, 4)]).toEqual([0, 1, 0, 0]);
  });
});

describe('ladderRows', () => {
  const row = (
    net: string,
    scenario: string,
    worst: Crossing['worst'],
    marginHigh: number | null,
    marginLow: number | null,
  ): Crossing => ({ net, label: net, rails: ['a', 'b'], scenario, marginHigh, marginLow, worst });
  it.each([
    [
      'an unchanged second state is left out',
      [row('N1', 'all-on', 'ok', 1, 1), row('N1', 'off', 'ok', 1, 1)],
      40,
      ['N1@all-on'],
    ],
    [
      'a changed second state is kept',
      [row('N1', 'all-on', 'ok', 1, 1), row('N1', 'off', 'error', null, null)],
      40,
      ['N1@all-on', 'N1@off'],
    ],
    [
      "over the cap, errors then the smallest margins, in the report's order",
      [
        row('A', 's', 'ok', 0.1, 0.2),
        row('B', 's', 'error', 0.5, 0.5),
        row('C', 's', 'warning', 0.05, 1),
        row('D', 's', 'ok', 0.01, 1),
      ],
      2,
      ['B@s', 'C@s'],
    ],
  ] as const)('%s', (_name, rows, cap, want) => {
    expect(ladderRows(rows, cap).rows.map((r) => `${r.net}@${r.scenario}`)).toEqual(want);
  });
});
