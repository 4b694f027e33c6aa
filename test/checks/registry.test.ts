/**
 * Every rule is registered, documented and tested (house-style.md): the registry, the rule ids
 * of the design format, the rule files, their test tables and the README's generated section
 * agree.
 */
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { RULES } from '../../rules/checks/index.ts';
import { declaredSeverities, type AnyRule } from '../../rules/checks/defineRule.ts';
import { RULE_IDS } from '../../rules/model/ruleIds.ts';
import {
  readRulesSection,
  RULES_END,
  RULES_START,
  rulesMarkdown,
  rulesSection,
  withRulesSection,
} from '../../rules/checks/docs.ts';

const root = new URL('../../', import.meta.url);
const exists = (path: string) => existsSync(new URL(path, root));

describe('the rule registry', () => {
  it('holds the catalogue ids, in catalogue order', () => {
    expect(RULES.map((r) => r.id)).toEqual([...RULE_IDS]);
  });

  it('registers every rule module in rules/checks', async () => {
    // A module whose default export is a rule is a rule file; every other module exports by name.
    const files = readdirSync(new URL('rules/checks/', root)).filter((f) => f.endsWith('.ts'));
    const ruleFiles: string[] = [];
    for (const f of files) {
      const module = (await import(`../../rules/checks/${f.slice(0, -3)}.ts`)) as { default?: unknown };
      if (module.default !== undefined) ruleFiles.push(f);
    }
    expect(ruleFiles.sort()).toEqual(RULE_IDS.map((id) => `${id}.ts`).sort());
  });

  it.each(RULES.map((rule) => [rule.id, rule] as const))(
    '%s is the default export of rules/checks/%s.ts',
    async (id, rule) => {
      const module = (await import(`../../rules/checks/${id}.ts`)) as { default: AnyRule };
      expect(module.default).toBe(rule);
    },
  );

  it.each(RULE_IDS.map((id) => [id, id]))('%s has its test table test/checks/%s.test.ts', (id) => {
    expect(exists(`test/checks/${id}.test.ts`), `test/checks/${id}.test.ts`).toBe(true);
  });

  it.each(RULES.map((rule) => [rule.id, rule] as const))('%s documents itself in its meta', (_id, rule) => {
    const { title, severity, explanation, hint, messages } = rule.meta;
    const problems: string[] = [];
    for (const [key, text] of Object.entries({ title, explanation, hint })) {
      if (typeof text !== 'string' || text.trim() === '') problems.push(`${key} is empty`);
    }
    if (declaredSeverities(severity).length === 0) problems.push('declares no severity');
    const ids = Object.keys(messages);
    if (ids.length === 0) problems.push('no messages');
    for (const m of ids) if (typeof messages[m] !== 'function') problems.push(`message ${m} is not a function`);
    expect(problems).toEqual([]);
  });
});

describe("the README's rules section", () => {
  it('is what the rules generate (run npm run docs when this fails)', () => {
    const readme = readFileSync(new URL('README.md', root), 'utf8');
    const section = readRulesSection(readme);
    expect(section, `README.md needs ${RULES_START} and ${RULES_END}, once each, in order`).toBeDefined();
    expect(section, 'README.md is out of date: run npm run docs').toBe(rulesSection());
  });

  it('holds one heading per rule, in registry order, each with its severity, explanation and remedy', () => {
    const md = rulesMarkdown();
    const headings = md.split('\n').filter((l) => l.startsWith('### '));
    expect(headings).toEqual(RULES.map((r) => `### \`${r.id}\` — ${r.meta.title}`));
    for (const r of RULES) {
      const block = md.slice(md.indexOf(`### \`${r.id}\``)).split('\n### ')[0]!;
      expect(block, r.id).toContain('**Severity:** ');
      expect(block, r.id).toContain('**Usual remedy:** ');
    }
  });

  const fake = [
    {
      id: 'level-high',
      meta: {
        title: 'A *starred* title',
        severity: { error: 'when x < 0', warning: 'when x < 1' },
        explanation: 'An <input> with a `tick` and [brackets].',
        hint: 'Fix it.',
        messages: { m: () => '' },
      },
    },
  ] as unknown as AnyRule[];

  it.each([
    // Markup characters in the metadata are escaped; a bare "<" before a space is left alone.
    ['title', '### `level-high` — A \\*starred\\* title'],
    ['severity', '**Severity:** error when x < 0; warning when x < 1.'],
    ['explanation', 'An \\<input> with a \\`tick\\` and \\[brackets\\].'],
    ['remedy', '**Usual remedy:** Fix it.'],
  ])('writes the %s line as Markdown', (_what, line) => {
    expect(rulesMarkdown(fake).split('\n')).toContain(line);
  });

  it.each([
    ['no markers', '# R\n'],
    ['the end marker only', `# R\n${RULES_END}\n`],
    ['markers out of order', `${RULES_END}\n${RULES_START}\n`],
    ['a repeated start marker', `${RULES_START}\n${RULES_START}\n${RULES_END}\n`],
    ['a repeated end marker', `${RULES_START}\n${RULES_END}\n${RULES_END}\n`],
  ])('refuses a README with %s', (_name, readme) => {
    expect(withRulesSection(readme)).toBeUndefined();
  });

  it('replaces only what stands between the markers', () => {
    const readme = `# R\n\nbefore\n\n${RULES_START}\nstale\n${RULES_END}\n\nafter\n`;
    expect(withRulesSection(readme, fake)).toBe(
      `# R\n\nbefore\n\n${RULES_START}${rulesSection(fake)}${RULES_END}\n\nafter\n`,
    );
    expect(rulesSection(fake)).toBe(`\n\n${rulesMarkdown(fake)}\n`);
  });
});
