/**
 * A check result is a value: a later incremental check never changes an earlier result
 * (the engine's contract, rules/check/check.ts). Before the tables were made of shared
 * buckets, `check(d1, r0)` took over r0's Maps: r0.nets lost SDA while r0.design still had it.
 */
import { produce } from 'immer';
import { describe, expect, it } from 'vitest';
import { check } from '../../rules/check/check.ts';
import type { CheckResult } from '../../rules/engine/types.ts';
import { greenhouse } from '../report/fixtures.ts';

const GREENHOUSE = greenhouse();

/** Everything a reader of a result can see, copied out. */
function snapshot(r: CheckResult) {
  return {
    nets: [...r.nets].map(([s, m]) => [s, [...m.keys()].sort()]),
    lone: [...r.lonePins].map(([s, m]) => [s, [...m.keys()].sort()]),
    rails: [...r.railFindings.keys()].sort(),
    findings: r.findings.map((f) => f.id),
    summary: { ...r.summary },
  };
}

describe('a result is a value', () => {
  it('removing net SDA leaves the earlier result whole: its nets, findings and summary', () => {
    const r0 = check(GREENHOUSE);
    const before = snapshot(r0);
    const d1 = produce(GREENHOUSE, (d) => {
      d.nets = d.nets.filter((n) => n.id !== 'SDA');
    });
    const r1 = check(d1, r0);
    expect(r1.stats.incremental).toBe(true);
    expect(r1.nets.get('all-on')!.has('SDA')).toBe(false);
    expect(r0.nets.get('all-on')!.has('SDA')).toBe(true);
    expect(r1.nets).not.toBe(r0.nets);
    expect(snapshot(r0)).toEqual(before);
    // and the later result equals a fresh full check of its own design
    expect(snapshot(r1)).toEqual(snapshot(check(d1)));
  });

  it('findings first read after a later check still describe their own design', () => {
    const r0 = check(GREENHOUSE);
    const full = check(GREENHOUSE).findings.map((f) => f.id);
    const d1 = produce(GREENHOUSE, (d) => {
      d.nets = d.nets.filter((n) => n.id !== 'SDA' && n.id !== 'SCL');
    });
    check(d1, r0);
    // r0.findings was never read before the second check: the lazy list must still be r0's
    expect(r0.findings.map((f) => f.id)).toEqual(full);
    expect(r0.findings.some((f) => f.net === 'SDA')).toBe(full.some((id) => id.includes(':SDA:')));
  });

  it('a result handed on twice gives a full check the second time, equal to a fresh one', () => {
    const r0 = check(GREENHOUSE);
    const d1 = produce(GREENHOUSE, (d) => {
      d.nets[0]!.label = 'DATA';
    });
    const d2 = produce(GREENHOUSE, (d) => {
      d.nets = d.nets.slice(1);
    });
    check(d1, r0);
    const r2 = check(d2, r0);
    expect(r2.stats.incremental).toBe(false);
    expect(snapshot(r2)).toEqual(snapshot(check(d2)));
  });

  it('the summary is counted from the findings, in every result of a chain of edits', () => {
    let design = GREENHOUSE;
    let result = check(design);
    for (const id of design.nets.map((n) => n.id).slice(0, 5)) {
      design = produce(design, (d) => {
        d.nets = d.nets.filter((n) => n.id !== id);
      });
      result = check(design, result);
      const counted = { error: 0, warning: 0, info: 0, waived: 0 };
      for (const f of result.findings) counted[f.waived !== undefined ? 'waived' : f.severity]++;
      expect(result.summary).toEqual(counted);
    }
  });
});
