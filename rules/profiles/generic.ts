/**
 * Profiles that are starting points rather than a family's data: the engineer is expected to
 * override them per part or pin with the chosen part's datasheet values.
 */
import { defineProfile } from './define.ts';

/**
 * A microcontroller GPIO: CMOS thresholds, a light-load row and an 8 mA row as a 3.3 V part's
 * port table gives them, at any supply (no `vddRange`).
 */
export const mcuGpio = defineProfile({
  id: 'mcu-gpio',
  label: 'Microcontroller GPIO (starting point)',
  source:
    'an editable starting point: CMOS thresholds 0.7/0.3·VDD and a static LVCMOS row (common practice), ' +
    "an 8 mA row VDD−0.4 / 0.4 V, ±1 µA leakage and 5 pF as a 3.3 V part's port table gives them " +
    '(from memory, −40…85 °C), VDD+0.5 clamp (common practice)',
  params: {
    vih: '0.7*VDD', // common practice
    vil: '0.3*VDD', // common practice
    voh: [
      { v: 'VDD-0.2', i: 100e-6 }, // common practice: static LVCMOS row
      { v: 'VDD-0.4', i: 8e-3 }, // from memory: a 3.3 V part's port row at 8 mA, −40…85 °C
    ],
    vol: [
      { v: 0.2, i: 100e-6 }, // common practice: static LVCMOS row
      { v: 0.4, i: 8e-3 }, // from memory: a 3.3 V part's port row at 8 mA, −40…85 °C
    ],
    iih: 1e-6, // from memory: ±1 µA pin leakage
    iil: 1e-6, // from memory: ±1 µA pin leakage
    cin: 5e-12, // from memory: 5 pF pin capacitance
    viMax: 'VDD+0.5', // common practice: clamp diode to VDD
  },
});

/** A signal from outside the board: no levels of its own; the user types them into the pin's params. */
export const offBoard = defineProfile({
  id: 'off-board',
  label: 'Off-board signal',
  source: 'typed in by the user',
  params: {},
});
