import rule from '../../rules/checks/translator-pull.ts';
import { ruleTester } from '../support/ruleTester.ts';
import { design, input, net, output, part, rail3v3, rail1v8 } from '../support/build.ts';
import type { Params } from '../../rules/model/schema.ts';

// Auto-direction translators (datasheet conventions from memory): class (a) weak push-pull with a
// series output resistance of about 4–4.5 kΩ and a smallest external pull of about 50 kΩ;
// class (b) open-drain pass with internal pulls and a largest load capacitance.
function translated(params: Params, netExtra: object = {}) {
  return design({
    rails: [rail3v3, rail1v8],
    parts: [part('U5', '3v3', 'lvcmos33', [output('B1', { params })]), part('U6', '3v3', 'lvcmos33', [input('A')])],
    nets: [net('N', ['U5.B1', 'U6.A'], netExtra)],
  });
}

ruleTester(rule, {
  valid: [
    { name: 'class (a) with no external pull', design: translated({ seriesResistance: 4500, minExternalPull: 50e3 }) },
    {
      // 3.465 × 4.5/(100 + 4.5) = 0.149 V, below VIL 0.8 V (JESD8C restated).
      name: 'class (a) with a 100 kΩ pull-up keeps its low',
      design: translated({ seriesResistance: 4500, minExternalPull: 50e3 }, { pull: { to: '3v3', ohms: 100e3 } }),
    },
    {
      name: 'class (b) within its load capacitance',
      design: translated({ minExternalPull: 10e3, maxLoadCapacitance: 70e-12 }),
    },
  ],
  invalid: [
    {
      name: 'a 4.7 kΩ pull-up where 50 kΩ is the least allowed',
      design: translated({ minExternalPull: 50e3 }, { pull: { to: '3v3', ohms: 4.7e3 } }),
      findings: [
        { messageId: 'pullTooStrong', severity: 'error', values: { ohms: 4700, minExternalPull: 50e3, pull: 'net' } },
      ],
    },
    {
      // The case: Rs 4.5 kΩ, 4.7 kΩ to a 3.3 V ± 5 % rail: 3.465 × 4.5/9.2 = 1.69 V > 0.8 V.
      name: 'class (a): a 4.7 kΩ pull-up lifts the low to 1.69 V',
      design: translated({ seriesResistance: 4500 }, { pull: { to: '3v3', ohms: 4.7e3 } }),
      findings: [
        {
          messageId: 'lowLevelLost',
          severity: 'error',
          id: 'translator-pull:N:all-on:U5.B1>U6.A',
          values: { vlow: (3.465 * 4500) / 9200, vil: 0.8, rs: 4500, rpu: 4700, vpull: 3.465 },
        },
      ],
    },
    {
      // 80 pF of wiring and two lvcmos33 pins of 5 pF each (from memory): 90 pF.
      name: 'class (b): 80 pF of wiring on a pin that drives 70 pF',
      design: translated({ maxLoadCapacitance: 70e-12 }, { wiringCapacitance: 80e-12 }),
      findings: [
        { messageId: 'loadTooLarge', severity: 'error', values: { capacitance: 90e-12, maxLoadCapacitance: 70e-12 } },
      ],
    },
  ],
});
