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
    '±10 µA and 10 pF (restated); VIH max VDD+0.5 (restated)',
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
    'thresholds, ±10 µA, 10 pF and VDD+0.5 as for i2c; range from JESD8-7\'s 1.65 V (from memory)',
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
