/**
 * The reader against design-format.md's list of what must be refused (our own format; the
 * list is transcribed into the cases below). Every refusal case breaks one thing in a valid
 * design and expects the JSON path of the break and a word of what was expected.
 */
import { describe, expect, it } from 'vitest';
import { MAX_ERRORS, readDesign, validateDesign, type DesignError } from '../../rules/model/index.ts';
import { greenhouse } from './fixtures.ts';

// `any`: the cases break the types on purpose.
// biome-ignore lint/suspicious/noExplicitAny: these tests build malformed documents on purpose
type Doc = any;

interface Refusal {
  name: string;
  /** Break the design in place, or return the text to read instead. */
  breakIt: (d: Doc) => undefined | string;
  path: string;
  /** A word of the message (what was expected, or what was found). */
  says: string;
}

const refusals: Refusal[] = [
  // Not JSON
  {
    name: 'not JSON',
    breakIt: () => '{"format": "railcross.design",\n  "version": 1,,\n}',
    path: '(root)',
    says: 'line 2, column 16',
  },
  { name: 'empty text', breakIt: () => '', path: '(root)', says: 'Not JSON' },
  { name: 'truncated file', breakIt: (d) => JSON.stringify(d).slice(0, -1), path: '(root)', says: 'Not JSON' },
  // format or version wrong
  {
    name: 'format of another kind',
    breakIt: (d) => void (d.format = 'some.other.format'),
    path: 'format',
    says: 'not a Railcross design',
  },
  { name: 'format missing', breakIt: (d) => void delete d.format, path: 'format', says: 'not a Railcross design' },
  { name: 'document is an array', breakIt: () => '[1, 2]', path: '(root)', says: 'not a Railcross design' },
  { name: 'document is null', breakIt: () => 'null', path: '(root)', says: 'not a Railcross design' },
  { name: 'version from the future', breakIt: (d) => void (d.version = 3), path: 'version', says: 'newer' },
  { name: 'version a string', breakIt: (d) => void (d.version = '1'), path: 'version', says: 'expected version 2' },
  { name: 'version missing', breakIt: (d) => void delete d.version, path: 'version', says: 'expected version 2' },
  { name: 'version zero', breakIt: (d) => void (d.version = 0), path: 'version', says: 'expected version 2' },
  // missing required key, wrong type
  { name: 'title missing', breakIt: (d) => void delete d.title, path: 'title', says: 'missing' },
  { name: 'nets missing', breakIt: (d) => void delete d.nets, path: 'nets', says: 'expected an array' },
  {
    name: 'pin role missing',
    breakIt: (d) => void delete d.parts[1].pins[0].role,
    path: 'parts[1].pins[0].role',
    says: 'missing',
  },
  {
    name: 'nominal a string',
    breakIt: (d) => void (d.rails[1].nominal = '3.3'),
    path: 'rails[1].nominal',
    says: 'expected a number',
  },
  {
    name: 'nominal too large to be finite',
    breakIt: (d) => JSON.stringify(d).replace('"nominal":5,', '"nominal":1e999,'),
    path: 'rails[0].nominal',
    says: 'finite',
  },
  {
    name: 'pins not an array',
    breakIt: (d) => void (d.parts[2].pins = {}),
    path: 'parts[2].pins',
    says: 'expected an array',
  },
  {
    name: 'role not one of three',
    breakIt: (d) => void (d.parts[0].pins[1].role = 'in'),
    path: 'parts[0].pins[1].role',
    says: '"input", "output" or "bidir"',
  },
  {
    name: 'drive misspelt',
    breakIt: (d) => void (d.parts[0].pins[0].drive = 'open-collector'),
    path: 'parts[0].pins[0].drive',
    says: '"open-drain"',
  },
  {
    name: 'unpoweredSafe a string',
    breakIt: (d) => void (d.parts[1].params.unpoweredSafe = 'no'),
    path: 'parts[1].params.unpoweredSafe',
    says: 'true or false',
  },
  {
    name: 'route pair of three',
    breakIt: (d) => void d.nets[2].route[0].push('U1.SDA'),
    path: 'nets[2].route[0]',
    says: 'at most 2',
  },
  {
    name: 'unknown key (strict in v1)',
    breakIt: (d) => void (d.parts[0].footprint = 'QFN'),
    path: 'parts[0].footprint',
    says: 'unknown key',
  },
  {
    name: 'unknown top-level key',
    breakIt: (d) => void (d.author = 'me'),
    path: 'author',
    says: 'expected only format, version',
  },
  {
    name: '__proto__ key',
    breakIt: (d) => JSON.stringify(d).replace('{"id":"EN"', '{"__proto__":{"role":"input"},"id":"EN"'),
    path: 'parts[1].pins[0].__proto__',
    says: 'unknown key',
  },
  {
    name: 'empty profile source',
    breakIt: (d) => void (d.profiles[0].source = '  '),
    path: 'profiles[0].source',
    says: 'non-empty source',
  },
  { name: 'empty part id', breakIt: (d) => void (d.parts[4].id = ''), path: 'parts[4].id', says: 'non-empty' },
  // version 2: the parts between chips
  {
    name: 'discrete of an unknown kind',
    breakIt: (d) => void (d.discretes[0].kind = 'capacitor'),
    path: 'discretes[0].kind',
    says: '"resistor", "fet-shifter" or "diode-shifter"',
  },
  {
    name: 'resistor without a value',
    breakIt: (d) => void delete d.discretes[0].ohms,
    path: 'discretes[0].ohms',
    says: 'missing',
  },
  {
    name: 'resistor of zero ohms',
    breakIt: (d) => void (d.discretes[1].ohms = 0),
    path: 'discretes[1].ohms',
    says: 'resistance (Ω) from 1 mΩ',
  },
  {
    name: 'negative resistor tolerance',
    breakIt: (d) => void (d.discretes[0].tolerance = -0.01),
    path: 'discretes[0].tolerance',
    says: '0 or more',
  },
  {
    name: 'resistor tied to an unknown rail',
    breakIt: (d) => void (d.discretes[1].tie['2'] = 'vbat'),
    path: 'discretes[1].tie["2"]',
    says: '"ground" or a rail id',
  },
  {
    name: 'FET gate on an unknown rail',
    breakIt: (d) => void (d.discretes[2].gate = '1v2'),
    path: 'discretes[2].gate',
    says: 'unknown rail',
  },
  {
    name: 'FET without a threshold',
    breakIt: (d) => void delete d.discretes[2].vgsThMax,
    path: 'discretes[2].vgsThMax',
    says: 'missing',
  },
  {
    name: 'diode with a negative leakage',
    breakIt: (d) => void (d.discretes[3].leakageMax = -1e-6),
    path: 'discretes[3].leakageMax',
    says: '0 or more',
  },
  {
    name: 'discrete with the id of a part',
    breakIt: (d) => void (d.discretes[3].id = 'U2'),
    path: 'discretes[3].id',
    says: 'unique among parts and discretes',
  },
  {
    name: 'two discretes of one id',
    breakIt: (d) => void (d.discretes[1].id = 'R9'),
    path: 'discretes[1].id',
    says: 'unique among parts and discretes',
  },
  {
    name: 'discrete id with a dot',
    breakIt: (d) => void (d.discretes[0].id = 'R.9'),
    path: 'discretes[0].id',
    says: 'without "."',
  },
  {
    name: 'net names a tied resistor end',
    breakIt: (d) => void d.nets[4].pins.push('R10.2'),
    path: 'nets[4].pins[3]',
    says: 'tied at discretes[1].tie["2"]',
  },
  {
    name: 'net names a pin a FET has not',
    breakIt: (d) => void d.nets[4].pins.push('Q1.G'),
    path: 'nets[4].pins[3]',
    says: 'has no pin "G"',
  },
  {
    name: 'negative injection limit',
    breakIt: (d) => void (d.parts[1].params.injectionMax = -1e-3),
    path: 'parts[1].params.injectionMax',
    says: '0 or more',
  },
  {
    name: 'bus-hold without its overdrive current',
    breakIt: (d) => void (d.parts[1].params.busHold = { hold: 75e-6 }),
    path: 'parts[1].params.busHold.overdrive',
    says: 'missing',
  },
  {
    name: 'viMin that does not parse',
    breakIt: (d) => void (d.parts[1].params.viMin = '-0.5V'),
    path: 'parts[1].params.viMin',
    says: 'Level',
  },
  {
    name: 'negative rail minimum load',
    breakIt: (d) => void (d.rails[1].minLoad = -0.01),
    path: 'rails[1].minLoad',
    says: '0 or more',
  },
  // unknown rail, profile or pin in a reference
  {
    name: 'part on an unknown rail',
    breakIt: (d) => void (d.parts[0].rail = '3v0'),
    path: 'parts[0].rail',
    says: 'unknown rail "3v0"',
  },
  {
    name: 'pin on an unknown rail',
    breakIt: (d) => void (d.parts[2].pins[0].rail = '1v5'),
    path: 'parts[2].pins[0].rail',
    says: 'expected a rail id',
  },
  {
    name: 'pin pull to an unknown rail',
    breakIt: (d) => void (d.parts[0].pins[3].pull.to = 'vcc'),
    path: 'parts[0].pins[3].pull.to',
    says: '"ground" or a rail id',
  },
  {
    name: 'net pull to an unknown rail',
    breakIt: (d) => void (d.nets[1].pull.to = 'GND'),
    path: 'nets[1].pull.to',
    says: '"ground" or a rail id',
  },
  {
    name: 'scenario turns off an unknown rail',
    breakIt: (d) => void (d.scenarios[1].off[1] = '1v2'),
    path: 'scenarios[1].off[1]',
    says: 'unknown rail',
  },
  {
    name: 'part with an unknown profile',
    breakIt: (d) => void (d.parts[2].profile = '74xyz'),
    path: 'parts[2].profile',
    says: 'built-in profile id',
  },
  {
    name: 'pin with an unknown profile',
    breakIt: (d) => void (d.parts[1].pins[1].profile = 'open-collector'),
    path: 'parts[1].pins[1].profile',
    says: 'unknown profile',
  },
  {
    name: 'net names an unknown pin',
    breakIt: (d) => void (d.nets[3].pins[1] = 'U1.ALARM'),
    path: 'nets[3].pins[1]',
    says: 'has no pin "ALARM"',
  },
  {
    name: 'net names an unknown part',
    breakIt: (d) => void (d.nets[0].pins[1] = 'U9.SDA'),
    path: 'nets[0].pins[1]',
    says: 'unknown part "U9"',
  },
  {
    name: 'net pin not written PART.PIN',
    breakIt: (d) => void (d.nets[4].pins[0] = 'PROBE'),
    path: 'nets[4].pins[0]',
    says: 'PART.PIN',
  },
  // duplicate ids
  {
    name: 'duplicate rail id',
    breakIt: (d) => void (d.rails[2].id = '5v0'),
    path: 'rails[2].id',
    says: 'unique among rails',
  },
  {
    name: 'duplicate scenario id',
    breakIt: (d) => void (d.scenarios[1].id = 'standby'),
    path: 'scenarios[1].id',
    says: 'unique among scenarios',
  },
  {
    name: 'duplicate profile id',
    breakIt: (d) => void (d.profiles[1].id = 'valve-driver'),
    path: 'profiles[1].id',
    says: 'unique among profiles',
  },
  {
    name: 'duplicate part id',
    breakIt: (d) => void (d.parts[3].id = 'U3'),
    path: 'parts[3].id',
    says: 'unique among parts',
  },
  {
    name: 'duplicate net id',
    breakIt: (d) => void (d.nets[4].id = 'VALVE_EN'),
    path: 'nets[4].id',
    says: 'unique among nets',
  },
  {
    name: 'duplicate pin id within a part',
    breakIt: (d) => void (d.parts[0].pins[4].id = 'SDA'),
    path: 'parts[0].pins[4].id',
    says: 'unique within part U1',
  },
  // reserved and forbidden ids
  {
    name: 'scenario id all-on',
    breakIt: (d) => void (d.scenarios[0].id = 'all-on'),
    path: 'scenarios[0].id',
    says: 'other than "all-on"',
  },
  {
    name: 'part id with a dot',
    breakIt: (d) => void (d.parts[4].id = 'J1.A'),
    path: 'parts[4].id',
    says: 'without "."',
  },
  {
    name: 'pin id with a dot',
    breakIt: (d) => void (d.parts[4].pins[0].id = 'P.1'),
    path: 'parts[4].pins[0].id',
    says: 'without "."',
  },
  {
    name: 'net id with a dot',
    breakIt: (d) => void (d.nets[0].id = 'I2C.SDA'),
    path: 'nets[0].id',
    says: 'without "."',
  },
  {
    name: 'rail id with a colon',
    breakIt: (d) => void (d.rails[3].id = 'probe:3v0'),
    path: 'rails[3].id',
    says: 'without ":" or ">"',
  },
  {
    name: 'scenario id with >',
    breakIt: (d) => void (d.scenarios[0].id = 'on>off'),
    path: 'scenarios[0].id',
    says: 'without ":" or ">"',
  },
  {
    name: 'profile id with a colon',
    breakIt: (d) => void (d.profiles[0].id = 'valve:driver'),
    path: 'profiles[0].id',
    says: 'without ":" or ">"',
  },
  {
    name: 'part id with a colon',
    breakIt: (d) => void (d.parts[0].id = 'U:1'),
    path: 'parts[0].id',
    says: 'without ":" or ">"',
  },
  {
    name: 'pin id with >',
    breakIt: (d) => void (d.parts[0].pins[0].id = 'A>B'),
    path: 'parts[0].pins[0].id',
    says: 'without ":" or ">"',
  },
  {
    name: 'net id with a colon',
    breakIt: (d) => void (d.nets[2].id = 'VALVE:EN'),
    path: 'nets[2].id',
    says: 'without ":" or ">"',
  },
  {
    name: 'rail id "ground" (pull.to reserves it)',
    breakIt: (d) => void (d.rails[1].id = 'ground'),
    path: 'rails[1].id',
    says: 'other than "ground"',
  },
  // a pin named twice in nets: the second occurrence
  {
    name: 'pin on two nets',
    breakIt: (d) => void d.nets[4].pins.push('U1.SDA'),
    path: 'nets[4].pins[3]',
    says: 'already at nets[0].pins[0]',
  },
  {
    name: 'pin twice on one net',
    breakIt: (d) => void d.nets[5].pins.push('U3.B1'),
    path: 'nets[5].pins[3]',
    says: 'one net at most',
  },
  // a Level that does not parse
  {
    name: 'Level with two VDD in a term',
    breakIt: (d) => void (d.profiles[1].params.vih = '0.7*VDD*VDD'),
    path: 'profiles[1].params.vih',
    says: 'at most one VDD',
  },
  {
    name: 'Level with a percent sign',
    breakIt: (d) => void (d.profiles[1].params.vil = '30%'),
    path: 'profiles[1].params.vil',
    says: 'expected a Level',
  },
  {
    name: 'Level of the wrong type',
    breakIt: (d) => void (d.profiles[0].params.viMax = true),
    path: 'profiles[0].params.viMax',
    says: 'expected a Level',
  },
  {
    name: 'Level in a schmitt pair',
    breakIt: (d) => void (d.profiles[1].params.schmitt.vtMinus = 'VDD/3'),
    path: 'profiles[1].params.schmitt.vtMinus',
    says: 'expected a Level',
  },
  {
    name: 'schmitt pair missing a Level',
    breakIt: (d) => void delete d.profiles[1].params.schmitt.vtPlus,
    path: 'profiles[1].params.schmitt.vtPlus',
    says: 'missing',
  },
  {
    name: 'Level in an output point',
    breakIt: (d) => void (d.parts[4].pins[0].params.voh[0].v = '2.4V'),
    path: 'parts[4].pins[0].params.voh[0].v',
    says: 'expected a Level',
  },
  {
    name: 'Level ending in an operator',
    breakIt: (d) => void (d.parts[0].pins[3].params.viMax = 'VDD+'),
    path: 'parts[0].pins[3].params.viMax',
    says: 'at the end',
  },
  // resistance not positive
  {
    name: 'pull of 0 Ω',
    breakIt: (d) => void (d.nets[0].pull.ohms = 0),
    path: 'nets[0].pull.ohms',
    says: 'resistance (Ω) from 1 mΩ to 1 TΩ',
  },
  {
    name: 'pull of negative ohms',
    breakIt: (d) => void (d.parts[3].pins[2].pull.ohms = -100e3),
    path: 'parts[3].pins[2].pull.ohms',
    says: 'resistance (Ω) from 1 mΩ to 1 TΩ',
  },
  // a pull's range (design-format: min ≤ ohms ≤ max, tolerance a fraction below 1)
  {
    name: 'pull min above its ohms',
    breakIt: (d) => void (d.nets[0].pull.min = 5e3),
    path: 'nets[0].pull',
    says: 'min ≤ ohms ≤ max',
  },
  {
    name: 'pull max below its ohms',
    breakIt: (d) => void (d.nets[0].pull.max = 4e3),
    path: 'nets[0].pull',
    says: 'min ≤ ohms ≤ max',
  },
  {
    name: 'pull tolerance of 1',
    breakIt: (d) => void (d.nets[0].pull.tolerance = 1),
    path: 'nets[0].pull.tolerance',
    says: 'below 1',
  },
  // negative capacitance, current, time, ramp or tolerance
  {
    name: 'negative input capacitance',
    breakIt: (d) => void (d.profiles[0].params.cin = -5e-12),
    path: 'profiles[0].params.cin',
    says: 'capacitance',
  },
  {
    name: 'negative wiring capacitance',
    breakIt: (d) => void (d.nets[1].wiringCapacitance = -1e-12),
    path: 'nets[1].wiringCapacitance',
    says: 'capacitance',
  },
  {
    name: 'negative default wiring capacitance',
    breakIt: (d) => void (d.settings.defaultWiringCapacitance = -5e-12),
    path: 'settings.defaultWiringCapacitance',
    says: '0 or more',
  },
  {
    name: 'negative input current',
    breakIt: (d) => void (d.profiles[0].params.iil = -1.6e-3),
    path: 'profiles[0].params.iil',
    says: 'current',
  },
  {
    name: 'negative output-point current',
    breakIt: (d) => void (d.profiles[1].params.vol[0].i = -4e-3),
    path: 'profiles[1].params.vol[0].i',
    says: 'current',
  },
  {
    name: 'negative ioMax',
    breakIt: (d) => void (d.profiles[1].params.ioMax = -0.02),
    path: 'profiles[1].params.ioMax',
    says: 'current',
  },
  {
    name: 'negative rise time',
    breakIt: (d) => void (d.nets[0].maxRiseTime = -300e-9),
    path: 'nets[0].maxRiseTime',
    says: 'time',
  },
  {
    name: 'negative input ramp',
    breakIt: (d) => void (d.profiles[1].params.maxInputRamp = -1e-7),
    path: 'profiles[1].params.maxInputRamp',
    says: 'ramp',
  },
  {
    name: 'negative tolerance',
    breakIt: (d) => void (d.rails[2].tolerance = -0.03),
    path: 'rails[2].tolerance',
    says: 'tolerance',
  },
  // rail or vddRange minimum above maximum
  {
    name: 'rail min above its tolerance max',
    breakIt: (d) => void (d.rails[0].min = 5.3),
    path: 'rails[0].min',
    says: 'minimum ≤ its maximum',
  },
  {
    name: 'rail max below its tolerance min',
    breakIt: (d) => void (d.rails[1].max = 3.1),
    path: 'rails[1].max',
    says: 'minimum ≤ its maximum',
  },
  {
    name: 'negative rail from its tolerance alone (min = nominal × 0.95 > max)',
    breakIt: (d) => void d.rails.push({ id: 'n5v0', label: '−5 V', nominal: -5 }),
    path: 'rails[4]',
    says: 'explicit min and max',
  },
  {
    name: 'rail explicit min above explicit max',
    breakIt: (d) => void (d.rails[3].min = 3.3),
    path: 'rails[3].min',
    says: 'minimum ≤ its maximum',
  },
  {
    name: 'vddRange reversed',
    breakIt: (d) => void (d.profiles[0].params.vddRange = [5.5, 4.5]),
    path: 'profiles[0].params.vddRange',
    says: 'min ≤ max',
  },
  {
    name: 'vddRange of one number',
    breakIt: (d) => void (d.profiles[0].params.vddRange = [4.5]),
    path: 'profiles[0].params.vddRange',
    says: 'at least 2',
  },
  // route pair naming a pin not on that net
  {
    name: 'route names a pin of another net',
    breakIt: (d) => void (d.nets[2].route[0][1] = 'U1.SDA'),
    path: 'nets[2].route[0][1]',
    says: 'not on net "VALVE_EN"',
  },
  {
    name: 'route names an unknown pin',
    breakIt: (d) => void (d.nets[5].route[1][0] = 'U7.Q'),
    path: 'nets[5].route[1][0]',
    says: 'expected a pin of its "pins"',
  },
  // waiver naming an unknown rule or scenario
  {
    name: 'waiver of an unknown rule',
    breakIt: (d) => void (d.nets[3].waivers[0].rule = 'level-hi'),
    path: 'nets[3].waivers[0].rule',
    says: 'expected a rule id',
  },
  {
    name: 'waiver in an unknown scenario',
    breakIt: (d) => void (d.nets[2].waivers[0].scenario = 'stand-by'),
    path: 'nets[2].waivers[0].scenario',
    says: 'unknown scenario "stand-by"',
  },
  {
    name: 'waiver without a note',
    breakIt: (d) => void delete d.nets[3].waivers[1].note,
    path: 'nets[3].waivers[1].note',
    says: 'missing',
  },
  // a lone pin's waiver, held by the pin, refused as a net's is
  {
    name: "a pin's waiver in an unknown scenario",
    breakIt: (d) => void (d.parts[0].pins[0].waivers = [{ rule: 'floating-input', scenario: 'stand-by', note: 'x' }]),
    path: 'parts[0].pins[0].waivers[0].scenario',
    says: 'unknown scenario "stand-by"',
  },
  {
    name: "a pin's waiver of an unknown rule",
    breakIt: (d) => void (d.parts[0].pins[0].waivers = [{ rule: 'floating', note: 'x' }]),
    path: 'parts[0].pins[0].waivers[0].rule',
    says: 'expected a rule id',
  },
];

interface Accepted {
  name: string;
  change: (d: Doc) => void;
}

const accepted: Accepted[] = [
  { name: 'the design as it is', change: () => {} },
  {
    name: "a pin's waiver in every power state and in one",
    change: (d) => {
      d.parts[0].pins[0].waivers = [
        { rule: 'floating-input', note: 'spare input, tied on the next board revision' },
        { rule: 'overvoltage', scenario: d.scenarios[0].id, note: 'x' },
      ];
    },
  },
  {
    name: 'rail, scenario and profile ids may contain "."',
    change: (d) => {
      d.rails[0].id = 'v5.0';
      d.parts[1].rail = 'v5.0';
      d.scenarios[0].off = ['v5.0'];
    },
  },
  {
    name: 'a waiver in the all-on state',
    change: (d) => void (d.nets[0].waivers = [{ rule: 'edge-rate', scenario: 'all-on', note: 'slow bus' }]),
  },
  {
    name: 'a design-local profile shadows a built-in id',
    change: (d) => {
      d.profiles[0].id = '74hc';
      d.parts[1].profile = '74hc';
    },
  },
  {
    name: 'a negative rail with an explicit range',
    change: (d) => void d.rails.push({ id: 'n5v0', label: '−5 V', nominal: -5, min: -5.25, max: -4.75 }),
  },
  {
    name: 'min equal to max',
    change: (d) => {
      d.rails[3].min = 3;
      d.rails[3].max = 3;
    },
  },
  {
    name: 'zero capacitance, current, time and tolerance',
    change: (d) => {
      d.nets[1].wiringCapacitance = 0;
      d.nets[0].maxRiseTime = 0;
      d.rails[0].tolerance = 0;
      d.profiles[0].params.iih = 0;
    },
  },
  {
    name: 'a net with no pins and one with one',
    change: (d) => {
      d.nets.push({ id: 'SPARE', pins: [] }, { id: 'TP1', pins: ['U4.DRDY'] });
      d.nets[5].pins.pop();
      d.nets[5].route.pop();
    },
  },
  {
    name: 'no scenarios, profiles or settings keys',
    change: (d) => {
      delete d.scenarios;
      delete d.settings;
      delete d.profiles;
      d.parts[1].profile = 'ttl';
      d.parts[0].profile = 'mcu-gpio';
      d.nets[2].waivers[0].scenario = 'all-on';
    },
  },
  { name: 'a byte-order mark before the JSON', change: () => {} },
];

function read(c: Refusal): ReturnType<typeof readDesign> {
  const d = greenhouse() as Doc;
  const text = c.breakIt(d);
  return readDesign(typeof text === 'string' ? text : JSON.stringify(d, null, 2));
}

describe('readDesign refuses', () => {
  it('every case in the table is named once', () => {
    expect(new Set(refusals.map((c) => c.name)).size).toBe(refusals.length);
  });

  it.each(refusals)('$name at $path', (c) => {
    const r = read(c);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    const hit = r.errors.find((e) => e.path === c.path);
    expect(hit, `errors: ${JSON.stringify(r.errors)}`).toBeDefined();
    expect(hit!.message).toContain(c.says);
  });
});

describe('readDesign accepts', () => {
  it.each(accepted)('$name', ({ name, change }) => {
    const d = greenhouse() as Doc;
    change(d);
    const text = (name.includes('byte-order') ? '\uFEFF' : '') + JSON.stringify(d);
    const r = readDesign(text);
    expect(r.ok ? [] : r.errors).toEqual([]);
    if (r.ok) expect(r.design).toStrictEqual(d);
  });
});

describe('readDesign messages', () => {
  it('a file of another kind gets one message, not a list of schema errors', () => {
    const r = readDesign(JSON.stringify({ type: 'FeatureCollection', features: [] }));
    expect(r).toEqual({
      ok: false,
      errors: [{ path: 'format', message: expect.stringContaining('not a Railcross design file') }],
    });
  });

  it('lists every problem of one reading, in document order', () => {
    const d = greenhouse() as Doc;
    d.nets[3].pins[1] = 'U1.ALARM';
    d.rails[1].nominal = '3.3';
    d.parts[0].pins[1].role = 'in';
    d.parts[0].rail = 'nope';
    d.title = 7;
    const r = readDesign(JSON.stringify(d));
    expect(r.ok ? [] : r.errors.map((e) => e.path)).toEqual([
      'title',
      'rails[1].nominal',
      'parts[0].rail',
      'parts[0].pins[1].role',
      'nets[3].pins[1]',
    ]);
  });

  it('follows the order of the keys in the file, not the schema', () => {
    const text = '{"format":"railcross.design","version":1,"nets":[],"parts":7,"rails":[],"title":false}';
    const r = readDesign(text);
    expect(r.ok ? [] : r.errors.map((e) => e.path)).toEqual(['parts', 'title']);
  });

  it(`lists at most ${MAX_ERRORS} problems and says how many more there were`, () => {
    const d = greenhouse() as Doc;
    for (let i = 0; i < 120; i++) d.nets.push({ id: `X${i}`, pins: [`U${i + 10}.A`] });
    const r = readDesign(JSON.stringify(d));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors).toHaveLength(MAX_ERRORS + 1);
    expect(r.errors.at(-1)).toEqual({ path: '(root)', message: expect.stringContaining('70 more problems') });
    expect(r.errors[0]!.path).toBe('nets[6].pins[0]');
  });

  // A missing or mistyped list is one cause: the references into it are not checked, so that
  // the cause is not pushed past the limit by one "unknown …" line per part or pin.
  const buried: { name: string; breakIt: (d: Doc) => void; only: string[] }[] = [
    { name: 'rails missing', breakIt: (d) => void delete d.rails, only: ['rails'] },
    { name: 'rails not a list', breakIt: (d) => void (d.rails = { id: '3v3' }), only: ['rails'] },
    { name: 'parts missing', breakIt: (d) => void delete d.parts, only: ['parts'] },
    { name: 'profiles not a list', breakIt: (d) => void (d.profiles = 'none'), only: ['profiles'] },
    { name: 'scenarios not a list', breakIt: (d) => void (d.scenarios = 1), only: ['scenarios'] },
  ];
  it.each(buried)('$name among 200 parts: that is the one error listed', ({ breakIt, only }) => {
    const d = greenhouse() as Doc;
    const first = d.parts[0];
    for (let i = 0; i < 200; i++) {
      const copy = structuredClone(first);
      copy.id = `X${i}`;
      d.parts.push(copy);
      d.nets.push({
        id: `XN${i}`,
        pins: [`X${i}.${copy.pins[0].id}`],
        waivers: [{ rule: 'level-low', scenario: d.scenarios[0].id, note: 'n' }],
      });
    }
    expect(readDesign(JSON.stringify(d)).ok).toBe(true);
    breakIt(d);
    const r = readDesign(JSON.stringify(d));
    expect(r.ok ? [] : r.errors.map((e) => e.path)).toEqual(only);
  });

  it('names the built-in profile ids it was given, not the default ones', () => {
    const d = greenhouse() as Doc;
    const r = validateDesign(d, { knownProfileIds: ['74lvc', 'lvcmos18', 'i2c-lv', 'off-board'] });
    expect(r.ok ? [] : r.errors.map((e) => e.path)).toEqual(['parts[1].pins[1].profile']);
  });
});

describe('validateDesign', () => {
  it('returns a fresh design equal to the value and leaves the value untouched', () => {
    const d = greenhouse();
    const frozen = JSON.stringify(d);
    const r = validateDesign(d);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.design).toStrictEqual(d);
    expect(r.design).not.toBe(d);
    expect(JSON.stringify(d)).toBe(frozen);
  });

  const hostile: { name: string; value: () => unknown }[] = [
    { name: 'undefined', value: () => undefined },
    { name: 'a function', value: () => () => 1 },
    {
      name: 'a cyclic object',
      value: () => {
        const d = greenhouse() as Doc;
        d.parts[0].params = d;
        d.rails.push(d.rails);
        return d;
      },
    },
    {
      name: 'a getter that throws',
      value: () => {
        const d = greenhouse() as Doc;
        Object.defineProperty(d.parts[0], 'label', {
          enumerable: true,
          get: () => {
            throw new Error('boom');
          },
        });
        return d;
      },
    },
    {
      name: 'a proxy that throws on every read',
      value: () =>
        new Proxy(
          {},
          {
            get: () => {
              throw new Error('no');
            },
            ownKeys: () => {
              throw new Error('no');
            },
          },
        ),
    },
    { name: 'a Map instead of an array', value: () => ({ ...greenhouse(), parts: new Map() }) },
    {
      name: 'a deep nest in the title',
      value: () => {
        let v: unknown = 0;
        for (let i = 0; i < 100_000; i++) v = [v];
        return { ...greenhouse(), title: v };
      },
    },
  ];

  it.each(hostile)('refuses $name without throwing, naming a place', ({ value }) => {
    let r: ReturnType<typeof validateDesign> | undefined;
    expect(() => (r = validateDesign(value()))).not.toThrow();
    expect(r!.ok).toBe(false);
    if (r!.ok) return;
    expect(r!.errors.length).toBeGreaterThan(0);
    for (const e of r!.errors as DesignError[]) expect(e.path).not.toBe('');
  });
});

describe('readDesign on large or odd text', () => {
  const cases: { name: string; text: () => string; path: string }[] = [
    { name: 'deeply nested arrays', text: () => '['.repeat(200_000) + ']'.repeat(200_000), path: '(root)' },
    { name: 'unbalanced deep nesting', text: () => '{"a":'.repeat(100_000), path: '(root)' },
    { name: 'a long string', text: () => JSON.stringify({ format: 'x'.repeat(1_000_000) }), path: 'format' },
    {
      name: 'a design with a huge title',
      text: () =>
        JSON.stringify({ ...greenhouse(), title: 5 + 'x'.repeat(10) }).replace(
          '"5xxxxxxxxxx"',
          `[${'1,'.repeat(100_000)}1]`,
        ),
      path: 'title',
    },
  ];
  it.each(cases)('$name', ({ text, path }) => {
    const r = readDesign(text());
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors[0]!.path).toBe(path);
  });

  it('refuses a value that is not text', () => {
    const r = readDesign(42 as unknown as string);
    expect(r.ok ? [] : r.errors.map((e) => e.path)).toEqual(['(root)']);
  });
});
