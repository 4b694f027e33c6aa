/** After the browser tests: the run's own build folder (see playwright.config.ts) goes. */
import { rmSync } from 'node:fs';

export default function teardown(): void {
  const dir = process.env.RAILCROSS_E2E_OUT;
  if (dir !== undefined && dir !== '') rmSync(dir, { recursive: true, force: true });
}
