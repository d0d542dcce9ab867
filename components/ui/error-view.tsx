import { StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { cleanError } from '@/lib/clean-error';
import { spacing } from '@/constants/theme';

type ErrorViewProps = { error: unknown; onRetry?: () => void; retrying?: boolean; title?: string };

/** What a failed query shows: one sentence about the failure and a Retry button. */
export function ErrorView({ error, onRetry, retrying, title = 'Could not load this' }: ErrorViewProps) {
  return (
    <View style={styles.box} role="alert" testID="error-view">
      <AppText variant="title">{title}</AppText>
      <AppText tone="muted" style={styles.message}>
        {cleanError(error)}
      </AppText>
      {onRetry ? <Button label="Retry" variant="secondary" onPress={onRetry} pending={retrying} testID="error-retry" /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { alignItems: 'center', gap: spacing.md, paddingVertical: spacing.xxxl, paddingHorizontal: spacing.lg },
  message: { textAlign: 'center', maxWidth: 420 },
});
