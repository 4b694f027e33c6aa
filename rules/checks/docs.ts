/**
 * The README's "Rules" section, generated from the rules' own metadata so that the
 * documentation cannot drift from the code (house-style.md: every rule is registered,
 * documented and tested). `npm run docs` writes it; test/checks/registry.test.ts holds the
 * README to it.
 */
import { severityText, type AnyRule } from './defineRule.ts';
import { RULES } from './index.ts';

/** The marker lines around the generated section in README.md. */
export const RULES_START = '<!-- rules:start -->';
export const RULES_END = '<!-- rules:end -->';

// The metadata is written for people reading reports; Markdown must not read a `*`, `_`, `[`
// or backtick in it as markup, nor `<x` as the start of an HTML tag ("NMH < 0" is left alone).
function plain(text: string): string {
  return text.replace(/[\\`*_[\]]/g, '\\$&').replace(/<(?=[A-Za-z/!?])/g, '\\<');
}

function ruleMarkdown(rule: AnyRule): string {
  const { title, severity, explanation, hint } = rule.meta;
  return [
    `### \`${rule.id}\` — ${plain(title)}`,
    `**Severity:** ${plain(severityText(severity))}.`,
    plain(explanation),
    `**Usual remedy:** ${plain(hint)}`,
  ].join('\n\n');
}

/**
 * The "Rules" section in Markdown, ending in a newline: one `###` heading per rule, in registry
 * (catalogue) order, with its severity, explanation and usual remedy. The README's own `##`
 * heading and introduction stand around it.
 */
export function rulesMarkdown(rules: readonly AnyRule[] = RULES): string {
  return `${rules.map(ruleMarkdown).join('\n\n')}\n`;
}

/** What stands between the two markers: the section with a blank line around it. */
export function rulesSection(rules: readonly AnyRule[] = RULES): string {
  return `\n\n${rulesMarkdown(rules)}\n`;
}

/** The text between the markers of a README, or undefined unless each marker occurs once, in order. */
export function readRulesSection(readme: string): string | undefined {
  const start = readme.indexOf(RULES_START);
  const end = readme.indexOf(RULES_END);
  if (start < 0 || end < start) return undefined;
  if (readme.indexOf(RULES_START, start + 1) >= 0 || readme.indexOf(RULES_END, end + 1) >= 0) return undefined;
  return readme.slice(start + RULES_START.length, end);
}

/**
 * The README with its section between the markers replaced by the generated one; undefined when
 * the markers are missing, repeated or out of order (the file is then not touched).
 */
export function withRulesSection(readme: string, rules: readonly AnyRule[] = RULES): string | undefined {
  if (readRulesSection(readme) === undefined) return undefined;
  const start = readme.indexOf(RULES_START) + RULES_START.length;
  const end = readme.indexOf(RULES_END);
  return readme.slice(0, start) + rulesSection(rules) + readme.slice(end);
}
