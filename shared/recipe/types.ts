import type { z } from 'zod';
import type { ruleSchema } from '@/shared/recipe/rules';
import type { groupSchema, nodeSchema, recipeSchema, recipeTreeSchema, repeatSchema, stageSchema } from '@/shared/recipe/schema';

/** Any node of a recipe tree, as parsed (defaults filled). */
export type RecipeNode = z.output<typeof nodeSchema>;
/** What a form, API body or plan may send for a node. */
export type RecipeNodeInput = z.input<typeof nodeSchema>;
export type NodeKind = RecipeNode['kind'];
export type NodeOf<K extends NodeKind> = Extract<RecipeNode, { kind: K }>;

export type StageNode = z.output<typeof stageSchema>;
export type RepeatNode = z.output<typeof repeatSchema>;
export type GroupNode = z.output<typeof groupSchema>;
export type ContainerNode = StageNode | RepeatNode | GroupNode;
export type ContainerKind = ContainerNode['kind'];
export type StepNode = Exclude<RecipeNode, ContainerNode>;

export type RecipeRule = z.output<typeof ruleSchema>;
export type RecipeTree = z.output<typeof recipeTreeSchema>;
export type RecipeTreeInput = z.input<typeof recipeTreeSchema>;
export type Recipe = z.output<typeof recipeSchema>;
export type RecipeInput = z.input<typeof recipeSchema>;

/** Anything with a list of nodes: the root or a container. */
export interface NodeList {
  children: RecipeNode[];
}

export const CONTAINER_KINDS = ['stage', 'repeat', 'group'] as const;

/** True for `stage`, `repeat` and `group`. */
export function isContainer(node: RecipeNode): node is ContainerNode {
  return node.kind === 'stage' || node.kind === 'repeat' || node.kind === 'group';
}
