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
    'VOL 0.4 V @ 12 mA from the 2.7 V row; inputs 0–5.5 V and partial power-down to 5.5 V; rows −40…85 °C; ' +
    'input leakage ±5 µA and 5 pF from memory',
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
    iih: 5e-6, // from memory: ±5 µA input leakage, the usual figure of parts' tables (the standard sets none)
    iil: 5e-6, // from memory: ±5 µA
    cin: 5e-12, // from memory: 5 pF, the usual maximum of parts' tables
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
    "JESD8C as restated in parts' DC tables; currents from memory; VDD+0.5 (the 4.6 V cap never binds at 3.0 V); " +
    "over the parts' operating range (−40…85 °C); input leakage ±5 µA and 5 pF from memory",
  params: {
    vddRange: [3, 3.6], // JESD8C restated: normal range
    vih: 2, // JESD8C restated
    vil: 0.8, // JESD8C restated
    voh: [{ v: 2.4, i: 2e-3 }], // JESD8C restated; 2 mA from memory
    vol: [{ v: 0.4, i: 2e-3 }], // JESD8C restated; 2 mA from memory
    iih: 5e-6, // from memory: ±5 µA input leakage, the usual figure of parts' tables (the standard sets none)
    iil: 5e-6, // from memory: ±5 µA
    cin: 5e-12, // from memory: 5 pF, the usual maximum of parts' tables
    viMax: 'VDD+0.5', // JESD8C restated (its 4.6 V cap never binds from 3.0 V)
  },
});

/** 3.3 V LVCMOS, JESD8C. */
export const lvcmos33 = defineProfile({
  id: 'lvcmos33',
  label: '3.3 V LVCMOS (JESD8C)',
  source:
    "JESD8C as restated in parts' DC tables; input 2.0 V from memory; VDD+0.5 (the 4.6 V cap never binds at 3.0 V); " +
    "over the parts' operating range (−40…85 °C); input leakage ±5 µA and 5 pF from memory",
  params: {
    vddRange: [3, 3.6], // JESD8C restated: normal range
    vih: 2, // from memory
    vil: 0.8, // JESD8C restated
    voh: [{ v: 'VDD-0.2', i: 100e-6 }], // JESD8C restated
    vol: [{ v: 0.2, i: 100e-6 }], // JESD8C restated
    iih: 5e-6, // from memory: ±5 µA input leakage, the usual figure of parts' tables (the standard sets none)
    iil: 5e-6, // from memory: ±5 µA
    cin: 5e-12, // from memory: 5 pF, the usual maximum of parts' tables
    viMax: 'VDD+0.5', // JESD8C restated (its 4.6 V cap never binds from 3.0 V)
  },
});

/** 2.5 V LVCMOS, JESD8-5. */
export const lvcmos25 = defineProfile({
  id: 'lvcmos25',
  label: '2.5 V LVCMOS (JESD8-5)',
  source:
    "JESD8-5: 1 mA rows restated, other rows and VDD+0.5 from memory; over the parts' operating range (−40…85 °C); input leakage ±5 µA and 5 pF from memory",
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
    iih: 5e-6, // from memory: ±5 µA input leakage, the usual figure of parts' tables (the standard sets none)
    iil: 5e-6, // from memory: ±5 µA
    cin: 5e-12, // from memory: 5 pF, the usual maximum of parts' tables
    viMax: 'VDD+0.5', // from memory
  },
});

/** 1.8 V LVCMOS, JESD8-7. */
export const lvcmos18 = defineProfile({
  id: 'lvcmos18',
  label: '1.8 V LVCMOS (JESD8-7)',
  source:
    "JESD8-7: 2 mA rows restated, 100 µA rows and VDD+0.5 from memory; over the parts' operating range (−40…85 °C); input leakage ±5 µA and 5 pF from memory",
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
    iih: 5e-6, // from memory: ±5 µA input leakage, the usual figure of parts' tables (the standard sets none)
    iil: 5e-6, // from memory: ±5 µA
    cin: 5e-12, // from memory: 5 pF, the usual maximum of parts' tables
    viMax: 'VDD+0.5', // from memory
  },
});

/** 1.5 V LVCMOS, JESD8-11. */
export const lvcmos15 = defineProfile({
  id: 'lvcmos15',
  label: '1.5 V LVCMOS (JESD8-11)',
  source:
    "JESD8-11: 2 mA rows restated, 100 µA rows and VDD+0.5 from memory; over the parts' operating range (−40…85 °C); input leakage ±5 µA and 5 pF from memory",
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
    iih: 5e-6, // from memory: ±5 µA input leakage, the usual figure of parts' tables (the standard sets none)
    iil: 5e-6, // from memory: ±5 µA
    cin: 5e-12, // from memory: 5 pF, the usual maximum of parts' tables
    viMax: 'VDD+0.5', // from memory
  },
});

/** 1.2 V LVCMOS, JESD8-12. Low confidence in the rows marked from memory. */
export const lvcmos12 = defineProfile({
  id: 'lvcmos12',
  label: '1.2 V LVCMOS (JESD8-12)',
  source:
    "JESD8-12 restated; VDD range, 100 µA rows and VDD+0.5 from memory (low confidence); over the parts' operating range (−40…85 °C); input leakage ±5 µA and 5 pF from memory",
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
    iih: 5e-6, // from memory: ±5 µA input leakage, the usual figure of parts' tables (the standard sets none)
    iil: 5e-6, // from memory: ±5 µA
    cin: 5e-12, // from memory: 5 pF, the usual maximum of parts' tables
    viMax: 'VDD+0.5', // from memory
  },
});

/** 74LVC at 1.65–1.95 V: JESD8-7 inputs, the 4 mA rows of the family's 1.65 V column. */
export const lvc18 = defineProfile({
  id: '74lvc-18',
  label: '74LVC at 1.8 V (JESD8-7 levels), 5.5 V-tolerant',
  source:
    'JESD8-7 thresholds (restated); 4 mA rows at 1.65 V from memory (1.2 V / 0.45 V, carried up as VDD−0.45 / ' +
    '0.45 V); input tolerance and partial power-down as 74LVC (restated); rows −40…85 °C; ±5 µA and 5 pF from memory',
  params: {
    vddRange: [1.65, 1.95], // JESD8-7 restated
    vih: '0.65*VDD', // JESD8-7 restated
    vil: '0.35*VDD', // JESD8-7 restated
    voh: [
      { v: 'VDD-0.2', i: 100e-6 }, // from memory, as the family's other columns
      { v: 'VDD-0.45', i: 4e-3 }, // from memory: 1.2 V @ 4 mA at 1.65 V, carried up
    ],
    vol: [
      { v: 0.2, i: 100e-6 }, // from memory
      { v: 0.45, i: 4e-3 }, // from memory: 0.45 V @ 4 mA at 1.65 V
    ],
    iih: 5e-6, // from memory: ±5 µA
    iil: 5e-6, // from memory: ±5 µA
    cin: 5e-12, // from memory: 5 pF
    viMax: 5.5, // restated: inputs accept 0–5.5 V whatever VDD
    unpoweredSafe: true, // restated: partial power-down specified
    viMaxOff: 5.5, // restated
  },
});

/** 74LVC at 2.3–2.7 V: JESD8-5 inputs, the 8 mA rows of the family's 2.3 V column. */
export const lvc25 = defineProfile({
  id: '74lvc-25',
  label: '74LVC at 2.5 V (JESD8-5 levels), 5.5 V-tolerant',
  source:
    'JESD8-5 thresholds 1.7 / 0.7 V (from memory, as lvcmos25); 8 mA rows at 2.3 V from memory (1.7 V / 0.6 V, ' +
    'carried up as VDD−0.6 / 0.6 V); input tolerance and partial power-down as 74LVC (restated); rows −40…85 °C; ' +
    '±5 µA and 5 pF from memory',
  params: {
    vddRange: [2.3, 2.7], // JESD8-5 (from memory, as lvcmos25)
    vih: 1.7, // JESD8-5, from memory
    vil: 0.7, // JESD8-5, from memory
    voh: [
      { v: 'VDD-0.2', i: 100e-6 }, // from memory
      { v: 'VDD-0.6', i: 8e-3 }, // from memory: 1.7 V @ 8 mA at 2.3 V, carried up
    ],
    vol: [
      { v: 0.2, i: 100e-6 }, // from memory
      { v: 0.6, i: 8e-3 }, // from memory: 0.6 V @ 8 mA at 2.3 V
    ],
    iih: 5e-6, // from memory: ±5 µA
    iil: 5e-6, // from memory: ±5 µA
    cin: 5e-12, // from memory: 5 pF
    viMax: 5.5, // restated: inputs accept 0–5.5 V whatever VDD
    unpoweredSafe: true, // restated: partial power-down specified
    viMaxOff: 5.5, // restated
  },
});

/**
 * An open-drain 74LVC-type buffer at 2.7–3.6 V: the family's sink rows, no high drive; its
 * output may be pulled up to 5 V.
 */
export const lvcOpenDrain = defineProfile({
  id: '74lvc-od',
  label: '74LVC-type open-drain buffer, 5.5 V-tolerant',
  source:
    "as 74LVC (restated in parts' DC tables): inputs 2.0 / 0.8 V, sink rows 0.2 V @ 100 µA and 0.4 V @ 12 mA " +
    '(2.7 V); pins tolerate 5.5 V powered or not (restated); off leakage ±5 µA and 5 pF from memory; rows −40…85 °C',
  params: {
    vddRange: [2.7, 3.6], // restated, as 74LVC
    vih: 2, // restated
    vil: 0.8, // restated
    vol: [
      { v: 0.2, i: 100e-6 }, // restated
      { v: 0.4, i: 12e-3 }, // restated: the 2.7 V row
    ],
    iih: 5e-6, // from memory: ±5 µA input and off-state leakage
    iil: 5e-6, // from memory
    cin: 5e-12, // from memory
    viMax: 5.5, // restated: inputs and the open-drain output accept 5.5 V
    unpoweredSafe: true, // restated: partial power-down specified
    viMaxOff: 5.5, // restated
  },
});
