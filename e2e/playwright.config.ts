import { fileURLToPath } from 'node:url';
import { defineConfig, devices } from '@playwright/test';

// Debian's Chromium (stack.md): Playwright cannot download its own browsers here.
// The suite serves its own build on a port of its own (RAILCROSS_E2E_PORT, 4180 unless set), so
// that `npm test` runs while `npm start` serves on 4173 and several work trees can test at once.
const port = Number(process.env.RAILCROSS_E2E_PORT ?? 4180);
const origin = `http://127.0.0.1:${port}`;

export default defineConfig({
  testDir: '.',
  timeout: 60_000,
  expect: { timeout: 10_000 },
  fullyParallel: false,
  workers: 1,
  retries: 0,
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
    command: `npx vite build && npx vite preview --port ${port} --strictPort --host 127.0.0.1`,
    // The repository's root, where index.html and vite.config.ts are (the default is this folder).
    cwd: fileURLToPath(new URL('..', import.meta.url)),
    url: origin,
    // Never another tree's server: a stale build on the port would be tested instead of this one.
    reuseExistingServer: false,
    timeout: 120_000,
  },
});
