import { describe, expect, it } from 'vitest';
import levelHigh from '../../rules/checks/level-high.ts';
import levelLow from '../../rules/checks/level-low.ts';
import overvoltage from '../../rules/checks/overvoltage.ts';
import railCrossing from '../../rules/checks/rail-crossing.ts';
import railRange from '../../rules/checks/rail-range.ts';
import { check } from '../../rules/check/check.ts';
import type { Design, Net, Waiver } from '../../rules/model/schema.ts';
import { builtinProfile } from '../../rules/profiles/index.ts';
import { buildReport } from '../../rules/report/buildReport.ts';
import { CAUTIONS } from '../../rules/report/cautions.ts';
import type { Crossing } from '../../rules/report/reportSchema.ts';
import { design, input, net, output, part, scenario } from '../support/build.ts';
import { FIXED_TIME, greenhouse } from './fixtures.ts';

// The rules these tests are about; the registry may grow without changing the expectations.
const RULES = [levelHigh, levelLow, overvoltage, railRange, railCrossing];

/*
 * M (3.3 V ± 5 %, mcu-gpio: VIH 0.7·VDD, VIL 0.3·VDD, VOH VDD−0.2, VOL 0.2 V, VI max VDD+0.5,
 * all common practice) and H (5 V ± 5 %, 74HCT: VIH 2.0 V, VIL 0.8 V, VI max VDD+0.5; JESD7).
 *   UP:     M.OUT → H.A   crosses; NMH 2.935 − 2.0 = 0.935 V, NML 0.8 − 0.2 = 0.6 V, no over-voltage
 *   DOWN:   H.Y → M.IN    crosses; margins pass (NMH 2.2245 V, NML 0.8405 V) but 5.25 V > 3.635 V:
 *                         an over-voltage error, from a rule other than the level rules
 *   SAME:   M.S → L.B     one rail: no crossing row
 *   PULLED: M.P → L.C     one rail, pulled up to 5 V: a pull's rail does not make a crossing
 *   NOPAIR: M.I2, H.B     crosses, no driver: margins null
 * Q (74HC, VDD 4.5–6 V, JESD7) sits on 3.3 V: a rail-range warning, all-on only.
 */
function crossingDesign(extra: { downWaivers?: Waiver[]; minMargin?: number } = {}): Design {
  const nets: Net[] = [
    net('UP', ['M.OUT', 'H.A'], { label: 'Up link' }),
    net('DOWN', ['H.Y', 'M.IN'], extra.downWaivers ? { waivers: extra.downWaivers } : {}),
    net('SAME', ['M.S', 'L.B']),
    net('PULLED', ['M.P', 'L.C'], { pull: { to: '5v0', ohms: 10e3 } }),
    net('NOPAIR', ['M.I2', 'H.B']),
  ];
  return design({
    ...(extra.minMargin === undefined ? {} : { settings: { minMargin: extra.minMargin } }),
    scenarios: [scenario('io-off', ['3v3'], 'I/O supply off')],
    parts: [
      part('M', '3v3', 'mcu-gpio', [output('OUT'), input('IN'), output('S'), output('P'), input('I2')]),
      part('H', '5v0', '74hct', [input('A'), output('Y'), input('B')]),
      part('L', '3v3', 'mcu-gpio', [input('B'), input('C')]),
      part('Q', '3v3', '74hct', [input('D')]), // 74HCT: 4.5–5.5 V (JESD7), so rail-range warns
    ],
    nets,
  });
}

function report(d: Design, scenarioId?: string) {
  return buildReport(d, check(d, undefined, RULES), {
    failOn: 'error',
    generatedAt: FIXED_TIME,
    ...(scenarioId === undefined ? {} : { scenario: scenarioId }),
  });
}

const row = (rows: readonly Crossing[], netId: string, state = 'all-on') =>
  rows.find((c) => c.net === netId && c.scenario === state);

describe('crossings', () => {
  it('list one row per crossing net and power state, in state then net order', () => {
    expect(report(crossingDesign()).crossings.map((c) => `${c.scenario}/${c.net}`)).toEqual([
      'all-on/UP',
      'all-on/DOWN',
      'all-on/NOPAIR',
      'io-off/UP',
      'io-off/DOWN',
      'io-off/NOPAIR',
    ]);
  });

  it('carry label, rails in order of first appearance, and the worst margins', () => {
    const up = row(report(crossingDesign()).crossings, 'UP')!;
    expect(up).toMatchObject({ label: 'Up link', rails: ['3v3', '5v0'] });
    expect(up.marginHigh).toBeCloseTo(0.935, 9); // 3.135 − 0.2 − 2.0
    expect(up.marginLow).toBeCloseTo(0.6, 9); // 0.8 − 0.2
    expect(row(report(crossingDesign()).crossings, 'DOWN')!.label).toBe('DOWN'); // no label: the id
  });

  it.each([
    ['no driver/receiver pair', 'NOPAIR', 'all-on'],
    ["the driver's rail is off", 'UP', 'io-off'],
    ["the receiver's rail is off", 'DOWN', 'io-off'],
  ])('have null margins when %s', (_name, netId, state) => {
    const c = row(report(crossingDesign()).crossings, netId, state)!;
    expect([c.marginHigh, c.marginLow]).toEqual([null, null]);
  });

  it.each<[string, Parameters<typeof crossingDesign>[0], string, string, Crossing['worst']]>([
    ['info only (rail-crossing) counts as ok', {}, 'UP', 'all-on', 'ok'],
    ['an over-voltage error, margins passing', {}, 'DOWN', 'all-on', 'error'],
    ['a level-low warning (NML 0.6 V < minMargin 0.7 V)', { minMargin: 0.7 }, 'UP', 'all-on', 'warning'],
    [
      'the error waived: ok',
      { downWaivers: [{ rule: 'overvoltage', note: 'series 1 kΩ limits the clamp current' }] },
      'DOWN',
      'all-on',
      'ok',
    ],
    [
      'a waiver of another rule leaves the error',
      { downWaivers: [{ rule: 'level-high', note: 'n/a' }] },
      'DOWN',
      'all-on',
      'error',
    ],
    [
      'a waiver for another power state leaves the error',
      { downWaivers: [{ rule: 'overvoltage', scenario: 'io-off', note: 'n/a' }] },
      'DOWN',
      'all-on',
      'error',
    ],
  ])('worst: %s', (_name, extra, netId, state, worst) => {
    expect(row(report(crossingDesign(extra)).crossings, netId, state)!.worst).toBe(worst);
  });

  it('the example: DISP_RX passes its margins yet is worst "error" (its over-voltage)', () => {
    const d = greenhouse();
    const c = row(
      buildReport(d, check(d, undefined, RULES), { failOn: 'error', generatedAt: FIXED_TIME }).crossings,
      'DISP_RX',
    )!;
    expect(c.marginHigh! > 0 && c.marginLow! > 0).toBe(true);
    expect(c.worst).toBe('error');
  });
});

describe('findings and summary', () => {
  const waived = crossingDesign({
    downWaivers: [{ rule: 'overvoltage', note: 'series 1 kΩ limits the clamp current' }],
  });
  const result = check(waived, undefined, RULES);
  const r = buildReport(waived, result, { failOn: 'warning', generatedAt: FIXED_TIME });

  it("keeps the engine's findings in its order, without the message id", () => {
    expect(r.findings.map((f) => f.id)).toEqual(result.findings.map((f) => f.id));
    expect(r.findings.filter((f) => 'messageId' in f)).toEqual([]);
  });

  it('keeps a waived finding in place, with its note, counted as waived', () => {
    const f = r.findings.find((x) => x.id === 'overvoltage:DOWN:all-on:M.IN');
    expect(f).toMatchObject({ severity: 'error', waived: 'series 1 kΩ limits the clamp current' });
    // errors: the 5 V pull-up over-drives M.P and L.C (5.25 V > 3.635 V); its (5.25 − 0.4) /
    // 10 kΩ ≈ 0.49 mA into M.P stays within the GPIO's 8 mA row (from memory), 0.4 V low;
    // warning: rail-range; info: 3 crossings × 2 power states.
    expect(r.summary).toEqual({ error: 2, warning: 1, info: 6, waived: 1 });
  });

  it('records the effective settings (design-format.md defaults 0.2 V and 5 pF) and failOn', () => {
    expect(r.settings).toEqual({ minMargin: 0.2, defaultWiringCapacitance: 5e-12, failOn: 'warning' });
  });

  it('counts parts, nets and rails and carries the cautions', () => {
    expect(r.design).toEqual({ title: 'test', parts: 4, nets: 5, rails: 3 });
    expect(r.cautions).toEqual([...CAUTIONS]);
  });
});

describe('the scenario option', () => {
  const d = crossingDesign();
  const full = report(d);

  it('without it, every power state: all-on first, labelled "All rails on"', () => {
    expect(full.scenarios).toEqual([
      { id: 'all-on', label: 'All rails on', off: [] },
      { id: 'io-off', label: 'I/O supply off', off: ['3v3'] },
    ]);
    expect(new Set(full.findings.map((f) => f.scenario))).toEqual(new Set(['all-on', 'io-off']));
  });

  it.each([['all-on'], ['io-off']])('"%s" reports that power state alone', (state) => {
    const r = report(d, state);
    expect(r.scenarios.map((s) => s.id)).toEqual([state]);
    expect(r.findings.map((f) => f.id)).toEqual(full.findings.filter((f) => f.scenario === state).map((f) => f.id));
    expect(r.crossings).toEqual(full.crossings.filter((c) => c.scenario === state));
    const count = (sev: string) => r.findings.filter((f) => f.severity === sev && f.waived === undefined).length;
    expect(r.summary).toEqual({ error: count('error'), warning: count('warning'), info: count('info'), waived: 0 });
    expect(r.findings.length).toBeGreaterThan(0);
  });

  it.each([
    ['all-on', 1],
    ['io-off', 0],
  ])('rail-range exists in all-on only (%s: %i)', (state, n) => {
    expect(report(d, state).findings.filter((f) => f.rule === 'rail-range')).toHaveLength(n);
  });

  it('refuses a power state the design does not have', () => {
    expect(() => report(d, 'pump-off')).toThrow(RangeError);
  });
});

describe('profiles used', () => {
  const d = design({
    profiles: [
      { id: '74hc', label: 'Local buffer', source: 'datasheet of the chosen buffer', params: { vih: 2 } },
      { id: 'spare', label: 'Unused', source: 'nowhere', params: {} },
    ],
    parts: [
      part('A', '3v3', 'mcu-gpio', [input('P1'), input('P2', { profile: 'lvcmos33' })]),
      part('B', '5v0', '74hc', [input('Q')]),
      part('C', '1v8', 'ttl', [input('R', { profile: 'lvcmos18' })]), // every pin overrides: ttl unused
      part('E', '5v0', '74ls', []), // no pins: its own profile
    ],
  });
  const r = buildReport(d, check(d, undefined, RULES), { failOn: 'error', generatedAt: FIXED_TIME });

  it('lists each effective profile once, in order of first use', () => {
    expect(r.profiles.map((p) => p.id)).toEqual(['mcu-gpio', 'lvcmos33', '74hc', 'lvcmos18', '74ls']);
  });

  it.each([['mcu-gpio'], ['lvcmos33'], ['lvcmos18'], ['74ls']])(
    "built-in %s with the library's label and source",
    (id) => {
      const p = builtinProfile(id)!;
      expect(r.profiles.find((x) => x.id === id)).toEqual({ id, label: p.label, source: p.source });
    },
  );

  it('a design-local profile shadows the built-in one of its id', () => {
    expect(r.profiles.find((p) => p.id === '74hc')).toEqual({
      id: '74hc',
      label: 'Local buffer',
      source: 'datasheet of the chosen buffer',
    });
  });
});
