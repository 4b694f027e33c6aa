import rule from '../../rules/checks/bus-hold.ts';
import { ruleTester } from '../support/ruleTester.ts';
import { design, input, net, output, part, rail3v3 } from '../support/build.ts';
import type { Net } from '../../rules/model/schema.ts';

// Bus-hold inputs: hold 75 µA, overdrive at most 500 µA (datasheet convention, from memory), on
// 3.3 V LVCMOS (VIH 2.0 V, VIL 0.8 V: JESD8C restated). A strap up must be at most
// (3.135 − 2.0)/500 µA = 2.27 kΩ (the figure); a strap down at most 0.8/500 µA = 1.6 kΩ.
const hold = { params: { busHold: { hold: 75e-6, overdrive: 500e-6 } } };
function strapped(netExtra: Partial<Net>, driver?: 'push-pull' | 'three-state') {
  return design({
    rails: [rail3v3],
    parts: [
      part('U7', '3v3', 'lvcmos33', [input('D0', hold)]),
      ...(driver === undefined ? [] : [part('U8', '3v3', 'lvcmos33', [output('Q', { drive: driver })])]),
    ],
    nets: [net('BUS0', ['U7.D0', ...(driver === undefined ? [] : ['U8.Q'])], netExtra)],
  });
}

ruleTester(rule, {
  valid: [
    { name: 'a 2.2 kΩ strap up overdrives 500 µA', design: strapped({ pull: { to: '3v3', ohms: 2200 } }) },
    { name: 'a 1.5 kΩ strap down overdrives 500 µA', design: strapped({ pull: { to: 'ground', ohms: 1500 } }) },
    {
      name: 'an actively driven net needs no strap to win',
      design: strapped({ pull: { to: '3v3', ohms: 47e3 } }, 'push-pull'),
    },
  ],
  invalid: [
    {
      name: 'a 4.7 kΩ strap up cannot overdrive the hold latch',
      design: strapped({ pull: { to: '3v3', ohms: 4700 } }),
      findings: [
        {
          messageId: 'strapTooWeak',
          severity: 'error',
          values: { ohms: 4700, rMax: (3.135 - 2.0) / 500e-6, overdrive: 500e-6, toward: 'high' },
        },
      ],
    },
    {
      name: 'a 2.2 kΩ strap down on a three-state bus',
      design: strapped({ pull: { to: 'ground', ohms: 2200 } }, 'three-state'),
      findings: [
        { messageId: 'strapTooWeak', severity: 'error', values: { ohms: 2200, rMax: 0.8 / 500e-6, toward: 'low' } },
      ],
    },
  ],
});
