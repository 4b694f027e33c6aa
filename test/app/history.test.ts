import { describe, expect, it } from 'vitest';
import { connectPins, moveParts, setPartLabel, setPartProfile, setTitle } from '../../app/store/commands/index.ts';
import { net } from '../support/build.ts';
import { valuesOf } from '../../rules/engine/findings.ts';
import { bench, harness } from './harness.ts';

describe('undo and redo', () => {
  it('a drag of two parts is one step', () => {
    const h = harness();
    h.apply(
      moveParts([
        { id: 'D', x: 50, y: 60 },
        { id: 'H', x: 300, y: 60 },
      ]),
    );
    expect(h.store.getState().past.map((s) => s.name)).toEqual(['Move 2 parts']);
    h.undo();
    expect(h.design.parts.map((p) => p.position)).toEqual([undefined, undefined, undefined, undefined]);
  });

  it('a command that changes nothing leaves no step', () => {
    const h = harness(bench({ title: 'same' }));
    expect(h.apply(setTitle('same'))).toEqual({ ok: true, changed: false });
    expect(h.store.getState().past).toHaveLength(0);
  });

  it('a new command after an undo drops the steps that could have been redone', () => {
    const h = harness();
    h.apply(setTitle('one'));
    h.apply(setTitle('two'));
    h.undo();
    expect(h.store.getState().future).toHaveLength(1);
    h.apply(setTitle('three'));
    expect(h.store.getState().future).toHaveLength(0);
    expect(h.redo()).toBe(false);
    expect(h.store.getState().past.map((s) => s.name)).toEqual(['Rename the design', 'Rename the design']);
  });

  it('undo and redo walk the whole history and stop at its ends', () => {
    const h = harness();
    const titles = ['a', 'b', 'c'];
    for (const t of titles) h.apply(setTitle(t));
    for (const t of ['b', 'a', 'test']) {
      expect(h.undo()).toBe(true);
      expect(h.design.title).toBe(t);
    }
    expect(h.undo()).toBe(false);
    for (const t of titles) {
      expect(h.redo()).toBe(true);
      expect(h.design.title).toBe(t);
    }
    expect(h.redo()).toBe(false);
  });

  it('records outside the edit keep their identity through edit, undo and redo', () => {
    const h = harness(bench({ nets: [net('A', ['D.Y1', 'H.A'])] }));
    const [d0, h0, t0] = h.design.parts;
    const a0 = h.design.nets[0];
    h.apply(setPartLabel('T', 'Receiver'));
    expect(h.design.parts[0]).toBe(d0);
    expect(h.design.parts[1]).toBe(h0);
    expect(h.design.parts[2]).not.toBe(t0);
    expect(h.design.nets[0]).toBe(a0);
    h.undo();
    expect(h.design.parts[0]).toBe(d0);
    expect(h.design.nets[0]).toBe(a0);
  });

  it('undo clears a selection of what it removed', () => {
    const h = harness();
    h.apply(connectPins('D.Y1', 'H.A'));
    h.store.getState().select({ net: 'N1', wires: ['N1:D.Y1:H.A'], parts: ['H'] });
    h.undo();
    expect(h.store.getState().selection).toEqual({ parts: ['H'], wires: [], net: null });
  });
});

describe('the re-check after each command', () => {
  // lvcmos33 driver: VOH ≥ VDD − 0.2 V at 100 µA (JESD8C LVCMOS, restated in the profile
  // library); 74HC receiver: VIH = 0.675·VDD + 0.15 (JESD7, as the library restates it);
  // 74HCT: VIH = 2.0 V (JESD7). Both rails 5 %: the worst corner is 3.135 V against 5.25 V.
  const nmhHc = 3.135 - 0.2 - (0.675 * 5.25 + 0.15);
  const nmhHct = 3.135 - 0.2 - 2.0;

  it('colours the wire red, then neutral with TTL thresholds, then red again on undo', () => {
    const h = harness();
    h.apply(connectPins('D.Y1', 'H.A'));
    const s = h.store.getState();
    expect(s.result.design).toBe(s.design);
    const f = s.result.findings.find((x) => x.rule === 'level-high' && x.net === 'N1');
    expect(f?.severity).toBe('error');
    expect(valuesOf(f!, 'level-high').margin).toBeCloseTo(nmhHc, 9);
    expect(h.severity('N1')).toBe('error');
    expect(s.netStatus.get('N1')?.rule).toBe('level-high');
    expect(s.result.nets.get('all-on')?.get('N1')?.view.analysis.worstHigh).toBeCloseTo(nmhHc, 9);

    h.apply(setPartProfile('H', '74hct'));
    expect(h.severity('N1')).not.toMatch(/error|warning/);
    expect(h.store.getState().result.nets.get('all-on')?.get('N1')?.view.analysis.worstHigh).toBeCloseTo(nmhHct, 9);

    h.undo();
    expect(h.severity('N1')).toBe('error');
    expect(h.store.getState().lastCheck).toMatchObject({ action: 'Undo Give H profile 74hct', netsChecked: 1 });
  });

  it('reports how many nets were checked and how long it took', () => {
    const h = harness(bench({ nets: [net('A', ['D.Y1', 'H.A']), net('B', ['D.Y2', 'T.A'])] }));
    h.apply(setPartProfile('T', '74hc'));
    const { lastCheck } = h.store.getState();
    expect(lastCheck.action).toBe('Give T profile 74hc');
    expect(lastCheck.netsChecked).toBeGreaterThan(0);
    expect(lastCheck.ms).toBeGreaterThanOrEqual(0);
  });

  it('the chosen power state picks which findings colour the wires', () => {
    const h = harness(
      bench({
        nets: [net('A', ['D.Y1', 'H.A'])],
        scenarios: [{ id: 'S1', label: 'Logic off', off: ['3v3'] }],
      }),
    );
    expect(h.store.getState().netStatus.get('A')?.rule).toBe('level-high');
    h.store.getState().setPowerState('S1');
    // With the driver's rail off there is no powered driver, so no level finding on A.
    expect(h.store.getState().powerState).toBe('S1');
    expect(h.store.getState().netStatus.get('A')?.rule).not.toBe('level-high');
    h.store.getState().setPowerState('no-such-state');
    expect(h.store.getState().powerState).toBe('S1');
  });
});
