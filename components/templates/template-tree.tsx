import { StyleSheet, View } from 'react-native';

import { NODE_KIND_LABELS, NodeIcon } from '@/components/recipes/node-icon';
import { AppText } from '@/components/ui/app-text';
import { useTheme } from '@/components/theme-provider';
import { spacing } from '@/constants/theme';
import { summarizeNode } from '@/shared/recipe/summary';
import type { RecipeNode, RecipeTree } from '@/shared/recipe/types';

type Row = { node: RecipeNode; depth: number };

function flatten(nodes: RecipeNode[], depth: number, rows: Row[]): Row[] {
  for (const node of nodes) {
    rows.push({ node, depth });
    if (node.kind === 'stage' || node.kind === 'repeat' || node.kind === 'group') flatten(node.children, depth + 1, rows);
  }
  return rows;
}

/** The template's steps as a read-only outline; filters appear by band ("Ha"). */
export function TemplateTree({ tree }: { tree: RecipeTree }) {
  const { palette } = useTheme();
  const rows = flatten(tree.children, 0, []);
  return (
    <View style={styles.list} role="list" testID="template-tree">
      {rows.map(({ node, depth }) => (
        <View key={node.id} role="listitem" style={[styles.row, { paddingLeft: depth * spacing.lg }]}>
          <NodeIcon kind={node.kind} color={node.enabled === false ? palette.textFaint : palette.textMuted} />
          <View style={styles.text}>
            <AppText variant="small" weight="semibold">
              {node.label ?? NODE_KIND_LABELS[node.kind]}
            </AppText>
            <AppText variant="small" tone="muted" tabular>
              {summarizeNode(node)}
            </AppText>
          </View>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.xs },
  row: { flexDirection: 'row', alignItems: 'flex-start', gap: spacing.sm, paddingVertical: spacing.xxs },
  text: { flex: 1, gap: 1 },
});
