import rule from '../../rules/checks/rail-injection.ts';
import { ruleTester } from '../support/ruleTester.ts';
import { divider, seriesClamp } from '../support/paths.ts';

// Each input takes (5.25 − 3.135)/950 = 2.226 mA through 1 kΩ − 5 % (the worked case).
const I_1K = (5.25 - 3.135) / 950;

ruleTester(rule, {
  valid: [{ name: 'no clamp current: nothing to absorb', design: divider() }],
  invalid: [
    {
      name: 'two inputs push 4.45 mA into a rail that always draws 1 mA',
      design: seriesClamp({ injectionMax: 5e-3, minLoad: 1e-3, inputs: 2 }),
      findings: [
        {
          messageId: 'exceedsMinLoad',
          severity: 'error',
          id: 'rail-injection:3v3:all-on',
          net: null,
          pins: ['U2.A1', 'U2.A2'],
          values: { rail: '3v3', total: 2 * I_1K, minLoad: 1e-3 },
        },
      ],
    },
    {
      name: 'a rail that states no minimum load cannot be judged, and says so',
      design: seriesClamp({ injectionMax: 5e-3 }),
      findings: [{ messageId: 'noMinLoad', severity: 'error', values: { total: I_1K, minLoad: null } }],
    },
    {
      name: 'a rail whose minimum load absorbs the current is listed with it',
      design: seriesClamp({ injectionMax: 5e-3, minLoad: 10e-3 }),
      findings: [{ messageId: 'absorbed', severity: 'info', values: { total: I_1K, minLoad: 10e-3 } }],
    },
  ],
});
