import type { Profile } from '../model/schema.ts';
import { ac, act, ahc, ahct, hc, hct } from './cmos5v.ts';
import { cmos4000 } from './cmos4000.ts';
import { deepFreeze } from './define.ts';
import { mcuGpio, offBoard } from './generic.ts';
import { lvc, lvcmos12, lvcmos15, lvcmos18, lvcmos25, lvcmos33, lvttl33 } from './lowVoltage.ts';
import { ls, lsOpenCollector, ttl } from './ttl.ts';
import { i2c, i2cLowVoltage } from './twoWire.ts';
import { translatorOpenDrain, translatorSide } from './translators.ts';

/**
 * The built-in logic-family profiles, in the id order of design-format.md (version 1), then the
 * ids the library added since (dual-supply translator sides).
 * Deep-frozen: the library is shared by every design and must not be edited in place; a design
 * that needs other numbers declares a design-local profile instead.
 */
export const BUILTIN_PROFILES: readonly Profile[] = deepFreeze([
  ttl,
  ls,
  lsOpenCollector,
  hc,
  hct,
  ac,
  act,
  ahc,
  ahct,
  lvc,
  lvttl33,
  lvcmos33,
  lvcmos25,
  lvcmos18,
  lvcmos15,
  lvcmos12,
  cmos4000,
  i2c,
  i2cLowVoltage,
  mcuGpio,
  offBoard,
  translatorSide,
  translatorOpenDrain,
]);
