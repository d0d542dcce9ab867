import { useMutation, useQueryClient } from '@tanstack/react-query';

import { api, isApiError, withQuery } from '@/lib/api';
import { sendBody } from '@/lib/upload';
import { recipeKeys } from '@/hooks/use-recipes';
import { rigKeys } from '@/hooks/use-rigs';
import { siteKeys } from '@/hooks/use-sites';
import { targetKeys } from '@/hooks/use-targets';
import type { PlanPreview } from '@/shared/plan/preview';
import type { PlanIssue } from '@/shared/plan/yaml-read';
import type { RecipeDetail } from '@/shared/schemas/recipe-api';

/*
 * The YAML plan: export (a text download), preview and import. Preview and import send the
 * plan as `text/yaml`; nothing is cached (a plan is read once), imports invalidate what they add.
 */

export type PlanImportResult = {
  recipe: RecipeDetail;
  created: { site: boolean; rig: boolean; targets: string[] };
};

export type PlanImportOptions = { text: string; createSite: boolean; createRig: boolean };

const YAML = 'text/yaml';

/** The plan of a saved recipe as YAML text (the night the server picks, or `date`). */
export function fetchPlanText(recipeId: string, opts: { estimate: boolean; date?: string }): Promise<string> {
  const path = withQuery(`/api/recipes/${encodeURIComponent(recipeId)}/plan`, { estimate: opts.estimate ? '1' : undefined, date: opts.date });
  return api.get<unknown>(path).then((body) => (typeof body === 'string' ? body : JSON.stringify(body)));
}

export function usePlanExportMutation() {
  return useMutation({ mutationFn: ({ recipeId, estimate }: { recipeId: string; estimate: boolean }) => fetchPlanText(recipeId, { estimate }) });
}

/** Checks a plan against the signed-in user's account; nothing is stored. */
export function usePlanPreviewMutation() {
  return useMutation({
    mutationFn: (text: string) => sendBody<{ preview: PlanPreview; errors: PlanIssue[] }>({ url: '/api/plans/preview', body: text, contentType: YAML }).then((r) => r.preview),
  });
}

/** Stores the plan as a new recipe (and site, rig and targets as needed) in one transaction. */
export function usePlanImportMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ text, createSite, createRig }: PlanImportOptions) =>
      sendBody<PlanImportResult>({ url: withQuery('/api/plans/import', { createSite: createSite ? '1' : '0', createRig: createRig ? '1' : '0' }), body: text, contentType: YAML }),
    onSuccess: () => Promise.all([recipeKeys.all, siteKeys.all, rigKeys.all, targetKeys.all].map((queryKey) => queryClient.invalidateQueries({ queryKey }))),
  });
}

/** The located problems of a refused plan (400 `invalid-plan`), or [] for any other error. */
export function planIssuesOf(error: unknown): PlanIssue[] {
  if (!isApiError(error, 400)) return [];
  const issues = (error.body as { error?: { issues?: unknown } } | undefined)?.error?.issues;
  return Array.isArray(issues) ? (issues as PlanIssue[]) : [];
}
