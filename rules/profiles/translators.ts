/**
 * Dual-supply translators: one profile per kind of side. A translator part sits on its A-side
 * rail and gives its B pins the other rail (`pin.rail`), so each side's Levels are taken at its
 * own supply. The numbers are generic: common practice for such parts, from memory. A design
 * that settles on a part should take that part's datasheet into a design-local profile.
 */
import { defineProfile } from './define.ts';

const SOURCE =
  "common practice for dual-supply translators; numbers from memory — take the chosen part's datasheet " +
  'into a design-local profile.';

/**
 * A push-pull side of a one-direction translator (or a direction-controlled one, as three-state
 * bidir pins). Inputs scale with the side's own supply; outputs are the 1.8 V interface rows
 * carried up the supply.
 */
export const translatorSide = defineProfile({
  id: 'xlat-side',
  label: 'Dual-rail translator, direction-controlled push-pull side',
  source:
    `${SOURCE} Models the direction-controlled (or one-direction) push-pull class, not the auto-direction ` +
    'push-pull one (whose weak static drive these rows overstate). ' +
    'Each side relative to its own supply: inputs 0.65·VDD / 0.35·VDD; outputs VDD−0.2 / 0.2 V ' +
    'at 100 µA and VDD−0.45 / 0.45 V at 2 mA (the 1.8 V interface rows, carried up the supply); ' +
    'partial power-down: pins may carry 5.5 V on an unpowered side; −40…85 °C.',
  params: {
    // From memory: either supply of such parts commonly spans 1.65–5.5 V.
    vddRange: [1.65, 5.5],
    // From memory: the scaled thresholds of JESD8-7, held over the whole supply range (common practice for these parts).
    vih: '0.65*VDD',
    vil: '0.35*VDD',
    voh: [
      // JESD8-7's 100 µA row (from memory), carried up the supply unchanged: conservative, outputs get stronger with VDD.
      { v: 'VDD-0.2', i: 100e-6 },
      // JESD8-7's 2 mA row (restated in parts' DC tables), carried up the supply unchanged.
      { v: 'VDD-0.45', i: 2e-3 },
    ],
    vol: [
      { v: 0.2, i: 100e-6 }, // JESD8-7's 100 µA row (from memory)
      { v: 0.45, i: 2e-3 }, // JESD8-7's 2 mA row (restated), kept at every supply: conservative
    ],
    iih: 1e-6, // from memory: input leakage of the order of ±1 µA
    iil: 1e-6, // from memory: input leakage of the order of ±1 µA
    viMax: 'VDD+0.5', // common practice: clamp to the side's own supply while powered (conservative)
    unpoweredSafe: true, // common practice: such parts isolate a side whose supply is off (partial power-down)
    viMaxOff: 5.5, // from memory: an unpowered side's pins may carry up to 5.5 V
  },
});

/**
 * A side of a bidirectional translator for open-drain nets (two-wire buses, wired-OR alarms):
 * its pins are bidir with `drive: "open-drain"`, each side pulled up to its own rail.
 */
export const translatorOpenDrain = defineProfile({
  id: 'xlat-od',
  label: 'Dual-rail translator, auto-direction open-drain side',
  source:
    `${SOURCE} Models the auto-direction open-drain class (a pass switch with each side pulled up). ` +
    'Each side relative to its own supply: inputs 0.65·VDD / 0.35·VDD; open-drain sink 0.15 V at 1 mA ' +
    'and 0.3 V at 3 mA (inside the two-wire bus limit of 0.2·VDD at 3 mA even at 1.65 V); partial power-down: ' +
    'pins may carry 5.5 V on an unpowered side; −40…85 °C.',
  params: {
    vddRange: [1.65, 5.5], // from memory: the usual span of either supply
    vih: '0.65*VDD', // from memory: a fraction of the side's own supply
    vil: '0.35*VDD', // from memory: a fraction of the side's own supply
    vol: [
      { v: 0.15, i: 1e-3 }, // from memory: a switch of the order of 150 Ω when on
      // from memory; meets the I2C-bus specification's 0.2·VDD at 3 mA (0.33 V) from 1.65 V up
      { v: 0.3, i: 3e-3 },
    ],
    iih: 1e-6, // from memory: off-state leakage of the order of ±1 µA
    iil: 1e-6, // from memory: off-state leakage of the order of ±1 µA
    viMax: 'VDD+0.5', // common practice: clamp to the side's own supply while powered (conservative)
    unpoweredSafe: true, // common practice: such parts isolate a side whose supply is off (partial power-down)
    viMaxOff: 5.5, // from memory: an unpowered side's pins may carry up to 5.5 V
  },
});
