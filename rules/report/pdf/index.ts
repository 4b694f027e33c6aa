/**
 * The PDF report (report-format.md: "the PDF report shows the same content for people"):
 * cover, block diagram, findings, rail crossings, margins per net, voltage ladders, method and sources,
 * cautions. jsPDF runs in Node and in the browser; this module takes the font files as bytes,
 * so that it reads nothing itself. The editor should load it with `import()`: jsPDF is large.
 */
import { jsPDF } from 'jspdf';
import type { Design } from '../../model/schema.ts';
import type { CheckResult } from '../../engine/types.ts';
import type { Report } from '../reportSchema.ts';
import { drawContents, drawCover } from './cover.ts';
import { drawDiagram } from './diagram.ts';
import { laddersSection } from './ladders.ts';
import { registerFonts, type PdfFonts } from './fonts.ts';
import { drawCautions, drawMethod } from './method.ts';
import { addPage, drawFurniture, type Ctx } from './page.ts';
import { crossingsTable, findingsTable, marginsTable } from './tables.ts';
import type { Paper } from './theme.ts';

export { reportPdfFileName } from './fileName.ts';
export { toBase64, type PdfFonts } from './fonts.ts';
export type { Paper } from './theme.ts';

/** What {@link writeReportPdf} needs. */
export interface ReportPdfInput {
  /** The report, as `buildReport(design, result, …)` made it. */
  readonly report: Report;
  /** The design checked (with any overridden setting applied), for the diagram and the rails. */
  readonly design: Design;
  /** `check(design)`: the per-net analysis gives the margin table. */
  readonly result: CheckResult;
  /** TrueType files; DejaVu Sans (regular, bold) and DejaVu Sans Mono cover Ω, µ, ≤, – and →. */
  readonly fonts: PdfFonts;
  /** Default `a4`. */
  readonly paper?: Paper;
  /** Called as each stage ends (`fonts`, `draw`, `output`), for a caller that measures them. */
  readonly mark?: (stage: 'fonts' | 'draw' | 'output') => void;
}

/** The sections in their order; the cover's contents list keeps a line for each. */
const SECTION_COUNT = 7;

/**
 * A stable file identifier from the report's time and title (FNV-1a, 128 bits as four
 * 32-bit lanes), so that the same report gives the same bytes (`SOURCE_DATE_EPOCH`).
 */
function fileId(report: Report): string {
  const text = `${report.generatedAt}\u0000${report.design.title}\u0000${report.tool}`;
  let out = '';
  for (let lane = 0; lane < 4; lane++) {
    let h = (0x811c9dc5 ^ lane) >>> 0;
    for (let k = 0; k < text.length; k++) h = Math.imul(h ^ text.charCodeAt(k), 0x01000193) >>> 0;
    out += h.toString(16).padStart(8, '0');
  }
  return out.toUpperCase();
}

/**
 * Writes the report as a PDF and returns its bytes. Pure apart from jsPDF's own work: the
 * same input gives the same bytes (the creation date is the report's `generatedAt`).
 */
export function writeReportPdf(input: ReportPdfInput): Uint8Array {
  const { report, design, result } = input;
  const paper = input.paper ?? 'a4';
  const doc = new jsPDF({ unit: 'pt', format: paper, orientation: 'portrait', compress: true, putOnlyUsedFonts: true });
  const fonts = registerFonts(doc, input.fonts);
  input.mark?.('fonts');
  const ctx: Ctx = { doc, fonts, paper, sections: [] };
  doc.setProperties({
    title: `Railcross report: ${report.design.title}`,
    subject: 'Signal-level check of a mixed-rail design',
    creator: report.tool,
    keywords: 'railcross, noise margin, logic levels',
  });
  doc.setCreationDate(new Date(report.generatedAt));
  doc.setFileId(fileId(report));

  const contentsY = drawCover(ctx, report, design, SECTION_COUNT);
  const first = report.scenarios[0] ?? { id: 'all-on', label: 'All rails on' };
  drawDiagram(ctx, design, report, {
    state: first,
    family: (part) => part.profile,
  });
  let y = addPage(ctx);
  y = findingsTable(ctx, y, report);
  y = crossingsTable(ctx, y, report, result);
  y = marginsTable(ctx, y, report, design, result);
  y = laddersSection(ctx, y, report, result);
  y = drawMethod(ctx, y, report);
  drawCautions(ctx, y, report);

  drawContents(ctx, contentsY);
  drawFurniture(ctx, report.design.title, report.tool, report.generatedAt);
  input.mark?.('draw');
  const bytes = new Uint8Array(doc.output('arraybuffer'));
  input.mark?.('output');
  return bytes;
}
