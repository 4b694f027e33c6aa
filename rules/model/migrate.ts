/**
 * Migration of older design files to the current version. The reader runs `migrate()` after
 * it has checked `format` and that `version` is one it knows, and before the schema, so the
 * schema only ever sees the current version.
 *
 * How a version 2 plugs in: set `CURRENT_VERSION = 2`, change the schema to version 2, and add
 * `1: (doc) => ({ ...doc, version: 2, newKey: … })` to `STEPS`. A step takes a document of
 * version n (unvalidated, so it must tolerate odd shapes: the schema reports them afterwards),
 * returns a new document of version n + 1 and never mutates its input, so that a refused
 * file changes nothing that was stored before. Steps run in a chain, 1 → 2 → … → current.
 */
import { FORMAT_VERSION } from './schema.ts';

/** The version this program reads and writes. */
export const CURRENT_VERSION: number = FORMAT_VERSION;

type Step = (doc: Record<string, unknown>) => Record<string, unknown>;

/**
 * `STEPS[n]` turns a version-n document into a version-(n + 1) one.
 * 1 → 2: version 2 only adds optional keys (discretes, new pin parameters, a rail's minLoad), and
 * a v1 `pull` stays a pull (drawn as a resistor to its rail), so the step changes the number.
 */
const STEPS: Readonly<Record<number, Step>> = {
  1: (doc) => ({ ...doc, version: 2 }),
};

/**
 * Bring a design document up to `CURRENT_VERSION`. A document that is not an object, has no
 * integer `version`, or has a version no step starts from is returned as it is (the reader
 * reports it). For a current document it returns the very same object.
 */
export function migrate(doc: unknown): unknown {
  if (typeof doc !== 'object' || doc === null || Array.isArray(doc)) return doc;
  let current = doc as Record<string, unknown>;
  for (;;) {
    const version = current.version;
    if (typeof version !== 'number' || !Number.isInteger(version) || version >= CURRENT_VERSION) {
      return current;
    }
    const step = STEPS[version];
    if (step === undefined) return current;
    current = step(current);
  }
}
