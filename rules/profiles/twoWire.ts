/**
 * Two-wire bus pins, levels of the I2C-bus specification. The bus is open-drain: a pin of
 * these profiles only pulls low, so there is no `voh`; the pull-up makes the high level.
 */
import { defineProfile } from './define.ts';

/** A two-wire bus pin at VDD above 2 V (standard-mode and fast-mode). */
export const i2c = defineProfile({
  id: 'i2c',
  label: 'I2C-bus pin',
  source:
    'I2C-bus specification: thresholds (std), VOL 0.4 V @ 3 mA for VDD > 2 V (currents std, level restated), ' +
    "±10 µA and 10 pF (restated); VIH max VDD+0.5 (restated); over the device's operating range (−40…85 °C)",
  params: {
    vddRange: [2, 5.5], // I2C-bus specification: the 0.4 V row holds for VDD > 2 V (restated); 5.5 V top from memory
    vih: '0.7*VDD', // I2C-bus specification (std)
    vil: '0.3*VDD', // I2C-bus specification (std)
    vol: [{ v: 0.4, i: 3e-3 }], // I2C-bus specification: 3 mA (std), 0.4 V (restated)
    iih: 10e-6, // I2C-bus specification, restated: ±10 µA
    iil: 10e-6, // I2C-bus specification, restated: ±10 µA
    cin: 10e-12, // I2C-bus specification, restated: ≤ 10 pF
    viMax: 'VDD+0.5', // I2C-bus specification, restated: VIH max VDD+0.5
  },
});

/** A two-wire bus pin at VDD of 2 V or less (fast-mode's low-supply row). */
export const i2cLowVoltage = defineProfile({
  id: 'i2c-lv',
  label: 'I2C-bus pin, VDD ≤ 2 V',
  source:
    "I2C-bus specification's table for VDD ≤ 2 V, restated: VOL 0.2·VDD @ 3 mA (fast-mode); " +
    "thresholds, ±10 µA, 10 pF and VDD+0.5 as for i2c; range from JESD8-7's 1.65 V (from memory); " +
    "over the device's operating range (−40…85 °C)",
  params: {
    vddRange: [1.65, 2], // 1.65 V: JESD8-7's lowest supply (from memory); 2 V: the specification's low-supply row
    vih: '0.7*VDD', // I2C-bus specification (std)
    vil: '0.3*VDD', // I2C-bus specification (std)
    vol: [{ v: '0.2*VDD', i: 3e-3 }], // I2C-bus specification, restated: VDD ≤ 2 V, fast-mode
    iih: 10e-6, // I2C-bus specification, restated: ±10 µA
    iil: 10e-6, // I2C-bus specification, restated: ±10 µA
    cin: 10e-12, // I2C-bus specification, restated: ≤ 10 pF
    viMax: 'VDD+0.5', // I2C-bus specification, restated: VIH max VDD+0.5
  },
});

/**
 * A fast-mode two-wire bus pin at VDD above 2 V: the standard-mode row and fast-mode's second
 * output row, 0.6 V at 6 mA (a standard-mode pin is rated for 3 mA only, so this is its own id).
 */
export const i2cFastMode = defineProfile({
  id: 'i2c-fm',
  label: 'I2C-bus pin, fast-mode',
  source:
    "I2C-bus specification: as i2c, with fast-mode's VOL 0.6 V @ 6 mA (std); over the device's operating range (−40…85 °C)",
  params: {
    vddRange: [2, 5.5], // as i2c
    vih: '0.7*VDD', // I2C-bus specification (std)
    vil: '0.3*VDD', // I2C-bus specification (std)
    vol: [
      { v: 0.4, i: 3e-3 }, // I2C-bus specification: 3 mA (std), 0.4 V (restated)
      { v: 0.6, i: 6e-3 }, // I2C-bus specification, fast-mode: 0.6 V at 6 mA (std)
    ],
    iih: 10e-6, // I2C-bus specification, restated: ±10 µA
    iil: 10e-6, // I2C-bus specification, restated: ±10 µA
    cin: 10e-12, // I2C-bus specification, restated: ≤ 10 pF
    viMax: 'VDD+0.5', // I2C-bus specification, restated: VIH max VDD+0.5
  },
});

/**
 * An SMBus pin (the system management bus's fixed levels, not fractions of VDD): high-power
 * class sink rating.
 */
export const smbus = defineProfile({
  id: 'smbus',
  label: 'SMBus pin (fixed 0.8 / 2.1 V levels)',
  source:
    'SMBus specification 2.0, from memory: VIL 0.8 V, VIH 2.1 V, VOL 0.4 V @ 4 mA (high-power class), ' +
    "leakage ±5 µA, 10 pF (as the I2C-bus pin), VDD 3–5.5 V; over the device's operating range (−40…85 °C)",
  params: {
    vddRange: [3, 5.5], // SMBus 2.0, from memory
    vih: 2.1, // SMBus 2.0, from memory
    vil: 0.8, // SMBus 2.0, from memory
    vol: [{ v: 0.4, i: 4e-3 }], // SMBus 2.0 high-power class, from memory
    iih: 5e-6, // SMBus 2.0, from memory: ±5 µA
    iil: 5e-6, // SMBus 2.0, from memory: ±5 µA
    cin: 10e-12, // from memory: as a two-wire bus pin
    viMax: 'VDD+0.5', // common practice: clamp diode to VDD
  },
});
