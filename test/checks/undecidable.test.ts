/**
 * Fail safe on numbers (issue 14): every rule that judges a number judges one that is not
 * finite (NaN, ±∞) as a failure, never as a pass. The designs here bypass the reader (its
 * limits would refuse them), as a bug or a future import path might: each carries one
 * non-finite or overflowing number, and the rule must raise an unwaivable "cannot be
 * guaranteed" error whose values hold null in place of the number (JSON has no NaN or ∞).
 * The rules that judge no number (contention, floating-input, missing-pull) are held to give
 * exactly the findings they give without the bad number.
 */
import { describe, expect, it } from 'vitest';
import type { AnyRule } from '../../rules/checks/defineRule.ts';
import { RULES } from '../../rules/checks/index.ts';
import { check } from '../../rules/check/check.ts';
import { hasNonFinite, nonFinitePaths, undecidablePaths } from '../../rules/engine/undecidable.ts';
import type { Design } from '../../rules/model/schema.ts';
import { bidir, design, input, net, output, part, rail, rail3v3, rail5v0, scenario } from '../support/build.ts';
import { findingsOf } from '../support/ruleTester.ts';
import { idsWhereLabelsBelong, relabelled } from '../support/relabel.ts';
import { fetBus, seriesClamp } from '../support/paths.ts';

const rule = (id: string): AnyRule => RULES.find((r) => r.id === id)!;

/** A 74HC output on 5 V into a 74HC input on 5 V: a clean net, unless a number is broken. */
function driven(
  over: { driverRail?: number; tolerance?: number; viMax?: number; ohms?: number; wiring?: number } = {},
): Design {
  const r5 =
    over.driverRail === undefined && over.tolerance === undefined
      ? rail5v0
      : rail('5v0', over.driverRail ?? 5, { tolerance: over.tolerance ?? 0.05 });
  return design({
    rails: [r5, rail3v3],
    parts: [
      part('D', '5v0', '74hc', [output('Y')]),
      part('R', '5v0', '74hc', [input('A', over.viMax === undefined ? {} : { params: { viMax: over.viMax } })]),
    ],
    nets: [
      net('N', ['D.Y', 'R.A'], {
        ...(over.ohms === undefined ? {} : { pull: { to: '5v0', ohms: over.ohms } }),
        ...(over.wiring === undefined ? {} : { wiringCapacitance: over.wiring, maxRiseTime: 1e-6 }),
      }),
    ],
  });
}

/** A two-wire bus on 3.3 V, pulled up: an open-drain net for pull-range and edge-rate. */
function bus(over: { ohms?: number; wiring?: number } = {}): Design {
  return design({
    rails: [rail5v0, rail3v3],
    parts: [
      part('M', '3v3', 'i2c', [bidir('SDA', { drive: 'open-drain' })]),
      part('S', '3v3', 'i2c', [bidir('SDA', { drive: 'open-drain' })]),
    ],
    nets: [
      net('SDA', ['M.SDA', 'S.SDA'], {
        pull: { to: '3v3', ohms: over.ohms ?? 4700 },
        maxRiseTime: 300e-9,
        ...(over.wiring === undefined ? {} : { wiringCapacitance: over.wiring }),
      }),
    ],
  });
}

/** A 5 V output into a 3.3 V input, the 3.3 V rail off in a scenario: back-power, crossing. */
function crossing(over: { driverRail?: number; tolerance?: number } = {}): Design {
  return design({
    rails: [rail('5v0', over.driverRail ?? 5, { tolerance: over.tolerance ?? 0.05 }), rail3v3],
    scenarios: [scenario('S', ['3v3'])],
    parts: [part('D', '5v0', '74hc', [output('Y')]), part('R', '3v3', 'lvcmos33', [input('A')])],
    nets: [net('N', ['D.Y', 'R.A'])],
  });
}

/**
 * A 3.3 V LVCMOS output into a 74HCT input on 5 V: interface-power's input held high below its
 * supply less the ΔICC offset (2.93 V < 5.25 V − 2.1 V), an info finding unless a number is broken.
 */
function held(over: { driverRail?: number; tolerance?: number } = {}): Design {
  return design({
    rails: [
      over.tolerance === undefined ? rail5v0 : rail('5v0', 5, { tolerance: over.tolerance }),
      over.driverRail === undefined ? rail3v3 : rail('3v3', over.driverRail, { tolerance: 0.05 }),
    ],
    parts: [part('D', '3v3', 'lvcmos33', [output('Y')]), part('R', '5v0', '74hct', [input('A')])],
    nets: [net('N', ['D.Y', 'R.A'])],
  });
}

interface Case {
  name: string;
  rule: string;
  design: Design;
}

const cases: Case[] = [
  { name: 'driver rail NaN V', rule: 'level-high', design: driven({ driverRail: Number.NaN }) },
  { name: 'tolerance 3.6e307 (rail range ±∞)', rule: 'level-high', design: driven({ tolerance: 3.6e307 }) },
  { name: 'driver rail NaN V', rule: 'level-low', design: driven({ driverRail: Number.NaN }) },
  { name: 'tolerance 3.6e307 (rail range ±∞)', rule: 'level-low', design: driven({ tolerance: 3.6e307 }) },
  { name: 'a pull of 5e-324 Ω (infinite load)', rule: 'drive-load', design: driven({ ohms: 5e-324 }) },
  { name: 'a pull of NaN Ω', rule: 'drive-load', design: driven({ ohms: Number.NaN }) },
  { name: 'infinite wiring capacitance', rule: 'edge-rate', design: bus({ wiring: Number.POSITIVE_INFINITY }) },
  { name: 'NaN wiring capacitance', rule: 'edge-rate', design: bus({ wiring: Number.NaN }) },
  { name: 'a pull of NaN Ω', rule: 'pull-range', design: bus({ ohms: Number.NaN }) },
  { name: 'infinite wiring capacitance', rule: 'pull-range', design: bus({ wiring: Number.POSITIVE_INFINITY }) },
  { name: 'viMax NaN V', rule: 'overvoltage', design: driven({ viMax: Number.NaN }) },
  { name: 'source rail +∞ V', rule: 'overvoltage', design: driven({ driverRail: Number.POSITIVE_INFINITY }) },
  {
    name: "source rail NaN V while the pin's rail is off",
    rule: 'back-power',
    design: crossing({ driverRail: Number.NaN }),
  },
  {
    name: "tolerance 3.6e307 while the pin's rail is off",
    rule: 'back-power',
    design: crossing({ tolerance: 3.6e307 }),
  },
  { name: 'margins of a crossing NaN', rule: 'rail-crossing', design: crossing({ driverRail: Number.NaN }) },
  { name: 'margins of a crossing −∞', rule: 'rail-crossing', design: crossing({ tolerance: 3.6e307 }) },
  { name: 'rail NaN V', rule: 'rail-range', design: driven({ driverRail: Number.NaN }) },
  // Version 2: the rules of the parts between chips.
  {
    name: 'a series resistor of NaN Ω',
    rule: 'clamp-current',
    design: seriesClamp({ ohms: Number.NaN, injectionMax: 5e-3 }),
  },
  {
    name: 'a series resistor of NaN Ω into a rail with a minimum load',
    rule: 'rail-injection',
    design: seriesClamp({ ohms: Number.NaN, injectionMax: 5e-3, minLoad: 10e-3 }),
  },
  {
    name: 'a −12 V line whose rail minimum is NaN',
    rule: 'undervoltage',
    design: design({
      rails: [rail3v3, rail('n12', -12, { min: Number.NaN, max: -11.4 })],
      parts: [
        part('J1', 'n12', 'off-board', [output('TXD', { params: { vol: [{ v: -11.4, i: 1e-3 }] } })]),
        part('R', '3v3', 'lvcmos33', [input('A', { params: { viMin: -0.5 } })]),
      ],
      nets: [net('N', ['J1.TXD', 'R.A'])],
    }),
  },
  { name: 'a FET threshold of NaN V', rule: 'fet-shifter', design: fetBus({ vgsThMax: Number.NaN }) },
  {
    name: 'a translator Rs of NaN Ω',
    rule: 'translator-pull',
    design: design({
      rails: [rail3v3],
      parts: [
        part('U5', '3v3', 'lvcmos33', [output('B1', { params: { seriesResistance: Number.NaN } })]),
        part('U6', '3v3', 'lvcmos33', [input('A')]),
      ],
      nets: [net('N', ['U5.B1', 'U6.A'], { pull: { to: '3v3', ohms: 4700 } })],
    }),
  },
  {
    name: 'a bus-hold strap of NaN Ω',
    rule: 'bus-hold',
    design: design({
      rails: [rail3v3],
      parts: [
        part('U7', '3v3', 'lvcmos33', [input('D0', { params: { busHold: { hold: 75e-6, overdrive: Number.NaN } } })]),
      ],
      nets: [net('BUS0', ['U7.D0'], { pull: { to: '3v3', ohms: 4700 } })],
    }),
  },
  { name: 'rail range ±∞', rule: 'rail-range', design: driven({ tolerance: 3.6e307 }) },
  { name: 'driver rail NaN V', rule: 'interface-power', design: held({ driverRail: Number.NaN }) },
  { name: 'receiver tolerance 3.6e307 (rail range ±∞)', rule: 'interface-power', design: held({ tolerance: 3.6e307 }) },
];

/** The rules that judge numbers, each with at least one case above. */
const NUMERIC = [
  'level-high',
  'level-low',
  'drive-load',
  'edge-rate',
  'pull-range',
  'overvoltage',
  'back-power',
  'rail-crossing',
  'rail-range',
  'interface-power',
  'clamp-current',
  'rail-injection',
  'undervoltage',
  'fet-shifter',
  'translator-pull',
  'bus-hold',
];
/** The rules that judge only how pins are connected. */
const STRUCTURAL = ['contention', 'floating-input', 'missing-pull', 'mixed-path'];

describe('a non-finite number is an error, never silence', () => {
  it('every rule is in one of the two lists, and every numeric rule has a case', () => {
    expect([...NUMERIC, ...STRUCTURAL].sort()).toEqual(RULES.map((r) => r.id).sort());
    for (const id of NUMERIC)
      expect(
        cases.some((c) => c.rule === id),
        id,
      ).toBe(true);
  });

  it.each(cases)('$rule: $name', (c) => {
    const found = findingsOf(rule(c.rule), c.design);
    const undecided = found.filter((f) => f.messageId === 'undecidable');
    expect(undecided.length, found.map((f) => `${f.severity} ${f.message}`).join('\n')).toBeGreaterThan(0);
    for (const f of undecided) {
      expect(f.severity).toBe('error');
      expect(f.message).toContain('cannot be guaranteed');
      expect(f.message).toMatch(/(is not a finite number|are not finite numbers); the check could not decide/);
      expect(f.waived).toBeUndefined();
      expect((f.values.undecidable as string[]).length).toBeGreaterThan(0);
    }
    for (const f of found) expect(nonFinitePaths(f), f.message).toEqual([]);
  });

  // One name for one thing (issue 18): "cannot be guaranteed" names the net, rail or profile by label too.
  it.each(cases)('$rule: $name, named by labels', (c) => {
    const d = relabelled(c.design);
    const undecided = findingsOf(rule(c.rule), d).filter((f) => f.messageId === 'undecidable');
    expect(undecided.length).toBeGreaterThan(0);
    for (const f of undecided) expect(idsWhereLabelsBelong(f.message, d), f.message).toEqual([]);
  });

  it.each(cases)('$rule: $name, with a waiver of the rule on the net, still counts', (c) => {
    const waived = {
      ...c.design,
      nets: c.design.nets.map((n) => ({ ...n, waivers: [{ rule: c.rule as never, note: 'accepted' }] })),
    };
    const result = check(waived);
    expect(result.summary.error).toBeGreaterThan(0);
  });
});

// The quick test that spares every finding the path walk must agree with the walk, at any depth.
describe('hasNonFinite agrees with nonFinitePaths', () => {
  const values: [string, unknown][] = [
    ['a finite number', 3.3],
    ['zero and negative zero', [0, -0]],
    ['NaN', Number.NaN],
    ['+infinity', Number.POSITIVE_INFINITY],
    ['−infinity deep in an object', { a: { b: { c: Number.NEGATIVE_INFINITY } } }],
    ['NaN in an array of objects', { currents: [{ current: 1e-3 }, { current: Number.NaN }] }],
    ['null, strings and booleans', { a: null, b: 'NaN', c: true, d: undefined }],
    ['the largest finite number', Number.MAX_VALUE],
    ['an empty object and array', { a: {}, b: [] }],
  ];
  it.each(values)('%s', (_name, value) => {
    expect(hasNonFinite(value)).toBe(nonFinitePaths(value).length > 0);
    expect(undecidablePaths(value, {}).length > 0).toBe(hasNonFinite(value));
    expect(undecidablePaths({}, value).length > 0).toBe(hasNonFinite(value));
  });
});

describe('rules that judge no number are not thrown by one', () => {
  const broken = [
    driven({ driverRail: Number.NaN }),
    driven({ ohms: 5e-324 }),
    crossing({ tolerance: 3.6e307 }),
    bus({ ohms: Number.NaN }),
  ];
  const clean = [driven(), driven({ ohms: 4700 }), crossing(), bus()];
  it.each(STRUCTURAL.flatMap((id) => broken.map((_d, k) => [id, k] as const)))('%s, design %i', (id, k) => {
    const strip = (d: Design) => findingsOf(rule(id), d).map((f) => `${f.id} ${f.severity}`);
    expect(strip(broken[k]!)).toEqual(strip(clean[k]!));
  });
});
