/** The example design and small designs for the report tests. */
import { readFileSync } from 'node:fs';
import { readDesign } from '../../rules/model/reader.ts';
import type { Design } from '../../rules/model/schema.ts';

/** Text of the committed example, as a fresh clone holds it. */
export const GREENHOUSE_TEXT = readFileSync(new URL('../../rules/examples/greenhouse.json', import.meta.url), 'utf8');

/** The example, read as the command line reads it. */
export function greenhouse(): Design {
  const read = readDesign(GREENHOUSE_TEXT);
  if (!read.ok) throw new Error(`the example does not read: ${JSON.stringify(read.errors)}`);
  return read.design;
}

/** A fixed report time: SOURCE_DATE_EPOCH 1767225600 s is 2026-01-01T00:00:00Z. */
export const FIXED_TIME = '2026-01-01T00:00:00.000Z';

/**
 * Every number with its unit in a message, as engineering notation prints it (`-0.759 V`,
 * `4.7 kΩ`, `16 mA`), so that a rendering can be checked to carry them all.
 */
export function quantitiesIn(message: string): string[] {
  return message.match(/-?\d+(?:\.\d+)? [pnµmkMG]?(?:V|A|Ω|F|s\/V|s)(?![A-Za-z])/gu) ?? [];
}
