/**
 * The command line on a design whose numbers the reader would refuse (issue 14: "a design
 * with a non-finite intermediate reported as failing"). Here the reader is replaced by a bare
 * JSON.parse, as a bug or a future import path might skip it, so that the 3.6e307 tolerance
 * of the regression file reaches the engine: the 5 V rail's range becomes ±∞ and every margin
 * on its net NaN or ±∞. Before, that design exited 0 with "worst NMH −∞ V … ok"; it must
 * exit 1 with findings that say the check could not decide.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it, vi } from 'vitest';
import { main } from '../../rules/cli/main.ts';
import { ReportSchema } from '../../rules/report/reportSchema.ts';
import { fakeIo } from './fakeIo.ts';

vi.mock('../../rules/model/reader.ts', async (importOriginal) => {
  const original = await importOriginal<typeof import('../../rules/model/reader.ts')>();
  return { ...original, readDesign: (text: string) => ({ ok: true, design: JSON.parse(text) }) };
});

const FILE = '5v-rail-tolerance-3.6e307.railcross.json';
const TEXT = readFileSync(new URL(`../fixtures/regressions/${FILE}`, import.meta.url), 'utf8');

describe('a design with a non-finite intermediate, past the reader', () => {
  it.each([['text'], ['md'], ['json']])('fails with exit 1 (--format %s)', async (format) => {
    const io = fakeIo({ [FILE]: TEXT }, { SOURCE_DATE_EPOCH: '1767225600' });
    const status = await main(['check', FILE, '--format', format], io);
    expect(status, io.err).toBe(1);
    expect(io.out).toContain('cannot be guaranteed');
    expect(io.out).not.toMatch(/NaN|∞/);
  });

  it('its JSON report names the undecided numbers, holds null for them and validates', async () => {
    const io = fakeIo({ [FILE]: TEXT }, { SOURCE_DATE_EPOCH: '1767225600' });
    await main(['check', FILE, '--json'], io);
    const report = JSON.parse(io.out) as {
      findings: { severity: string; message: string; values: Record<string, unknown> }[];
      crossings: { worst: string; marginHigh: unknown; marginLow: unknown }[];
    };
    expect(ReportSchema.safeParse(report).success).toBe(true);
    const undecided = report.findings.filter((f) => f.message.includes('cannot be guaranteed'));
    expect(undecided.length).toBeGreaterThan(0);
    for (const f of undecided) {
      expect(f.severity).toBe('error');
      expect((f.values.undecidable as string[]).length).toBeGreaterThan(0);
    }
    expect(report.crossings).toHaveLength(1);
    expect(report.crossings[0]).toMatchObject({ worst: 'error', marginHigh: null, marginLow: null });
  });

  it('writes its PDF report', { timeout: 60_000 }, async () => {
    const io = fakeIo({ [FILE]: TEXT }, { SOURCE_DATE_EPOCH: '1767225600' });
    const status = await main(['check', FILE, '--pdf', 'report.pdf'], io);
    expect(status, io.err).toBe(1);
    const bytes = io.binaries.get('report.pdf');
    expect(bytes, io.err).toBeDefined();
    expect(Buffer.from(bytes!.slice(0, 5)).toString('latin1')).toBe('%PDF-');
  });
});
