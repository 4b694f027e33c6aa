/**
 * zod's issues turned into the reader's messages: each names what was expected (and what was
 * found), in the words of the design format rather than of the validation library.
 */
import { z } from 'zod';
import type { LocatedError, PathSegment } from './paths.ts';

type Issue = z.core.$ZodIssue;

const EXPECTED: Readonly<Record<string, string>> = {
  string: 'a string',
  number: 'a number',
  boolean: 'true or false',
  array: 'an array',
  tuple: 'an array',
  object: 'an object',
};

/** A short, safe description of a found value (never its whole content). */
export function describeValue(value: unknown): string {
  if (value === undefined) return 'nothing';
  if (value === null) return 'null';
  if (typeof value === 'string') {
    const shown = value.length > 40 ? `${value.slice(0, 40)}…` : value;
    return JSON.stringify(shown);
  }
  if (typeof value === 'number' || typeof value === 'boolean') return String(value);
  if (Array.isArray(value)) return 'an array';
  if (typeof value === 'object') return 'an object';
  return `a ${typeof value}`;
}

function quoteList(values: readonly unknown[]): string {
  const shown = values.map((v) => (typeof v === 'string' ? JSON.stringify(v) : String(v)));
  return shown.length <= 1 ? (shown[0] ?? 'nothing') : `${shown.slice(0, -1).join(', ')} or ${shown.at(-1)}`;
}

function bound(
  iss: { origin: string; inclusive?: boolean; exact?: boolean },
  n: number | bigint,
  side: 'min' | 'max',
): string {
  if (iss.origin === 'array') {
    const how = iss.exact ? 'exactly' : side === 'min' ? 'at least' : 'at most';
    return `expected ${how} ${n} item${n === 1 ? '' : 's'}`;
  }
  if (iss.origin === 'string') {
    return `expected ${side === 'min' ? 'at least' : 'at most'} ${n} character${n === 1 ? '' : 's'}`;
  }
  const op = side === 'min' ? (iss.inclusive ? '≥' : '>') : iss.inclusive ? '≤' : '<';
  return `expected a number ${op} ${n}`;
}

/** What was found, for a size complaint: an array's length, else the value. */
function found(input: unknown): string {
  if (Array.isArray(input)) return `${input.length} item${input.length === 1 ? '' : 's'}`;
  if (typeof input === 'string') return `${input.length} character${input.length === 1 ? '' : 's'}`;
  return describeValue(input);
}

/**
 * The error map passed to `safeParse`. Messages the schema sets itself (an id without ".",
 * a Level that does not parse) take precedence over it, as zod defines.
 */
export const designErrorMap: z.core.$ZodErrorMap = (iss) => {
  switch (iss.code) {
    case 'invalid_type': {
      const expected = EXPECTED[iss.expected] ?? `a ${iss.expected}`;
      if (iss.input === undefined) return `missing: expected ${expected}`;
      if (iss.expected === 'number' && typeof iss.input === 'number') {
        return `expected a finite number, found ${iss.input}`;
      }
      return `expected ${expected}, found ${describeValue(iss.input)}`;
    }
    case 'invalid_value':
      return `expected ${quoteList(iss.values)}, found ${describeValue(iss.input)}`;
    case 'too_small':
      return `${bound(iss, iss.minimum, 'min')}, found ${found(iss.input)}`;
    case 'too_big':
      return `${bound(iss, iss.maximum, 'max')}, found ${found(iss.input)}`;
    case 'invalid_union':
      return 'expected a value of another form';
    default:
      return undefined;
  }
};

/** The keys an object may have at `path` of `root` (a zod schema), or undefined if unknown. */
function allowedKeys(root: z.ZodType, path: readonly PathSegment[]): string[] | undefined {
  let schema: unknown = root;
  const unwrap = () => {
    while (schema instanceof z.ZodOptional) schema = schema.unwrap();
  };
  for (const s of path) {
    unwrap();
    if (schema instanceof z.ZodObject && typeof s === 'string') schema = (schema.shape as Record<string, unknown>)[s];
    else if (schema instanceof z.ZodArray && typeof s === 'number') schema = schema.element;
    else if (schema instanceof z.ZodTuple && typeof s === 'number') schema = schema.def.items[s];
    else return undefined;
  }
  unwrap();
  return schema instanceof z.ZodObject ? Object.keys(schema.shape) : undefined;
}

function mentionsInput(message: string, input: unknown): boolean {
  return message.includes(typeof input === 'string' ? JSON.stringify(input) : String(input));
}

/** Turn zod's issues into located errors; an unknown key becomes one error at that key. */
export function issuesToErrors(root: z.ZodType, issues: readonly Issue[]): LocatedError[] {
  const out: LocatedError[] = [];
  for (const iss of issues) {
    const segments = iss.path.filter((s): s is PathSegment => typeof s !== 'symbol');
    if (iss.code === 'unrecognized_keys') {
      const keys = allowedKeys(root, segments);
      const expected = keys ? `expected only ${keys.join(', ')}` : 'expected none';
      for (const key of iss.keys) {
        out.push({
          segments: [...segments, key],
          message: `unknown key ${JSON.stringify(key)} (the format has no such key): ${expected}`,
        });
      }
      continue;
    }
    let message = iss.message;
    const input = iss.input;
    const primitive = typeof input === 'string' || typeof input === 'number' || typeof input === 'boolean';
    // A schema's own message says what was expected; add what was found, unless it says so already.
    if (primitive && !message.includes('found') && !mentionsInput(message, input)) {
      message += ` (found ${describeValue(input)})`;
    } else if (input === undefined && !message.startsWith('missing')) {
      message = `missing: ${message.replace(/, found nothing$/, '')}`;
    }
    out.push({ segments, message });
  }
  return out;
}
