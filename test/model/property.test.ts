/**
 * Property tests of the reader and the writer over random valid designs
 * (test/support/arbitraries.ts):
 * (a) a corruption drawn from design-format.md's refusal list is always refused, with the
 *     expected path among the errors, every path non-empty, and no exception;
 * (b) valid designs survive writeDesign → readDesign unchanged, and writing is stable.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { readDesign, validateDesign, writeDesign, type Design } from '../../rules/model/index.ts';
import { designArb } from '../support/arbitraries.ts';

// `any`: the corruptions break the types on purpose.
// biome-ignore lint/suspicious/noExplicitAny: these tests build malformed documents on purpose
type Doc = any;

interface Corruption {
  name: string;
  applies?: (d: Design) => boolean;
  /** Break `d` in place (using `n` to pick a target); return the expected path, and text to read instead if any. */
  apply: (d: Doc, n: number) => { path: string; text?: string };
}

const pick = <T>(list: readonly T[], n: number): [T, number] => {
  const i = n % list.length;
  return [list[i]!, i];
};
const hasNets = (d: Design) => d.nets.length > 0;
const partsWithPins = (d: Doc) => (d.parts as Doc[]).map((p, i) => [p, i] as const).filter(([p]) => p.pins.length > 0);

const corruptions: Corruption[] = [
  {
    name: 'not JSON',
    apply: (d, n) => {
      const t = JSON.stringify(d);
      return { path: '(root)', text: t.slice(0, n % t.length) };
    },
  },
  {
    name: 'format wrong',
    apply: (d) => {
      d.format = 'railcross.report';
      return { path: 'format' };
    },
  },
  {
    name: 'version wrong',
    apply: (d, n) => {
      d.version = [3, '1', null, 1.5][n % 4];
      return { path: 'version' };
    },
  },
  {
    name: 'missing required key',
    apply: (d, n) => {
      const [key] = pick(['title', 'rails', 'parts', 'nets'], n);
      delete d[key];
      return { path: key };
    },
  },
  {
    name: 'wrong type',
    apply: (d, n) => {
      const [rail, i] = pick(d.rails as Doc[], n);
      rail.nominal = String(rail.nominal);
      return { path: `rails[${i}].nominal` };
    },
  },
  {
    name: 'unknown key',
    apply: (d, n) => {
      const [, i] = pick(d.parts as Doc[], n);
      d.parts[i].footprint = 'SO-8';
      return { path: `parts[${i}].footprint` };
    },
  },
  {
    name: 'unknown rail on a part',
    apply: (d, n) => {
      const [, i] = pick(d.parts as Doc[], n);
      d.parts[i].rail = 'no-such-rail';
      return { path: `parts[${i}].rail` };
    },
  },
  {
    name: 'unknown pull rail on a pin',
    apply: (d, n) => {
      const [[part, i]] = pick(partsWithPins(d), n);
      const [, j] = pick(part.pins as Doc[], n >> 3);
      part.pins[j].pull = { to: 'no-such-rail', ohms: 1e4 };
      return { path: `parts[${i}].pins[${j}].pull.to` };
    },
  },
  {
    name: 'unknown profile',
    apply: (d, n) => {
      const [, i] = pick(d.parts as Doc[], n);
      d.parts[i].profile = 'no-such-profile';
      return { path: `parts[${i}].profile` };
    },
  },
  {
    name: 'unknown rail turned off',
    apply: (d) => {
      d.scenarios = [...(d.scenarios ?? []), { id: 'broken', label: '', off: ['no-such-rail'] }];
      return { path: `scenarios[${d.scenarios.length - 1}].off[0]` };
    },
  },
  {
    name: 'unknown pin in a net',
    applies: hasNets,
    apply: (d, n) => {
      const [net, i] = pick(d.nets as Doc[], n);
      const [ref, j] = pick(net.pins as string[], n >> 3);
      net.pins[j] = `${ref.slice(0, ref.indexOf('.'))}.NO_SUCH_PIN`;
      return { path: `nets[${i}].pins[${j}]` };
    },
  },
  {
    name: 'duplicate id',
    apply: (d, n) => {
      const [kind] = pick(
        ['rails', 'parts', 'nets', 'profiles', 'scenarios'].filter((k) => (d[k]?.length ?? 0) > 0),
        n,
      );
      const list = d[kind] as Doc[];
      list.push(structuredClone(list[(n >> 3) % list.length]));
      return { path: `${kind}[${list.length - 1}].id` };
    },
  },
  {
    name: 'duplicate pin id in a part',
    apply: (d, n) => {
      const [[part, i]] = pick(partsWithPins(d), n);
      part.pins.push({ ...part.pins[0], pull: undefined, params: undefined });
      return { path: `parts[${i}].pins[${part.pins.length - 1}].id` };
    },
  },
  {
    name: 'scenario all-on',
    apply: (d) => {
      d.scenarios = [{ id: 'all-on', label: '', off: [] }, ...(d.scenarios ?? [])];
      return { path: 'scenarios[0].id' };
    },
  },
  {
    name: 'id with a forbidden character',
    apply: (d, n) => {
      const [where] = pick(
        ['parts', 'nets', 'pins', 'rails'].filter((k) => k !== 'nets' || d.nets.length > 0),
        n,
      );
      const [bad] = pick(where === 'rails' ? [':', '>'] : ['.', ':', '>'], n >> 3);
      if (where === 'pins') {
        const [[part, i]] = pick(partsWithPins(d), n >> 5);
        part.pins[0].id += `${bad}x`;
        return { path: `parts[${i}].pins[0].id` };
      }
      const [, i] = pick(d[where] as Doc[], n >> 5);
      d[where][i].id += `${bad}x`;
      return { path: `${where}[${i}].id` };
    },
  },
  {
    name: 'pin named twice in nets',
    applies: hasNets,
    apply: (d, n) => {
      const [from, i] = pick(d.nets as Doc[], n);
      const [to, j] = pick(d.nets as Doc[], n >> 3);
      to.pins.push(from.pins[0]);
      // The second occurrence in document order is reported: the copy, unless it lands on an earlier net.
      return { path: j < i ? `nets[${i}].pins[0]` : `nets[${j}].pins[${to.pins.length - 1}]` };
    },
  },
  {
    name: 'Level that does not parse',
    apply: (d, n) => {
      const [, i] = pick(d.parts as Doc[], n);
      const [bad] = pick(['0.7*VDD*VDD', 'VDD+', '70%', '2V', '', 'vdd'], n >> 3);
      d.parts[i].params = { ...d.parts[i].params, vih: bad };
      return { path: `parts[${i}].params.vih` };
    },
  },
  {
    name: 'resistance not positive',
    applies: hasNets,
    apply: (d, n) => {
      const [, i] = pick(d.nets as Doc[], n);
      d.nets[i].pull = { to: 'ground', ohms: [0, -4700, -0][(n >> 3) % 3] };
      return { path: `nets[${i}].pull.ohms` };
    },
  },
  {
    name: 'negative quantity',
    apply: (d, n) => {
      const [key] = pick(['iih', 'iil', 'cin', 'ioMax', 'maxInputRamp'], n);
      const [, i] = pick(d.parts as Doc[], n >> 3);
      d.parts[i].params = { ...d.parts[i].params, [key]: -1e-9 };
      return { path: `parts[${i}].params.${key}` };
    },
  },
  {
    name: 'negative net capacitance or time',
    applies: hasNets,
    apply: (d, n) => {
      const [key] = pick(['wiringCapacitance', 'maxRiseTime'], n);
      const [, i] = pick(d.nets as Doc[], n >> 1);
      d.nets[i][key] = -1e-12;
      return { path: `nets[${i}].${key}` };
    },
  },
  {
    name: 'negative tolerance',
    apply: (d, n) => {
      const [, i] = pick(d.rails as Doc[], n);
      d.rails[i].tolerance = -0.01;
      return { path: `rails[${i}].tolerance` };
    },
  },
  {
    name: 'rail min above max',
    apply: (d, n) => {
      const [rail, i] = pick(d.rails as Doc[], n);
      rail.min = rail.nominal + 1;
      rail.max = rail.nominal;
      return { path: `rails[${i}].min` };
    },
  },
  {
    name: 'vddRange min above max',
    apply: (d, n) => {
      const [, i] = pick(d.parts as Doc[], n);
      d.parts[i].params = { ...d.parts[i].params, vddRange: [3.6, 1.65] };
      return { path: `parts[${i}].params.vddRange` };
    },
  },
  {
    name: 'route pair off the net',
    applies: hasNets,
    apply: (d, n) => {
      const [net, i] = pick(d.nets as Doc[], n);
      net.route = [...(net.route ?? []), [net.pins[0], 'ZZ.OTHER']];
      return { path: `nets[${i}].route[${net.route.length - 1}][1]` };
    },
  },
  {
    name: 'waiver of an unknown rule or scenario',
    applies: hasNets,
    apply: (d, n) => {
      const [net, i] = pick(d.nets as Doc[], n);
      const unknownRule = n % 2 === 0;
      net.waivers = [
        ...(net.waivers ?? []),
        unknownRule ? { rule: 'no-such-rule', note: '' } : { rule: 'level-low', scenario: 'no-such-state', note: '' },
      ];
      return { path: `nets[${i}].waivers[${net.waivers.length - 1}].${unknownRule ? 'rule' : 'scenario'}` };
    },
  },
  {
    name: '__proto__ key',
    apply: (d, n) => {
      const [, i] = pick(d.parts as Doc[], n);
      Object.defineProperty(d.parts[i], '__proto__', {
        value: { polluted: true },
        enumerable: true,
        configurable: true,
        writable: true,
      });
      return { path: `parts[${i}].__proto__` };
    },
  },
];

// 200 random files a test: generous, so that a busy machine slows it without failing it.
describe('reader properties', { timeout: 120_000 }, () => {
  it('every corruption kind of the table is named once', () => {
    expect(new Set(corruptions.map((c) => c.name)).size).toBe(corruptions.length);
  });

  it('(a) a corrupted valid design is refused with the path of the corruption, never throwing', () => {
    fc.assert(
      fc.property(designArb(), fc.nat(), fc.nat(), fc.boolean(), (design, which, n, asText) => {
        const usable = corruptions.filter((c) => c.applies?.(design) ?? true);
        const corruption = usable[which % usable.length]!;
        const doc = structuredClone(design) as Doc;
        const { path, text } = corruption.apply(doc, n);
        const r =
          text !== undefined ? readDesign(text) : asText ? readDesign(JSON.stringify(doc)) : validateDesign(doc);
        expect(r.ok, corruption.name).toBe(false);
        if (r.ok) return;
        for (const e of r.errors) {
          expect(e.path.length).toBeGreaterThan(0);
          expect(e.message.length).toBeGreaterThan(0);
        }
        expect(
          r.errors.map((e) => e.path),
          corruption.name,
        ).toContain(path);
      }),
      { numRuns: 200 },
    );
  });

  it('(a) the reader never throws on arbitrary JSON text or values', () => {
    fc.assert(
      fc.property(fc.oneof(fc.json(), fc.string()), fc.anything(), (text, value) => {
        const r1 = readDesign(text);
        const r2 = validateDesign(value);
        expect(r1.ok || r1.errors.length > 0).toBe(true);
        expect(r2.ok).toBe(false);
      }),
      { numRuns: 200 },
    );
  });

  it('(b) valid designs round-trip through writeDesign and readDesign unchanged', () => {
    fc.assert(
      fc.property(designArb(), (design) => {
        const text = writeDesign(design);
        const r = readDesign(text);
        expect(r.ok ? [] : r.errors).toEqual([]);
        if (!r.ok) return;
        expect(r.design).toStrictEqual(design);
        expect(writeDesign(r.design)).toBe(text);
      }),
      { numRuns: 200 },
    );
  });
});
