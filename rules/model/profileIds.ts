/**
 * The built-in profile ids (the design format names them, so the model holds the list; the
 * library in rules/profiles must have exactly these, test/profiles/builtin.test.ts): those of design file version 1 (design-format.md), in its order,
 * then the ids the library added since (`xlat-side`, `xlat-od`: dual-supply translator sides).
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
] as const satisfies readonly string[]);

export type BuiltinProfileId = (typeof BUILTIN_PROFILE_IDS)[number];
