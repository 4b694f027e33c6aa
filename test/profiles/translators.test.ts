/**
 * The dual-supply translator sides against the published levels they must meet at their
 * lowest supply (1.65 V) and across their range. Transcribed here with their sources:
 * - JESD8-7 (1.8 V, 1.65–1.95 V): VIH 0.65·VDD, VIL 0.35·VDD, VOH VDD − 0.45 V and VOL 0.45 V at
 *   2 mA (restated in parts' DC tables).
 * - I2C-bus specification, VDD ≤ 2 V: VOL ≤ 0.2·VDD at 3 mA (restated); above 2 V: 0.4 V at 3 mA.
 * - Partial power-down: pins may carry voltage at VDD = 0 (common practice for such parts).
 */
import { describe, expect, it } from 'vitest';
import { levelAt } from '../../rules/levels/level.ts';
import { outputLevel } from '../../rules/levels/output.ts';
import { builtinProfile } from '../../rules/profiles/index.ts';

const side = builtinProfile('xlat-side')!;
const od = builtinProfile('xlat-od')!;

describe('xlat-side meets the 1.8 V interface standard at its lowest supply and holds it up the range', () => {
  it.each([1.65, 1.8, 1.95, 2.5, 3.3, 5.0, 5.5])('VDD %f V', (vdd) => {
    // Inputs: never above 0.65·VDD for VIH, never below 0.35·VDD for VIL (JESD8-7 form).
    expect(levelAt(side.params.vih!, vdd)).toBeLessThanOrEqual(0.65 * vdd + 1e-12);
    expect(levelAt(side.params.vil!, vdd)).toBeGreaterThanOrEqual(0.35 * vdd - 1e-12);
    // Outputs at 2 mA: at least VDD − 0.45 V high, at most 0.45 V low (JESD8-7, restated).
    expect(outputLevel(side.params.voh, 2e-3, vdd, 'high')!.v).toBeCloseTo(vdd - 0.45, 12);
    expect(outputLevel(side.params.vol, 2e-3, vdd, 'low')!.v).toBeCloseTo(0.45, 12);
  });
});

describe('xlat-od sinks like a two-wire bus pin', () => {
  it.each([
    ['1.65 V (VDD ≤ 2 V: 0.2·VDD at 3 mA)', 1.65, 0.2 * 1.65],
    ['1.95 V (VDD ≤ 2 V: 0.2·VDD at 3 mA)', 1.95, 0.2 * 1.95],
    ['3.3 V (VDD > 2 V: 0.4 V at 3 mA)', 3.3, 0.4],
    ['5.5 V (VDD > 2 V: 0.4 V at 3 mA)', 5.5, 0.4],
  ])('VOL at 3 mA, %s', (_name, vdd, limit) => {
    expect(outputLevel(od.params.vol, 3e-3, vdd, 'low')!.v).toBeLessThanOrEqual(limit);
  });

  it('has no push-pull high level: it only ever pulls low', () => {
    expect(od.params.voh).toBeUndefined();
  });
});

describe('both sides', () => {
  it.each([side, od])('$id: partial power-down, at most 5.5 V unpowered, each side on 1.65–5.5 V', (p) => {
    expect(p.params.unpoweredSafe).toBe(true);
    expect(p.params.viMaxOff).toBe(5.5);
    expect(p.params.vddRange).toEqual([1.65, 5.5]);
    expect(p.source).toMatch(/from memory/);
    expect(p.label).toMatch(/^Dual-rail translator/);
  });
});
