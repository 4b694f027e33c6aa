/**
 * `diff` and `--baseline` over pairs of designs: the example against edits of it. Finding ids
 * carry rule, net (or pin), power state and pair, so an edit that does not touch a net leaves
 * that net's ids, and the findings behind them, as they were.
 */
import { describe, expect, it } from 'vitest';
import { check } from '../../rules/engine/check.ts';
import type { Design, Net } from '../../rules/model/schema.ts';
import { baselineOf, baselineVerdict, inBaseline } from '../../rules/report/baseline.ts';
import { buildReport } from '../../rules/report/buildReport.ts';
import { changeText, diffReports, renderDiffJson, renderDiffMarkdown, renderDiffText, type ReportDiff } from '../../rules/report/diff.ts';
import type { FailOn, Report } from '../../rules/report/reportSchema.ts';
import { FIXED_TIME, greenhouse } from './fixtures.ts';

const reportOf = (d: Design, failOn: FailOn = 'error'): Report => buildReport(d, check(d), { failOn, generatedAt: FIXED_TIME });
const base = greenhouse();

const onNet = (id: string, change: (n: Net) => Net) => (d: Design): Design => ({ ...d, nets: d.nets.map((n) => (n.id === id ? change(n) : n)) });
const waive = (d: Design) => onNet('VALVE_EN', (n) => ({ ...n, waivers: [{ rule: 'level-high', note: 'a buffer is fitted' }] }))(d);

/** Edits that touch no net: every id and finding stays. */
const untouched: [string, (d: Design) => Design][] = [
  ['the same design', (d) => d],
  ['every part moved', (d) => ({ ...d, parts: d.parts.map((p) => ({ ...p, position: { x: (p.position?.x ?? 0) + 120, y: (p.position?.y ?? 0) - 40 } })) })],
  ['a new title', (d) => ({ ...d, title: 'Greenhouse controller, rev B' })],
  ['a part renamed in its label only', (d) => ({ ...d, parts: d.parts.map((p) => (p.id === 'U1' ? { ...p, label: 'Main controller' } : p)) })],
  ['the nets listed in reverse', (d) => ({ ...d, nets: [...d.nets].reverse() })],
];

type Expected = { new: string[]; gone: string[]; changed: [string, string[]][]; regressions: number };

/** Edits of one net or its parts, with what the comparison must say. */
const edits: [string, (d: Design) => Design, Expected][] = [
  [
    // The 100 kΩ pull-up was above the 67.3 kΩ the range allows; 47 kΩ lies inside (from the report).
    'FROST pull-up 100 kΩ → 47 kΩ: its pull-range finding drops from error to info',
    onNet('FROST', (n) => ({ ...n, pull: { to: '3v3', ohms: 47_000 } })),
    { new: [], gone: [], changed: [['pull-range:FROST:all-on', ['severity', 'values.ohms']], ['pull-range:FROST:standby', ['severity', 'values.ohms']]], regressions: 0 },
  ],
  [
    'FROST back to 100 kΩ from 47 kΩ: the same change reversed is a regression in both states',
    (d) => d,
    { new: [], gone: [], changed: [['pull-range:FROST:all-on', ['severity', 'values.ohms']], ['pull-range:FROST:standby', ['severity', 'values.ohms']]], regressions: 2 },
  ],
  [
    'the SLEEP net deleted: its findings go, the two inputs float on no net (warnings)',
    (d) => ({ ...d, nets: d.nets.filter((n) => n.id !== 'SLEEP') }),
    {
      new: ['floating-input:U3.SLEEP:all-on', 'floating-input:U4.SLEEP:all-on', 'floating-input:U3.SLEEP:standby', 'floating-input:U4.SLEEP:standby'],
      gone: ['floating-input:SLEEP:all-on', 'floating-input:SLEEP:standby'],
      changed: [],
      regressions: 0,
    },
  ],
  [
    'a waiver on VALVE_EN: its level-high findings change by their waiver alone',
    waive,
    { new: [], gone: [], changed: [['level-high:VALVE_EN:all-on:U1.VALVE_EN>U3.EN', ['waived']], ['level-high:VALVE_EN:standby:U1.VALVE_EN>U3.EN', ['waived']]], regressions: 0 },
  ],
];

function ids(d: ReportDiff) {
  return {
    new: d.new.map((f) => f.id).sort(),
    gone: d.gone.map((f) => f.id).sort(),
    changed: d.changed.map((c) => [c.id, c.changes.map((x) => x.key).sort()] as [string, string[]]).sort(),
    regressions: d.summary.regressions,
  };
}
const sorted = (e: Expected) => ({ new: [...e.new].sort(), gone: [...e.gone].sort(), changed: [...e.changed].sort(), regressions: e.regressions });

describe('finding ids are stable across edits that touch no net', () => {
  const before = reportOf(base);
  it.each(untouched)('%s', (_name, edit) => {
    const after = reportOf(edit(base));
    const byId = (r: Report) => new Map(r.findings.map((f) => [f.id, f]));
    const a = byId(before);
    const b = byId(after);
    expect([...b.keys()].sort()).toEqual([...a.keys()].sort());
    for (const [id, f] of b) expect({ ...f, message: '' }, id).toEqual({ ...a.get(id)!, message: '' });
    expect(a.size).toBeGreaterThan(20); // not vacuous: the example has findings on most nets
    const d = diffReports(before, after, { from: 'a', to: 'b' }, 'error');
    expect(d.summary).toEqual({ new: 0, gone: 0, changed: 0, unchanged: a.size, regressions: 0 });
  });

  it('an edit of one net leaves every other net\'s findings as they were', () => {
    const after = reportOf(onNet('FROST', (n) => ({ ...n, pull: { to: '3v3', ohms: 47_000 } }))(base));
    const others = (r: Report) => r.findings.filter((f) => f.net !== 'FROST');
    expect(others(after)).toEqual(others(before));
  });
});

describe('diff OLD NEW', () => {
  it.each(edits)('%s', (name, edit, expected) => {
    // The reversed case compares the 47 kΩ design (old) with the example (new).
    const reversed = name.startsWith('FROST back');
    const from = reversed ? reportOf(onNet('FROST', (n) => ({ ...n, pull: { to: '3v3', ohms: 47_000 } }))(base)) : reportOf(base);
    const to = reportOf(edit(base));
    const d = diffReports(from, to, { from: 'old.json', to: 'new.json' }, 'error');
    expect(ids(d)).toEqual(sorted(expected));
    expect(d.summary.unchanged + d.summary.changed + d.summary.new).toBe(to.findings.length);
    expect(d.summary.unchanged + d.summary.changed + d.summary.gone).toBe(from.findings.length);
  });

  it('a regression: the waiver removed again fails both states at the error level', () => {
    const d = diffReports(reportOf(waive(base)), reportOf(base), { from: 'a', to: 'b' }, 'error');
    expect(d.summary.regressions).toBe(2);
  });

  it.each<[FailOn, number]>([
    // SDA pulled up with 2.2 kΩ: U1 sinks more than its 1 mA test point, its VOL rises to the
    // 0.4 V point and NML falls to 0.113 V < 0.2 V, a new warning (all-on; in standby U2 is off).
    ['error', 0],
    ['warning', 1],
  ])('a new warning is a regression only with --fail-on warning (%s)', (failOn, regressions) => {
    const d = diffReports(reportOf(base, failOn), reportOf(onNet('SDA', (n) => ({ ...n, pull: { to: '3v3', ohms: 2200 } }))(base), failOn), { from: 'a', to: 'b' }, failOn);
    expect(d.new.map((f) => f.id)).toEqual(['level-low:SDA:all-on:U1.SDA>U2.SDA']);
    expect(d.summary.regressions).toBe(regressions);
  });

  describe('renderings', () => {
    const d = diffReports(reportOf(base), reportOf(onNet('FROST', (n) => ({ ...n, pull: { to: '3v3', ohms: 47_000 } }))(base)), { from: 'old.json', to: 'new | rev.json' }, 'error');
    it('text names each change with its numbers in engineering notation', () => {
      const text = renderDiffText(d);
      expect(text).toContain('0 new, 0 gone, 2 changed');
      expect(text).toContain('severity error → info; ohms 100 kΩ → 47 kΩ');
    });
    it('Markdown escapes a file name in a code span and keeps tables', () => {
      const md = renderDiffMarkdown(d);
      expect(md).toContain('`new \\| rev.json`');
      expect(md).toMatch(/^\| info \| `pull-range` \| `FROST` \| `all-on` \| severity error → info; ohms 100 kΩ → 47 kΩ \|/m);
    });
    it('JSON carries the summary and every change', () => {
      const json = JSON.parse(renderDiffJson(d)) as ReportDiff;
      expect(json.format).toBe('railcross.diff');
      expect(json.summary.changed).toBe(2);
      expect(json.changed[0]!.changes).toEqual([
        { key: 'severity', before: 'error', after: 'info' },
        { key: 'values.ohms', before: 100_000, after: 47_000 },
      ]);
    });
  });

  it.each([
    ['a margin', { key: 'values.margin', before: -0.75875, after: 0.2 }, 'margin -0.759 V → 0.2 V'],
    ['a severity', { key: 'severity', before: 'error', after: 'warning' }, 'severity error → warning'],
    ['a waiver added', { key: 'waived', before: null, after: 'ok' }, 'waived — → ok'],
    ['a current', { key: 'values.loadLow', before: 0.0048, after: 0.0016 }, 'loadLow 4.8 mA → 1.6 mA'],
  ])('changeText: %s', (_name, change, text) => {
    expect(changeText(change)).toBe(text);
  });
});

describe('--baseline', () => {
  const known = baselineOf(reportOf(base));
  it.each<[string, (d: Design) => Design, FailOn, boolean, RegExp]>([
    ['the same design passes though it has errors', (d) => d, 'error', false, /^PASS: .* beyond the baseline; 20 findings at that level already in the baseline\.$/],
    ['a fixed finding still passes', onNet('FROST', (n) => ({ ...n, pull: { to: '3v3', ohms: 47_000 } })), 'error', false, /^PASS/],
    ['a new warning passes at fail-on error', onNet('SDA', (n) => ({ ...n, pull: { to: '3v3', ohms: 2200 } })), 'error', false, /^PASS/],
    ['a new warning fails at fail-on warning', onNet('SDA', (n) => ({ ...n, pull: { to: '3v3', ohms: 2200 } })), 'warning', true, /^FAIL: .* not in the baseline: 1 warning; 23 findings at that level already in the baseline\.$/],
    [
      'a new error fails: a 5 V push-pull output added to the 3.3 V-only DISP_TX net',
      (d) => ({
        ...d,
        parts: [...d.parts, { id: 'X1', label: 'Extra', rail: '5v0', profile: 'hc', pins: [{ id: 'Y', role: 'output' }] }],
        nets: d.nets.map((n) => (n.id === 'DISP_TX' ? { ...n, pins: [...n.pins, 'X1.Y'] } : n)),
      }),
      'error',
      true,
      /^FAIL: .* not in the baseline: \d+ errors?; /,
    ],
  ])('%s', (_name, edit, failOn, fails, line) => {
    const base2 = failOn === 'warning' ? baselineOf(reportOf(base, 'warning')) : known;
    const v = baselineVerdict(reportOf(edit(base), failOn), base2);
    expect(v.fails).toBe(fails);
    expect(v.line).toMatch(line);
  });

  it.each<[string, 'error' | 'warning' | 'info', 'error' | 'warning' | 'info', boolean]>([
    ['same severity', 'error', 'error', true],
    ['milder now', 'error', 'warning', true],
    ['worse now: new', 'warning', 'error', false],
    ['info became a warning: new', 'info', 'warning', false],
  ])('inBaseline: %s', (_name, was, now, held) => {
    const f = reportOf(base).findings[0]!;
    const b = baselineOf({ ...reportOf(base), findings: [{ ...f, severity: was }] });
    expect(inBaseline({ ...f, severity: now }, b)).toBe(held);
  });
});
