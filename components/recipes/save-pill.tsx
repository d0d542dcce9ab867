import { ActivityIndicator, Pressable, StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { useTheme } from '@/components/theme-provider';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import type { SaveState } from '@/hooks/use-recipe-autosave';
import { radii, spacing, type Palette } from '@/constants/theme';

const TEXT: Record<SaveState, string> = {
  saved: 'Saved',
  saving: 'Saving…',
  unsaved: 'Unsaved changes',
  failed: 'Couldn’t save',
  conflict: 'Changed elsewhere',
};

/** Where the autosave stands; a failed save offers Retry right in the pill. */
export function SavePill({ state, onRetry }: { state: SaveState; onRetry: () => void }) {
  const styles = useThemedStyles(makeStyles);
  const { palette } = useTheme();
  const bad = state === 'failed' || state === 'conflict';
  return (
    <View style={[styles.pill, bad && styles.bad, state === 'saved' && styles.ok]} role="status" aria-live="polite" testID="composer-save-state">
      {state === 'saving' ? <ActivityIndicator size="small" color={palette.textMuted} style={styles.spinner} /> : <View style={[styles.dot, styles[state]]} />}
      <AppText variant="caption" weight="semibold" tone={bad ? 'danger' : state === 'saved' ? 'muted' : 'default'} numberOfLines={1}>
        {TEXT[state]}
      </AppText>
      {state === 'failed' ? (
        <Pressable role="button" accessibilityLabel="Retry saving" onPress={onRetry} hitSlop={8} testID="composer-save-retry">
          <AppText variant="caption" weight="semibold" tone="accent">
            — Retry
          </AppText>
        </Pressable>
      ) : null}
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    pill: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs + 2, height: 28, paddingHorizontal: spacing.sm + 2, borderRadius: radii.pill, borderWidth: 1, borderColor: c.borderStrong, backgroundColor: c.surface },
    ok: { borderColor: c.border },
    bad: { borderColor: c.danger, backgroundColor: c.dangerSoft },
    spinner: { transform: [{ scale: 0.6 }], width: 8, height: 8 },
    dot: { width: 7, height: 7, borderRadius: radii.pill },
    saved: { backgroundColor: c.ok },
    saving: { backgroundColor: c.textMuted },
    unsaved: { backgroundColor: c.accent },
    failed: { backgroundColor: c.danger },
    conflict: { backgroundColor: c.danger },
  });
