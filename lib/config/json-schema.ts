import { z } from 'zod';
import { configSchema } from './schema.js';

/** The JSON Schema of basinquota.yaml (draft 2020-12), generated from the zod schema; shipped as schema/basinquota.schema.json. */
export function configJsonSchema(): object {
  const schema = z.toJSONSchema(configSchema, { io: 'input', target: 'draft-2020-12' }) as Record<string, unknown>;
  return { ...schema, $id: 'basinquota.schema.json', title: 'basinquota project configuration' };
}
