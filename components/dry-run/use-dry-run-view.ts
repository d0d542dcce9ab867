import { useCallback, useEffect, useMemo, useRef } from 'react';

import { makeNaming } from '@/components/dry-run/naming';
import { useLatestDryRunQuery, useRunDryRunMutation, type DryRunRecord, type DryRunRequest } from '@/hooks/use-dry-run';
import { useRecipeQuery } from '@/hooks/use-recipes';
import { useRigsQuery } from '@/hooks/use-rigs';
import { useSitesQuery } from '@/hooks/use-sites';
import { useTargetsQuery } from '@/hooks/use-targets';

/** The newer of two stored runs (a fresh run's answer may arrive before the refetched latest). */
function newest(a: DryRunRecord | undefined, b: DryRunRecord | null | undefined): DryRunRecord | null {
  if (!a) return b ?? null;
  if (!b) return a;
  return Date.parse(a.createdAt) >= Date.parse(b.createdAt) ? a : b;
}

/**
 * Everything the dry-run screen shows and does: the recipe, the shown result (the latest stored
 * run, or the one just made), names for its ids, and `runNight` — a run for another night, site
 * or rig, keeping what is not changed. With no stored run yet it runs once, for the current night.
 */
export function useDryRunView(recipeId: string) {
  const recipe = useRecipeQuery(recipeId);
  const latest = useLatestDryRunQuery(recipeId);
  const run = useRunDryRunMutation(recipeId);
  const sites = useSitesQuery();
  const rigs = useRigsQuery();
  const targets = useTargetsQuery();
  const shown = newest(run.data, latest.data);
  const { mutate } = run;

  const autoRan = useRef(false);
  useEffect(() => {
    if (autoRan.current || !recipe.isSuccess || !latest.isSuccess || latest.data !== null) return;
    autoRan.current = true;
    mutate({});
  }, [recipe.isSuccess, latest.isSuccess, latest.data, mutate]);

  const runNight = useCallback(
    (change: DryRunRequest = {}) => {
      const base: DryRunRequest = shown ? { date: shown.nightDate, siteId: shown.siteId, rigId: shown.rigId } : {};
      mutate({ ...base, ...change });
    },
    [mutate, shown],
  );

  const naming = useMemo(() => makeNaming(recipe.data?.tree, targets.data), [recipe.data?.tree, targets.data]);

  return {
    recipe,
    latest,
    run,
    shown,
    runNight,
    /** The night being run right now, to show in the header while the answer is on its way. */
    pendingDate: run.isPending ? run.variables?.date : undefined,
    sites: sites.data ?? [],
    rigs: rigs.data ?? [],
    targets: targets.data ?? [],
    naming,
  };
}

export type DryRunView = ReturnType<typeof useDryRunView>;
