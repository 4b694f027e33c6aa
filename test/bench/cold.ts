/**
 * One cold check for the engine benchmark (run.ts starts this in a fresh process per size): the
 * first check() of a process pays for compiling the engine's code as it runs, which a command-line
 * run in CI pays every time. Prints one JSON object: parseMs, firstMs (the cold check) and
 * secondMs (the same design again, in the same process).
 */
import { check } from '../../rules/check/check.ts';
import { generateDesign } from '../support/generator.ts';

const parts = Number(process.argv[2]);
const design = generateDesign(20261202 + parts, { parts, discretes: Number(process.env.BENCH_DISCRETES ?? 0.02) });
const text = JSON.stringify(design);
let t = performance.now();
const first = JSON.parse(text);
const parseMs = performance.now() - t;
t = performance.now();
check(first);
const firstMs = performance.now() - t;
const second = JSON.parse(text);
t = performance.now();
check(second);
const secondMs = performance.now() - t;
process.stdout.write(`${JSON.stringify({ parseMs, firstMs, secondMs })}\n`);
