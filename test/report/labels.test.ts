/**
 * One name for one thing (issue 18): the example with every net, rail and profile labelled apart
 * from its id, through every report writer. Human text names nets and rails by label; ids stay
 * where a person needs them to edit the file (the crossings table's net column, the profiles'
 * list) and in the machine fields (finding ids, SARIF's logical locations, JUnit's case names).
 */
import { describe, expect, it } from 'vitest';
import { check } from '../../rules/check/check.ts';
import type { Design } from '../../rules/model/schema.ts';
import { buildReport } from '../../rules/report/buildReport.ts';
import { renderJunit } from '../../rules/report/junit.ts';
import { renderMarkdown } from '../../rules/report/renderMarkdown.ts';
import { renderText } from '../../rules/report/renderText.ts';
import { toSarif } from '../../rules/report/sarif.ts';
import example from '../../rules/examples/greenhouse.json' with { type: 'json' };
import { idsWhereLabelsBelong, relabelled } from '../support/relabel.ts';
import { FIXED_TIME } from './fixtures.ts';

const design = relabelled(example as Design);
const report = buildReport(design, check(design), { failOn: 'error', generatedAt: FIXED_TIME });

/** The text before a heading line that starts `marker` (the profiles' list gives ids on purpose). */
const textBefore = (text: string, marker: string) => text.slice(0, text.indexOf(marker));

describe('the relabelled example', () => {
  it('has findings that name nets and rails, so that the checks below can fail', () => {
    const withNet = report.findings.filter((f) => f.net !== null);
    expect(withNet.length).toBeGreaterThan(10);
    expect(report.crossings.length).toBeGreaterThan(3);
    expect(report.names?.rails['3v3']).toBe('Supply label 2');
  });

  it('text: findings, crossings and supply currents name nets and rails by label', () => {
    const text = textBefore(renderText(report, { verbose: true }), '\nProfiles used');
    // The crossings table's first column is the net's id, beside its label: what the file says.
    const lines = text.split('\n').map((line) => {
      const crossing = report.crossings.find((c) => line.startsWith(`  ${c.net} `));
      return crossing === undefined ? line : line.slice(2 + crossing.net.length);
    });
    const bad = lines.flatMap((line) => idsWhereLabelsBelong(line, design).map((id) => `${id}: ${line}`));
    expect(bad).toEqual([]);
  });

  it('Markdown: the same', () => {
    const md = textBefore(renderMarkdown(report), '\n## Profiles');
    const lines = md.split('\n').map((line) => line.replace(/^\| `[^`]*` \|/, '|'));
    const bad = lines.flatMap((line) => idsWhereLabelsBelong(line, design).map((id) => `${id}: ${line}`));
    expect(bad).toEqual([]);
  });

  it('SARIF: messages by label, logical locations by id', () => {
    const sarif = toSarif(report, { file: 'greenhouse.json' }) as {
      runs: { results: { message: { text: string }; locations: { logicalLocations: { name: string }[] }[] }[] }[];
    };
    const results = sarif.runs[0]!.results;
    for (const r of results) expect(idsWhereLabelsBelong(r.message.text, design), r.message.text).toEqual([]);
    const names = results.flatMap((r) => r.locations[0]!.logicalLocations.map((l) => l.name));
    expect(names).toContain('SDA');
  });

  it('JUnit: failure messages by label', () => {
    const xml = renderJunit(report);
    const messages = [...xml.matchAll(/message="([^"]*)"/g)].map((m) => m[1]!);
    expect(messages.length).toBeGreaterThan(0);
    for (const m of messages) expect(idsWhereLabelsBelong(m, design), m).toEqual([]);
  });
});
