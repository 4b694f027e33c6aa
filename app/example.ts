/** The example design the editor opens on a first start. */
import { greenhouse as example } from '../rules/examples/index.ts';
import { validateDesign } from '../rules/model/index.ts';
import type { Design } from '../rules/model/index.ts';

/** The greenhouse irrigation controller, read through the reader like any other file. */
export function exampleDesign(): Design {
  const read = validateDesign(structuredClone(example));
  if (!read.ok)
    throw new Error(`the bundled example is not a valid design: ${read.errors[0]?.path} ${read.errors[0]?.message}`);
  return read.design;
}
