import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { SCHEMA_PATH, schemaText } from '../../lib/cli/write-schema.js';

describe('configJsonSchema', () => {
  it('the shipped schema/basinquota.schema.json equals the schema generated from the zod definition (run npm run schema)', () => {
    expect(readFileSync(SCHEMA_PATH, 'utf8')).toBe(schemaText());
  });

  it('configJsonSchema() is draft 2020-12 and forbids unknown top-level keys', () => {
    const schema = JSON.parse(schemaText()) as { $schema: string; additionalProperties: boolean; required: string[] };
    expect(schema.$schema).toBe('https://json-schema.org/draft/2020-12/schema');
    expect(schema.additionalProperties).toBe(false);
    expect(schema.required).toEqual(['report', 'inputs', 'classes']);
  });
});
