import type { EditorTarget } from '@/components/recipes/node-editor/editor-types';
import type { NodeEditorState } from '@/components/recipes/node-editor/use-node-editor';
import type { RigInput } from '@/shared/rig/schema';

/** What every kind's form gets. */
export type KindFormProps = { ed: NodeEditorState; rig?: RigInput; targets: readonly EditorTarget[] };
