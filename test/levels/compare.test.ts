/**
 * The comparisons every rule uses (rules/levels/compare.ts): equal within 1e-9 of the larger
 * magnitude (rules-catalogue.md, "Comparisons"), and fail safe on a value that is not finite
 * (issue 14): in JavaScript `NaN < 0` and `NaN > 0` are both false, so a rule asking "does
 * the margin break the limit?" with a plain comparison would answer no and pass.
 */
import { describe, expect, it } from 'vitest';
import { below, exceeds, higherScore, lowerScore, nearlyEqual } from '../../rules/levels/compare.ts';

const NAN = Number.NaN;
const INF = Number.POSITIVE_INFINITY;

describe('exceeds and below', () => {
  it.each([
    // finite: strict, and not by rounding noise (ten 1.6 mA loads against 16 mA: common practice)
    ['a clear excess', 2, 1, true, false],
    ['equal', 1, 1, false, false],
    ['equal but for rounding', 0.1 + 0.2, 0.3, false, false],
    ['ten 1.6 mA loads against 16 mA', 10 * 1.6e-3, 16e-3, false, false],
    ['a clear shortfall', -0.1, 0, false, true],
    // not finite: both true, the limit cannot be shown to hold
    ['NaN against a limit', NAN, 0.4, true, true],
    ['a value against a NaN limit', 0.4, NAN, true, true],
    ['+∞ against a limit', INF, 1, true, true],
    ['−∞ against a limit', -INF, 1, true, true],
    ['a value against an infinite limit', 1, INF, true, true],
  ])('%s', (_name, a, b, over, under) => {
    expect(exceeds(a, b)).toBe(over);
    expect(below(a, b)).toBe(under);
  });

  it('nearlyEqual keeps its relative tolerance', () => {
    expect(nearlyEqual(1, 1 + 1e-12)).toBe(true);
    expect(nearlyEqual(1, 1 + 1e-6)).toBe(false);
    expect(nearlyEqual(NAN, NAN)).toBe(false);
  });
});

describe('keeping the worst score', () => {
  it.each([
    ['a lower finite score replaces', 1, 2, true, false],
    ['a higher finite score does not', 3, 2, false, true],
    ['NaN replaces a finite score', NAN, 2, true, true],
    ['−∞ replaces a finite score', -INF, 2, true, true],
    ['+∞ replaces a finite score', INF, 2, true, true],
    ['nothing replaces a kept NaN', -1e300, NAN, false, false],
    ['nothing replaces a kept −∞', -INF, -INF, false, false],
  ])('%s', (_name, candidate, worst, lower, higher) => {
    expect(lowerScore(candidate, worst)).toBe(lower);
    expect(higherScore(candidate, worst)).toBe(higher);
  });
});
