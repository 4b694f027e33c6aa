/**
 * The published JSON Schema files, derived from the zod schemas. `generate.ts` writes them;
 * a test fails when a committed file is stale. Adding a schema is one line in `SCHEMA_FILES`.
 */
import { z } from 'zod';
import { DesignSchema, FORMAT_VERSION } from '../model/schema.ts';
import { REPORT_FORMAT_VERSION, ReportSchema } from '../report/reportSchema.ts';

/** A JSON Schema document. */
export type JsonSchema = Record<string, unknown>;

/** Identifier of the published design schema (a URN: the project has no web address of its own). */
export const DESIGN_SCHEMA_ID = `urn:railcross:schema:design:${FORMAT_VERSION}`;

/** Put the identifying keys first, then zod's output. */
function publish(schema: z.ZodType, id: string, title: string, description: string): JsonSchema {
  const { $schema, ...body } = z.toJSONSchema(schema) as JsonSchema;
  return { $schema, $id: id, title, description, ...body };
}

/** The JSON Schema of the design file (design-format.md). */
export function designJsonSchema(): JsonSchema {
  return publish(
    DesignSchema,
    DESIGN_SCHEMA_ID,
    `Railcross design file, version ${FORMAT_VERSION}`,
    'A block diagram of chips on supply rails and the nets between them. Quantities are SI numbers (V, A, Ω, F, s). ' +
      'References between records (a net naming PART.PIN, a part naming a rail or a profile) and unique ids are checked by the Railcross reader, not by this schema.',
  );
}

/** Identifier of the published report schema. */
export const REPORT_SCHEMA_ID = `urn:railcross:schema:report:${REPORT_FORMAT_VERSION}`;

/** The JSON Schema of the rule report (report-format.md). */
export function reportJsonSchema(): JsonSchema {
  return publish(
    ReportSchema,
    REPORT_SCHEMA_ID,
    `Railcross rule report, version ${REPORT_FORMAT_VERSION}`,
    'What `railcross check FILE --json` prints and the editor exports: the findings of every rule in every power state checked, ' +
      'the rail crossings, the profiles used and the cautions. Quantities in values are SI numbers (V, A, Ω, F, s).',
  );
}

/** Every generated schema file: its name in rules/schema/ and how to build it. */
export const SCHEMA_FILES: readonly { file: string; build: () => JsonSchema }[] = [
  { file: 'design.schema.json', build: designJsonSchema },
  { file: 'report.schema.json', build: reportJsonSchema },
];

/** The committed text of a schema: two-space JSON with a final newline. */
export function schemaText(schema: JsonSchema): string {
  return `${JSON.stringify(schema, null, 2)}\n`;
}
