import { router } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';

import { formatDryRunEnd, formatExposureHm, formatUpdated, stepCountText, targetCountText } from '@/components/recipes/recipe-format';
import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import type { WebPressState } from '@/components/ui/pressable-state';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';
import type { RecipeListItem } from '@/shared/schemas/recipe-api';

type ListProps = {
  recipes: RecipeListItem[];
  onDelete: (item: RecipeListItem) => void;
  /** The id being deleted right now, to show its button as pending. */
  deletingId: string | null;
};

const open = (id: string) => router.push(`/recipes/${id}`);

const COLUMNS = [
  { key: 'name', label: 'Name', flex: 3 },
  { key: 'rig', label: 'Rig', flex: 2 },
  { key: 'targets', label: 'Targets', flex: 1.2 },
  { key: 'exposure', label: 'Planned', flex: 1.2 },
  { key: 'dryRun', label: 'Last dry run ends', flex: 1.6 },
  { key: 'updated', label: 'Updated', flex: 1.4 },
] as const;

function TableRow({ item, onDelete, deleting }: { item: RecipeListItem; onDelete: () => void; deleting: boolean }) {
  const styles = useThemedStyles(makeStyles);
  const cells: Record<(typeof COLUMNS)[number]['key'], string> = {
    name: item.name,
    rig: item.rigName ?? '—',
    targets: String(item.targetCount),
    exposure: formatExposureHm(item.plannedExposureS),
    dryRun: formatDryRunEnd(item.lastDryRunEnd, item.lastDryRunStale),
    updated: formatUpdated(item.updatedAt),
  };
  return (
    <View style={styles.tableRow} testID={`recipe-row-${item.id}`} role="row">
      <Pressable onPress={() => open(item.id)} role="link" accessibilityLabel={`Open ${item.name}`} style={({ hovered }: WebPressState) => [styles.rowMain, hovered && styles.hover]}>
        {COLUMNS.map((col) => (
          <AppText key={col.key} role="cell" numberOfLines={1} tabular={col.key !== 'name' && col.key !== 'rig'} weight={col.key === 'name' ? 'semibold' : 'regular'} tone={col.key === 'name' ? 'default' : 'muted'} variant={col.key === 'name' ? 'body' : 'small'} style={{ flex: col.flex }}>
            {cells[col.key]}
          </AppText>
        ))}
      </Pressable>
      <Button label="Delete" variant="ghost" size="small" onPress={onDelete} pending={deleting} accessibilityLabel={`Delete ${item.name}`} testID={`recipe-delete-${item.id}`} />
    </View>
  );
}

function Card({ item, onDelete, deleting }: { item: RecipeListItem; onDelete: () => void; deleting: boolean }) {
  const styles = useThemedStyles(makeStyles);
  return (
    <View style={styles.card} testID={`recipe-row-${item.id}`}>
      <Pressable onPress={() => open(item.id)} role="link" accessibilityLabel={`Open ${item.name}`} style={styles.cardMain}>
        <AppText weight="semibold" numberOfLines={1}>
          {item.name}
        </AppText>
        <AppText variant="small" tone="muted" numberOfLines={1}>
          {[item.rigName ?? 'No rig', targetCountText(item.targetCount), stepCountText(item.nodeCount)].join(' · ')}
        </AppText>
        <View style={styles.cardFacts}>
          <AppText variant="small" tabular tone="accent">{`${formatExposureHm(item.plannedExposureS)} planned`}</AppText>
          <AppText variant="small" tabular tone="faint">{`Ends ${formatDryRunEnd(item.lastDryRunEnd, item.lastDryRunStale)}`}</AppText>
          <AppText variant="small" tabular tone="faint" style={styles.grow}>
            {formatUpdated(item.updatedAt)}
          </AppText>
        </View>
      </Pressable>
      <Button label="Delete" variant="ghost" size="small" onPress={onDelete} pending={deleting} accessibilityLabel={`Delete ${item.name}`} testID={`recipe-delete-${item.id}`} />
    </View>
  );
}

/** The recipe list: a table from tablet width, cards on phones. */
export function RecipeList({ recipes, onDelete, deletingId }: ListProps) {
  const styles = useThemedStyles(makeStyles);
  const { isTablet } = useBreakpoints();
  if (!isTablet) {
    return (
      <View style={styles.cards} testID="recipes-list">
        {recipes.map((item) => (
          <Card key={item.id} item={item} onDelete={() => onDelete(item)} deleting={deletingId === item.id} />
        ))}
      </View>
    );
  }
  return (
    <View style={styles.table} role="table" accessibilityLabel="Recipes" testID="recipes-list">
      <View style={styles.headRow} role="row">
        <View style={styles.headCells}>
          {COLUMNS.map((col) => (
            <AppText key={col.key} eyebrow tone="faint" weight="semibold" role="columnheader" numberOfLines={1} style={{ flex: col.flex }}>
              {col.label}
            </AppText>
          ))}
        </View>
        <View style={styles.actionSpace} />
      </View>
      {recipes.map((item) => (
        <TableRow key={item.id} item={item} onDelete={() => onDelete(item)} deleting={deletingId === item.id} />
      ))}
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    table: { borderColor: c.border, borderWidth: 1, borderRadius: radii.lg, backgroundColor: c.surface, overflow: 'hidden' },
    headRow: { flexDirection: 'row', alignItems: 'center', paddingVertical: spacing.sm, paddingRight: spacing.sm, borderBottomWidth: 1, borderBottomColor: c.border },
    headCells: { flex: 1, flexDirection: 'row', gap: spacing.md, paddingHorizontal: spacing.lg },
    actionSpace: { width: 72 },
    tableRow: { flexDirection: 'row', alignItems: 'center', paddingRight: spacing.sm, borderBottomWidth: 1, borderBottomColor: c.border },
    rowMain: { flex: 1, flexDirection: 'row', alignItems: 'center', gap: spacing.md, paddingHorizontal: spacing.lg, minHeight: 52 },
    hover: { backgroundColor: c.surfaceRaised },
    cards: { gap: spacing.sm },
    card: { flexDirection: 'row', alignItems: 'center', backgroundColor: c.surface, borderColor: c.border, borderWidth: 1, borderRadius: radii.md, paddingRight: spacing.xs },
    cardMain: { flex: 1, minWidth: 0, padding: spacing.md, gap: spacing.xxs },
    cardFacts: { flexDirection: 'row', gap: spacing.md, marginTop: spacing.xxs },
    grow: { flex: 1, textAlign: 'right' },
  });
