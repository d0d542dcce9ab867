import fs from 'node:fs';
import path from 'node:path';
import Ajv2020 from 'ajv/dist/2020';
import addFormats from 'ajv-formats';
import { parse } from 'yaml';
import { describe, expect, it } from 'vitest';
import { importPlan, planJsonSchemaText, planSchema, PLAN_SCHEMA_PATH } from '@/shared/plan';

const ROOT = path.resolve(__dirname, '../..');
const FIXTURES = path.join(ROOT, 'tests/fixtures/plans');
const fixtures = fs.readdirSync(FIXTURES).filter((f) => f.endsWith('.yaml')).sort();

describe('the published JSON Schema', () => {
  it('is up to date with the zod schemas (run `npm run schemas` after changing them)', () => {
    const committed = fs.readFileSync(path.join(ROOT, PLAN_SCHEMA_PATH), 'utf8');
    expect(committed).toBe(planJsonSchemaText());
  });

  it('agrees with the zod schemas on every fixture (valid-*.yaml pass both, invalid-*.yaml fail both)', () => {
    const ajv = new Ajv2020({ allErrors: true, strict: false });
    addFormats(ajv);
    const validate = ajv.compile(JSON.parse(planJsonSchemaText()) as object);
    expect(fixtures.filter((f) => f.startsWith('valid-')).length).toBeGreaterThanOrEqual(3);
    expect(fixtures.filter((f) => f.startsWith('invalid-')).length).toBeGreaterThanOrEqual(5);
    for (const name of fixtures) {
      const text = fs.readFileSync(path.join(FIXTURES, name), 'utf8');
      const data = parse(text) as unknown;
      const expected = name.startsWith('valid-');
      expect(planSchema.safeParse(data).success, `zod on ${name}`).toBe(expected);
      expect(validate(data), `ajv on ${name}: ${JSON.stringify(validate.errors?.slice(0, 2))}`).toBe(expected);
      expect(importPlan(text).ok, `importPlan on ${name}`).toBe(expected);
    }
  });
});
