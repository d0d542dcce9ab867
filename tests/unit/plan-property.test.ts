import fc from 'fast-check';
import { parse, stringify } from 'yaml';
import { describe, expect, it } from 'vitest';
import { exportPlan, importPlan, type PlanInput } from '@/shared/plan';
import { NODE_KINDS } from '@/shared/recipe/schema';
import { recipeChildrenArb, recipeTextArb } from './plan-arbitraries';
import { samplePlan } from './plan-sample';

/*
 * Property-based checks of plan-format.md: any valid recipe survives export → import → export
 * byte for byte, and any broken document is refused cleanly (no throw, at least one located
 * error). Runs are bounded so the unit suite stays fast.
 */

const RUNS = 100;

const planArb = fc.record({ children: recipeChildrenArb, name: recipeTextArb.name, notes: recipeTextArb.notes }).map(({ children, name, notes }): PlanInput => {
  const plan = samplePlan();
  return { ...plan, recipe: { name, notes, children } } as PlanInput;
});

type Json = Record<string, unknown>;

/** Every path to a mapping inside the recipe tree's nodes (the nodes themselves). */
function nodePaths(plan: Json): (string | number)[][] {
  const out: (string | number)[][] = [];
  const visit = (list: unknown, path: (string | number)[]) => {
    (list as Json[]).forEach((n, i) => {
      out.push([...path, i]);
      if (Array.isArray(n.children)) visit(n.children, [...path, i, 'children']);
    });
  };
  visit((plan.recipe as Json).children, ['recipe', 'children']);
  return out;
}

function numberLeaves(value: unknown, path: (string | number)[] = [], out: (string | number)[][] = []): (string | number)[][] {
  if (typeof value === 'number') out.push(path);
  else if (Array.isArray(value)) value.forEach((v, i) => numberLeaves(v, [...path, i], out));
  else if (value && typeof value === 'object') for (const [k, v] of Object.entries(value)) numberLeaves(v, [...path, k], out);
  return out;
}

function getAt(root: Json, path: (string | number)[]): Json {
  return path.reduce<unknown>((v, k) => (v as Json)[k], root) as Json;
}

function setAt(root: Json, path: (string | number)[], value: unknown): void {
  getAt(root, path.slice(0, -1))[path[path.length - 1] as string] = value;
}

const REQUIRED = [['meta', 'title'], ['meta', 'created'], ['site', 'latitudeDeg'], ['site', 'timeZone'], ['night', 'date'], ['recipe', 'name'], ['targets', 0, 'raDeg'], ['format']];
const BOUNDED: [(string | number)[], number][] = [[['site', 'latitudeDeg'], 90], [['site', 'longitudeDeg'], 180], [['site', 'elevationM'], 9000], [['rig', 'camera', 'bitDepth'], 16], [['targets', 0, 'decDeg'], 90]];

/** A mutation that makes a valid exported plan invalid, as YAML text. */
const brokenArb = fc.tuple(planArb, fc.nat(), fc.integer({ min: 0, max: 4 }), fc.double({ min: 0.5, max: 1e6, noNaN: true }), fc.string({ minLength: 1, maxLength: 12 })).map(([plan, pick, mutation, excess, word]) => {
  const text = exportPlan(plan);
  if (mutation === 4) return text.slice(0, pick % text.indexOf('\nrecipe:'));
  const data = parse(text) as Json;
  const nodes = nodePaths(data);
  if (mutation === 0) {
    const path = nodes.length > 0 && pick % 2 === 0 ? [...nodes[pick % nodes.length]!, pick % 3 === 0 ? 'kind' : 'id'] : REQUIRED[pick % REQUIRED.length]!;
    delete getAt(data, path.slice(0, -1))[path[path.length - 1] as string];
  } else if (mutation === 1) {
    const leaves = numberLeaves(data);
    setAt(data, leaves[pick % leaves.length]!, `${word} not a number`);
  } else if (mutation === 2) {
    const [path, max] = BOUNDED[pick % BOUNDED.length]!;
    setAt(data, path, max + excess);
  } else {
    const kind = (NODE_KINDS as readonly string[]).includes(word) ? `${word}-x` : word;
    if (nodes.length > 0) setAt(data, [...nodes[pick % nodes.length]!, 'kind'], kind);
    else data.recipe = { name: 'x', children: [{ id: '00000000-0000-4000-8000-000000000000', kind }] };
  }
  return stringify(data);
});

describe('plan export and import (property-based)', () => {
  it('export → import → export is byte-identical for random valid recipes', () => {
    fc.assert(
      fc.property(planArb, (plan) => {
        const first = exportPlan(plan);
        const imported = importPlan(first);
        if (!imported.ok) throw new Error(`refused: ${JSON.stringify(imported.errors.slice(0, 3))}`);
        expect(exportPlan(imported.plan)).toBe(first);
        expect(imported.plan.recipe.children.length).toBe(plan.recipe.children.length);
      }),
      { numRuns: RUNS },
    );
  }, 30_000);

  it('refuses broken documents cleanly: no throw, at least one error with a message', () => {
    fc.assert(
      fc.property(brokenArb, (text) => {
        const result = importPlan(text);
        expect(result.ok).toBe(false);
        if (result.ok) return;
        expect(result.errors.length).toBeGreaterThan(0);
        for (const e of result.errors) {
          expect(e.message.length).toBeGreaterThan(0);
          if (e.line !== null) expect(e.line).toBeGreaterThanOrEqual(1);
        }
      }),
      { numRuns: RUNS },
    );
  }, 30_000);
});
