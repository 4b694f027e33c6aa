import rule from '../../rules/checks/interface-power.ts';
import { ruleTester } from '../support/ruleTester.ts';
import { design, input, link, net, output, part, rail, scenario } from '../support/build.ts';

// Rails: 3.3 V ± 5 % = 3.135–3.465 V, 5 V ± 5 % = 4.75–5.25 V. ΔICC of the TTL-input CMOS
// profiles (from memory): 74HCT 0.5 mA, 74AHCT 1.5 mA per input, at VCC − 2.1 V. JESD8C LVCMOS:
// VOH VDD − 0.2 V at 100 µA; 74HC: VDD − 0.1 V at 20 µA (JESD7 as restated).
const lvcmos = { rail: '3v3', profile: 'lvcmos33' } as const;

ruleTester(rule, {
  valid: [
    // A 5 V 74HC output into 74HCT on the same rail: VDD − 0.1 V, never 2.1 V below the supply.
    {
      name: 'driven from its own supply',
      design: link({ rail: '5v0', profile: '74hc' }, { rail: '5v0', profile: '74hct' }),
    },
    // 74HC inputs give no ΔICC in the library: nothing to report.
    { name: 'an input without a ΔICC', design: link(lvcmos, { rail: '5v0', profile: '74hc' }) },
    {
      // An exact 5 V rail and a driver exactly at 5 − 2.1 = 2.9 V: not below.
      name: 'a high level exactly at the test offset',
      design: link(
        { rail: 'p5', profile: 'off-board', pin: { params: { voh: [{ v: 2.9, i: 1e-3 }] } } },
        { rail: 'p5', profile: '74hct' },
        { rails: [rail('p5', 5, { tolerance: 0 })] },
      ),
    },
  ],
  invalid: [
    {
      // 3.135 − 0.2 = 2.935 V against 5.25 − 2.1 = 3.15 V: 0.5 mA more from 5v0.
      name: '3.3 V CMOS into a 5 V TTL-input CMOS part',
      design: link(lvcmos, { rail: '5v0', profile: '74hct' }),
      findings: [
        {
          messageId: 'belowSupply',
          severity: 'info',
          id: 'interface-power:N:all-on:R.A',
          pins: ['R.A', 'D.Y'],
          values: {
            pin: 'R.A',
            driver: 'D.Y',
            rail: '5v0',
            current: 0.5e-3,
            drop: 2.1,
            high: 3.135 - 0.2,
            threshold: 5.25 - 2.1,
          },
        },
      ],
    },
    {
      // Two 74AHCT inputs on one net: one finding each, 1.5 mA each (the report sums them per rail).
      name: 'one finding per input',
      design: design({
        parts: [part('D', '3v3', 'lvcmos33', [output('Y')]), part('R', '5v0', '74ahct', [input('A'), input('B')])],
        nets: [net('N', ['D.Y', 'R.A', 'R.B'])],
      }),
      findings: [
        { messageId: 'belowSupply', severity: 'info', id: 'interface-power:N:all-on:R.A', values: { current: 1.5e-3 } },
        { messageId: 'belowSupply', severity: 'info', id: 'interface-power:N:all-on:R.B', values: { current: 1.5e-3 } },
      ],
    },
    {
      // An open-drain driver pulled up to 3.3 V: the pull-up's level, 3.135 V less 4.7 kΩ × (1 µA
      // of the 74HCT input, JESD7, and 10 µA of the bus pin, I2C-bus specification), against 3.15 V.
      // With the driver's rail off there is no driver.
      name: 'a pull-up to a lower rail holds the input below its supply',
      design: design({
        parts: [
          part('D', '3v3', 'i2c', [output('Y', { drive: 'open-drain' })]),
          part('R', '5v0', '74hct', [input('A')]),
        ],
        nets: [net('N', ['D.Y', 'R.A'], { pull: { to: '3v3', ohms: 4700 } })],
        scenarios: [scenario('io-off', ['3v3'])],
      }),
      findings: [
        {
          messageId: 'belowSupply',
          severity: 'info',
          scenario: 'all-on',
          values: { driver: 'D.Y', high: 3.135 - 4700 * (10e-6 + 1e-6), threshold: 3.15 },
        },
      ],
    },
  ],
});
