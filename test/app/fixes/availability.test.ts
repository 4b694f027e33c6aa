/**
 * Whether a finding may have a quick fix is decided in one place (`mayHaveFixes`): the findings
 * list shows "Fix…" by it, and `fixesFor` offers nothing where it says no.
 */
import { describe, expect, it } from 'vitest';
import { exampleDesign } from '../../../app/example.ts';
import { fixesFor, mayHaveFixes } from '../../../app/store/commands/fixes/index.ts';
import { check } from '../../../rules/check/check.ts';
import type { Finding } from '../../../rules/engine/types.ts';
import { generateDesign } from '../../support/generator.ts';

const designs = [
  exampleDesign(),
  ...[3, 17, 29, 41].map((seed) => generateDesign(seed, { parts: 30, faultRate: 0.5 })),
];

describe('fix availability', () => {
  it.each(designs.map((d, k) => [k === 0 ? 'the example' : `generated board ${k}`, d] as const))(
    '%s: fixes only where mayHaveFixes says so',
    (_name, design) => {
      const result = check(design);
      let offered = 0;
      for (const f of result.findings) {
        const fixes = fixesFor(f, design, result);
        if (!mayHaveFixes(f)) expect(fixes, f.id).toEqual([]);
        offered += fixes.length;
      }
      if (_name === 'the example') expect(offered).toBeGreaterThan(0);
    },
  );

  const base = {
    id: 'x',
    scenario: 'all-on',
    net: 'N',
    place: 'N',
    pins: [],
    parts: [],
    message: '',
    values: {},
    hint: '',
  };
  it.each([
    ['a waived level-high', { ...base, rule: 'level-high', severity: 'error', messageId: 'fail', waived: 'ok' }, false],
    ['a level-high error', { ...base, rule: 'level-high', severity: 'error', messageId: 'fail' }, true],
    ['a pull-range in range (info)', { ...base, rule: 'pull-range', severity: 'info', messageId: 'inRange' }, false],
    ['a pull-range out of range', { ...base, rule: 'pull-range', severity: 'error', messageId: 'tooHigh' }, true],
    ['a push-pull fight', { ...base, rule: 'contention', severity: 'error', messageId: 'fight' }, false],
    [
      'shared three-state enables',
      { ...base, rule: 'contention', severity: 'warning', messageId: 'enablesNeeded' },
      true,
    ],
    ['a drive-load error', { ...base, rule: 'drive-load', severity: 'error', messageId: 'x' }, false],
  ] as const)('%s', (_name, finding, expected) => {
    expect(mayHaveFixes(finding as unknown as Finding)).toBe(expected);
  });
});
