/**
 * Profiles that are starting points rather than a family's data: the engineer is expected to
 * override them per part or pin with the chosen part's datasheet values.
 */
import { defineProfile } from './define.ts';

/** A microcontroller GPIO: CMOS thresholds and static LVCMOS rows, at any supply (no `vddRange`). */
export const mcuGpio = defineProfile({
  id: 'mcu-gpio',
  label: 'Microcontroller GPIO (starting point)',
  source:
    'an editable starting point: CMOS thresholds 0.7/0.3·VDD and static LVCMOS rows (common practice), ' +
    'VDD+0.5 clamp (common practice)',
  params: {
    vih: '0.7*VDD', // common practice
    vil: '0.3*VDD', // common practice
    voh: [{ v: 'VDD-0.2', i: 100e-6 }], // common practice: static LVCMOS row
    vol: [{ v: 0.2, i: 100e-6 }], // common practice: static LVCMOS row
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
