/** Copy, paste and duplicate of parts with the nets among them; arrow-key nudges, one step each. */
import { describe, expect, it } from 'vitest';
import { copyParts, designatorPrefix, planPaste } from '../../app/store/clipboard.ts';
import { insertParts, nudgeParts } from '../../app/store/commands/index.ts';
import { newDesign } from '../../rules/model/newDesign.ts';
import { validateDesign } from '../../rules/model/reader.ts';
import { net } from '../support/build.ts';
import { bench, harness } from './harness.ts';

// D drives H and T on net A (route D–H, H–T); H drives T on net B; S is left out of the copy.
const start = bench({
  nets: [
    net('A', ['D.Y1', 'H.A', 'T.A'], {
      route: [
        ['D.Y1', 'H.A'],
        ['H.A', 'T.A'],
      ],
      label: 'VALVE_EN',
      pull: { to: '5v0', ohms: 10e3 },
      waivers: [{ rule: 'level-high', note: 'seen' }],
    }),
    net('B', ['H.Y', 'T.B']),
    net('C', ['D.Y2', 'S.SDA']),
  ],
  parts: bench().parts.map((p, k) => ({ ...p, position: { x: k * 300, y: 100 } })),
});

describe('copy and paste', () => {
  it('copies the parts and only the nets among them, without labels or waivers', () => {
    const clip = copyParts(start, ['H', 'T'])!;
    expect(clip.parts.map((p) => p.id)).toEqual(['H', 'T']);
    expect(clip.nets).toEqual([
      { id: 'A', pins: ['H.A', 'T.A'], route: [['H.A', 'T.A']], pull: { to: '5v0', ohms: 10e3 } },
      { id: 'B', pins: ['H.Y', 'T.B'] },
    ]);
    expect(copyParts(start, ['Q'])).toBeUndefined();
  });

  it("a copy leaves a pin's waivers behind, as it leaves a net's", () => {
    const waived = {
      ...start,
      parts: start.parts.map((p) =>
        p.id === 'H'
          ? {
              ...p,
              pins: p.pins.map((q) =>
                q.id === 'C' ? { ...q, waivers: [{ rule: 'floating-input' as const, note: 'spare' }] } : q,
              ),
            }
          : p,
      ),
    };
    const clip = copyParts(waived, ['H'])!;
    expect(clip.parts[0]!.pins.find((q) => q.id === 'C')).toEqual({ id: 'C', role: 'input' });
    expect(waived.parts[1]!.pins.find((q) => q.id === 'C')?.waivers).toHaveLength(1);
  });

  it('pastes with fresh designators and net ids, moved by the offset, in one undo step', () => {
    const h = harness(start);
    const planned = planPaste(h.design, copyParts(h.design, ['H', 'T'])!, { x: 40, y: 40 });
    // Asked for 40 px down and right, the copies would cover H and T (131 px tall: 44 header,
    // 4 rows of 20, 6 padding, 1 border): they land 120 px lower, the nearest step of 20 px that
    // leaves 24 px between bodies (106 + 131 + 24 = 261 ≤ 266).
    expect(planned.parts.map((p) => [p.id, p.position])).toEqual([
      ['H1', { x: 340, y: 260 }],
      ['T1', { x: 640, y: 260 }],
    ]);
    expect(planned.nets.map((n) => [n.id, n.pins, n.route])).toEqual([
      ['N1', ['H1.A', 'T1.A'], [['H1.A', 'T1.A']]],
      ['N2', ['H1.Y', 'T1.B'], undefined],
    ]);
    expect(h.apply(insertParts(planned.parts, planned.nets))).toEqual({ ok: true, changed: true });
    expect(h.design.parts.map((p) => p.id)).toEqual(['D', 'H', 'T', 'S', 'H1', 'T1']);
    // The connection to D (outside the copy) is not copied: D.Y1's net is unchanged.
    expect(h.netOf('D.Y1')?.pins).toEqual(['D.Y1', 'H.A', 'T.A']);
    const read = validateDesign(h.design);
    expect(read.ok ? [] : read.errors).toEqual([]);
    expect(h.store.getState().past.map((s) => s.name)).toEqual(['Paste 2 parts']);
    h.undo();
    expect(h.design).toEqual(start);
  });

  it('a second paste of the same clip takes the next designators and ids', () => {
    const h = harness(start);
    const clip = copyParts(h.design, ['H', 'T'])!;
    for (const k of [1, 2]) {
      const p = planPaste(h.design, clip, { x: 40 * k, y: 40 * k });
      h.apply(insertParts(p.parts, p.nets));
    }
    expect(h.design.parts.map((p) => p.id)).toEqual(['D', 'H', 'T', 'S', 'H1', 'T1', 'H2', 'T2']);
    expect(h.design.nets.map((n) => n.id)).toEqual(['A', 'B', 'C', 'N1', 'N2', 'N3', 'N4']);
  });

  it("a paste into a design without the clip's rail is refused whole", () => {
    const clip = copyParts(start, ['H', 'T'])!;
    // A design with no rails: nothing the clip names is there.
    const h = harness({ ...newDesign('Empty'), rails: [] });
    const p = planPaste(h.design, clip, { x: 0, y: 0 });
    const out = h.apply(insertParts(p.parts, p.nets));
    expect(out.ok ? '' : out.reason).toMatch(/no rail 5v0/);
    expect(h.design.parts).toHaveLength(0);
  });

  const prefixes: [string, string][] = [
    ['U12', 'U'],
    ['J3', 'J'],
    ['VALVE', 'VALVE'],
    ['42', 'U'],
    ['R2C', 'R2C'],
  ];
  it.each(prefixes)('the designator letters of %s are %s', (id, prefix) => {
    expect(designatorPrefix(id)).toBe(prefix);
  });
});

describe('nudging with the arrow keys', () => {
  it('each press is one undo step', () => {
    const h = harness(start);
    h.apply(nudgeParts(['H', 'T'], 10, 0));
    h.apply(nudgeParts(['H', 'T'], 0, -40));
    expect(h.design.parts.slice(1, 3).map((p) => p.position)).toEqual([
      { x: 310, y: 60 },
      { x: 610, y: 60 },
    ]);
    expect(h.store.getState().past.map((s) => s.name)).toEqual(['Nudge 2 parts', 'Nudge 2 parts']);
    h.undo();
    expect(h.design.parts.slice(1, 3).map((p) => p.position)).toEqual([
      { x: 310, y: 100 },
      { x: 610, y: 100 },
    ]);
    h.undo();
    expect(h.design).toEqual(start);
  });

  it('with nothing to move, nothing happens', () => {
    const h = harness(start);
    const out = h.apply(nudgeParts([], 10, 0));
    expect(out.ok).toBe(false);
    expect(h.store.getState().past).toHaveLength(0);
  });
});
