/** Waivers written from a finding: the finding stays, marked with the note; the wire loses its colour; undo. */
import { describe, expect, it } from 'vitest';
import {
  addWaiver,
  connectPins,
  removeWaiverAt,
  removeWaiverFor,
  type Command,
} from '../../app/store/commands/index.ts';
import { validateDesign } from '../../rules/model/reader.ts';
import { net, scenario } from '../support/build.ts';
import { bench, harness } from './harness.ts';

// D.Y1 (3.3 V LVCMOS) into H.A (5 V 74HC): the high level fails (see customChips.test.ts).
const start = bench({ nets: [net('A', ['D.Y1', 'H.A'])], scenarios: [scenario('S1', ['1v8'], 'Standby')] });

function levelHigh(h: ReturnType<typeof harness>, state: string) {
  return h.store
    .getState()
    .result.findings.find((f) => f.rule === 'level-high' && f.scenario === state && f.net === 'A');
}

describe('waivers', () => {
  const scopes: { name: string; scenario: string | undefined; waivedIn: string[] }[] = [
    { name: 'in every power state', scenario: undefined, waivedIn: ['all-on', 'S1'] },
    { name: 'in one power state', scenario: 'all-on', waivedIn: ['all-on'] },
  ];
  it.each(scopes)(
    'accepting a finding $name keeps it listed with the note and clears the wire; undo brings it back',
    ({ scenario: sc, waivedIn }) => {
      const h = harness(start);
      expect(h.severity('A')).toBe('error');
      expect(
        h.apply(
          addWaiver(
            { net: 'A', rule: 'level-high', scenario: sc },
            '  valve driver tolerates it: see bench report 12 ',
          ),
        ),
      ).toEqual({ ok: true, changed: true });
      for (const state of ['all-on', 'S1']) {
        const f = levelHigh(h, state);
        expect(f?.severity).toBe('error');
        expect(f?.waived).toBe(waivedIn.includes(state) ? 'valve driver tolerates it: see bench report 12' : undefined);
      }
      expect(h.severity('A')).not.toBe('error');
      expect(h.store.getState().result.summary.waived).toBe(waivedIn.length);
      const read = validateDesign(h.design);
      expect(read.ok ? [] : read.errors).toEqual([]);
      h.undo();
      expect(h.design).toEqual(start);
      expect(h.severity('A')).toBe('error');
      expect(levelHigh(h, 'all-on')?.waived).toBeUndefined();
    },
  );

  it('a second waiver of the same rule and scope changes the note rather than adding one', () => {
    const h = harness(start);
    h.apply(addWaiver({ net: 'A', rule: 'level-high' }, 'first'));
    h.apply(addWaiver({ net: 'A', rule: 'level-high' }, 'second'));
    expect(h.design.nets[0]!.waivers).toEqual([{ rule: 'level-high', note: 'second' }]);
  });

  it('withdrawing the waiver that covers a finding colours the wire again', () => {
    const h = harness(start);
    h.apply(addWaiver({ net: 'A', rule: 'level-high' }, 'ok'));
    h.apply(removeWaiverFor('A', 'level-high', 'all-on'));
    expect(h.design.nets[0]!.waivers).toBeUndefined();
    expect(h.severity('A')).toBe('error');
  });

  it('a waiver survives the merge of its net with another', () => {
    const h = harness(start);
    h.apply(addWaiver({ net: 'A', rule: 'level-high' }, 'ok'));
    h.apply(connectPins('H.A', 'T.A'));
    expect(h.netOf('T.A')?.waivers).toEqual([{ rule: 'level-high', note: 'ok' }]);
  });

  const refusals: { name: string; command: Command; reason: RegExp }[] = [
    {
      name: 'a waiver without a note',
      command: addWaiver({ net: 'A', rule: 'level-high' }, '   '),
      reason: /needs a note/,
    },
    {
      name: 'a waiver on an unknown net',
      command: addWaiver({ net: 'Q', rule: 'level-high' }, 'x'),
      reason: /no net Q/,
    },
    {
      name: 'a waiver for an unknown power state',
      command: addWaiver({ net: 'A', rule: 'level-high', scenario: 'S9' }, 'x'),
      reason: /no power state S9/,
    },
    {
      name: 'withdrawing a waiver that is not there',
      command: removeWaiverFor('A', 'level-high', 'all-on'),
      reason: /No waiver of level-high/,
    },
    { name: 'withdrawing a waiver by a place that is empty', command: removeWaiverAt('A', 0), reason: /no waiver 1/ },
  ];
  it.each(refusals)('refuses $name', ({ command, reason }) => {
    const h = harness(start);
    const out = h.apply(command);
    expect(out.ok ? '' : out.reason).toMatch(reason);
    expect(h.design).toBe(start);
  });
});
