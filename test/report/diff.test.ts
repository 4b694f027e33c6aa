/**
 * `diff` and `--baseline` over pairs of designs: the example against edits of it. Finding ids
 * carry rule, net (or pin), power state and pair, so an edit that does not touch a net leaves
 * that net's ids, and the findings behind them, as they were.
 */
import { describe, expect, it } from 'vitest';
import { check } from '../../rules/check/check.ts';
import type { Design, Net } from '../../rules/model/schema.ts';
import { baselineOf, baselineVerdict, inBaseline } from '../../rules/report/baseline.ts';
import { buildReport } from '../../rules/report/buildReport.ts';
import {
  changeText,
  diffReports,
  renderDiffJson,
  renderDiffMarkdown,
  renderDiffText,
  type ReportDiff,
} from '../../rules/report/diff.ts';
import type { FailOn, Report } from '../../rules/report/reportSchema.ts';
import { FIXED_TIME, greenhouse } from './fixtures.ts';

const reportOf = (d: Design, failOn: FailOn = 'error'): Report =>
  buildReport(d, check(d), { failOn, generatedAt: FIXED_TIME });
const base = greenhouse();

const onNet =
  (id: string, change: (n: Net) => Net) =>
  (d: Design): Design => ({ ...d, nets: d.nets.map((n) => (n.id === id ? change(n) : n)) });
const waive = (d: Design) =>
  onNet('VALVE_EN', (n) => ({ ...n, waivers: [{ rule: 'level-high', note: 'a buffer is fitted' }] }))(d);
/**
 * FLOW has only the controller pin's own 40 kΩ pull-up, above the 7.84 kΩ its 10 µs rise time
 * allows (the example's planted pull-range error, with an edge-rate warning). The report's
 * suggested 4.7 kΩ on the net fixes both: 4.7 kΩ ∥ 40 kΩ = 4.21 kΩ (parallel resistors, common
 * practice) lies inside 3.07 kΩ–7.84 kΩ, and its edges then meet the net's 10 µs limit.
 */
const flowFixed = onNet('FLOW', (n) => ({ ...n, pull: { to: '3v3', ohms: 4700 } }));
const STATES = ['all-on', 'standby', 'reset'];
/** The pull-range change of the FLOW fix in each power state: its severity and the pull it sees. */
const flowChanged: [string, string[]][] = STATES.map((s) => [
  `pull-range:FLOW:${s}`,
  ['severity', 'values.ohms', 'values.ohmsMax', 'values.ohmsMin'],
]);

/** Edits that touch no net: every id and finding stays. */
const untouched: [string, (d: Design) => Design][] = [
  ['the same design', (d) => d],
  [
    'every part moved',
    (d) => ({
      ...d,
      parts: d.parts.map((p) => ({ ...p, position: { x: (p.position?.x ?? 0) + 120, y: (p.position?.y ?? 0) - 40 } })),
    }),
  ],
  ['a new title', (d) => ({ ...d, title: 'Greenhouse controller, rev B' })],
  [
    'a part renamed in its label only',
    (d) => ({ ...d, parts: d.parts.map((p) => (p.id === 'U1' ? { ...p, label: 'Main controller' } : p)) }),
  ],
  ['the nets listed in reverse', (d) => ({ ...d, nets: [...d.nets].reverse() })],
];

type Expected = { new: string[]; gone: string[]; changed: [string, string[]][]; regressions: number };

/** Edits of one net or its parts, with what the comparison must say. */
const edits: [string, (d: Design) => Design, Expected][] = [
  [
    'a 4.7 kΩ pull-up fitted on FLOW: its pull-range finding drops from error to info, its slow edges go',
    flowFixed,
    { new: [], gone: STATES.map((s) => `edge-rate:FLOW:${s}`), changed: flowChanged, regressions: 0 },
  ],
  [
    "FLOW back to its pin's pull-up alone: the same change reversed is a regression in every state",
    (d) => d,
    // the edge-rate findings come back as warnings: new, but no regression at fail-on error
    { new: STATES.map((s) => `edge-rate:FLOW:${s}`), gone: [], changed: flowChanged, regressions: 3 },
  ],
  [
    'the SLEEP net deleted: its findings go, the two inputs float on no net (warnings)',
    (d) => ({ ...d, nets: d.nets.filter((n) => n.id !== 'SLEEP') }),
    {
      new: STATES.flatMap((s) => [`floating-input:U3.SLEEP:${s}`, `floating-input:U4.SLEEP:${s}`]),
      gone: STATES.map((s) => `floating-input:SLEEP:${s}`),
      changed: [],
      regressions: 0,
    },
  ],
  [
    'a waiver on VALVE_EN: its level-high findings change by their waiver alone',
    waive,
    {
      new: [],
      gone: [],
      changed: [
        ['level-high:VALVE_EN:all-on:U1.VALVE_EN>U3.EN', ['waived']],
        ['level-high:VALVE_EN:standby:U1.VALVE_EN>U3.EN', ['waived']],
      ],
      regressions: 0,
    },
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
const sorted = (e: Expected) => ({
  new: [...e.new].sort(),
  gone: [...e.gone].sort(),
  changed: [...e.changed].sort(),
  regressions: e.regressions,
});

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

  it("an edit of one net leaves every other net's findings as they were", () => {
    const after = reportOf(flowFixed(base));
    const others = (r: Report) => r.findings.filter((f) => f.net !== 'FLOW');
    expect(others(after)).toEqual(others(before));
    expect(after.findings.length).toBeLessThan(before.findings.length); // not vacuous: FLOW's own did change
  });
});

describe('diff OLD NEW', () => {
  it.each(edits)('%s', (name, edit, expected) => {
    // The reversed case compares the fixed design (old) with the example (new).
    const reversed = name.startsWith('FLOW back');
    const from = reversed ? reportOf(flowFixed(base)) : reportOf(base);
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
    // 0.4 V point and NML falls to 0.113 V < 0.2 V, a new warning (all-on and reset, where U1
    // still drives SDA; in standby U2 is off).
    ['error', 0],
    ['warning', 2],
  ])('a new warning is a regression only with --fail-on warning (%s)', (failOn, regressions) => {
    const d = diffReports(
      reportOf(base, failOn),
      reportOf(onNet('SDA', (n) => ({ ...n, pull: { to: '3v3', ohms: 2200 } }))(base), failOn),
      { from: 'a', to: 'b' },
      failOn,
    );
    expect(d.new.map((f) => f.id)).toEqual(['level-low:SDA:all-on:U1.SDA>U2.SDA', 'level-low:SDA:reset:U1.SDA>U2.SDA']);
    expect(d.summary.regressions).toBe(regressions);
  });

  describe('renderings', () => {
    const d = diffReports(
      reportOf(base),
      reportOf(flowFixed(base)),
      { from: 'old.json', to: 'new | rev.json' },
      'error',
    );
    it('text names each change with its numbers in engineering notation', () => {
      const text = renderDiffText(d);
      expect(text).toContain('0 new, 3 gone, 3 changed');
      expect(text).toContain('severity error → info; ohms 40 kΩ → 4.21 kΩ');
    });
    it('Markdown escapes a file name in a code span and keeps tables', () => {
      const md = renderDiffMarkdown(d);
      expect(md).toContain('`new \\| rev.json`');
      expect(md).toMatch(
        /^\| info \| `pull-range` \| FLOW_PULSE \| `all-on` \| severity error → info; ohms 40 kΩ → 4\.21 kΩ[;|]/m,
      );
    });
    it('JSON carries the summary and every change', () => {
      const json = JSON.parse(renderDiffJson(d)) as ReportDiff;
      expect(json.format).toBe('railcross.diff');
      expect(json.summary).toMatchObject({ new: 0, gone: 3, changed: 3 });
      const [severity, ohms] = json.changed[0]!.changes;
      expect(severity).toEqual({ key: 'severity', before: 'error', after: 'info' });
      expect(ohms!.key).toBe('values.ohms');
      expect(ohms!.before).toBe(40_000);
      expect(ohms!.after).toBeCloseTo((4700 * 40_000) / (4700 + 40_000), 6); // the two pull-ups in parallel
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
  // The baseline's own counts, from its report: every error (and, at fail-on warning, every warning) is already known.
  const { error: errors, warning: warnings } = reportOf(base, 'warning').summary;
  it.each<[string, (d: Design) => Design, FailOn, boolean, RegExp]>([
    [
      'the same design passes though it has errors',
      (d) => d,
      'error',
      false,
      new RegExp(`^PASS: .* beyond the baseline; ${errors} findings at that level already in the baseline\\.$`),
    ],
    ['a fixed finding still passes', flowFixed, 'error', false, /^PASS/],
    [
      'a new warning passes at fail-on error',
      onNet('SDA', (n) => ({ ...n, pull: { to: '3v3', ohms: 2200 } })),
      'error',
      false,
      /^PASS/,
    ],
    // the SDA warning of all-on and reset (see above) is new; the example's errors and warnings are known
    [
      'a new warning fails at fail-on warning',
      onNet('SDA', (n) => ({ ...n, pull: { to: '3v3', ohms: 2200 } })),
      'warning',
      true,
      new RegExp(
        `^FAIL: .* not in the baseline: 2 warnings; ${errors + warnings} findings at that level already in the baseline\\.$`,
      ),
    ],
    [
      'a new error fails: a 5 V push-pull output added to the 3.3 V-only DISP_TX net',
      (d) => ({
        ...d,
        parts: [
          ...d.parts,
          { id: 'X1', label: 'Extra', rail: '5v0', profile: 'hc', pins: [{ id: 'Y', role: 'output' }] },
        ],
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
