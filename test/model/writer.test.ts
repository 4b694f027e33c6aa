/**
 * The canonical writer: key order of design-format.md's tables (transcribed below), layout,
 * and the round trip through the reader.
 */
import { describe, expect, it } from 'vitest';
import type { z } from 'zod';
import {
  DesignSchema,
  NetSchema,
  ParamsSchema,
  PartSchema,
  PinSchema,
  ProfileSchema,
  PullSchema,
  RailSchema,
  ScenarioSchema,
  SettingsSchema,
  WaiverSchema,
  ResistorSchema,
  FetShifterSchema,
  DiodeShifterSchema,
  readDesign,
  writeDesign,
  type Design,
} from '../../rules/model/index.ts';
import { KEY_ORDER, type KeyOrder } from '../../rules/model/writer.ts';
import { greenhouse } from './fixtures.ts';

/** rules/schema/design-format.md's tables, in their row order (transcribed; version 2). */
const TABLE_ORDER: { name: string; order: KeyOrder | undefined; schema: z.ZodObject; keys: string[] }[] = [
  {
    name: 'top level',
    order: KEY_ORDER.design,
    schema: DesignSchema,
    keys: ['format', 'version', 'title', 'settings', 'rails', 'scenarios', 'profiles', 'parts', 'discretes', 'nets'],
  },
  {
    name: 'settings',
    order: KEY_ORDER.design.children.settings,
    schema: SettingsSchema,
    keys: ['minMargin', 'defaultWiringCapacitance'],
  },
  {
    name: 'rail',
    order: KEY_ORDER.design.children.rails,
    schema: RailSchema,
    keys: ['id', 'label', 'nominal', 'tolerance', 'min', 'max', 'colour', 'minLoad'],
  },
  {
    name: 'scenario',
    order: KEY_ORDER.design.children.scenarios,
    schema: ScenarioSchema,
    keys: ['id', 'label', 'off', 'pins'],
  },
  {
    name: 'part',
    order: KEY_ORDER.design.children.parts,
    schema: PartSchema,
    keys: ['id', 'label', 'rail', 'profile', 'params', 'position', 'pins'],
  },
  {
    name: 'pin',
    order: KEY_ORDER.design.children.parts.children.pins,
    schema: PinSchema,
    keys: ['id', 'role', 'drive', 'rail', 'profile', 'params', 'pull', 'side', 'waivers'],
  },
  {
    name: 'params',
    order: KEY_ORDER.params,
    schema: ParamsSchema,
    keys: [
      'vih',
      'vil',
      'schmitt',
      'iih',
      'iil',
      'cin',
      'viMax',
      'unpoweredSafe',
      'viMaxOff',
      'voh',
      'vol',
      'ioMax',
      'maxInputRamp',
      'vddRange',
      'deltaIcc',
      'deltaIccDrop',
      'viMin',
      'injectionMax',
      'busHold',
      'seriesResistance',
      'minExternalPull',
      'maxLoadCapacitance',
    ],
  },
  {
    name: 'pull',
    order: KEY_ORDER.design.children.nets.children.pull,
    schema: PullSchema,
    keys: ['to', 'ohms', 'tolerance', 'min', 'max'],
  },
  {
    name: 'net',
    order: KEY_ORDER.design.children.nets,
    schema: NetSchema,
    keys: ['id', 'label', 'pins', 'pull', 'wiringCapacitance', 'maxRiseTime', 'waivers', 'route'],
  },
  {
    name: 'waiver',
    order: KEY_ORDER.design.children.nets.children.waivers,
    schema: WaiverSchema,
    keys: ['rule', 'scenario', 'note'],
  },
  {
    name: 'profile',
    order: KEY_ORDER.design.children.profiles,
    schema: ProfileSchema,
    keys: ['id', 'label', 'source', 'params'],
  },
];

/** The discrete parts share one key order; each kind's schema has a subset of it. */
const DISCRETE_ORDER = [
  'id',
  'kind',
  'label',
  'ohms',
  'tolerance',
  'tie',
  'gate',
  'vgsThMax',
  'rdsOnMax',
  'vfMax',
  'leakageMax',
  'position',
];

describe('writeDesign key order of the discretes (version 2)', () => {
  it('is the table order', () => {
    expect(KEY_ORDER.design.children.discretes.keys).toEqual(DISCRETE_ORDER);
  });
  it.each([
    { name: 'resistor', schema: ResistorSchema },
    { name: 'fet-shifter', schema: FetShifterSchema },
    { name: 'diode-shifter', schema: DiodeShifterSchema },
  ])('$name: every key of its schema is in the order', ({ schema }) => {
    for (const key of Object.keys(schema.shape)) expect(DISCRETE_ORDER).toContain(key);
  });
});

describe('writeDesign key order', () => {
  it.each(TABLE_ORDER)('$name: the table order, and every key of the schema', ({ order, schema, keys }) => {
    expect(order?.keys).toEqual(keys);
    // A key added to the schema but not to the writer would otherwise land at the end, unordered.
    expect([...(order?.keys ?? [])].sort()).toEqual(Object.keys(schema.shape).sort());
  });

  it('writes keys in table order whatever order the object has', () => {
    const shuffled = {
      nets: [],
      parts: [{ pins: [{ side: 'left', role: 'input', id: 'A' }], profile: 'ttl', rail: 'r', label: 'L', id: 'U1' }],
      rails: [{ colour: 'red', nominal: 5, label: '5 V', id: 'r' }],
      title: 'T',
      version: 1,
      format: 'railcross.design',
    } as unknown as Design;
    const text = writeDesign(shuffled);
    const keysInText = [...text.matchAll(/"(\w+)":/g)].map((m) => m[1]);
    expect(keysInText).toEqual([
      'format',
      'version',
      'title',
      'rails',
      'id',
      'label',
      'nominal',
      'colour',
      'parts',
      'id',
      'label',
      'rail',
      'profile',
      'pins',
      'id',
      'role',
      'side',
      'nets',
    ]);
  });
});

describe('writeDesign layout', () => {
  const d = greenhouse();
  const text = writeDesign(d);

  const cases: { name: string; holds: (t: string) => boolean }[] = [
    { name: 'ends with one newline', holds: (t) => t.endsWith('}\n') && !t.endsWith('\n\n') },
    {
      name: 'two-space indentation',
      holds: (t) => t.includes('\n  "version": 2,\n') && t.includes('\n    {\n      "id": "5v0",'),
    },
    {
      name: 'plain arrays on one line',
      holds: (t) => t.includes('"pins": ["U3.B1", "U1.PROBE_IN", "U4.DRDY"]') && t.includes('"vddRange": [4.5, 5.5]'),
    },
    {
      name: 'route pairs one per line',
      holds: (t) =>
        t.includes('"route": [\n        ["U3.B1", "U1.PROBE_IN"],\n        ["U1.PROBE_IN", "U4.DRDY"]\n      ]'),
    },
    {
      name: 'numbers as JSON numbers (SI, no engineering notation)',
      holds: (t) => t.includes('"ohms": 4700') && t.includes('"maxRiseTime": 3e-7'),
    },
    { name: 'no tabs, no trailing spaces', holds: (t) => !/\t| \n/.test(t) },
  ];
  it.each(cases)('$name', ({ holds }) => {
    expect(holds(text)).toBe(true);
  });

  it('omits keys whose value is undefined', () => {
    const withUndefined = { ...greenhouse(), settings: undefined, scenarios: undefined } as unknown as Design;
    const t = writeDesign(withUndefined);
    expect(t).not.toContain('settings');
    expect(t).not.toContain('undefined');
    expect(t).not.toContain('"scenarios"');
  });

  it('keeps the sign of -0 and the order of arrays', () => {
    const g = greenhouse();
    g.parts[0]!.position = { x: -0, y: 0 };
    g.nets.reverse();
    const r = readDesign(writeDesign(g));
    expect(r.ok && Object.is(r.design.parts[0]!.position!.x, -0)).toBe(true);
    expect(r.ok && r.design.nets.map((n) => n.id)).toEqual([
      'PROBE_BUF',
      'PROBE',
      'ALARM',
      'VALVE_EN',
      'I2C_SCL',
      'I2C_SDA',
    ]);
  });

  it('escapes text so that it reads back the same', () => {
    const g = greenhouse();
    g.title = 'Line 1\n"quoted" \\ tab\t µ Ω ≤ \u0000 \ud800 😀';
    const r = readDesign(writeDesign(g));
    expect(r.ok && r.design.title).toBe(g.title);
  });
});

describe('writeDesign round trip', () => {
  it('reading what was written gives the same design, and writing it again the same text', () => {
    const d = greenhouse();
    const first = writeDesign(d);
    const r = readDesign(first);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.design).toStrictEqual(d);
    expect(writeDesign(r.design)).toBe(first);
  });

  it('a design written with its keys in another order gives the same text', () => {
    const d = greenhouse();
    const reordered = JSON.parse(
      JSON.stringify(d, Object.keys(d).reverse().concat(collectKeys(d).reverse())),
    ) as Design;
    expect(Object.keys(reordered)[0]).toBe('nets');
    expect(writeDesign(reordered)).toBe(writeDesign(d));
  });
});

function collectKeys(value: unknown, into = new Set<string>()): string[] {
  if (Array.isArray(value))
    value.forEach((v) => {
      collectKeys(v, into);
    });
  else if (typeof value === 'object' && value !== null) {
    for (const [k, v] of Object.entries(value)) {
      into.add(k);
      collectKeys(v, into);
    }
  }
  return [...into];
}
