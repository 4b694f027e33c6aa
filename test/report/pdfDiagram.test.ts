/**
 * The PDF's block diagram draws what the canvas draws: the example's pull resistors with their
 * values (IEC 60062 codes: 4K7 for 4.7 kΩ, 47K for 47 kΩ) beside the net's name or the pin's,
 * and the same routes as the editor (rules/routing), with no wire through a part box.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { loadDejaVuFonts } from '../../rules/cli/node.ts';
import { check } from '../../rules/check/check.ts';
import { buildReport } from '../../rules/report/buildReport.ts';
import { writeReportPdf } from '../../rules/report/pdf/index.ts';
import { layoutDiagram } from '../../rules/report/pdf/diagramLayout.ts';
import { bodyCrossings, sharedTracks } from '../../rules/routing/index.ts';
import { FIXED_TIME, greenhouse } from './fixtures.ts';

const HAVE_POPPLER = spawnSync('pdftotext', ['-v']).error === undefined;
const dir = mkdtempSync(join(tmpdir(), 'railcross-diagram-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('the PDF diagram', () => {
  it.skipIf(!HAVE_POPPLER)("prints each pull resistor's value beside its net or pin", { timeout: 60_000 }, () => {
    const d = greenhouse();
    const result = check(d);
    const report = buildReport(d, result, { failOn: 'error', generatedAt: FIXED_TIME });
    const file = join(dir, 'report.pdf');
    writeFileSync(file, writeReportPdf({ report, design: d, result, fonts: loadDejaVuFonts() }));
    const text = execFileSync('pdftotext', ['-f', '2', '-l', '2', '-layout', file, '-'], { encoding: 'utf8' });
    // SDA and SCL: 4.7 kΩ to 3.3 V; the controller's RAIN pin: an internal 47 kΩ.
    expect(text).toMatch(/SDA\s+↑4K7 3\.3 V/);
    expect(text).toMatch(/SCL\s+↑4K7 3\.3 V/);
    expect(text).toMatch(/RAIN ↑47K/);
  });

  it('routes the example as the editor does: no shared track, no wire through a box', () => {
    const layout = layoutDiagram(greenhouse());
    const drawn = layout.wires.map((w) => ({ net: w.net.id, points: w.points }));
    const boxes = layout.boxes.map((b) => ({ id: b.part.id, x: b.x, y: b.y, width: b.width, height: b.height }));
    expect(sharedTracks(drawn, 3)).toEqual([]);
    expect(bodyCrossings(drawn, boxes)).toEqual([]);
    expect(layout.junctions.length).toBeGreaterThan(0);
  });
});
