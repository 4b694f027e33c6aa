/**
 * The entry of the built command (dist-cli/railcross.mjs, package.json "bin"): rules/cli/vite.config.ts
 * bundles this file and everything it imports into plain JavaScript, so no transpiler runs when
 * the command does.
 */
import process from 'node:process';
import { run } from './node.ts';

process.exitCode = await run(process.argv.slice(2));
