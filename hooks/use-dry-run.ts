import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { recipeKeys } from '@/hooks/use-recipes';
import { api, isApiError } from '@/lib/api';
import type { DryRunResult } from '@/shared/dry-run/types';

/** A stored result only changes by a new run (which invalidates it) or a recipe edit (stale flag). */
export const LATEST_DRY_RUN_STALE_MS = 30_000;

/** One stored dry run, as `POST /api/recipes/:id/dry-runs` and `GET …/latest` return it. */
export interface DryRunRecord {
  id: string;
  recipeId: string;
  recipeVersion: number;
  nightDate: string;
  siteId: string;
  rigId: string | null;
  createdAt: string;
  /** The recipe changed after this run. */
  stale: boolean;
  result: DryRunResult;
}

/** What a run may choose; anything left out takes the recipe's own (and the current night). */
export type DryRunRequest = { date?: string; siteId?: string | null; rigId?: string | null };

export const dryRunKeys = {
  all: ['dry-runs'] as const,
  latest: (recipeId: string) => [...dryRunKeys.all, 'latest', recipeId] as const,
};

const runsPath = (recipeId: string) => `/api/recipes/${encodeURIComponent(recipeId)}/dry-runs`;

/** The recipe's latest stored dry run; `null` (not an error) when it has none yet. */
export function useLatestDryRunQuery(recipeId: string) {
  return useQuery({
    queryKey: dryRunKeys.latest(recipeId),
    queryFn: async ({ signal }) => {
      try {
        return (await api.get<{ dryRun: DryRunRecord }>(`${runsPath(recipeId)}/latest`, signal)).dryRun;
      } catch (e) {
        if (isApiError(e, 404) && e.code === 'not-found') return null;
        throw e;
      }
    },
    staleTime: LATEST_DRY_RUN_STALE_MS,
    enabled: recipeId.length > 0,
  });
}

/** Runs and stores a dry run; the latest and the recipe list (which shows the last end time) refresh. */
export function useRunDryRunMutation(recipeId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (request: DryRunRequest) => api.post<{ dryRun: DryRunRecord }>(runsPath(recipeId), request).then((r) => r.dryRun),
    onSettled: () => Promise.all([queryClient.invalidateQueries({ queryKey: dryRunKeys.latest(recipeId) }), queryClient.invalidateQueries({ queryKey: recipeKeys.lists() })]),
  });
}
