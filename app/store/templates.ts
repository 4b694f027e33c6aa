/**
 * The parts palette: templates with generic names, built from the profile library. Each
 * template makes a part with a fresh designator on the design's best-fitting rail.
 */
import type { Design, Part, Pin, Profile, Rail } from '../../rules/model/index.ts';
import { builtinProfile } from '../../rules/profiles/index.ts';
import { freshId } from './commands/command.ts';

export interface Template {
  /** `kind:variant`, e.g. `gate:74hc`. */
  readonly id: string;
  readonly name: string;
  /** The family (profile label, or both sides of a translator). */
  readonly family: string;
  readonly search: string;
  /** A part at `position`, or why none can be made (no rails). */
  build(design: Design, position: { x: number; y: number }): Part | { refused: string };
}

/** The logic families a gate or a buffer comes in, in library order. */
const LOGIC_FAMILIES = [
  'ttl',
  '74ls',
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
] as const;

const profile = (id: string): Profile => {
  const p = builtinProfile(id);
  if (p === undefined) throw new Error(`the profile library has no ${id}`);
  return p;
};

/**
 * The rail a part of this profile most likely sits on: one whose nominal lies in the
 * profile's supply range, nearest to `preferred` (or the range's middle); failing that, the
 * nearest rail of all.
 */
export function pickRail(rails: readonly Rail[], p: Profile, preferred?: number): Rail | undefined {
  const range = p.params.vddRange;
  const target = preferred ?? (range === undefined ? 3.3 : (range[0] + range[1]) / 2);
  const inRange = range === undefined ? rails : rails.filter((r) => r.nominal >= range[0] && r.nominal <= range[1]);
  const pool = inRange.length > 0 ? inRange : rails;
  let best: Rail | undefined;
  for (const r of pool)
    if (best === undefined || Math.abs(r.nominal - target) < Math.abs(best.nominal - target)) best = r;
  return best;
}

const input = (id: string, extra: Partial<Pin> = {}): Pin => ({ id, role: 'input', ...extra });
const output = (id: string, extra: Partial<Pin> = {}): Pin => ({ id, role: 'output', ...extra });
const range = (prefix: string, n: number, make: (id: string) => Pin): Pin[] =>
  Array.from({ length: n }, (_, k) => make(`${prefix}${k}`));

interface Spec {
  id: string;
  name: string;
  profiles: readonly string[];
  prefix: string;
  preferred?: number;
  /** Pins, given the rail chosen for the first profile and the others. */
  pins: (rails: readonly Rail[]) => Pin[];
  /** Extra rails needed (translator side A). */
  sideRails?: number;
}

function template(spec: Spec): Template {
  const profiles = spec.profiles.map(profile);
  const family =
    profiles.length === 1 ? profiles[0]!.label : profiles.map((p, k) => `${'AB'[k]}: ${p.label}`).join(' / ');
  return {
    id: spec.id,
    name: spec.name,
    family,
    search: `${spec.name} ${family} ${spec.profiles.join(' ')}`.toLowerCase(),
    build(design, position) {
      const rails = profiles.map((p, k) => pickRail(design.rails, p, k === 0 ? spec.preferred : undefined));
      if (rails.some((r) => r === undefined)) return { refused: 'The design has no rail: add a rail first.' };
      const chosen = rails as Rail[];
      return {
        id: freshId(
          spec.prefix,
          design.parts.map((p) => p.id),
        ),
        label: spec.name,
        rail: chosen[chosen.length - 1]!.id,
        profile: profiles[profiles.length - 1]!.id,
        position: { x: Math.round(position.x), y: Math.round(position.y) },
        pins: spec.pins(chosen),
      };
    },
  };
}

/**
 * The usual supply of a family whose range is wide enough that its middle misleads: 74HC spans
 * 2–6 V but is mostly run at 5 V (common practice).
 */
const USUAL_SUPPLY: Readonly<Record<string, number>> = { '74hc': 5 };
const usual = (family: string) => (USUAL_SUPPLY[family] === undefined ? {} : { preferred: USUAL_SUPPLY[family] });

function gate(family: string): Template {
  return template({
    id: `gate:${family}`,
    name: 'Single gate',
    profiles: [family],
    prefix: 'U',
    ...usual(family),
    pins: () => [input('A'), input('B'), output('Y')],
  });
}

function buffer(family: string): Template {
  return template({
    id: `buffer:${family}`,
    name: 'Octal buffer',
    profiles: [family],
    prefix: 'U',
    ...usual(family),
    pins: () => [
      input('OE_N'),
      ...Array.from({ length: 8 }, (_, k) => input(`A${k + 1}`)),
      ...Array.from({ length: 8 }, (_, k) => output(`Y${k + 1}`, { drive: 'three-state' })),
    ],
  });
}

/** Two channels each way; side A on its own rail and family (pin overrides), side B the part's. */
function translator(a: string, b: string, name: string): Template {
  return template({
    id: `translator:${a}:${b}`,
    name: `Dual-rail translator ${name}`,
    profiles: [a, b],
    prefix: 'U',
    pins: ([railA]) => {
      const sideA = { rail: railA!.id, profile: a, side: 'left' as const };
      return [
        input('A1', sideA),
        input('A2', sideA),
        output('A3', { ...sideA, drive: 'three-state' }),
        output('A4', { ...sideA, drive: 'three-state' }),
        output('B1', { drive: 'three-state' }),
        output('B2', { drive: 'three-state' }),
        input('B3', { side: 'right' }),
        input('B4', { side: 'right' }),
      ];
    },
  });
}

function mcu(n: 8 | 16): Template {
  const io = n === 8 ? 4 : 6;
  return template({
    id: `mcu:${n}`,
    name: `Microcontroller with ${n} pins`,
    profiles: ['mcu-gpio'],
    prefix: 'U',
    preferred: 3.3,
    pins: () => [
      ...range('IN', io, (id) => input(id)),
      ...range('OUT', io, (id) => output(id)),
      ...(n === 16
        ? [
            // The two-wire pins are bus pins: the I2C-bus specification's levels, not the GPIO rows.
            { id: 'SDA', role: 'bidir', drive: 'open-drain', profile: 'i2c', side: 'left' } satisfies Pin,
            { id: 'SCL', role: 'bidir', drive: 'open-drain', profile: 'i2c', side: 'left' } satisfies Pin,
            output('TX'),
            input('RX'),
          ]
        : []),
    ],
  });
}

function sensor(family: 'i2c' | 'i2c-lv'): Template {
  return template({
    id: `sensor:${family}`,
    name: 'Two-wire-bus sensor',
    profiles: [family],
    prefix: 'U',
    preferred: family === 'i2c' ? 3.3 : 1.8,
    pins: () => [
      { id: 'SDA', role: 'bidir', drive: 'open-drain', side: 'left' },
      input('SCL'),
      output('INT_N', { drive: 'open-drain' }),
    ],
  });
}

function offBoard(direction: 'in' | 'out'): Template {
  return template({
    id: `off-board:${direction}`,
    name: direction === 'in' ? 'Off-board signal coming in' : 'Off-board signal going out',
    profiles: ['off-board'],
    prefix: 'J',
    preferred: 3.3,
    // The connector drives what comes in and receives what goes out.
    pins: () => [direction === 'in' ? output('SIG') : input('SIG')],
  });
}

/** Every template, in palette order. */
export const TEMPLATES: readonly Template[] = [
  ...LOGIC_FAMILIES.map(gate),
  ...LOGIC_FAMILIES.map(buffer),
  translator('lvcmos18', 'lvcmos33', '1.8 V ↔ 3.3 V'),
  translator('lvcmos33', '74ahc', '3.3 V ↔ 5 V'),
  translator('lvcmos18', '74ahc', '1.8 V ↔ 5 V'),
  mcu(8),
  mcu(16),
  sensor('i2c'),
  sensor('i2c-lv'),
  offBoard('in'),
  offBoard('out'),
];

export function templateById(id: string): Template | undefined {
  return TEMPLATES.find((t) => t.id === id);
}

/** Templates whose name or family contains every word of `query` (case-insensitive). */
export function searchTemplates(query: string, list: readonly Template[] = TEMPLATES): Template[] {
  const words = query
    .toLowerCase()
    .split(/\s+/)
    .filter((w) => w !== '');
  return list.filter((t) => words.every((w) => t.search.includes(w)));
}
