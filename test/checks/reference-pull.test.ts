/**
 * pull-range against published pull-up sizing: the I2C-bus specification's formulas with a
 * worked example per speed mode, and the handbook's open-collector pull-up range. Each design
 * is built so that its corners reduce to the published case (rails without tolerance, input
 * currents zeroed where the published formula has none, wiring capacitance equal to Cb).
 */
import { describe, expect, it } from 'vitest';
import rule from '../../rules/checks/pull-range.ts';
import { findingsOf } from '../support/ruleTester.ts';
import { bidir, design, input, net, output, part, rail, rail5v0 } from '../support/build.ts';
import { validateDesign } from '../../rules/model/reader.ts';
import type { Design } from '../../rules/model/schema.ts';

/**
 * A two-wire bus: master M and slave S (i2c profile) on a rail with no tolerance, open-drain,
 * input currents and pin capacitance zeroed so that C = Cb and the level bound does not bind
 * (the specification's Rp(max) is the rise-time bound alone).
 */
function twoWire(vdd: number, cb: number, tr: number, ohms: number, vol?: { v: number; i: number }): Design {
  const params = { iih: 0, iil: 0, cin: 0, ...(vol === undefined ? {} : { vol: [vol] }) };
  return design({
    rails: [rail('vdd', vdd, { tolerance: 0 })],
    parts: [
      part('M', 'vdd', 'i2c', [bidir('SDA', { drive: 'open-drain' })], { params }),
      part('S', 'vdd', 'i2c', [bidir('SDA', { drive: 'open-drain' })], { params }),
    ],
    nets: [net('SDA', ['M.SDA', 'S.SDA'], { pull: { to: 'vdd', ohms }, wiringCapacitance: cb, maxRiseTime: tr })],
  });
}

/**
 * The handbook's open-collector case: a 74LS open-collector output (VOL 0.5 V @ 8 mA, off
 * leakage 0.1 mA) and four 74LS inputs (IIH 20 µA, IIL 0.4 mA, VIH 2.0 V) on 5 V ± 5 %, with
 * 2.4 V required high: the engine's "VOH required" is VIH + minMargin, so minMargin is 0.4 V.
 */
const openCollector = design({
  rails: [rail5v0],
  settings: { minMargin: 0.4 },
  parts: [
    part('G', '5v0', '74ls-oc', [output('Y', { drive: 'open-drain' })]),
    part('L', '5v0', '74ls', [input('A1'), input('A2'), input('A3'), input('A4')]),
  ],
  nets: [net('N', ['G.Y', 'L.A1', 'L.A2', 'L.A3', 'L.A4'], { pull: { to: '5v0', ohms: 4700 } })],
});

interface Case {
  name: string;
  /** Where the published numbers come from. */
  source: string;
  design: Design;
  /** Published values as the source prints them (compared at that precision), null for none. */
  rMin: string | null;
  rMax: string | null;
  empty: boolean;
  /**
   * The advice (README, "Pull-up advice"): the range shrunk by 5 % tolerance with the rise-time
   * bound at 0.7 × tr, the IEC 60063 E12 value nearest its geometric mean, and the largest E24
   * value inside as the lowest-power alternative.
   */
  suggested: number | null;
  lowestPower: number | null;
  severity: 'error' | 'info';
}

const cases: Case[] = [
  {
    // Rp(min) = (3.3 − 0.4) / 3 mA = 966.7 Ω; Rp(max) = 1000 ns / (0.8473 × 400 pF) = 2950.6 Ω.
    // Advice: [966.7/0.95, 0.7 × 2950.6/1.05] = [1017.5, 1967.1] Ω, √ = 1414.7 Ω: E12 1.5 kΩ
    // (ratio 1.060, 1.2 kΩ is 1.179); largest E24 inside 1.8 kΩ.
    name: 'standard-mode, 3.3 V, 400 pF',
    source:
      'I2C-bus specification, pull-up sizing: Rp(min) = (VDD − VOL(max)) / IOL, Rp(max) = tr / (0.8473 × Cb); standard-mode tr 1000 ns, Cb 400 pF, VOL 0.4 V @ 3 mA',
    design: twoWire(3.3, 400e-12, 1000e-9, 2200),
    rMin: '966.7 Ω',
    rMax: '2950.6 Ω',
    empty: false,
    suggested: 1500,
    lowestPower: 1800,
    severity: 'info',
  },
  {
    // Rp(max) at 200 pF = 5901.1 Ω. Advice [1017.5, 3934.1] Ω, √ = 2000.7 Ω: E12 2.2 kΩ (1.0996)
    // beats 1.8 kΩ (1.1115); largest E24 inside 3.9 kΩ.
    name: 'standard-mode, 3.3 V, 200 pF',
    source: 'I2C-bus specification, pull-up sizing (as above), Cb 200 pF',
    design: twoWire(3.3, 200e-12, 1000e-9, 2200),
    rMin: '966.7 Ω',
    rMax: '5901.1 Ω',
    empty: false,
    suggested: 2200,
    lowestPower: 3900,
    severity: 'info',
  },
  {
    // Rp(max) = 300 ns / (0.8473 × 400 pF) = 885.2 Ω < Rp(min) 966.7 Ω: no valid pull-up.
    name: 'fast-mode, 3.3 V, 400 pF: no valid pull-up',
    source: 'I2C-bus specification, pull-up sizing; fast-mode tr 300 ns, Cb 400 pF, VOL 0.4 V @ 3 mA',
    design: twoWire(3.3, 400e-12, 300e-9, 1000),
    rMin: '966.7 Ω',
    rMax: '885.2 Ω',
    empty: true,
    suggested: null,
    lowestPower: null,
    severity: 'error',
  },
  {
    // Rp(min) = (5.5 − 0.4) / 20 mA = 255.0 Ω; Rp(max) = 120 ns / (0.8473 × 550 pF) = 257.5 Ω;
    // IEC 60063 E24 has 240 Ω and 270 Ω only: no standard value inside.
    name: 'fast-mode plus, 5.5 V, 550 pF: no E24 value',
    source: 'I2C-bus specification, pull-up sizing; fast-mode plus tr 120 ns, Cb 550 pF, VOL 0.4 V @ 20 mA',
    design: twoWire(5.5, 550e-12, 120e-9, 256, { v: 0.4, i: 20e-3 }),
    rMin: '255.0 Ω',
    rMax: '257.5 Ω',
    empty: false,
    suggested: null,
    lowestPower: null,
    severity: 'info',
  },
  {
    // Rmax = (4.75 − 2.4) / (4 × 20 µA + 0.1 mA) = 2.35 V / 0.18 mA = 13.06 kΩ;
    // Rmin = (5.25 − 0.5) / (8 mA − 4 × 0.4 mA) = 4.75 V / 6.4 mA = 742.2 Ω. Advice [781.3,
    // 12438] Ω (no rise limit; the 47 kΩ cap lies above), √ = 3117 Ω: E12 3.3 kΩ; largest E24 12 kΩ.
    name: '74LS open-collector with four 74LS loads',
    source:
      'handbook, open-collector TTL data pages: Rmax = (VCC,min − VOH) / (Σ leakage + Σ IIH), Rmin = (VCC,max − VOL) / (IOL − Σ IIL)',
    design: openCollector,
    rMin: '742.2 Ω',
    rMax: '13.06 kΩ',
    empty: false,
    suggested: 3300,
    lowestPower: 12000,
    severity: 'info',
  },
];

/** `actual` (Ω) rounded as `published` is printed ("2950.6 Ω", "13.06 kΩ"), in its unit. */
function asPrinted(actual: number | null, published: string | null): string | null {
  if (actual === null || published === null) return actual === null ? null : String(actual);
  const m = /^(\d+)(?:\.(\d+))? (k?)Ω$/.exec(published);
  if (m === null) throw new Error(`unreadable published value ${published}`);
  const scale = m[3] === 'k' ? 1e3 : 1;
  return `${(actual / scale).toFixed((m[2] ?? '').length)} ${m[3]}Ω`;
}

describe('pull-range reproduces published pull-up ranges', () => {
  for (const c of cases) {
    it(c.name, () => {
      expect(c.source.length).toBeGreaterThan(0);
      const read = validateDesign(c.design);
      expect(read.ok ? [] : read.errors).toEqual([]);
      const found = findingsOf(rule, c.design);
      expect(found.length).toBe(1);
      const f = found[0]!;
      const v = f.values as {
        rMin: number | null;
        rMax: number | null;
        empty: boolean;
        suggested: number | null;
        lowestPower: number | null;
      };
      expect(asPrinted(v.rMin, c.rMin)).toBe(c.rMin);
      expect(asPrinted(v.rMax, c.rMax)).toBe(c.rMax);
      expect(v.empty).toBe(c.empty);
      expect(v.suggested).toBe(c.suggested);
      expect(v.lowestPower).toBe(c.lowestPower);
      expect(f.severity, f.message).toBe(c.severity);
    });
  }
});
