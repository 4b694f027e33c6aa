/**
 * `npm run docs`: regenerates everything the project writes from its own code: the JSON Schema
 * files of this folder (as `npm run schema` does) and README.md's "Rules" section from the
 * rules' metadata (rules/checks/docs.ts). A README without the markers is refused, never guessed
 * at; a missing README is created with just the title and the markers. Tests fail while any of
 * them is stale (test/schema, test/checks/registry.test.ts).
 */
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { RULES_END, RULES_START, withRulesSection } from '../checks/docs.ts';
import { writeSchemaFiles } from './generate.ts';

for (const path of writeSchemaFiles()) console.log(`wrote ${path}`);

const path = new URL('../../README.md', import.meta.url);
const before = existsSync(path) ? readFileSync(path, 'utf8') : `# Railcross\n\n${RULES_START}\n${RULES_END}\n`;
const after = withRulesSection(before);
if (after === undefined) {
  console.error(`README.md needs the lines ${RULES_START} and ${RULES_END}, each once and in that order.`);
  process.exit(1);
}
if (after === before && existsSync(path)) {
  console.log('README.md: the rules section is up to date.');
} else {
  writeFileSync(path, after);
  console.log('README.md: the rules section was rewritten.');
}
