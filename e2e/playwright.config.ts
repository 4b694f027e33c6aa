import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { defineConfig, devices } from '@playwright/test';
import { freePort } from './freePort.ts';

// Debian's Chromium (stack.md): Playwright cannot download its own browsers here.
// The suite serves its own build on a port of its own, so that `npm test` runs while `npm start`
// serves on 4173 and several runs (work trees) test at once: RAILCROSS_E2E_PORT when set, else a
// free port. This file is read again in every worker process; the port chosen in the first
// process is put in the environment, which the workers inherit, so that all of them agree.
if ((process.env.RAILCROSS_E2E_PORT ?? '') === '') process.env.RAILCROSS_E2E_PORT = String(await freePort());
const port = Number(process.env.RAILCROSS_E2E_PORT);
if (!Number.isInteger(port) || port <= 0 || port > 65535)
  throw new Error(`RAILCROSS_E2E_PORT must be a port number, not "${process.env.RAILCROSS_E2E_PORT}"`);
const origin = `http://127.0.0.1:${port}`;
// The build goes to a folder of this run's own (named by its port), not dist/: a run must not
// rewrite the files that `npm start`, or another run in the same tree, is serving meanwhile.
// teardown.ts removes it at the end.
const outDir = join(tmpdir(), `railcross-e2e-${port}`);
process.env.RAILCROSS_E2E_OUT = outDir;

export default defineConfig({
  testDir: '.',
  timeout: 60_000,
  expect: { timeout: 10_000 },
  fullyParallel: false,
  workers: 1,
  retries: 0,
  globalTeardown: './teardown.ts',
  use: { baseURL: origin, viewport: { width: 1440, height: 900 }, screenshot: 'only-on-failure' },
  projects: [
    {
      name: 'chromium',
      use: {
        ...devices['Desktop Chrome'],
        viewport: { width: 1440, height: 900 },
        launchOptions: {
          executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
          args: ['--no-sandbox', '--headless=new', '--disable-gpu', '--disable-dev-shm-usage'],
        },
      },
    },
  ],
  webServer: {
    command: `npx vite build --outDir ${JSON.stringify(outDir)} --emptyOutDir && npx vite preview --outDir ${JSON.stringify(outDir)} --port ${port} --strictPort --host 127.0.0.1`,
    // The repository's root, where index.html and vite.config.ts are (the default is this folder).
    cwd: fileURLToPath(new URL('..', import.meta.url)),
    url: origin,
    // Never another tree's server: a stale build on the port would be tested instead of this one.
    reuseExistingServer: false,
    timeout: 120_000,
  },
});
