import { execFile } from 'node:child_process';
import path from 'node:path';
import { promisify } from 'node:util';
import { describe, expect, it } from 'vitest';
import { planJsonSchemaText } from '@/shared/plan';

/*
 * The command line, spawned as a user runs it (`node --import tsx bin/nightloom.ts …`, and the
 * `npx nightloom` shim once): exit codes 0 clean, 1 stop findings, 2 invalid; text and JSON.
 */

const ROOT = path.resolve(__dirname, '../..');
const fixture = (name: string) => path.join('tests/fixtures/plans', name);
const run = promisify(execFile);

async function nightloom(args: string[], via: 'ts' | 'shim' = 'ts'): Promise<{ code: number; stdout: string; stderr: string }> {
  const argv = via === 'ts' ? ['--import', 'tsx', 'bin/nightloom.ts', ...args] : ['bin/nightloom.mjs', ...args];
  try {
    const { stdout, stderr } = await run(process.execPath, argv, { cwd: ROOT, maxBuffer: 8 * 1024 * 1024 });
    return { code: 0, stdout, stderr };
  } catch (err) {
    const e = err as { code: number; stdout: string; stderr: string };
    return { code: e.code, stdout: e.stdout, stderr: e.stderr };
  }
}

describe('nightloom command line', () => {
  it('check: a clean plan exits 0 with the timeline summary and findings in the site’s time', async () => {
    const r = await nightloom(['check', fixture('valid-with-estimate.yaml')]);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('Andromeda in L · 2026-10-10');
    expect(r.stdout).toMatch(/\n {2}20:3\d–21:4\d {2}M31 {2}\[children\[1\]\] {2}L 20 frames \(60 min\)/);
    expect(r.stdout).toContain('times in Europe/Zurich');
    expect(r.stdout).toContain('warn darks-missing');
    expect(r.stdout).toContain('The timeline matches the estimate in the plan.');
  }, 30_000);

  it('check: findings with severity stop exit 1', async () => {
    const r = await nightloom(['check', fixture('valid-stop-finding.yaml')]);
    expect(r.code).toBe(1);
    expect(r.stdout).toContain('stop filter-missing');
  }, 30_000);

  it('check: an invalid plan exits 2 with file:line:column, path and message', async () => {
    const r = await nightloom(['check', fixture('invalid-negative-exposure.yaml')]);
    expect(r.code).toBe(2);
    expect(r.stderr).toBe('tests/fixtures/plans/invalid-negative-exposure.yaml:196:26: recipe.children[1].children[4].children[0].exposureS: Exposure must be between 0.001 and 3600 s\n');
    const missing = await nightloom(['check', 'tests/fixtures/plans/no-such-file.yaml']);
    expect(missing.code).toBe(2);
    expect(missing.stderr).toContain('no such file');
    const usage = await nightloom(['check', fixture('valid-sample.yaml'), '--date', '2026-13-40']);
    expect(usage.code).toBe(2);
    expect(usage.stderr).toContain('--date wants a date as YYYY-MM-DD');
  }, 30_000);

  it('check --json: a report for scripts, for another night with --date', async () => {
    const r = await nightloom(['check', fixture('valid-with-estimate.yaml'), '--json', '--date', '2026-10-12']);
    expect(r.code).toBe(0);
    const report = JSON.parse(r.stdout);
    expect(report).toMatchObject({ valid: true, nightDate: '2026-10-12', site: 'Test Meadow', timeZone: 'Europe/Zurich', counts: { stop: 0 }, matchesPlanEstimate: null });
    expect(report.estimate.stages[0]).toMatchObject({ name: 'M31', frames: [{ filter: 'L', frames: 20 }] });
    expect(report.estimate.stages[0].start).toMatch(/^2026-10-12T\d\d:\d\d:\d\d\+02:00$/);
    const bad = await nightloom(['check', fixture('invalid-unknown-kind.yaml'), '--json']);
    expect(bad.code).toBe(2);
    expect(JSON.parse(bad.stdout)).toMatchObject({ valid: false, errors: [{ path: 'recipe.children[3].kind', line: 204, column: 13 }] });
  }, 30_000);

  it('schema prints the JSON Schema; the npx shim runs from the package bin', async () => {
    const r = await nightloom(['schema'], 'shim');
    expect(r.code).toBe(0);
    expect(r.stdout).toBe(planJsonSchemaText());
  }, 30_000);
});
