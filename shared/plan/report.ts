import type { DryRunResult } from '@/shared/dry-run/types';
import { countNodes } from '@/shared/recipe/tree-read';
import { planDryRunInput, planEstimate } from '@/shared/plan/estimate';
import type { PlanEstimate } from '@/shared/plan/estimate-schema';
import type { Plan } from '@/shared/plan/schema';
import type { PlanIssue } from '@/shared/plan/yaml-read';

/** What `nightloom check --json` prints for a plan that reads. */
export interface CheckReport {
  file: string;
  valid: true;
  title: string;
  recipe: string;
  nodeCount: number;
  site: string;
  timeZone: string;
  rig: string;
  nightDate: string;
  estimate: PlanEstimate;
  counts: { stop: number; warn: number; info: number };
  /** Whether this run matches the plan's own estimate (same night); null when it has none for that night. */
  matchesPlanEstimate: boolean | null;
}

/** What `nightloom check --json` prints for a plan that does not read. */
export interface InvalidReport {
  file: string;
  valid: false;
  errors: PlanIssue[];
}

const comparable = (e: PlanEstimate) => JSON.stringify([e.nightEnd, e.stages, e.integrationByFilter]);

/** The report of a dry run of a plan's recipe on `nightDate` (findings counted by severity). */
export function checkReport(file: string, plan: Plan, result: DryRunResult, nightDate: string, now: Date): CheckReport {
  const input = planDryRunInput(plan, nightDate);
  const estimate = planEstimate(result, input, now);
  const count = (severity: string) => estimate.findings.filter((f) => f.severity === severity).length;
  const own = plan.estimate?.nightDate === nightDate ? plan.estimate : undefined;
  return {
    file,
    valid: true,
    title: plan.meta.title,
    recipe: plan.recipe.name,
    nodeCount: countNodes({ children: plan.recipe.children }),
    site: plan.site.name,
    timeZone: plan.site.timeZone,
    rig: plan.rig.name,
    nightDate,
    estimate,
    counts: { stop: count('stop'), warn: count('warn'), info: count('info') },
    matchesPlanEstimate: own ? comparable(own) === comparable(estimate) : null,
  };
}

const hhmm = (iso: string | null) => (iso ? iso.slice(11, 16) : '—');
const minutes = (seconds: number) => `${Math.round(seconds / 60)} min`;
const frames = (list: PlanEstimate['integrationByFilter']) => list.map((f) => `${f.filter} ${f.frames} frames (${minutes(f.seconds)})`).join(', ') || 'no light frames';

/** The report as text: the timeline by stage (site time), totals, then every finding. */
export function formatCheckReport(r: CheckReport): string {
  const e = r.estimate;
  const out = [`${r.file}: ${r.title}`, `Recipe "${r.recipe}" (${r.nodeCount} steps) on ${r.rig}, at ${r.site}, night of ${r.nightDate} (times in ${r.timeZone})`, '', 'Timeline'];
  if (e.stages.length === 0) out.push('  (no stage ran)');
  for (const s of e.stages) out.push(`  ${hhmm(s.start)}–${hhmm(s.end)}  ${s.name}  [${s.path}]  ${frames(s.frames)}`);
  out.push(`  Night ends ${hhmm(e.nightEnd)} · efficiency ${Math.round(e.efficiency * 100)} % · ${frames(e.integrationByFilter)}`, '');
  out.push(`Findings: ${r.counts.stop} stop, ${r.counts.warn} warn, ${r.counts.info} info`);
  for (const f of e.findings) {
    out.push(`  ${f.severity.padEnd(4)} ${f.code}${f.time ? ` at ${hhmm(f.time)}` : ''}${f.path ? `  [${f.path}]` : ''}`, `       ${f.message}`);
    if (f.fix) out.push(`       Fix: ${f.fix}`);
  }
  if (r.matchesPlanEstimate !== null) out.push('', r.matchesPlanEstimate ? 'The timeline matches the estimate in the plan.' : 'The timeline differs from the estimate in the plan (the engine or the data changed since it was written).');
  return `${out.join('\n')}\n`;
}

/** Import errors as `file:line:column: path: message` lines, the form editors and CI logs link. */
export function formatPlanErrors(file: string, errors: PlanIssue[]): string {
  return `${errors.map((e) => `${file}${e.line !== null ? `:${e.line}:${e.column ?? 1}` : ''}: ${e.path ? `${e.path}: ` : ''}${e.message}`).join('\n')}\n`;
}
