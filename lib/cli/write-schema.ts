// Write schema/basinquota.schema.json from the zod config schema (run by `npm run schema`; a test keeps it current).
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { configJsonSchema } from '../config/index.js';
import { PACKAGE_ROOT } from './package-info.js';

/** Path of the shipped JSON Schema. */
export const SCHEMA_PATH = join(PACKAGE_ROOT, 'schema', 'basinquota.schema.json');

/** The schema file's exact text. */
export function schemaText(): string {
  return `${JSON.stringify(configJsonSchema(), null, 2)}\n`;
}

if (process.argv[1] && /write-schema\.ts$/.test(process.argv[1])) writeFileSync(SCHEMA_PATH, schemaText());
