import rule from '../../rules/checks/undervoltage.ts';
import { ruleTester } from '../support/ruleTester.ts';
import { design, input, net, output, part, rail, rail3v3, resistor } from '../support/build.ts';

// viMin −0.5 V: the absolute minimum of a clamped CMOS input (−0.5 V, common practice; JESD8C
// restates the same figure for LVCMOS inputs).
const clamped = { params: { viMin: -0.5 } };
// A ±12 V line: an off-board driver on a −12 V rail (invented, ±5 % given explicitly).
const n12 = rail('n12', -12, { min: -12.6, max: -11.4 });
const lineDriver = part('J1', 'n12', 'off-board', [
  output('TXD', { params: { voh: [{ v: -11.4, i: 1e-3 }], vol: [{ v: -12.6, i: 1e-3 }] } }),
]);

ruleTester(rule, {
  valid: [
    {
      name: 'a 3.3 V output into a clamped input never goes below 0 V',
      design: design({
        rails: [rail3v3],
        parts: [part('D', '3v3', 'lvcmos33', [output('Y')]), part('R', '3v3', 'lvcmos33', [input('A', clamped)])],
        nets: [net('N', ['D.Y', 'R.A'])],
      }),
    },
    {
      // 100 kΩ / 1 kΩ: −12.6 × 1/101 = −0.125 V, above −0.5 V.
      name: 'the −12 V line divided by 100 kΩ / 1 kΩ',
      design: design({
        rails: [rail3v3, n12],
        parts: [lineDriver, part('R', '3v3', 'lvcmos33', [input('A', clamped)])],
        discretes: [
          resistor('R1', 100e3, { tolerance: 0 }),
          resistor('R2', 1e3, { tolerance: 0, tie: { '2': 'ground' } }),
        ],
        nets: [net('LINE', ['J1.TXD', 'R1.1']), net('N', ['R1.2', 'R2.1', 'R.A'])],
      }),
    },
  ],
  invalid: [
    {
      name: 'a −12 V line straight into a clamped logic input',
      design: design({
        rails: [rail3v3, n12],
        parts: [lineDriver, part('R', '3v3', 'lvcmos33', [input('A', clamped)])],
        nets: [net('N', ['J1.TXD', 'R.A'])],
      }),
      findings: [
        {
          messageId: 'tooLow',
          severity: 'error',
          id: 'undervoltage:N:all-on:R.A',
          values: { vNet: -12.6, viMin: -0.5, source: 'J1.TXD' },
        },
      ],
    },
    {
      // 10 kΩ / 1 kΩ: −12.6 × 1/11 = −1.145 V, below −0.5 V.
      name: 'the −12 V line through a 10 kΩ / 1 kΩ divider is still too low',
      design: design({
        rails: [rail3v3, n12],
        parts: [lineDriver, part('R', '3v3', 'lvcmos33', [input('A', clamped)])],
        discretes: [
          resistor('R1', 10e3, { tolerance: 0 }),
          resistor('R2', 1e3, { tolerance: 0, tie: { '2': 'ground' } }),
        ],
        nets: [net('LINE', ['J1.TXD', 'R1.1']), net('N', ['R1.2', 'R2.1', 'R.A'])],
      }),
      findings: [{ messageId: 'tooLow', severity: 'error', values: { vNet: -12.6 / 11, viMin: -0.5 } }],
    },
  ],
});
