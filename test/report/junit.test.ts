/**
 * JUnit XML: well-formed XML 1.0 (read back by a strict reader), a test case per net and power
 * state, a failure where an unwaived finding reaches the fail-on level, the rest in system-out.
 */
import { describe, expect, it } from 'vitest';
import { check } from '../../rules/check/check.ts';
import type { Design } from '../../rules/model/schema.ts';
import { baselineOf } from '../../rules/report/baseline.ts';
import { buildReport } from '../../rules/report/buildReport.ts';
import { escapeXml, renderJunit } from '../../rules/report/junit.ts';
import type { FailOn, Report } from '../../rules/report/reportSchema.ts';
import { parseXml, type XmlElement } from '../support/xml.ts';
import { FIXED_TIME, greenhouse } from './fixtures.ts';

const reportOf = (d: Design, failOn: FailOn = 'error'): Report =>
  buildReport(d, check(d), { failOn, generatedAt: FIXED_TIME });
const nets = (d: Design) => d.nets.map((n) => n.id);
const cases = (root: XmlElement) => root.children.flatMap((s) => s.children.map((c) => ({ suite: s, c })));
const failure = (c: XmlElement) => c.children.find((e) => e.name === 'failure');

function waivedAndOdd(): Design {
  const d = greenhouse();
  return {
    ...d,
    title: 'Greenhouse <rev B> & "C" \u0001',
    nets: d.nets.map((n) =>
      n.id === 'VALVE_EN'
        ? { ...n, waivers: [{ rule: 'level-high' as const, note: 'fixed by a buffer & a <note>' }] }
        : n,
    ),
  };
}

describe('JUnit XML of the example', () => {
  const d = greenhouse();
  const report = reportOf(d);
  const root = parseXml(renderJunit(report, { nets: nets(d) }));

  it("has a suite per power state and a case per net in each, in the file's order", () => {
    expect(root.name).toBe('testsuites');
    expect(root.children.map((s) => s.name)).toEqual(['testsuite', 'testsuite', 'testsuite']);
    expect(root.children.map((s) => s.attrs.name)).toEqual([
      'all-on (All rails on)',
      'standby (Standby: sensor rail off)',
      'reset (Reset: controller pins are inputs)',
    ]);
    for (const s of root.children) {
      const names = s.children.map((c) => c.attrs.name);
      expect(names.slice(0, d.nets.length)).toEqual(d.nets.map((n) => `net ${n.id}`));
    }
  });

  it('fails exactly the cases holding an unwaived error, with each such finding in the failure', () => {
    for (const { suite, c } of cases(root)) {
      const state = suite.attrs.name!.split(' ')[0]!;
      const net = c.attrs.name!.replace(/^net /, '');
      const errors = report.findings.filter(
        (f) =>
          f.scenario === state &&
          (f.net ?? 'pins on no net and rails') === net &&
          f.severity === 'error' &&
          f.waived === undefined,
      );
      const fail = failure(c);
      expect(fail !== undefined, `${state} ${net}`).toBe(errors.length > 0);
      for (const f of errors) expect(fail!.text).toContain(f.id);
    }
  });

  it('counts tests and failures in the attributes', () => {
    const all = cases(root);
    expect(Number(root.attrs.tests)).toBe(all.length);
    expect(Number(root.attrs.failures)).toBe(all.filter(({ c }) => failure(c) !== undefined).length);
    for (const s of root.children)
      expect(Number(s.attrs.failures)).toBe(s.children.filter((c) => failure(c) !== undefined).length);
    expect(Number(root.attrs.failures)).toBeGreaterThan(0);
  });

  it('lists the findings that do not fail in system-out: nothing is hidden', () => {
    const text = cases(root)
      .map(({ c }) => c.children.map((e) => e.text).join('\n'))
      .join('\n');
    for (const f of report.findings) expect(text).toContain(f.id);
  });
});

/** The example with FLOW's planted pull-range error waived: only its edge-rate warning is left to fail it. */
function flowWaived(): Design {
  const d = greenhouse();
  return {
    ...d,
    nets: d.nets.map((n) =>
      n.id === 'FLOW'
        ? { ...n, waivers: [{ rule: 'pull-range' as const, note: 'a pull-up is fitted on the sensor' }] }
        : n,
    ),
  };
}

describe('JUnit XML details', () => {
  it.each<[string, () => Design, FailOn, number]>([
    // The example has unwaived errors on 9 nets in all-on (VALVE_EN, SDA, SCL, DISP_RX, STATUS,
    // PUMP_EN, SLEEP, TANK_LOW, FLOW), the same 9 in standby, and 8 in reset (no contention on
    // PUMP_EN once the controller's pin is an input). edge-rate warns on FLOW in all three; SCL2_L (the planted FET-shifter pull-up) fails in all-on and at reset.
    ['fail on error', greenhouse, 'error', 28],
    ['fail on warning: FLOW fails already by its error', greenhouse, 'warning', 28],
    ["fail on error, FLOW's error waived: FLOW passes", flowWaived, 'error', 25],
    ["fail on warning, FLOW's error waived: its warning fails it again", flowWaived, 'warning', 28],
  ])('%s', (_name, make, failOn, expected) => {
    const d = make();
    const root = parseXml(renderJunit(reportOf(d, failOn), { nets: nets(d) }));
    expect(Number(root.attrs.failures)).toBe(expected);
  });

  it('a waived finding does not fail its case; markup and control characters are escaped', () => {
    const d = waivedAndOdd();
    const xml = renderJunit(reportOf(d), { nets: nets(d) });
    const root = parseXml(xml);
    expect(root.attrs.name).toBe('railcross check: Greenhouse <rev B> & "C" \uFFFD');
    const valve = new Map(
      cases(root)
        .filter(({ c }) => c.attrs.name === 'net VALVE_EN')
        .map(({ suite, c }) => [suite.attrs.name!.split(' ')[0]!, c]),
    );
    expect([...valve.keys()]).toEqual(['all-on', 'standby', 'reset']);
    for (const state of ['all-on', 'standby']) {
      const c = valve.get(state)!;
      expect(failure(c), state).toBeUndefined();
      expect(c.children.find((e) => e.name === 'system-out')!.text).toContain('waived: fixed by a buffer & a <note>');
    }
    // In reset the controller's pin is an input: nothing drives VALVE_EN, and the floating inputs
    // are an error the level-high waiver does not cover.
    const reset = failure(valve.get('reset')!);
    expect(reset?.text).toContain('floating-input:VALVE_EN:reset');
    expect(reset?.text).not.toContain('level-high');
  });

  it('with a baseline holding every finding, nothing fails', () => {
    const d = greenhouse();
    const report = reportOf(d);
    const root = parseXml(renderJunit(report, { nets: nets(d), baseline: baselineOf(report) }));
    expect(root.attrs.failures).toBe('0');
    expect(Number(root.attrs.tests)).toBeGreaterThan(0);
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
