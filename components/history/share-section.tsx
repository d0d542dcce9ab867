import { StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { FormSection } from '@/components/ui/form-section';
import { LoadingView } from '@/components/ui/loading-view';
import { SwitchRow } from '@/components/ui/switch-row';
import { TextLink } from '@/components/ui/text-link';
import { useClubsQuery } from '@/hooks/use-clubs';
import { useCaptureShareMutation } from '@/hooks/use-history';
import { cleanError } from '@/lib/clean-error';
import { spacing } from '@/constants/theme';

/**
 * Sharing this target's capture summary with a club, one switch per club: nothing is shared
 * until the owner turns it on. Members see totals by filter and nights, never the frames.
 */
export function ShareSection({ targetId, sharedWith }: { targetId: string; sharedWith: readonly string[] }) {
  const clubs = useClubsQuery();
  const share = useCaptureShareMutation(targetId);
  const pendingClub = share.isPending ? share.variables?.organizationId : undefined;
  return (
    <FormSection title="Share with a club" description="Members of a club you share with see this target's totals by filter and its nights on the club page; never your frames or files." testID="history-share">
      {clubs.isPending ? <LoadingView label="Loading your clubs…" /> : null}
      {clubs.data && clubs.data.length === 0 ? (
        <View style={styles.none}>
          <AppText variant="small" tone="muted">
            You are in no club yet.
          </AppText>
          <TextLink href="/clubs" label="Clubs ›" variant="small" />
        </View>
      ) : null}
      {clubs.data?.map((club) => {
        const on = pendingClub === club.id && share.variables ? share.variables.shared : sharedWith.includes(club.id);
        return (
          <SwitchRow
            key={club.id}
            label={`Share with ${club.name}`}
            description={on ? 'Shared: members see the totals.' : 'Not shared.'}
            value={on}
            disabled={share.isPending}
            onValueChange={(next) => share.mutate({ organizationId: club.id, shared: next })}
            testID={`history-share-${club.id}`}
          />
        );
      })}
      {share.isError ? <Banner tone="danger" title="Could not change the sharing" message={cleanError(share.error)} /> : null}
    </FormSection>
  );
}

const styles = StyleSheet.create({
  none: { flexDirection: 'row', gap: spacing.sm, alignItems: 'baseline' },
});
