/**
 * `npm run schema`: write every file of SCHEMA_FILES into rules/schema/. Importable too (it
 * only writes when run as a script).
 */
import { writeFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { SCHEMA_FILES, schemaText } from './schemas.ts';

export { designJsonSchema, reportJsonSchema, SCHEMA_FILES, schemaText } from './schemas.ts';

/** Write the schema files into `dir` (default: this folder); returns the paths written. */
export function writeSchemaFiles(dir = fileURLToPath(new URL('.', import.meta.url))): string[] {
  return SCHEMA_FILES.map(({ file, build }) => {
    const path = resolve(dir, file);
    writeFileSync(path, schemaText(build()));
    return path;
  });
}

if (process.argv[1] !== undefined && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  for (const path of writeSchemaFiles()) console.log(`wrote ${path}`);
}
