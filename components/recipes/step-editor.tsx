import { useMemo } from 'react';

import { NodeEditor, type EditorTarget } from '@/components/recipes/node-editor';
import type { RecipeNode } from '@/shared/recipe/types';
import type { Rig } from '@/shared/rig/schema';
import type { Target } from '@/shared/schemas/target';

export type StepEditorProps = {
  node: RecipeNode;
  rig: Rig | undefined;
  targets: Target[];
  onApply: (next: RecipeNode) => void;
  onCancel: () => void;
};

/** The step forms (components/recipes/node-editor) fed with the composer's rig and targets. */
export function StepEditor({ node, rig, targets, onApply, onCancel }: StepEditorProps) {
  const editorTargets: EditorTarget[] = useMemo(
    () => targets.map((t) => ({ id: t.id, designation: t.designation, name: t.name, framings: t.framings.map((f) => ({ id: f.id, name: f.name, raDeg: f.raDeg, decDeg: f.decDeg, positionAngleDeg: f.positionAngleDeg })) })),
    [targets],
  );
  return <NodeEditor node={node} rig={rig} targets={editorTargets} onApply={onApply} onCancel={onCancel} hideTitle testID="node-editor" />;
}
