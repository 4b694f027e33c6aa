/**
 * Reference checks of the engine's margins against published and trade values, run through
 * check() on small designs (each source named beside its rows).
 */
import { describe, expect, it } from 'vitest';
import { check } from '../../rules/check/check.ts';
import type { Profile } from '../../rules/model/schema.ts';
import { design, input, net, output, part, rail } from '../support/build.ts';

// Common practice, 5 V: the trade's CMOS levels (out 4.4/0.5 V, in 3.5/1.5 V). A design-local
// profile carries them, since no built-in family is defined by exactly these round numbers.
const tradeCmos: Profile = {
  id: 'cmos5-trade',
  label: '5 V CMOS (trade levels)',
  source: 'common practice (5 V CMOS levels as the trade quotes them)',
  params: { vih: 3.5, vil: 1.5, voh: [{ v: 4.4, i: 1e-3 }], vol: [{ v: 0.5, i: 1e-3 }] },
};
// Common practice, 5 V: the trade's TTL levels (out 2.4/0.4 V, in 2.0/0.8 V).
const tradeTtl: Profile = {
  id: 'ttl-trade',
  label: '5 V TTL (trade levels)',
  source: 'common practice (5 V TTL levels as the trade quotes them)',
  params: { vih: 2.0, vil: 0.8, voh: [{ v: 2.4, i: 1e-3 }], vol: [{ v: 0.4, i: 1e-3 }] },
};

/** The single pair's analysis of driver profile → receiver profile on given rails. */
function pair(
  driver: string,
  receiver: string,
  rails = { d: 'r', r: 'r' },
  railsList = [rail('r', 5, { tolerance: 0 })],
) {
  const d = design({
    rails: railsList,
    profiles: [tradeCmos, tradeTtl],
    parts: [part('D', rails.d, driver, [output('Y')]), part('R', rails.r, receiver, [input('A')])],
    nets: [net('N', ['D.Y', 'R.A'])],
  });
  const result = check(d);
  const p = result.nets.get('all-on')!.get('N')!.view.analysis.pairs[0]!;
  return {
    high: p.high!,
    low: p.low!,
    findings: result.findings.filter((f) => f.rule === 'level-high' || f.rule === 'level-low'),
  };
}

describe('5 V levels of the trade (common practice)', () => {
  const cases = [
    // [driver, receiver, NMH, NML, high status, low status]
    ['ttl-trade', 'ttl-trade', 0.4, 0.4, 'pass', 'pass'], // TTL: 0.4 V on both sides
    ['cmos5-trade', 'cmos5-trade', 0.9, 1.0, 'pass', 'pass'], // CMOS: 0.9 V high, 1.0 V low
    ['cmos5-trade', 'ttl-trade', 2.4, 0.3, 'pass', 'pass'], // CMOS driving TTL passes, 0.3 V low
    ['ttl-trade', 'cmos5-trade', -1.1, 1.1, 'fail', 'pass'], // TTL driving 5 V CMOS fails high
  ] as const;
  it.each(cases)('%s → %s', (driver, receiver, nmh, nml, hs, ls) => {
    const { high, low } = pair(driver, receiver);
    expect(high.margin).toBeCloseTo(nmh, 9);
    expect(low.margin).toBeCloseTo(nml, 9);
    expect(high.status).toBe(hs);
    expect(low.status).toBe(ls);
  });
});

describe('built-in families through the engine', () => {
  it('standard TTL into standard TTL: handbook 2.4/2.0 and 0.8/0.4 V give 0.4 V both sides', () => {
    // Handbook table (bipolar TTL, 5 V ± 5 %): the levels hold over the whole range.
    const { high, low } = pair('ttl', 'ttl', { d: '5v0', r: '5v0' }, [rail('5v0', 5)]);
    expect(high.margin).toBeCloseTo(0.4, 9);
    expect(low.margin).toBeCloseTo(0.4, 9);
  });

  it('JESD8C: LVTTL driving LVCMOS at 3.3 V gives 0.4 V high and 0.4 V low', () => {
    // JESD8C as restated: LVTTL VOH 2.4 V @ 2 mA, VOL 0.4 V; inputs 2.0 / 0.8 V.
    const { high, low } = pair('lvttl33', 'lvcmos33', { d: '3v3', r: '3v3' }, [rail('3v3', 3.3)]);
    expect(high.margin).toBeCloseTo(0.4, 9);
    expect(low.margin).toBeCloseTo(0.4, 9);
  });

  it('JESD8-7: 1.8 V LVCMOS to itself, judged at one shared VDD (worst at 1.71 V)', () => {
    // VOH VDD−0.2 @ 100 µA (light load), VIH 0.65·VDD → NMH = 0.35·VDD − 0.2, smallest at the
    // rail's lowest 1.71 V; VIL 0.35·VDD − VOL 0.2 → NML = 0.35·VDD − 0.2 too.
    const { high, low } = pair('lvcmos18', 'lvcmos18', { d: '1v8', r: '1v8' }, [rail('1v8', 1.8)]);
    expect(high.margin).toBeCloseTo(0.35 * 1.71 - 0.2, 9);
    expect(high.driverVdd).toBeCloseTo(1.71, 12);
    expect(high.receiverVdd).toBeCloseTo(1.71, 12);
    expect(low.margin).toBeCloseTo(0.35 * 1.71 - 0.2, 9);
  });

  it('a 5 V ± 10 % part driving its neighbour on one rail is never judged at 4.5 V against 5.5 V', () => {
    // 74HC to 74HC, one rail 4.5–5.5 V: VOH VDD−0.1 against VIH 0.675·VDD+0.15 → smallest NMH
    // at 4.5 V (0.325·4.5 − 0.25 = 1.2125 V). Split rails would give 4.4 − 3.8625 = 0.5375 V.
    const { high } = pair('74hc', '74hc', { d: '5v0', r: '5v0' }, [rail('5v0', 5, { tolerance: 0.1 })]);
    expect(high.margin).toBeCloseTo(0.325 * 4.5 - 0.25, 9);
  });

  it('on two rails the driver is judged at its lowest and the receiver at its highest', () => {
    const { high } = pair('74hc', '74hc', { d: 'a', r: 'b' }, [
      rail('a', 5, { tolerance: 0.1 }),
      rail('b', 5, { tolerance: 0.1 }),
    ]);
    expect(high.margin).toBeCloseTo(4.5 - 0.1 - (0.675 * 5.5 + 0.15), 9);
    expect(high.driverVdd).toBeCloseTo(4.5, 12);
    expect(high.receiverVdd).toBeCloseTo(5.5, 12);
  });
});
