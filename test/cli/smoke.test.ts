/**
 * The installed command itself, as a user runs it: `npx railcross` (package.json "bin" → the
 * tsx shim). Slow (each run starts Node and tsx), so only a few; main.test.ts covers the rest
 * in-process.
 */
import { spawnSync } from 'node:child_process';
import { copyFileSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';

const ROOT = fileURLToPath(new URL('../..', import.meta.url));
const SHIM = join(ROOT, 'rules/cli/railcross.mjs');
const EXAMPLE = join(ROOT, 'rules/examples/greenhouse.json');
const TIMEOUT = 60_000;
const away = mkdtempSync(join(tmpdir(), 'railcross-smoke-'));
afterAll(() => rmSync(away, { recursive: true, force: true }));

function spawn(cmd: string, args: string[], cwd: string) {
  // `--no`: npx must run the project's own bin, never fetch a package of that name.
  const r = spawnSync(cmd, args, { cwd, encoding: 'utf8', env: { ...process.env, SOURCE_DATE_EPOCH: '1767225600' }, timeout: TIMEOUT });
  return { status: r.status, out: r.stdout, err: r.stderr };
}

describe('npx railcross', () => {
  it('check the example --json, from the repository root: exit 1 and the report', () => {
    const r = spawn('npx', ['--no', 'railcross', 'check', 'rules/examples/greenhouse.json', '--json'], ROOT);
    expect(r.status, r.err).toBe(1);
    const report = JSON.parse(r.out) as { format: string; generatedAt: string; summary: { error: number } };
    expect(report.format).toBe('railcross.report');
    expect(report.generatedAt).toBe('2026-01-01T00:00:00.000Z');
    expect(report.summary.error).toBeGreaterThan(0);
  }, TIMEOUT);

  it('profiles: exit 0 and the library with sources', () => {
    const r = spawn('npx', ['--no', 'railcross', 'profiles'], ROOT);
    expect(r.status, r.err).toBe(0);
    expect(r.out).toMatch(/^ttl: Standard TTL/m);
    expect(r.out).toMatch(/^ {4}source +handbook/m);
  }, TIMEOUT);

  it('the bin from another working directory, with a relative file name', () => {
    copyFileSync(EXAMPLE, join(away, 'design.json'));
    const r = spawn(process.execPath, [SHIM, 'check', 'design.json', '--format', 'md'], away);
    expect(r.status, r.err).toBe(1);
    expect(r.out).toMatch(/^# Railcross check: Greenhouse irrigation controller$/m);
  }, TIMEOUT);

  it('check --pdf from another working directory: the PDF is written, the exit follows the findings', () => {
    copyFileSync(EXAMPLE, join(away, 'design.json'));
    const r = spawn(process.execPath, [SHIM, 'check', 'design.json', '--pdf', 'report.pdf', '--paper', 'letter'], away);
    expect(r.status, r.err).toBe(1);
    expect(readFileSync(join(away, 'report.pdf')).subarray(0, 5).toString('latin1')).toBe('%PDF-');
  }, TIMEOUT);
});
