/**
 * A driver that reaches a FET shifter through a series resistor, the receiver on the shifter's
 * other side: the shifter's near side is solved by nodal analysis with the far side's pull-up
 * current fed in through the FET, then the far side sits at V_near + I_far·RDS(on) (the I2C-bus
 * specification's level-shifter section), provided VGS = Vgate − V_near reaches VGS(th),max.
 *
 * The circuit (test/support/paths.ts fetBus, invented values in the specification's form): a
 * 3.3 V ±5 % controller U1 (VOL 0.4 V at its rated current) → RS ±1 % → SDA_H (RH 4.7 kΩ ±1 % to
 * 3.3 V) → Q1 (gate 1.8 V ±5 %, VGS(th) ≤ 1 V, RDS(on) ≤ 6 Ω) → SDA_L (RL 4.7 kΩ ±1 % to 1.8 V)
 * with the 1.8 V sensor U2 (VIL 0.3·VDD).
 */
import { describe, expect, it } from 'vitest';
import { check } from '../../rules/check/check.ts';
import type { Design } from '../../rules/model/schema.ts';
import { net, resistor } from '../support/build.ts';
import { fetBus } from '../support/paths.ts';

function chain(rs: number): Design {
  const d = fetBus();
  return {
    ...d,
    discretes: [...(d.discretes ?? []), resistor('RS', rs, { tolerance: 0.01 })],
    nets: [
      net('SDA_X', ['U1.SDA', 'RS.1']),
      net('SDA_H', ['RS.2', 'Q1.D', 'RH.1']),
      net('SDA_L', ['U2.SDA', 'Q1.S', 'RL.1']),
    ],
  };
}

function lowPair(d: Design) {
  const r = check(d);
  const pair = r.nets
    .get('all-on')!
    .get('SDA_L')!
    .view.analysis.pairs.find((p) => p.driver === 'U1.SDA' && p.receiver === 'U2.SDA');
  return { r, pair };
}

// Worst corner: 3.3 V at 3.465 V (RH's current largest), 1.8 V at 1.71 V (VIL = 0.513 V);
// RS at 101 Ω, RH and RL at 4653 Ω. I_far = 1.71/4653 = 0.36750 mA (taken at 0 V: a bound).
// SDA_H: V(1/101 + 1/4653) = 0.4/101 + 3.465/4653 + 0.36750 mA
//        → V = (0.0039604 + 0.00074468 + 0.00036750)/(0.0099010 + 0.00021492) = 0.50145 V;
// SDA_L: 0.50145 + 0.36750 mA · 6 Ω = 0.50365 V; NML = 0.513 − 0.50365 = 9.35 mV (a warning);
// VGS = 1.71 − 0.50145 = 1.2085 V ≥ 1 V.
describe('a series resistor before a FET shifter', () => {
  it('is solved through the resistor and the FET: 100 Ω', () => {
    const { r, pair } = lowPair(chain(100));
    expect(pair?.via).toBe('RS+Q1');
    expect(pair!.low!.detail!.vNear).toBeCloseTo(0.50145, 5);
    expect(pair!.low!.detail!.iFar).toBeCloseTo(1.71 / 4653, 9);
    expect(pair!.low!.detail!.vgs).toBeCloseTo(1.71 - 0.50145, 5);
    expect(pair!.low!.out).toBeCloseTo(0.50365, 5);
    expect(pair!.low!.threshold).toBeCloseTo(0.513, 9);
    expect(pair!.low!.margin).toBeCloseTo(0.00935, 5);
    expect(pair!.low!.status).toBe('warning');
    // The high comes from SDA_L's own pull-up: 1.71 V against 0.7 · 1.71 = 1.197 V.
    expect(pair!.high!.out).toBeCloseTo(1.71, 9);
    expect(pair!.high!.margin).toBeCloseTo(0.513, 9);
    const f = r.findings.find((x) => x.id === 'level-low:SDA_L:all-on:U1.SDA>U2.SDA');
    expect(f?.severity).toBe('warning');
    // The chain is judged, so it is not reported as unsolved.
    expect(r.findings.filter((x) => x.id === 'mixed-path:SDA_L:all-on:U1.SDA')).toEqual([]);
  });

  // 1 kΩ: at 1.8 V = 1.89 V, I_far = 1.89/4653 = 0.40619 mA;
  // V(1/1010 + 1/4653) = 0.4/1010 + 3.465/4653 + 0.40619 mA → V = 0.0015469/0.0012050 = 1.2837 V,
  // VGS = 1.89 − 1.2837 = 0.606 V < 1 V: the FET is not guaranteed on, SDA_L stays at its pull-up's
  // 1.89 V against VIL 0.3 · 1.89 = 0.567 V: NML = −1.323 V, an error.
  it('fails where the resistor keeps the FET from turning on: 1 kΩ', () => {
    const { r, pair } = lowPair(chain(1000));
    expect(pair!.low!.out).toBeCloseTo(1.89, 9);
    expect(pair!.low!.margin).toBeCloseTo(0.567 - 1.89, 9);
    expect(pair!.low!.status).toBe('fail');
    expect(pair!.low!.detail!.vgs).toBeLessThan(1);
    expect(r.findings.find((x) => x.id === 'level-low:SDA_L:all-on:U1.SDA>U2.SDA')?.severity).toBe('error');
  });
});
