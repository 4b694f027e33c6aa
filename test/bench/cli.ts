/**
 * The command-line benchmark (`npm run bench:cli`, `-- --json`, `-- --runs=N`): not a test.
 * Whole processes, as a CI job runs them: the built command (dist-cli/railcross.mjs, rebuilt
 * first unless `--no-build`) on the example and on a seeded 10,000-part design, each run paired
 * with a bare `node` process that only reads and JSON.parses the same file (the floor), in
 * alternating order. Reports medians of wall time, CPU time (user + system) and peak resident
 * memory, and each stage's time inside the command (RAILCROSS_TIMING=1: read, validate, check,
 * report, render; with --pdf, the PDF's stages), every run a fresh process, so cold.
 */
import { spawnSync } from 'node:child_process';
import { copyFileSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import os, { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { generateDesign } from '../support/generator.ts';
import { median, round } from './stats.ts';

const ROOT = fileURLToPath(new URL('../..', import.meta.url));
const BIN = join(ROOT, 'dist-cli/railcross.mjs');
const json = process.argv.includes('--json');
const runsArg = process.argv.find((a) => a.startsWith('--runs='));
const RUNS = runsArg ? Number(runsArg.slice(7)) : 5;

if (!process.argv.includes('--no-build')) {
  const built = spawnSync('npm', ['run', 'build:cli', '--silent'], { cwd: ROOT, stdio: 'inherit' });
  if (built.status !== 0) throw new Error('npm run build:cli failed');
}

const dir = mkdtempSync(join(tmpdir(), 'railcross-bench-cli-'));
const usageFile = join(dir, 'usage.json');
// Preloaded into every measured process, the command and the floor alike: at exit it writes the
// process's own peak memory and CPU time (process.resourceUsage) for this script to read.
const preload = join(dir, 'usage.mjs');
writeFileSync(
  preload,
  `import { writeFileSync } from 'node:fs';
process.on('exit', () => { const u = process.resourceUsage(); writeFileSync(process.env.BENCH_USAGE, JSON.stringify({ maxRssKB: u.maxRSS, cpuUs: u.userCPUTime + u.systemCPUTime })); });
`,
);
const floor = join(dir, 'floor.mjs');
writeFileSync(floor, `import { readFileSync } from 'node:fs';\nJSON.parse(readFileSync(process.argv[2], 'utf8'));\n`);

const example = join(dir, 'greenhouse.json');
copyFileSync(join(ROOT, 'rules/examples/greenhouse.json'), example);
const big = join(dir, 'board-10000.json');
const bigDesign = generateDesign(20261202 + 10000, { parts: 10000 });
writeFileSync(big, JSON.stringify(bigDesign));

interface Sample {
  wallMs: number;
  cpuMs: number;
  maxRssMB: number;
  stages: Record<string, number>;
}

function once(args: string[]): Sample {
  rmSync(usageFile, { force: true });
  const t = performance.now();
  const r = spawnSync(process.execPath, ['--import', preload, ...args], {
    cwd: dir,
    encoding: 'utf8',
    env: { ...process.env, BENCH_USAGE: usageFile, RAILCROSS_TIMING: '1', SOURCE_DATE_EPOCH: '1767225600' },
    maxBuffer: 1 << 30,
  });
  const wallMs = performance.now() - t;
  if (r.status !== 0 && r.status !== 1) throw new Error(`${args.join(' ')}: exit ${r.status}\n${r.stderr}`);
  const usage = JSON.parse(readFileSync(usageFile, 'utf8')) as { maxRssKB: number; cpuUs: number };
  const stages: Record<string, number> = {};
  const line = /railcross: timing ms (.*)/.exec(r.stderr)?.[1] ?? '';
  for (const m of line.matchAll(/([\w-]+)=([\d.]+)/g)) stages[m[1]!] = Number(m[2]);
  return { wallMs, cpuMs: usage.cpuUs / 1000, maxRssMB: usage.maxRssKB / 1024, stages };
}

interface Case {
  name: string;
  file: string;
  args: string[];
}
const CASES: Case[] = [
  { name: 'example, text', file: example, args: ['check', example] },
  { name: 'example, --json', file: example, args: ['check', example, '--json'] },
  { name: 'example, --pdf', file: example, args: ['check', example, '--quiet', '--pdf', join(dir, 'r.pdf')] },
  { name: '10,000 parts, --json', file: big, args: ['check', big, '--json'] },
  { name: '10,000 parts, text', file: big, args: ['check', big] },
];

const summarize = (xs: Sample[]) => {
  const stageNames = [...new Set(xs.flatMap((x) => Object.keys(x.stages)))];
  return {
    wallMs: round(median(xs.map((x) => x.wallMs)), 1),
    cpuMs: round(median(xs.map((x) => x.cpuMs)), 1),
    maxRssMB: round(Math.max(...xs.map((x) => x.maxRssMB)), 1),
    stagesMs: Object.fromEntries(stageNames.map((s) => [s, round(median(xs.map((x) => x.stages[s] ?? NaN)), 1)])),
  };
};

const results = CASES.map((c) => {
  const cmd: Sample[] = [];
  const base: Sample[] = [];
  for (let k = 0; k < RUNS; k++) {
    // Alternate which goes first, so that a change in the machine's load falls on both alike.
    if (k % 2 === 0) {
      cmd.push(once([BIN, ...c.args]));
      base.push(once([floor, c.file]));
    } else {
      base.push(once([floor, c.file]));
      cmd.push(once([BIN, ...c.args]));
    }
  }
  const a = summarize(cmd);
  const b = summarize(base);
  return {
    case: c.name,
    command: a,
    floor: { wallMs: b.wallMs, cpuMs: b.cpuMs, maxRssMB: b.maxRssMB },
    ratioWall: round(a.wallMs / b.wallMs, 2),
    ratioCpu: round(a.cpuMs / b.cpuMs, 2),
  };
});
rmSync(dir, { recursive: true, force: true });

const machine = {
  node: process.version,
  cpus: os.cpus().length,
  cpu: os.cpus()[0]?.model ?? '?',
  loadAverage: os.loadavg().map((x) => round(x, 2)),
  runs: RUNS,
};
if (json) {
  process.stdout.write(
    `${JSON.stringify({ machine, parts: bigDesign.parts.length, nets: bigDesign.nets.length, results }, null, 2)}\n`,
  );
} else {
  console.log(
    `railcross CLI benchmark: ${RUNS} paired runs per case, medians; ${machine.cpus} CPUs, Node ${machine.node}, load ${machine.loadAverage.join(' ')}`,
  );
  console.log(`10,000-part design: ${bigDesign.parts.length} parts, ${bigDesign.nets.length} nets`);
  for (const r of results) {
    const c = r.command;
    console.log(
      `\n${r.case}: wall ${c.wallMs} ms (floor ${r.floor.wallMs} ms, ×${r.ratioWall}), CPU ${c.cpuMs} ms (floor ${r.floor.cpuMs} ms, ×${r.ratioCpu}), peak RSS ${c.maxRssMB} MB (floor ${r.floor.maxRssMB} MB)`,
    );
    console.log(
      `  stages (ms): ${Object.entries(c.stagesMs)
        .map(([k, v]) => `${k} ${v}`)
        .join(', ')}`,
    );
  }
}
