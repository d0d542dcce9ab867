import { useEffect } from 'react';
import { StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';

type SnackbarProps = {
  message: string;
  actionLabel?: string;
  onAction?: () => void;
  actionPending?: boolean;
  onDismiss: () => void;
  /** Hides itself after this long (ms); the action stays reachable until then. */
  durationMs?: number;
  testID?: string;
  actionTestID?: string;
};

/** A quiet message along the bottom edge with one action (e.g. Undo), gone after a few seconds. */
export function Snackbar({ message, actionLabel, onAction, actionPending, onDismiss, durationMs = 8000, testID, actionTestID }: SnackbarProps) {
  const styles = useThemedStyles(makeStyles);
  useEffect(() => {
    const timer = setTimeout(onDismiss, durationMs);
    return () => clearTimeout(timer);
  }, [onDismiss, durationMs, message]);
  return (
    <View style={styles.wrap} pointerEvents="box-none">
      <View style={styles.bar} role="status" aria-live="polite" testID={testID}>
        <AppText variant="small" style={styles.text} numberOfLines={2}>
          {message}
        </AppText>
        {actionLabel && onAction ? <Button label={actionLabel} variant="ghost" size="small" onPress={onAction} pending={actionPending} testID={actionTestID} /> : null}
      </View>
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    wrap: { position: 'absolute', left: 0, right: 0, bottom: spacing.lg, alignItems: 'center', paddingHorizontal: spacing.lg },
    bar: {
      flexDirection: 'row',
      alignItems: 'center',
      gap: spacing.md,
      maxWidth: 520,
      width: '100%',
      backgroundColor: c.surfaceRaised,
      borderColor: c.borderStrong,
      borderWidth: 1,
      borderRadius: radii.md,
      paddingLeft: spacing.lg,
      paddingRight: spacing.xs,
      paddingVertical: spacing.xs,
      minHeight: 48,
    },
    text: { flex: 1 },
  });
