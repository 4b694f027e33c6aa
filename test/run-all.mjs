// `npm test`: the type checks, the linter and formatter (Biome), every vitest test, then (when e2e/ has specs) the Playwright
// specs; it ends with one plain "N passed, N failed" line so that a run that executed no
// test is visible at a glance (neither runner prints such a line itself).
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, readdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

const out = mkdtempSync(join(tmpdir(), 'railcross-test-'));
let passed = 0;
let failed = 0;
let broken = false;

function run(label, cmd, args) {
  console.log(`\n▶ ${label}`);
  const r = spawnSync(cmd, args, { stdio: 'inherit', shell: false });
  if (r.status !== 0) broken = true;
  return r.status;
}

function readCounts(file) {
  if (!existsSync(file)) {
    broken = true;
    return;
  }
  const j = JSON.parse(readFileSync(file, 'utf8'));
  passed += j.numPassedTests ?? j.stats?.expected ?? 0;
  failed += j.numFailedTests ?? (j.stats?.unexpected ?? 0) + (j.stats?.flaky ?? 0);
}

run('typecheck', 'npx', ['tsc', '-p', 'tsconfig.json', '--noEmit']);
run('typecheck rules/ (no DOM)', 'npx', ['tsc', '-p', 'rules/tsconfig.json', '--noEmit']);
run('lint and format (Biome, biome.jsonc)', 'npx', ['biome', 'ci', '.']);

const unitJson = join(out, 'vitest.json');
run('vitest', 'npx', ['vitest', 'run', '--reporter=default', '--reporter=json', `--outputFile.json=${unitJson}`]);
readCounts(unitJson);

const specs = existsSync('e2e') ? readdirSync('e2e').filter((f) => f.endsWith('.spec.ts')) : [];
if (specs.length > 0) {
  const e2eJson = join(out, 'playwright.json');
  console.log('\n▶ playwright');
  const r = spawnSync('npx', ['playwright', 'test', '-c', 'e2e/playwright.config.ts', '--reporter=list,json'], {
    stdio: 'inherit',
    env: { ...process.env, PLAYWRIGHT_JSON_OUTPUT_NAME: e2eJson },
  });
  if (r.status !== 0) broken = true;
  readCounts(e2eJson);
}

console.log('');
console.log(`${passed} passed, ${failed} failed`);
process.exit(broken || failed > 0 || passed === 0 ? 1 : 0);
