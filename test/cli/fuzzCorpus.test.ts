/**
 * The fuzz corpus of issue 14 as property tests: random mutations of the example design
 * (rules/examples/greenhouse.json; test/support/mutations.ts) through reader → check → report
 * → text and Markdown → main(). Under `npm test` the cases are fixed (propertySeed.ts);
 * `npm run fuzz` draws fresh ones round after round.
 *
 * What must hold for every mutation:
 * - the reader either refuses the file, every error with a path and a reason, and main()
 *   exits 2; or it accepts it, and then the report holds no NaN or ±∞ anywhere, validates
 *   against the zod schema and the committed JSON Schema, renders as text and Markdown, and
 *   main() exits 1 exactly when the report fails (0 otherwise);
 * - a design that skips the reader with numbers JSON cannot carry (NaN, ±∞) still gives a
 *   report without a non-finite number that validates, and every finding that had to judge
 *   one is an error (never a pass).
 */
import { readFileSync } from 'node:fs';
import Ajv2020 from 'ajv/dist/2020.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { main } from '../../rules/cli/main.ts';
import { check } from '../../rules/check/check.ts';
import { nonFinitePaths } from '../../rules/engine/undecidable.ts';
import { readDesign } from '../../rules/model/reader.ts';
import type { Design } from '../../rules/model/schema.ts';
import { buildReport } from '../../rules/report/buildReport.ts';
import { renderMarkdown } from '../../rules/report/renderMarkdown.ts';
import { renderText } from '../../rules/report/renderText.ts';
import { ReportSchema, type Report } from '../../rules/report/reportSchema.ts';
import { verdict } from '../../rules/report/verdict.ts';
import { EXTREME_NUMBERS, mutate, mutationsArb, NON_FINITE_NUMBERS, numberMutationsArb } from '../support/mutations.ts';
import { fakeIo } from './fakeIo.ts';

const EXAMPLE_TEXT = readFileSync(new URL('../../rules/examples/greenhouse.json', import.meta.url), 'utf8');
const EXAMPLE = JSON.parse(EXAMPLE_TEXT) as Design;
const FIXED_TIME = '2026-01-01T00:00:00.000Z';

const ajv = new Ajv2020({ allErrors: true, strict: true, validateFormats: false });
const validateJson = ajv.compile(
  JSON.parse(readFileSync(new URL('../../rules/schema/report.schema.json', import.meta.url), 'utf8')) as object,
);

/** Everything a report must be, whatever the design. */
function expectSound(report: Report): void {
  expect(nonFinitePaths(report), 'no NaN or ±∞ in the report').toEqual([]);
  const parsed = ReportSchema.safeParse(report);
  expect(parsed.success, parsed.success ? '' : JSON.stringify(parsed.error.issues.slice(0, 3))).toBe(true);
  const json = JSON.parse(JSON.stringify(report)) as unknown;
  expect(validateJson(json), JSON.stringify(validateJson.errors?.slice(0, 3))).toBe(true);
  // Verbose: the plain text lists info findings only when asked (otherwise a count).
  const text = renderText(report, { verbose: true });
  const markdown = renderMarkdown(report);
  for (const f of report.findings) expect(text).toContain(f.message);
  expect(markdown.startsWith('# Railcross check: ')).toBe(true);
}

describe('mutations of the example through the reader and main()', () => {
  it('are refused with paths, or checked into a sound report with the right exit status', {
    timeout: 600_000,
  }, async () => {
    await fc.assert(
      fc.asyncProperty(mutationsArb(EXTREME_NUMBERS), async (mutations) => {
        const text = JSON.stringify(mutate(EXAMPLE, mutations));
        const read = readDesign(text);
        const io = fakeIo({ 'design.json': text }, { SOURCE_DATE_EPOCH: '1767225600' });
        const status = await main(['check', 'design.json', '--format', 'md'], io);
        if (!read.ok) {
          for (const e of read.errors) {
            expect(e.path.length).toBeGreaterThan(0);
            expect(e.message.length).toBeGreaterThan(0);
          }
          expect(status, io.err).toBe(2);
          return;
        }
        const report = buildReport(read.design, check(read.design), { failOn: 'error', generatedAt: FIXED_TIME });
        expectSound(report);
        expect(status, io.err).toBe(verdict(report).fails ? 1 : 0);
        expect(io.out).toBe(renderMarkdown(report));
      }),
      { numRuns: 150 },
    );
  });
});

describe('designs that skip the reader with numbers JSON cannot carry', () => {
  // The shape stays whole (numbers only), and the settings and the header are spared: the
  // report restates the settings, and a version is not a quantity.
  const spare = (p: readonly (string | number)[]) => p[0] === 'settings' || p[0] === 'version';
  it('give a sound report in which every finding that met one is an error', { timeout: 600_000 }, () => {
    fc.assert(
      fc.property(numberMutationsArb([...NON_FINITE_NUMBERS, ...EXTREME_NUMBERS]), (mutations) => {
        const design = mutate(EXAMPLE, mutations, spare);
        const result = check(design);
        const report = buildReport(design, result, { failOn: 'error', generatedAt: FIXED_TIME });
        expectSound(report);
        for (const f of result.findings) {
          if (f.messageId === 'undecidable') {
            expect(f.severity).toBe('error');
            expect(f.waived).toBeUndefined();
          }
        }
        for (const c of report.crossings) {
          const analysis = result.nets.get(c.scenario)?.get(c.net)?.view.analysis;
          const undecided = [analysis?.worstHigh, analysis?.worstLow].some(
            (m) => typeof m === 'number' && !Number.isFinite(m),
          );
          if (undecided) expect(c.worst).toBe('error');
        }
      }),
      { numRuns: 300 },
    );
  });
});
