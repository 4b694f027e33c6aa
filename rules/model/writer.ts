/**
 * The canonical writer: one design, one text. Keys in the order of design-format.md's tables,
 * two-space indentation, arrays of plain values on one line (`"pins": ["U1.TX", "U2.RX"]`),
 * a final newline. Keys whose value is undefined are left out. Writing twice gives the same
 * text, and reading what was written gives the same design back.
 */
import { PARAM_KEYS, type Design } from './schema.ts';

/** The key order of one kind of object, and the orders of the objects below it. */
export interface KeyOrder {
  readonly keys: readonly string[];
  readonly children?: Readonly<Record<string, KeyOrder>>;
}

const leaf = (...keys: string[]): KeyOrder => ({ keys });

const LEVEL_POINT = leaf('v', 'i', 'vddMin');
const PARAMS: KeyOrder = {
  keys: PARAM_KEYS,
  children: {
    schmitt: leaf('vtPlus', 'vtMinus'),
    voh: LEVEL_POINT,
    vol: LEVEL_POINT,
    busHold: leaf('hold', 'overdrive'),
  },
};
const PULL = leaf('to', 'ohms', 'tolerance', 'min', 'max');

/** Key orders of design-format.md's tables; exported so a test can hold them to the schema. */
export const KEY_ORDER = {
  design: {
    keys: ['format', 'version', 'title', 'settings', 'rails', 'scenarios', 'profiles', 'parts', 'discretes', 'nets'],
    children: {
      settings: leaf('minMargin', 'defaultWiringCapacitance'),
      rails: leaf('id', 'label', 'nominal', 'tolerance', 'min', 'max', 'colour', 'minLoad'),
      scenarios: {
        keys: ['id', 'label', 'off', 'pins'],
        children: { pins: { keys: ['pin', 'role', 'drive', 'pull'], children: { pull: PULL } } },
      },
      profiles: { keys: ['id', 'label', 'source', 'params'], children: { params: PARAMS } },
      parts: {
        keys: ['id', 'label', 'rail', 'profile', 'params', 'position', 'pins'],
        children: {
          params: PARAMS,
          position: leaf('x', 'y'),
          pins: {
            keys: ['id', 'role', 'drive', 'rail', 'profile', 'params', 'pull', 'side', 'waivers'],
            children: { params: PARAMS, pull: PULL, waivers: leaf('rule', 'scenario', 'note') },
          },
        },
      },
      discretes: {
        keys: [
          'id',
          'kind',
          'label',
          'ohms',
          'tolerance',
          'tie',
          'gate',
          'vgsThMax',
          'rdsOnMax',
          'vfMax',
          'leakageMax',
          'position',
        ],
        children: { tie: leaf('1', '2'), position: leaf('x', 'y') },
      },
      nets: {
        keys: ['id', 'label', 'pins', 'pull', 'wiringCapacitance', 'maxRiseTime', 'waivers', 'route'],
        children: { pull: PULL, waivers: leaf('rule', 'scenario', 'note') },
      },
    },
  },
  params: PARAMS,
} as const satisfies Record<string, KeyOrder>;

const NO_ORDER: KeyOrder = { keys: [] };
const INDENT = '  ';

const isPlain = (v: unknown): boolean => v === null || typeof v !== 'object';

function scalar(v: unknown): string {
  // JSON.stringify writes -0 as 0; keep the sign so that reading back gives the same number.
  if (typeof v === 'number' && Object.is(v, -0)) return '-0';
  return JSON.stringify(v) ?? 'null';
}

function write(value: unknown, order: KeyOrder, depth: number): string {
  if (isPlain(value)) return scalar(value);
  const inner = INDENT.repeat(depth + 1);
  const outer = INDENT.repeat(depth);
  if (Array.isArray(value)) {
    if (value.every(isPlain)) return `[${value.map(scalar).join(', ')}]`;
    return `[\n${value.map((v) => inner + write(v, order, depth + 1)).join(',\n')}\n${outer}]`;
  }
  const record = value as Record<string, unknown>;
  const present = (k: string) => Object.hasOwn(record, k) && record[k] !== undefined && typeof record[k] !== 'function';
  const known = order.keys.filter(present);
  // Keys outside the format cannot come from the reader; they are kept (sorted, last), not dropped.
  const extra = Object.keys(record)
    .filter((k) => !order.keys.includes(k) && present(k))
    .sort();
  const keys = [...known, ...extra];
  if (keys.length === 0) return '{}';
  const lines = keys.map(
    (k) => `${inner}${JSON.stringify(k)}: ${write(record[k], order.children?.[k] ?? NO_ORDER, depth + 1)}`,
  );
  return `{\n${lines.join(',\n')}\n${outer}}`;
}

/** The canonical JSON text of a design (design-format.md), ending in a newline. */
export function writeDesign(design: Design): string {
  return `${write(design, KEY_ORDER.design, 0)}\n`;
}
