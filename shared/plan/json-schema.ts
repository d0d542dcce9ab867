import { z } from 'zod';
import { planSchema } from '@/shared/plan/schema';

/** Where the published schema lives in the repository. */
export const PLAN_SCHEMA_PATH = 'schemas/nightloom.plan.v1.schema.json';

/**
 * The JSON Schema (draft 2020-12) of a plan, generated from the zod schemas that validate
 * import, as a reader sees the file (`io: 'input'`: keys with defaults may be left out).
 * The schema describes the shape and ranges; refinements do not reach it. One that JSON Schema
 * can state is restated beside it with `.meta()` (recorded positions of a flats step need a
 * rotator angle, a focuser position or both: an `anyOf` of `required`), so the schema refuses it
 * too. The rest (calendar dates, time zones, unique target ids, stage targets present, tree
 * depth and size) are the importer's alone.
 */
export function planJsonSchema(): Record<string, unknown> {
  const generated = z.toJSONSchema(planSchema, { io: 'input', target: 'draft-2020-12' }) as Record<string, unknown>;
  const { $schema, title, description, ...rest } = generated;
  return { $schema, $id: 'urn:nightloom:schema:plan:1', title, description, ...rest };
}

/** The schema file's exact text (two-space JSON and a final newline). */
export function planJsonSchemaText(): string {
  return `${JSON.stringify(planJsonSchema(), null, 2)}\n`;
}
