import { useMemo } from 'react';

import { pathErrors, type PathErrors } from '@/components/recipes/path-errors';
import type { NodeFindings } from '@/components/recipes/step-list';
import { formatExposureHm, stepCountText } from '@/components/recipes/recipe-format';
import type { ComposerDoc } from '@/hooks/use-composer';
import type { SaveFailure } from '@/hooks/use-recipe-autosave';
import { checkRecipe, SEVERITY_ORDER, type FindingSeverity } from '@/shared/recipe/checks';
import { flattenTree } from '@/shared/recipe/flat';
import { totals } from '@/shared/recipe/summary';
import { walk } from '@/shared/recipe/tree';
import type { RecipeNode } from '@/shared/recipe/types';
import type { Rig } from '@/shared/rig/schema';
import type { Site } from '@/shared/schemas/site';
import type { Target } from '@/shared/schemas/target';

const NO_ERRORS: PathErrors = { byNode: new Map(), other: [] };

/**
 * Everything the composer shows that derives from the tree, computed once per change of the
 * tree (never per row): the rows, nodes by id, findings by step, save errors by step, totals.
 */
export function useComposerView(doc: ComposerDoc, collapsed: ReadonlySet<string>, rig: Rig | undefined, site: Site | undefined, targets: Target[] | undefined, failure: SaveFailure | null) {
  const { tree } = doc;
  const rows = useMemo(() => flattenTree(tree, collapsed), [tree, collapsed]);
  const nodeById = useMemo(() => {
    const map = new Map<string, RecipeNode>();
    walk(tree, (node) => void map.set(node.id, node));
    return map;
  }, [tree]);
  const findings = useMemo(() => checkRecipe(tree, { rig, site }), [tree, rig, site]);
  const findingsByNode = useMemo(() => {
    const map = new Map<string, NodeFindings>();
    for (const f of findings) {
      const had = map.get(f.nodeId);
      const severity: FindingSeverity = had && SEVERITY_ORDER[had.severity] < SEVERITY_ORDER[f.severity] ? had.severity : f.severity;
      map.set(f.nodeId, { severity, count: (had?.count ?? 0) + 1 });
    }
    return map;
  }, [findings]);
  const worst = findings.reduce<FindingSeverity | null>((w, f) => (w === null || SEVERITY_ORDER[f.severity] < SEVERITY_ORDER[w] ? f.severity : w), null);
  const errors = useMemo(() => (failure?.kind === 'invalid' ? pathErrors(failure.doc.tree, failure.fields) : NO_ERRORS), [failure]);
  const targetName = useMemo(() => {
    const names = new Map((targets ?? []).map((t) => [t.id, t.designation]));
    return (id: string) => names.get(id);
  }, [targets]);
  const facts = useMemo(() => {
    const t = totals(tree);
    return `${stepCountText(nodeById.size)} · ${t.atLeast ? 'at least ' : ''}${formatExposureHm(t.lightShutterS)} of lights planned`;
  }, [tree, nodeById]);
  return { rows, nodeById, findings, findingsByNode, worst, errors, targetName, facts };
}
