/**
 * The report over random valid designs (test/support/arbitraries.ts: awkward ids, non-ASCII
 * labels, odd levels, scenarios, waivers): it holds to the report schema (zod and the committed
 * JSON Schema through ajv), counts what it lists, renders as text and Markdown with every
 * finding's message, and writes a PDF that starts and ends as one, without throwing.
 */
import { readFileSync } from 'node:fs';
import Ajv2020 from 'ajv/dist/2020.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { loadDejaVuFonts } from '../../rules/cli/node.ts';
import { check } from '../../rules/check/check.ts';
import { buildReport } from '../../rules/report/buildReport.ts';
import { writeReportPdf } from '../../rules/report/pdf/index.ts';
import { renderMarkdown } from '../../rules/report/renderMarkdown.ts';
import { renderText } from '../../rules/report/renderText.ts';
import { ReportSchema } from '../../rules/report/reportSchema.ts';
import { designArb } from '../support/arbitraries.ts';
import { FIXED_TIME } from './fixtures.ts';

const ajv = new Ajv2020({ allErrors: true, strict: true, validateFormats: false });
const validateJson = ajv.compile(
  JSON.parse(readFileSync(new URL('../../rules/schema/report.schema.json', import.meta.url), 'utf8')) as object,
);

describe('the report of any valid design', () => {
  it('holds to its schemas, counts what it lists, and renders as text and Markdown', () => {
    fc.assert(
      fc.property(
        designArb(),
        fc.constantFrom('error', 'warning') as fc.Arbitrary<'error' | 'warning'>,
        (design, failOn) => {
          const report = buildReport(design, check(design), { failOn, generatedAt: FIXED_TIME });
          expect(ReportSchema.safeParse(report).success).toBe(true);
          const json = JSON.parse(JSON.stringify(report)) as unknown;
          expect(validateJson(json), JSON.stringify(validateJson.errors?.slice(0, 3))).toBe(true);

          const tally = { error: 0, warning: 0, info: 0, waived: 0 };
          for (const f of report.findings) tally[f.waived !== undefined ? 'waived' : f.severity]++;
          expect(report.summary).toMatchObject(tally);

          const text = renderText(report, { verbose: true });
          const markdown = renderMarkdown(report);
          for (const f of report.findings) expect(text).toContain(f.message);
          expect(markdown.length).toBeGreaterThan(0);
        },
      ),
      { numRuns: 60 },
    );
  });

  it('writes a PDF of it', { timeout: 120_000 }, () => {
    const fonts = loadDejaVuFonts();
    fc.assert(
      fc.property(designArb({ maxParts: 6 }), (design) => {
        const result = check(design);
        const report = buildReport(design, result, { failOn: 'error', generatedAt: FIXED_TIME });
        const bytes = writeReportPdf({ report, design, result, fonts, paper: 'a4' });
        const text = Buffer.from(bytes).toString('latin1');
        expect(text.startsWith('%PDF-')).toBe(true);
        expect(text.trimEnd().endsWith('%%EOF')).toBe(true);
      }),
      { numRuns: 12 },
    );
  });
});
