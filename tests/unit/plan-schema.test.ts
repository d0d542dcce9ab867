import fs from 'node:fs';
import path from 'node:path';
import Ajv2020 from 'ajv/dist/2020';
import addFormats from 'ajv-formats';
import { parse } from 'yaml';
import { describe, expect, it } from 'vitest';
import { importPlan, planJsonSchemaText, planSchema, PLAN_SCHEMA_PATH } from '@/shared/plan';
import { samplePlan } from './plan-sample';

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

  // recipe.md: recorded positions carry a rotator angle, a focuser position or both; zod checks
  // it with a refinement, the schema with an `anyOf` of `required`.
  it('refuses recorded positions with neither a rotator angle nor a focuser position, as zod does', () => {
    const ajv = new Ajv2020({ allErrors: true, strict: false });
    addFormats(ajv);
    const validate = ajv.compile(JSON.parse(planJsonSchemaText()) as object);
    const withPositions = (positions: Record<string, number>) => {
      const plan = samplePlan();
      const flats = { kind: 'flats', id: '99999999-9999-4999-8999-999999999995', filters: ['L'], matchFramingOf: { kind: 'positions', ...positions } };
      return { ...plan, recipe: { ...plan.recipe, children: [...plan.recipe.children, flats] } };
    };
    const cases: [Record<string, number>, boolean][] = [
      [{}, false],
      [{ rotatorAngleDeg: 12.5 }, true],
      [{ focuserPositionSteps: 24_000 }, true],
      [{ rotatorAngleDeg: 12.5, focuserPositionSteps: 24_000 }, true],
    ];
    for (const [positions, expected] of cases) {
      const data = withPositions(positions);
      expect(planSchema.safeParse(data).success, `zod on ${JSON.stringify(positions)}`).toBe(expected);
      expect(validate(data), `ajv on ${JSON.stringify(positions)}: ${JSON.stringify(validate.errors?.slice(0, 2))}`).toBe(expected);
    }
  });

  // J2000 right ascension and position angle are 0 ≤ x < 360: 360 itself is 0 and is refused by both.
  it('refuses a target framing at RA 360° or PA 360°, as zod does, and takes 359.999°', () => {
    const ajv = new Ajv2020({ allErrors: true, strict: false });
    addFormats(ajv);
    const validate = ajv.compile(JSON.parse(planJsonSchemaText()) as object);
    const withFraming = (raDeg: number, positionAngleDeg: number) => {
      const plan = samplePlan();
      const [first, ...rest] = plan.targets ?? [];
      const framings = (first!.framings ?? []).map((f, i) => (i === 0 ? { ...f, raDeg, positionAngleDeg } : f));
      expect(framings.length).toBeGreaterThan(0);
      return { ...plan, targets: [{ ...first!, framings }, ...rest] };
    };
    const cases: [number, number, boolean][] = [
      [360, 10, false],
      [10, 360, false],
      [359.999, 359.999, true],
    ];
    for (const [ra, pa, expected] of cases) {
      const data = withFraming(ra, pa);
      expect(planSchema.safeParse(data).success, `zod on RA ${ra}, PA ${pa}`).toBe(expected);
      expect(validate(data), `ajv on RA ${ra}, PA ${pa}`).toBe(expected);
    }
  });
});
