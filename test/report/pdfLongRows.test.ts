/**
 * PDF rows taller than a page (issue 14: a 3,000-character net label without spaces or a
 * 5,000-character waiver note made the whole report fail). Such a row goes on over as many
 * pages as it needs, each later piece marked "(continued from the previous page)" in its rule
 * cell, and nothing of the text is lost. Read back with pdftotext (poppler-utils), as
 * test/report/pdf.test.ts does; skipped with a message where poppler is missing.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { loadDejaVuFonts } from '../../rules/cli/node.ts';
import { check } from '../../rules/check/check.ts';
import type { Design } from '../../rules/model/schema.ts';
import { buildReport } from '../../rules/report/buildReport.ts';
import { writeReportPdf } from '../../rules/report/pdf/index.ts';
import { CONTINUED } from '../../rules/report/pdf/tables.ts';
import { design, input, net, output, part, rail3v3, rail5v0 } from '../support/build.ts';
import { FIXED_TIME } from './fixtures.ts';

const HAVE_POPPLER = spawnSync('pdftotext', ['-v']).error === undefined;
if (!HAVE_POPPLER)
  console.warn('test/report/pdfLongRows.test.ts: pdftotext (poppler-utils) is not installed: SKIPPED.');

const fonts = loadDejaVuFonts();
const dir = mkdtempSync(join(tmpdir(), 'railcross-pdf-rows-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

// Letters that appear nowhere else in a report, so that counting them counts the name and note.
const LABEL = 'Ж'.repeat(3000);
const NOTE = 'Щ'.repeat(5000);

/** A 5 V output into a 3.3 V input: an over-voltage error (waived, with the note) and a crossing. */
function longRows(label: string, note: string): Design {
  return design({
    title: 'Long rows',
    rails: [rail5v0, rail3v3],
    parts: [part('D', '5v0', '74hc', [output('Y')]), part('R', '3v3', 'lvcmos33', [input('A')])],
    nets: [net('N', ['D.Y', 'R.A'], { label, waivers: [{ rule: 'overvoltage', note }] })],
  });
}

function pdfText(d: Design, name: string): string {
  const result = check(d);
  const report = buildReport(d, result, { failOn: 'error', generatedAt: FIXED_TIME });
  const bytes = writeReportPdf({ report, design: d, result, fonts, paper: 'a4' });
  const file = join(dir, name);
  writeFileSync(file, bytes);
  return execFileSync('pdftotext', [file, '-'], { encoding: 'utf8', maxBuffer: 64 << 20 });
}

const count = (text: string, ch: string): number => text.split(ch).length - 1;

describe.skipIf(!HAVE_POPPLER)('a findings row taller than a page', () => {
  it.each([
    ['a 3,000-character label without spaces', LABEL, 'short note', 'Ж', 3000],
    ['a 5,000-character waiver note', 'short label', NOTE, 'Щ', 5000],
    ['both at once', LABEL, NOTE, 'Щ', 5000],
  ])(
    '%s: the PDF is made, the row continues with its mark, no character lost',
    (name, label, note, ch, n) => {
      const text = pdfText(longRows(label, note), `${name.replace(/\W+/g, '-')}.pdf`);
      expect(text).toContain(CONTINUED.split(' ')[0]);
      expect(text.replace(/\s+/g, ' ')).toContain(CONTINUED);
      // The row's own text, whole: at least as many of its letters as it has (the label is
      // also printed in the crossing and margin tables and the diagram).
      expect(count(text, ch)).toBeGreaterThanOrEqual(n);
    },
    60_000,
  ); // a PDF of a dozen pages: generous on a loaded machine, never a speed assertion
});
