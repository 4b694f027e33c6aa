import type { Profile } from '../model/schema.ts';
import { ac, act, ahc, ahct, hc, hct } from './cmos5v.ts';
import { cmos4000, cmos4000Unbuffered } from './cmos4000.ts';
import { abt, lvt } from './bicmos.ts';
import { auc, avc } from './avc.ts';
import { deepFreeze } from './define.ts';
import { mcuGpio, offBoard } from './generic.ts';
import {
  lvc,
  lvc18,
  lvc25,
  lvcOpenDrain,
  lvcmos12,
  lvcmos15,
  lvcmos18,
  lvcmos25,
  lvcmos33,
  lvttl33,
} from './lowVoltage.ts';
import { ls, lsOpenCollector, ttl } from './ttl.ts';
import { i2c, i2cFastMode, i2cLowVoltage, smbus } from './twoWire.ts';
import { translatorOpenDrain, translatorSide } from './translators.ts';

/**
 * The built-in logic-family profiles, in the id order of design-format.md (version 1), then the
 * ids the library added since (ids.ts lists them).
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
  i2cFastMode,
  smbus,
  cmos4000Unbuffered,
  lvc18,
  lvc25,
  lvcOpenDrain,
  lvt,
  abt,
  avc,
  auc,
]);
