/**
 * The search box's matching on the greenhouse example: which parts, pins, nets and findings a
 * query finds (by id and by label, whatever the case, any part of the word), in which order, and
 * how the groups come.
 */
import { describe, expect, it } from 'vitest';
import { exampleDesign } from '../../../app/example.ts';
import { rank, search, searchItems } from '../../../app/search/match.ts';
import { check } from '../../../rules/check/check.ts';

const design = exampleDesign();
const items = searchItems(design, check(design));

/** The hits' titles by kind, as the box lists them. */
const found = (query: string, perKind?: number) =>
  Object.fromEntries(search(items, query, perKind).map((g) => [g.kind, g.hits.map((h) => h.title)]));

describe('search matching', () => {
  it.each([
    // A part by its id, any case: U2 itself first, and U20, which starts with it, after; their pins too.
    ['u2', { part: ['U2', 'U20'], pin: ['U2.SDA', 'U2.SCL', 'U20.SDA', 'U20.SCL'] }],
    // A part by its label, partly.
    ['humidity', { part: ['U2'] }],
    // A part between chips by its label.
    ['busy divider', { part: ['R5', 'R6'] }],
    // A net by its label, partly: the labels are what the canvas shows.
    ['tank_low', { net: ['TANK_LOW_N'], pin: ['U1.TANK_LOW'] }],
    // A net by its id when the label differs (FAULT_N is labelled VALVE_FAULT_N).
    ['valve_fault', { net: ['VALVE_FAULT_N'] }],
    // A pin by its key.
    ['u4.bu', { pin: ['U4.BUSY'] }],
    // Nothing: no group at all.
    ['nothing-called-this', {}],
    // Blank: no search yet.
    ['   ', {}],
  ])('%j finds %j (parts, pins, nets; findings left aside)', (query, expected) => {
    const { finding: _f, ...rest } = found(query);
    expect(rest).toEqual(expected);
  });

  it('finds findings by their message and rule, grouped after parts, pins and nets', () => {
    const groups = search(items, 'sda', 100);
    expect(groups.map((g) => g.kind)).toEqual(['part', 'pin', 'net', 'finding']);
    const findings = groups.find((g) => g.kind === 'finding')!.hits;
    expect(findings.length).toBeGreaterThan(0);
    for (const f of findings) expect(f.words.some((w) => w.toLowerCase().includes('sda'))).toBe(true);
    // By the rule's title alone (the words "over-voltage" are in no part, pin or net).
    const over = search(items, 'overvoltage', 100);
    expect(over.map((g) => g.kind)).toEqual(['finding']);
    expect(over[0]!.hits.every((h) => h.target.kind === 'finding' && h.target.finding.rule === 'overvoltage')).toBe(
      true,
    );
  });

  it('puts a word equal to the query first, then one starting with it, then one containing it', () => {
    // Net ids and labels: SDA (equal), SDA2_H… (start), none containing only.
    expect(found('sda').net).toEqual(['SDA', 'SDA2', 'SDA2_1V8']);
    expect(found('scl').net?.[0]).toBe('SCL');
    expect(rank(['XSDA', 'SDAX'], 'sda')).toBe(1);
    expect(rank(['XSDA'], 'sda')).toBe(2);
    expect(rank(['sda'], 'sda')).toBe(0);
    expect(rank(['scl'], 'sda')).toBeUndefined();
  });

  it('cuts each group at the limit and says how many more there are', () => {
    const groups = search(items, 'u', 3);
    const parts = groups.find((g) => g.kind === 'part')!;
    expect(parts.hits).toHaveLength(3);
    const all = search(items, 'u', 1000).find((g) => g.kind === 'part')!.hits.length;
    expect(parts.more).toBe(all - 3);
  });

  it('leads every item to what it names', () => {
    const pin = items.find((i) => i.key === 'pin:U1.RAIN')!;
    expect(pin.target).toEqual({ kind: 'pin', part: 'U1', pin: 'RAIN' });
    expect(pin.detail).toContain('net RAIN_PULSE');
    expect(items.find((i) => i.key === 'net:FAULT_N')!.target).toEqual({ kind: 'net', net: 'FAULT_N' });
    expect(items.find((i) => i.key === 'part:R7')!.target).toEqual({ kind: 'part', part: 'R7' });
  });
});
