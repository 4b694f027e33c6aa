/**
 * 4000B-series CMOS, JESD13, over 5–15 V. The standard tabulates thresholds at 5, 10 and 15 V;
 * the lines below are exact at 5 and 15 V and conservative at 10 V.
 */
import { defineProfile } from './define.ts';

/** 4000B CMOS. */
export const cmos4000 = defineProfile({
  id: 'cmos4000',
  label: '4000B CMOS (JESD13)',
  source:
    'JESD13 as restated; VDD+0.5 clamp (common practice); thresholds as the conservative lines ' +
    '0.75·VDD−0.25 / 0.25·VDD+0.25 (exact at 5 and 15 V); 0.36 mA rows at 5 V (85 °C) carried up as VDD−0.4 / 0.4 V; ' +
    'rows −40…85 °C',
  params: {
    vddRange: [5, 15], // JESD13 restated: the tabulated supplies 5–15 V (the family runs 3–18 V)
    // JESD13 restated: 3.5 V @ 5 V, 7.0 @ 10, 11.0 @ 15; the line gives 3.5 / 7.25 / 11.0
    vih: '0.75*VDD-0.25',
    // JESD13 restated: 1.5 V @ 5 V, 3.0 @ 10, 4.0 @ 15; the line gives 1.5 / 2.75 / 4.0
    vil: '0.25*VDD+0.25',
    voh: [
      { v: 'VDD-0.05', i: 1e-6 }, // JESD13 restated: VDD−0.05 @ < 1 µA
      { v: 'VDD-0.4', i: 360e-6 }, // JESD13 restated: 4.6 V @ 0.36 mA at 5 V, 85 °C, carried up
    ],
    vol: [
      { v: 0.05, i: 1e-6 }, // JESD13 restated: 0.05 V @ < 1 µA
      { v: 0.4, i: 360e-6 }, // JESD13 restated: 0.4 V @ 0.36 mA at 5 V, 85 °C
    ],
    iih: 1e-6, // JESD13 restated: ±1 µA at 85 °C
    iil: 1e-6, // JESD13 restated: ±1 µA at 85 °C
    viMax: 'VDD+0.5', // common practice: clamp diode to VDD
  },
});

/**
 * 4000-series unbuffered (UB) gates: the same outputs, input thresholds at 80 / 20 % of the
 * supply at 5 V (JESD13's UB rows, restated: 4.0 / 1.0 V at 5 V; 8.0 / 2.0 at 10 V and 12.5 / 2.5
 * at 15 V from memory). Lines never optimistic at a tabulated point: VIH 0.85·VDD−0.25 (4.0 /
 * 8.25 / 12.5), VIL 0.15·VDD+0.25 (1.0 / 1.75 / 2.5).
 */
export const cmos4000Unbuffered = defineProfile({
  id: 'cmos4000-ub',
  label: '4000 CMOS, unbuffered (UB) inputs (JESD13)',
  source:
    'JESD13 UB rows as restated: VIH/VIL 4.0/1.0 V at 5 V; 10 and 15 V rows from memory; thresholds as the ' +
    'conservative lines 0.85·VDD−0.25 / 0.15·VDD+0.25 (exact at 5 and 15 V); outputs, currents and clamp as 4000B; ' +
    'rows −40…85 °C',
  params: {
    vddRange: [5, 15], // JESD13 restated: the tabulated supplies
    vih: '0.85*VDD-0.25', // JESD13 UB: 4.0 V @ 5 V (restated), 8.0 @ 10, 12.5 @ 15 (from memory)
    vil: '0.15*VDD+0.25', // JESD13 UB: 1.0 V @ 5 V (restated), 2.0 @ 10, 2.5 @ 15 (from memory)
    voh: [
      { v: 'VDD-0.05', i: 1e-6 }, // JESD13 restated, as 4000B
      { v: 'VDD-0.4', i: 360e-6 }, // JESD13 restated, as 4000B: 0.36 mA at 5 V, 85 °C
    ],
    vol: [
      { v: 0.05, i: 1e-6 }, // JESD13 restated, as 4000B
      { v: 0.4, i: 360e-6 }, // JESD13 restated, as 4000B
    ],
    iih: 1e-6, // JESD13 restated: ±1 µA at 85 °C
    iil: 1e-6, // JESD13 restated: ±1 µA at 85 °C
    viMax: 'VDD+0.5', // common practice: clamp diode to VDD
  },
});
