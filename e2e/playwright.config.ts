import { fileURLToPath } from 'node:url';
import { defineConfig, devices } from '@playwright/test';

// Debian's Chromium (stack.md): Playwright cannot download its own browsers here.
export default defineConfig({
  testDir: '.',
  timeout: 60_000,
  expect: { timeout: 10_000 },
  fullyParallel: false,
  workers: 1,
  retries: 0,
  use: { baseURL: 'http://127.0.0.1:4173', viewport: { width: 1440, height: 900 }, screenshot: 'only-on-failure' },
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
    command: 'npx vite build && npx vite preview --port 4173 --strictPort --host 127.0.0.1',
    // The repository's root, where index.html and vite.config.ts are (the default is this folder).
    cwd: fileURLToPath(new URL('..', import.meta.url)),
    url: 'http://127.0.0.1:4173',
    reuseExistingServer: !process.env.CI,
    timeout: 120_000,
  },
});
