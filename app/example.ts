/** The example design the editor opens on a first start. */
import example from '../rules/examples/greenhouse.json';
import { validateDesign } from '../rules/model/reader.ts';
import type { Design } from '../rules/model/schema.ts';

/** The greenhouse irrigation controller, read through the reader like any other file. */
export function exampleDesign(): Design {
  const read = validateDesign(structuredClone(example));
  if (!read.ok)
    throw new Error(`the bundled example is not a valid design: ${read.errors[0]?.path} ${read.errors[0]?.message}`);
  return read.design;
}
