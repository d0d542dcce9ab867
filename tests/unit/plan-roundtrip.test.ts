import fs from 'node:fs';
import path from 'node:path';
import { parse } from 'yaml';
import { describe, expect, it } from 'vitest';
import { buildPlan, exportPlan, importPlan, planDryRunInput, type Plan } from '@/shared/plan';
import { runDryRun } from '@/shared/dry-run';
import { defaultRigInput } from '@/shared/rig/schema';
import { samplePlan, SAMPLE_IDS } from './plan-sample';

const FIXTURES = path.resolve(__dirname, '../fixtures/plans');
const read = (name: string) => fs.readFileSync(path.join(FIXTURES, name), 'utf8');

function imported(text: string): Plan {
  const result = importPlan(text);
  if (!result.ok) throw new Error(JSON.stringify(result.errors));
  return result.plan;
}

/** Reverses the key order of every mapping (a reader may write keys in any order). */
function shuffled(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(shuffled);
  if (value === null || typeof value !== 'object') return value;
  return Object.fromEntries(Object.entries(value).reverse().map(([k, v]) => [k, shuffled(v)]));
}

describe('exportPlan / importPlan', () => {
  it('export → import → export is byte-identical, and import keeps every field', () => {
    const first = exportPlan(samplePlan());
    const plan = imported(first);
    expect(exportPlan(plan)).toBe(first);
    expect(imported(exportPlan(plan))).toEqual(plan);
    expect(plan.recipe.children[1]).toMatchObject({ kind: 'stage', targetId: SAMPLE_IDS.target, window: { notBefore: 'astronomical-dusk', minAltitudeDeg: 30 } });
    expect(plan.targets[0]!.framings[0]).toMatchObject({ id: SAMPLE_IDS.framing, positionAngleDeg: 35 });
  });

  it('reproduces the committed exporter fixtures byte for byte', () => {
    for (const name of ['valid-sample.yaml', 'valid-with-estimate.yaml', 'valid-stop-finding.yaml']) {
      const text = read(name);
      expect(exportPlan(imported(text)), name).toBe(text);
    }
  });

  it('writes keys in one defined order whatever order they came in', () => {
    const plain = exportPlan(samplePlan());
    expect(exportPlan(shuffled(samplePlan()) as Plan)).toBe(plain);
    const top = plain.split('\n').filter((l) => /^[a-z]+:/.test(l)).map((l) => l.split(':')[0]);
    expect(top).toEqual(['format', 'meta', 'site', 'rig', 'night', 'targets', 'recipe']);
    expect(plain).toMatch(/- kind: stage\n {6}id: "2{8}-/);
    // rules and children close a container.
    expect(plain.indexOf('rules:')).toBeLessThan(plain.indexOf('children:\n        - kind: slew'));
  });

  it('is human friendly: block style, unit comments, quoted times, offsets, no folding', () => {
    const text = exportPlan(samplePlan());
    expect(text.startsWith('# Nightloom plan')).toBe(true);
    expect(text).toContain('exposureS: 180 # seconds');
    expect(text).toContain('latitudeDeg: 46.93 # degrees, north positive');
    expect(text).toContain('positionAngleDeg: 35 # degrees east of north');
    expect(text).toContain('created: "2026-10-01T20:00:00+02:00"');
    expect(text).toContain('date: "2026-10-10"');
    expect(text).not.toMatch(/[{[]\s*\w/); // no flow collections
    // YAML 1.1 readers would read 21:30 as a number and yes as true: such strings are quoted.
    const plan = samplePlan() as { recipe: { children: { kind: string; window?: object; label?: string }[] } };
    plan.recipe.children[1]!.window = { endBy: '05:30' };
    plan.recipe.children[0]!.label = 'yes';
    const quoted = exportPlan(plan as never);
    expect(quoted).toContain('endBy: "05:30"');
    expect(quoted).toContain('label: "yes"');
    expect(parse(quoted, { version: '1.1' }).recipe.children[1].window.endBy).toBe('05:30');
  });

  it('reads its own minor versions and drops keys it does not know', () => {
    const plan = imported(read('valid-minimal-hand-written.yaml'));
    expect(plan.format).toBe('nightloom.plan/1.2');
    expect(plan.rig.filterWheel.slots.map((s) => s.name)).toEqual(['Ha']);
    expect(plan.rig.camera.bitDepth).toBe(16);
    const again = exportPlan(plan);
    expect(again).toContain('format: nightloom.plan/1\n');
    expect(again).not.toContain('weather');
    expect(exportPlan(imported(again))).toBe(again);
  });

  it('builds a plan with darkness and an estimate in the site’s zone', () => {
    const sample = imported(exportPlan(samplePlan()));
    const plan = buildPlan({
      recipe: { id: SAMPLE_IDS.recipe, name: 'Andromeda in L', notes: '', tree: { children: sample.recipe.children } },
      site: sample.site,
      rig: defaultRigInput(),
      targets: sample.targets,
      nightDate: '2026-10-10',
      author: 'Test Imager',
      generator: 'Nightloom tests',
      now: new Date('2026-10-01T18:00:00Z'),
      withEstimate: true,
    });
    expect(plan.meta).toMatchObject({ title: 'Andromeda in L · 2026-10-10', created: '2026-10-01T20:00:00+02:00', sourceRecipeId: SAMPLE_IDS.recipe });
    expect(plan.night.darknessStart).toMatch(/^2026-10-10T20:\d\d:\d\d\+02:00$/);
    expect(plan.night.darknessEnd).toMatch(/^2026-10-11T0\d:\d\d:\d\d\+02:00$/);
    const estimate = plan.estimate!;
    expect(estimate.stages).toHaveLength(1);
    expect(estimate.stages[0]).toMatchObject({ nodeId: SAMPLE_IDS.stage, path: 'children[1]', name: 'M31', frames: [{ filter: 'L', frames: 20, seconds: 3600 }] });
    expect(estimate.integrationByFilter).toEqual([{ filter: 'L', frames: 20, seconds: 3600 }]);
    expect(estimate.findings.every((f) => f.time === null || f.time.endsWith('+02:00'))).toBe(true);
    // The estimate survives the round trip and matches a fresh run of the imported plan.
    const back = imported(exportPlan(plan));
    expect(back.estimate).toEqual(estimate);
    expect(runDryRun(planDryRunInput(back)).totals.nightEnd).not.toBeNull();
  });
});
