import { describe, expect, it } from 'vitest';
import { exportPlan, importPlan, PLAN_LIMITS, type PlanIssue } from '@/shared/plan';
import { samplePlan, SAMPLE_IDS } from './plan-sample';

/*
 * Hostile and broken input (plan-format.md "Limits: document size, node count, depth, YAML
 * aliases"): every case is refused with a clear message, with line and column where there is
 * a place to point at, and nothing throws.
 */

const good = exportPlan(samplePlan());

function refused(text: string): PlanIssue[] {
  const result = importPlan(text);
  if (result.ok) throw new Error('expected the plan to be refused');
  expect(result.errors.length).toBeGreaterThan(0);
  return result.errors;
}

/** The 1-based line of the first occurrence of `needle` in the sample. */
const lineOf = (text: string, needle: string) => text.slice(0, text.indexOf(needle)).split('\n').length;

describe('importPlan: hostile input', () => {
  it('refuses a document over the size limit before parsing it', () => {
    const [e] = refused(`${good}\n# ${'x'.repeat(PLAN_LIMITS.maxBytes)}`);
    expect(e!.message).toMatch(/at most 2\.0 MB/);
    expect(e!.line).toBeNull();
    // Multi-byte characters count as bytes, not characters.
    const [wide] = refused(`# ${'€'.repeat(PLAN_LIMITS.maxBytes / 3 + 10)}\n${good}`);
    expect(wide!.message).toMatch(/MB/);
  });

  it('refuses nesting bombs in flow and block style without exhausting the stack', () => {
    expect(refused('['.repeat(200_000))[0]!.message).toMatch(/nested too deeply/);
    expect(refused(`${'{a: '.repeat(50_000)}1${'}'.repeat(50_000)}`)[0]!.message).toMatch(/nested too deeply/);
    expect(refused('- '.repeat(100_000))[0]!.message).toMatch(/nested too deeply/);
    const stairs = Array.from({ length: 2000 }, (_, i) => `${' '.repeat(i)}k:`).join('\n');
    const [e] = refused(stairs);
    expect(e!.message).toMatch(/nested too deeply/);
    expect(e!.line).toBeGreaterThan(1);
    // Brackets inside a quoted string are text, not nesting.
    expect(importPlan(good.replace('notes: Autumn test night.', `notes: "${'['.repeat(500)}"`)).ok).toBe(true);
  });

  it('refuses documents with too many values', () => {
    const [e] = refused(`format: nightloom.plan/1\nlots: [${'1,'.repeat(PLAN_LIMITS.maxYamlNodes)}1]\n`);
    expect(e!.message).toMatch(/too many values|values; at most/);
  });

  it('refuses alias expansion bombs ("billion laughs") and points at the first alias', () => {
    const levels = ['a: &a ["lol","lol","lol","lol","lol","lol","lol","lol","lol"]'];
    for (let i = 1; i < 9; i++) levels.push(`${String.fromCharCode(97 + i)}: &${String.fromCharCode(97 + i)} [${Array(9).fill(`*${String.fromCharCode(96 + i)}`).join(',')}]`);
    const [e] = refused(`format: nightloom.plan/1\n${levels.join('\n')}\n`);
    expect(e!.message).toMatch(/aliases/);
    expect(e!).toMatchObject({ line: 3, column: 8 });
  });

  it('refuses duplicate keys with the key and its line', () => {
    const text = good.replace('  title: Andromeda in L · 2026-10-10\n', '  title: Andromeda in L · 2026-10-10\n  title: again\n');
    const [e] = refused(text);
    expect(e!.message).toBe('The key "title" appears twice in the same mapping');
    expect(e!.line).toBe(lineOf(text, 'title: again'));
  });

  it('refuses a scalar, a list, junk, several documents and an empty file', () => {
    expect(refused('just some words')[0]!.message).toMatch(/a single value/);
    expect(refused('- format\n- meta\n')[0]!.message).toMatch(/a list/);
    expect(refused('\x00\x01 {{{ ]]] : : :\n\t- x')[0]!.line).toBe(1);
    expect(refused(`${good}---\nformat: nightloom.plan/1\n`)[0]!.message).toMatch(/one YAML document/);
    expect(refused('   \n\n')[0]!.message).toBe('The plan is empty');
    expect(refused('# only a comment\n')[0]!.message).toMatch(/mapping of sections|empty/);
  });

  it('checks the format first: another major version, a foreign file, a minor addition', () => {
    const [v2] = refused(good.replace('format: nightloom.plan/1', 'format: nightloom.plan/2'));
    expect(v2!.message).toMatch(/nightloom\.plan\/2.*reads nightloom\.plan\/1/);
    expect(v2).toMatchObject({ path: 'format', line: lineOf(good, 'format:') });
    expect(refused('name: a shopping list\nitems: [milk]\n')[0]!.message).toMatch(/first key must be "format: nightloom\.plan\/1"/);
    expect(refused('format: something-else/1\n')[0]!.message).toMatch(/Not a Nightloom plan/);
    const minor = importPlan(good.replace('format: nightloom.plan/1', 'format: nightloom.plan/1.3').replace('meta:\n', 'comingSoon: { a: 1 }\nmeta:\n  extra: kept out\n'));
    expect(minor.ok).toBe(true);
  });

  it('names wrong types, unknown kinds and out-of-range values by path, line and column', () => {
    const text = good.replace('exposureS: 180', 'exposureS: -5').replace('count: 10', 'count: "ten"').replace('- kind: park', '- kind: teleport');
    const errors = refused(text);
    expect(errors).toContainEqual({ path: 'recipe.children[1].children[4].children[0].exposureS', message: 'Exposure must be between 0.001 and 3600 s', line: lineOf(text, 'exposureS: -5'), column: 26 });
    expect(errors.find((e) => e.path.endsWith('.count'))).toMatchObject({ message: 'Frame count must be a number', line: lineOf(text, 'count: "ten"') });
    expect(errors.find((e) => e.path === 'recipe.children[3].kind')!.message).toMatch(/^Kind is one of stage, repeat/);
    // Errors come in document order.
    expect(errors.map((e) => e.line)).toEqual([...errors.map((e) => e.line)].sort((a, b) => a! - b!));
  });

  it('reports a missing required key where its mapping starts, and a missing section', () => {
    const text = good.replace('    decDeg: 41.2687 # degrees, J2000\n', '');
    const [e] = refused(text);
    expect(e).toMatchObject({ path: 'targets[0].decDeg', line: lineOf(text, '  - id: 6f1c2a4e'), column: 5 });
    const noRig = good.replace(/\nrig:\n[\s\S]*?\nnight:/, '\nnight:');
    expect(refused(noRig).map((x) => x.message)).toContain('The plan needs a rig section');
  });

  it('applies the recipe limits (depth, node count) before the schema', () => {
    let deep: object[] = [{ kind: 'park', id: SAMPLE_IDS.park }];
    for (let i = 0; i < 9; i++) deep = [{ kind: 'group', id: crypto.randomUUID(), children: deep }];
    const text = good.replace(/\nrecipe:[\s\S]*$/, `\nrecipe: ${JSON.stringify({ name: 'Deep', children: deep })}\n`);
    expect(refused(text)[0]!.message).toMatch(/nested 9 levels deep; a recipe allows at most 8/);
    const many = Array.from({ length: 2001 }, () => ({ kind: 'park', id: crypto.randomUUID() }));
    const wide = good.replace(/\nrecipe:[\s\S]*$/, `\nrecipe: ${JSON.stringify({ name: 'Wide', children: many })}\n`);
    expect(refused(wide)[0]!.message).toMatch(/2001 steps and containers; at most 2000/);
  });

  it('refuses a stage that points at a target the plan does not carry', () => {
    const text = good.replace(`targetId: ${SAMPLE_IDS.target}`, 'targetId: 0f0f0f0f-0f0f-4f0f-8f0f-0f0f0f0f0f0f');
    const [e] = refused(text);
    expect(e).toMatchObject({ path: 'recipe.children[1].targetId', line: lineOf(text, 'targetId: 0f0f') });
  });

  it('never throws, whatever it is given', () => {
    for (const input of [undefined, null, 42, {}, '\uFEFF', '%YAML 1.1\n---\na: !!binary aGVsbG8=\n', '? [a, b]\n: c\n', 'format: !!str\n', '&a [*a]', '*unknown\n']) {
      expect(() => importPlan(input as string)).not.toThrow();
      expect(importPlan(input as string).ok).toBe(false);
    }
  });
});
