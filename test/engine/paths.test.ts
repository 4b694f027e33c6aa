/**
 * Signal paths through parts between chips: the numbers the engine computes for a divider, a
 * series resistor, a FET shifter and a diode shifter, against hand-worked values whose sources
 * are named beside them.
 */
import { describe, expect, it } from 'vitest';
import { check } from '../../rules/check/check.ts';
import { solve } from '../../rules/engine/nodal.ts';
import { rng } from '../support/generator.ts';
import { pathExposure } from '../../rules/engine/paths.ts';
import { levelAt } from '../../rules/levels/level.ts';
import type { NetView } from '../../rules/engine/types.ts';
import type { Design } from '../../rules/model/schema.ts';
import { validateDesign } from '../../rules/model/reader.ts';
import { diodeLink, divider, fetBus, seriesClamp } from '../support/paths.ts';
import { resistor } from '../support/build.ts';

const close = (a: number, b: number, rel = 1e-9) =>
  expect(Math.abs(a - b)).toBeLessThanOrEqual(rel * Math.max(Math.abs(a), Math.abs(b)) + 1e-15);

function viewOf(d: Design, netId: string, state = 'all-on'): NetView {
  const read = validateDesign(d);
  expect(read.ok ? [] : read.errors).toEqual([]);
  return check(d).nets.get(state)!.get(netId)!.view;
}

describe('nodal solver', () => {
  const cases = [
    {
      // Ohm's law: two equal resistors from 10 V to 0 V halve it (common practice).
      name: 'a divider of two equal resistors',
      net: {
        n: 3,
        fixed: [10, undefined, 0],
        links: [
          { a: 0, b: 1, g: 1e-3 },
          { a: 1, b: 2, g: 1e-3 },
        ],
        ties: [],
        inject: [0, 0, 0],
      },
      expect: [10, 5, 0],
    },
    {
      // Norton: 1 mA into 1 kΩ to ground is 1 V (common practice).
      name: 'a current into a resistor to ground',
      net: { n: 1, fixed: [undefined], links: [], ties: [{ a: 0, g: 1e-3, v: 0 }], inject: [1e-3] },
      expect: [1],
    },
    {
      // A node joined to nothing that holds a voltage has no defined level.
      name: 'a node with no path to a fixed voltage',
      net: { n: 2, fixed: [3, undefined], links: [], ties: [], inject: [0, 0] },
      expect: [3, undefined],
    },
    {
      // Millman: 5 V and 0 V through 1 kΩ and 3 kΩ meet at 5 × 3/4 = 3.75 V (common practice).
      name: 'two sources through unequal resistors',
      net: {
        n: 1,
        fixed: [undefined],
        links: [],
        ties: [
          { a: 0, g: 1e-3, v: 5 },
          { a: 0, g: 1 / 3e3, v: 0 },
        ],
        inject: [0],
      },
      expect: [3.75],
    },
  ];
  it('a resistance that is not a number decides nothing: every node is NaN, never a skipped link', () => {
    const got = solve({
      n: 2,
      fixed: [5, undefined],
      links: [{ a: 0, b: 1, g: 1 / Number.NaN }],
      ties: [],
      inject: [0, 0],
    });
    expect(got.every((v) => Number.isNaN(v))).toBe(true);
  });

  it.each(cases)('$name', ({ net, expect: want }) => {
    const got = solve(net);
    want.forEach((w, k) => {
      w === undefined ? expect(got[k]).toBeUndefined() : close(got[k]!, w);
    });
  });

  // Kirchhoff's current law (common practice): at every free node with a defined level, the
  // currents out through its links and ties equal the current injected. Random networks of up to
  // eight nodes, some held, some floating, some joined to nothing.
  it("meets Kirchhoff's current law at every free node of random networks", () => {
    const r = rng(60063);
    for (let trial = 0; trial < 300; trial++) {
      const n = 1 + Math.floor(r() * 8);
      const fixed = Array.from({ length: n }, () => (r() < 0.3 ? Math.round(r() * 50) / 10 : undefined));
      const links = Array.from({ length: Math.floor(r() * 2 * n) }, () => ({
        a: Math.floor(r() * n),
        b: Math.floor(r() * n),
        g: r() < 0.1 ? 0 : 1 / (100 + r() * 1e5),
      })).filter((l) => l.a !== l.b);
      const ties = Array.from({ length: Math.floor(r() * n) }, () => ({
        a: Math.floor(r() * n),
        g: 1 / (1e3 + r() * 1e5),
        v: Math.round(r() * 50) / 10,
      }));
      const inject = Array.from({ length: n }, () => (r() < 0.5 ? 0 : (r() - 0.5) * 1e-4));
      const net = { n, fixed, links, ties, inject };
      const v = solve(net);
      for (let k = 0; k < n; k++) {
        if (fixed[k] !== undefined) {
          expect(v[k]).toBe(fixed[k]);
          continue;
        }
        if (v[k] === undefined) continue;
        let out = 0;
        let scale = Math.abs(inject[k]!);
        for (const l of links) {
          if (!(l.g > 0) || (l.a !== k && l.b !== k)) continue;
          const other = v[l.a === k ? l.b : l.a];
          expect(other, 'a node linked to a defined one is defined').toBeDefined();
          out += (v[k]! - other!) * l.g;
          scale += Math.abs(v[k]! * l.g);
        }
        for (const t of ties) {
          if (t.a !== k) continue;
          out += (v[k]! - t.v) * t.g;
          scale += Math.abs(v[k]! * t.g);
        }
        expect(Math.abs(out - inject[k]!)).toBeLessThanOrEqual(1e-9 * scale + 1e-15);
      }
    }
  });
});

describe("the divider (the issue's reference case, worked by hand there)", () => {
  // k = R2/(R1 + R2); k_min = 3.267/(2.222 + 3.267) = 0.5952, k_max = 3.333/(2.178 + 3.333) = 0.6048.
  const kMin = 3267 / (2222 + 3267);
  const kMax = 3333 / (2178 + 3333);
  const view = viewOf(divider(), 'RX33');
  const pair = view.analysis.pairs.find((p) => p.driver === 'U1.Y' && p.receiver === 'U2.A')!;

  it("k at the tolerance ends is the issue's 0.5952 and 0.6048", () => {
    expect(kMin).toBeCloseTo(0.5952, 4);
    expect(kMax).toBeCloseTo(0.6048, 4);
  });

  // The input's own leakage, 5 µA (lvcmos33, from memory), flows through R1‖R2 at the same ends.
  const IIN = 5e-6;
  it('worst high = VOH,min · k_min against VIH (VOH = VDD − 0.1 at 4.75 V; VIH 2.0 V, JESD8C restated), less the input current through R1‖R2', () => {
    close(pair.high!.out, 4.65 * kMin - ((2222 * 3267) / (2222 + 3267)) * IIN);
    close(pair.high!.margin, 4.65 * kMin - ((2222 * 3267) / (2222 + 3267)) * IIN - 2);
    expect(pair.high!.driverVdd).toBe(4.75);
    expect(pair.high!.detail).toEqual({ vSource: 4.65, 'R:R1': 2222, 'R:R2': 3267 });
    expect(pair.via).toBe('R1');
  });

  it('worst low = VOL,max · k_max against VIL (VOL 0.1 V; VIL 0.8 V, JESD8C restated)', () => {
    close(pair.low!.out, 0.1 * kMax + ((2178 * 3333) / (2178 + 3333)) * IIN);
    close(pair.low!.margin, 0.8 - 0.1 * kMax - ((2178 * 3333) / (2178 + 3333)) * IIN);
  });

  it('over-voltage is judged at VDD,drv,max · k_max = 5.25 × 0.6048 = 3.175 V, not at 5.25 V', () => {
    const pin = view.pins.find((p) => p.key === 'U2.A')!;
    const e = pathExposure(view.path!, pin, view.rails, (vdd) => levelAt('VDD+0.5', vdd), 'high')!;
    close(e.vNet, 5.25 * kMax);
    expect(e.vNet).toBeCloseTo(3.175, 3);
    expect(e.current).toBe(0);
  });

  it('10–90 % edge ln 9 · (R1‖R2) · C: 1.32 kΩ, 10 pF, 29 ns (each resistor at its high end: 1.3332 kΩ, 29.3 ns)', () => {
    close(view.pathEdge!.resistance, (2222 * 3333) / (2222 + 3333));
    close(view.pathEdge!.riseTime, Math.log(9) * ((2222 * 3333) / 5555) * 10e-12);
    // At the nominal values the figure: ln 9 × 1.32 kΩ × 10 pF = 29.0 ns.
    expect(Math.log(9) * 1320 * 10e-12).toBeCloseTo(29.0e-9, 10);
  });

  it("the driver's load includes the divider current, 5.25 V / (2.178 + 3.267) kΩ at most", () => {
    const a = viewOf(divider(), 'TX5');
    // Plus the receiver's 5 µA input current (lvcmos33, from memory), drawn through the resistors.
    const r1 = 2178;
    const r2 = 3267;
    close(a.loads.get('U1.Y')!.high, 5.25 / (r1 + r2) + (r2 / (r1 + r2)) * 5e-6);
  });
});

describe("clamp current through a series resistor (the issue's case)", () => {
  it('1 kΩ − 5 % from 5.25 V into a 3.135 V rail: (5.25 − 3.135)/950 = 2.23 mA', () => {
    const view = viewOf(seriesClamp(), 'RX1');
    const pin = view.pins.find((p) => p.key === 'U2.A1')!;
    const e = pathExposure(view.path!, pin, view.rails, (vdd) => levelAt('VDD+0.5', vdd), 'high')!;
    close(e.current, (5.25 - 3.135) / 950);
    expect(e.current * 1e3).toBeCloseTo(2.23, 2);
    close(e.vNet, 5.25);
  });
});

describe("FET shifter pairs (the I2C-bus specification's level-shifting section)", () => {
  it('far-side low = VOL + I_far · RDS(on), I_far the far pull-up at VOL (resistor at its low end)', () => {
    const view = viewOf(fetBus({ rdsOnMax: 6 }), 'SDA_H');
    const pair = view.analysis.pairs.find((p) => p.driver === 'U2.SDA' && p.receiver === 'U1.SDA')!;
    // The receiver and the far pull-up share the 3.3 V rail: the worst corner is its lowest,
    // where VIL = 0.3 × 3.135 is lowest (one VDD per rail, rules-catalogue.md).
    const iFar = (3.135 - 0.4) / (4700 * 0.99);
    close(pair.low!.out, 0.4 + iFar * 6);
    close(pair.low!.threshold, 0.3 * 3.135);
    expect(pair.via).toBe('Q1');
  });

  it("each side's high is its own pull-up (no input currents here: Vpull,min)", () => {
    const view = viewOf(fetBus(), 'SDA_L');
    const pair = view.analysis.pairs.find((p) => p.driver === 'U1.SDA' && p.receiver === 'U2.SDA')!;
    close(pair.high!.out, 1.71);
    close(pair.high!.threshold, 0.7 * 1.71);
  });

  it("the driver's low load counts both pull-ups: 1.49 V/4.653 kΩ + 3.065 V/4.653 kΩ", () => {
    const view = viewOf(fetBus(), 'SDA_L');
    close(view.loads.get('U2.SDA')!.low, 1.49 / 4653 + 3.065 / 4653);
  });

  it('with the gate rail off the FET passes nothing', () => {
    const d = fetBus();
    const off = { ...d, scenarios: [{ id: 'g-off', label: 'gate off', off: ['1v8'] }] };
    const view = viewOf(off, 'SDA_H', 'g-off');
    expect(view.analysis.pairs.filter((p) => p.via !== undefined)).toEqual([]);
  });
});

/** The design with a 100 Ω resistor between the driver and the diode's cathode. */
function throughSeries(d: Design): Design {
  return {
    ...d,
    discretes: [...(d.discretes ?? []), resistor('RS', 100)],
    nets: [
      ...d.nets.filter((n) => n.id !== 'TX'),
      { id: 'TX', pins: ['U1.Y', 'RS.1'] },
      { id: 'MID', pins: ['RS.2', 'D1.K'] },
    ],
  };
}

describe('diode shifter pairs', () => {
  it('low = VOL + Vf; high = Vpull,min − Rp·(Σ iin + leakage)', () => {
    const view = viewOf(diodeLink({ vfMax: 0.45, leakageMax: 5e-6 }), 'RX');
    const pair = view.analysis.pairs.find((p) => p.driver === 'U1.Y' && p.receiver === 'U2.A')!;
    // 74LVC VOL 0.4 V at 12 mA (the 2.7 V row, restated; the 0.53 mA load passes its 100 µA row),
    // Vf 0.45 V (invented, a Schottky's usual size from memory).
    close(pair.low!.out, 0.4 + 0.45);
    // 74HCT input current ±1 µA (JESD7 restated); pull-up 10 kΩ +1 %.
    close(pair.high!.out, 4.75 - 10100 * (1e-6 + 5e-6));
  });

  // One set of quantities for the high level whether the driver sits beside the diode or beyond a
  // series resistor: the pull's resistance and the diode's leakage it carries.
  it.each([
    ['beside the diode', diodeLink({ leakageMax: 5e-6 })],
    ['beyond a series resistor', throughSeries(diodeLink({ leakageMax: 5e-6 }))],
  ])("the high level's detail names the leakage, driver %s", (_where, d) => {
    const pair = viewOf(d, 'RX').analysis.pairs.find((p) => p.driver === 'U1.Y' && p.receiver === 'U2.A')!;
    expect(pair.high!.detail).toEqual({ pullResistance: 10100, leakage: 5e-6 });
  });

  it('passes nothing from its anode back to its cathode', () => {
    const view = viewOf(diodeLink(), 'TX');
    expect(view.analysis.pairs).toEqual([]);
  });
});
