import { describe, expect, it } from 'vitest';
import { formatPath, resolveRailRange, type PathSegment } from '../../rules/model/index.ts';

describe('formatPath', () => {
  const cases: { segments: PathSegment[]; path: string }[] = [
    { segments: [], path: '(root)' },
    { segments: ['title'], path: 'title' },
    { segments: ['nets', 3, 'pins', 1], path: 'nets[3].pins[1]' },
    { segments: ['nets', 0, 'route', 2, 1], path: 'nets[0].route[2][1]' },
    { segments: ['parts', 0, 'odd key'], path: 'parts[0]["odd key"]' },
    { segments: ['parts', 0, '__proto__'], path: 'parts[0].__proto__' },
    { segments: ['a"b'], path: '["a\\"b"]' },
  ];
  it.each(cases)('$path', ({ segments, path }) => {
    expect(formatPath(segments)).toBe(path);
  });
});

describe('resolveRailRange (design-format.md: nominal × (1 ± tolerance), default 0.05, explicit ends win)', () => {
  const cases: { name: string; rail: Parameters<typeof resolveRailRange>[0]; min: number; max: number }[] = [
    { name: 'default tolerance', rail: { nominal: 3.3 }, min: 3.135, max: 3.465 },
    { name: 'given tolerance', rail: { nominal: 5, tolerance: 0.1 }, min: 4.5, max: 5.5 },
    { name: 'explicit min wins for its end only', rail: { nominal: 5, min: 4.5 }, min: 4.5, max: 5.25 },
    { name: 'explicit max wins for its end only', rail: { nominal: 1.8, tolerance: 0, max: 1.9 }, min: 1.8, max: 1.9 },
    {
      name: 'undefined fields count as absent',
      rail: { nominal: 2.5, tolerance: undefined, min: undefined },
      min: 2.375,
      max: 2.625,
    },
    {
      name: 'an explicit inverted range is returned as given',
      rail: { nominal: 3, min: 3.3, max: 3.1 },
      min: 3.3,
      max: 3.1,
    },
  ];
  it.each(cases)('$name', ({ rail, min, max }) => {
    const r = resolveRailRange(rail);
    expect(r.min).toBeCloseTo(min, 12);
    expect(r.max).toBeCloseTo(max, 12);
  });
});
