import 'fake-indexeddb/auto';
import { beforeAll, describe, expect, it } from 'vitest';
import { readJob, reportJob, LARGE_DESIGN_PARTS, WORKER_FILE_BYTES } from '../../../app/check/jobs.ts';
import { READ_ONLY } from '../../../app/store/editorStore.ts';
import { setTitle } from '../../../app/store/commands/index.ts';
import { exampleDesign } from '../../../app/example.ts';
import { check } from '../../../rules/check/check.ts';
import { writeDesign } from '../../../rules/model/writer.ts';
import { ReportSchema } from '../../../rules/report/reportSchema.ts';
import type { Design } from '../../../rules/model/schema.ts';
import { generateDesign } from '../../support/generator.ts';
import { dbName, tab } from './sessionSupport.ts';

// One design just over the threshold, and what a full check of it finds.
let large: Design;
let text: string;
let counts: { errors: number; warnings: number };
beforeAll(() => {
  large = generateDesign(14, { parts: LARGE_DESIGN_PARTS + 1 });
  text = writeDesign(large);
  const summary = check(large).summary;
  counts = { errors: summary.error, warnings: summary.warning };
});

const file = (body: string, name = 'big-board.railcross.json') => new File([body], name, { type: 'application/json' });

describe('the checking jobs (run in the worker, or inline)', () => {
  it("reads and checks a file, naming each stage as it starts; the counts are the engine's", () => {
    const stages: string[] = [];
    const { reply } = readJob(text, (s) => stages.push(s));
    expect(stages).toEqual(['reading', 'checking']);
    expect(reply.ok && [reply.parts, reply.counts]).toEqual([LARGE_DESIGN_PARTS + 1, counts]);
  });

  it("refuses a bad file with the reader's place and reason, checking nothing", () => {
    const stages: string[] = [];
    const { reply } = readJob(
      '{"format":"railcross.design","version":1,"title":"x","rails":[],"parts":[{"id":"U1"}],"nets":[]}',
      (s) => stages.push(s),
    );
    expect(stages).toEqual(['reading']);
    expect(!reply.ok && reply.errors[0]?.path).toMatch(/^parts\[0\]/);
  });

  it('reports on a stored document: the report holds to its schema and counts what the check counts', () => {
    const reply = reportJob({ doc: exampleDesign() }, () => {});
    const summary = check(exampleDesign()).summary;
    expect(reply.ok && reply.counts).toEqual({ errors: summary.error, warnings: summary.warning });
    expect(reply.ok && ReportSchema.safeParse(reply.report).success).toBe(true);
  });
});

describe('a design too large to edit comfortably opens with a choice', () => {
  it('is above the file size read in the worker', () => {
    expect(text.length).toBeGreaterThan(WORKER_FILE_BYTES);
  });

  it('an import stores it and offers the choice without opening it; report only checks it and opens nothing', async () => {
    const a = await tab(dbName());
    const openBefore = a.openId;
    expect(await a.importFile(file(text))).toBe(true);
    const offered = a.state.getState().large;
    expect(offered).toMatchObject({ title: large.title, parts: LARGE_DESIGN_PARTS + 1, counts, source: 'import' });
    expect(a.openId).toBe(openBefore);
    const stored = await a.library!.list();
    expect(stored.designs.map((d) => [d.title, d.errors, d.warnings])).toContainEqual([
      large.title,
      counts.errors,
      counts.warnings,
    ]);

    // The record keeps the part count, so that the next start need not read the document to know it.
    const id = offered!.id;
    expect((await a.library!.db.designs.get(id))?.parts).toBe(LARGE_DESIGN_PARTS + 1);
    expect(await a.library!.partCount(id)).toBe(LARGE_DESIGN_PARTS + 1);
    // A record written before the count was kept: the document is counted instead.
    const { parts: _kept, ...older } = (await a.library!.db.designs.get(id))!;
    await a.library!.db.designs.put(older);
    expect(await a.library!.partCount(id)).toBe(LARGE_DESIGN_PARTS + 1);

    await a.chooseLarge('report');
    const report = a.state.getState().large?.report;
    expect(report?.counts).toEqual(counts);
    expect(ReportSchema.safeParse(JSON.parse(report?.text ?? 'null')).success).toBe(true);
    expect(report?.fileName).toMatch(/-report\.json$/);
    expect(a.openId).toBe(openBefore);
  });

  it('read-only opens it refusing every edit and saving nothing; "Edit" opens it for editing', async () => {
    const a = await tab(dbName());
    await a.importFile(file(text));
    const id = a.state.getState().large!.id;
    await a.chooseLarge('read-only');
    expect(a.state.getState().large).toBeNull();
    expect(a.openId).toBe(id);
    const editor = a.editor.getState();
    expect(editor.readOnly).toBe(true);
    expect(editor.apply(setTitle('Changed'))).toEqual({ ok: false, reason: READ_ONLY });
    expect(a.hasUnsaved()).toBe(false);
    expect((await a.library!.open(id)).ok && (await a.library!.db.designs.get(id))?.rev).toBe(1);

    await a.editAnyway();
    expect(a.editor.getState().readOnly).toBe(false);
    expect(a.editor.getState().apply(setTitle('Changed')).ok).toBe(true);
  });

  it('reopened at the next start, it waits for the choice instead of opening; "not now" opens another design', async () => {
    const name = dbName();
    const a = await tab(name);
    const other = a.openId;
    await a.importFile(file(text));
    await a.chooseLarge('open');
    const id = a.openId;
    expect(a.editor.getState().readOnly).toBe(false);
    await a.settled;

    const b = await tab(name);
    expect(b.state.getState().large).toMatchObject({ id, source: 'start', parts: LARGE_DESIGN_PARTS + 1 });
    expect(b.openId).toBeNull();
    expect(b.editor.getState().design.parts).toEqual([]);
    await b.chooseLarge('cancel');
    expect(b.state.getState().large).toBeNull();
    expect(b.openId).toBe(other);
  });

  it('a small file still opens at once', async () => {
    const a = await tab(dbName());
    const small = generateDesign(15, { parts: 600 });
    const body = writeDesign(small);
    expect(body.length).toBeGreaterThan(WORKER_FILE_BYTES);
    expect(await a.importFile(file(body))).toBe(true);
    expect(a.state.getState().large).toBeNull();
    expect(a.editor.getState().design.title).toBe(small.title);
  });
});
