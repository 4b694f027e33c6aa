/**
 * A rich, valid design used by the model tests: an invented greenhouse irrigation
 * controller. Part names and values are invented demo data (no real part numbers).
 * It uses every kind of record and most optional keys, so that each refusal case can break
 * exactly one thing in it.
 */
import type { Design } from '../../rules/model/schema.ts';

export function greenhouse(): Design {
  return {
    format: 'railcross.design',
    version: 2,
    title: 'Greenhouse irrigation controller',
    settings: { minMargin: 0.25, defaultWiringCapacitance: 8e-12 },
    rails: [
      { id: '5v0', label: '5 V valves', nominal: 5, tolerance: 0.05, colour: '#c0562b' },
      { id: '3v3', label: '3.3 V logic', nominal: 3.3 },
      { id: '1v8', label: '1.8 V sensor core', nominal: 1.8, tolerance: 0.03 },
      { id: 'probe.3v0', label: 'Probe supply', nominal: 3, min: 2.8, max: 3.2 },
    ],
    scenarios: [
      { id: 'standby', label: 'Valves unpowered in standby', off: ['5v0'] },
      { id: 'probe-off', label: 'Probe supply off between readings', off: ['probe.3v0', '1v8'] },
    ],
    profiles: [
      {
        id: 'valve-driver',
        label: 'Valve driver inputs (invented)',
        source: 'invented for this test',
        params: { vih: 2, vil: 0.8, iih: 20e-6, iil: 20e-6, cin: 5e-12, viMax: 'VDD+0.5', vddRange: [4.5, 5.5] },
      },
      {
        id: 'mcu-gpio',
        label: 'Controller GPIO (shadows the built-in)',
        source: 'from memory',
        params: {
          vih: '0.7*VDD',
          vil: '0.3*VDD',
          schmitt: { vtPlus: '0.6*VDD', vtMinus: '0.35*VDD' },
          voh: [{ v: 'VDD-0.4', i: 4e-3 }],
          vol: [{ v: 0.4, i: 4e-3 }],
          ioMax: 20e-3,
          maxInputRamp: 1e-7,
        },
      },
    ],
    parts: [
      {
        id: 'U1',
        label: 'Irrigation controller',
        rail: '3v3',
        profile: 'mcu-gpio',
        position: { x: 120, y: -40.5 },
        pins: [
          { id: 'SDA', role: 'bidir', drive: 'open-drain', side: 'right' },
          { id: 'SCL', role: 'output', drive: 'open-drain', side: 'right' },
          { id: 'VALVE_EN', role: 'output' },
          { id: 'PROBE_IN', role: 'input', pull: { to: '3v3', ohms: 40e3 }, params: { viMax: 3.6 } },
          { id: 'ALARM_N', role: 'input' },
        ],
      },
      {
        id: 'U2',
        label: 'Valve driver',
        rail: '5v0',
        profile: 'valve-driver',
        params: { unpoweredSafe: false },
        pins: [
          { id: 'EN', role: 'input' },
          { id: 'FAULT_N', role: 'output', drive: 'open-drain', profile: '74ls-oc' },
        ],
      },
      {
        id: 'U3',
        label: 'Sensor translator',
        rail: '3v3',
        profile: '74lvc',
        pins: [
          { id: 'A1', role: 'input', rail: '1v8', profile: 'lvcmos18' },
          { id: 'B1', role: 'output', drive: 'three-state' },
        ],
      },
      {
        id: 'U4',
        label: 'Humidity sensor',
        rail: '1v8',
        profile: 'i2c-lv',
        pins: [
          { id: 'SDA', role: 'bidir', drive: 'open-drain' },
          { id: 'SCL', role: 'input', params: { viMaxOff: 3.6 } },
          { id: 'DRDY', role: 'output', pull: { to: 'ground', ohms: 100e3 } },
        ],
      },
      {
        id: 'J1',
        label: 'Soil probe connector',
        rail: 'probe.3v0',
        profile: 'off-board',
        pins: [{ id: 'PROBE', role: 'output', params: { voh: [{ v: 2.4, i: 1e-3 }], vol: [{ v: 0.5, i: 1e-3 }] } }],
      },
    ],
    // Version 2: parts between chips (invented values).
    discretes: [
      {
        id: 'R9',
        kind: 'resistor',
        label: 'Probe series resistor',
        ohms: 1e3,
        tolerance: 0.01,
        position: { x: 10, y: 20 },
      },
      { id: 'R10', kind: 'resistor', ohms: 47e3, tie: { '2': 'ground' } },
      { id: 'Q1', kind: 'fet-shifter', gate: '1v8', vgsThMax: 1.0, rdsOnMax: 6 },
      { id: 'D1', kind: 'diode-shifter', vfMax: 0.45, leakageMax: 5e-6 },
    ],
    nets: [
      {
        id: 'I2C_SDA',
        label: 'SDA',
        pins: ['U1.SDA', 'U4.SDA'],
        pull: { to: '3v3', ohms: 4.7e3 },
        // I2C-bus specification (UM10204), fast mode: rise time at most 300 ns (transcribed, from memory).
        maxRiseTime: 300e-9,
      },
      {
        id: 'I2C_SCL',
        label: 'SCL',
        pins: ['U1.SCL', 'U4.SCL'],
        pull: { to: '3v3', ohms: 4.7e3 },
        wiringCapacitance: 12e-12,
      },
      {
        id: 'VALVE_EN',
        pins: ['U1.VALVE_EN', 'U2.EN'],
        waivers: [
          { rule: 'back-power', scenario: 'standby', note: 'Driver input is current-limited by its series resistor' },
        ],
        route: [['U1.VALVE_EN', 'U2.EN']],
      },
      {
        id: 'ALARM',
        label: 'ALARM_N',
        pins: ['U2.FAULT_N', 'U1.ALARM_N'],
        pull: { to: '3v3', ohms: 10e3 },
        waivers: [
          { rule: 'level-high', note: 'reviewed' },
          { rule: 'floating-input', scenario: 'all-on', note: 'reviewed' },
        ],
      },
      { id: 'PROBE', pins: ['J1.PROBE', 'U3.A1', 'R10.1'], route: [['J1.PROBE', 'U3.A1']] },
      {
        id: 'PROBE_BUF',
        pins: ['U3.B1', 'U1.PROBE_IN', 'U4.DRDY'],
        route: [
          ['U3.B1', 'U1.PROBE_IN'],
          ['U1.PROBE_IN', 'U4.DRDY'],
        ],
      },
    ],
  };
}
