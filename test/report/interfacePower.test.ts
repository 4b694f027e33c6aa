/**
 * The per-rail sum of interface-power findings. ΔICC figures: 74HCT 0.5 mA and 74AHCT 1.5 mA
 * per input at VCC − 2.1 V (from memory, the library's values); 3.3 V LVCMOS VOH VDD − 0.2 V
 * (JESD8C), 2.935 V at 3.135 V, below 5.25 − 2.1 = 3.15 V.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { check } from '../../rules/check/check.ts';
import { interfacePowerRows } from '../../rules/report/interfacePower.ts';
import { buildReport } from '../../rules/report/buildReport.ts';
import { renderText } from '../../rules/report/renderText.ts';
import { readDesign } from '../../rules/model/reader.ts';
import { design, input, net, output, part, scenario } from '../support/build.ts';

const board = design({
  parts: [
    part('D', '3v3', 'lvcmos33', [output('Y'), output('Z')]),
    part('H', '5v0', '74hct', [input('A'), input('B')]),
    part('K', '5v0', '74ahct', [input('A')]),
  ],
  nets: [net('N1', ['D.Y', 'H.A', 'H.B']), net('N2', ['D.Z', 'K.A'], { waivers: [] })],
  scenarios: [scenario('io-off', ['3v3'])],
});

describe('interface power per rail', () => {
  it('sums ΔICC per power state and rail: 2 × 0.5 mA + 1.5 mA on 5v0 with every rail on, nothing with 3v3 off', () => {
    const rows = interfacePowerRows(check(board).findings);
    expect(rows.map((r) => ({ ...r, current: Math.round(r.current * 1e9) / 1e9 }))).toEqual([
      { scenario: 'all-on', rail: '5v0', current: 2.5e-3, pins: ['H.A', 'H.B', 'K.A'] },
    ]);
  });

  it('leaves a waived finding out of the sum', () => {
    const waived = {
      ...board,
      nets: board.nets.map((n) =>
        n.id === 'N2' ? { ...n, waivers: [{ rule: 'interface-power' as const, note: 'budgeted' }] } : n,
      ),
    };
    const rows = interfacePowerRows(check(waived).findings);
    expect(rows).toHaveLength(1);
    expect(rows[0]!.current).toBeCloseTo(1e-3, 12);
    expect(rows[0]!.pins).toEqual(['H.A', 'H.B']);
  });

  it("the example: the controller's 3.3 V output into the display's 74HCT input costs 0.5 mA from 5v0 in each power state", () => {
    const text = readFileSync(new URL('../../rules/examples/greenhouse.json', import.meta.url), 'utf8');
    const read = readDesign(text);
    if (!read.ok) throw new Error('example unreadable');
    const report = buildReport(read.design, check(read.design), {
      failOn: 'error',
      generatedAt: '2026-01-01T00:00:00.000Z',
    });
    expect(report.interfacePower).toEqual([
      { scenario: 'all-on', rail: '5v0', current: 0.5e-3, pins: ['U4.RX'] },
      { scenario: 'standby', rail: '5v0', current: 0.5e-3, pins: ['U4.RX'] },
      { scenario: 'reset', rail: '5v0', current: 0.5e-3, pins: ['U4.RX'] },
    ]);
    expect(renderText(report)).toMatch(/all-on\s+5 V valve and display supply\s+500 µA\s+U4\.RX/);
  });
});
