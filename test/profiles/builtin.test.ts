/**
 * The built-in library against its specification.
 *
 * Source of the expected values: shared reference builtin-profiles.md, transcribed; each row's
 * own source is in the profile. Units converted to SI (µA → 1e-6 A, mA → 1e-3 A, pF → 1e-12 F).
 * The id list is design-format.md, version 1, transcribed; the library may add ids after it
 * (design-format.md: "the library may add more, never rename these"), listed in ADDED below.
 */
import { describe, expect, it } from 'vitest';
import { ProfileSchema, type Params } from '../../rules/model/schema.ts';
import { BUILTIN_PROFILE_IDS as IDS_MODULE } from '../../rules/model/profileIds.ts';
import { BUILTIN_PROFILE_IDS, BUILTIN_PROFILES, builtinProfile, resolveProfile } from '../../rules/profiles/index.ts';

/** design-format.md v1, "Built-in profile ids", in its order. */
const V1_IDS = [
  'ttl',
  '74ls',
  '74ls-oc',
  '74hc',
  '74hct',
  '74ac',
  '74act',
  '74ahc',
  '74ahct',
  '74lvc',
  'lvttl33',
  'lvcmos33',
  'lvcmos25',
  'lvcmos18',
  'lvcmos15',
  'lvcmos12',
  'cmos4000',
  'i2c',
  'i2c-lv',
  'mcu-gpio',
  'off-board',
];

/** Ids the library added after the v1 list, in the library's order. */
const ADDED_IDS = [
  'xlat-side',
  'xlat-od',
  'i2c-fm',
  'smbus',
  'cmos4000-ub',
  '74lvc-18',
  '74lvc-25',
  '74lvc-od',
  '74lvt',
  '74abt',
  '74avc',
  '74auc',
];

const ALL_IDS = [...V1_IDS, ...ADDED_IDS];

const µA = 1e-6;
const mA = 1e-3;

/** builtin-profiles.md, row by row. A key absent here is a dash in the table. */
const TABLE: Record<string, Params> = {
  ttl: {
    vddRange: [4.75, 5.25],
    vih: 2,
    vil: 0.8,
    voh: [{ v: 2.4, i: 400 * µA }],
    vol: [{ v: 0.4, i: 16 * mA }],
    iih: 40 * µA,
    iil: 1.6 * mA,
    cin: 5e-12,
    viMax: 5.5, // cin from memory (issue 16)
  },
  '74ls': {
    vddRange: [4.75, 5.25],
    vih: 2,
    vil: 0.8,
    voh: [{ v: 2.7, i: 400 * µA }],
    vol: [
      { v: 0.4, i: 4 * mA },
      { v: 0.5, i: 8 * mA },
    ],
    iih: 20 * µA,
    iil: 400 * µA,
    cin: 5e-12,
    viMax: 7, // cin from memory (issue 16)
  },
  '74ls-oc': {
    vddRange: [4.75, 5.25],
    vol: [{ v: 0.5, i: 8 * mA }],
    iih: 100 * µA,
    viMax: 5.5,
  },
  '74hc': {
    // issue 16: the whole 2–6 V of JESD7 (as restated), each heavier row from the supply it is tabulated at
    vddRange: [2, 6],
    vih: '0.675*VDD+0.15',
    vil: '0.325*VDD-0.15',
    voh: [
      { v: 'VDD-0.1', i: 20 * µA },
      { v: 'VDD-0.66', i: 4 * mA, vddMin: 4.5 },
      { v: 'VDD-0.66', i: 5.2 * mA, vddMin: 6 },
    ],
    vol: [
      { v: 0.1, i: 20 * µA },
      { v: 0.33, i: 4 * mA, vddMin: 4.5 },
      { v: 0.33, i: 5.2 * mA, vddMin: 6 },
    ],
    iih: 1 * µA,
    iil: 1 * µA,
    cin: 10e-12,
    viMax: 'VDD+0.5',
  },
  '74hct': {
    vddRange: [4.5, 5.5],
    vih: 2,
    vil: 0.8,
    voh: [
      { v: 'VDD-0.1', i: 20 * µA },
      { v: 'VDD-0.66', i: 4 * mA },
    ],
    vol: [
      { v: 0.1, i: 20 * µA },
      { v: 0.33, i: 4 * mA },
    ],
    iih: 1 * µA,
    iil: 1 * µA,
    cin: 10e-12,
    deltaIcc: 0.5 * mA,
    deltaIccDrop: 2.1,
    viMax: 'VDD+0.5',
  },
  '74ac': {
    vddRange: [4.5, 6],
    vih: '0.7*VDD',
    vil: '0.3*VDD',
    voh: [
      { v: 'VDD-0.1', i: 50 * µA },
      { v: 'VDD-0.74', i: 24 * mA },
    ],
    vol: [
      { v: 0.1, i: 50 * µA },
      { v: 0.44, i: 24 * mA },
    ],
    iih: 1 * µA,
    iil: 1 * µA,
    cin: 10e-12,
    viMax: 'VDD+0.5', // cin from memory (issue 16)
  },
  '74act': {
    vddRange: [4.5, 5.5],
    vih: 2,
    vil: 0.8,
    voh: [
      { v: 'VDD-0.1', i: 50 * µA },
      { v: 'VDD-0.74', i: 24 * mA },
    ],
    vol: [
      { v: 0.1, i: 50 * µA },
      { v: 0.44, i: 24 * mA },
    ],
    iih: 1 * µA,
    iil: 1 * µA,
    cin: 10e-12,
    deltaIcc: 1.5 * mA,
    deltaIccDrop: 2.1,
    viMax: 'VDD+0.5', // cin from memory (issue 16)
  },
  '74ahc': {
    vddRange: [4.5, 5.5],
    vih: '0.7*VDD',
    vil: '0.3*VDD',
    // VOH at 8 mA: VDD − 0.70, the −40…85 °C figure of a family datasheet's DC table (issue 16's review)
    voh: [
      { v: 'VDD-0.1', i: 50 * µA },
      { v: 'VDD-0.7', i: 8 * mA },
    ],
    vol: [
      { v: 0.1, i: 50 * µA },
      { v: 0.44, i: 8 * mA },
    ],
    iih: 1 * µA,
    iil: 1 * µA,
    cin: 10e-12,
    viMax: 5.5, // cin from memory
  },
  '74ahct': {
    vddRange: [4.5, 5.5],
    vih: 2,
    vil: 0.8,
    // VOH at 8 mA: VDD − 0.70, the −40…85 °C figure of a family datasheet's DC table (issue 16's review)
    voh: [
      { v: 'VDD-0.1', i: 50 * µA },
      { v: 'VDD-0.7', i: 8 * mA },
    ],
    vol: [
      { v: 0.1, i: 50 * µA },
      { v: 0.44, i: 8 * mA },
    ],
    iih: 1 * µA,
    iil: 1 * µA,
    cin: 10e-12,
    deltaIcc: 1.5 * mA,
    deltaIccDrop: 2.1,
    viMax: 5.5, // cin from memory
  },
  '74lvc': {
    vddRange: [2.7, 3.6],
    vih: 2,
    vil: 0.8,
    voh: [
      { v: 'VDD-0.2', i: 100 * µA },
      { v: 'VDD-0.6', i: 12 * mA },
    ],
    vol: [
      { v: 0.2, i: 100 * µA },
      { v: 0.4, i: 12 * mA },
    ],
    iih: 5 * µA,
    iil: 5 * µA,
    cin: 5e-12,
    viMax: 5.5,
    unpoweredSafe: true,
    viMaxOff: 5.5, // currents and cin from memory
  },
  lvttl33: {
    vddRange: [3, 3.6],
    vih: 2,
    vil: 0.8,
    voh: [{ v: 2.4, i: 2 * mA }],
    vol: [{ v: 0.4, i: 2 * mA }],
    iih: 5 * µA,
    iil: 5 * µA,
    cin: 5e-12,
    viMax: 'VDD+0.5',
  },
  lvcmos33: {
    vddRange: [3, 3.6],
    vih: 2,
    vil: 0.8,
    voh: [{ v: 'VDD-0.2', i: 100 * µA }],
    vol: [{ v: 0.2, i: 100 * µA }],
    iih: 5 * µA,
    iil: 5 * µA,
    cin: 5e-12,
    viMax: 'VDD+0.5',
  },
  lvcmos25: {
    vddRange: [2.3, 2.7],
    vih: 1.7,
    vil: 0.7,
    voh: [
      { v: 'VDD-0.2', i: 100 * µA },
      { v: 2, i: 1 * mA },
      { v: 1.7, i: 2 * mA },
    ],
    vol: [
      { v: 0.2, i: 100 * µA },
      { v: 0.4, i: 1 * mA },
      { v: 0.7, i: 2 * mA },
    ],
    iih: 5 * µA,
    iil: 5 * µA,
    cin: 5e-12, // from memory (issue 16)
    viMax: 'VDD+0.5',
  },
  lvcmos18: {
    vddRange: [1.65, 1.95],
    vih: '0.65*VDD',
    vil: '0.35*VDD',
    voh: [
      { v: 'VDD-0.2', i: 100 * µA },
      { v: 'VDD-0.45', i: 2 * mA },
    ],
    vol: [
      { v: 0.2, i: 100 * µA },
      { v: 0.45, i: 2 * mA },
    ],
    iih: 5 * µA,
    iil: 5 * µA,
    cin: 5e-12, // from memory (issue 16)
    viMax: 'VDD+0.5',
  },
  lvcmos15: {
    vddRange: [1.4, 1.6],
    vih: '0.65*VDD',
    vil: '0.35*VDD',
    voh: [
      { v: 'VDD-0.2', i: 100 * µA },
      { v: '0.75*VDD', i: 2 * mA },
    ],
    vol: [
      { v: 0.2, i: 100 * µA },
      { v: '0.25*VDD', i: 2 * mA },
    ],
    iih: 5 * µA,
    iil: 5 * µA,
    cin: 5e-12, // from memory (issue 16)
    viMax: 'VDD+0.5',
  },
  lvcmos12: {
    vddRange: [1.1, 1.3],
    vih: '0.65*VDD',
    vil: '0.35*VDD',
    voh: [
      { v: 'VDD-0.1', i: 100 * µA },
      { v: '0.75*VDD', i: 2 * mA },
    ],
    vol: [
      { v: 0.1, i: 100 * µA },
      { v: '0.25*VDD', i: 2 * mA },
    ],
    iih: 5 * µA,
    iil: 5 * µA,
    cin: 5e-12, // from memory (issue 16)
    viMax: 'VDD+0.5',
  },
  cmos4000: {
    vddRange: [5, 15],
    vih: '0.75*VDD-0.25',
    vil: '0.25*VDD+0.25',
    voh: [
      { v: 'VDD-0.05', i: 1 * µA },
      { v: 'VDD-0.4', i: 360 * µA },
    ],
    vol: [
      { v: 0.05, i: 1 * µA },
      { v: 0.4, i: 360 * µA },
    ],
    iih: 1 * µA,
    iil: 1 * µA,
    viMax: 'VDD+0.5',
  },
  i2c: {
    vddRange: [2, 5.5],
    vih: '0.7*VDD',
    vil: '0.3*VDD',
    vol: [{ v: 0.4, i: 3 * mA }],
    iih: 10 * µA,
    iil: 10 * µA,
    cin: 10e-12,
    viMax: 'VDD+0.5',
  },
  'i2c-lv': {
    vddRange: [1.65, 2],
    vih: '0.7*VDD',
    vil: '0.3*VDD',
    vol: [{ v: '0.2*VDD', i: 3 * mA }],
    iih: 10 * µA,
    iil: 10 * µA,
    cin: 10e-12,
    viMax: 'VDD+0.5',
  },
  'mcu-gpio': {
    vih: '0.7*VDD',
    vil: '0.3*VDD',
    // 8 mA rows, ±1 µA and 5 pF from memory (issue 16)
    voh: [
      { v: 'VDD-0.2', i: 100 * µA },
      { v: 'VDD-0.4', i: 8 * mA },
    ],
    vol: [
      { v: 0.2, i: 100 * µA },
      { v: 0.4, i: 8 * mA },
    ],
    iih: 1 * µA,
    iil: 1 * µA,
    cin: 5e-12,
    viMax: 'VDD+0.5',
  },
  'off-board': {},
};

/**
 * The added profiles. No shared reference table covers them: the expected values are the
 * generic dual-supply translator numbers chosen for the library, each with its source.
 */
const ADDED: Record<string, Params> = {
  'xlat-side': {
    vddRange: [1.65, 5.5], // from memory: the usual span of either supply of such parts
    vih: '0.65*VDD',
    vil: '0.35*VDD', // JESD8-7's scaled thresholds, over the whole range (from memory)
    // JESD8-7 rows: 2 mA restated, 100 µA from memory; carried up the supply unchanged
    voh: [
      { v: 'VDD-0.2', i: 100 * µA },
      { v: 'VDD-0.45', i: 2 * mA },
    ],
    vol: [
      { v: 0.2, i: 100 * µA },
      { v: 0.45, i: 2 * mA },
    ],
    iih: 1 * µA,
    iil: 1 * µA, // from memory
    viMax: 'VDD+0.5', // common practice: clamp to the side's own supply
    unpoweredSafe: true,
    viMaxOff: 5.5, // common practice: partial power-down; 5.5 V from memory
  },
  'xlat-od': {
    vddRange: [1.65, 5.5], // from memory
    vih: '0.65*VDD',
    vil: '0.35*VDD', // from memory
    vol: [
      { v: 0.15, i: 1 * mA },
      { v: 0.3, i: 3 * mA },
    ], // from memory
    iih: 1 * µA,
    iil: 1 * µA, // from memory
    viMax: 'VDD+0.5', // common practice
    unpoweredSafe: true,
    viMaxOff: 5.5, // common practice: partial power-down; 5.5 V from memory
  },
  'i2c-fm': {
    vddRange: [2, 5.5],
    vih: '0.7*VDD',
    vil: '0.3*VDD',
    vol: [
      { v: 0.4, i: 3 * mA },
      { v: 0.6, i: 6 * mA },
    ], // I2C-bus specification: fast-mode 0.6 V @ 6 mA
    iih: 10 * µA,
    iil: 10 * µA,
    cin: 10e-12,
    viMax: 'VDD+0.5',
  },
  smbus: {
    // SMBus specification 2.0, from memory: fixed 0.8 / 2.1 V thresholds, 0.4 V @ 4 mA
    vddRange: [3, 5.5],
    vih: 2.1,
    vil: 0.8,
    vol: [{ v: 0.4, i: 4 * mA }],
    iih: 5 * µA,
    iil: 5 * µA,
    cin: 10e-12,
    viMax: 'VDD+0.5',
  },
  'cmos4000-ub': {
    // JESD13 UB: 4.0 / 1.0 V at 5 V (restated), 12.5 / 2.5 V at 15 V (from memory): lines exact at both
    vddRange: [5, 15],
    vih: '0.85*VDD-0.25',
    vil: '0.15*VDD+0.25',
    voh: [
      { v: 'VDD-0.05', i: 1 * µA },
      { v: 'VDD-0.4', i: 360 * µA },
    ],
    vol: [
      { v: 0.05, i: 1 * µA },
      { v: 0.4, i: 360 * µA },
    ],
    iih: 1 * µA,
    iil: 1 * µA,
    viMax: 'VDD+0.5',
  },
  '74lvc-18': {
    // JESD8-7 thresholds; 4 mA rows at 1.65 V from memory
    vddRange: [1.65, 1.95],
    vih: '0.65*VDD',
    vil: '0.35*VDD',
    voh: [
      { v: 'VDD-0.2', i: 100 * µA },
      { v: 'VDD-0.45', i: 4 * mA },
    ],
    vol: [
      { v: 0.2, i: 100 * µA },
      { v: 0.45, i: 4 * mA },
    ],
    iih: 5 * µA,
    iil: 5 * µA,
    cin: 5e-12,
    viMax: 5.5,
    unpoweredSafe: true,
    viMaxOff: 5.5,
  },
  '74lvc-25': {
    // JESD8-5 thresholds; 8 mA rows at 2.3 V from memory
    vddRange: [2.3, 2.7],
    vih: 1.7,
    vil: 0.7,
    voh: [
      { v: 'VDD-0.2', i: 100 * µA },
      { v: 'VDD-0.6', i: 8 * mA },
    ],
    vol: [
      { v: 0.2, i: 100 * µA },
      { v: 0.6, i: 8 * mA },
    ],
    iih: 5 * µA,
    iil: 5 * µA,
    cin: 5e-12,
    viMax: 5.5,
    unpoweredSafe: true,
    viMaxOff: 5.5,
  },
  '74lvc-od': {
    // as 74LVC, sink rows only
    vddRange: [2.7, 3.6],
    vih: 2,
    vil: 0.8,
    vol: [
      { v: 0.2, i: 100 * µA },
      { v: 0.4, i: 12 * mA },
    ],
    iih: 5 * µA,
    iil: 5 * µA,
    cin: 5e-12,
    viMax: 5.5,
    unpoweredSafe: true,
    viMaxOff: 5.5,
  },
  '74lvt': {
    // from memory: TTL levels, 32 mA rows at 3.0 V
    vddRange: [3, 3.6],
    vih: 2,
    vil: 0.8,
    voh: [
      { v: 'VDD-0.2', i: 100 * µA },
      { v: 2, i: 32 * mA },
    ],
    vol: [
      { v: 0.2, i: 100 * µA },
      { v: 0.5, i: 32 * mA },
      { v: 0.55, i: 64 * mA },
    ],
    iih: 1 * µA,
    iil: 1 * µA,
    cin: 5e-12,
    viMax: 5.5,
    unpoweredSafe: true,
    viMaxOff: 5.5,
  },
  '74abt': {
    // from memory: TTL levels at 4.5 V
    vddRange: [4.5, 5.5],
    vih: 2,
    vil: 0.8,
    voh: [
      { v: 2.5, i: 3 * mA },
      { v: 2, i: 32 * mA },
    ],
    vol: [{ v: 0.55, i: 64 * mA }],
    iih: 1 * µA,
    iil: 1 * µA,
    cin: 5e-12,
    viMax: 5.5,
  },
  '74avc': {
    // JESD8-7 thresholds; 4 mA rows at 1.65 V from memory
    vddRange: [1.65, 1.95],
    vih: '0.65*VDD',
    vil: '0.35*VDD',
    voh: [
      { v: 'VDD-0.2', i: 100 * µA },
      { v: 'VDD-0.45', i: 4 * mA },
    ],
    vol: [
      { v: 0.2, i: 100 * µA },
      { v: 0.45, i: 4 * mA },
    ],
    iih: 2.5 * µA,
    iil: 2.5 * µA,
    cin: 5e-12,
    viMax: 3.6,
    unpoweredSafe: true,
    viMaxOff: 3.6,
  },
  '74auc': {
    // JESD8-12 thresholds; 3 mA rows at 1.1 V from memory
    vddRange: [1.1, 1.3],
    vih: '0.65*VDD',
    vil: '0.35*VDD',
    voh: [
      { v: 'VDD-0.1', i: 100 * µA },
      { v: 'VDD-0.3', i: 3 * mA },
    ],
    vol: [
      { v: 0.1, i: 100 * µA },
      { v: 0.3, i: 3 * mA },
    ],
    iih: 5 * µA,
    iil: 5 * µA,
    cin: 5e-12,
    viMax: 3.6,
    unpoweredSafe: true,
    viMaxOff: 3.6,
  },
};

const EXPECTED: Record<string, Params> = { ...TABLE, ...ADDED };

/** Equal within 1e-12 relative: 400 * µA and 400e-6 may differ in the last bit. */
function closeTo(a: unknown, b: unknown): boolean {
  if (typeof a === 'number' && typeof b === 'number') {
    return Math.abs(a - b) <= 1e-12 * Math.max(Math.abs(a), Math.abs(b));
  }
  return false;
}

/** Deep equality with numbers compared by closeTo; keys must match exactly (a missing or extra key fails). */
function sameParams(actual: unknown, expected: unknown, path: string): string[] {
  if (typeof expected === 'number') {
    return closeTo(actual, expected) ? [] : [`${path}: ${String(actual)} ≠ ${expected}`];
  }
  if (expected === null || typeof expected !== 'object') {
    return actual === expected ? [] : [`${path}: ${JSON.stringify(actual)} ≠ ${JSON.stringify(expected)}`];
  }
  if (actual === null || typeof actual !== 'object' || Array.isArray(actual) !== Array.isArray(expected)) {
    return [`${path}: ${JSON.stringify(actual)} is not like ${JSON.stringify(expected)}`];
  }
  const a = actual as Record<string, unknown>;
  const e = expected as Record<string, unknown>;
  const keys = new Set([...Object.keys(a), ...Object.keys(e)]);
  const out: string[] = [];
  for (const k of keys) {
    if (!(k in e)) out.push(`${path}.${k}: extra key`);
    else if (!(k in a)) out.push(`${path}.${k}: missing key`);
    else out.push(...sameParams(a[k], e[k], `${path}.${k}`));
  }
  return out;
}

describe('built-in profile library', () => {
  it('holds the 21 ids of design-format.md v1 first, in its order, then the added ids', () => {
    expect(BUILTIN_PROFILES.map((p) => p.id).slice(0, V1_IDS.length)).toEqual(V1_IDS);
    expect(BUILTIN_PROFILES.map((p) => p.id)).toEqual(ALL_IDS);
    expect(BUILTIN_PROFILE_IDS).toEqual(ALL_IDS);
    expect(IDS_MODULE).toEqual(ALL_IDS);
  });

  it('adds no id that differs from a v1 id only in case', () => {
    const v1 = new Set(V1_IDS.map((id) => id.toLowerCase()));
    expect(ADDED_IDS.filter((id) => v1.has(id.toLowerCase()))).toEqual([]);
  });

  it('has unique ids', () => {
    const ids = BUILTIN_PROFILES.map((p) => p.id);
    expect(new Set(ids).size).toBe(ids.length);
  });

  it('the transcribed tables cover every profile', () => {
    expect(Object.keys(TABLE).sort()).toEqual([...V1_IDS].sort());
    expect(Object.keys(ADDED).sort()).toEqual([...ADDED_IDS].sort());
  });

  describe.each(ALL_IDS)('%s', (id) => {
    const profile = builtinProfile(id);

    it('exists and has exactly the keys id, label, source, params', () => {
      expect(profile).toBeDefined();
      expect(Object.keys(profile!).sort()).toEqual(['id', 'label', 'params', 'source']);
      expect(profile!.id).toBe(id);
    });

    it('has a non-empty label and source', () => {
      expect(profile!.label.trim()).not.toBe('');
      expect(profile!.source.trim()).not.toBe('');
    });

    it('has the parameters of its table (builtin-profiles.md, or ADDED), every key exactly', () => {
      expect(sameParams(profile!.params, EXPECTED[id], id)).toEqual([]);
    });

    it('is a valid design-local profile too (Levels parse, currents non-negative)', () => {
      expect(ProfileSchema.safeParse(profile).success).toBe(true);
    });

    it('lists voh and vol by increasing test current', () => {
      for (const list of [profile!.params.voh ?? [], profile!.params.vol ?? []]) {
        const currents = list.map((p) => p.i);
        expect(currents).toEqual([...currents].sort((a, b) => a - b));
        expect(new Set(currents).size).toBe(currents.length);
      }
    });

    it('is deep-frozen', () => {
      const p = profile!;
      expect(Object.isFrozen(p)).toBe(true);
      expect(Object.isFrozen(p.params)).toBe(true);
      for (const point of [...(p.params.voh ?? []), ...(p.params.vol ?? [])]) {
        expect(Object.isFrozen(point)).toBe(true);
      }
      if (p.params.voh) expect(Object.isFrozen(p.params.voh)).toBe(true);
      if (p.params.vddRange) expect(Object.isFrozen(p.params.vddRange)).toBe(true);
      expect(() => {
        (p.params as Record<string, unknown>).vih = 99;
      }).toThrow(TypeError);
    });
  });

  it('the library array itself is frozen', () => {
    expect(Object.isFrozen(BUILTIN_PROFILES)).toBe(true);
    expect(Object.isFrozen(BUILTIN_PROFILE_IDS)).toBe(true);
  });
});

describe('lookup', () => {
  const local = { id: '74hc', label: 'Chosen part', source: 'datasheet of the chosen part', params: { vih: 3.5 } };
  const custom = { id: 'bench-probe', label: 'Probe', source: 'measured on the bench', params: {} };

  it.each([
    ['a built-in id', '74lvc', '74lvc'],
    ['the first id', 'ttl', 'ttl'],
    ['the last id', 'off-board', 'off-board'],
  ])('builtinProfile finds %s', (_name, id, expectedId) => {
    expect(builtinProfile(id)?.id).toBe(expectedId);
  });

  it.each([
    ['an unknown id', 'nosuch'],
    ['an empty id', ''],
    ['a prototype key', '__proto__'],
    ['a wrong case', '74HC'],
  ])('builtinProfile refuses %s', (_name, id) => {
    expect(builtinProfile(id)).toBeUndefined();
  });

  it.each([
    ['a built-in with no design profiles', {}, '74hct', '74hct', 'builtin'],
    ['a built-in with other design profiles', { profiles: [custom] }, 'ttl', 'ttl', 'builtin'],
    ['a design-local profile', { profiles: [custom] }, 'bench-probe', 'bench-probe', 'local'],
    ['a design-local profile shadowing a built-in', { profiles: [custom, local] }, '74hc', '74hc', 'local'],
  ] as const)('resolveProfile finds %s', (_name, design, id, expectedId, origin) => {
    const p = resolveProfile(design, id);
    expect(p?.id).toBe(expectedId);
    expect(p === builtinProfile(id)).toBe(origin === 'builtin');
  });

  it("resolveProfile: the shadowing profile is the design's own object", () => {
    expect(resolveProfile({ profiles: [local] }, '74hc')).toBe(local);
  });

  it.each([
    ['no design profiles', {}],
    ['other design profiles', { profiles: [custom] }],
  ])('resolveProfile returns undefined for an unknown id with %s', (_name, design) => {
    expect(resolveProfile(design, 'nosuch')).toBeUndefined();
  });
});
