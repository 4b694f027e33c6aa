/**
 * The engine benchmark (`npm run bench`, `npm run bench -- --json`): not a test. For seeded
 * synthetic designs of 100, 1,000 and 10,000 parts it measures, as medians over repetitions:
 * parseMs (JSON.parse of the design file: the floor), fullMs (a full check), editMs (single
 * edits of every kind re-checked incrementally) and heapMB (heap in use after a full check);
 * coldMs is the first check of a fresh process (cold.ts, median of three processes), as a
 * command-line run in CI pays it, with coldOverParse against the same process's parse.
 */
import { spawnSync } from 'node:child_process';
import os from 'node:os';
import { check } from '../../rules/check/check.ts';
import type { CheckResult } from '../../rules/engine/types.ts';
import type { Design } from '../../rules/model/schema.ts';
import { applyEdit, EDIT_KINDS, generateDesign, rng } from '../support/generator.ts';
import { median, round as roundTo } from './stats.ts';

const json = process.argv.includes('--json');
const sizesArg = process.argv.find((a) => a.startsWith('--sizes='));
const SIZES = sizesArg ? sizesArg.slice(8).split(',').map(Number) : [100, 1000, 10000];
const EDITS = 200;
const gc = (globalThis as { gc?: () => void }).gc;

const round = (x: number, d = 3) => roundTo(x, d);

/** The first check in each of three fresh processes: the median by cold time. */
function coldRuns(parts: number): { parseMs: number; firstMs: number } {
  const runs: { parseMs: number; firstMs: number }[] = [];
  for (let k = 0; k < 3; k++) {
    const r = spawnSync(
      process.execPath,
      ['--import', 'tsx', new URL('./cold.ts', import.meta.url).pathname, String(parts)],
      {
        encoding: 'utf8',
        env: process.env,
      },
    );
    if (r.status !== 0) throw new Error(`cold run failed: ${r.stderr}`);
    runs.push(JSON.parse(r.stdout));
  }
  runs.sort((a, b) => a.firstMs - b.firstMs);
  return runs[1]!;
}

function measure(parts: number) {
  // Two nets in a hundred joined by a part between chips (a resistor, a FET or diode shifter).
  const design = generateDesign(20261202 + parts, { parts, discretes: Number(process.env.BENCH_DISCRETES ?? 0.02) });
  const text = JSON.stringify(design);
  const reps = parts >= 10000 ? 7 : parts >= 1000 ? 15 : 41;

  const parseTimes: number[] = [];
  const fullTimes: number[] = [];
  let heapMB = 0;
  let last: CheckResult | undefined;
  let lastDesign: Design = design;
  for (let k = 0; k < reps; k++) {
    let t = performance.now();
    const fresh = JSON.parse(text) as Design;
    parseTimes.push(performance.now() - t);
    gc?.();
    t = performance.now();
    last = check(fresh);
    fullTimes.push(performance.now() - t);
    lastDesign = fresh;
  }
  if (gc !== undefined) {
    gc();
    heapMB = process.memoryUsage().heapUsed / 2 ** 20;
  }

  // Single edits, every kind in turn, each re-checked against the previous result.
  const editTimes: number[] = [];
  const r = rng(parts);
  let current = lastDesign;
  let result = last!;
  for (let k = 0; k < EDITS; k++) {
    const kind = EDIT_KINDS[k % EDIT_KINDS.length]!;
    const next = applyEdit(current, kind, r);
    const t = performance.now();
    result = check(next, result);
    editTimes.push(performance.now() - t);
    current = next;
  }
  const cold = coldRuns(parts);
  const pins = design.parts.reduce((n, p) => n + p.pins.length, 0);
  const parseMs = median(parseTimes);
  const fullMs = median(fullTimes);
  const editMs = median(editTimes);
  return {
    parts,
    pins,
    nets: design.nets.length,
    parseMs: round(parseMs),
    fullMs: round(fullMs),
    editMs: round(editMs),
    heapMB: round(heapMB, 1),
    fullOverParse: round(fullMs / parseMs, 2),
    fullOverEdit: round(fullMs / editMs, 1),
    coldMs: round(cold.firstMs),
    coldOverParse: round(cold.firstMs / cold.parseMs, 2),
  };
}

const machine = {
  cpus: os.cpus().length,
  cpu: os.cpus()[0]?.model ?? 'unknown',
  memoryGB: round(os.totalmem() / 2 ** 30, 1),
  node: process.version,
  gc: gc !== undefined,
};
const sizes = SIZES.map(measure);
if (json) {
  process.stdout.write(`${JSON.stringify({ machine, sizes })}\n`);
} else {
  console.log(
    `Railcross engine benchmark — ${machine.cpus} × ${machine.cpu}, Node ${machine.node}${gc ? '' : ' (run with --expose-gc for heapMB)'}`,
  );
  console.table(sizes);
}
