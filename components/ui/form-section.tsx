import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { Card } from '@/components/ui/card';
import { spacing } from '@/constants/theme';

type FormSectionProps = {
  title: string;
  description?: string;
  /** Controls beside the title (e.g. an add button). */
  actions?: ReactNode;
  children: ReactNode;
  testID?: string;
};

/** One titled group of a long form, on a card; the title is a level-2 heading. */
export function FormSection({ title, description, actions, children, testID }: FormSectionProps) {
  return (
    <Card style={styles.card} testID={testID}>
      <View style={styles.header}>
        <View style={styles.titles}>
          <AppText variant="lead" weight="semibold" role="heading" aria-level={2}>
            {title}
          </AppText>
          {description ? (
            <AppText variant="small" tone="muted">
              {description}
            </AppText>
          ) : null}
        </View>
        {actions ? <View style={styles.actions}>{actions}</View> : null}
      </View>
      {children}
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { gap: spacing.lg },
  header: { flexDirection: 'row', alignItems: 'flex-start', justifyContent: 'space-between', gap: spacing.md, flexWrap: 'wrap' },
  titles: { flexShrink: 1, flexGrow: 1, flexBasis: 200, gap: spacing.xxs },
  actions: { flexDirection: 'row', gap: spacing.sm },
});
