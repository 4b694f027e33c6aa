/**
 * The PDF report in the browser: loaded with import() so that jsPDF and the font URLs stay out
 * of the main chunk; the DejaVu TrueType files (Ω, µ, ≤) are fetched once, on first use.
 */
import regularUrl from 'dejavu-fonts-ttf/ttf/DejaVuSans.ttf?url';
import boldUrl from 'dejavu-fonts-ttf/ttf/DejaVuSans-Bold.ttf?url';
import monoUrl from 'dejavu-fonts-ttf/ttf/DejaVuSansMono.ttf?url';
import { writeReportPdf, type PdfFonts, type ReportPdfInput } from '../../rules/report/pdf/index.ts';

let fonts: Promise<PdfFonts> | undefined;

async function fetchBytes(url: string): Promise<Uint8Array> {
  const response = await fetch(url);
  if (!response.ok) throw new Error(`the report's font ${url} could not be loaded (HTTP ${response.status})`);
  return new Uint8Array(await response.arrayBuffer());
}

function loadFonts(): Promise<PdfFonts> {
  fonts ??= Promise.all([fetchBytes(regularUrl), fetchBytes(boldUrl), fetchBytes(monoUrl)]).then(
    ([regular, bold, mono]) => ({ regular, bold, mono }),
  );
  // A failed fetch is tried again next time rather than remembered.
  fonts.catch(() => (fonts = undefined));
  return fonts;
}

/** Write the PDF; `onStep` names each stage so the page can show it. */
export async function makeReportPdf(
  input: Omit<ReportPdfInput, 'fonts'>,
  onStep: (step: string) => Promise<void>,
): Promise<Uint8Array> {
  await onStep('loading fonts');
  const loaded = await loadFonts();
  await onStep('writing the pages');
  return writeReportPdf({ ...input, fonts: loaded });
}
