/**
 * Inserting a dual-rail translator: the net is split at the crossing, the driver's side keeps
 * the net, the other side gets a new net, and the translator's pins sit one on each rail.
 *
 * Level facts behind the cases (from the profile library, with its sources): a 3.3 V output
 * (VOH ≥ VDD − 0.2 V at 100 µA, JESD8C LVCMOS as restated) misses a 5 V 74HC input's VIH of
 * 0.675·VDD + 0.15 (JESD7's table as a conservative line); a 3.3 V LVTTL VOL of 0.4 V
 * (JESD8C) leaves less than 0.2 V below a 1.8 V input's VIL of 0.35·VDD (JESD8-7) at 1.71 V.
 */
import { describe, expect, it } from 'vitest';
import { exampleDesign } from '../../../app/example.ts';
import type { Design, Part } from '../../../rules/model/schema.ts';
import { chipSize } from '../../../app/canvas/chipLayout.ts';
import { design, input, net, output, part, rail1v8, rail3v3, rail5v0, scenario } from '../../support/build.ts';
import { applyAndUndo, type FixCase, netOf, offered, partById } from './support.ts';
import { harness } from '../harness.ts';
import { applyFix, fixesFor } from '../../../app/store/commands/fixes/index.ts';
import { MAX_CHANNELS } from '../../../app/store/commands/fixes/translator.ts';
import { deleteSelection } from '../../../app/store/commands/index.ts';

const greenhouse = exampleDesign();

const cases: Omit<FixCase, 'fix'>[] = [
  {
    name: 'greenhouse VALVE_EN (level-high, 3.3 V MCU into 5 V 74HC): one-way, A on 3v3',
    start: greenhouse,
    finding: 'level-high:VALVE_EN:all-on:U1.VALVE_EN>U3.EN',
    expect(d) {
      expect(netOf(d, 'VALVE_EN')?.pins).toEqual(['U1.VALVE_EN', 'U8.A']);
      expect(netOf(d, 'VALVE_EN_5v0')).toMatchObject({ label: 'VALVE_EN_5v0', pins: ['U8.B', 'U3.EN'] });
      // The new half comes right after the original, so that the report keeps them together.
      expect(d.nets.map((n) => n.id).indexOf('VALVE_EN_5v0')).toBe(d.nets.map((n) => n.id).indexOf('VALVE_EN') + 1);
      const box = (p: Part) => ({ ...p.position!, ...chipSize(p) });
      const t = box(partById(d, 'U8')!);
      for (const other of d.parts.filter((p) => p.id !== 'U8').map(box)) {
        const apart =
          t.x + t.width <= other.x ||
          other.x + other.width <= t.x ||
          t.y + t.height <= other.y ||
          other.y + other.height <= t.y;
        expect(apart).toBe(true);
      }
      expect(partById(d, 'U8')).toEqual({
        id: 'U8',
        label: 'Dual-rail translator for VALVE_EN',
        rail: '3v3',
        profile: 'xlat-side',
        // Halfway between U1 (360, 160) and U3 (720, 80) is (540, 120), on top of U1: the nearest
        // spot on the 20 px grid clear of every chip and part between chips by 24 px is 60 px
        // up and left, (480, 60) (freeSpot.test.ts holds the search's own cases).
        position: { x: 480, y: 60 },
        pins: [
          { id: 'A', role: 'input', side: 'left' },
          { id: 'B', role: 'output', rail: '5v0', side: 'right' },
        ],
      });
    },
  },
  {
    name: 'greenhouse DISP_RX (overvoltage from a 5 V output): direction from the driver, A on 5v0',
    start: greenhouse,
    finding: 'overvoltage:DISP_RX:all-on:U1.DISP_RX',
    expect(d) {
      expect(netOf(d, 'DISP_RX')?.pins).toEqual(['U4.TX', 'U8.A']);
      expect(netOf(d, 'DISP_RX_3v3')?.pins).toEqual(['U8.B', 'U1.DISP_RX']);
      expect(partById(d, 'U8')).toMatchObject({ rail: '5v0', profile: 'xlat-side' });
      expect(partById(d, 'U8')?.pins.map((p) => [p.id, p.role, p.rail])).toEqual([
        ['A', 'input', undefined],
        ['B', 'output', '3v3'],
      ]);
    },
  },
  {
    name: 'greenhouse SDA (overvoltage from the 3.3 V pull-up): open-drain, each side pulled to its own rail',
    start: greenhouse,
    finding: 'overvoltage:SDA:all-on:U2.SDA',
    expect(d) {
      expect(netOf(d, 'SDA')).toEqual({
        id: 'SDA',
        label: 'SDA',
        pins: ['U1.SDA', 'U8.A'],
        pull: { to: '3v3', ohms: 4700 },
        wiringCapacitance: 5e-11,
        maxRiseTime: 1e-6,
      });
      expect(netOf(d, 'SDA_1v8')).toEqual({
        id: 'SDA_1v8',
        label: 'SDA_1v8',
        pins: ['U8.B', 'U2.SDA'],
        pull: { to: '1v8', ohms: 4700 },
        wiringCapacitance: 5e-11,
        maxRiseTime: 1e-6,
      });
      expect(partById(d, 'U8')).toMatchObject({ rail: '3v3', profile: 'xlat-od' });
      expect(partById(d, 'U8')?.pins.map((p) => [p.id, p.role, p.drive])).toEqual([
        ['A', 'bidir', 'open-drain'],
        ['B', 'bidir', 'open-drain'],
      ]);
    },
  },
  {
    name: 'greenhouse SDA in standby (back-power into the unpowered sensor): the translator isolates it',
    start: greenhouse,
    finding: 'back-power:SDA:standby:U2.SDA',
    expect(d) {
      expect(netOf(d, 'SDA_1v8')?.pull).toEqual({ to: '1v8', ohms: 4700 });
    },
  },
  {
    name: 'level-low warning, 3.3 V LVTTL into 1.8 V LVCMOS, with a route and a waiver',
    start: design({
      rails: [rail3v3, rail1v8],
      scenarios: [scenario('sleep', ['1v8'])],
      parts: [
        part('D', '3v3', 'lvttl33', [output('Y')], { position: { x: 0, y: 0 } }),
        part('R', '1v8', 'lvcmos18', [input('A')], { position: { x: 400, y: 0 } }),
        part('S', '1v8', 'lvcmos18', [input('A')], { position: { x: 400, y: 200 } }),
        part('M', '3v3', 'lvcmos33', [input('A')], { position: { x: 0, y: 200 } }),
      ],
      nets: [
        net('N', ['D.Y', 'R.A', 'S.A', 'M.A'], {
          label: 'CLK',
          route: [
            ['D.Y', 'R.A'],
            ['R.A', 'S.A'],
            ['D.Y', 'M.A'],
          ],
          waivers: [{ rule: 'back-power', scenario: 'sleep', note: 'reviewed' }],
        }),
      ],
    }),
    finding: 'level-low:N:all-on:D.Y>R.A',
    expect(d) {
      expect(netOf(d, 'N')).toEqual({
        id: 'N',
        label: 'CLK',
        pins: ['D.Y', 'M.A', 'U1.A'],
        route: [
          ['D.Y', 'U1.A'],
          ['D.Y', 'M.A'],
        ],
        waivers: [{ rule: 'back-power', scenario: 'sleep', note: 'reviewed' }],
      });
      expect(netOf(d, 'N_1v8')).toEqual({
        id: 'N_1v8',
        label: 'CLK_1v8',
        pins: ['U1.B', 'R.A', 'S.A'],
        route: [
          ['U1.B', 'R.A'],
          ['R.A', 'S.A'],
        ],
      });
      // Halfway between D and M (0, 100) and R and S (400, 100).
      expect(partById(d, 'U1')?.position).toEqual({ x: 200, y: 100 });
    },
  },
];

describe('insert a translator', () => {
  it.each(cases)('$name', ({ start, finding, expect: check }) => {
    applyAndUndo(start, finding, 'translator', ({ design: d }) => check(d));
  });

  it('the second translator of a design takes the next free designator', () => {
    const first = applyAndUndo(greenhouse, 'overvoltage:SDA:all-on:U2.SDA', 'translator');
    expect(first.fix.title).toBe('Insert translator U8 on SDA');
    const h = first.h;
    expect(h.redo()).toBe(true);
    const { result } = h.store.getState();
    const scl = result.findings.find((f) => f.id === 'overvoltage:SCL:all-on:U2.SCL')!;
    const fix = fixesFor(scl, h.design, result).find((x) => x.id === 'translator')!;
    expect(fix.title).toBe('Insert translator U9 on SCL');
    expect(h.apply(applyFix(fix))).toEqual({ ok: true, changed: true });
    expect(h.design.parts.map((p) => p.id).slice(-2)).toEqual(['U8', 'U9']);
  });

  it('refuses, changing nothing, when the net it was made for is gone', () => {
    const h = harness(greenhouse);
    const { result } = h.store.getState();
    const f = result.findings.find((x) => x.id === 'level-high:VALVE_EN:all-on:U1.VALVE_EN>U3.EN')!;
    const fix = fixesFor(f, h.design, result).find((x) => x.id === 'translator')!;
    h.apply(deleteSelection({ parts: [], wires: [['U1.VALVE_EN', 'U3.EN']] }));
    const before = h.design;
    expect(h.apply(applyFix(fix))).toEqual({ ok: false, reason: 'There is no net VALVE_EN.' });
    expect(h.design).toBe(before);
  });

  it.each([
    [
      'a net on one rail (no crossing to split)',
      design({
        rails: [rail5v0],
        parts: [part('D', '5v0', 'ttl', [output('Y')]), part('R', '5v0', '74hc', [input('A')])],
        nets: [net('N', ['D.Y', 'R.A'])],
      }),
      'level-high:N:all-on:D.Y>R.A',
    ],
  ])('is not offered for %s', (_name, start, finding) => {
    expect(offered(start, finding)).not.toContain('translator');
  });
});

/** The greenhouse example after the translator fix on SDA (U8, open-drain, 3v3 ↔ 1v8). */
function withSdaTranslator(): Design {
  const { h } = applyAndUndo(greenhouse, 'overvoltage:SDA:all-on:U2.SDA', 'translator');
  expect(h.redo()).toBe(true);
  return h.design;
}

describe('a channel of a translator already there', () => {
  it('SCL takes channel 2 of the SDA translator: one part, two channels, each side pulled to its rail', () => {
    const start = withSdaTranslator();
    expect(offered(start, 'overvoltage:SCL:all-on:U2.SCL')).toEqual([
      'translator-channel',
      'translator',
      'fet-shifter',
      'mark-tolerant',
    ]);
    applyAndUndo(start, 'overvoltage:SCL:all-on:U2.SCL', 'translator-channel', ({ design: d, fix }) => {
      expect(fix.title).toBe('Use channel 2 of translator U8 on SCL');
      expect(d.parts.filter((p) => p.profile === 'xlat-od').map((p) => p.id)).toEqual(['U8']);
      expect(partById(d, 'U8')).toMatchObject({
        label: 'Dual-rail translator for SDA, SCL',
        // The sensor sits left of the controller: side B faces it, and channel 2 follows channel 1.
        pins: [
          { id: 'A', role: 'bidir', drive: 'open-drain', side: 'right' },
          { id: 'B', role: 'bidir', drive: 'open-drain', rail: '1v8', side: 'left' },
          { id: 'A2', role: 'bidir', drive: 'open-drain', side: 'right' },
          { id: 'B2', role: 'bidir', drive: 'open-drain', rail: '1v8', side: 'left' },
        ],
      });
      expect(netOf(d, 'SCL')).toMatchObject({ pins: ['U1.SCL', 'U8.A2'], pull: { to: '3v3', ohms: 4700 } });
      expect(netOf(d, 'SCL_1v8')).toMatchObject({ pins: ['U8.B2', 'U2.SCL'], pull: { to: '1v8', ohms: 4700 } });
    });
  });

  it('the same in standby: back-power on SCL is answered by channel 2', () => {
    applyAndUndo(withSdaTranslator(), 'back-power:SCL:standby:U2.SCL', 'translator-channel');
  });

  it.each([
    {
      name: 'a push-pull crossing (VALVE_EN) next to an open-drain translator',
      start: () => withSdaTranslator(),
      finding: 'level-high:VALVE_EN:all-on:U1.VALVE_EN>U3.EN',
    },
    {
      name: 'a translator between other rails (DISP_RX, 5v0 → 3v3, beside the 3v3 → 5v0 one on VALVE_EN)',
      start: () => {
        const { h } = applyAndUndo(greenhouse, 'level-high:VALVE_EN:all-on:U1.VALVE_EN>U3.EN', 'translator');
        expect(h.redo()).toBe(true);
        return h.design;
      },
      finding: 'overvoltage:DISP_RX:all-on:U1.DISP_RX',
    },
    {
      name: `a translator with all ${MAX_CHANNELS} channels taken`,
      start: () => {
        const d = structuredClone(withSdaTranslator());
        const u8 = d.parts.find((p) => p.id === 'U8')!;
        for (let k = 2; k <= MAX_CHANNELS; k++) {
          u8.pins.push(
            { id: `A${k}`, role: 'bidir', drive: 'open-drain', side: 'left' },
            { id: `B${k}`, role: 'bidir', drive: 'open-drain', rail: '1v8', side: 'right' },
          );
        }
        return d;
      },
      finding: 'overvoltage:SCL:all-on:U2.SCL',
    },
  ])('is not offered for $name', ({ start, finding }) => {
    const fixes = offered(start(), finding);
    expect(fixes).toContain('translator');
    expect(fixes).not.toContain('translator-channel');
  });

  it('refuses, changing nothing, when the translator is gone by the time it is applied', () => {
    const h = harness(withSdaTranslator());
    const { result } = h.store.getState();
    const f = result.findings.find((x) => x.id === 'overvoltage:SCL:all-on:U2.SCL')!;
    const fix = fixesFor(f, h.design, result).find((x) => x.id === 'translator-channel')!;
    h.apply(deleteSelection({ parts: ['U8'], wires: [] }));
    const before = h.design;
    expect(h.apply(applyFix(fix))).toEqual({
      ok: false,
      reason: 'Translator U8 has no free channel between 3v3 and 1v8 for this net.',
    });
    expect(h.design).toBe(before);
  });
});
