/**
 * One name for one thing (issue 18): every quick fix offered on the example, with every net,
 * rail and profile labelled apart from its id, names them by label in its title and its
 * sentence ("Use 74HCT CMOS…", not "Use 74hct"; "up to Supply label 2", not "up to 3v3").
 */
import { describe, expect, it } from 'vitest';
import { exampleDesign } from '../../../app/example.ts';
import { fixesFor } from '../../../app/store/commands/fixes/index.ts';
import { check } from '../../../rules/check/check.ts';
import { idsWhereLabelsBelong, relabelled } from '../../support/relabel.ts';

const design = relabelled(exampleDesign());
const result = check(design);
// One power state is enough: the fixes offered depend on the finding, not on which state found it.
const findings = result.findings.filter((f) => f.scenario === 'all-on');
const fixes = findings.flatMap((f) => fixesFor(f, design, result));

describe('quick fixes on the relabelled example', () => {
  it('offers fixes that name nets, rails and profiles, so that the check below can fail', () => {
    const ids = new Set(fixes.map((f) => f.id));
    for (const id of ['ttl-inputs', 'pull-up', 'translator']) expect(ids, id).toContain(id);
  });

  it('names a profile by its label: Use 74HCT…', () => {
    const ttl = fixes.find((f) => f.id === 'ttl-inputs')!;
    expect(ttl.title).toMatch(/^Use 74HCT CMOS, TTL inputs/);
  });

  it('names nets and rails by label in every title and sentence', () => {
    const bad = fixes.flatMap((f) =>
      [f.title, f.sentence].flatMap((text) => idsWhereLabelsBelong(text, design).map((id) => `${id}: ${text}`)),
    );
    expect(bad).toEqual([]);
  });
});
