/**
 * Properties of check() over random valid designs (test/support/arbitraries.ts draws designs
 * with awkward ids, random parameters, pulls, scenarios and waivers).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { check } from '../../rules/check/check.ts';
import type { Finding } from '../../rules/engine/types.ts';
import type { Design } from '../../rules/model/schema.ts';
import { RULE_IDS } from '../../rules/model/ruleIds.ts';
import { designArb } from '../support/arbitraries.ts';

const RUNS = { numRuns: 150 };

/** A finding without its waiver mark, to compare two checks finding by finding. */
const bare = ({ waived: _w, ...f }: Finding) => f;

// 150 random designs a test: a second or two alone, many more on a machine shared with other work.
describe('check() over random valid designs', { timeout: 120_000 }, () => {
  it('never throws, and its summary counts its findings', () => {
    fc.assert(
      fc.property(designArb(), (design) => {
        const r = check(design);
        const unwaived = r.findings.filter((f) => f.waived === undefined);
        expect(r.summary.waived).toBe(r.findings.length - unwaived.length);
        expect(r.summary.error + r.summary.warning + r.summary.info).toBe(unwaived.length);
        expect(new Set(r.findings.map((f) => f.id)).size).toBe(r.findings.length);
      }),
      RUNS,
    );
  });

  it('adding a waiver changes no finding but the ones it names', () => {
    fc.assert(
      fc.property(
        designArb().filter((d) => d.nets.length > 0),
        fc.nat(),
        fc.constantFrom(...RULE_IDS),
        (design, k, rule) => {
          const index = k % design.nets.length;
          const net = design.nets[index]!;
          const waived: Design = {
            ...design,
            nets: design.nets.map((n, i) =>
              i === index ? { ...n, waivers: [...(n.waivers ?? []), { rule, note: 'reviewed on the bench' }] } : n,
            ),
          };
          const before = check(design).findings;
          const after = check(waived).findings;
          expect(after.map(bare)).toEqual(before.map(bare));
          after.forEach((f, i) => {
            const named = f.net === net.id && f.rule === rule;
            if (named) expect(f.waived).toBeDefined();
            else expect(f.waived).toBe(before[i]!.waived);
          });
        },
      ),
      RUNS,
    );
  });

  it('removing every pin of a net removes its findings', () => {
    fc.assert(
      fc.property(
        designArb().filter((d) => d.nets.length > 0),
        fc.nat(),
        (design, k) => {
          const index = k % design.nets.length;
          const id = design.nets[index]!.id;
          const emptied: Design = {
            ...design,
            nets: design.nets.map((n, i) => (i === index ? { ...n, pins: [], route: [] } : n)),
          };
          expect(check(emptied).findings.filter((f) => f.net === id)).toEqual([]);
        },
      ),
      RUNS,
    );
  });

  it('a design whose rails are all on has no back-power finding', () => {
    fc.assert(
      fc.property(designArb(), (design) => {
        const allOn: Design = { ...design, scenarios: (design.scenarios ?? []).map((s) => ({ ...s, off: [] })) };
        expect(check(allOn).findings.filter((f) => f.rule === 'back-power')).toEqual([]);
      }),
      RUNS,
    );
  });
});
