/**
 * JUnit XML: well-formed XML 1.0 (read back by a strict reader), a test case per net and power
 * state, a failure where an unwaived finding reaches the fail-on level, the rest in system-out.
 */
import { describe, expect, it } from 'vitest';
import { check } from '../../rules/engine/check.ts';
import type { Design } from '../../rules/model/schema.ts';
import { baselineOf } from '../../rules/report/baseline.ts';
import { buildReport } from '../../rules/report/buildReport.ts';
import { escapeXml, renderJunit } from '../../rules/report/junit.ts';
import type { FailOn, Report } from '../../rules/report/reportSchema.ts';
import { parseXml, type XmlElement } from '../support/xml.ts';
import { FIXED_TIME, greenhouse } from './fixtures.ts';

const reportOf = (d: Design, failOn: FailOn = 'error'): Report => buildReport(d, check(d), { failOn, generatedAt: FIXED_TIME });
const nets = (d: Design) => d.nets.map((n) => n.id);
const cases = (root: XmlElement) => root.children.flatMap((s) => s.children.map((c) => ({ suite: s, c })));
const failure = (c: XmlElement) => c.children.find((e) => e.name === 'failure');

function waivedAndOdd(): Design {
  const d = greenhouse();
  return {
    ...d,
    title: 'Greenhouse <rev B> & "C" \u0001',
    nets: d.nets.map((n) => (n.id === 'VALVE_EN' ? { ...n, waivers: [{ rule: 'level-high' as const, note: 'fixed by a buffer & a <note>' }] } : n)),
  };
}

describe('JUnit XML of the example', () => {
  const d = greenhouse();
  const report = reportOf(d);
  const root = parseXml(renderJunit(report, { nets: nets(d) }));

  it('has a suite per power state and a case per net in each, in the file\'s order', () => {
    expect(root.name).toBe('testsuites');
    expect(root.children.map((s) => s.name)).toEqual(['testsuite', 'testsuite']);
    expect(root.children.map((s) => s.attrs['name'])).toEqual(['all-on (All rails on)', 'standby (Standby: sensor rail off)']);
    for (const s of root.children) {
      const names = s.children.map((c) => c.attrs['name']);
      expect(names.slice(0, d.nets.length)).toEqual(d.nets.map((n) => `net ${n.id}`));
    }
  });

  it('fails exactly the cases holding an unwaived error, with each such finding in the failure', () => {
    for (const { suite, c } of cases(root)) {
      const state = suite.attrs['name']!.split(' ')[0]!;
      const net = c.attrs['name']!.replace(/^net /, '');
      const errors = report.findings.filter((f) => f.scenario === state && (f.net ?? 'pins on no net and rails') === net && f.severity === 'error' && f.waived === undefined);
      const fail = failure(c);
      expect(fail !== undefined, `${state} ${net}`).toBe(errors.length > 0);
      for (const f of errors) expect(fail!.text).toContain(f.id);
    }
  });

  it('counts tests and failures in the attributes', () => {
    const all = cases(root);
    expect(Number(root.attrs['tests'])).toBe(all.length);
    expect(Number(root.attrs['failures'])).toBe(all.filter(({ c }) => failure(c) !== undefined).length);
    for (const s of root.children) expect(Number(s.attrs['failures'])).toBe(s.children.filter((c) => failure(c) !== undefined).length);
    expect(Number(root.attrs['failures'])).toBeGreaterThan(0);
  });

  it('lists the findings that do not fail in system-out: nothing is hidden', () => {
    const text = cases(root).map(({ c }) => c.children.map((e) => e.text).join('\n')).join('\n');
    for (const f of report.findings) expect(text).toContain(f.id);
  });
});

describe('JUnit XML details', () => {
  it.each<[string, FailOn, number]>([
    // The example has unwaived errors on 9 nets in each of its 2 power states and on SCL2_L in all-on; edge-rate warns on FLOW in both.
    ['fail on error', 'error', 19],
    ['fail on warning adds the FLOW cases', 'warning', 21],
  ])('%s', (_name, failOn, expected) => {
    const d = greenhouse();
    const root = parseXml(renderJunit(reportOf(d, failOn), { nets: nets(d) }));
    expect(Number(root.attrs['failures'])).toBe(expected);
  });

  it('a waived finding does not fail its case; markup and control characters are escaped', () => {
    const d = waivedAndOdd();
    const xml = renderJunit(reportOf(d), { nets: nets(d) });
    const root = parseXml(xml);
    expect(root.attrs['name']).toBe('railcross check: Greenhouse <rev B> & "C" \uFFFD');
    const valve = cases(root).filter(({ c }) => c.attrs['name'] === 'net VALVE_EN');
    expect(valve.length).toBe(2);
    for (const { c } of valve) {
      expect(failure(c)).toBeUndefined();
      expect(c.children.find((e) => e.name === 'system-out')!.text).toContain('waived: fixed by a buffer & a <note>');
    }
  });

  it('with a baseline holding every finding, nothing fails', () => {
    const d = greenhouse();
    const report = reportOf(d);
    const root = parseXml(renderJunit(report, { nets: nets(d), baseline: baselineOf(report) }));
    expect(root.attrs['failures']).toBe('0');
    expect(Number(root.attrs['tests'])).toBeGreaterThan(0);
  });

  it.each([
    ['markup', `<a href="x">'&'</a>`, '&lt;a href=&quot;x&quot;&gt;&apos;&amp;&apos;&lt;/a&gt;'],
    ['a C0 control', 'a\u0007b', 'a\uFFFDb'],
    ['tab and line breaks stay', 'a\tb\nc\rd', 'a\tb\nc\rd'],
    ['a lone surrogate', 'a\uD800b', 'a\uFFFDb'],
    ['a surrogate pair stays', 'a\u{1F600}b', 'a\u{1F600}b'],
    ['U+FFFF', 'a\uFFFFb', 'a\uFFFDb'],
  ])('escapeXml: %s', (_name, input, expected) => {
    expect(escapeXml(input)).toBe(expected);
  });

  it.each([
    ['a bare ampersand', '<a>&</a>'],
    ['a mismatched tag', '<a><b></a></b>'],
    ['a control character', '<a>\u0001</a>'],
    ['an unknown entity', '<a>&nbsp;</a>'],
  ])('the reader refuses %s (it can fail)', (_name, xml) => {
    expect(() => parseXml(xml)).toThrow();
  });
});
