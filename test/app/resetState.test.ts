/**
 * One click for a part's state before firmware runs: its outputs become inputs in the `reset`
 * power state, where every rule runs; a floating enable there is an error (floating-input).
 */
import { describe, expect, it } from 'vitest';
import { exampleDesign } from '../../app/example.ts';
import { setResetState } from '../../app/store/commands/index.ts';
import { validateDesign } from '../../rules/model/reader.ts';
import { harness } from './harness.ts';

describe('reset state of a part', () => {
  it('makes the example controller\'s outputs and bidir pins inputs in "reset", once, and undoes in one step', () => {
    const start = exampleDesign();
    const h = harness(start);
    expect(h.apply(setResetState('U1')).ok).toBe(true);
    const reset = h.design.scenarios?.find((s) => s.id === 'reset');
    expect(reset?.off).toEqual([]);
    const outputs = start.parts
      .find((p) => p.id === 'U1')!
      .pins.filter((p) => p.role !== 'input')
      .map((p) => `U1.${p.id}`);
    // The example's reset state already sets VALVE_EN and PUMP_EN (the latter with its 40 kΩ
    // pull-down): they stay as they are, the controller's other outputs join them.
    expect(new Set(reset?.pins?.map((p) => p.pin))).toEqual(new Set(outputs));
    expect(reset?.pins?.every((p) => p.role === 'input')).toBe(true);
    expect(reset?.pins?.find((p) => p.pin === 'U1.PUMP_EN')?.pull).toEqual({ to: 'ground', ohms: 40e3 });
    const valid = validateDesign(h.design);
    expect(valid.ok ? [] : valid.errors).toEqual([]);
    // The display's receive line floats while the controller boots: an error there only.
    const floating = h.store
      .getState()
      .result.findings.filter((f) => f.rule === 'floating-input' && f.net === 'DISP_TX');
    expect(floating.map((f) => `${f.scenario}/${f.severity}`)).toContain('reset/error');
    expect(floating.some((f) => f.scenario === 'all-on')).toBe(false);
    // A second click adds nothing.
    const before = h.design;
    h.apply(setResetState('U1'));
    expect(h.design.scenarios).toEqual(before.scenarios);
    h.undo();
    h.undo();
    expect(h.design).toEqual(start);
  });

  it('refuses a part with no output', () => {
    const h = harness(exampleDesign());
    expect(h.apply(setResetState('U6')).ok).toBe(false);
  });
});
