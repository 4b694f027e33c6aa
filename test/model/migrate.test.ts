import fc from 'fast-check';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import '../support/propertySeed.ts';
import { CURRENT_VERSION, migrate, readDesign, writeDesign, type Design } from '../../rules/model/index.ts';
import { check } from '../../rules/check/check.ts';
import { designArb } from '../support/arbitraries.ts';
import { generateDesign } from '../support/generator.ts';
import { greenhouse } from './fixtures.ts';

/** The same document written as a version 1 file: v1 has none of version 2's keys. */
function asVersion1(d: Design): Record<string, unknown> {
  return { ...d, version: 1 };
}

/** Keys that only version 2 has. */
const V2_KEYS = new Set([
  'discretes',
  'minLoad',
  'viMin',
  'injectionMax',
  'busHold',
  'seriesResistance',
  'minExternalPull',
  'maxLoadCapacitance',
]);

/** A design without anything version 2 added: a file a version-1 editor could have written. */
function version1Subset(d: Design): Omit<Design, 'version'> {
  const between = new Set((d.discretes ?? []).map((x) => x.id));
  const strip = (v: unknown): unknown => {
    if (Array.isArray(v)) return v.map(strip);
    if (typeof v !== 'object' || v === null) return v;
    return Object.fromEntries(
      Object.entries(v)
        .filter(([k]) => !V2_KEYS.has(k))
        .map(([k, x]) => [k, strip(x)]),
    );
  };
  const out = strip(d) as Design;
  return {
    ...out,
    nets: out.nets.map((n) => ({ ...n, pins: n.pins.filter((p) => !between.has(p.slice(0, p.indexOf('.')))) })),
  };
}

/** What a check says, without the timing. */
const verdict = (d: Design) => {
  const r = check(d);
  return { summary: r.summary, findings: r.findings };
};

describe('migrate', () => {
  it('the current version is 2 (rules/schema/design-format.md: "version 2")', () => {
    expect(CURRENT_VERSION).toBe(2);
  });

  it('returns a version-2 document itself, unchanged', () => {
    const d = greenhouse();
    const before = JSON.stringify(d);
    expect(migrate(d)).toBe(d);
    expect(JSON.stringify(d)).toBe(before);
  });

  it('lifts a version-1 document to version 2 without changing its input', () => {
    const v1 = asVersion1(greenhouse());
    const before = JSON.stringify(v1);
    const lifted = migrate(v1) as Record<string, unknown>;
    expect(lifted).not.toBe(v1);
    expect(lifted.version).toBe(2);
    expect(JSON.stringify(v1)).toBe(before);
    // Everything but the number is the same: a v1 pull stays a pull.
    expect({ ...lifted, version: 1 }).toEqual(v1);
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

describe('a version-1 file gives the same findings after migration', () => {
  it('the example design, without what only version 2 can say', () => {
    const text = readFileSync(new URL('../../rules/examples/greenhouse.json', import.meta.url), 'utf8');
    // The example is version 2 with parts between chips; its version-1 subset (no discretes,
    // no net pins of theirs, none of version 2's keys) is what a version-1 editor could have written.
    const v1Doc = version1Subset(JSON.parse(text) as Design);
    expect(JSON.stringify(v1Doc)).not.toMatch(/discretes|minLoad|injectionMax|"Q1\./);
    const v1 = JSON.stringify({ ...v1Doc, version: 1 });
    const read = readDesign(v1);
    expect(read.ok ? [] : read.errors).toEqual([]);
    if (!read.ok) return;
    expect(read.design.version).toBe(2);
    expect(verdict(read.design)).toEqual(verdict({ ...v1Doc, version: 2 } as Design));
  });

  it('random v1 designs: read as v1 text, checked, equal to the same design checked directly', () => {
    fc.assert(
      fc.property(designArb(), (d) => {
        const read = readDesign(JSON.stringify(asVersion1(d)));
        expect(read.ok ? [] : read.errors).toEqual([]);
        if (!read.ok) return;
        expect(read.design.version).toBe(2);
        expect(verdict(read.design)).toEqual(verdict(d));
      }),
      { numRuns: 60 },
    );
  });

  it('synthetic boards with pulls: v1 pulls keep their findings, and the writer writes version 2', () => {
    for (const seed of [3, 17, 29]) {
      const d = generateDesign(seed, { parts: 30, faultRate: 0.3 });
      const read = readDesign(JSON.stringify(asVersion1(d)));
      expect(read.ok).toBe(true);
      if (!read.ok) continue;
      expect(verdict(read.design)).toEqual(verdict(d));
      expect(writeDesign(read.design)).toContain('\n  "version": 2,\n');
    }
  });
});
