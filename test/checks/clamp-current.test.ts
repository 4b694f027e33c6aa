import rule from '../../rules/checks/clamp-current.ts';
import { ruleTester } from '../support/ruleTester.ts';
import { divider, seriesClamp } from '../support/paths.ts';

// The worked case: 1 kΩ − 5 % from 5.25 V into a 3.135 V rail, the clamp diode's drop at
// 0 V (the worst case): (5.25 − 3.135)/950 = 2.226 mA. VDD + 0.5 V for a clamped LVCMOS input is
// JESD8C restated (lvcmos33); the 5.25 V is the 5 V rail at +5 %.
const I_1K = (5.25 - 3.135) / 950;
// 2.2 kΩ − 5 %: (5.25 − 3.135)/2090 = 1.012 mA.
const I_2K2 = (5.25 - 3.135) / 2090;

ruleTester(rule, {
  valid: [
    { name: 'the divider keeps the input below viMax: no clamp current', design: divider() },
    { name: "a pin without an injection limit is overvoltage's to report", design: seriesClamp() },
  ],
  invalid: [
    {
      name: '2.23 mA through 1 kΩ against a 2 mA injection limit',
      design: seriesClamp({ injectionMax: 2e-3 }),
      findings: [
        {
          messageId: 'overLimit',
          severity: 'error',
          id: 'clamp-current:RX1:all-on:U2.A1',
          pins: ['U2.A1'],
          values: {
            current: I_1K,
            injectionMax: 2e-3,
            vNet: 5.25,
            viMax: 3.635,
            pinVdd: 3.135,
            source: 'U1.Y1',
            rail: '3v3',
          },
        },
      ],
    },
    {
      name: '1.01 mA through 2.2 kΩ within a 5 mA limit is listed with its current',
      design: seriesClamp({ ohms: 2200, injectionMax: 5e-3 }),
      findings: [{ messageId: 'withinLimit', severity: 'info', values: { current: I_2K2, injectionMax: 5e-3 } }],
    },
  ],
});
