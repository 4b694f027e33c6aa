/**
 * The physical limits of the design format (rules/model/limits.ts): every number outside its
 * range is refused with its JSON path and the range in words, and the ends of each range are
 * accepted. The limits are our own choice (documented in README.md, "Limits of the numbers");
 * the two cases of issue 14 (a rail tolerance of 3.6e307, a pull of 5e-324 Ω) are among them.
 */
import { describe, expect, it } from 'vitest';
import { readDesign } from '../../rules/model/index.ts';
import { designJsonSchema } from '../../rules/schema/schemas.ts';
import { greenhouse } from './fixtures.ts';

// `any`: the cases break the types on purpose.
// biome-ignore lint/suspicious/noExplicitAny: these tests build malformed documents on purpose
type Doc = any;

interface Refusal {
  name: string;
  breakIt: (d: Doc) => void;
  path: string;
  says: string;
}

const refusals: Refusal[] = [
  // issue 14: a tolerance that overflowed the rail's range to ±∞, a denormal pull
  {
    name: 'tolerance 3.6e307',
    breakIt: (d) => void (d.rails[0].tolerance = 3.6e307),
    path: 'rails[0].tolerance',
    says: 'below 1',
  },
  {
    name: 'tolerance exactly 1',
    breakIt: (d) => void (d.rails[0].tolerance = 1),
    path: 'rails[0].tolerance',
    says: 'below 1',
  },
  {
    name: 'pull of 5e-324 Ω',
    breakIt: (d) => void (d.nets[0].pull.ohms = 5e-324),
    path: 'nets[0].pull.ohms',
    says: 'from 1 mΩ to 1 TΩ',
  },
  {
    name: 'pull just under a milliohm',
    breakIt: (d) => void (d.nets[0].pull.ohms = 0.99e-3),
    path: 'nets[0].pull.ohms',
    says: 'from 1 mΩ to 1 TΩ',
  },
  {
    name: 'pull above a teraohm',
    breakIt: (d) => void (d.parts[3].pins[2].pull.ohms = 2e12),
    path: 'parts[3].pins[2].pull.ohms',
    says: 'from 1 mΩ to 1 TΩ',
  },
  {
    name: 'nominal 1e307 V',
    breakIt: (d) => void (d.rails[1].nominal = 1e307),
    path: 'rails[1].nominal',
    says: 'at most 10 kV',
  },
  {
    name: 'rail min below −10 kV',
    breakIt: (d) => void (d.rails[3].min = -20e3),
    path: 'rails[3].min',
    says: 'at least -10 kV',
  },
  {
    name: 'rail max above 10 kV',
    breakIt: (d) => void (d.rails[3].max = 10001),
    path: 'rails[3].max',
    says: 'at most 10 kV',
  },
  {
    name: 'Level number beyond 10 kV',
    breakIt: (d) => void (d.profiles[0].params.vih = 1e5),
    path: 'profiles[0].params.vih',
    says: 'at most 10 kV',
  },
  {
    name: 'Level string beyond 10 kV',
    breakIt: (d) => void (d.profiles[0].params.vih = '0.7*VDD+99999'),
    path: 'profiles[0].params.vih',
    says: 'within ±10 kV',
  },
  {
    name: 'Level with a VDD factor of 100',
    breakIt: (d) => void (d.profiles[0].params.vih = '100*VDD'),
    path: 'profiles[0].params.vih',
    says: 'factor of VDD within ±10',
  },
  {
    name: 'viMaxOff beyond 10 kV',
    breakIt: (d) => void (d.profiles[0].params.viMaxOff = -1e6),
    path: 'profiles[0].params.viMaxOff',
    says: 'at least -10 kV',
  },
  {
    name: 'vddRange beyond 10 kV',
    breakIt: (d) => void (d.profiles[0].params.vddRange = [0, 1e300]),
    path: 'profiles[0].params.vddRange[1]',
    says: 'at most 10 kV',
  },
  {
    name: 'minMargin beyond 10 kV',
    breakIt: (d) => void (d.settings.minMargin = 3.6e307),
    path: 'settings.minMargin',
    says: 'margin (V) of at most 10 kV',
  },
  {
    name: 'input current above 1 kA',
    breakIt: (d) => void (d.profiles[0].params.iih = 1001),
    path: 'profiles[0].params.iih',
    says: 'at most 1 kA',
  },
  {
    name: 'denormal input current',
    breakIt: (d) => void (d.profiles[0].params.iil = 5e-324),
    path: 'profiles[0].params.iil',
    says: 'from 1 fA to 1 kA',
  },
  {
    name: 'ioMax 1e307 A',
    breakIt: (d) => void (d.profiles[0].params.ioMax = 1e307),
    path: 'profiles[0].params.ioMax',
    says: 'at most 1 kA',
  },
  {
    name: 'output test current 5e-324 A',
    breakIt: (d) => void (d.parts[4].pins[0].params.voh[0].i = 5e-324),
    path: 'parts[4].pins[0].params.voh[0].i',
    says: 'from 1 fA to 1 kA',
  },
  {
    name: 'input capacitance of 2 F',
    breakIt: (d) => void (d.profiles[0].params.cin = 2),
    path: 'profiles[0].params.cin',
    says: 'at most 1 F',
  },
  {
    name: 'denormal wiring capacitance',
    breakIt: (d) => void (d.nets[1].wiringCapacitance = 5e-324),
    path: 'nets[1].wiringCapacitance',
    says: 'from 1 aF to 1 F',
  },
  {
    name: 'default wiring capacitance of 10 F',
    breakIt: (d) => void (d.settings.defaultWiringCapacitance = 10),
    path: 'settings.defaultWiringCapacitance',
    says: 'at most 1 F',
  },
  {
    name: 'maxRiseTime of an hour',
    breakIt: (d) => void (d.nets[0].maxRiseTime = 3600),
    path: 'nets[0].maxRiseTime',
    says: 'at most 1 s',
  },
  {
    name: 'denormal maxRiseTime',
    breakIt: (d) => void (d.nets[0].maxRiseTime = 1e-320),
    path: 'nets[0].maxRiseTime',
    says: 'from 1 fs to 1 s',
  },
  {
    name: 'maxInputRamp of 5 s/V',
    breakIt: (d) => void (d.profiles[1].params.maxInputRamp = 5),
    path: 'profiles[1].params.maxInputRamp',
    says: 'at most 1 s/V',
  },
];

interface Accepted {
  name: string;
  change: (d: Doc) => void;
}

/** The ends of each range, inclusive (the tolerance's upper end excepted). */
const accepted: Accepted[] = [
  { name: 'tolerance 0.99', change: (d) => void (d.rails[0].tolerance = 0.99) },
  {
    name: 'pulls of 1 mΩ and 1 TΩ',
    change: (d) => {
      d.nets[0].pull.ohms = 1e-3;
      d.parts[3].pins[2].pull.ohms = 1e12;
    },
  },
  {
    name: 'rail at ±10 kV',
    change: (d) => {
      d.rails[3].min = -10e3;
      d.rails[3].max = 10e3;
    },
  },
  {
    name: 'Levels at the ends',
    change: (d) => {
      d.profiles[0].params.vih = '10*VDD-10000';
      d.profiles[0].params.vil = -10e3;
    },
  },
  {
    name: 'currents of 1 fA and 1 kA',
    change: (d) => {
      d.profiles[0].params.iil = 1e-15;
      d.profiles[0].params.ioMax = 1e3;
    },
  },
  {
    name: 'capacitances of 1 aF and 1 F',
    change: (d) => {
      d.nets[1].wiringCapacitance = 1e-18;
      d.profiles[0].params.cin = 1;
    },
  },
  {
    name: 'times of 1 fs and 1 s',
    change: (d) => {
      d.nets[0].maxRiseTime = 1e-15;
      d.profiles[1].params.maxInputRamp = 1;
    },
  },
];

function read(d: Doc) {
  return readDesign(JSON.stringify(d));
}

describe('the reader refuses numbers outside physical sense', () => {
  it.each(refusals)('$name at $path', (c) => {
    const d = greenhouse() as Doc;
    c.breakIt(d);
    const r = read(d);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    const hit = r.errors.find((e) => e.path === c.path);
    expect(hit, `errors: ${JSON.stringify(r.errors)}`).toBeDefined();
    expect(hit!.message).toContain(c.says);
  });
});

describe('the reader accepts the ends of each range', () => {
  it.each(accepted)('$name', (c) => {
    const d = greenhouse() as Doc;
    c.change(d);
    const r = read(d);
    expect(r.ok ? [] : r.errors).toEqual([]);
  });
});

describe('the published JSON Schema carries the limits', () => {
  const text = JSON.stringify(designJsonSchema());
  it.each([
    ['resistance', '"minimum":0.001,"maximum":1000000000000'],
    ['tolerance', '"exclusiveMaximum":1'],
    ['voltages', '"minimum":-10000,"maximum":10000'],
    ['currents', '"maximum":1000'],
  ])('%s', (_name, fragment) => {
    expect(text).toContain(fragment);
  });
});
