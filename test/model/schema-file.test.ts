/** The committed JSON Schema files must be what the generator writes now. */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { SCHEMA_FILES, designJsonSchema, schemaText } from '../../rules/schema/schemas.ts';

describe('committed JSON Schema files', () => {
  it.each(SCHEMA_FILES)('rules/schema/$file is up to date', ({ file, build }) => {
    let committed = '';
    try {
      committed = readFileSync(new URL(`../../rules/schema/${file}`, import.meta.url), 'utf8');
    } catch {
      // Reported by the assertion below, with the remedy.
    }
    expect(
      committed === schemaText(build()),
      `rules/schema/${file} is stale or missing: run \`npm run schema\` and commit it`,
    ).toBe(true);
  });

  it('the design schema names itself, is closed, and defines the records', () => {
    const s = designJsonSchema();
    expect(Object.keys(s).slice(0, 4)).toEqual(['$schema', '$id', 'title', 'description']);
    expect(s.$id).toBe('urn:railcross:schema:design:2');
    expect(s.additionalProperties).toBe(false);
    expect(s.required).toEqual(['format', 'version', 'title', 'rails', 'parts', 'nets']);
    expect(Object.keys(s.$defs as object).sort()).toEqual([
      'DiodeShifter',
      'Discrete',
      'FetShifter',
      'Level',
      'Net',
      'OutputPoint',
      'Params',
      'Part',
      'Pin',
      'PinState',
      'Profile',
      'Pull',
      'Rail',
      'Resistor',
      'Scenario',
      'Waiver',
    ]);
  });
});
