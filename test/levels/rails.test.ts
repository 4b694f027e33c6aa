/** Rail ranges (design-format.md, Rail) and the corner enumeration of rules-catalogue.md. */
import { describe, expect, it } from 'vitest';
import { corners, railRange } from '../../rules/levels/rails.ts';

describe('railRange', () => {
  const cases: [string, Parameters<typeof railRange>[0], number, number][] = [
    ['5 % by default', { nominal: 5 }, 4.75, 5.25],
    ['a given tolerance', { nominal: 3.3, tolerance: 0.1 }, 2.97, 3.63],
    ['an explicit min wins for its end only', { nominal: 5, min: 4.5 }, 4.5, 5.25],
    ['an explicit max wins for its end only', { nominal: 5, tolerance: 0.1, max: 5.1 }, 4.5, 5.1],
    ['a zero tolerance is one value', { nominal: 1.8, tolerance: 0 }, 1.8, 1.8],
  ];
  it.each(cases)('%s', (_n, rail, min, max) => {
    const r = railRange(rail);
    expect(r.min).toBeCloseTo(min, 12);
    expect(r.max).toBeCloseTo(max, 12);
  });
});

describe('corners', () => {
  const ranges = new Map([
    ['5v0', { min: 4.75, max: 5.25 }],
    ['3v3', { min: 3.135, max: 3.465 }],
    ['off', { min: 0, max: 0 }],
  ]);
  const flat = (ids: string[]) => corners(ids, ranges).map((c) => ids.map((id) => c.get(id)));

  it('pins on one rail share one VDD: two corners, not four', () => {
    expect(flat(['5v0', '5v0'])).toEqual([
      [4.75, 4.75],
      [5.25, 5.25],
    ]);
  });
  it('two rails are taken independently: four corners', () => {
    expect(flat(['3v3', '5v0'])).toEqual([
      [3.135, 4.75],
      [3.135, 5.25],
      [3.465, 4.75],
      [3.465, 5.25],
    ]);
  });
  it('an off rail contributes one value, 0 V', () => {
    expect(flat(['off', '3v3'])).toEqual([
      [0, 3.135],
      [0, 3.465],
    ]);
  });
  it('a rail unknown to the state is left out', () => {
    expect(corners(['nope'], ranges)).toEqual([new Map()]);
  });
});
