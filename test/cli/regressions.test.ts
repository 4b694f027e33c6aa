/**
 * The regression files of issue 14 (test/fixtures/regressions/): each design file goes through
 * main() as `railcross check FILE ARGS` and must give the exit status and the output its entry
 * in expected.json names. A file without an entry, or an entry without a file, fails.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { main } from '../../rules/cli/main.ts';
import { fakeIo } from './fakeIo.ts';

interface Expected {
  why: string;
  args: string[];
  exit: 0 | 1 | 2;
  stdout?: string[];
  stderr?: string[];
  pdf?: string;
}

const DIR = new URL('../fixtures/regressions/', import.meta.url);
const expected = JSON.parse(readFileSync(new URL('expected.json', DIR), 'utf8')) as Record<string, Expected | string>;
const files = readdirSync(DIR)
  .filter((f) => f.endsWith('.railcross.json'))
  .sort();
const entries = Object.entries(expected).filter((e): e is [string, Expected] => typeof e[1] === 'object');

describe('regression files', () => {
  it('every file has an entry and every entry a file', () => {
    expect(entries.map(([f]) => f).sort()).toEqual(files);
  });

  // Generous: the PDF case writes a dozen pages on a loaded machine. Never a speed assertion;
  // the quadratic Markdown of old would take minutes and exceed it.
  it.each(entries)('%s', { timeout: 60_000 }, async (file, e) => {
    const io = fakeIo({ [file]: readFileSync(new URL(file, DIR), 'utf8') }, { SOURCE_DATE_EPOCH: '1767225600' });
    const status = await main(['check', file, ...e.args], io);
    expect(status, `${e.why}\n${io.err}`).toBe(e.exit);
    for (const s of e.stdout ?? []) expect(io.out).toContain(s);
    for (const s of e.stderr ?? []) expect(io.err).toContain(s);
    if (e.exit !== 2) expect(io.err).not.toContain('internal error');
    if (e.pdf !== undefined) {
      const bytes = io.binaries.get(e.pdf);
      expect(bytes, 'the PDF was written').toBeDefined();
      expect(Buffer.from(bytes!.slice(0, 5)).toString('latin1')).toBe('%PDF-');
    }
  });
});
