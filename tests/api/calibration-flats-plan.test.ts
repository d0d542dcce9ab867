/**
 * Flats steps that return to recorded rotator and focuser positions (`matchFramingOf` of kind
 * `positions`) through the YAML plan: export, the committed JSON Schema, and import for the same
 * and for another user.
 */
import fs from 'node:fs';
import path from 'node:path';
import Ajv2020 from 'ajv/dist/2020';
import addFormats from 'ajv-formats';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { importPlan, PLAN_SCHEMA_PATH } from '@/shared/plan';
import { createNode } from '@/shared/recipe/factory';
import { recipeTreeSchema } from '@/shared/recipe/schema';
import type { NodeOf, RecipeNode } from '@/shared/recipe/types';
import { dateObs, intakeOk, light } from './calibration-fixtures';
import { ORIGIN, signUp, startHarness, validSite, type Harness, type TestUser } from './harness';

type Positions = Extract<NonNullable<NodeOf<'flats'>['matchFramingOf']>, { kind: 'positions' }>;

let h: Harness;
let owner: TestUser;
let other: TestUser;

beforeAll(async () => {
  h = await startHarness();
  owner = await signUp(h, { name: 'Flats Exporter' });
  other = await signUp(h);
  expect((await owner.agent.post('/api/sites').set('Origin', ORIGIN).send(validSite)).status).toBe(201);
});
afterAll(async () => h.close());

/** The committed schema file, as a reader of the format gets it (not the one generated in memory). */
function committedSchemaValidator() {
  const ajv = new Ajv2020({ allErrors: true, strict: false });
  addFormats(ajv);
  return ajv.compile(JSON.parse(fs.readFileSync(path.resolve(__dirname, '../..', PLAN_SCHEMA_PATH), 'utf8')) as object);
}

const flatsSteps = (children: readonly RecipeNode[]) => children.filter((n): n is NodeOf<'flats'> => n.kind === 'flats');
const positionsOf = (children: readonly RecipeNode[]) => flatsSteps(children).map((s) => s.matchFramingOf);

/** Exports a recipe on 2026-10-12 and checks the text against the committed JSON Schema. */
async function exportChecked(recipeId: string): Promise<string> {
  const res = await owner.agent.get(`/api/recipes/${recipeId}/plan?date=2026-10-12`);
  expect(res.status, res.text).toBe(200);
  const validate = committedSchemaValidator();
  expect(validate(parse(res.text)), JSON.stringify(validate.errors?.slice(0, 3))).toBe(true);
  return res.text;
}

async function importAs(u: TestUser, text: string) {
  const res = await u.agent.post('/api/plans/import?createSite=1&createRig=1').set('Origin', ORIGIN).set('Content-Type', 'text/yaml').send(text);
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body.recipe as { id: string; tree: { children: RecipeNode[] } };
}

describe('recorded positions in the plan format', () => {
  it('a flats recipe made from a night’s lights keeps its positions through export and import', async () => {
    await intakeOk(owner, [
      light('L1.fits', { dateObs: '2026-10-12T20:00:00', exposureS: 120, filter: 'L', rotatorAngleDeg: 12.5, focuserPositionSteps: 15200 }),
      light('Ha1.fits', { dateObs: dateObs('2026-10-12T20:00:00', 30), exposureS: 300, filter: 'Ha', rotatorAngleDeg: 192.5, focuserPositionSteps: 15180 }),
    ]);
    const made = await owner.agent.post('/api/calibration/flats-recipe').set('Origin', ORIGIN).send({ nightDate: '2026-10-12', source: 'panel' });
    expect(made.status).toBe(201);
    const original = recipeTreeSchema.parse((await owner.agent.get(`/api/recipes/${made.body.recipeId}`)).body.recipe.tree);
    const expected: Positions[] = [
      { kind: 'positions', rotatorAngleDeg: 192.5, focuserPositionSteps: 15180 },
      { kind: 'positions', rotatorAngleDeg: 12.5, focuserPositionSteps: 15200 },
    ];
    expect(positionsOf(original.children)).toEqual(expected);

    const text = await exportChecked(made.body.recipeId);
    const read = importPlan(text);
    if (!read.ok) throw new Error(JSON.stringify(read.errors));
    expect(positionsOf(read.plan.recipe.children)).toEqual(expected);
    expect(positionsOf((await importAs(other, text)).tree.children)).toEqual(expected);
  });

  it('keeps edge values exactly: zeros, just under 360°, the largest focuser position, one of the two alone, a float with many digits', async () => {
    const cases: Positions[] = [
      { kind: 'positions', rotatorAngleDeg: 0, focuserPositionSteps: 0 },
      { kind: 'positions', rotatorAngleDeg: 359.99 },
      { kind: 'positions', focuserPositionSteps: 1_000_000 },
      { kind: 'positions', rotatorAngleDeg: 0.1 + 0.2, focuserPositionSteps: 15230 },
    ];
    const tree = { children: [createNode('note', { text: 'Panel on the dew shield' }), ...cases.map((matchFramingOf, i) => createNode('flats', { filters: [i % 2 ? 'Ha' : 'L'], source: 'panel', matchFramingOf }))] };
    const made = await owner.agent.post('/api/recipes').set('Origin', ORIGIN).send({ name: 'Flats at recorded positions', start: { kind: 'tree', tree } });
    expect(made.status, JSON.stringify(made.body)).toBe(201);
    expect(positionsOf(made.body.recipe.tree.children)).toEqual(cases);

    const text = await exportChecked(made.body.recipe.id);
    const mine = await importAs(owner, text);
    const theirs = await importAs(other, text);
    for (const imported of [mine, theirs]) {
      expect(positionsOf(imported.tree.children)).toEqual(cases);
      // Node ids and every other field come back too.
      expect(flatsSteps(imported.tree.children)).toEqual(flatsSteps(made.body.recipe.tree.children));
    }
    // An imported recipe exports to the same steps again.
    const again = importPlan(await exportChecked(mine.id));
    expect(again.ok && positionsOf(again.plan.recipe.children)).toEqual(cases);

    // The schema is no rubber stamp: what the recipe schema refuses, it refuses too.
    const validate = committedSchemaValidator();
    const data = parse(text) as { recipe: { children: { kind: string; matchFramingOf?: unknown }[] } };
    const step = data.recipe.children.find((n) => n.kind === 'flats')!;
    for (const bad of [{ kind: 'positions', rotatorAngleDeg: 360 }, { kind: 'positions', focuserPositionSteps: 1.5 }, { kind: 'positions', focuserPositionSteps: -1 }, { kind: 'positions', rotatorAngleDeg: '12.5' }, { kind: 'places', rotatorAngleDeg: 12.5 }]) {
      step.matchFramingOf = bad;
      expect(validate(data), JSON.stringify(bad)).toBe(false);
    }
  });
});

