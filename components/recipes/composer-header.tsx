import { useEffect, useState } from 'react';
import { Pressable, StyleSheet, TextInput, View } from 'react-native';

import { PlanExportButton } from '@/components/plans/plan-export-button';
import { ComposerIcon } from '@/components/recipes/composer-icons';
import { IconButton } from '@/components/recipes/icon-button';
import { SavePill } from '@/components/recipes/save-pill';
import { PublishToClubButton, TemplateNewerNotice } from '@/components/templates/composer-template-bits';
import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import type { WebPressState } from '@/components/ui/pressable-state';
import { SelectField } from '@/components/ui/select-field';
import { TextLink } from '@/components/ui/text-link';
import { useTheme } from '@/components/theme-provider';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import type { SaveState } from '@/hooks/use-recipe-autosave';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { fonts, radii, spacing, typeScale, type Palette } from '@/constants/theme';
import type { FindingSeverity } from '@/shared/recipe/checks';

type Option = { value: string; label: string };

export type ComposerHeaderProps = {
  name: string;
  onRename: (name: string) => void;
  rigId: string | null;
  siteId: string | null;
  rigs: Option[];
  sites: Option[];
  onRig: (id: string | null) => void;
  onSite: (id: string | null) => void;
  saveState: SaveState;
  onRetry: () => void;
  findingCount: number;
  worst: FindingSeverity | null;
  onFindings: () => void;
  canUndo: boolean;
  canRedo: boolean;
  onUndo: () => void;
  onRedo: () => void;
  onHistory: () => void;
  /** "42 steps · 6 h 20 m planned". */
  facts: string;
  /** Opens the dry run of the saved recipe. */
  onDryRun: () => void;
  recipeId: string;
};

/** The recipe's name, edited in place; committed on blur or Enter (one undo step per rename). */
function NameField({ name, onRename }: { name: string; onRename: (name: string) => void }) {
  const styles = useThemedStyles(makeStyles);
  const { palette } = useTheme();
  const [text, setText] = useState(name);
  const [focused, setFocused] = useState(false);
  useEffect(() => {
    if (!focused) setText(name);
  }, [name, focused]);
  const commit = () => {
    setFocused(false);
    const next = text.trim().slice(0, 80);
    if (next && next !== name) onRename(next);
    else setText(name);
  };
  return (
    <TextInput
      value={text}
      onChangeText={setText}
      onFocus={() => setFocused(true)}
      onBlur={commit}
      onSubmitEditing={commit}
      maxLength={80}
      accessibilityLabel="Recipe name"
      selectionColor={palette.accent}
      testID="composer-name"
      style={[styles.name, focused && styles.nameFocused]}
    />
  );
}

function FindingsButton({ count, worst, onPress }: { count: number; worst: FindingSeverity | null; onPress: () => void }) {
  const styles = useThemedStyles(makeStyles);
  const { palette } = useTheme();
  const color = worst === 'stop' ? palette.danger : worst === 'warn' ? palette.accent : palette.textMuted;
  const text = count === 0 ? 'No findings' : count === 1 ? '1 finding' : `${count} findings`;
  return (
    <Pressable role="button" accessibilityLabel={text} onPress={onPress} testID="composer-findings" style={({ hovered }: WebPressState) => [styles.findings, hovered && styles.findingsHover]}>
      <ComposerIcon name="findings" color={color} size={16} />
      <AppText variant="caption" weight="semibold" style={{ color }} tabular>
        {text}
      </AppText>
    </Pressable>
  );
}

/** Composer header: back, name, rig and site, save state, findings, undo/redo and history. */
export function ComposerHeader(p: ComposerHeaderProps) {
  const styles = useThemedStyles(makeStyles);
  const { isWide } = useBreakpoints();
  const dryRun = (
    <View style={styles.tools}>
      <Button label="Dry run" size="small" variant="secondary" onPress={p.onDryRun} disabled={p.saveState !== 'saved'} accessibilityLabel="Dry run (once saved)" testID="composer-dry-run" />
      <PlanExportButton recipeId={p.recipeId} recipeName={p.name} />
      <PublishToClubButton recipeId={p.recipeId} disabled={p.saveState !== 'saved'} />
    </View>
  );
  const tools = (
    <View style={styles.tools}>
      <IconButton icon="undo" label="Undo" onPress={p.onUndo} disabled={!p.canUndo} testID="composer-undo" />
      <IconButton icon="redo" label="Redo" onPress={p.onRedo} disabled={!p.canRedo} testID="composer-redo" />
      <IconButton icon="history" label="History" onPress={p.onHistory} showLabel={isWide} testID="composer-history" />
      {isWide ? dryRun : null}
    </View>
  );
  const status = (
    <View style={styles.status}>
      <SavePill state={p.saveState} onRetry={p.onRetry} />
      <FindingsButton count={p.findingCount} worst={p.worst} onPress={p.onFindings} />
    </View>
  );
  const pickers = (
    <View style={styles.pickers}>
      <View style={styles.picker}>
        <SelectField label="Rig" compact value={p.rigId ?? ''} onChange={(v) => p.onRig(v || null)} choices={[{ value: '', label: 'No rig' }, ...p.rigs]} testID="composer-rig" />
      </View>
      <View style={styles.picker}>
        <SelectField label="Site" compact value={p.siteId ?? ''} onChange={(v) => p.onSite(v || null)} choices={[{ value: '', label: 'No site' }, ...p.sites]} testID="composer-site" />
      </View>
      {isWide ? (
        <AppText variant="small" tone="faint" tabular numberOfLines={1} style={styles.facts} testID="composer-facts">
          {p.facts}
        </AppText>
      ) : null}
    </View>
  );
  return (
    <View style={styles.header}>
      <View style={styles.top}>
        <TextLink href="/recipes" label="‹ Recipes" variant="small" testID="composer-back" />
        {isWide ? status : dryRun}
      </View>
      <View style={styles.nameRow}>
        <NameField name={p.name} onRename={p.onRename} />
        {isWide ? tools : null}
      </View>
      {isWide ? null : (
        <View style={styles.nameRow}>
          {status}
          {tools}
        </View>
      )}
      {pickers}
      <TemplateNewerNotice recipeId={p.recipeId} />
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    header: { gap: spacing.sm, paddingBottom: spacing.sm },
    top: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: spacing.md, minHeight: 28 },
    nameRow: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, justifyContent: 'space-between' },
    name: { flex: 1, minWidth: 0, ...typeScale.title, fontFamily: fonts.semibold, color: c.text, paddingVertical: spacing.xs, paddingHorizontal: spacing.sm, marginLeft: -spacing.sm, borderRadius: radii.sm, borderWidth: 1, borderColor: 'transparent' },
    nameFocused: { borderColor: c.borderStrong, backgroundColor: c.surface },
    tools: { flexDirection: 'row', alignItems: 'center', gap: spacing.xxs },
    status: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, flexShrink: 1 },
    findings: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs, height: 28, paddingHorizontal: spacing.sm, borderRadius: radii.pill },
    findingsHover: { backgroundColor: c.surfaceRaised },
    pickers: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
    picker: { flex: 1, maxWidth: 240, minWidth: 0 },
    facts: { flex: 1, textAlign: 'right' },
  });
