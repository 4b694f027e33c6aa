/**
 * The series-resistor fix for an over-voltage: a 5 V ±5 % 74HC output straight into a clamped
 * 3.3 V ±5 % LVCMOS input (viMax VDD + 0.5 V, JESD8C restated). The resistor is sized from the
 * input's injection-current limit, R·(1 − t) ≥ (Vsrc,max − VDD,rx,min)/Iinj (the clamp
 * formula with Vf = 0, the worst case), rounded up to E24 (IEC 60063).
 */
import { describe, expect, it } from 'vitest';
import { fixesFor, previewFix } from '../../../app/store/commands/fixes/index.ts';
import { seriesOhms } from '../../../app/store/commands/fixes/series.ts';
import { check } from '../../../rules/check/check.ts';
import type { Design } from '../../../rules/model/schema.ts';
import { design, input, net, output, part, rail3v3, rail5v0 } from '../../support/build.ts';
import { applyAndUndo } from './support.ts';

/** One net: U1 (74HC on 5 V) drives U2.A (LVCMOS on 3.3 V), with or without an injection limit. */
/** `minLoad` null: the 3.3 V rail states none. */
function direct(injectionMax?: number, minLoad: number | null = 2e-3): Design {
  return design({
    rails: [rail5v0, minLoad === null ? rail3v3 : { ...rail3v3, minLoad }],
    parts: [
      part('U1', '5v0', '74hc', [output('Y')], { position: { x: 0, y: 0 } }),
      part('U2', '3v3', 'lvcmos33', [input('A', injectionMax === undefined ? {} : { params: { injectionMax } })], {
        position: { x: 400, y: 0 },
      }),
    ],
    nets: [net('TX', ['U1.Y', 'U2.A'])],
  });
}

const FINDING = 'overvoltage:TX:all-on:U2.A';

function fixOf(d: Design) {
  const r = check(d);
  const f = r.findings.find((x) => x.id === FINDING);
  if (f === undefined) throw new Error(`no ${FINDING}`);
  return fixesFor(f, d, r).find((x) => x.id === 'series-resistor');
}

describe('series resistor sizing', () => {
  it.each([
    // (5.25 − 3.135)/1 mA = 2115 Ω; ÷ 0.95 = 2226 Ω → 2.4 kΩ (2.2 kΩ's low end, 2090 Ω, is too small).
    ['1 mA limit, 5 %', 5.25, 3.135, 1e-3, 0.05, 2115, 2400],
    // Without tolerance 2.2 kΩ would do: the tolerance is what moves it up a step.
    ['1 mA limit, exact', 5.25, 3.135, 1e-3, 0, 2115, 2200],
    // (5.25 − 3.135)/2 mA = 1057.5 Ω; ÷ 0.95 = 1113 Ω → 1.2 kΩ.
    ['2 mA limit, 5 %', 5.25, 3.135, 2e-3, 0.05, 1057.5, 1200],
    // (3.465 − 1.71)/0.5 mA = 3510 Ω; ÷ 0.95 = 3695 Ω → 3.9 kΩ.
    ['3.3 V into 1.8 V, 0.5 mA', 3.465, 1.71, 0.5e-3, 0.05, 3510, 3900],
  ])('%s', (_name, vs, vdd, inj, tol, least, ohms) => {
    const s = seriesOhms(vs, vdd, inj, tol)!;
    expect(s.least).toBeCloseTo(least, 6);
    expect(s.ohms).toBe(ohms);
    expect(s.ohms * (1 - tol)).toBeGreaterThanOrEqual(s.least);
  });

  it.each([
    ['no excess', 3.3, 3.3, 1e-3],
    ['a zero limit', 5.25, 3.135, 0],
    ['a limit that is not a number', 5.25, 3.135, Number.NaN],
  ])('names no value for %s', (_name, vs, vdd, inj) => {
    expect(seriesOhms(vs, vdd, inj)).toBeUndefined();
  });
});

describe('series resistor fix', () => {
  it('shows the clamp current, the margins and the edge time before applying, and applies as one undo step', () => {
    const fix = fixOf(direct(1e-3))!;
    expect(fix.unavailable).toBeUndefined();
    const figures = Object.fromEntries((fix.figures ?? []).map((g) => [g.label, g.value]));
    expect(figures).toEqual({
      'Least resistance, (5.25 V − 3.135 V)/1 mA': '2.12 kΩ',
      'Chosen (E24, ±5 %; its low end 2.28 kΩ)': '2.4 kΩ',
      // 2.115 V / 2280 Ω = 0.928 mA (the resistor at its low end, the pin held at 3.135 V).
      'Clamp current into U2.A (limit 1 mA)': '928 µA',
      'Clamp current into 3v3 (its minimum load 2 mA)': '928 µA',
      // 74HC VOH 4.75 − 0.1 = 4.65 V (JESD7's 20 µA row) less 2520 Ω · 5 µA = 4.637 V; VIH 2.0 V.
      'High margin at U2.A (4.637 V against VIH 2 V)': '2.637 V',
      // VOL 0.1 V plus 2520 Ω · 5 µA = 0.113 V; VIL 0.8 V.
      'Low margin at U2.A (0.1126 V against VIL 0.8 V)': '0.6874 V',
      // ln 9 · 2520 Ω · (5 pF wiring + 5 pF input) = 55.4 ns.
      '10–90 % edge, ln 9 · 2.52 kΩ · 10 pF': '55.4 ns',
    });
    applyAndUndo(direct(1e-3), FINDING, 'series-resistor', ({ design: d, after }) => {
      expect(d.nets.map((n) => [n.id, n.pins])).toEqual([
        ['TX', ['U1.Y', 'R1.1']],
        ['TX_3v3', ['U2.A', 'R1.2']],
      ]);
      expect(d.discretes).toEqual([
        {
          id: 'R1',
          kind: 'resistor',
          label: 'TX series resistor',
          ohms: 2400,
          tolerance: 0.05,
          // Midway in the gap between U1 (0…208) and U2 (400…): (208 + 400)/2 − 60 = 244, on the 10 grid 240.
          position: { x: 240, y: 0 },
        },
      ]);
      const clamp = after.find((f) => f.rule === 'clamp-current');
      expect(clamp?.severity).toBe('info');
    });
  });

  it("shows that the rail must state its minimum load, and the preview brings rail-injection's error", () => {
    const d = direct(1e-3, null);
    const fix = fixOf(d)!;
    expect(fix.figures?.find((g) => g.label.startsWith('Clamp current into 3v3'))).toEqual({
      label: 'Clamp current into 3v3, which states no minimum load (rail-injection asks for it)',
      value: '928 µA',
    });
    const r = check(d);
    const preview = previewFix(fix, d, r);
    expect(preview.added.filter((f) => f.severity === 'error').map((f) => f.id)).toEqual(['rail-injection:3v3:all-on']);
  });

  it('says what it needs where the pin states no injection limit, and applies nothing', () => {
    const fix = fixOf(direct())!;
    expect(fix.unavailable).toMatch(/injection-current limit of U2\.A \(injectionMax/);
    expect(fix.unavailable).toContain('(5.25 V − 3.135 V)/Iinj,max');
    expect(fix.figures).toBeUndefined();
    const d = direct();
    expect(fix.apply(structuredClone(d))).toEqual({ refused: fix.unavailable });
  });

  it('is not offered where the source is a pull-up, not a driver', () => {
    const d = design({
      rails: [rail5v0, rail3v3],
      parts: [part('U2', '3v3', 'lvcmos33', [input('A', { params: { injectionMax: 1e-3 } })])],
      nets: [net('TX', ['U2.A'], { pull: { to: '5v0', ohms: 10e3 } })],
    });
    const r = check(d);
    const f = r.findings.find((x) => x.rule === 'overvoltage')!;
    expect(fixesFor(f, d, r).map((x) => x.id)).not.toContain('series-resistor');
  });
});
