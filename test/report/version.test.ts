import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { TOOL_NAME, TOOL_VERSION } from '../../rules/report/version.ts';

describe('tool version', () => {
  const pkg = JSON.parse(readFileSync(new URL('../../package.json', import.meta.url), 'utf8')) as { version: string };

  it.each([
    ['TOOL_VERSION equals package.json version', TOOL_VERSION, pkg.version],
    ['TOOL_NAME is "railcross" and that version', TOOL_NAME, `railcross ${pkg.version}`],
  ])('%s', (_name, actual, expected) => {
    expect(actual).toBe(expected);
  });

  it('is a plain X.Y.Z version (the report schema requires one)', () => {
    expect(TOOL_VERSION).toMatch(/^\d+\.\d+\.\d+$/);
  });
});
