/** Design-local profiles: made from a built-in one with a required source, edited, used, deleted. */
import { describe, expect, it } from 'vitest';
import {
  addProfile,
  connectPins,
  deleteProfile,
  localProfileId,
  setPartProfile,
  setProfileParam,
  setProfileSource,
  type Command,
} from '../../app/store/commands/index.ts';
import { validateDesign } from '../../rules/model/reader.ts';
import { builtinProfile } from '../../rules/profiles/index.ts';
import { bench, harness } from './harness.ts';

describe('design-local profiles', () => {
  it('a copy of a built-in one, edited, changes the checks of the parts that use it; undo steps back one edit at a time', () => {
    const h = harness();
    h.apply(connectPins('D.Y1', 'H.A'));
    const id = h.netOf('H.A')!.id;
    expect(h.severity(id)).toBe('error');
    const local = localProfileId(h.design, '74hc');
    expect(local).toBe('74hc-local');
    expect(h.apply(addProfile('74hc', local, '', 'datasheet of the chosen part, table 6'))).toEqual({
      ok: true,
      changed: true,
    });
    const made = h.design.profiles![0]!;
    expect([made.id, made.label, made.source]).toEqual([
      '74hc-local',
      `${builtinProfile('74hc')!.label} (this design)`,
      'datasheet of the chosen part, table 6',
    ]);
    expect(made.params).toEqual(builtinProfile('74hc')!.params);
    h.apply(setPartProfile('H', local));
    // The copy has the built-in numbers: still failing.
    expect(h.severity(id)).toBe('error');
    // A TTL-level input threshold, 2.0 V (JESD7, 74HCT input levels), clears the high-level finding.
    h.apply(setProfileParam(local, 'vih', 2));
    expect(h.severity(id)).not.toBe('error');
    const read = validateDesign(h.design);
    expect(read.ok ? [] : read.errors).toEqual([]);
    h.undo();
    expect(h.severity(id)).toBe('error');
    expect(h.design.profiles![0]!.params.vih).toBe(made.params.vih);
  });

  it('a second copy of the same family gets the next free id', () => {
    const h = harness();
    h.apply(addProfile('74hc', localProfileId(h.design, '74hc'), 'one', 'bench'));
    expect(localProfileId(h.design, '74hc')).toBe('74hc-local2');
  });

  it('a design-local profile of a built-in id shadows the built-in one', () => {
    const h = harness();
    h.apply(connectPins('D.Y1', 'H.A'));
    const id = h.netOf('H.A')!.id;
    h.apply(addProfile('74hc', '74hc', 'shadow', 'measured on the bench'));
    h.apply(setProfileParam('74hc', 'vih', 2));
    expect(h.severity(id)).not.toBe('error');
  });

  const start = bench();
  const refusals: { name: string; setup?: Command[]; command: Command; reason: RegExp }[] = [
    {
      name: 'a profile without a source',
      command: addProfile('74hc', 'mine', 'Mine', '  '),
      reason: /where the numbers come from/,
    },
    {
      name: 'a copy of an unknown family',
      command: addProfile('74xyz', 'mine', 'Mine', 'bench'),
      reason: /no built-in profile 74xyz/,
    },
    {
      name: 'an id used twice',
      setup: [addProfile('74hc', 'mine', '', 'bench')],
      command: addProfile('74hct', 'mine', '', 'bench'),
      reason: /already has a profile mine/,
    },
    { name: 'an id with ":"', command: addProfile('74hc', 'a:b', '', 'bench'), reason: /id/ },
    {
      name: 'clearing the source',
      setup: [addProfile('74hc', 'mine', '', 'bench')],
      command: setProfileSource('mine', ''),
      reason: /needs a source/,
    },
    {
      name: 'a Level that does not parse',
      setup: [addProfile('74hc', 'mine', '', 'bench')],
      command: setProfileParam('mine', 'vih', 'VDD*VDD'),
      reason: /vih: expected a Level/,
    },
    {
      name: 'deleting a profile in use',
      setup: [addProfile('74hc', 'mine', '', 'bench'), setPartProfile('H', 'mine')],
      command: deleteProfile('mine'),
      reason: /still used by H/,
    },
  ];
  it.each(refusals)('refuses $name', ({ setup = [], command, reason }) => {
    const h = harness(start);
    for (const c of setup) expect(h.apply(c).ok).toBe(true);
    const before = h.design;
    const out = h.apply(command);
    expect(out.ok ? '' : out.reason).toMatch(reason);
    expect(h.design).toBe(before);
  });

  it('deleting an unused profile takes the list away with it', () => {
    const h = harness();
    h.apply(addProfile('74hc', 'mine', '', 'bench'));
    h.apply(deleteProfile('mine'));
    expect(h.design.profiles).toBeUndefined();
  });
});
