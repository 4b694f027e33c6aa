// `npm run fuzz [-- --rounds=N]`: the property tests again and again with fresh random cases
// (`npm test` draws the same ones every time). It stops at the first failure; fast-check's
// message carries the seed, and RAILCROSS_SEED=<seed> npx vitest run <file> replays it.
import { spawnSync } from 'node:child_process';
import { readFileSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';

const arg = process.argv.find((a) => a.startsWith('--rounds='));
const rounds = arg ? Number(arg.slice('--rounds='.length)) : 20;

function testFiles(dir) {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) return testFiles(path);
    return /\.test\.tsx?$/.test(name) && readFileSync(path, 'utf8').includes("from 'fast-check'") ? [path] : [];
  });
}

const files = testFiles('test');
console.log(`${files.length} files with property tests, ${rounds} rounds`);
for (let i = 1; i <= rounds; i++) {
  const r = spawnSync('npx', ['vitest', 'run', '--reporter=dot', ...files], {
    stdio: ['ignore', 'pipe', 'pipe'],
    env: { ...process.env, RAILCROSS_FUZZ: '1' },
    encoding: 'utf8',
  });
  if (r.status !== 0) {
    process.stdout.write(r.stdout + r.stderr);
    console.log(`round ${i} of ${rounds} failed`);
    process.exit(1);
  }
  console.log(`round ${i} of ${rounds}: passed`);
}
