import { expect } from 'vitest';
import rule from '../../rules/checks/edge-rate.ts';
import { ruleTester } from '../support/ruleTester.ts';
import { divider } from '../support/paths.ts';
import { bidir, design, input, link, net, output, part, rail, rail5v0, scenario } from '../support/build.ts';

// Single-pole RC edge (common practice; the I2C-bus specification's 0.8473 for 30–70 %):
// 10–90 % = ln 9 · RC, 30–70 % = ln(7/3) · RC.
const LN9 = Math.log(9);
const LN73 = Math.log(7 / 3);
// Output resistance |Δv| / Δi over the two largest voh rows:
// 74HC (JESD7 as restated): VDD−0.1 @ 20 µA, VDD−0.66 @ 4 mA.
const HC_ROUT = (0.66 - 0.1) / (4e-3 - 20e-6);
// Pin capacitances: 74HC 10 pF (JESD7 restated), I2C-bus pin 10 pF (specification, restated).
const CIN = 10e-12;
// From memory: a 74HC input accepts edges up to 500 ns long at 4.5 V, i.e. 500 ns / 4.5 V.
const HC_MAX_RAMP = 500e-9 / 4.5;

/**
 * The tester compares numbers within 1e-9 absolute, which says nothing about seconds or s/V;
 * these are compared to about ten significant digits instead.
 */
const near = (x: number) => expect.closeTo(x, 10 - Math.floor(Math.log10(Math.abs(x))));

const hc = { rail: '5v0', profile: '74hc' };
const i2cDriver = { rail: '3v3', profile: 'i2c', pin: { drive: 'open-drain' as const } };

ruleTester(rule, {
  valid: [
    {
      // C = 10 + 10 + 5 pF (default wiring); t = ln 9 × 140.7 Ω × 25 pF ≈ 7.7 ns.
      name: '74HC into 74HC well within maxRiseTime',
      design: link(hc, hc, { net: { maxRiseTime: 100e-9 } }),
    },
    {
      name: 'the rise time exactly at maxRiseTime passes',
      design: link(
        i2cDriver,
        { rail: '3v3', profile: 'i2c' },
        {
          net: {
            pull: { to: '3v3', ohms: 4700 },
            wiringCapacitance: 100e-12,
            maxRiseTime: LN73 * 4700 * (100e-12 + 2 * CIN),
          },
        },
      ),
    },
    {
      // JESD8C LVCMOS has one voh row: no output resistance, no rise time.
      name: 'a driver with a single voh point gives no rise time',
      design: link(
        { rail: '3v3', profile: 'lvcmos33' },
        { rail: '3v3', profile: 'lvcmos33' },
        { net: { maxRiseTime: 1e-12 } },
      ),
    },
    {
      // The i2c profile has no voh (the bus is open-drain): a push-pull pin of it gets no 10–90 % time.
      name: 'a push-pull bus pin has no voh and no rise time',
      design: link({ rail: '3v3', profile: 'i2c' }, { rail: '3v3', profile: 'i2c' }, { net: { maxRiseTime: 1e-12 } }),
    },
    {
      name: 'a Schmitt input has no ramp limit',
      design: link(
        i2cDriver,
        {
          rail: '3v3',
          profile: 'mcu-gpio',
          pin: { params: { maxInputRamp: 1e-9, schmitt: { vtPlus: '0.7*VDD', vtMinus: '0.3*VDD' } } },
        },
        { net: { pull: { to: '3v3', ohms: 10e3 }, wiringCapacitance: 400e-12 } },
      ),
    },
    {
      // Ramp = ln 9 × Rout × C / (0.8 × 4.75 V), C = 1 nF + 2 × 10 pF: the limit set to that value.
      name: 'a ramp exactly at maxInputRamp passes',
      design: link(
        hc,
        { ...hc, pin: { params: { maxInputRamp: (LN9 * HC_ROUT * (1e-9 + 2 * CIN)) / (0.8 * 4.75) } } },
        {
          net: { wiringCapacitance: 1e-9 },
        },
      ),
    },
    {
      name: 'with neither limit set nothing is judged',
      design: link(
        i2cDriver,
        { rail: '3v3', profile: 'i2c' },
        {
          net: { pull: { to: '3v3', ohms: 100e3 }, wiringCapacitance: 1e-9 },
        },
      ),
    },
  ],
  invalid: [
    {
      // The divider edge: ln 9 · (R1‖R2) · C, each resistor at its +1 % end:
      // 2.222 k‖3.333 k = 1.3332 kΩ, 10 pF: 29.3 ns (29 ns at the nominal 1.32 kΩ).
      name: 'the edge through a 2.2 kΩ / 3.3 kΩ divider against a 20 ns limit',
      design: divider({ maxRiseTime: 20e-9 }),
      findings: [
        {
          messageId: 'pathRiseSlow',
          severity: 'warning',
          id: 'edge-rate:RX33:all-on',
          values: {
            resistance: (2222 * 3333) / 5555,
            capacitance: 10e-12,
            riseTime: Math.log(9) * ((2222 * 3333) / 5555) * 10e-12,
            span: '10-90',
            driver: 'U1.Y',
          },
        },
      ],
    },
    {
      // I2C-bus specification, standard-mode: tr ≤ 1000 ns at Cb = 400 pF gives Rp(max) = 2950.6 Ω;
      // The pull exactly at the limit above, given ± 1 %: its largest end, 4747 Ω, is too slow.
      name: "a pull's tolerance: its largest end sets the rise time",
      design: link(
        i2cDriver,
        { rail: '3v3', profile: 'i2c' },
        {
          net: {
            pull: { to: '3v3', ohms: 4700, tolerance: 0.01 },
            wiringCapacitance: 100e-12,
            maxRiseTime: LN73 * 4700 * (100e-12 + 2 * CIN),
          },
        },
      ),
      findings: [
        {
          messageId: 'pulledRiseSlow',
          severity: 'warning',
          values: { resistance: near(4747), riseTime: near(LN73 * 4747 * (100e-12 + 2 * CIN)) },
        },
      ],
    },
    {
      // 3 kΩ is just too slow. C = 380 pF wiring + two 10 pF pins.
      name: 'a pulled bus too slow for its maxRiseTime (30-70)',
      design: link(
        i2cDriver,
        { rail: '3v3', profile: 'i2c' },
        {
          net: { pull: { to: '3v3', ohms: 3000 }, wiringCapacitance: 380e-12, maxRiseTime: 1e-6 },
        },
      ),
      findings: [
        {
          messageId: 'pulledRiseSlow',
          severity: 'warning',
          id: 'edge-rate:N:all-on',
          pins: ['D.Y'],
          values: {
            riseTime: near(LN73 * 3000 * 400e-12),
            span: '30-70',
            capacitance: near(400e-12),
            resistance: 3000,
            limit: 1e-6,
            driver: null,
          },
        },
      ],
    },
    {
      // Thévenin resistance of the net's 4.7 kΩ and the receiver's internal 10 kΩ (a pull inside a
      // pin): R = 1/(1/4.7k + 1/10k). Fast-mode limit 300 ns (I2C-bus specification).
      name: 'several pulls on one net: their Thévenin resistance',
      design: link(
        i2cDriver,
        { rail: '3v3', profile: 'i2c', pin: { pull: { to: '3v3', ohms: 10e3 } } },
        {
          net: { pull: { to: '3v3', ohms: 4700 }, wiringCapacitance: 380e-12, maxRiseTime: 300e-9 },
        },
      ),
      findings: [
        {
          messageId: 'pulledRiseSlow',
          severity: 'warning',
          values: { resistance: 1 / (1 / 4700 + 1 / 10e3), riseTime: near((LN73 * 400e-12) / (1 / 4700 + 1 / 10e3)) },
        },
      ],
    },
    {
      // t = ln 9 × Rout × C, C = 1 nF wiring + 2 × 10 pF.
      name: 'an actively driven net too slow for its maxRiseTime (10-90)',
      design: link(hc, hc, { net: { wiringCapacitance: 1e-9, maxRiseTime: 100e-9 } }),
      findings: [
        {
          messageId: 'drivenRiseSlow',
          severity: 'warning',
          id: 'edge-rate:N:all-on',
          pins: ['D.Y'],
          values: {
            riseTime: near(LN9 * HC_ROUT * 1.02e-9),
            span: '10-90',
            capacitance: near(1.02e-9),
            resistance: near(HC_ROUT),
            limit: 100e-9,
            driver: 'D.Y',
          },
        },
      ],
    },
    {
      // 74HC (140.7 Ω) and 74AC (26.7 Ω) three-state outputs into 1 nF + 2 × 10 pF (JESD7) + 10 pF
      // (74AC, from memory). The 74HC is judged; with its rail off only the 74AC counts, and it is
      // fast enough.
      name: 'the slowest powered driver is judged; one on an off rail does not count',
      design: design({
        rails: [rail5v0, rail('aux', 5, { tolerance: 0.05 })],
        parts: [
          part('S', 'aux', '74hc', [output('Y', { drive: 'three-state' })]),
          part('F', '5v0', '74ac', [output('Y', { drive: 'three-state' })]),
          part('R', '5v0', '74hc', [input('A')]),
        ],
        nets: [net('N', ['F.Y', 'S.Y', 'R.A'], { wiringCapacitance: 1e-9, maxRiseTime: 100e-9 })],
        scenarios: [scenario('slow-off', ['aux'])],
      }),
      findings: [
        {
          messageId: 'drivenRiseSlow',
          severity: 'warning',
          scenario: 'all-on',
          pins: ['S.Y'],
          values: { driver: 'S.Y', resistance: near(HC_ROUT), riseTime: near(LN9 * HC_ROUT * 1.03e-9) },
        },
      ],
    },
    {
      // JESD8-11 rows: VDD−0.2 @ 100 µA (from memory) and 0.75·VDD @ 2 mA (restated):
      // |Δv| = |0.25·VDD − 0.2|, larger at 1.575 V (0.194 V) than at 1.425 V (0.156 V).
      name: 'the output resistance is taken at the rail end giving the larger value',
      design: link(
        { rail: '1v5', profile: 'lvcmos15' },
        { rail: '1v5', profile: 'lvcmos15' },
        {
          rails: [rail('1v5', 1.5, { tolerance: 0.05 })],
          net: { wiringCapacitance: 1e-9, maxRiseTime: 1e-9 },
        },
      ),
      findings: [
        {
          messageId: 'drivenRiseSlow',
          severity: 'warning',
          values: { resistance: near((0.25 * 1.575 - 0.2) / (2e-3 - 100e-6)) },
        },
      ],
    },
    {
      // No maxRiseTime: the ramp is still judged. Ramp = ln 9 × Rout × C / (0.8 × Vswing), Vswing the
      // driver rail's minimum, 4.75 V; C = 2 nF + 2 × 10 pF.
      name: 'a slow ramp into a CMOS input, without a maxRiseTime',
      design: link(hc, { ...hc, pin: { params: { maxInputRamp: HC_MAX_RAMP } } }, { net: { wiringCapacitance: 2e-9 } }),
      findings: [
        {
          messageId: 'rampSlow',
          severity: 'warning',
          id: 'edge-rate:N:all-on:R.A',
          pins: ['R.A', 'D.Y'],
          values: {
            ramp: near((LN9 * HC_ROUT * 2.02e-9) / (0.8 * 4.75)),
            maxInputRamp: HC_MAX_RAMP,
            pin: 'R.A',
            driver: 'D.Y',
            swing: 4.75,
          },
        },
      ],
    },
    {
      // A pulled net: R and Vswing are the pulls' Thévenin values, 4.7 kΩ to 3.3 V and 47 kΩ to
      // ground; the lowest Vpull is 3.135 V × 47k / 51.7k. C = 200 pF + one 10 pF bus pin + the
      // GPIO's 5 pF (from memory). The 10 ns/V limit is from memory (a 3.3 V CMOS input's usual figure).
      name: 'a slow ramp on a pulled net uses the Thévenin resistance and voltage',
      design: link(
        i2cDriver,
        { rail: '3v3', profile: 'mcu-gpio', pin: { params: { maxInputRamp: 10e-9 } } },
        {
          net: { pull: { to: '3v3', ohms: 4700 }, wiringCapacitance: 200e-12 },
          extraParts: [part('P', '3v3', 'off-board', [input('X', { pull: { to: 'ground', ohms: 47e3 } })])],
          extraPins: ['P.X'],
        },
      ),
      findings: [
        {
          messageId: 'rampSlow',
          severity: 'warning',
          pins: ['R.A'],
          values: {
            driver: null,
            swing: near((3.135 * 47e3) / 51.7e3),
            ramp: near((LN9 * (1 / (1 / 4700 + 1 / 47e3)) * 215e-12) / (0.8 * ((3.135 * 47e3) / 51.7e3))),
          },
        },
      ],
    },
    {
      // Two bidir three-state pins: each is judged against the other as the source of its edge.
      // A.IO (74HC) sees the 74AC edge, 15.6 ns/V; B.IO sees the 74HC edge, 82 ns/V. C = 1 nF + 10 pF
      // (74HC, JESD7) + 10 pF (74AC, from memory).
      name: 'a bidir receiver is not the source of its own edge',
      design: design({
        rails: [rail5v0],
        parts: [
          part('A', '5v0', '74hc', [bidir('IO', { params: { maxInputRamp: 50e-9 } })]),
          part('B', '5v0', '74ac', [bidir('IO', { params: { maxInputRamp: 50e-9 } })]),
        ],
        nets: [net('N', ['A.IO', 'B.IO'], { wiringCapacitance: 1e-9 })],
      }),
      findings: [
        {
          messageId: 'rampSlow',
          severity: 'warning',
          id: 'edge-rate:N:all-on:B.IO',
          values: { driver: 'A.IO', ramp: near((LN9 * HC_ROUT * 1.02e-9) / (0.8 * 4.75)) },
        },
      ],
    },
    {
      name: 'a receiver on an off rail is not checked',
      design: link(
        hc,
        { rail: 'aux', profile: '74hc', pin: { params: { maxInputRamp: HC_MAX_RAMP } } },
        {
          rails: [rail5v0, rail('aux', 5, { tolerance: 0.05 })],
          net: { wiringCapacitance: 2e-9 },
          scenarios: [scenario('rx-off', ['aux'])],
        },
      ),
      findings: [{ messageId: 'rampSlow', severity: 'warning', scenario: 'all-on' }],
    },
    {
      name: 'a waived edge finding stays, marked with its note',
      design: link(hc, hc, {
        net: {
          wiringCapacitance: 1e-9,
          maxRiseTime: 100e-9,
          waivers: [{ rule: 'edge-rate', note: 'slow strobe, sampled late' }],
        },
      }),
      findings: [{ messageId: 'drivenRiseSlow', severity: 'warning', waived: 'slow strobe, sampled late' }],
    },
  ],
});
