import rule from '../../rules/checks/drive-load.ts';
import { ruleTester } from '../support/ruleTester.ts';
import { design, input, link, net, output, part, rail, rail5v0, scenario } from '../support/build.ts';

// Rail ends: 5 V ± 5 % = 4.75–5.25 V; 3.3 V ± 5 % = 3.135–3.465 V.
// 74HC rows (JESD7 as restated): voh/vol largest test current 4 mA, VOL 0.33 V there; iih = iil = 1 µA.
const HC_RATED = 4e-3;
const HC_VOL = 0.33;
const HC_I_IN = 1e-6;
// 74AC (from memory): largest test current 24 mA, VOL 0.44 V there; iih = iil = 1 µA.
const AC_VOL = 0.44;
// I2C-bus specification: VOL 0.4 V at IOL 3 mA (std currents, restated level); ±10 µA input current.
const I2C_IOL = 3e-3;
const I2C_VOL = 0.4;
const I2C_I_IN = 10e-6;

/** One driver `D.Y` on `5v0` and `n` receivers `R1.A`…`Rn.A` on a second 5 V rail `aux`. */
function fanOut(
  driverProfile: string,
  receiverProfile: string,
  n: number,
  scenarios = [] as ReturnType<typeof scenario>[],
) {
  const receivers = Array.from({ length: n }, (_, k) => part(`R${k + 1}`, 'aux', receiverProfile, [input('A')]));
  return design({
    rails: [rail5v0, rail('aux', 5, { tolerance: 0.05 })],
    parts: [part('D', '5v0', driverProfile, [output('Y')]), ...receivers],
    nets: [net('N', ['D.Y', ...receivers.map((r) => `${r.id}.A`)])],
    scenarios,
  });
}

ruleTester(rule, {
  valid: [
    {
      name: '74HC driving one 74HC input',
      design: link({ rail: '5v0', profile: '74hc' }, { rail: '5v0', profile: '74hc' }),
    },
    {
      // Handbook fan-out of standard TTL is 10: 10 × 1.6 mA = 16 mA and 10 × 40 µA = 0.4 mA, both
      // exactly the largest test currents (the 1e-9 comparison of rules-catalogue.md).
      name: 'exactly at the rated current passes',
      design: fanOut('ttl', 'ttl', 10),
    },
    {
      // A load exactly at ioMax: a 74AC output (24 mA rows, from memory) given ioMax equal to its
      // 5.25 V / 1 kΩ + 1 µA high load from a pull-down.
      name: 'exactly at ioMax passes',
      design: link(
        { rail: '5v0', profile: '74ac', part: { params: { ioMax: 5.25 / 1000 + HC_I_IN } } },
        { rail: '5v0', profile: '74ac' },
        { net: { pull: { to: 'ground', ohms: 1000 } } },
      ),
    },
    {
      // A pull-down would load a high output with 5.25 V / 100 Ω, but an open-drain output never
      // drives high, so its voh and ioMax are not judged on the high side.
      name: 'an open-drain driver has no high side to overload',
      design: link(
        { rail: '5v0', profile: '74hc', pin: { drive: 'open-drain' }, part: { params: { ioMax: 1e-3 } } },
        { rail: '5v0', profile: '74hc' },
        { net: { pull: { to: 'ground', ohms: 100 } } },
      ),
    },
    {
      name: 'a driver without voh, vol or ioMax is not judged',
      design: link(
        { rail: '5v0', profile: 'off-board' },
        { rail: '5v0', profile: '74hc' },
        { net: { pull: { to: 'ground', ohms: 10 } } },
      ),
    },
  ],
  invalid: [
    {
      // Low load = (Vpull,max − VOL) / R + iil of the receiver (rules-catalogue.md, load currents).
      name: 'a strong pull-up overloads the low side',
      design: link(
        { rail: '5v0', profile: '74hc' },
        { rail: '5v0', profile: '74hc' },
        { net: { pull: { to: '5v0', ohms: 1000 } } },
      ),
      findings: [
        {
          messageId: 'lowOverload',
          severity: 'error',
          id: 'drive-load:N:all-on:D.Y',
          pins: ['D.Y'],
          values: {
            driver: 'D.Y',
            loadHigh: HC_I_IN,
            loadLow: (5.25 - HC_VOL) / 1000 + HC_I_IN,
            ratedHigh: HC_RATED,
            ratedLow: HC_RATED,
            ioMax: null,
          },
        },
      ],
    },
    {
      // High load = (Vdriver,max − 0 V) / R + iih of the receiver.
      name: 'a strong pull-down overloads the high side',
      design: link(
        { rail: '5v0', profile: '74hc' },
        { rail: '5v0', profile: '74hc' },
        { net: { pull: { to: 'ground', ohms: 1000 } } },
      ),
      findings: [
        {
          messageId: 'highOverload',
          severity: 'error',
          values: { loadHigh: 5.25 / 1000 + HC_I_IN, loadLow: HC_I_IN, ratedHigh: HC_RATED, ratedLow: HC_RATED },
        },
      ],
    },
    {
      // The net's pull-up to the driver's own rail feeds (5.25 V − VOL)/R into a low output and draws
      // nothing from a high one; the receiver's internal pull-down (a pull inside a pin) draws
      // 5.25 V / R from a high output.
      name: 'both sides overloaded: a pull-up on the net and a pull-down inside a pin',
      design: design({
        rails: [rail5v0],
        parts: [
          part('D', '5v0', '74hc', [output('Y')]),
          part('R', '5v0', '74hc', [input('A', { pull: { to: 'ground', ohms: 1000 } })]),
        ],
        nets: [net('N', ['D.Y', 'R.A'], { pull: { to: '5v0', ohms: 1000 } })],
      }),
      findings: [
        {
          messageId: 'bothOverload',
          severity: 'error',
          values: {
            loadHigh: 5.25 / 1000 + HC_I_IN,
            loadLow: (5.25 - HC_VOL) / 1000 + HC_I_IN,
          },
        },
      ],
    },
    {
      // Within the 24 mA rows (from memory) but beyond a part's own 2 mA ioMax (invented).
      name: 'beyond ioMax though within the test currents',
      design: link(
        { rail: '5v0', profile: '74ac', part: { params: { ioMax: 2e-3 } } },
        { rail: '5v0', profile: '74ac' },
        { net: { pull: { to: '5v0', ohms: 1000 } } },
      ),
      findings: [
        {
          messageId: 'lowOverload',
          severity: 'error',
          values: { loadLow: (5.25 - AC_VOL) / 1000 + HC_I_IN, ratedLow: 24e-3, ioMax: 2e-3 },
        },
      ],
    },
    {
      // I2C-bus specification: Rp(min) = (VDD − VOL) / IOL. At 3.465 V that is 3.065 V / 3 mA =
      // 1021.7 Ω, so 1 kΩ is too strong at the top of the rail (at 3.3 V nominal, 966.7 Ω, it passes).
      name: 'open-drain bus pin with too strong a pull-up: only its low side is judged',
      design: link(
        { rail: '3v3', profile: 'i2c', pin: { drive: 'open-drain' } },
        { rail: '3v3', profile: 'i2c' },
        { net: { pull: { to: '3v3', ohms: 1000 } } },
      ),
      findings: [
        {
          messageId: 'lowOverload',
          severity: 'error',
          values: { loadHigh: null, ratedHigh: null, loadLow: (3.465 - I2C_VOL) / 1000 + I2C_I_IN, ratedLow: I2C_IOL },
        },
      ],
    },
    {
      // The pull-down at exactly ioMax above, given ± 10 %: its smallest end, 900 Ω, draws
      // 5.25 V / 900 Ω + 1 µA, beyond the ioMax set for 1 kΩ.
      name: "a pull's tolerance: its smallest end sets the load",
      design: link(
        { rail: '5v0', profile: '74ac', part: { params: { ioMax: 5.25 / 1000 + HC_I_IN } } },
        { rail: '5v0', profile: '74ac' },
        { net: { pull: { to: 'ground', ohms: 1000, tolerance: 0.1 } } },
      ),
      findings: [
        {
          messageId: 'highOverload',
          severity: 'error',
          values: { loadHigh: 5.25 / 900 + HC_I_IN, ioMax: 5.25 / 1000 + HC_I_IN },
        },
      ],
    },
    {
      // Handbook: 11 standard TTL loads, 17.6 mA > 16 mA and 0.44 mA > 0.4 mA. With the driver's rail
      // off it is no driver; with the receivers' rail off they still load it (rules-catalogue.md).
      name: 'a driver on an off rail is not judged; unpowered receivers still load',
      design: fanOut('ttl', 'ttl', 11, [scenario('drv-off', ['5v0']), scenario('rx-off', ['aux'])]),
      findings: [
        {
          messageId: 'bothOverload',
          severity: 'error',
          scenario: 'all-on',
          values: { loadLow: 11 * 1.6e-3, loadHigh: 11 * 40e-6 },
        },
        { messageId: 'bothOverload', severity: 'error', scenario: 'rx-off', id: 'drive-load:N:rx-off:D.Y' },
      ],
    },
    {
      name: 'a waived overload stays, marked with its note',
      design: link(
        { rail: '5v0', profile: '74hc' },
        { rail: '5v0', profile: '74hc' },
        {
          net: {
            pull: { to: 'ground', ohms: 1000 },
            waivers: [{ rule: 'drive-load', note: 'pull-down fitted only for test' }],
          },
        },
      ),
      findings: [{ messageId: 'highOverload', severity: 'error', waived: 'pull-down fitted only for test' }],
    },
  ],
});
