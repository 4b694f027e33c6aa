/**
 * Checking what comes back from IndexedDB before trusting it: another program, an old version
 * or a damaged disk may have left a record of the wrong shape. A bad record is reported with
 * the place and what was expected, and skipped; the others still open.
 */
import type { DesignRecord, RevisionRecord } from './db.ts';

/** A stored record that could not be read. */
export interface Skipped {
  /** Where it is, e.g. `designs["3f2…"].title` or `documents["3f2…", 7]`. */
  readonly where: string;
  readonly message: string;
}

type Check = (v: unknown) => boolean;

const isString: Check = (v) => typeof v === 'string';
const isCount: Check = (v) => typeof v === 'number' && Number.isInteger(v) && v >= 0;
const isRev: Check = (v) => typeof v === 'number' && Number.isInteger(v) && v >= 1;
const isTime: Check = (v) => typeof v === 'number' && Number.isFinite(v);
const isTimeOrNull: Check = (v) => v === null || isTime(v);

const EXPECTED: Readonly<Record<string, string>> = {
  string: 'a string',
  count: 'a whole number ≥ 0',
  rev: 'a whole number ≥ 1',
  time: 'a time in milliseconds',
  timeOrNull: 'a time in milliseconds or null',
};

const DESIGN_FIELDS: readonly (readonly [keyof DesignRecord, Check, string])[] = [
  ['id', isString, 'string'],
  ['title', isString, 'string'],
  ['rev', isRev, 'rev'],
  ['createdAt', isTime, 'time'],
  ['updatedAt', isTime, 'time'],
  ['deletedAt', isTimeOrNull, 'timeOrNull'],
  ['errors', isCount, 'count'],
  ['warnings', isCount, 'count'],
];

const REVISION_FIELDS: readonly (readonly [keyof RevisionRecord, Check, string])[] = [
  ['designId', isString, 'string'],
  ['rev', isRev, 'rev'],
  ['savedAt', isTime, 'time'],
  ['title', isString, 'string'],
  ['errors', isCount, 'count'],
  ['warnings', isCount, 'count'],
];

function describeValue(v: unknown): string {
  if (v === undefined) return 'nothing';
  if (v === null) return 'null';
  if (typeof v === 'string') return `"${v.length > 40 ? `${v.slice(0, 40)}…` : v}"`;
  if (typeof v === 'object') return Array.isArray(v) ? 'a list' : 'an object';
  return String(v);
}

function checkFields<T>(
  value: unknown,
  where: string,
  fields: readonly (readonly [keyof T, Check, string])[],
): T | Skipped {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    return { where, message: `expected a record (an object), found ${describeValue(value)}` };
  }
  const record = value as Record<string, unknown>;
  for (const [key, ok, kind] of fields) {
    const v = record[key as string];
    if (!ok(v))
      return { where: `${where}.${String(key)}`, message: `expected ${EXPECTED[kind]}, found ${describeValue(v)}` };
  }
  return value as T;
}

export function isSkipped(value: unknown): value is Skipped {
  return typeof value === 'object' && value !== null && 'where' in value && 'message' in value;
}

/** Where a design record is: by its key when it has a usable one, else by its place in the table. */
export function designPlace(value: unknown, index: number): string {
  const id = typeof value === 'object' && value !== null ? (value as { id?: unknown }).id : undefined;
  return typeof id === 'string' ? `designs[${JSON.stringify(id)}]` : `designs[${index}]`;
}

/** A design record as stored, or why it cannot be used. */
export function checkDesignRecord(value: unknown, where: string): DesignRecord | Skipped {
  return checkFields<DesignRecord>(value, where, DESIGN_FIELDS);
}

/** A revision record as stored, or why it cannot be used. */
export function checkRevisionRecord(value: unknown, where: string): RevisionRecord | Skipped {
  return checkFields<RevisionRecord>(value, where, REVISION_FIELDS);
}
