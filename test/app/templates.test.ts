import { describe, expect, it } from 'vitest';
import { pickRail, searchTemplates, TEMPLATES, templateById } from '../../app/store/templates.ts';
import { addPart } from '../../app/store/commands/index.ts';
import { builtinProfile } from '../../rules/profiles/index.ts';
import { newDesign } from '../../rules/model/newDesign.ts';
import { validateDesign } from '../../rules/model/reader.ts';
import { harness } from './harness.ts';

// newDesign() has rails 5 V, 3.3 V, 1.8 V. Supply ranges (restated in the profile library):
// 74HC 2–6 V and 74HCT 4.5–5.5 V (JESD7), LVCMOS 3.3 V 3.0–3.6 V (JESD8C), 1.8 V 1.65–1.95 V
// (JESD8-7), 4000B 5–15 V (JESD13, tabulated supplies); the GPIO starting point has none.
const railCases = [
  { profile: '74hct', rail: '5v0' },
  { profile: 'lvcmos33', rail: '3v3' },
  { profile: 'lvcmos18', rail: '1v8' },
  { profile: 'cmos4000', rail: '5v0' },
  { profile: 'mcu-gpio', rail: '3v3' },
  { profile: 'lvcmos25', rail: '1v8' }, // no rail in 2.3–2.7 V (from memory): the nearest to 2.5 V
];

describe('parts palette', () => {
  it.each(railCases)('a $profile part goes on rail $rail', ({ profile, rail }) => {
    expect(pickRail(newDesign().rails, builtinProfile(profile)!)?.id).toBe(rail);
  });

  it('a 74HC gate goes on 5 V, its usual supply (common practice), though 3.3 V lies inside its 2–6 V (JESD7)', () => {
    const part = templateById('gate:74hc')!.build(newDesign(), { x: 0, y: 0 });
    if ('refused' in part) throw new Error(part.refused);
    expect(part.rail).toBe('5v0');
    expect(pickRail(newDesign().rails, builtinProfile('74hc')!)?.id).toBe('3v3');
  });

  it('every template makes a part the reader accepts, with a fresh designator', () => {
    const h = harness(newDesign());
    for (const t of TEMPLATES) {
      const part = t.build(h.design, { x: 0, y: 0 });
      if ('refused' in part) throw new Error(part.refused);
      expect(h.apply(addPart(part)).ok).toBe(true);
    }
    const ids = h.design.parts.map((p) => p.id);
    expect(new Set(ids).size).toBe(TEMPLATES.length);
    const valid = validateDesign(h.design);
    expect(valid.ok ? [] : valid.errors).toEqual([]);
  });

  it("the 16-pin microcontroller's two-wire pins use the two-wire bus profile, its GPIO pins the GPIO one", () => {
    const part = templateById('mcu:16')!.build(newDesign(), { x: 0, y: 0 });
    if ('refused' in part) throw new Error(part.refused);
    const profileOf = (id: string) => part.pins.find((p) => p.id === id)!.profile ?? part.profile;
    expect([profileOf('SDA'), profileOf('SCL'), profileOf('OUT1'), profileOf('IN1')]).toEqual([
      'i2c',
      'i2c',
      'mcu-gpio',
      'mcu-gpio',
    ]);
  });

  it('a translator puts side A on its own rail and family', () => {
    const part = templateById('translator:lvcmos18:lvcmos33')!.build(newDesign(), { x: 0, y: 0 });
    if ('refused' in part) throw new Error(part.refused);
    expect([part.rail, part.profile]).toEqual(['3v3', 'lvcmos33']);
    expect(part.pins.filter((p) => p.rail === '1v8' && p.profile === 'lvcmos18').map((p) => p.id)).toEqual([
      'A1',
      'A2',
      'A3',
      'A4',
    ]);
  });

  it('refuses to build without rails', () => {
    expect(templateById('gate:74hc')!.build({ ...newDesign(), rails: [] }, { x: 0, y: 0 })).toEqual({
      refused: 'The design has no rail: add a rail first.',
    });
  });

  it.each([
    { query: 'gate 74hc', ids: ['gate:74hc', 'gate:74hct'] },
    { query: 'TRANSLATOR 5 v', ids: ['translator:lvcmos33:74ahc', 'translator:lvcmos18:74ahc'] },
    { query: 'two-wire', ids: ['sensor:i2c', 'sensor:i2c-lv'] },
    { query: 'microcontroller 16', ids: ['mcu:16'] },
    { query: 'off-board', ids: ['off-board:in', 'off-board:out'] },
    { query: 'JESD8-7 buffer', ids: ['buffer:lvcmos18'] },
    { query: 'nothing like this', ids: [] },
  ])('search "$query" finds by name and family', ({ query, ids }) => {
    expect(searchTemplates(query).map((t) => t.id)).toEqual(ids);
  });
});
