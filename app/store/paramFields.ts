/**
 * The electrical parameters as the editor shows and accepts them: engineering notation with
 * units at the edge, plain SI numbers and Level strings inside (design-format.md, "Params").
 * One table drives the pin table's overrides, the part's, the design-local profiles' and the
 * details panel's effective values.
 */
import { parseLevel, type Level } from '../../rules/levels/index.ts';
import { formatQuantity, parseQuantity, type Unit } from '../../rules/levels/index.ts';
import type { OutputPoint, Params } from '../../rules/model/index.ts';

export type ParamKey = keyof Params;

export type ParamRead = { readonly ok: true; readonly value: unknown } | { readonly ok: false; readonly error: string };

type Kind =
  | { readonly type: 'level' }
  | { readonly type: 'quantity'; readonly unit: Unit }
  | { readonly type: 'volts' }
  | { readonly type: 'points' }
  | { readonly type: 'schmitt' }
  | { readonly type: 'bool' }
  | { readonly type: 'range' }
  | { readonly type: 'busHold' };

export interface ParamField {
  readonly key: ParamKey;
  /** Short name, as a datasheet's table heads it. */
  readonly label: string;
  /** What it means, for a title and a screen reader. */
  readonly meaning: string;
  /** An example of what may be typed. */
  readonly example: string;
  readonly kind: Kind;
}

/** Every key of Params, in the order a datasheet's DC table gives them. */
export const PARAM_FIELDS: readonly ParamField[] = [
  {
    key: 'vih',
    label: 'VIH',
    meaning: 'lowest input voltage read as high',
    example: '2.0 or 0.7*VDD',
    kind: { type: 'level' },
  },
  {
    key: 'vil',
    label: 'VIL',
    meaning: 'highest input voltage read as low',
    example: '0.8 or 0.3*VDD',
    kind: { type: 'level' },
  },
  {
    key: 'voh',
    label: 'VOH',
    meaning: 'lowest output-high voltage at a sourced current (level @ current; …)',
    example: 'VDD-0.1 @ 20µ; VDD-0.8 @ 4m',
    kind: { type: 'points' },
  },
  {
    key: 'vol',
    label: 'VOL',
    meaning: 'highest output-low voltage at a sunk current (level @ current; …)',
    example: '0.1 @ 20µ; 0.4 @ 4m',
    kind: { type: 'points' },
  },
  {
    key: 'iih',
    label: 'IIH',
    meaning: 'current drawn from the net when it is high (magnitude)',
    example: '1 µA',
    kind: { type: 'quantity', unit: 'A' },
  },
  {
    key: 'iil',
    label: 'IIL',
    meaning: 'current drawn from the net when it is low (magnitude)',
    example: '1.6 mA',
    kind: { type: 'quantity', unit: 'A' },
  },
  { key: 'cin', label: 'CIN', meaning: 'input capacitance', example: '5 pF', kind: { type: 'quantity', unit: 'F' } },
  {
    key: 'viMax',
    label: 'VI max',
    meaning: 'highest voltage the pin may see while powered',
    example: '5.5 or VDD+0.5',
    kind: { type: 'level' },
  },
  {
    key: 'ioMax',
    label: 'IO max',
    meaning: 'largest continuous output current',
    example: '25 mA',
    kind: { type: 'quantity', unit: 'A' },
  },
  {
    key: 'schmitt',
    label: 'VT+ / VT−',
    meaning: 'Schmitt-trigger thresholds, rising / falling',
    example: '0.7*VDD / 0.3*VDD',
    kind: { type: 'schmitt' },
  },
  {
    key: 'maxInputRamp',
    label: 'Ramp max',
    meaning: 'slowest input edge accepted',
    example: '10 ns/V',
    kind: { type: 'quantity', unit: 's/V' },
  },
  {
    key: 'unpoweredSafe',
    label: 'Safe off',
    meaning: 'may carry voltage while its chip is unpowered',
    example: 'yes or no',
    kind: { type: 'bool' },
  },
  {
    key: 'viMaxOff',
    label: 'VI max off',
    meaning: 'highest voltage the pin may see while unpowered',
    example: '3.6 V',
    kind: { type: 'volts' },
  },
  {
    key: 'deltaIcc',
    label: 'ΔICC',
    meaning: 'extra supply current per input held high below its supply',
    example: '0.5 mA',
    kind: { type: 'quantity', unit: 'A' },
  },
  {
    key: 'deltaIccDrop',
    label: 'ΔICC at',
    meaning: 'how far below its supply the input is held for ΔICC',
    example: '2.1 V',
    kind: { type: 'volts' },
  },
  {
    key: 'vddRange',
    label: 'VDD range',
    meaning: 'supply range over which the numbers hold',
    example: '1.65 … 3.6',
    kind: { type: 'range' },
  },
  {
    key: 'viMin',
    label: 'VI min',
    meaning: 'lowest voltage the pin may see while powered',
    example: '-0.5',
    kind: { type: 'level' },
  },
  {
    key: 'injectionMax',
    label: 'I inj max',
    meaning: 'largest current its clamp diodes may carry',
    example: '2 mA',
    kind: { type: 'quantity', unit: 'A' },
  },
  {
    key: 'busHold',
    label: 'Bus hold',
    meaning: 'bus-hold input: hold current / largest overdrive current',
    example: '75 µA / 500 µA',
    kind: { type: 'busHold' },
  },
  {
    key: 'seriesResistance',
    label: 'Rs',
    meaning: 'series output resistance of a weak push-pull auto-direction translator',
    example: '4.5 kΩ',
    kind: { type: 'quantity', unit: 'Ω' },
  },
  {
    key: 'minExternalPull',
    label: 'R pull min',
    meaning: 'smallest external pull resistor the pin tolerates',
    example: '50 kΩ',
    kind: { type: 'quantity', unit: 'Ω' },
  },
  {
    key: 'maxLoadCapacitance',
    label: 'C load max',
    meaning: 'largest capacitance the pin drives reliably',
    example: '70 pF',
    kind: { type: 'quantity', unit: 'F' },
  },
];

export const FIELD_BY_KEY: ReadonlyMap<ParamKey, ParamField> = new Map(PARAM_FIELDS.map((f) => [f.key, f]));

/** A Level typed as volts (`2`, `2.0 V`, `3V3`) or as an expression of VDD (`0.7*VDD`, `vdd - 0.45`). */
export function parseLevelText(text: string): ParamRead {
  const s = text.trim();
  const volts = parseQuantity(s, 'V');
  if (volts.ok) return { ok: true, value: volts.value };
  const expr = s.replace(/vdd/gi, 'VDD');
  if (!expr.includes('VDD')) return { ok: false, error: volts.error };
  const r = parseLevel(expr);
  if (!r.ok) return { ok: false, error: `not a Level: expected ${r.error} at character ${r.at + 1}` };
  return { ok: true, value: expr };
}

export function formatLevel(level: Level): string {
  return typeof level === 'number' ? formatQuantity(level, 'V', 4) : level;
}

function parsePoints(text: string): ParamRead {
  const items = text
    .split(/[;\n]/)
    .map((t) => t.trim())
    .filter((t) => t !== '');
  if (items.length === 0) return { ok: false, error: 'expected at least one "level @ current"' };
  const points: OutputPoint[] = [];
  for (const item of items) {
    const [v, i, ...rest] = item.split('@');
    if (i === undefined || rest.length > 0)
      return { ok: false, error: `"${item}": expected "level @ current", e.g. "VDD-0.4 @ 4m"` };
    const level = parseLevelText(v ?? '');
    if (!level.ok) return { ok: false, error: `"${item}": ${level.error}` };
    const current = parseQuantity(i, 'A');
    if (!current.ok) return { ok: false, error: `"${item}": ${current.error}` };
    points.push({ v: level.value as Level, i: current.value });
  }
  return { ok: true, value: points };
}

function parseRange(text: string): ParamRead {
  const ends = text.split(/\s*(?:…|\.\.\.|\bto\b|–|,)\s*/).filter((t) => t.trim() !== '');
  if (ends.length !== 2) return { ok: false, error: 'expected "min … max", e.g. "1.65 … 3.6"' };
  const lo = parseQuantity(ends[0]!, 'V');
  const hi = parseQuantity(ends[1]!, 'V');
  if (!lo.ok) return lo;
  if (!hi.ok) return hi;
  if (lo.value > hi.value) return { ok: false, error: 'the minimum is above the maximum' };
  return { ok: true, value: [lo.value, hi.value] };
}

/** Text to a parameter's value. Empty text is not a value: the caller treats it as "no override". */
export function parseParam(key: ParamKey, text: string): ParamRead {
  const field = FIELD_BY_KEY.get(key);
  if (field === undefined) return { ok: false, error: `unknown parameter ${key}` };
  const s = text.trim();
  switch (field.kind.type) {
    case 'level':
      return parseLevelText(s);
    case 'volts': {
      const r = parseQuantity(s, 'V');
      return r.ok ? r : { ok: false, error: r.error };
    }
    case 'quantity': {
      const r = parseQuantity(s, field.kind.unit);
      return r.ok ? r : { ok: false, error: r.error };
    }
    case 'points':
      return parsePoints(s);
    case 'schmitt': {
      const [plus, minus, ...rest] = s.split('/');
      if (minus === undefined || rest.length > 0)
        return { ok: false, error: 'expected "VT+ / VT−", e.g. "0.7*VDD / 0.3*VDD"' };
      const a = parseLevelText(plus ?? '');
      const b = parseLevelText(minus);
      if (!a.ok) return { ok: false, error: `VT+: ${a.error}` };
      if (!b.ok) return { ok: false, error: `VT−: ${b.error}` };
      return { ok: true, value: { vtPlus: a.value, vtMinus: b.value } };
    }
    case 'bool': {
      const t = s.toLowerCase();
      if (t === 'yes' || t === 'true') return { ok: true, value: true };
      if (t === 'no' || t === 'false') return { ok: true, value: false };
      return { ok: false, error: 'expected yes or no' };
    }
    case 'range':
      return parseRange(s);
    case 'busHold': {
      const [hold, overdrive, ...rest] = s.split('/');
      if (overdrive === undefined || rest.length > 0)
        return { ok: false, error: 'expected "hold / overdrive", e.g. "75 µA / 500 µA"' };
      const a = parseQuantity(hold ?? '', 'A');
      const b = parseQuantity(overdrive, 'A');
      if (!a.ok) return { ok: false, error: `hold: ${a.error}` };
      if (!b.ok) return { ok: false, error: `overdrive: ${b.error}` };
      if (a.value < 0 || b.value < 0) return { ok: false, error: 'expected currents of 0 or more' };
      return { ok: true, value: { hold: a.value, overdrive: b.value } };
    }
  }
}

/** A parameter's value as the editor shows it; the text parses back with `parseParam`. */
export function formatParam(key: ParamKey, value: unknown): string {
  const field = FIELD_BY_KEY.get(key);
  if (field === undefined || value === undefined) return '';
  switch (field.kind.type) {
    case 'level':
      return formatLevel(value as Level);
    case 'volts':
      return formatQuantity(value as number, 'V', 4);
    case 'quantity':
      return formatQuantity(value as number, field.kind.unit, 4);
    case 'points':
      return (value as OutputPoint[]).map((p) => `${formatLevel(p.v)} @ ${formatQuantity(p.i, 'A', 4)}`).join('; ');
    case 'schmitt': {
      const s = value as NonNullable<Params['schmitt']>;
      return `${formatLevel(s.vtPlus)} / ${formatLevel(s.vtMinus)}`;
    }
    case 'bool':
      return value === true ? 'yes' : 'no';
    case 'range': {
      const [lo, hi] = value as [number, number];
      return `${formatQuantity(lo, 'V', 4)} … ${formatQuantity(hi, 'V', 4)}`;
    }
    case 'busHold': {
      const b = value as NonNullable<Params['busHold']>;
      return `${formatQuantity(b.hold, 'A', 4)} / ${formatQuantity(b.overdrive, 'A', 4)}`;
    }
  }
}

/** `params` with `key` set to `value`, or without it (`undefined`); undefined when nothing is left. */
export function withParam(params: Params | undefined, key: ParamKey, value: unknown): Params | undefined {
  const next: Record<string, unknown> = { ...params };
  if (value === undefined) delete next[key];
  else next[key] = value;
  return Object.keys(next).length === 0 ? undefined : (next as Params);
}
