/**
 * Low-voltage CMOS: 74LVC and the JEDEC LVTTL/LVCMOS interface standards (non-terminated).
 *
 * "VDD+0.5, never above 4.6 V" of the 3.3 V standards is not a Level; the cap never binds
 * inside 3.0–3.6 V because `viMax` is taken at the rail's lowest voltage, so `VDD+0.5` is written.
 */
import { defineProfile } from './define.ts';

/**
 * 74LVC at 2.7–3.6 V: inputs accept 5.5 V whatever the supply, and pins may carry 5.5 V while
 * the part is unpowered (partial power-down).
 */
export const lvc = defineProfile({
  id: '74lvc',
  label: '74LVC 3.3 V CMOS, 5.5 V-tolerant',
  source:
    "as restated in parts' DC tables; 12 mA VOH as VDD−0.6 (2.4 V at 3.0 V, conservative against 2.2 V at 2.7 V); " +
    'VOL 0.4 V @ 12 mA from the 2.7 V row; inputs 0–5.5 V and partial power-down to 5.5 V',
  params: {
    vddRange: [2.7, 3.6], // restated: the supply range of these rows
    vih: 2, // restated
    vil: 0.8, // restated
    voh: [
      { v: 'VDD-0.2', i: 100e-6 }, // restated
      // restated: 2.2 V @ 12 mA at 2.7 V and 2.4 V at 3.0 V; the larger drop, 0.6 V, is carried
      // (the 2.7 V row, a 0.5 V drop, is thereby covered conservatively)
      { v: 'VDD-0.6', i: 12e-3 },
    ],
    vol: [
      { v: 0.2, i: 100e-6 }, // restated
      { v: 0.4, i: 12e-3 }, // restated: the 2.7 V row
    ],
    viMax: 5.5, // restated: inputs accept 0–5.5 V whatever VDD
    unpoweredSafe: true, // restated: partial power-down specified
    viMaxOff: 5.5, // restated: pins may carry up to 5.5 V at VDD = 0
  },
});

/** 3.3 V LVTTL, JESD8C. */
export const lvttl33 = defineProfile({
  id: 'lvttl33',
  label: '3.3 V LVTTL (JESD8C)',
  source:
    "JESD8C as restated in parts' DC tables; currents from memory; VDD+0.5 (the 4.6 V cap never binds at 3.0 V)",
  params: {
    vddRange: [3, 3.6], // JESD8C restated: normal range
    vih: 2, // JESD8C restated
    vil: 0.8, // JESD8C restated
    voh: [{ v: 2.4, i: 2e-3 }], // JESD8C restated; 2 mA from memory
    vol: [{ v: 0.4, i: 2e-3 }], // JESD8C restated; 2 mA from memory
    viMax: 'VDD+0.5', // JESD8C restated (its 4.6 V cap never binds from 3.0 V)
  },
});

/** 3.3 V LVCMOS, JESD8C. */
export const lvcmos33 = defineProfile({
  id: 'lvcmos33',
  label: '3.3 V LVCMOS (JESD8C)',
  source:
    "JESD8C as restated in parts' DC tables; input 2.0 V from memory; VDD+0.5 (the 4.6 V cap never binds at 3.0 V)",
  params: {
    vddRange: [3, 3.6], // JESD8C restated: normal range
    vih: 2, // from memory
    vil: 0.8, // JESD8C restated
    voh: [{ v: 'VDD-0.2', i: 100e-6 }], // JESD8C restated
    vol: [{ v: 0.2, i: 100e-6 }], // JESD8C restated
    viMax: 'VDD+0.5', // JESD8C restated (its 4.6 V cap never binds from 3.0 V)
  },
});

/** 2.5 V LVCMOS, JESD8-5. */
export const lvcmos25 = defineProfile({
  id: 'lvcmos25',
  label: '2.5 V LVCMOS (JESD8-5)',
  source: 'JESD8-5: 1 mA rows restated, other rows and VDD+0.5 from memory',
  params: {
    vddRange: [2.3, 2.7], // from memory
    vih: 1.7, // from memory
    vil: 0.7, // from memory
    voh: [
      { v: 'VDD-0.2', i: 100e-6 }, // from memory
      { v: 2, i: 1e-3 }, // JESD8-5 restated
      { v: 1.7, i: 2e-3 }, // from memory
    ],
    vol: [
      { v: 0.2, i: 100e-6 }, // from memory
      { v: 0.4, i: 1e-3 }, // JESD8-5 restated
      { v: 0.7, i: 2e-3 }, // from memory
    ],
    viMax: 'VDD+0.5', // from memory
  },
});

/** 1.8 V LVCMOS, JESD8-7. */
export const lvcmos18 = defineProfile({
  id: 'lvcmos18',
  label: '1.8 V LVCMOS (JESD8-7)',
  source: 'JESD8-7: 2 mA rows restated, 100 µA rows and VDD+0.5 from memory',
  params: {
    vddRange: [1.65, 1.95], // JESD8-7 restated
    vih: '0.65*VDD', // JESD8-7 restated
    vil: '0.35*VDD', // JESD8-7 restated
    voh: [
      { v: 'VDD-0.2', i: 100e-6 }, // from memory
      { v: 'VDD-0.45', i: 2e-3 }, // JESD8-7 restated
    ],
    vol: [
      { v: 0.2, i: 100e-6 }, // from memory
      { v: 0.45, i: 2e-3 }, // JESD8-7 restated
    ],
    viMax: 'VDD+0.5', // from memory
  },
});

/** 1.5 V LVCMOS, JESD8-11. */
export const lvcmos15 = defineProfile({
  id: 'lvcmos15',
  label: '1.5 V LVCMOS (JESD8-11)',
  source: 'JESD8-11: 2 mA rows restated, 100 µA rows and VDD+0.5 from memory',
  params: {
    vddRange: [1.4, 1.6], // JESD8-11 title page (std)
    vih: '0.65*VDD', // JESD8-11 restated
    vil: '0.35*VDD', // JESD8-11 restated
    voh: [
      { v: 'VDD-0.2', i: 100e-6 }, // from memory
      { v: '0.75*VDD', i: 2e-3 }, // JESD8-11 restated
    ],
    vol: [
      { v: 0.2, i: 100e-6 }, // from memory
      { v: '0.25*VDD', i: 2e-3 }, // JESD8-11 restated
    ],
    viMax: 'VDD+0.5', // from memory
  },
});

/** 1.2 V LVCMOS, JESD8-12. Low confidence in the rows marked from memory. */
export const lvcmos12 = defineProfile({
  id: 'lvcmos12',
  label: '1.2 V LVCMOS (JESD8-12)',
  source: 'JESD8-12 restated; VDD range, 100 µA rows and VDD+0.5 from memory (low confidence)',
  params: {
    vddRange: [1.1, 1.3], // from memory
    vih: '0.65*VDD', // JESD8-12 restated
    vil: '0.35*VDD', // JESD8-12 restated
    voh: [
      { v: 'VDD-0.1', i: 100e-6 }, // from memory, low confidence
      { v: '0.75*VDD', i: 2e-3 }, // JESD8-12 restated
    ],
    vol: [
      { v: 0.1, i: 100e-6 }, // from memory
      { v: '0.25*VDD', i: 2e-3 }, // JESD8-12 restated
    ],
    viMax: 'VDD+0.5', // from memory
  },
});
