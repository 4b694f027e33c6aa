import rule from '../../rules/checks/fet-shifter.ts';
import { ruleTester } from '../support/ruleTester.ts';
import { fetBus } from '../support/paths.ts';

// The bidirectional N-MOSFET shifter of the I2C-bus specification's level-shifting section:
// gate on the low side's rail, a pull-up on each side, the driver sinks both. Bus pins VOL 0.4 V
// at their rated current (the specification's form); 1.8 V rail at −5 %: 1.71 V.

ruleTester(rule, {
  valid: [
    // VGS = 1.71 − 0.4 = 1.31 V ≥ 1.0 V; sink 1.49/4653 + 3.065/4653 = 0.98 mA ≤ 3 mA.
    { name: 'a logic-level FET with 4.7 kΩ on each side', design: fetBus() },
  ],
  invalid: [
    {
      // The case: a 1.5 V threshold against 1.71 V − 0.4 V = 1.31 V.
      name: 'a 1.5 V threshold is not guaranteed to turn on from the 1.8 V gate',
      design: fetBus({ vgsThMax: 1.5 }),
      findings: [
        {
          messageId: 'mayNotTurnOn',
          severity: 'error',
          id: 'fet-shifter:SDA_L:all-on:Q1:U1.SDA',
          values: { vgs: 1.31 },
        },
        {
          messageId: 'mayNotTurnOn',
          severity: 'error',
          id: 'fet-shifter:SDA_L:all-on:Q1:U2.SDA',
          values: { vgate: 1.71, vol: 0.4, vgs: 1.31, vgsTh: 1.5 },
        },
      ],
    },
    {
      // The case in our values: 10 kΩ − 1 % to 1.89 V and 1 kΩ − 1 % to 3.465 V at VOL 0.4 V:
      // 1.49/9900 = 0.151 mA + 3.065/990 = 3.096 mA = 3.246 mA > the sensor's 3 mA.
      name: 'the 1.8 V sensor must sink both pull-ups: 3.25 mA > 3 mA',
      design: fetBus({ lowPull: 10e3, highPull: 1e3 }),
      findings: [
        {
          messageId: 'sinksBoth',
          severity: 'error',
          pins: ['U2.SDA', 'Q1.S', 'Q1.D'],
          values: {
            driver: 'U2.SDA',
            iLow: 1.49 / 9900,
            iHigh: 3.065 / 990,
            total: 1.49 / 9900 + 3.065 / 990,
            rated: 3e-3,
          },
        },
      ],
    },
    {
      name: 'a side without a pull-up',
      design: fetBus({ highPull: null }),
      findings: [{ messageId: 'sideWithoutPull', severity: 'error', values: { side: 'high', net: 'SDA_H' } }],
    },
    {
      // Gate on 3.3 V, high side pulled to 1.8 V: 3.465 V > 1.71 V, the FET never turns off.
      name: "a gate rail above the high side's pull rail",
      design: fetBus({ gate: '3v3', highRail: '1v8' }),
      findings: [
        {
          messageId: 'gateAboveHighSide',
          severity: 'error',
          values: { gate: '3v3', gateMax: 3.465, pullRail: '1v8', pullMin: 1.71 },
        },
      ],
    },
  ],
});
