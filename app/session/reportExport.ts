/**
 * The editor's report exports (report-format.md): the JSON report of the open design and its
 * check result, held to the report schema before it is written, the same report as Markdown
 * (what `railcross check --format md` prints), and the PDF, whose writer
 * (jsPDF and the fonts, about 2 MB) is loaded only when asked for.
 */
import type { CheckResult } from '../../rules/engine/index.ts';
import type { Design } from '../../rules/model/index.ts';
import { buildReport } from '../../rules/report/index.ts';
import { reportPdfFileName } from '../../rules/report/index.ts';
import { renderMarkdown } from '../../rules/report/index.ts';
import { ReportSchema, type Report } from '../../rules/report/index.ts';
import { reportJsonFileName, reportMarkdownFileName } from '../storage/designFile.ts';
import { downloadFile } from './download.ts';
import type { Session } from './session.ts';

export type Built =
  | { readonly ok: true; readonly report: Report }
  | { readonly ok: false; readonly errors: readonly string[] };

/** The report of the open design, as the command line would write it, checked against its schema. */
export function buildEditorReport(design: Design, result: CheckResult, now = new Date()): Built {
  let report: Report;
  try {
    report = buildReport(design, result, { failOn: 'error', generatedAt: now.toISOString() });
  } catch (error) {
    return { ok: false, errors: [error instanceof Error ? error.message : String(error)] };
  }
  const parsed = ReportSchema.safeParse(report);
  if (parsed.success) return { ok: true, report };
  return {
    ok: false,
    errors: parsed.error.issues.slice(0, 6).map((i) => `${i.path.join('.') || '(root)'}: ${i.message}`),
  };
}

function refused(session: Session, what: string, errors: readonly string[]): void {
  session.notify({
    key: 'export',
    tone: 'error',
    title: `The ${what} could not be made`,
    lines: [...errors, 'Please report this: the design itself is fine and still saved.'],
  });
}

/** "Export → Report (JSON)". */
export function exportReportJson(session: Session): void {
  const { design, result } = session.editor.getState();
  const built = buildEditorReport(design, result);
  if (!built.ok) {
    refused(session, 'JSON report', built.errors);
    return;
  }
  downloadFile(reportJsonFileName(design.title), `${JSON.stringify(built.report, null, 2)}\n`, 'application/json');
}

/** "Export → Report (Markdown)": the text and file name it writes, or why it could not. */
export function editorReportMarkdown(
  design: Design,
  result: CheckResult,
  now = new Date(),
): { ok: true; name: string; text: string } | { ok: false; errors: readonly string[] } {
  const built = buildEditorReport(design, result, now);
  if (!built.ok) return built;
  return { ok: true, name: reportMarkdownFileName(design.title), text: renderMarkdown(built.report) };
}

/** "Export → Report (Markdown)". */
export function exportReportMarkdown(session: Session): void {
  const { design, result } = session.editor.getState();
  const made = editorReportMarkdown(design, result);
  if (!made.ok) {
    refused(session, 'Markdown report', made.errors);
    return;
  }
  downloadFile(made.name, made.text, 'text/markdown');
}

/** Let the browser paint the progress indication before a long step. */
const nextFrame = () => new Promise<void>((resolve) => requestAnimationFrame(() => setTimeout(resolve, 0)));

/** US and Canadian locales print on Letter; everyone else on A4 (ISO 216). */
function paperFor(locale: string): 'a4' | 'letter' {
  return /^(en-US|en-CA|es-US|fr-CA)$/i.test(locale) ? 'letter' : 'a4';
}

/** "Export → Report (PDF)", with its progress in the session's task. */
export async function exportReportPdf(session: Session): Promise<void> {
  if (session.state.getState().task !== null) return;
  const { design, result } = session.editor.getState();
  const built = buildEditorReport(design, result);
  if (!built.ok) return refused(session, 'PDF report', built.errors);
  try {
    session.setTask('Making the PDF: loading the writer…');
    await nextFrame();
    const { makeReportPdf } = await import('./reportPdf.ts');
    const bytes = await makeReportPdf(
      { report: built.report, design, result, paper: paperFor(navigator.language) },
      async (step) => {
        session.setTask(`Making the PDF: ${step}…`);
        await nextFrame();
      },
    );
    downloadFile(reportPdfFileName(design.title), bytes, 'application/pdf');
  } catch (error) {
    refused(session, 'PDF report', [error instanceof Error ? error.message : String(error)]);
  } finally {
    session.setTask(null);
  }
}
