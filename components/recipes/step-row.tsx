import { memo } from 'react';
import { Platform, Pressable, StyleSheet, View, type ViewStyle } from 'react-native';

import { ComposerIcon } from '@/components/recipes/composer-icons';
import { NODE_KIND_LABELS, NodeIcon } from '@/components/recipes/node-icon';
import { useIsSelected, useSelectedRowExtras, type SelectionStore } from '@/components/recipes/selection-store';
import { AppText } from '@/components/ui/app-text';
import type { WebPressState } from '@/components/ui/pressable-state';
import { useTheme } from '@/components/theme-provider';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';
import type { FindingSeverity } from '@/shared/recipe/checks';
import { summarizeNode } from '@/shared/recipe/summary';
import type { RecipeNode } from '@/shared/recipe/types';

/** Every row has this height, so the list can place rows without measuring them. */
export const ROW_HEIGHT = 56;
const INDENT = 18;

export type StepRowProps = {
  node: RecipeNode;
  depth: number;
  isContainer: boolean;
  collapsed: boolean;
  hasChildren: boolean;
  /** Read per row, so a new selection re-renders two rows, not all. */
  selection: SelectionStore;
  /** The worst finding on this step and how many there are. */
  severity: FindingSeverity | null;
  findingCount: number;
  /** The first message of a refused save about this step. */
  errorText: string | undefined;
  targetName: (id: string) => string | undefined;
  /** This row is the one being dragged. */
  isActive: boolean;
  drag: () => void;
  onPress: (id: string) => void;
  onToggleCollapsed: (id: string) => void;
  onToggleEnabled: (id: string) => void;
  onHandlePressIn: (id: string, drag: () => void) => void;
  onHandlePressOut: (id: string) => void;
};

// Web only: the handle must not scroll the page on touch, and shows a grab cursor.
const handleWeb = (Platform.OS === 'web' ? { touchAction: 'none', cursor: 'grab', userSelect: 'none' } : {}) as ViewStyle;

function Badge({ severity, count, id }: { severity: FindingSeverity; count: number; id: string }) {
  const styles = useThemedStyles(makeStyles);
  const label = `${count} ${count === 1 ? 'finding' : 'findings'}, worst: ${severity}`;
  return (
    <View style={[styles.badge, styles[severity]]} accessibilityLabel={label} testID={`step-findings-${id}`}>
      <AppText variant="caption" weight="semibold" style={styles[`${severity}Text`]} tabular>
        {count}
      </AppText>
    </View>
  );
}

function EnabledSwitch({ on, id, onToggle, name }: { on: boolean; id: string; onToggle: (id: string) => void; name: string }) {
  const styles = useThemedStyles(makeStyles);
  return (
    <Pressable role="switch" aria-checked={on} accessibilityLabel={`Run ${name}`} onPress={() => onToggle(id)} hitSlop={8} testID={`step-enabled-${id}`} style={styles.switchHit}>
      <View style={[styles.track, on && styles.trackOn]}>
        <View style={[styles.thumb, on && styles.thumbOn]} />
      </View>
    </Pressable>
  );
}

/** The selected row's extras (its action buttons on wide screens). */
function SelectedExtras({ selection }: { selection: SelectionStore }) {
  return <>{useSelectedRowExtras(selection)}</>;
}

function StepRowView(p: StepRowProps) {
  const styles = useThemedStyles(makeStyles);
  const { palette } = useTheme();
  const { node } = p;
  const selected = useIsSelected(p.selection, node.id);
  const kindLabel = NODE_KIND_LABELS[node.kind];
  const title = node.label ? `${kindLabel} · ${node.label}` : kindLabel;
  const summary = p.errorText ?? summarizeNode(node, { targetName: p.targetName });
  return (
    <Pressable
      role="treeitem"
      aria-level={p.depth + 1}
      aria-selected={selected}
      aria-expanded={p.isContainer ? !p.collapsed : undefined}
      accessibilityLabel={`${title}: ${summary}`}
      nativeID={`step-${node.id}`}
      testID={`step-row-${node.id}`}
      onPress={() => p.onPress(node.id)}
      style={({ hovered }: WebPressState) => [styles.row, hovered && styles.hover, selected && styles.selected, p.isActive && styles.dragging]}
    >
      <Pressable onPressIn={() => p.onHandlePressIn(node.id, p.drag)} onPressOut={() => p.onHandlePressOut(node.id)} accessibilityLabel={`Drag ${title}`} focusable={false} testID={`step-handle-${node.id}`} style={[styles.handle, handleWeb]}>
        <ComposerIcon name="handle" color={palette.textFaint} size={18} />
      </Pressable>
      {Array.from({ length: p.depth }, (_, i) => (
        <View key={i} style={styles.guide} />
      ))}
      {p.isContainer ? (
        <Pressable onPress={() => p.onToggleCollapsed(node.id)} accessibilityLabel={p.collapsed ? `Unfold ${title}` : `Fold ${title}`} hitSlop={6} testID={`step-fold-${node.id}`} style={styles.chevron}>
          <ComposerIcon name={p.collapsed ? 'chevron-right' : 'chevron-down'} color={p.hasChildren ? palette.textMuted : palette.textFaint} size={16} />
        </Pressable>
      ) : (
        <View style={styles.chevron} />
      )}
      <View style={[styles.body, !node.enabled && styles.off]}>
        <NodeIcon kind={node.kind} size={20} color={selected ? palette.accent : palette.textMuted} />
        <View style={styles.text}>
          <AppText variant="small" weight="semibold" numberOfLines={1}>
            {title}
          </AppText>
          <AppText variant="small" tone={p.errorText ? 'danger' : 'muted'} numberOfLines={1} tabular testID={p.errorText ? `step-error-${node.id}` : undefined}>
            {summary}
          </AppText>
        </View>
      </View>
      {selected ? <SelectedExtras selection={p.selection} /> : null}
      {p.severity ? <Badge severity={p.severity} count={p.findingCount} id={node.id} /> : null}
      <EnabledSwitch on={node.enabled} id={node.id} onToggle={p.onToggleEnabled} name={title} />
    </Pressable>
  );
}

/** One row of the drag list: handle, folding chevron, icon, kind and summary, badges, on/off. */
export const StepRow = memo(StepRowView);

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    row: { height: ROW_HEIGHT, flexDirection: 'row', alignItems: 'center', paddingRight: spacing.sm, gap: spacing.xs, borderBottomWidth: 1, borderBottomColor: c.border, backgroundColor: c.background },
    hover: { backgroundColor: c.surface },
    selected: { backgroundColor: c.accentSoft, borderBottomColor: c.accentSoft },
    dragging: { backgroundColor: c.surfaceRaised, borderColor: c.accent, borderWidth: 1, borderRadius: radii.sm, opacity: 0.96 },
    handle: { width: 34, height: ROW_HEIGHT - 1, alignItems: 'center', justifyContent: 'center' },
    guide: { width: INDENT, alignSelf: 'stretch', borderLeftWidth: 1, borderLeftColor: c.border, marginLeft: -INDENT / 2 + 8 },
    chevron: { width: 20, height: 28, alignItems: 'center', justifyContent: 'center' },
    body: { flex: 1, minWidth: 96, flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
    off: { opacity: 0.45 },
    text: { flex: 1, minWidth: 0 },
    badge: { minWidth: 22, height: 20, paddingHorizontal: spacing.xs + 2, borderRadius: radii.pill, alignItems: 'center', justifyContent: 'center', borderWidth: 1 },
    stop: { backgroundColor: c.dangerSoft, borderColor: c.danger },
    warn: { backgroundColor: c.accentSoft, borderColor: c.accent },
    info: { backgroundColor: c.surfaceRaised, borderColor: c.borderStrong },
    stopText: { color: c.danger },
    warnText: { color: c.accent },
    infoText: { color: c.textMuted },
    switchHit: { paddingHorizontal: spacing.xs, height: 40, justifyContent: 'center' },
    track: { width: 30, height: 18, borderRadius: radii.pill, backgroundColor: c.surfaceRaised, borderWidth: 1, borderColor: c.borderStrong, padding: 2, justifyContent: 'center' },
    trackOn: { backgroundColor: c.accentSoft, borderColor: c.accent },
    thumb: { width: 12, height: 12, borderRadius: radii.pill, backgroundColor: c.textFaint },
    thumbOn: { backgroundColor: c.accent, transform: [{ translateX: 12 }] },
  });
