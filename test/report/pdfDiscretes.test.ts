/**
 * The PDF's block diagram draws the parts between chips as the canvas does: each with its
 * designator and value, a resistor's as an IEC 60062 code with a small k (2k2, 3k3, 4k7; the
 * letter in place of the decimal point, IEC 60062) and its tolerance, a shifter's deciding
 * figure, and the wires to their pins routed around their boxes.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { loadDejaVuFonts } from '../../rules/cli/node.ts';
import { check } from '../../rules/check/check.ts';
import { buildReport } from '../../rules/report/buildReport.ts';
import { discreteValue } from '../../rules/report/discreteValue.ts';
import { layoutDiagram } from '../../rules/report/pdf/diagramLayout.ts';
import { writeReportPdf } from '../../rules/report/pdf/index.ts';
import { bodyCrossings } from '../../rules/routing/index.ts';
import type { Design } from '../../rules/model/schema.ts';
import { divider, fetBus } from '../support/paths.ts';
import { FIXED_TIME } from './fixtures.ts';

const HAVE_POPPLER = spawnSync('pdftotext', ['-v']).error === undefined;
const dir = mkdtempSync(join(tmpdir(), 'railcross-discretes-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** The divider and the FET-shifted bus side by side, each part at a place of its own. */
function board(): Design {
  const a = divider();
  const b = fetBus();
  const at = (x: number, y: number) => ({ position: { x, y } });
  return {
    ...a,
    rails: [...a.rails, ...b.rails.filter((r) => !a.rails.some((x) => x.id === r.id))],
    profiles: [...(a.profiles ?? []), ...(b.profiles ?? [])],
    parts: [
      ...a.parts.map((p, k) => ({ ...p, ...at(k * 500, 0) })),
      ...b.parts.map((p, k) => ({ ...p, id: `B${p.id}`, ...at(k * 500, 400) })),
    ],
    discretes: [
      ...(a.discretes ?? []).map((d, k) => ({ ...d, ...at(260, k * 120) })),
      // Q1 between the chips, the pull-ups below it.
      ...(b.discretes ?? []).map((d, k) => ({ ...d, id: `B${d.id}`, ...at(260, 380 + k * 110) })),
    ],
    nets: [
      ...a.nets,
      ...b.nets.map((n) => ({
        ...n,
        id: `B${n.id}`,
        pins: n.pins.map((k) => `B${k}`),
      })),
    ],
  } as Design;
}

describe('parts between chips in the PDF diagram', () => {
  it.each([
    [{ id: 'R', kind: 'resistor', ohms: 4700, tolerance: 0.01 }, '4k7 ±1 %'],
    [{ id: 'R', kind: 'resistor', ohms: 2200 }, '2k2 ±5 %'],
    [{ id: 'R', kind: 'resistor', ohms: 100e3, tolerance: 0.05 }, '100k ±5 %'],
    [{ id: 'R', kind: 'resistor', ohms: 470, tolerance: 0.01 }, '470R ±1 %'],
    [{ id: 'Q', kind: 'fet-shifter', gate: 'x', vgsThMax: 1, rdsOnMax: 5 }, 'VGS(th) ≤ 1 V'],
    [{ id: 'D', kind: 'diode-shifter', vfMax: 0.45, leakageMax: 5e-6 }, 'Vf ≤ 0.45 V'],
  ] as const)('%o is labelled %s', (d, label) => {
    expect(discreteValue(d as never)).toBe(label);
  });

  it('lays out a box per part with anchors for its untied pins, and routes no wire through one', () => {
    const d = board();
    const layout = layoutDiagram(d);
    expect(layout.discretes.map((b) => [b.discrete.id, b.pins.map((p) => p.key)])).toEqual([
      ['R1', ['R1.1', 'R1.2']],
      // R2's end 2 is tied to ground: no anchor there.
      ['R2', ['R2.1']],
      ['BQ1', ['BQ1.S', 'BQ1.D']],
      ['BRL', ['BRL.1']],
      ['BRH', ['BRH.1']],
    ]);
    // Every pin of every net is reached: the divider's nets have wires to R1 and R2.
    const ends = new Set(layout.wires.flatMap((w) => [w.points[0], w.points.at(-1)]).map((p) => `${p!.x},${p!.y}`));
    for (const b of layout.discretes) for (const p of b.pins) expect(ends.has(`${p.at.x},${p.at.y}`), p.key).toBe(true);
    const boxes = [
      ...layout.boxes.map((b) => ({ id: b.part.id, x: b.x, y: b.y, width: b.width, height: b.height })),
      ...layout.discretes.map((b) => ({ id: b.discrete.id, x: b.x, y: b.y, width: b.width, height: b.height })),
    ];
    const drawn = layout.wires.map((w) => ({ net: w.net.id, points: w.points }));
    expect(bodyCrossings(drawn, boxes)).toEqual([]);
  });

  it.skipIf(!HAVE_POPPLER)('prints each part with its value', { timeout: 60_000 }, () => {
    const d = board();
    const result = check(d);
    const report = buildReport(d, result, { failOn: 'error', generatedAt: FIXED_TIME });
    const file = join(dir, 'report.pdf');
    writeFileSync(file, writeReportPdf({ report, design: d, result, fonts: loadDejaVuFonts() }));
    const text = execFileSync('pdftotext', ['-f', '2', '-l', '2', '-raw', file, '-'], { encoding: 'utf8' });
    expect(text).toContain('2k2 ±1 %');
    expect(text).toContain('3k3 ±1 %');
    expect(text).toContain('VGS(th) ≤ 1 V');
    expect(text).toMatch(/BQ1 gate 1v8/);
    expect(text).toContain('ground');
    expect(text).toMatch(/and 5 between them/);
  });
});
