import { StyleSheet, View } from 'react-native';

import { LinkedText } from '@/components/mail/linked-text';
import { AppText } from '@/components/ui/app-text';
import { Card } from '@/components/ui/card';
import type { SentMail } from '@/hooks/use-dev-mail';
import { formatLogTime } from '@/lib/format';
import { spacing } from '@/constants/theme';

/** One sent message: subject, recipients, time and the plain-text body with live links. */
export function MailItem({ message }: { message: SentMail }) {
  return (
    <Card testID={`mail-${message.id}`}>
      <View style={styles.head}>
        <AppText weight="semibold" style={styles.subject} role="heading" aria-level={2}>
          {message.subject || '(no subject)'}
        </AppText>
        <AppText variant="small" tone="faint" tabular>
          {formatLogTime(message.receivedAt)}
        </AppText>
      </View>
      <AppText variant="small" tone="muted" testID="mail-to">
        {`To ${message.to.join(', ')} · from ${message.from}`}
      </AppText>
      <LinkedText text={message.text.trim()} testID="mail-body" />
    </Card>
  );
}

const styles = StyleSheet.create({
  head: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'baseline', gap: spacing.md, flexWrap: 'wrap' },
  subject: { flexShrink: 1 },
});
