/**
 * The work a large design asks for, as plain functions of plain data, so that the same code
 * runs in the checking worker (check.worker.ts) and, where there is no worker (tests), inline:
 * reading a design file (the engine's reader), checking it (the engine's `check`, the same one
 * the command line runs) and writing its report. Each step says when it starts, for progress.
 */
import { check } from '../../rules/check/index.ts';
import type { CheckResult } from '../../rules/engine/index.ts';
import type { DesignError } from '../../rules/model/index.ts';
import { readDesign } from '../../rules/model/index.ts';
import type { Design } from '../../rules/model/index.ts';
import type { Report } from '../../rules/report/index.ts';
import { buildEditorReport } from '../session/reportExport.ts';
import { RailcrossDb } from '../storage/db.ts';
import { Library, readDocument } from '../storage/library.ts';

export { LARGE_DESIGN_PARTS, WORKER_FILE_BYTES } from './limits.ts';

export type Stage = 'reading' | 'checking' | 'storing' | 'reporting';

export interface Counts {
  readonly errors: number;
  readonly warnings: number;
}

export type ReadReply =
  | {
      readonly ok: true;
      /** The design, unless it was stored where it was read (`stored`): a large design never crosses to the page. */
      readonly design: Design | null;
      readonly stored: { readonly id: string; readonly rev: number } | null;
      readonly title: string;
      readonly parts: number;
      readonly counts: Counts;
      readonly checkMs: number;
    }
  | { readonly ok: false; readonly errors: readonly DesignError[] };

export type ReportReply =
  | { readonly ok: true; readonly report: Report; readonly counts: Counts; readonly findings: number }
  | { readonly ok: false; readonly errors: readonly string[] };

function countsOf(result: CheckResult): Counts {
  return { errors: result.summary.error, warnings: result.summary.warning };
}

/** Read a design file's text and check it. */
export function readJob(
  text: string,
  progress: (stage: Stage) => void,
): { reply: ReadReply; result: CheckResult | null } {
  progress('reading');
  const read = readDesign(text);
  if (!read.ok) return { reply: { ok: false, errors: read.errors }, result: null };
  progress('checking');
  const start = performance.now();
  const result = check(read.design);
  const checkMs = performance.now() - start;
  return {
    reply: {
      ok: true,
      design: read.design,
      stored: null,
      title: read.design.title,
      parts: read.design.parts.length,
      counts: countsOf(result),
      checkMs,
    },
    result,
  };
}

/** Where a read stores a design of more than `aboveParts` parts itself, as a new design of the library. */
export interface StoreLarge {
  readonly dbName: string;
  readonly aboveParts: number;
}

/**
 * After `readJob`, a design above the limit is stored in the library from here (its own
 * connection to the database), so that the page never copies it in or out.
 */
export async function storeIfLarge(
  read: { reply: ReadReply; result: CheckResult | null },
  store: StoreLarge | undefined,
  progress: (stage: Stage) => void,
): Promise<{ reply: ReadReply; result: CheckResult | null }> {
  const { reply } = read;
  if (!reply.ok || store === undefined || reply.parts <= store.aboveParts || reply.design === null) return read;
  progress('storing');
  const db = new RailcrossDb(store.dbName);
  try {
    const record = await new Library(db).create(reply.design, reply.counts);
    return { reply: { ...reply, design: null, stored: { id: record.id, rev: record.rev } }, result: read.result };
  } finally {
    db.close();
  }
}

/** The JSON report of a stored document (read and checked here) or of a design just checked. */
export function reportJob(
  source: { readonly doc: unknown } | { readonly design: Design; readonly result: CheckResult },
  progress: (stage: Stage) => void,
  now = new Date(),
): ReportReply {
  let design: Design;
  let result: CheckResult;
  if ('doc' in source) {
    progress('reading');
    const read = readDocument(source.doc);
    if (!read.ok) return { ok: false, errors: read.errors.slice(0, 6).map((e) => `${e.path}: ${e.message}`) };
    design = read.design;
    progress('checking');
    result = check(design);
  } else {
    ({ design, result } = source);
  }
  progress('reporting');
  const built = buildEditorReport(design, result, now);
  if (!built.ok) return built;
  return { ok: true, report: built.report, counts: countsOf(result), findings: built.report.findings.length };
}
