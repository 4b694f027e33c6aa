/**
 * 5 V CMOS logic: 74HC/HCT, 74AC/ACT, 74AHC/AHCT.
 *
 * Output rows tabulated at 4.5 V only are carried up the supply as `VDD-(4.5-v)` for VOH and
 * `v` for VOL: conservative above 4.5 V, because outputs get stronger with supply. 74HC covers
 * its whole 2–6 V with rows that hold from a supply up (`vddMin`); the others' `vddRange`
 * starts at 4.5 V, and a part run lower gets a rail-range warning.
 */
import { defineProfile } from './define.ts';

/**
 * 74HC: CMOS inputs, JESD7, over the family's whole 2–6 V. The datasheet's test points: 20 µA
 * rows at 2, 4.5 and 6 V; the 4 mA rows from 4.5 V and the 5.2 mA rows at 6 V only (`vddMin`),
 * so that a 74HC on 3.3 V is judged by what is guaranteed there, the 20 µA rows.
 */
export const hc = defineProfile({
  id: '74hc',
  label: '74HC CMOS (JESD7), 2–6 V',
  source:
    "JESD7 (JESD7A test points) as restated in parts' DC tables, 2–6 V; thresholds as the conservative lines " +
    '0.675·VDD+0.15 / 0.325·VDD−0.15 (exact at 2 and 6 V); 20 µA rows VDD−0.1 / 0.1 V at every supply; 4 mA rows ' +
    'from 4.5 V (3.84 V / 0.33 V at 4.5 V, carried up as VDD−0.66 / 0.33 V) and 5.2 mA rows at 6 V (5.34 V / ' +
    '0.33 V); clamp diodes: VDD+0.5 (common practice); all rows −40…85 °C',
  params: {
    vddRange: [2, 6], // JESD7 restated: the family's supply range, with test points at 2, 4.5 and 6 V
    // JESD7 restated: 1.5 V @ 2 V, 3.15 @ 4.5, 3.85 @ 5.5, 4.2 @ 6. The line is exact at 2 and 6 V and above the table between.
    vih: '0.675*VDD+0.15',
    // JESD7 restated: 0.5 V @ 2 V, 1.35 @ 4.5, 1.8 @ 6. The line is exact at 2 and 6 V and below the table between.
    vil: '0.325*VDD-0.15',
    voh: [
      { v: 'VDD-0.1', i: 20e-6 }, // JESD7 restated: 1.9 / 4.4 / 5.9 V at 2 / 4.5 / 6 V
      { v: 'VDD-0.66', i: 4e-3, vddMin: 4.5 }, // JESD7 restated: 3.84 V @ 4 mA at 4.5 V, −40…85 °C
      { v: 'VDD-0.66', i: 5.2e-3, vddMin: 6 }, // JESD7 restated: 5.34 V @ 5.2 mA at 6 V, −40…85 °C
    ],
    vol: [
      { v: 0.1, i: 20e-6 }, // JESD7 restated: at 2, 4.5 and 6 V
      { v: 0.33, i: 4e-3, vddMin: 4.5 }, // JESD7 restated: 4 mA at 4.5 V, −40…85 °C
      { v: 0.33, i: 5.2e-3, vddMin: 6 }, // JESD7 restated: 5.2 mA at 6 V, −40…85 °C
    ],
    iih: 1e-6, // JESD7 restated: ±1 µA
    iil: 1e-6, // JESD7 restated: ±1 µA
    cin: 10e-12, // JESD7 restated: 10 pF
    viMax: 'VDD+0.5', // common practice: clamp diode to VCC
  },
});

/** 74HCT: TTL-compatible inputs, 74HC outputs, JESD7. */
export const hct = defineProfile({
  id: '74hct',
  label: '74HCT CMOS, TTL inputs (JESD7)',
  source:
    "JESD7 as restated in parts' DC tables; outputs as 74HC (4 mA rows at 4.5 V); clamp diodes: VDD+0.5 (common practice); " +
    'ΔICC 0.5 mA per input at VCC − 2.1 V from memory; all rows −40…85 °C',
  params: {
    vddRange: [4.5, 5.5], // JESD7 restated
    vih: 2, // JESD7 restated
    vil: 0.8, // JESD7 restated
    voh: [
      { v: 'VDD-0.1', i: 20e-6 }, // JESD7 restated, as 74HC
      { v: 'VDD-0.66', i: 4e-3 }, // JESD7 restated, as 74HC: 3.84 V @ 4 mA at 4.5 V
    ],
    vol: [
      { v: 0.1, i: 20e-6 }, // JESD7 restated, as 74HC
      { v: 0.33, i: 4e-3 }, // JESD7 restated, as 74HC
    ],
    iih: 1e-6, // JESD7 restated: ±1 µA
    iil: 1e-6, // JESD7 restated: ±1 µA
    cin: 10e-12, // JESD7 restated: 10 pF
    deltaIcc: 0.5e-3, // from memory: ΔICC per input about 0.5 mA (−40…85 °C)
    deltaIccDrop: 2.1, // from memory: ΔICC is tabulated with the input at VCC − 2.1 V
    viMax: 'VDD+0.5', // common practice: clamp diode to VCC
  },
});

/** 74AC: advanced CMOS, CMOS inputs. */
export const ac = defineProfile({
  id: '74ac',
  label: '74AC advanced CMOS',
  source:
    'from memory (24 mA rows at 4.5 V, −40…85 °C, carried up as VDD−0.74 / 0.44 V; 10 pF input); VDD+0.5 common practice',
  params: {
    vddRange: [4.5, 6], // 4.5 V: the 24 mA rows (from memory); 6 V family maximum (from memory)
    vih: '0.7*VDD', // from memory
    vil: '0.3*VDD', // from memory
    voh: [
      { v: 'VDD-0.1', i: 50e-6 }, // from memory
      { v: 'VDD-0.74', i: 24e-3 }, // from memory: 3.76 V @ 24 mA at 4.5 V
    ],
    vol: [
      { v: 0.1, i: 50e-6 }, // from memory
      { v: 0.44, i: 24e-3 }, // from memory
    ],
    iih: 1e-6, // from memory: ±1 µA
    iil: 1e-6, // from memory: ±1 µA
    cin: 10e-12, // from memory: 10 pF, the usual maximum of the family's tables
    viMax: 'VDD+0.5', // common practice: clamp diode to VCC
  },
});

/** 74ACT: advanced CMOS, TTL-compatible inputs. */
export const act = defineProfile({
  id: '74act',
  label: '74ACT advanced CMOS, TTL inputs',
  source:
    'from memory (24 mA rows at 4.5 V, −40…85 °C, carried up as VDD−0.74 / 0.44 V; 10 pF input); VDD+0.5 common practice',
  params: {
    vddRange: [4.5, 5.5], // from memory
    vih: 2, // from memory
    vil: 0.8, // from memory
    voh: [
      { v: 'VDD-0.1', i: 50e-6 }, // from memory
      { v: 'VDD-0.74', i: 24e-3 }, // from memory: 3.76 V @ 24 mA at 4.5 V
    ],
    vol: [
      { v: 0.1, i: 50e-6 }, // from memory
      { v: 0.44, i: 24e-3 }, // from memory
    ],
    iih: 1e-6, // from memory: ±1 µA
    iil: 1e-6, // from memory: ±1 µA
    cin: 10e-12, // from memory: 10 pF, the usual maximum of the family's tables
    deltaIcc: 1.5e-3, // from memory: ΔICC per input 1.5 mA (−40…85 °C)
    deltaIccDrop: 2.1, // from memory: ΔICC is tabulated with the input at VCC − 2.1 V
    viMax: 'VDD+0.5', // common practice: clamp diode to VCC
  },
});

/**
 * 74AHC: CMOS inputs that tolerate 5.5 V whatever the supply. The input limit is the profile's
 * `viMax`; a template's output pins of this family set `viMax: "VDD+0.5"` themselves.
 */
export const ahc = defineProfile({
  id: '74ahc',
  label: '74AHC CMOS, 5.5 V-tolerant inputs',
  source:
    "input tolerance (5.5 V whatever VDD) as restated in parts' DC tables; levels from a family datasheet's DC table " +
    '(−40…85 °C, from the review; 8 mA rows at 4.5 V, 3.8 V / 0.44 V, carried up as VDD−0.70 / 0.44 V; 10 pF input, from memory)',
  params: {
    vddRange: [4.5, 5.5], // 4.5 V: the 8 mA rows (from memory); 5.5 V family maximum (from memory)
    vih: '0.7*VDD', // from memory
    vil: '0.3*VDD', // from memory
    voh: [
      { v: 'VDD-0.1', i: 50e-6 }, // from memory
      // a family datasheet's DC table, −40…85 °C (from the review): 3.8 V @ 8 mA at 4.5 V; the
      // 3.94 V printed beside it is the 25 °C figure
      { v: 'VDD-0.7', i: 8e-3 },
    ],
    vol: [
      { v: 0.1, i: 50e-6 }, // from memory
      { v: 0.44, i: 8e-3 }, // from memory
    ],
    iih: 1e-6, // from memory: ±1 µA
    iil: 1e-6, // from memory: ±1 µA
    cin: 10e-12, // from memory: 10 pF, the usual maximum of the family's tables
    viMax: 5.5, // restated in parts' DC tables: inputs tolerate 5.5 V whatever VDD
  },
});

/** 74AHCT: TTL-compatible inputs that tolerate 5.5 V whatever the supply. */
export const ahct = defineProfile({
  id: '74ahct',
  label: '74AHCT CMOS, TTL inputs, 5.5 V-tolerant',
  source:
    "input tolerance (5.5 V whatever VDD) as restated in parts' DC tables; levels from a family datasheet's DC table " +
    '(−40…85 °C, from the review; 8 mA rows at 4.5 V, 3.8 V / 0.44 V, carried up as VDD−0.70 / 0.44 V; 10 pF input, from memory)',
  params: {
    vddRange: [4.5, 5.5], // from memory
    vih: 2, // from memory
    vil: 0.8, // from memory
    voh: [
      { v: 'VDD-0.1', i: 50e-6 }, // from memory
      // a family datasheet's DC table, −40…85 °C (from the review): 3.8 V @ 8 mA at 4.5 V; the
      // 3.94 V printed beside it is the 25 °C figure
      { v: 'VDD-0.7', i: 8e-3 },
    ],
    vol: [
      { v: 0.1, i: 50e-6 }, // from memory
      { v: 0.44, i: 8e-3 }, // from memory
    ],
    iih: 1e-6, // from memory: ±1 µA
    iil: 1e-6, // from memory: ±1 µA
    cin: 10e-12, // from memory: 10 pF, the usual maximum of the family's tables
    deltaIcc: 1.5e-3, // from memory: ΔICC per input 1.35–1.5 mA, 1.5 mA taken (−40…85 °C)
    deltaIccDrop: 2.1, // from memory: ΔICC is tabulated with the input at VCC − 2.1 V
    viMax: 5.5, // restated in parts' DC tables: inputs tolerate 5.5 V whatever VDD
  },
});
