/**
 * The packed command, as a user gets it: `npm pack` (which builds dist-cli/ through the
 * `prepare` script), installed offline into an empty folder, and run there with `npx railcross`.
 * Each run starts a Node process, so only a few; main.test.ts covers the options in-process.
 */
import { spawnSync } from 'node:child_process';
import { copyFileSync, existsSync, mkdirSync, mkdtempSync, readFileSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

const ROOT = fileURLToPath(new URL('../..', import.meta.url));
const EXAMPLE = join(ROOT, 'rules/examples/greenhouse.json');
// Generous: on a machine shared with other work, npm and a cold Node can take many seconds.
const TIMEOUT = 240_000;
const work = mkdtempSync(join(tmpdir(), 'railcross-pack-'));
const home = join(work, 'home');
afterAll(() => rmSync(work, { recursive: true, force: true }));

function spawn(cmd: string, args: string[], cwd: string) {
  const env = { ...process.env, SOURCE_DATE_EPOCH: '1767225600' };
  const r = spawnSync(cmd, args, { cwd, encoding: 'utf8', env, timeout: TIMEOUT });
  return { status: r.status, out: r.stdout, err: `${r.stderr}${r.error === undefined ? '' : String(r.error)}` };
}

/** `npx --no`: npx must run the installed bin, never fetch a package of that name. */
const npx = (args: string[], cwd = home) => spawn('npx', ['--no', 'railcross', ...args], cwd);

beforeAll(() => {
  const packed = spawn('npm', ['pack', '--pack-destination', work, '--no-audit', '--no-fund'], ROOT);
  expect(packed.status, packed.err).toBe(0);
  const tgz = readdirSync(work).find((f) => f.endsWith('.tgz'));
  expect(tgz).toBeDefined();
  mkdirSync(home);
  // An empty folder, no network: everything the command needs must be in the tarball.
  const installed = spawn(
    'npm',
    ['install', '--offline', '--no-audit', '--no-fund', '--no-package-lock', join(work, tgz!)],
    home,
  );
  expect(installed.status, installed.err).toBe(0);
  copyFileSync(EXAMPLE, join(home, 'design.json'));
}, TIMEOUT);

describe('the packed package, installed into an empty folder', () => {
  it('installs the command alone: no other package, no transpiler', () => {
    expect(readdirSync(join(home, 'node_modules')).filter((f) => !f.startsWith('.'))).toEqual(['railcross']);
    const pkg = JSON.parse(readFileSync(join(home, 'node_modules/railcross/package.json'), 'utf8')) as {
      bin: Record<string, string>;
    };
    expect(pkg.bin.railcross).toMatch(/\.mjs$/);
    const bin = readFileSync(join(home, 'node_modules/railcross', pkg.bin.railcross!), 'utf8');
    expect(bin.startsWith('#!/usr/bin/env node\n')).toBe(true);
    // Only Node's own modules are imported by name; the rest is bundled.
    const bare = [...bin.matchAll(/\bfrom\s*"([^".][^"]*)"/g)].map((m) => m[1]!).filter((s) => !s.startsWith('node:'));
    expect(bare).toEqual([]);
  });

  it(
    'npx railcross check FILE --json: exit 1 (the example has errors) and the report',
    () => {
      const r = npx(['check', 'design.json', '--json']);
      expect(r.status, r.err).toBe(1);
      const report = JSON.parse(r.out) as { format: string; generatedAt: string; summary: { error: number } };
      expect(report.format).toBe('railcross.report');
      expect(report.generatedAt).toBe('2026-01-01T00:00:00.000Z');
      expect(report.summary.error).toBeGreaterThan(0);
      expect(r.err).toBe('');
    },
    TIMEOUT,
  );

  it(
    'npx railcross check FILE: the text report',
    () => {
      const r = npx(['check', 'design.json']);
      expect(r.status, r.err).toBe(1);
      expect(r.out).toMatch(/^Railcross check: Greenhouse irrigation controller$/m);
    },
    TIMEOUT,
  );

  it(
    'npx railcross check FILE --pdf: the PDF, with the fonts the package carries',
    () => {
      const r = npx(['check', 'design.json', '--pdf', 'report.pdf', '--paper', 'letter', '--quiet']);
      expect(r.status, r.err).toBe(1);
      expect(readFileSync(join(home, 'report.pdf')).subarray(0, 5).toString('latin1')).toBe('%PDF-');
    },
    TIMEOUT,
  );

  it(
    'profiles: exit 0 and the library with sources',
    () => {
      const r = npx(['profiles']);
      expect(r.status, r.err).toBe(0);
      expect(r.out).toMatch(/^ttl: Standard TTL/m);
    },
    TIMEOUT,
  );

  it(
    'an invalid file: exit 2 and the place on stderr',
    () => {
      const r = npx(['check', 'missing.json']);
      expect(r.status).toBe(2);
      expect(r.err).toMatch(/cannot read missing\.json/);
    },
    TIMEOUT,
  );
});

describe("the repository's own bin (built by npm install, or by the pack above)", () => {
  it(
    'npx railcross from the repository root',
    () => {
      expect(existsSync(join(ROOT, 'dist-cli/railcross.mjs'))).toBe(true);
      const r = npx(['check', 'rules/examples/greenhouse.json', '--format', 'md'], ROOT);
      expect(r.status, r.err).toBe(1);
      expect(r.out).toMatch(/^# Railcross check: Greenhouse irrigation controller$/m);
    },
    TIMEOUT,
  );
});
