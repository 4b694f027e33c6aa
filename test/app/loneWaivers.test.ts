/**
 * Waivers that outlive a new power state, and waivers of a pin on no net (an unused input):
 * written into the pin, they mark its findings as a net's waivers mark a net's, in the editor's
 * incremental check as in a full one, and survive the file's round trip.
 */
import { describe, expect, it } from 'vitest';
import {
  addPowerState,
  addWaiver,
  connectPins,
  removeWaiverAt,
  removeWaiverFor,
  type Command,
} from '../../app/store/commands/index.ts';
import { check } from '../../rules/check/check.ts';
import type { Finding } from '../../rules/engine/types.ts';
import { readDesign, validateDesign } from '../../rules/model/reader.ts';
import { writeDesign } from '../../rules/model/writer.ts';
import { net, scenario } from '../support/build.ts';
import { bench, harness, type Harness } from './harness.ts';

// D.Y1 (3.3 V LVCMOS) into H.A (5 V 74HC): level-high fails (see waivers.test.ts); H.B, H.C,
// H.D, T.A and T.B are inputs on no net, each a floating-input warning.
const start = bench({ nets: [net('A', ['D.Y1', 'H.A'])], scenarios: [scenario('S1', ['1v8'], 'Standby')] });

const of = (h: Harness, rule: string, place: string) =>
  h.store.getState().result.findings.filter((f) => f.rule === rule && f.place === place);
const waivedIn = (list: readonly Finding[]) => list.filter((f) => f.waived !== undefined).map((f) => f.scenario);

describe('a waiver and the power states added after it', () => {
  const scopes = [
    { name: 'in every power state (the default) covers the new state too', scenario: undefined, waived: 3 },
    { name: 'in one power state leaves the new state unwaived', scenario: 'all-on', waived: 1 },
  ];
  it.each(scopes)('a net waiver $name', ({ scenario: sc, waived }) => {
    const h = harness(start);
    h.apply(addWaiver({ net: 'A', rule: 'level-high', scenario: sc }, 'valve board is 3.3 V tolerant'));
    h.apply(addPowerState('Valve test'));
    const list = of(h, 'level-high', 'A');
    expect(list.map((f) => f.scenario)).toEqual(['all-on', 'S1', 'S2']);
    expect(waivedIn(list)).toHaveLength(waived);
  });
  it.each(scopes)('a pin waiver $name', ({ scenario: sc, waived }) => {
    const h = harness(start);
    h.apply(addWaiver({ pin: 'H.B', rule: 'floating-input', scenario: sc }, 'spare gate'));
    h.apply(addPowerState('Valve test'));
    const list = of(h, 'floating-input', 'H.B');
    expect(list.map((f) => f.scenario)).toEqual(['all-on', 'S1', 'S2']);
    expect(waivedIn(list)).toHaveLength(waived);
  });
});

describe('waivers of a pin on no net', () => {
  it('marks the pin’s findings in every state, the others stay; the summary counts them; undo', () => {
    const h = harness(start);
    const warnings = h.store.getState().result.summary.warning;
    expect(
      h.apply(addWaiver({ pin: 'H.B', rule: 'floating-input' }, '  spare gate, tied on the next revision ')),
    ).toEqual({ ok: true, changed: true });
    expect(h.design.parts.find((p) => p.id === 'H')!.pins.find((p) => p.id === 'B')!.waivers).toEqual([
      { rule: 'floating-input', note: 'spare gate, tied on the next revision' },
    ]);
    const hb = of(h, 'floating-input', 'H.B');
    expect(hb.map((f) => f.waived)).toEqual([
      'spare gate, tied on the next revision',
      'spare gate, tied on the next revision',
    ]);
    expect(waivedIn(of(h, 'floating-input', 'H.C'))).toEqual([]);
    const { summary } = h.store.getState().result;
    expect([summary.warning, summary.waived]).toEqual([warnings - 2, 2]);
    h.undo();
    expect(h.design).toEqual(start);
    expect(waivedIn(of(h, 'floating-input', 'H.B'))).toEqual([]);
  });

  it('the incremental check gives what a full check gives', () => {
    const h = harness(start);
    h.apply(addWaiver({ pin: 'T.A', rule: 'floating-input', scenario: 'S1' }, 'test point'));
    const full = check(h.design).findings.map((f) => [f.id, f.waived]);
    expect(h.store.getState().result.findings.map((f) => [f.id, f.waived])).toEqual(full);
    expect(full.filter(([, w]) => w !== undefined)).toEqual([['floating-input:T.A:S1', 'test point']]);
  });

  it('survives the file: written, read back, checked by the command line’s engine', () => {
    const h = harness(start);
    h.apply(addWaiver({ pin: 'H.D', rule: 'floating-input' }, 'reserved'));
    const read = readDesign(writeDesign(h.design));
    expect(read.ok).toBe(true);
    if (!read.ok) return;
    expect(read.design).toEqual(h.design);
    expect(
      check(read.design)
        .findings.filter((f) => f.waived !== undefined)
        .map((f) => f.id),
    ).toEqual(['floating-input:H.D:all-on', 'floating-input:H.D:S1']);
  });

  it('withdrawing the waiver brings the warning back', () => {
    const h = harness(start);
    h.apply(addWaiver({ pin: 'H.B', rule: 'floating-input' }, 'spare'));
    expect(h.apply(removeWaiverFor({ pin: 'H.B' }, 'floating-input', 'S1'))).toEqual({ ok: true, changed: true });
    expect(h.design).toEqual(start);
    expect(waivedIn(of(h, 'floating-input', 'H.B'))).toEqual([]);
  });

  it('once the pin joins a net, the net’s findings are judged by the net’s waivers', () => {
    const h = harness(start);
    h.apply(addWaiver({ pin: 'H.B', rule: 'floating-input' }, 'spare'));
    h.apply(connectPins('D.Y2', 'H.B'));
    expect(h.store.getState().result.findings.filter((f) => f.waived !== undefined)).toEqual([]);
    const read = validateDesign(h.design);
    expect(read.ok ? [] : read.errors).toEqual([]);
  });

  it('a waiver left in a pin that joined a net can still be withdrawn, by its place', () => {
    const h = harness(start);
    h.apply(addWaiver({ pin: 'H.B', rule: 'floating-input' }, 'spare'));
    h.apply(addWaiver({ pin: 'H.B', rule: 'overvoltage', scenario: 'S1' }, 'clamped'));
    h.apply(connectPins('D.Y2', 'H.B'));
    expect(h.apply(removeWaiverAt({ pin: 'H.B' }, 0))).toEqual({ ok: true, changed: true });
    const pin = () => h.design.parts.find((p) => p.id === 'H')!.pins.find((p) => p.id === 'B')!;
    expect(pin().waivers).toEqual([{ rule: 'overvoltage', scenario: 'S1', note: 'clamped' }]);
    h.apply(removeWaiverAt({ pin: 'H.B' }, 0));
    expect(pin().waivers).toBeUndefined();
    const out = h.apply(removeWaiverAt({ pin: 'H.B' }, 0));
    expect(out.ok ? '' : out.reason).toMatch(/Pin H\.B has no waiver 1/);
  });

  const refusals: { name: string; command: Command; reason: RegExp }[] = [
    {
      name: 'a waiver on an unknown pin',
      command: addWaiver({ pin: 'H.Q', rule: 'floating-input' }, 'x'),
      reason: /no pin H\.Q/,
    },
    {
      name: 'a pin waiver for a pin on a net (its net holds the waiver)',
      command: addWaiver({ pin: 'H.A', rule: 'floating-input' }, 'x'),
      reason: /on a net/,
    },
    {
      name: 'a pin waiver without a note',
      command: addWaiver({ pin: 'H.B', rule: 'floating-input' }, ' '),
      reason: /needs a note/,
    },
    {
      name: 'withdrawing a pin waiver that is not there',
      command: removeWaiverFor({ pin: 'H.B' }, 'floating-input', 'all-on'),
      reason: /No waiver of floating-input on pin H\.B/,
    },
  ];
  it.each(refusals)('refuses $name', ({ command, reason }) => {
    const h = harness(start);
    const out = h.apply(command);
    expect(out.ok ? '' : out.reason).toMatch(reason);
    expect(h.design).toBe(start);
  });
});
