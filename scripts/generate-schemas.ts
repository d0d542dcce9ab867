/**
 * Writes the published JSON Schemas from the shared zod schemas (`npm run schemas`).
 * A unit test fails when the committed file differs from what this would write.
 */
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { PLAN_SCHEMA_PATH, planJsonSchemaText } from '@/shared/plan/json-schema';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const target = path.join(root, PLAN_SCHEMA_PATH);
fs.mkdirSync(path.dirname(target), { recursive: true });
fs.writeFileSync(target, planJsonSchemaText());
console.log(`wrote ${PLAN_SCHEMA_PATH}`);
