/**
 * The before/after re-check of a fix, as the findings panel will show it: what it removes,
 * what it brings, and that trying a fix on a copy leaves the store untouched.
 */
import { describe, expect, it } from 'vitest';
import { exampleDesign } from '../../../app/example.ts';
import { fixesFor, previewFix } from '../../../app/store/commands/fixes/index.ts';
import { harness } from '../harness.ts';

describe('previewFix', () => {
  it.each([
    {
      // FLOW's pull-up fixes the slow edge too: edge-rate goes with the pull-range error.
      name: 'a pull-up added into its range: the error goes, an info takes its id in each of the three power states',
      finding: 'pull-range:FLOW:all-on',
      fix: 'pull-value',
      gone: [
        'pull-range:FLOW:all-on',
        'pull-range:FLOW:standby',
        'pull-range:FLOW:reset',
        'edge-rate:FLOW:all-on',
        'edge-rate:FLOW:standby',
        'edge-rate:FLOW:reset',
      ],
      added: ['pull-range:FLOW:all-on/info', 'pull-range:FLOW:standby/info', 'pull-range:FLOW:reset/info'],
    },
    {
      name: 'a translator on VALVE_EN: the level error and the crossing go in both power states',
      finding: 'level-high:VALVE_EN:all-on:U1.VALVE_EN>U3.EN',
      fix: 'translator',
      gone: [
        'level-high:VALVE_EN:all-on:U1.VALVE_EN>U3.EN',
        'level-high:VALVE_EN:standby:U1.VALVE_EN>U3.EN',
        'rail-crossing:VALVE_EN:all-on',
        'rail-crossing:VALVE_EN:standby',
        'rail-crossing:VALVE_EN:reset',
      ],
      added: [],
    },
  ])('$name', ({ finding, fix, gone, added }) => {
    const h = harness(exampleDesign());
    const { design, result } = h.store.getState();
    const ids = result.findings.map((f) => f.id);
    const f = result.findings.find((x) => x.id === finding)!;
    const p = previewFix(fixesFor(f, design, result).find((x) => x.id === fix)!, design, result);
    expect(p.refused).toBeUndefined();
    expect(p.gone.map((g) => g.id).sort()).toEqual([...gone].sort());
    expect(p.added.map((g) => `${g.id}/${g.severity}`).sort()).toEqual([...added].sort());
    // The store is untouched, and its result is still the one it holds (not consumed by the preview).
    expect(h.store.getState().design).toBe(design);
    expect(h.store.getState().result.findings.map((x) => x.id)).toEqual(ids);
    expect(p.design).not.toBe(design);
  });

  it('reports a refusal and leaves the design as it was', () => {
    const h = harness(exampleDesign());
    const { design, result } = h.store.getState();
    const f = result.findings.find((x) => x.id === 'missing-pull:TANK_LOW:all-on')!;
    const fix = fixesFor(f, design, result)[0]!;
    const gone = { ...design, nets: design.nets.filter((n) => n.id !== 'TANK_LOW') };
    const p = previewFix(fix, gone, result);
    expect(p.refused).toBe('There is no net TANK_LOW.');
    expect(p.design).toBe(gone);
  });
});
