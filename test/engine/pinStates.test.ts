/**
 * Pins' states before firmware runs: a power state may give pins another role, drive or internal
 * pull, and every rule runs in it as in any power state. Levels: the GPIO starting point
 * (VIH 0.7·VDD, common practice) and 74HC (JESD7 as restated); the 40 kΩ pull is the example's
 * own kind of value (invented).
 */
import { describe, expect, it } from 'vitest';
import { check } from '../../rules/check/check.ts';
import { validateDesign } from '../../rules/model/reader.ts';
import type { PinState } from '../../rules/model/schema.ts';
import { design, input, net, output, part } from '../support/build.ts';

/** A controller's enable output into a valve driver's 74HC input, with a reset state for the enable. */
function board(states: PinState[]) {
  return design({
    parts: [part('U1', '3v3', 'mcu-gpio', [output('EN')]), part('U3', '3v3', '74hc', [input('EN')])],
    nets: [net('VALVE_EN', ['U1.EN', 'U3.EN'])],
    scenarios: [{ id: 'reset', label: 'Reset: firmware not running', off: [], pins: states }],
  });
}

const ids = (d: ReturnType<typeof board>, scenario: string) =>
  check(d)
    .findings.filter((f) => f.scenario === scenario && f.severity !== 'info')
    .map((f) => `${f.rule}/${f.severity}`)
    .sort();

describe('pin states in a power state', () => {
  it.each<[string, PinState[], string[]]>([
    // Nothing drives the enable while the controller's pin is an input: the valve driver's input floats.
    [
      'the enable output is an input at reset: a floating enable is an error',
      [{ pin: 'U1.EN', role: 'input' }],
      ['floating-input/error'],
    ],
    // A weak pull-down holds it low: no finding.
    [
      'with a 40 kΩ pull-down at reset the enable is held low',
      [{ pin: 'U1.EN', role: 'input', pull: { to: 'ground', ohms: 40e3 } }],
      [],
    ],
    // No state given for the pin: the reset state is judged as every rail on.
    ['no pin state: as with every rail on', [], []],
  ])('%s', (_name, states, expected) => {
    const d = board(states);
    const valid = validateDesign(d);
    expect(valid.ok ? [] : valid.errors).toEqual([]);
    expect(ids(d, 'reset')).toEqual(expected);
    expect(ids(d, 'all-on')).toEqual([]);
  });

  it("a pin state's pull: null takes the pin's own pull away", () => {
    const d = design({
      parts: [
        part('U1', '3v3', 'mcu-gpio', [output('EN', { drive: 'open-drain', pull: { to: '3v3', ohms: 40e3 } })]),
        part('U3', '3v3', '74hc', [input('EN')]),
      ],
      nets: [net('N', ['U1.EN', 'U3.EN'])],
      scenarios: [{ id: 'reset', label: 'Reset', off: [], pins: [{ pin: 'U1.EN', pull: null }] }],
    });
    // Open-drain with its internal pull-up gone: nothing pulls the net up (missing-pull).
    expect(ids(d, 'reset')).toContain('missing-pull/error');
    expect(ids(d, 'all-on')).not.toContain('missing-pull/error');
  });

  it('the reader refuses a pin state naming an unknown pin', () => {
    const d = board([{ pin: 'U1.NOPE', role: 'input' }]);
    const valid = validateDesign(d);
    expect(valid.ok).toBe(false);
    if (!valid.ok) expect(valid.errors.map((e) => e.path)).toContain('scenarios[0].pins[0].pin');
  });
});
