import { AppText } from '@/components/ui/app-text';

/** The errors of one table row (or list), under it; nothing when all are empty. */
export function RowErrors({ messages, testID }: { messages: (string | undefined)[]; testID?: string }) {
  const shown = [...new Set(messages.filter((m): m is string => !!m))];
  if (shown.length === 0) return null;
  return (
    <AppText variant="small" tone="danger" role="alert" testID={testID}>
      {shown.join(' · ')}
    </AppText>
  );
}
