/**
 * Pull resistors as the canvas and the PDF diagram label them (rules/report/pullLabel.ts): the
 * value as an IEC 60062 resistance code (4K7 for 4.7 kΩ, 47K for 47 kΩ, 100K, 1K0 — IEC 60062,
 * the letter standing for the decimal point), an arrow for up or down, and where it goes.
 */
import { describe, expect, it } from 'vitest';
import { pullLabel, pullWords } from '../../rules/report/pullLabel.ts';
import { rail } from '../support/build.ts';

const rails = [rail('3v3', 3.3, { label: '3.3 V controller I/O' }), rail('5v0', 5, { label: '5 V valve supply' })];

describe('pull labels', () => {
  it.each([
    [
      '4.7 kΩ up to the 3.3 V rail',
      { to: '3v3', ohms: 4700 },
      '↑4K7 3.3 V',
      'pull-up 4.7 kΩ to 3.3 V controller I/O (3v3)',
    ],
    ['47 kΩ up to the 5 V rail', { to: '5v0', ohms: 47_000 }, '↑47K 5 V', 'pull-up 47 kΩ to 5 V valve supply (5v0)'],
    ['100 kΩ down to ground', { to: 'ground', ohms: 100_000 }, '↓100K GND', 'pull-down 100 kΩ to ground'],
    [
      '1 kΩ (one digit keeps its 0: 1K0)',
      { to: '3v3', ohms: 1000 },
      '↑1K0 3.3 V',
      'pull-up 1 kΩ to 3.3 V controller I/O (3v3)',
    ],
    ['a rail the design does not have: its id', { to: 'r9', ohms: 2200 }, '↑2K2 r9', 'pull-up 2.2 kΩ to r9'],
  ])('%s', (_name, pull, label, words) => {
    expect(pullLabel(pull, rails)).toBe(label);
    expect(pullWords(pull, rails)).toBe(words);
  });
});
