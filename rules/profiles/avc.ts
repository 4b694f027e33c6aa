/**
 * Low-voltage CMOS for the lowest supplies: 74AVC-type at 1.8 V and 74AUC-type at 1.2 V, each
 * over one JEDEC supply band (JESD8-7, JESD8-12) with the family's rows at its low end. Levels
 * of the bands restated; currents from memory, low confidence.
 */
import { defineProfile } from './define.ts';

/** 74AVC-type at 1.65–1.95 V. */
export const avc = defineProfile({
  id: '74avc',
  label: '74AVC-type low-voltage CMOS at 1.8 V',
  source:
    'JESD8-7 thresholds 0.65·VDD / 0.35·VDD (restated); 4 mA rows at 1.65 V from memory (1.2 V / 0.45 V, carried ' +
    'up as VDD−0.45 / 0.45 V), low confidence; inputs and powered-off pins tolerate 3.6 V (from memory); ' +
    '±2.5 µA and 5 pF from memory; −40…85 °C',
  params: {
    vddRange: [1.65, 1.95], // JESD8-7 restated
    vih: '0.65*VDD', // JESD8-7 restated
    vil: '0.35*VDD', // JESD8-7 restated
    voh: [
      { v: 'VDD-0.2', i: 100e-6 }, // from memory
      { v: 'VDD-0.45', i: 4e-3 }, // from memory: 1.2 V @ 4 mA at 1.65 V
    ],
    vol: [
      { v: 0.2, i: 100e-6 }, // from memory
      { v: 0.45, i: 4e-3 }, // from memory
    ],
    iih: 2.5e-6, // from memory
    iil: 2.5e-6, // from memory
    cin: 5e-12, // from memory
    viMax: 3.6, // from memory: inputs tolerate 3.6 V whatever VDD
    unpoweredSafe: true, // from memory: partial power-down specified
    viMaxOff: 3.6, // from memory
  },
});

/** 74AUC-type at 1.1–1.3 V. */
export const auc = defineProfile({
  id: '74auc',
  label: '74AUC-type low-voltage CMOS at 1.2 V',
  source:
    'JESD8-12 thresholds 0.65·VDD / 0.35·VDD (restated); 3 mA rows at 1.1 V from memory (0.8 V / 0.3 V, carried ' +
    'up as VDD−0.3 / 0.3 V), low confidence; inputs and powered-off pins tolerate 3.6 V (from memory); ' +
    '±5 µA and 5 pF from memory; −40…85 °C',
  params: {
    vddRange: [1.1, 1.3], // JESD8-12 band (from memory, as lvcmos12)
    vih: '0.65*VDD', // JESD8-12 restated
    vil: '0.35*VDD', // JESD8-12 restated
    voh: [
      { v: 'VDD-0.1', i: 100e-6 }, // from memory
      { v: 'VDD-0.3', i: 3e-3 }, // from memory: 0.8 V @ 3 mA at 1.1 V
    ],
    vol: [
      { v: 0.1, i: 100e-6 }, // from memory
      { v: 0.3, i: 3e-3 }, // from memory
    ],
    iih: 5e-6, // from memory
    iil: 5e-6, // from memory
    cin: 5e-12, // from memory
    viMax: 3.6, // from memory: inputs tolerate 3.6 V whatever VDD
    unpoweredSafe: true, // from memory: partial power-down specified
    viMaxOff: 3.6, // from memory
  },
});
