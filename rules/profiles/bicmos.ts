/**
 * BiCMOS bus-interface logic with TTL input levels: 74LVT-type at 3.3 V (5 V-tolerant) and
 * 74ABT-type at 5 V. Numbers from memory; a design that settles on a part should take that
 * part's datasheet into a design-local profile.
 */
import { defineProfile } from './define.ts';

/** 74LVT-type: 3.3 V BiCMOS, TTL levels, 5.5 V-tolerant, partial power-down. */
export const lvt = defineProfile({
  id: '74lvt',
  label: '74LVT-type 3.3 V BiCMOS, TTL levels, 5.5 V-tolerant',
  source:
    "from memory (the family's DC table at 3.0 V, −40…85 °C): inputs 2.0 / 0.8 V; VOH VDD−0.2 V @ 100 µA and " +
    '2.0 V @ 32 mA; VOL 0.2 V @ 100 µA, 0.5 V @ 32 mA and 0.55 V @ 64 mA; ±1 µA, 5 pF; inputs and outputs ' +
    'tolerate 5.5 V, powered or not',
  params: {
    vddRange: [3, 3.6], // from memory: the 32 mA rows are given from 3.0 V
    vih: 2, // from memory: TTL levels
    vil: 0.8, // from memory
    voh: [
      { v: 'VDD-0.2', i: 100e-6 }, // from memory
      { v: 2, i: 32e-3 }, // from memory: 2.0 V @ 32 mA at 3.0 V
    ],
    vol: [
      { v: 0.2, i: 100e-6 }, // from memory
      { v: 0.5, i: 32e-3 }, // from memory
      { v: 0.55, i: 64e-3 }, // from memory
    ],
    iih: 1e-6, // from memory: ±1 µA
    iil: 1e-6, // from memory: ±1 µA
    cin: 5e-12, // from memory: about 4 pF, 5 pF taken
    viMax: 5.5, // from memory: 5 V-tolerant inputs
    unpoweredSafe: true, // from memory: partial power-down (Ioff) specified
    viMaxOff: 5.5, // from memory
  },
});

/** 74ABT-type: 5 V BiCMOS, TTL levels. */
export const abt = defineProfile({
  id: '74abt',
  label: '74ABT-type 5 V BiCMOS, TTL levels',
  source:
    "from memory (the family's DC table at 4.5 V, −40…85 °C): inputs 2.0 / 0.8 V; VOH 2.5 V @ 3 mA and " +
    '2.0 V @ 32 mA; VOL 0.55 V @ 64 mA; ±1 µA, 5 pF; input limit 5.5 V (common practice for a 5 V part)',
  params: {
    vddRange: [4.5, 5.5], // from memory
    vih: 2, // from memory: TTL levels
    vil: 0.8, // from memory
    voh: [
      { v: 2.5, i: 3e-3 }, // from memory
      { v: 2, i: 32e-3 }, // from memory
    ],
    vol: [{ v: 0.55, i: 64e-3 }], // from memory
    iih: 1e-6, // from memory: ±1 µA
    iil: 1e-6, // from memory: ±1 µA
    cin: 5e-12, // from memory: about 4 pF, 5 pF taken
    viMax: 5.5, // common practice: a 5 V part's inputs
  },
});
