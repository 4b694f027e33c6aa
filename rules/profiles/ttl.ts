/**
 * Bipolar TTL at 5 V ± 5 %. Levels and input currents are the handbook's tables; an input's
 * low-level current flows out of the input, and is stored as a magnitude.
 */
import { defineProfile } from './define.ts';

/** Standard 74-series TTL. */
export const ttl = defineProfile({
  id: 'ttl',
  label: 'Standard TTL (5 V)',
  source: 'handbook table (bipolar TTL, 5 V ± 5 %, commercial 0…70 °C); input limit 5.5 V and 5 pF input from memory',
  params: {
    vddRange: [4.75, 5.25], // handbook: 5 V ± 5 %
    vih: 2, // handbook
    vil: 0.8, // handbook
    voh: [{ v: 2.4, i: 400e-6 }], // handbook: 2.4 V @ 0.4 mA
    vol: [{ v: 0.4, i: 16e-3 }], // handbook: 0.4 V @ 16 mA
    iih: 40e-6, // handbook: 40 µA
    iil: 1.6e-3, // handbook: 1.6 mA, out of the input
    cin: 5e-12, // from memory: a few pF (5 pF taken) for a bipolar input
    viMax: 5.5, // from memory
  },
});

/** 74LS low-power Schottky TTL. */
export const ls = defineProfile({
  id: '74ls',
  label: '74LS low-power Schottky TTL',
  source: 'handbook table (bipolar TTL, 5 V ± 5 %, commercial 0…70 °C); input limit 7 V and 5 pF input from memory',
  params: {
    vddRange: [4.75, 5.25], // handbook: 5 V ± 5 %
    vih: 2, // handbook
    vil: 0.8, // handbook
    voh: [{ v: 2.7, i: 400e-6 }], // handbook: 2.7 V @ 0.4 mA
    vol: [
      { v: 0.4, i: 4e-3 }, // handbook: 0.4 V @ 4 mA
      { v: 0.5, i: 8e-3 }, // handbook: 0.5 V @ 8 mA
    ],
    iih: 20e-6, // handbook: 20 µA
    iil: 400e-6, // handbook: 0.4 mA, out of the input
    cin: 5e-12, // from memory: a few pF (5 pF taken) for a bipolar input
    viMax: 7, // from memory
  },
});

/**
 * A 74LS open-collector output. It has no input side and no high drive: the pull-up makes the
 * high level, so only the sink row and the off-state leakage (as `iih`) are modelled.
 */
export const lsOpenCollector = defineProfile({
  id: '74ls-oc',
  label: '74LS open-collector output',
  source:
    'handbook (74LS open-collector data pages, commercial 0…70 °C): off leakage ≤ 0.1 mA at 5.5 V, VOL 0.5 V @ 8 mA',
  params: {
    vddRange: [4.75, 5.25], // handbook: 5 V ± 5 %
    vol: [{ v: 0.5, i: 8e-3 }], // handbook: 0.5 V @ 8 mA
    iih: 100e-6, // handbook: off-state leakage ≤ 0.1 mA at 5.5 V
    viMax: 5.5, // handbook: the leakage is specified up to 5.5 V
  },
});
