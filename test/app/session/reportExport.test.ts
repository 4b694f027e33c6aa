import { describe, expect, it } from 'vitest';
import { buildEditorReport, editorReportMarkdown } from '../../../app/session/reportExport.ts';
import { renderMarkdown } from '../../../rules/report/renderMarkdown.ts';
import { exampleDesign } from '../../../app/example.ts';
import { check } from '../../../rules/check/check.ts';
import { newDesign } from '../../../rules/model/newDesign.ts';
import { ReportSchema } from '../../../rules/report/reportSchema.ts';

const AT = new Date(Date.UTC(2026, 11, 1, 12, 0, 0));

describe("the editor's JSON report", () => {
  it.each([
    {
      name: 'the example, with its planted faults',
      design: exampleDesign(),
      finding: 'level-high:VALVE_EN:all-on:U1.VALVE_EN>U3.EN',
      parts: 12,
    },
    { name: 'an empty design', design: newDesign('Empty board'), finding: undefined, parts: 0 },
  ])('$name: holds to the report schema', ({ design, finding, parts }) => {
    const built = buildEditorReport(design, check(design), AT);
    expect(built.ok).toBe(true);
    if (!built.ok) return;
    expect(ReportSchema.safeParse(built.report).success).toBe(true);
    expect(built.report.generatedAt).toBe('2026-12-01T12:00:00.000Z');
    expect(built.report.settings.failOn).toBe('error');
    expect(built.report.design).toMatchObject({ title: design.title, parts });
    expect(built.report.findings.find((f) => f.id === finding)?.severity).toBe(
      finding === undefined ? undefined : 'error',
    );
  });

  it('says why when the check result does not belong to the design (no throw)', () => {
    const design = exampleDesign();
    const built = buildEditorReport({ ...design, title: 42 as unknown as string }, check(design), AT);
    expect(built.ok).toBe(false);
    expect(!built.ok && built.errors[0]).toContain('design.title');
  });
});

describe("the editor's Markdown report", () => {
  it("is the command line's Markdown of the same report, named after the design", () => {
    const design = exampleDesign();
    const made = editorReportMarkdown(design, check(design), AT);
    const built = buildEditorReport(design, check(design), AT);
    expect(made.ok && built.ok).toBe(true);
    if (!made.ok || !built.ok) return;
    expect(made.name).toBe('greenhouse-irrigation-controller-report.md');
    expect(made.text).toBe(renderMarkdown(built.report));
    expect(made.text).toMatch(/^# Railcross check: Greenhouse irrigation controller\n/);
    expect(made.text).toContain('`level-high`');
  });

  it('says why when the report cannot be made', () => {
    const design = exampleDesign();
    const made = editorReportMarkdown({ ...design, title: 42 as unknown as string }, check(design), AT);
    expect(made.ok).toBe(false);
    expect(!made.ok && made.errors[0]).toContain('design.title');
  });
});
