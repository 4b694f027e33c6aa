/**
 * The design reader: the edge where untrusted text (an imported file, a file on the command
 * line, a record from the editor's storage) becomes a `Design`. It never throws: every
 * problem becomes a `DesignError` naming the JSON path and what was expected.
 *
 * Order: JSON → `format` and `version` (a file of another kind gets one clear message, not a
 * list of schema errors) → migrate() → the zod schema and the cross-record checks together,
 * so that one reading lists every problem, in document order, at most `MAX_ERRORS`.
 */
import { BUILTIN_PROFILE_IDS } from './profileIds.ts';
import { CURRENT_VERSION, migrate } from './migrate.ts';
import { finishErrors, ROOT_PATH, type DesignError } from './paths.ts';
import { checkReferences } from './references.ts';
import { DesignSchema, FORMAT_ID, type Design } from './schema.ts';
import { describeValue, designErrorMap, issuesToErrors } from './schemaIssues.ts';

export type { DesignError } from './paths.ts';

/** What the reader returns: the design, or every reason it was refused. */
export type ReadResult = { ok: true; design: Design } | { ok: false; errors: DesignError[] };

/** Options of `readDesign` and `validateDesign`. */
export interface ReadOptions {
  /**
   * Profile ids a part or pin may name without a design-local profile of that id; by default
   * the built-in library's (`BUILTIN_PROFILE_IDS`).
   */
  knownProfileIds?: Iterable<string>;
}

/** The most errors one reading lists; one more line then says how many were left out. */
export const MAX_ERRORS = 50;

const NOT_A_DESIGN = `expected "format": "${FORMAT_ID}": this is not a Railcross design file`;

function refuse(path: string, message: string): ReadResult {
  return { ok: false, errors: [{ path, message }] };
}

/** Line and column (1-based) of a character offset. */
function lineColumn(text: string, offset: number): { line: number; column: number } {
  let line = 1;
  let lineStart = 0;
  const end = Math.min(offset, text.length);
  for (let i = 0; i < end; i++) {
    if (text.charCodeAt(i) === 10) {
      line++;
      lineStart = i + 1;
    }
  }
  return { line, column: end - lineStart + 1 };
}

function notJson(text: string, error: unknown): ReadResult {
  const raw = error instanceof Error ? error.message : String(error);
  const position = /at position (\d+)/.exec(raw);
  const offset = position ? Number(position[1]) : text.length;
  const { line, column } = lineColumn(text, offset);
  // V8's wording, without its own position and source excerpt (we give line and column).
  const reason = raw.replace(/\s*in JSON at position.*$/s, '').replace(/, ".*$/s, '');
  return refuse(
    ROOT_PATH,
    `Not JSON (line ${line}, column ${column}): ${reason}; expected a design file, which is a JSON document`,
  );
}

/** `format` and `version`, checked before anything else. */
function checkHeader(value: unknown): DesignError | undefined {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    return { path: ROOT_PATH, message: `${NOT_A_DESIGN} (found ${describeValue(value)}, not an object)` };
  }
  const has = (k: string) => Object.hasOwn(value, k);
  const format = has('format') ? (value as Record<string, unknown>).format : undefined;
  if (format !== FORMAT_ID) {
    return { path: 'format', message: `${NOT_A_DESIGN} (found ${describeValue(format)})` };
  }
  const version = has('version') ? (value as Record<string, unknown>).version : undefined;
  if (typeof version === 'number' && Number.isInteger(version) && version > CURRENT_VERSION) {
    return {
      path: 'version',
      message: `expected version ${CURRENT_VERSION} or earlier, found ${version}: the file was written by a newer Railcross`,
    };
  }
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 1) {
    return {
      path: 'version',
      message: `expected version ${CURRENT_VERSION} (a whole number), found ${describeValue(version)}`,
    };
  }
  return undefined;
}

function validate(value: unknown, options: ReadOptions | undefined): ReadResult {
  const header = checkHeader(value);
  if (header) return { ok: false, errors: [header] };
  const doc = migrate(value);
  const parsed = DesignSchema.safeParse(doc, { error: designErrorMap, reportInput: true });
  const builtin = new Set(options?.knownProfileIds ?? BUILTIN_PROFILE_IDS);
  const located = [
    ...(parsed.success ? [] : issuesToErrors(DesignSchema, parsed.error.issues)),
    ...checkReferences(doc, builtin),
  ];
  if (parsed.success && located.length === 0) return { ok: true, design: parsed.data };
  return { ok: false, errors: finishErrors(doc, located, MAX_ERRORS) };
}

function unreadable(error: unknown): ReadResult {
  const why = error instanceof Error ? error.message : 'unknown error';
  return refuse(ROOT_PATH, `could not read the design (${why}): expected a plain JSON document`);
}

/**
 * Check an already-parsed value (e.g. a record from the editor's storage) and return it as a
 * design, a fresh object, or the reasons it was refused. Never throws.
 */
export function validateDesign(value: unknown, options?: ReadOptions): ReadResult {
  try {
    return validate(value, options);
  } catch (error) {
    // Only a value that is not plain JSON data (a getter that throws, a hostile proxy) lands here.
    return unreadable(error);
  }
}

/**
 * Read a design file's text: parse the JSON (a leading byte-order mark is allowed), then as
 * `validateDesign`. Never throws.
 */
export function readDesign(text: string, options?: ReadOptions): ReadResult {
  try {
    if (typeof text !== 'string')
      return refuse(ROOT_PATH, `expected the text of a design file, found ${describeValue(text)}`);
    const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
    let value: unknown;
    try {
      value = JSON.parse(body);
    } catch (error) {
      return notJson(body, error);
    }
    return validate(value, options);
  } catch (error) {
    return unreadable(error);
  }
}
