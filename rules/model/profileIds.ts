/**
 * The built-in profile ids (the design format names them, so the model holds the list; the
 * library in rules/profiles must have exactly these, test/profiles/builtin.test.ts): those of
 * design file version 1 (design-format.md), in its order, then the ids the library added since
 * (`xlat-side`, `xlat-od`: dual-supply translator sides; a fast-mode two-wire pin, SMBus, 4000
 * unbuffered, 74LVC at 1.8 and 2.5 V and open-drain, BiCMOS 74LVT/74ABT-types, 74AVC/74AUC-types).
 * The library may add ids, never rename these: designs name them. The reader accepts a part's or a pin's
 * `profile` when it is one of these or a design-local profile's id.
 */
export const BUILTIN_PROFILE_IDS = Object.freeze([
  'ttl',
  '74ls',
  '74ls-oc',
  '74hc',
  '74hct',
  '74ac',
  '74act',
  '74ahc',
  '74ahct',
  '74lvc',
  'lvttl33',
  'lvcmos33',
  'lvcmos25',
  'lvcmos18',
  'lvcmos15',
  'lvcmos12',
  'cmos4000',
  'i2c',
  'i2c-lv',
  'mcu-gpio',
  'off-board',
  'xlat-side',
  'xlat-od',
  'i2c-fm',
  'smbus',
  'cmos4000-ub',
  '74lvc-18',
  '74lvc-25',
  '74lvc-od',
  '74lvt',
  '74abt',
  '74avc',
  '74auc',
] as const satisfies readonly string[]);

export type BuiltinProfileId = (typeof BUILTIN_PROFILE_IDS)[number];
