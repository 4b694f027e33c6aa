import { describe, expect, it } from 'vitest';
import { CURRENT_VERSION, migrate } from '../../rules/model/index.ts';
import { greenhouse } from './fixtures.ts';

describe('migrate', () => {
  it('the current version is 1 (design-format.md: "version 1")', () => {
    expect(CURRENT_VERSION).toBe(1);
  });

  it('returns a version-1 document itself, unchanged', () => {
    const d = greenhouse();
    const before = JSON.stringify(d);
    expect(migrate(d)).toBe(d);
    expect(JSON.stringify(d)).toBe(before);
  });

  const untouched: { name: string; value: unknown }[] = [
    { name: 'null', value: null },
    { name: 'a number', value: 3 },
    { name: 'a string', value: 'railcross.design' },
    { name: 'an array', value: [1, 2] },
    { name: 'no version', value: { format: 'railcross.design' } },
    { name: 'a version of another type', value: { version: '1' } },
    { name: 'a fractional version', value: { version: 0.5 } },
    { name: 'a version from the future', value: { version: 7 } },
    { name: 'a version no step starts from', value: { version: 0 } },
  ];
  it.each(untouched)('leaves $name for the reader to report', ({ value }) => {
    expect(migrate(value)).toBe(value);
  });
});
