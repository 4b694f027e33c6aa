#!/usr/bin/env node
// The `railcross` command (package.json "bin"). Node 20 cannot run TypeScript itself, so this
// shim loads the CLI through tsx (a runtime dependency). Everything is resolved from this
// file's own location, so the command works from any working directory, and tsx is pointed at
// the project's tsconfig rather than whatever the working directory holds.
import { fileURLToPath } from 'node:url';
import { tsImport } from 'tsx/esm/api';

const tsconfig = fileURLToPath(new URL('../../tsconfig.json', import.meta.url));
try {
  const { run } = await tsImport('./node.ts', { parentURL: import.meta.url, tsconfig });
  process.exitCode = await run(process.argv.slice(2));
} catch (error) {
  process.stderr.write(`railcross: could not start: ${error instanceof Error ? error.message : String(error)}\n`);
  process.exitCode = 2;
}
