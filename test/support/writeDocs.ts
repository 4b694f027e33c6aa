/**
 * `npm run docs`: rewrites README.md's generated "Rules" section from the rules' metadata
 * (rules/checks/docs.ts). A README without the markers is refused, never guessed at; a missing
 * README is created with just the title and the markers.
 */
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { RULES_END, RULES_START, withRulesSection } from '../../rules/checks/docs.ts';

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
