/**
 * One seeded generator of synthetic designs and of edits to them, shared by the incremental
 * property test and the benchmark (`npm run bench`). Values are invented; the families are
 * the built-in library's.
 *
 * Edits go through immer's `produce`, as the editor's commands do, so that everything an edit
 * did not touch keeps its identity: that sharing is what the incremental check relies on.
 */
import { original, produce } from 'immer';
import type { Design, Discrete, Net, Part, Pin, Rail } from '../../rules/model/schema.ts';

/** mulberry32: a small, fast, seedable generator (public-domain algorithm). */
export function rng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export type Rand = () => number;
const pick = <T>(r: Rand, xs: readonly T[]): T => xs[Math.floor(r() * xs.length)]!;
const int = (r: Rand, lo: number, hi: number): number => lo + Math.floor(r() * (hi - lo + 1));

const RAILS: Rail[] = [
  { id: 'r5v0', label: '5 V', nominal: 5, tolerance: 0.05, colour: '#b45309' },
  { id: 'r3v3', label: '3.3 V', nominal: 3.3, tolerance: 0.05, colour: '#0f766e' },
  { id: 'r2v5', label: '2.5 V', nominal: 2.5, tolerance: 0.05, colour: '#1d4ed8' },
  { id: 'r1v8', label: '1.8 V', nominal: 1.8, tolerance: 0.05, colour: '#7c3aed' },
];

/** Families that suit each rail and each other on it. */
const FAMILIES: Record<string, readonly string[]> = {
  r5v0: ['74hc', '74hct', '74ac', '74ahct'],
  r3v3: ['lvcmos33', '74lvc', 'mcu-gpio'],
  r2v5: ['lvcmos25'],
  r1v8: ['lvcmos18', 'mcu-gpio'],
};
/** Families that a sprinkling of parts take instead: another rail's, or an older 5 V one. */
const ODD_FAMILIES: readonly string[] = ['ttl', '74ls', 'cmos4000', 'lvttl33', 'lvcmos18', 'lvcmos33', '74hc', 'i2c'];

function makePin(r: Rand, id: string): Pin {
  const roll = r();
  if (roll < 0.45) return { id, role: 'input' };
  if (roll < 0.8) return { id, role: 'output' };
  if (roll < 0.9) return { id, role: 'output', drive: 'open-drain' };
  return { id, role: 'bidir', drive: r() < 0.5 ? 'open-drain' : 'three-state' };
}

const DEFAULT_GRID = { columns: 50, dx: 220, dy: 180 };

function makePart(
  r: Rand,
  n: number,
  rails: readonly Rail[],
  faultRate: number,
  grid: { columns: number; dx: number; dy: number } = DEFAULT_GRID,
): Part {
  const rail = pick(r, rails).id;
  const families = r() < faultRate ? ODD_FAMILIES : (FAMILIES[rail] ?? ODD_FAMILIES);
  const pins: Pin[] = [];
  const count = int(r, 2, 6);
  for (let k = 0; k < count; k++) pins.push(makePin(r, `P${k + 1}`));
  return {
    id: `U${n}`,
    label: `Block ${n}`,
    rail,
    profile: pick(r, families),
    position: { x: (n % grid.columns) * grid.dx, y: Math.floor(n / grid.columns) * grid.dy },
    pins,
  };
}

export interface GeneratorOptions {
  parts: number;
  /** Share of parts given a family of another rail (default 0.05). */
  faultRate?: number;
  /** Share of pins left on no net (default 0.1 when wiring is random, else 0.01). */
  loneRate?: number;
  /**
   * `board` (default): each net has one driver and its receivers, mostly on the driver's rail,
   * open-drain nets pulled up to their own rail, so that faults stay a sprinkling, as on a
   * real board. `random`: pins dealt into nets at random, so that every rule fires often
   * (what the incremental property test wants).
   */
  wiring?: 'board' | 'random';
  /**
   * Parts per row of the grid and the grid's pitch (default 50 a row, 220 × 180: chips nearly
   * touching). A drawing test gives room between chips, as a person would.
   */
  grid?: { columns: number; dx: number; dy: number };
  /**
   * Deal pins into nets only among this many consecutive parts (a row's neighbours), as a board
   * wires chips near each other; default: across the whole design.
   */
  cluster?: number;
  /**
   * Share of neighbouring nets joined by a part between chips (version 2: a series resistor, a
   * resistor tied to a rail or ground, a FET or a diode shifter); default 0. With any, a tenth of
   * the input pins also get a version-2 parameter (injection limit, viMin, bus-hold).
   */
  discretes?: number;
}

let discreteSerial = 0;

/** A random part between chips with its pins on nets `a` and `b` (pushed onto their pin lists). */
function makeDiscrete(r: Rand, a: Net, b: Net, rails: readonly Rail[], id: string): Discrete {
  const roll = r();
  const tolerance = pick(r, [0, 0.01, 0.05]);
  if (roll < 0.45) {
    a.pins.push(`${id}.1`);
    b.pins.push(`${id}.2`);
    return { id, kind: 'resistor', ohms: pick(r, [100, 1000, 2200, 3300, 10000]), tolerance };
  }
  if (roll < 0.65) {
    a.pins.push(`${id}.1`);
    return {
      id,
      kind: 'resistor',
      ohms: pick(r, [1000, 4700, 10000]),
      tolerance,
      tie: { '2': r() < 0.3 ? 'ground' : pick(r, rails).id },
    };
  }
  if (roll < 0.85) {
    a.pins.push(`${id}.S`);
    b.pins.push(`${id}.D`);
    return {
      id,
      kind: 'fet-shifter',
      gate: pick(r, rails).id,
      vgsThMax: pick(r, [0.9, 1.5]),
      rdsOnMax: pick(r, [2, 10]),
    };
  }
  a.pins.push(`${id}.K`);
  b.pins.push(`${id}.A`);
  return { id, kind: 'diode-shifter', vfMax: pick(r, [0.3, 0.45]), leakageMax: pick(r, [1e-6, 20e-6]) };
}

/** Version-2 pin parameters on some inputs. */
function sprinkleParams(r: Rand, parts: Part[]): void {
  for (const part of parts) {
    for (const pin of part.pins) {
      if (pin.role !== 'input' || r() >= 0.1) continue;
      const roll = r();
      pin.params =
        roll < 0.4
          ? { injectionMax: pick(r, [1e-3, 5e-3]) }
          : roll < 0.7
            ? { viMin: -0.5 }
            : { busHold: { hold: 75e-6, overdrive: 500e-6 } };
    }
  }
}

interface Dealt {
  key: string;
  pin: Pin;
  rail: string;
}

/** Nets of 2–6 pins dealt at random. */
function randomNets(r: Rand, pool: Dealt[]): Net[] {
  const nets: Net[] = [];
  let at = 0;
  while (pool.length - at >= 2) {
    const size = Math.min(int(r, 2, 6), pool.length - at);
    const members = pool.slice(at, at + size);
    at += size;
    const net: Net = { id: `N${nets.length + 1}`, pins: members.map((m) => m.key) };
    if (members.some((m) => m.pin.drive === 'open-drain') && r() < 0.9) {
      net.pull = { to: pick(r, RAILS).id, ohms: pick(r, [1000, 2200, 4700, 10000, 47000]) };
    }
    if (r() < 0.1) net.maxRiseTime = pick(r, [1e-6, 300e-9, 50e-9]);
    nets.push(net);
  }
  return nets;
}

/** Nets as a board has them: one driver, 1–5 receivers, one receiver in twenty from another rail. */
function boardNets(r: Rand, pool: Dealt[]): Net[] {
  const drivers = pool.filter((d) => d.pin.role !== 'input');
  const inputsByRail = new Map<string, Dealt[]>();
  for (const d of pool) {
    if (d.pin.role !== 'input') continue;
    const list = inputsByRail.get(d.rail) ?? [];
    list.push(d);
    inputsByRail.set(d.rail, list);
  }
  const takeInput = (rail: string): Dealt | undefined => {
    const own = inputsByRail.get(rail);
    if (own !== undefined && own.length > 0 && r() < 0.95) return own.pop();
    for (const list of inputsByRail.values()) if (list.length > 0) return list.pop();
    return undefined;
  };
  const nets: Net[] = [];
  for (const d of drivers) {
    const members = [d];
    const receivers = int(r, 1, 5);
    for (let k = 0; k < receivers; k++) {
      const x = takeInput(d.rail);
      if (x !== undefined) members.push(x);
    }
    if (members.length < 2) break;
    const net: Net = { id: `N${nets.length + 1}`, pins: members.map((m) => m.key) };
    if (d.pin.drive === 'open-drain') net.pull = { to: d.rail, ohms: pick(r, [2200, 4700, 10000]) };
    if (r() < 0.02) net.maxRiseTime = pick(r, [1e-6, 300e-9]);
    nets.push(net);
  }
  return nets;
}

/** A synthetic design: about 4 pins a part, nets of 2–6 pins, 4 rails, 2 power states. */
export function generateDesign(seed: number, options: GeneratorOptions): Design {
  const r = rng(seed);
  const wiring = options.wiring ?? 'board';
  const faultRate = options.faultRate ?? 0.05;
  const loneRate = options.loneRate ?? (wiring === 'random' ? 0.1 : 0.01);
  const parts: Part[] = [];
  for (let n = 1; n <= options.parts; n++) parts.push(makePart(r, n, RAILS, faultRate, options.grid));

  const pool: Dealt[] = [];
  for (const p of parts) {
    for (const pin of p.pins)
      if (r() >= loneRate) pool.push({ key: `${p.id}.${pin.id}`, pin, rail: pin.rail ?? p.rail });
  }
  let nets: Net[];
  if (options.cluster === undefined) {
    for (let k = pool.length - 1; k > 0; k--) {
      const j = Math.floor(r() * (k + 1));
      [pool[k], pool[j]] = [pool[j]!, pool[k]!];
    }
    nets = wiring === 'random' ? randomNets(r, pool) : boardNets(r, pool);
  } else {
    // Each cluster of parts wired among itself, net ids numbered on across clusters.
    nets = [];
    const size = options.cluster;
    for (let first = 1; first <= options.parts; first += size) {
      const ids = new Set(parts.slice(first - 1, first - 1 + size).map((p) => p.id));
      const local = pool.filter((d) => ids.has(d.key.slice(0, d.key.indexOf('.'))));
      for (let k = local.length - 1; k > 0; k--) {
        const j = Math.floor(r() * (k + 1));
        [local[k], local[j]] = [local[j]!, local[k]!];
      }
      const made = wiring === 'random' ? randomNets(r, local) : boardNets(r, local);
      for (const net of made) nets.push({ ...net, id: `N${nets.length + 1}` });
    }
  }
  const rate = options.discretes ?? 0;
  const discretes: Discrete[] = [];
  const rails = RAILS.map((x) => ({ ...x }));
  if (rate > 0) {
    // Only with discretes asked for: the designs without them stay what they were.
    for (let k = 0; k + 1 < nets.length; k++) {
      if (r() < rate) discretes.push(makeDiscrete(r, nets[k]!, nets[k + 1]!, RAILS, `Z${discretes.length + 1}`));
    }
    sprinkleParams(r, parts);
    rails[1] = { ...rails[1]!, minLoad: 5e-3 };
  }
  return {
    format: 'railcross.design',
    version: 2,
    title: `Synthetic design, ${options.parts} parts, seed ${seed}`,
    rails,
    scenarios: [{ id: 'standby', label: 'Standby: 1.8 V rail off', off: ['r1v8'] }],
    parts,
    ...(discretes.length > 0 ? { discretes } : {}),
    nets,
  };
}

export const EDIT_KINDS = [
  'add-part',
  'remove-part',
  'connect',
  'disconnect',
  'move-part',
  'rail-voltage',
  'switch-profile',
  'add-waiver',
  'rail-off',
  'net-pull',
  'pin-state',
  'add-discrete',
  'remove-discrete',
  'discrete-value',
  'move-discrete',
  'relabel-net',
  'relabel-rail',
] as const;
export type EditKind = (typeof EDIT_KINDS)[number];

/**
 * Removes a pin from whatever net holds it (dropping a net left with fewer than two pins is not
 * needed: one-pin nets are valid). It searches the design as it was before this edit, not the
 * draft: reading every net through immer's draft makes a proxy per net, whose garbage the
 * collector then clears in the middle of the check being timed. The draft's nets keep the
 * base's order (edits here only append nets), and a pin is unplugged at most once per edit.
 */
function unplug(d: Design, key: string): void {
  const base = original(d)!.nets;
  for (let i = 0; i < base.length; i++) {
    if (!base[i]!.pins.includes(key)) continue;
    const net = d.nets[i]!;
    const k = net.pins.indexOf(key);
    if (k >= 0) {
      net.pins.splice(k, 1);
      if (net.route !== undefined) net.route = net.route.filter(([a, b]) => a !== key && b !== key);
    }
  }
}

let partSerial = 0;

/** One edit of the given kind, chosen with `r`; returns a new design sharing what it left alone. */
export function applyEdit(design: Design, kind: EditKind, r: Rand): Design {
  return produce(design, (d) => {
    switch (kind) {
      case 'add-part': {
        partSerial++;
        const part = makePart(r, 100000 + partSerial, d.rails, 0.1);
        part.id = `X${partSerial}_${Math.floor(r() * 1e6)}`;
        if (original(d)!.parts.some((p) => p.id === part.id)) return;
        d.parts.push(part);
        if (d.nets.length > 0 && part.pins.length > 0) pick(r, d.nets).pins.push(`${part.id}.${part.pins[0]!.id}`);
        return;
      }
      case 'remove-part': {
        if (d.parts.length === 0) return;
        const k = Math.floor(r() * d.parts.length);
        const part = d.parts[k]!;
        for (const pin of part.pins) unplug(d, `${part.id}.${pin.id}`);
        for (const sc of d.scenarios ?? [])
          if (sc.pins !== undefined) sc.pins = sc.pins.filter((p) => !p.pin.startsWith(`${part.id}.`));
        // A splice through the draft would make a proxy of every later part.
        d.parts = original(d)!.parts.filter((_, i) => i !== k);
        return;
      }
      case 'connect': {
        if (d.parts.length === 0 || d.nets.length === 0) return;
        const part = pick(r, d.parts);
        if (part.pins.length === 0) return;
        const key = `${part.id}.${pick(r, part.pins).id}`;
        unplug(d, key);
        pick(r, d.nets).pins.push(key);
        return;
      }
      case 'disconnect': {
        const withPins = original(d)!.nets.filter((n) => n.pins.length > 0);
        if (withPins.length === 0) return;
        const net = pick(r, withPins);
        unplug(d, pick(r, net.pins));
        return;
      }
      case 'move-part': {
        if (d.parts.length === 0) return;
        const part = pick(r, d.parts);
        part.position = { x: (part.position?.x ?? 0) + 10, y: (part.position?.y ?? 0) + 5 };
        return;
      }
      case 'rail-voltage': {
        const rail = pick(r, d.rails);
        rail.nominal = Math.round(rail.nominal * (0.9 + r() * 0.2) * 100) / 100;
        return;
      }
      case 'switch-profile': {
        if (d.parts.length === 0) return;
        const part = pick(r, d.parts);
        part.profile = pick(r, r() < 0.5 ? ODD_FAMILIES : (FAMILIES[part.rail] ?? ODD_FAMILIES));
        return;
      }
      case 'add-waiver': {
        // Now and then a lone pin's own waiver (kept in the pin; judged only while it is on no net).
        if (d.parts.length > 0 && r() < 0.3) {
          const pin = pick(r, pick(r, d.parts).pins);
          const scenario = r() < 0.5 ? { scenario: 'standby' } : {};
          pin.waivers = [...(pin.waivers ?? []), { rule: 'floating-input', ...scenario, note: 'spare' }];
          return;
        }
        if (d.nets.length === 0) return;
        const net = pick(r, d.nets);
        const rule = pick(r, [
          'level-high',
          'level-low',
          'overvoltage',
          'contention',
          'floating-input',
          'rail-crossing',
        ] as const);
        net.waivers = [...(net.waivers ?? []), { rule, note: 'reviewed' }];
        return;
      }
      case 'rail-off': {
        const scenario = d.scenarios?.[0];
        if (scenario === undefined) return;
        const rail = pick(r, d.rails).id;
        scenario.off = scenario.off.includes(rail) ? scenario.off.filter((x) => x !== rail) : [...scenario.off, rail];
        return;
      }
      case 'add-discrete': {
        if (d.nets.length < 2) return;
        const a = pick(r, d.nets);
        const b = pick(r, d.nets);
        if (a === b) return;
        discreteSerial++;
        const made = makeDiscrete(r, a, b, d.rails, `W${discreteSerial}_${Math.floor(r() * 1e6)}`);
        const base = original(d)!;
        if (base.parts.some((p) => p.id === made.id) || (base.discretes ?? []).some((x) => x.id === made.id)) return;
        d.discretes = [...(base.discretes ?? []), made];
        return;
      }
      case 'remove-discrete': {
        const list = d.discretes ?? [];
        if (list.length === 0) return;
        const k = Math.floor(r() * list.length);
        const gone = list[k]!;
        for (const pin of ['1', '2', 'S', 'D', 'K', 'A']) unplug(d, `${gone.id}.${pin}`);
        list.splice(k, 1);
        return;
      }
      case 'discrete-value': {
        const list = d.discretes ?? [];
        if (list.length === 0) return;
        const x = pick(r, list);
        if (x.kind === 'resistor') {
          x.ohms = pick(r, [470, 1000, 2200, 4700, 47000]);
          x.tolerance = pick(r, [0, 0.01, 0.05]);
        } else if (x.kind === 'fet-shifter') {
          x.vgsThMax = pick(r, [0.8, 1.2, 2]);
          x.gate = pick(r, d.rails).id;
        } else {
          x.vfMax = pick(r, [0.2, 0.5]);
        }
        return;
      }
      case 'move-discrete': {
        const list = d.discretes ?? [];
        if (list.length === 0) return;
        const x = pick(r, list);
        x.position = { x: (x.position?.x ?? 0) + 10, y: 0 };
        return;
      }
      case 'pin-state': {
        // A pin made an input at reset, with or without a weak pull-down, or given back its own state.
        const scenario = d.scenarios?.[0];
        if (scenario === undefined || d.parts.length === 0) return;
        const part = pick(r, d.parts);
        if (part.pins.length === 0) return;
        const key = `${part.id}.${pick(r, part.pins).id}`;
        const pins = scenario.pins ?? [];
        scenario.pins = pins.some((p) => p.pin === key)
          ? pins.filter((p) => p.pin !== key)
          : [
              ...pins,
              r() < 0.5 ? { pin: key, role: 'input' } : { pin: key, role: 'input', pull: { to: 'ground', ohms: 40e3 } },
            ];
        return;
      }
      // Messages name nets and rails by their labels: a new label must reach every finding that names it.
      case 'relabel-net': {
        if (d.nets.length === 0) return;
        pick(r, d.nets).label = `SIG_${Math.floor(r() * 1e6)}`;
        return;
      }
      case 'relabel-rail': {
        pick(r, d.rails).label = `Supply ${Math.floor(r() * 1e6)}`;
        return;
      }
      case 'net-pull': {
        if (d.nets.length === 0) return;
        const net = pick(r, d.nets);
        if (net.pull === undefined) net.pull = { to: pick(r, d.rails).id, ohms: pick(r, [1000, 4700, 10000]) };
        else delete net.pull;
        return;
      }
    }
  });
}
