import rule from '../../rules/checks/rail-range.ts';
import { ruleTester } from '../support/ruleTester.ts';
import { design, input, output, part, rail, scenario } from '../support/build.ts';

ruleTester(rule, {
  valid: [
    // builtin 74HC vddRange 2–6 V (JESD7 as restated: the family's whole range, test points at 2, 4.5 and 6 V).
    { name: '74HC on 5 V ± 5 %', design: design({ parts: [part('U', '5v0', '74hc', [input('A')])] }) },
    { name: '74HC on 3.3 V ± 5 %, inside 2–6 V', design: design({ parts: [part('U', '3v3', '74hc', [input('A')])] }) },
    {
      // JESD7 as restated: 74HCT 4.5–5.5 V, exactly the ends of 5 V ± 10 %.
      name: "a rail exactly on the profile's ends",
      design: design({ rails: [rail('5v0', 5, { tolerance: 0.1 })], parts: [part('U', '5v0', '74hct', [input('A')])] }),
    },
    { name: 'a profile without vddRange', design: design({ parts: [part('U', '3v3', 'mcu-gpio', [input('A')])] }) },
  ],
  invalid: [
    {
      // JESD7 as restated: 74HCT 4.5–5.5 V.
      name: '74HCT on a 3.3 V rail',
      design: design({ parts: [part('U', '3v3', '74hct', [input('A')])] }),
      findings: [
        {
          messageId: 'outside',
          severity: 'warning',
          id: 'rail-range:3v3:all-on:74hct',
          net: null,
          pins: ['U.A'],
          values: { rail: '3v3', railMin: 3.135, railMax: 3.465, profileMin: 4.5, profileMax: 5.5 },
        },
      ],
    },
    {
      name: 'one finding per rail and profile, listing every pin, once whatever the scenarios',
      design: design({
        scenarios: [scenario('sleep', ['3v3'])],
        parts: [part('U1', '3v3', '74hct', [input('A'), output('Y')]), part('U2', '3v3', '74hct', [input('A')])],
      }),
      findings: [{ messageId: 'outside', severity: 'warning', scenario: 'all-on', pins: ['U1.A', 'U1.Y', 'U2.A'] }],
    },
    {
      name: 'the narrowest range of the pins wins',
      design: design({
        rails: [rail('5v0', 5, { tolerance: 0.08 })],
        parts: [part('U', '5v0', '74hct', [input('A'), input('B', { params: { vddRange: [4.75, 5.25] } })])],
      }),
      findings: [
        {
          messageId: 'outside',
          severity: 'warning',
          values: { profileMin: 4.75, profileMax: 5.25, railMin: 4.6, railMax: 5.4 },
        },
      ],
    },
    {
      name: 'a pin on another rail than its part is judged on its own rail',
      design: design({ parts: [part('U', '5v0', '74hc', [input('A'), input('B', { rail: '1v8' })])] }),
      findings: [{ messageId: 'outside', severity: 'warning', id: 'rail-range:1v8:all-on:74hc', pins: ['U.B'] }],
    },
  ],
});
