/**
 * Findings that cannot be decided. A rule computes margins, levels and currents from the
 * design's numbers; when one of them is not a finite number (NaN from 0/0, ±∞ from an
 * overflow, reachable only by a design that bypassed the reader's limits or by a bug), the
 * rule's own sentence ("NML −∞ V", "sinks NaN A") would be nonsense and its severity
 * meaningless. The engine therefore turns every draft carrying such a number into an error of
 * our own wording, "cannot be guaranteed", whatever severity the rule gave: the verdict is the
 * product, and a check that could not decide must fail, never pass.
 *
 * Its values keep the rule's keys with `null` in place of each non-finite number (JSON has no
 * NaN or ∞) and list those keys under `undecidable`.
 */

/** The message id of such a finding (no rule defines one of that name). */
export const UNDECIDABLE = 'undecidable';

export const UNDECIDABLE_HINT =
  'Check the numbers of the rails, pulls and parts involved: each must be finite and inside the ' +
  'limits of the design format (a file read through the design reader always is).';

/** Dotted paths of the numbers in `value` that are not finite, depth-first in key order. */
export function nonFinitePaths(value: unknown, path = ''): string[] {
  if (typeof value === 'number') return Number.isFinite(value) ? [] : [path];
  if (value === null || typeof value !== 'object') return [];
  const out: string[] = [];
  const entries = Array.isArray(value) ? value.map((v, k) => [String(k), v] as const) : Object.entries(value);
  for (const [k, v] of entries) out.push(...nonFinitePaths(v, path === '' ? k : `${path}.${k}`));
  return out;
}

/** A copy with every non-finite number replaced by null (what JSON would write anyway, but said openly). */
export function finiteOrNull<T>(value: T): T {
  if (typeof value === 'number') return (Number.isFinite(value) ? value : null) as T;
  if (value === null || typeof value !== 'object') return value;
  if (Array.isArray(value)) return value.map(finiteOrNull) as T;
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(value)) out[k] = finiteOrNull(v);
  return out as T;
}

function at(path: string, root: unknown): unknown {
  return path
    .split('.')
    .reduce<unknown>(
      (o, k) => (o !== null && typeof o === 'object' ? (o as Record<string, unknown>)[k] : undefined),
      root,
    );
}

/**
 * Whether `value` holds a number that is not finite. Every finding's values and data are asked
 * this, and almost every answer is no: it walks without building the paths (nor any array), so
 * that the paths are worked out only for the rare draft that has one.
 */
export function hasNonFinite(value: unknown): boolean {
  if (typeof value === 'number') return !Number.isFinite(value);
  if (value === null || typeof value !== 'object') return false;
  if (Array.isArray(value)) {
    for (let k = 0; k < value.length; k++) if (hasNonFinite(value[k])) return true;
    return false;
  }
  for (const k in value) {
    if (Object.hasOwn(value, k) && hasNonFinite((value as Record<string, unknown>)[k])) return true;
  }
  return false;
}

const NONE: readonly string[] = Object.freeze([]);

/** The non-finite numbers of a draft: its values' paths, then its message data's not already named. */
export function undecidablePaths(values: unknown, data: unknown): readonly string[] {
  if (!hasNonFinite(values) && !hasNonFinite(data)) return NONE;
  const paths = nonFinitePaths(values);
  for (const p of nonFinitePaths(data)) if (!paths.includes(p)) paths.push(p);
  return paths;
}

/** A path named with what its number is, in words: "margin (not a number)", "load (+infinite)". */
function named(path: string, values: unknown, data: unknown): string {
  const inValues = at(path, values);
  const v = typeof inValues === 'number' ? inValues : at(path, data);
  if (typeof v !== 'number' || Number.isNaN(v)) return `${path} (not a number)`;
  return `${path} (${v > 0 ? '+' : '−'}infinite)`;
}

/** The sentence of an undecidable finding: which check, on what, and which numbers failed. */
export function undecidableMessage(
  title: string,
  subject: string,
  paths: readonly string[],
  values: unknown,
  data: unknown,
): string {
  const names = paths.map((p) => named(p, values, data));
  return (
    `${title}: cannot be guaranteed${subject === '' ? '' : ` for ${subject}`}, ` +
    `because ${names.join(', ')} ${names.length === 1 ? 'is not a finite number' : 'are not finite numbers'}; ` +
    'the check could not decide and counts as failed.'
  );
}
