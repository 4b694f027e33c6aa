/**
 * Reference checks of drive-load and edge-rate against sources outside the project: the
 * handbook fan-outs of bipolar TTL, the I2C-bus specification's pull-up limit, and the RC
 * constants of a single-pole edge.
 */
import { describe, expect, it } from 'vitest';
import driveLoad from '../../rules/checks/drive-load.ts';
import edgeRate from '../../rules/checks/edge-rate.ts';
import type { Design } from '../../rules/model/schema.ts';
import { valuesOf } from '../../rules/engine/findings.ts';
import type { FindingValues } from '../../rules/engine/values.ts';
import { findingsOf } from '../support/ruleTester.ts';
import { design, input, link, net, output, part, rail5v0 } from '../support/build.ts';

/** One driver `D.Y` and `n` receivers of a profile, all on 5 V ± 5 %. */
function fanOut(profile: string, n: number): Design {
  const receivers = Array.from({ length: n }, (_, k) => part(`R${k + 1}`, '5v0', profile, [input('A')]));
  return design({
    rails: [rail5v0],
    parts: [part('D', '5v0', profile, [output('Y')]), ...receivers],
    nets: [net('N', ['D.Y', ...receivers.map((r) => `${r.id}.A`)])],
  });
}

describe('drive-load: handbook fan-outs, exactly at the limit', () => {
  // Handbook (bipolar TTL tables): standard TTL IOL 16 mA / IIL 1.6 mA and IOH 0.4 mA / IIH 40 µA,
  // fan-out 10; 74LS IOL 8 mA / IIL 0.4 mA and IOH 0.4 mA / IIH 20 µA, fan-out 20. At the fan-out
  // both loads equal the test currents exactly and pass; one more load exceeds both.
  it.each([
    {
      family: 'standard TTL',
      profile: 'ttl',
      loads: 10,
      fails: false,
      iil: 1.6e-3,
      iih: 40e-6,
      iol: 16e-3,
      ioh: 0.4e-3,
    },
    {
      family: 'standard TTL',
      profile: 'ttl',
      loads: 11,
      fails: true,
      iil: 1.6e-3,
      iih: 40e-6,
      iol: 16e-3,
      ioh: 0.4e-3,
    },
    { family: '74LS', profile: '74ls', loads: 20, fails: false, iil: 0.4e-3, iih: 20e-6, iol: 8e-3, ioh: 0.4e-3 },
    { family: '74LS', profile: '74ls', loads: 21, fails: true, iil: 0.4e-3, iih: 20e-6, iol: 8e-3, ioh: 0.4e-3 },
  ])('$family driving $loads of its own inputs: fails = $fails', ({ profile, loads, fails, iil, iih, iol, ioh }) => {
    const found = findingsOf(driveLoad, fanOut(profile, loads));
    expect(found.length).toBe(fails ? 1 : 0);
    if (fails) {
      const f = found[0]!;
      expect(f.messageId).toBe('bothOverload');
      const v = valuesOf(f, 'drive-load');
      expect(v.loadLow).toBeCloseTo(loads * iil, 12);
      expect(v.loadHigh).toBeCloseTo(loads * iih, 12);
      expect(v.ratedLow).toBe(iol);
      expect(v.ratedHigh).toBe(ioh);
    }
  });
});

/** Rise time of a pulled two-wire bus: two bus pins (10 pF each, I2C-bus specification, restated). */
function bus(ohms: number, busCapacitance: number, maxRiseTime: number): Design {
  return link(
    { rail: '3v3', profile: 'i2c', pin: { drive: 'open-drain' } },
    { rail: '3v3', profile: 'i2c' },
    { net: { pull: { to: '3v3', ohms }, wiringCapacitance: busCapacitance - 20e-12, maxRiseTime } },
  );
}

describe("edge-rate: the I2C-bus specification's pull-up limit Rp(max) = tr / (0.8473 · Cb)", () => {
  // Worked values from the specification's formula: standard-mode (1000 ns) at 400 pF → 2950.6 Ω;
  // fast-mode (300 ns) at 400 pF → 885.2 Ω. A whole ohm either side of the limit decides.
  it.each([
    { mode: 'standard-mode', ohms: 2950, tr: 1000e-9, slow: false },
    { mode: 'standard-mode', ohms: 2951, tr: 1000e-9, slow: true },
    { mode: 'fast-mode', ohms: 885, tr: 300e-9, slow: false },
    { mode: 'fast-mode', ohms: 886, tr: 300e-9, slow: true },
  ])('$mode, $ohms Ω at 400 pF: too slow = $slow', ({ ohms, tr, slow }) => {
    const found = findingsOf(edgeRate, bus(ohms, 400e-12, tr));
    expect(found.map((f) => f.messageId)).toEqual(slow ? ['pulledRiseSlow'] : []);
  });
});

describe('edge-rate: single-pole RC constants', () => {
  // 30–70 %: ln(7/3) ≈ 0.8473 (the I2C-bus specification's figure); 10–90 %: ln 9 ≈ 2.197, the
  // "2.2 RC" rule of thumb (common practice).
  const pulled = findingsOf(edgeRate, bus(10e3, 400e-12, 1e-9))[0]!;
  // 74HC driving 74HC through 1 nF of wiring (74HC rows: JESD7 as restated).
  const driven = findingsOf(
    edgeRate,
    link(
      { rail: '5v0', profile: '74hc' },
      { rail: '5v0', profile: '74hc' },
      { net: { wiringCapacitance: 1e-9, maxRiseTime: 1e-9 } },
    ),
  )[0]!;
  const rise = (f: typeof pulled) =>
    valuesOf(f, 'edge-rate') as FindingValues<'edge-rate'> & { riseTime: number; span: string };
  const ratio = (f: typeof pulled) => {
    const v = valuesOf(f, 'edge-rate');
    if (!('riseTime' in v)) throw new Error(`${f.id} is not a rise time`);
    return v.riseTime! / (v.resistance! * v.capacitance!);
  };

  it.each([
    { span: '30-70', finding: () => pulled, constant: 0.8473, digits: 4 },
    { span: '10-90', finding: () => driven, constant: 2.197, digits: 3 },
  ])('$span: rise time / RC ≈ $constant', ({ span, finding, constant, digits }) => {
    const f = finding();
    expect(rise(f).span).toBe(span);
    expect(ratio(f)).toBeCloseTo(constant, digits);
  });

  it('10-90 is within 0.2 % of the 2.2 RC rule of thumb', () => {
    expect(Math.abs(ratio(driven) / 2.2 - 1)).toBeLessThan(2e-3);
  });
});
