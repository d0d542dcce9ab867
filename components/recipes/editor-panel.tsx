import { ScrollView, StyleSheet, View } from 'react-native';

import { NODE_KIND_LABELS, NodeIcon } from '@/components/recipes/node-icon';
import { Sheet } from '@/components/recipes/sheet';
import { StepEditor } from '@/components/recipes/step-editor';
import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { useTheme } from '@/components/theme-provider';
import { spacing } from '@/constants/theme';
import type { RecipeNode } from '@/shared/recipe/types';
import type { Rig } from '@/shared/rig/schema';
import type { Target } from '@/shared/schemas/target';

type EditorPanelProps = {
  node: RecipeNode | undefined;
  rig: Rig | undefined;
  targets: Target[];
  /** The server's messages about this step from a refused save. */
  errors: string[] | undefined;
  onApply: (next: RecipeNode) => void;
  onClose: () => void;
  /** Phones: a sheet over the list; wide: the column beside it. */
  asSheet: boolean;
  open: boolean;
};

function Editor({ node, rig, targets, errors, onApply, onClose, asSheet }: EditorPanelProps & { node: RecipeNode }) {
  return (
    <>
      {errors?.length ? <Banner tone="danger" title="The server refused this step" message={errors.join(' ')} testID="composer-step-errors" /> : null}
      <StepEditor
        key={node.id}
        node={node}
        rig={rig}
        targets={targets}
        onApply={(next) => {
          onApply(next);
          if (asSheet) onClose();
        }}
        onCancel={onClose}
      />
    </>
  );
}

/** The selected step's editor: a sheet on phones, a side column from 900 px. */
export function EditorPanel(props: EditorPanelProps) {
  const { palette } = useTheme();
  const { node, asSheet, open, onClose } = props;
  if (asSheet) {
    return (
      <Sheet open={open && !!node} onClose={onClose} title={node ? NODE_KIND_LABELS[node.kind] : 'Step'} testID="composer-editor-sheet">
        {node ? <Editor {...props} node={node} /> : null}
      </Sheet>
    );
  }
  return (
    <ScrollView style={styles.fill} contentContainerStyle={styles.content} keyboardShouldPersistTaps="handled" testID="composer-editor-panel">
      {node ? (
        <>
          <View style={styles.title}>
            <NodeIcon kind={node.kind} size={22} color={palette.accent} />
            <AppText variant="title" role="heading" aria-level={2}>
              {NODE_KIND_LABELS[node.kind]}
            </AppText>
          </View>
          <Editor {...props} node={node} />
        </>
      ) : (
        <View style={styles.hint}>
          <AppText weight="semibold">No step selected</AppText>
          <AppText tone="muted">Select a step to see and change its settings. Drag a step by its handle, or use the keyboard: the list is one stop in the Tab order.</AppText>
        </View>
      )}
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  fill: { flex: 1 },
  content: { gap: spacing.md, paddingBottom: spacing.xxl },
  title: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  hint: { gap: spacing.sm, paddingTop: spacing.sm },
});
