/**
 * The example design holds exactly its planted faults, one or more for each rule that can fail,
 * each with the numbers and the corner it was judged at, and nothing else at error or warning
 * level. Part values are the example's own (invented); the family values below are transcribed
 * with their source beside them.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { readDesign } from '../../rules/model/reader.ts';
import { check } from '../../rules/check/check.ts';
import { valuesOf } from '../../rules/engine/findings.ts';

const text = readFileSync(new URL('../../rules/examples/greenhouse.json', import.meta.url), 'utf8');

type Expected = number | string | boolean | null | readonly string[];
interface Planted {
  readonly id: string;
  readonly values: Readonly<Record<string, Expected>>;
}

// Rails of the example, nominal × (1 ± 5 %).
const V33 = { min: 3.3 * 0.95, max: 3.3 * 1.05 };
const V50 = { min: 5 * 0.95, max: 5 * 1.05 };
const V18 = { min: 1.8 * 0.95 };

// Standard TTL input currents: handbook table, 1.6 mA out of a low input, 40 µA into a high one.
const TTL_IIL = 1.6e-3;
const TTL_IIH = 40e-6;
// 74HC output rows: JESD7 as restated, largest test current 4 mA for both VOH and VOL.
const HC_IO_TEST = 4e-3;
// 74HC VIH line 0.675·VDD + 0.15 (JESD7 as restated).
const hcVih = (vdd: number) => 0.675 * vdd + 0.15;
// Microcontroller inputs: VIH 0.7·VDD, VIL 0.3·VDD (common practice, the mcu-gpio starting point).
const MCU_VIH = 0.7;
// A CMOS pin's clamp diode to VDD conducts about 0.5 V above it (common practice): powered, the
// limit is VDD + 0.5; unpowered (VDD = 0), 0.5 V.
const CLAMP = 0.5;
// 30–70 % of an RC edge: ln(7/3)·RC, the I2C-bus specification's rise-time figure (0.8473 RC).
const RISE_30_70 = Math.log(7 / 3);
const MIN_MARGIN = 0.2; // the example's settings.minMargin
const U1_I = 1e-6; // the controller's iih and iil, the example's own datasheet value
const U1_CIN = 5e-12; // the controller's cin, the example's own
const FLOW_RMIN = (V33.max - 0.4) / (1e-3 - U1_I);
const FLOW_RMAX = 10e-6 / (RISE_30_70 * (1.5e-9 + U1_CIN));

const plantedErrors: Planted[] = [
  // The 3.3 V bus pull-ups reach the 1.8 V sensor's pins: 3.465 V against VDD + 0.5 at 1.71 V.
  { id: 'overvoltage:SDA:all-on:U2.SDA', values: { vNet: V33.max, viMax: V18.min + CLAMP } },
  { id: 'overvoltage:SCL:all-on:U2.SCL', values: { vNet: V33.max, viMax: V18.min + CLAMP } },
  // A 3.3 V output into an HC input on the 5 V valve board; the controller's VOH row VDD − 0.2
  // at 100 µA is the example's own value.
  {
    id: 'level-high:VALVE_EN:all-on:U1.VALVE_EN>U3.EN',
    values: { voh: V33.min - 0.2, vih: hcVih(V50.max), driverVdd: V33.min, receiverVdd: V50.max },
  },
  // The 5 V display's push-pull output into the controller's 3.3 V input.
  { id: 'overvoltage:DISP_RX:all-on:U1.DISP_RX', values: { vNet: V50.max, viMax: V33.min + CLAMP } },
  // The valve board's HC status output drives three standard TTL inputs on the lamp board:
  // 3 × 1.6 mA sunk when low, past the 4 mA row. High: 3 × 40 µA, well inside.
  {
    id: 'drive-load:STATUS:all-on:U3.STATUS',
    values: {
      driver: 'U3.STATUS',
      loadLow: 3 * TTL_IIL,
      ratedLow: HC_IO_TEST,
      loadHigh: 3 * TTL_IIH,
      ratedHigh: HC_IO_TEST,
      ioMax: null,
    },
  },
  // The controller and the manual override panel both drive the pump-enable line push-pull.
  {
    id: 'contention:PUMP_EN:all-on',
    values: { drivers: ['U1.PUMP_EN', 'U7.PUMP_ON'], kinds: ['push-pull', 'push-pull'] },
  },
  // The two boards' sleep inputs are joined, but no output was ever put on the line.
  { id: 'floating-input:SLEEP:all-on', values: { pins: ['U3.SLEEP', 'U4.SLEEP'] } },
  // At reset the controller's VALVE_EN pin is an input until firmware runs: nothing drives the
  // valve driver's enable and nothing pulls it, so it floats exactly while the board boots.
  { id: 'floating-input:VALVE_EN:reset', values: { pins: ['U1.VALVE_EN', 'U3.EN'] } },
  // The tank float switch only pulls low and nothing pulls the line up.
  { id: 'missing-pull:TANK_LOW:all-on', values: { drivers: ['J3.SW'] } },
  // The flow meter's line has only the controller's internal 40 kΩ pull-up, far above what its
  // 10 µs rise limit allows over 15 m of cable: Rmax = 10 µs / (ln(7/3) × 1.505 nF). Rmin =
  // (VDD,max − VOL) / (IOL − the controller's iil), the meter's own 0.4 V @ 1 mA row. The advice
  // for a pull of the net's own beside the 40 kΩ: from 1/(1/Rmin − 1/40 k) = 3322.9 Ω to
  // 1/(1/(0.7 × Rmax) − 1/40 k) = 6363.0 Ω, shrunk by 5 % to [3497.8, 6060.0] Ω: √ = 4604 Ω,
  // E12 4.7 kΩ (IEC 60063); largest E24 inside 5.6 kΩ.
  {
    id: 'pull-range:FLOW:all-on',
    values: {
      ohms: 40e3,
      rMin: FLOW_RMIN,
      rMax: FLOW_RMAX,
      rMaxBy: 'rise-time',
      empty: false,
      adviceMin: 1 / (1 / FLOW_RMIN - 1 / 40e3) / 0.95,
      adviceMax: 1 / (1 / (0.7 * FLOW_RMAX) - 1 / 40e3) / 1.05,
      suggested: 4.7e3,
      lowestPower: 5.6e3,
    },
  },
  // Planted in version 2: SCL2's 3.3 V-side pull-up through the FET shifter Q2 is 1 kΩ (−1 %),
  // and the 1.8 V leaf sensor must sink it with its own 4.7 kΩ (−1 %): the I2C-bus
  // specification's sink current per side at VOL = 0.2·VDD (i2c-lv, the specification
  // restated), 1.71 V rail: (1.71 − 0.342)/4653 + (3.465 − 0.342)/990 = 3.45 mA > 3 mA.
  {
    id: 'fet-shifter:SCL2_L:all-on:Q2:U20.SCL:sink',
    values: {
      driver: 'U20.SCL',
      iLow: (V18.min - 0.2 * V18.min) / 4653,
      iHigh: (V33.max - 0.2 * V18.min) / 990,
      rated: 3e-3,
    },
  },
  // The same sensor's low load as drive-load bounds it (catalogue: bounds at the rails' ends):
  // its own pull-up at 1.89 V less VOL 0.378 V, the far pull-up at 3.465 V less the lowest VOL
  // 0.342 V, and the controller's 1 µA input current (the example's own).
  {
    id: 'drive-load:SCL2_L:all-on:U20.SCL',
    values: {
      driver: 'U20.SCL',
      loadLow: (1.8 * 1.05 - 0.2 * 1.8 * 1.05) / 4653 + (V33.max - 0.2 * V18.min) / 990 + U1_I,
      ratedLow: 3e-3,
    },
  },
  // Standby: the 1.8 V rail is off, the 3.3 V pull-ups stay: 3.465 V on an unpowered pin whose
  // clamp diode conducts above 0.5 V (common practice).
  { id: 'back-power:SDA:standby:U2.SDA', values: { vNet: V33.max, viMax: CLAMP, limit: 'clamp', source: 'net' } },
  { id: 'back-power:SCL:standby:U2.SCL', values: { vNet: V33.max, viMax: CLAMP, limit: 'clamp', source: 'net' } },
];

const plantedWarnings: Planted[] = [
  // The planted SCL2 pull-up also costs the low margin at the sensor: the controller's 0.4 V row
  // (the example's own, at 8 mA) plus the far side's current through RDS(on) 5 Ω, against
  // VIL = 0.3 × 1.71 V (I2C-bus specification, restated): 0.4 + 5 × (1.31/4653 + 10 µA).
  {
    id: 'level-low:SCL2_L:all-on:U1.SCL2>U20.SCL',
    values: {
      vol: 0.4 + 5 * ((V18.min - 0.4) / 4653 + 10e-6),
      vil: 0.3 * V18.min,
      driverVdd: V33.min,
      receiverVdd: V18.min,
    },
  },
  // 15 m of cable to the flow meter (1.5 nF, the example's own) on the controller's internal
  // 40 kΩ pull-up: ln(7/3) × 40 kΩ × 1.505 nF ≈ 51 µs, against the 10 µs the pulse counter needs.
  {
    id: 'edge-rate:FLOW:all-on',
    values: {
      riseTime: RISE_30_70 * 40e3 * (1.5e-9 + U1_CIN),
      span: '30-70',
      capacitance: 1.5e-9 + U1_CIN,
      resistance: 40e3,
      limit: 10e-6,
    },
  },
];

/**
 * Accepted extras: every rule runs again in each power state (rules-catalogue.md, "Power
 * states"), and standby switches off only the 1.8 V sensor rail, which none of these nets
 * touches, so each of these all-on faults is found again in standby with the same numbers.
 */
const errorsAgainInStandby: readonly string[] = [
  'level-high:VALVE_EN:all-on:U1.VALVE_EN>U3.EN',
  'overvoltage:DISP_RX:all-on:U1.DISP_RX',
  'drive-load:STATUS:all-on:U3.STATUS',
  'contention:PUMP_EN:all-on',
  'floating-input:SLEEP:all-on',
  'missing-pull:TANK_LOW:all-on',
  'pull-range:FLOW:all-on',
];
const warningsAgainInStandby: readonly string[] = ['edge-rate:FLOW:all-on'];
const inStandby = (id: string) => id.replace(':all-on', ':standby');

/**
 * Reset (every rail on, the controller's VALVE_EN and PUMP_EN pins inputs until firmware runs):
 * every all-on fault is found again with the same numbers, except the two those pins caused as
 * outputs: no level-high on VALVE_EN (nothing drives it) and no contention on PUMP_EN (only the
 * override panel drives it, against the controller's 40 kΩ pull-down).
 */
const notAtReset = new Set(['level-high:VALVE_EN:all-on:U1.VALVE_EN>U3.EN', 'contention:PUMP_EN:all-on']);
const errorsAgainAtReset: readonly string[] = [
  ...errorsAgainInStandby.filter((id) => !notAtReset.has(id)),
  'overvoltage:SDA:all-on:U2.SDA',
  'overvoltage:SCL:all-on:U2.SCL',
  // The planted SCL2 pull-up (version 2): every rail is on at reset, so the FET shifter conducts.
  'fet-shifter:SCL2_L:all-on:Q2:U20.SCL:sink',
  'drive-load:SCL2_L:all-on:U20.SCL',
];
const warningsAgainAtReset: readonly string[] = ['edge-rate:FLOW:all-on', 'level-low:SCL2_L:all-on:U1.SCL2>U20.SCL'];
const atReset = (id: string) => id.replace(':all-on', ':reset');

function expectClose(actual: unknown, expected: Expected, label: string): void {
  if (typeof expected !== 'number') {
    expect(actual, label).toEqual(expected);
    return;
  }
  expect(typeof actual, label).toBe('number');
  // Relative: the values span volts to nanofarads.
  expect(Math.abs((actual as number) - expected), label).toBeLessThanOrEqual(1e-9 * Math.abs(expected));
}

describe('greenhouse irrigation controller example', () => {
  const read = readDesign(text);
  it('is a valid design file', () => {
    expect(read.ok ? [] : read.errors).toEqual([]);
  });
  const design = read.ok ? read.design : (JSON.parse(text) as never);
  const result = check(design);
  const ids = (severity: string) =>
    result.findings
      .filter((f) => f.severity === severity && f.waived === undefined)
      .map((f) => f.id)
      .sort();
  it('has exactly the planted faults at error level', () => {
    const expected = [
      ...plantedErrors.map((p) => p.id),
      ...errorsAgainInStandby.map(inStandby),
      ...errorsAgainAtReset.map(atReset),
    ];
    expect(ids('error')).toEqual(expected.sort());
  });

  it('has exactly the planted warnings', () => {
    const expected = [
      ...plantedWarnings.map((p) => p.id),
      ...warningsAgainInStandby.map(inStandby),
      ...warningsAgainAtReset.map(atReset),
    ];
    expect(ids('warning')).toEqual(expected.sort());
  });

  it.each([...plantedErrors, ...plantedWarnings])('$id carries its numbers and corner', ({ id, values }) => {
    const f = result.findings.find((x) => x.id === id);
    expect(f, id).toBeDefined();
    for (const [k, v] of Object.entries(values))
      expectClose((f!.values as Readonly<Record<string, unknown>>)[k], v, `${id} ${k}`);
    expect(f!.message).toMatch(/\d/);
  });

  it.each([...errorsAgainAtReset, ...warningsAgainAtReset])(
    '%s is found again at reset with the same numbers',
    (id) => {
      const allOn = result.findings.find((f) => f.id === id);
      const reset = result.findings.find((f) => f.id === atReset(id));
      expect(reset, atReset(id)).toBeDefined();
      expect(reset!.severity).toBe(allOn!.severity);
      expect(reset!.values).toEqual(allOn!.values);
    },
  );

  it.each([...errorsAgainInStandby, ...warningsAgainInStandby])(
    '%s is found again in standby with the same numbers',
    (id) => {
      const allOn = result.findings.find((f) => f.id === id);
      const standby = result.findings.find((f) => f.id === inStandby(id));
      expect(allOn, id).toBeDefined();
      expect(standby, inStandby(id)).toBeDefined();
      expect(standby!.severity).toBe(allOn!.severity);
      expect(standby!.values).toEqual(allOn!.values);
    },
  );

  // The pull-up advice (README, "Pull-up advice"), worked by hand: the range of the pulls
  // together, the net's own pull-up beside the pins' internal ones, the rise-time bound at
  // 0.7 × maxRiseTime, shrunk by 5 % tolerance to [lo/0.95, hi/1.05], capped at 10 kΩ with an
  // off-board pin or 47 kΩ on board where only leakage bounds it; the IEC 60063 E12 value nearest
  // √(lo·hi) on a log scale; the largest E24 value inside as the alternative.
  const SDA_RMIN = (V33.max - 0.2 * V18.min) / (3e-3 - U1_I); // the sensor's 0.2·VDD @ 3 mA (I2C-bus specification, VDD ≤ 2 V)
  const SDA_RMAX = 1e-6 / (RISE_30_70 * (50e-12 + U1_CIN + 10e-12)); // standard-mode 1 µs; 50 pF wiring + 5 pF + 10 pF (I2C-bus spec. pin)
  const FAULT_RMIN = (V33.max - 0.33) / (4e-3 - U1_I); // 74HC 0.33 V @ 4 mA (JESD7 as restated)
  const FAULT_RMAX = ((1 - MCU_VIH) * V33.min - MIN_MARGIN) / (1e-6 + U1_I); // 74HC iih 1 µA (JESD7) + the controller's
  const FROST_RMIN = (V33.max - 0.4) / (1e-3 - U1_I);
  const RAIN_RMIN = (V33.max - 0.1) / (1e-3 - U1_I); // the gauge's own 0.1 V @ 1 mA
  it.each([
    // 1.04–18.2 kΩ: [1096.1, 12104.8] Ω, √ = 3643 Ω: 3.9 kΩ (ratio 1.071; 3.3 kΩ is 1.104), not 18 kΩ.
    [
      'SDA',
      {
        rMin: SDA_RMIN,
        rMax: SDA_RMAX,
        adviceMin: SDA_RMIN / 0.95,
        adviceMax: (0.7 * SDA_RMAX) / 1.05,
        adviceCap: null,
        suggested: 3.9e3,
        lowestPower: 12e3,
      },
    ],
    ['SCL', { rMin: SDA_RMIN, rMax: SDA_RMAX, suggested: 3.9e3 }],
    // The fault line, leakage only, on board: [825.3 Ω, 47 kΩ], √ = 6228 Ω: 6.8 kΩ (1.092; 5.6 kΩ
    // is 1.112), not 360 kΩ.
    [
      'FAULT_N',
      {
        rMin: FAULT_RMIN,
        rMax: FAULT_RMAX,
        adviceMin: FAULT_RMIN / 0.95,
        adviceCap: 47e3,
        suggested: 6.8e3,
        lowestPower: 330e3,
      },
    ],
    // The frost thermostat (off-board) beside the controller's 30–50 kΩ pull-up: from 1/(1/Rmin −
    // 1/30 k) = 3417.6 Ω, shrunk 3597.5 Ω, capped at 10 kΩ: √ = 5998 Ω, 5.6 kΩ (1.071), not 62 kΩ.
    [
      'FROST',
      {
        ohms: 1 / (1 / 100e3 + 1 / 40e3),
        ohmsMin: 1 / (1 / 100e3 + 1 / 30e3),
        ohmsMax: 1 / (1 / 100e3 + 1 / 50e3),
        rMin: FROST_RMIN,
        adviceMin: 1 / (1 / FROST_RMIN - 1 / 30e3) / 0.95,
        adviceCap: 10e3,
        suggested: 5.6e3,
      },
    ],
    // The rain gauge (off-board) beside the controller's 47 kΩ: from 1/(1/Rmin − 1/47 k) = 3628.5 Ω,
    // shrunk 3819.5 Ω, capped at 10 kΩ: √ = 6180 Ω, 6.8 kΩ (1.1003; 5.6 kΩ is 1.1036).
    ['RAIN', { rMin: RAIN_RMIN, adviceMin: 1 / (1 / RAIN_RMIN - 1 / 47e3) / 0.95, adviceCap: 10e3, suggested: 6.8e3 }],
  ] as const)('pull-up advice on %s follows the policy', (netId, values) => {
    const f = result.findings.find((x) => x.id === `pull-range:${netId}:all-on`);
    expect(f, netId).toBeDefined();
    for (const [k, v] of Object.entries(values))
      expectClose((f!.values as Readonly<Record<string, unknown>>)[k], v as Expected, `${netId} ${k}`);
  });

  it('has the standby and reset scenarios, and back-power finds the sensor fed through its bus pins there only', () => {
    expect(design.scenarios?.map((sc) => sc.id)).toEqual(['standby', 'reset']);
    expect(design.scenarios?.[0]).toEqual({ id: 'standby', label: 'Standby: sensor rail off', off: ['1v8'] });
    const backPower = result.findings.filter((f) => f.rule === 'back-power');
    expect(backPower.map((f) => `${f.scenario} ${f.id}`).sort()).toEqual([
      'standby back-power:SCL:standby:U2.SCL',
      'standby back-power:SDA:standby:U2.SDA',
    ]);
  });

  it('shows a FET-shifted two-wire bus, a divider and a series resistor, each correct', () => {
    const live = (net: string) =>
      result.findings.filter((f) => f.net === net && f.waived === undefined && f.severity !== 'info');
    for (const net of ['SDA2_H', 'SDA2_L', 'BUSY', 'BUSY_DIV', 'LEAK', 'LEAK_IN']) expect(live(net), net).toEqual([]);
    expect((design.discretes ?? []).map((d) => d.kind).sort()).toEqual([
      'fet-shifter',
      'fet-shifter',
      ...Array(7).fill('resistor'),
    ]);
    // The divider R5 1.8 kΩ / R6 3.3 kΩ ±1 % from the display's 74HCT output (JESD7 restated:
    // VDD − 0.66 V at 4 mA) at 4.75 V, less the controller's 1 µA through R5‖R6, against
    // VIH = 0.7 × 3.465 V (the mcu-gpio starting point, common practice).
    const pair = result.nets.get('all-on')!.get('BUSY_DIV')!.view.analysis.pairs[0]!;
    const r5 = 1818;
    const r6 = 3267;
    expectClose(pair.high!.out, (4.09 * r6) / (r5 + r6) - ((r5 * r6) / (r5 + r6)) * U1_I, 'divider high');
    expectClose(pair.high!.threshold, MCU_VIH * V33.max, 'divider VIH');
    // The series resistor R7 10 kΩ −5 % into the controller's leak input (1 mA limit, the
    // example's own): (5.25 − 3.135)/9500 = 223 µA, absorbed by the 3.3 V rail's 20 mA minimum load.
    const clamp = result.findings.find((f) => f.id === 'clamp-current:LEAK_IN:all-on:U1.LEAK')!;
    expect(clamp.severity).toBe('info');
    expectClose(valuesOf(clamp, 'clamp-current').current, (V50.max - V33.min) / 9500, 'clamp current');
    expect(result.findings.find((f) => f.id === 'rail-injection:3v3:all-on')?.severity).toBe('info');
  });

  // The editor draws a part as a box about 200 wide and 40 + 22 per pin tall, a part between
  // chips as one of 120 × 64, on a canvas of about 1400 × 1150 (the parts between chips sit in
  // bands of their own, so that no two nets share a wire's track): the example's boxes must
  // neither overlap nor leave it, and every pin is placed.
  it('lays its parts out without overlaps, each pin on a side', () => {
    const boxes = [
      ...design.parts.map((p) => ({
        id: p.id,
        x: p.position?.x ?? 0,
        y: p.position?.y ?? 0,
        w: 200,
        h: 40 + 22 * p.pins.length,
      })),
      ...(design.discretes ?? []).map((d) => ({
        id: d.id,
        x: d.position?.x ?? 0,
        y: d.position?.y ?? 0,
        w: 120,
        h: 64,
      })),
    ];
    const problems: string[] = [];
    for (const b of boxes)
      if (b.x < 0 || b.y < 0 || b.x + b.w > 1400 || b.y + b.h > 1150) problems.push(`${b.id} off canvas`);
    for (const [i, a] of boxes.entries()) {
      for (const b of boxes.slice(i + 1)) {
        if (a.x < b.x + b.w && b.x < a.x + a.w && a.y < b.y + b.h && b.y < a.y + a.h) problems.push(`${a.id}/${b.id}`);
      }
    }
    for (const p of design.parts)
      for (const pin of p.pins) if (pin.side === undefined) problems.push(`${p.id}.${pin.id} no side`);
    expect(problems).toEqual([]);
  });
});
