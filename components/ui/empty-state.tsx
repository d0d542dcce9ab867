import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { Card } from '@/components/ui/card';
import { spacing } from '@/constants/theme';

type EmptyStateProps = { title: string; message: string; icon?: ReactNode; action?: ReactNode; testID?: string };

/** The first-run message of a screen with nothing to show yet, with the one action that fixes it. */
export function EmptyState({ title, message, icon, action, testID }: EmptyStateProps) {
  return (
    <Card style={styles.card} testID={testID}>
      {icon}
      <AppText variant="title" style={styles.center}>
        {title}
      </AppText>
      <AppText tone="muted" style={[styles.center, styles.message]}>
        {message}
      </AppText>
      {action ? <View style={styles.action}>{action}</View> : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { alignItems: 'center', paddingVertical: spacing.xxl, paddingHorizontal: spacing.xl },
  center: { textAlign: 'center' },
  message: { maxWidth: 440 },
  action: { marginTop: spacing.sm },
});
