/**
 * JSON paths in the reader's messages, and the document order they are listed in.
 *
 * A path is written the way a JavaScript expression would reach the value from the document:
 * `nets[3].pins[1]`, `parts[0].params.vih`, `parts[2]["odd key"]`; the whole document is
 * `(root)`.
 */

/** One step of a path: an object key or an array index. */
export type PathSegment = string | number;

/** A refusal before it is formatted: where, and what was expected. */
export interface LocatedError {
  segments: readonly PathSegment[];
  message: string;
}

/** One reason a design was refused. */
export interface DesignError {
  /** JSON path of the offending value, e.g. `nets[3].pins[1]`; `(root)` for the whole document. */
  path: string;
  /** What is wrong, saying what was expected. */
  message: string;
}

/** The path of the whole document. */
export const ROOT_PATH = '(root)';

const IDENTIFIER = /^[A-Za-z_$][A-Za-z0-9_$]*$/;

/** Format path segments as `nets[3].pins[1]`; no segments gives `(root)`. */
export function formatPath(segments: readonly PathSegment[]): string {
  if (segments.length === 0) return ROOT_PATH;
  let out = '';
  for (const s of segments) {
    if (typeof s === 'number') out += `[${s}]`;
    else if (IDENTIFIER.test(s)) out += out === '' ? s : `.${s}`;
    else out += `[${JSON.stringify(s)}]`;
  }
  return out;
}

function child(node: unknown, s: PathSegment): unknown {
  if (typeof node !== 'object' || node === null) return undefined;
  if (typeof s === 'number') return Array.isArray(node) ? node[s] : undefined;
  return Object.hasOwn(node, s) ? (node as Record<string, unknown>)[s] : undefined;
}

/**
 * The position of each segment among its siblings in the document: array indices as they
 * are, keys by their place in the object. A key that is not there (a missing required key)
 * sorts after the keys that are.
 */
function ranks(root: unknown, segments: readonly PathSegment[], keyOrder: Map<object, Map<string, number>>): number[] {
  const out: number[] = [];
  let node = root;
  for (const s of segments) {
    if (typeof s === 'number') {
      out.push(s);
    } else if (typeof node === 'object' && node !== null) {
      let order = keyOrder.get(node);
      if (order === undefined) {
        order = new Map(Object.keys(node).map((k, i) => [k, i]));
        keyOrder.set(node, order);
      }
      out.push(order.get(s) ?? order.size);
    } else {
      out.push(0);
    }
    node = child(node, s);
  }
  return out;
}

function compareRanks(a: readonly number[], b: readonly number[]): number {
  const n = Math.min(a.length, b.length);
  for (let i = 0; i < n; i++) {
    const d = a[i]! - b[i]!;
    if (d !== 0) return d;
  }
  return a.length - b.length;
}

/**
 * Format, de-duplicate and sort errors into document order (a parent before its children,
 * siblings in the order the file has them; ties keep the order found), and keep at most
 * `limit`, adding one line that says how many more there were.
 */
export function finishErrors(root: unknown, errors: readonly LocatedError[], limit: number): DesignError[] {
  const keyOrder = new Map<object, Map<string, number>>();
  const seen = new Set<string>();
  const unique: { rank: number[]; error: DesignError }[] = [];
  for (const e of errors) {
    const path = formatPath(e.segments);
    const key = `${path}\u0000${e.message}`;
    if (seen.has(key)) continue;
    seen.add(key);
    unique.push({ rank: ranks(root, e.segments, keyOrder), error: { path, message: e.message } });
  }
  unique.sort((x, y) => compareRanks(x.rank, y.rank));
  const listed = unique.slice(0, limit).map((u) => u.error);
  if (unique.length > limit) {
    listed.push({
      path: ROOT_PATH,
      message: `${unique.length - limit} more problems not listed: expected at most ${limit} listed at a time; fix these first`,
    });
  }
  return listed;
}
