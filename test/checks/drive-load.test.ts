import rule from '../../rules/checks/drive-load.ts';
import { ruleTester } from '../support/ruleTester.ts';
import {
  design,
  diodeShifter,
  input,
  link,
  net,
  output,
  part,
  rail,
  rail5v0,
  resistor,
  scenario,
} from '../support/build.ts';
import { fetBus } from '../support/paths.ts';

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

/**
 * The 1.8 V two-wire sensor (VOL 0.4 V at its rated 3 mA, the I2C-bus specification's form)
 * reaching a FET shifter through a series resistor RS: U2 → RS → SDA_L (RL 10 kΩ ±1 % to 1.8 V) →
 * Q1 (gate 1.8 V) → SDA_H (RH 1 kΩ ±1 % to 3.3 V) with the controller. When low, the sensor sinks
 * both pull-ups, the far one through the FET and RS.
 */
function sensorBehindResistor(rs: number, highPull = 1000) {
  const d = fetBus({ lowPull: 10e3, highPull, tolerance: 0.01, sensorRated: 3e-3 });
  return {
    ...d,
    discretes: [...(d.discretes ?? []), resistor('RS', rs, { tolerance: 0.01 })],
    nets: [
      net('SDA_X', ['U2.SDA', 'RS.1']),
      net('SDA_L', ['RS.2', 'Q1.S', 'RL.1']),
      net('SDA_H', ['U1.SDA', 'Q1.D', 'RH.1']),
    ],
  };
}

/**
 * The same chain with a Schottky diode (Vf ≤ 0.35 V, leakage ≤ 1 µA: invented) for the FET: with its
 * cathode on SDA_L it passes the low from there, so the sensor sinks RH's current through it (Vf taken
 * as 0, the worst case); turned round (anode on SDA_L) it blocks that current.
 */
function sensorBehindResistorDiode(cathodeOnPath: boolean) {
  const d = sensorBehindResistor(100);
  const [near, far] = cathodeOnPath ? ['Q1.K', 'Q1.A'] : ['Q1.A', 'Q1.K'];
  return {
    ...d,
    discretes: [...(d.discretes ?? []).filter((x) => x.id !== 'Q1'), diodeShifter('Q1', 0.35, 1e-6)],
    nets: [
      net('SDA_X', ['U2.SDA', 'RS.1']),
      net('SDA_L', ['RS.2', near, 'RL.1']),
      net('SDA_H', ['U1.SDA', far, 'RH.1']),
    ],
  };
}

// Worst case for the sensor's low load (the driver at its VOL 0.4 V, the pull rails at their highest,
// 1.89 V and 3.465 V, each pull and RS at its low end): the far side's pull-up current through the FET,
// (3.465 − 0.4)/990, is fed into SDA_L, which RL (9900 Ω to 1.89 V) and RS (99 Ω to the driver's
// 0.4 V) hold at V = (1.89/9900 + 0.4/99 + 3.065/990)/(1/9900 + 1/99) = 0.71822 V; the sensor sinks
// (V − 0.4)/99 = 3.2143 mA (= 0.1184 mA through RL + 3.0960 mA through the FET), beyond its 3 mA.
// Before the far side was counted: (1.89 − 0.4)/(9900 + 99) = 0.1490 mA, a pass.
const SENSOR_NODE = (1.89 / 9900 + 0.4 / 99 + (3.465 - 0.4) / 990) / (1 / 9900 + 1 / 99);
const SENSOR_LOAD = (SENSOR_NODE - 0.4) / 99;

/**
 * The other way round: the sensor straight on the shifter's low side (SDA_L, RL 10 kΩ ±1 % to
 * 1.8 V), and on the high side a series resistor RS before the controller's net SDA_Y, which holds
 * the 1 kΩ ±1 % pull-up to 3.3 V.
 */
function resistorBeyondShifter(rs: number) {
  const d = fetBus({ lowPull: 10e3, highPull: 1000, tolerance: 0.01, sensorRated: 3e-3 });
  return {
    ...d,
    discretes: [...(d.discretes ?? []), resistor('RS', rs, { tolerance: 0.01 })],
    nets: [
      net('SDA_L', ['U2.SDA', 'Q1.S', 'RL.1']),
      net('SDA_H', ['Q1.D', 'RS.1']),
      net('SDA_Y', ['RS.2', 'U1.SDA', 'RH.1']),
    ],
  };
}

// The sensor at VOL 0.4 V holds SDA_H there (RDS(on) taken as 0, the worst case): it sinks
// (1.89 − 0.4)/9900 through RL and (3.465 − 0.4)/(990 + 21.78) through RH and RS (22 Ω at −1 %),
// 0.15051 + 3.02932 = 3.1798 mA, beyond its 3 mA. Before: only RL's 0.15051 mA, a pass.
const BEYOND_LOAD = (1.89 - 0.4) / 9900 + (3.465 - 0.4) / (990 + 21.78);

ruleTester(rule, {
  valid: [
    {
      // The diode turned round blocks the far pull-up: (1.89 − 0.4)/(9900 + 99) = 0.149 mA only.
      name: 'a diode beyond a series resistor with its anode towards the driver adds nothing',
      design: sensorBehindResistorDiode(false),
    },
    {
      // The same chain with a 4.7 kΩ far pull-up: 3.065/4653 = 0.659 mA through the FET, about
      // 0.78 mA in all, well within 3 mA.
      name: "a driver beyond a series resistor within its rating, the shifter's far pull-up counted",
      design: sensorBehindResistor(100, 4700),
    },
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
      // The numbers of the FET case below: SDA_L at 0.71822 V, 3.2143 mA into the sensor.
      name: "a driver beyond a series resistor sinks a diode's anode-side pull-up through its cathode",
      design: sensorBehindResistorDiode(true),
      findings: [
        {
          messageId: 'lowOverload',
          severity: 'error',
          id: 'drive-load:SDA_X:all-on:U2.SDA',
          values: { loadLow: SENSOR_LOAD, ratedLow: 3e-3 },
        },
      ],
    },
    {
      name: "a shifter's far side reaching a pull-up through a series resistor loads the driver",
      design: resistorBeyondShifter(22),
      findings: [
        {
          messageId: 'lowOverload',
          severity: 'error',
          id: 'drive-load:SDA_L:all-on:U2.SDA',
          pins: ['U2.SDA'],
          values: { driver: 'U2.SDA', loadHigh: null, loadLow: BEYOND_LOAD, ratedLow: 3e-3 },
        },
      ],
    },
    {
      name: "a driver beyond a series resistor sinks the shifter's far pull-up too",
      design: sensorBehindResistor(100),
      findings: [
        {
          messageId: 'lowOverload',
          severity: 'error',
          id: 'drive-load:SDA_X:all-on:U2.SDA',
          pins: ['U2.SDA'],
          values: { driver: 'U2.SDA', loadHigh: null, loadLow: SENSOR_LOAD, ratedLow: 3e-3 },
        },
      ],
    },
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
