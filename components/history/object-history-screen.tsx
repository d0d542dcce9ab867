import { router } from 'expo-router';

import { AddObjectTarget } from '@/components/history/add-object-target';
import { BackToCalibration, HistoryBody, HistoryTotals, unsolvedText } from '@/components/history/history-sections';
import { RecordedFramings } from '@/components/history/recorded-framings';
import { AppText } from '@/components/ui/app-text';
import { ErrorView } from '@/components/ui/error-view';
import { FormSection } from '@/components/ui/form-section';
import { LoadingView } from '@/components/ui/loading-view';
import { Screen } from '@/components/ui/screen';
import { TextLink } from '@/components/ui/text-link';
import { useObjectHistoryQuery } from '@/hooks/use-history';
import { isApiError } from '@/lib/api';
import type { TargetHistory } from '@/shared/schemas/calibration-api';

function Framings({ history }: { history: TargetHistory }) {
  return (
    <FormSection title="Recorded framings" description={`Where the lights were taken: centres within 1′, angles equal modulo 180°.${unsolvedText(history)}`} testID="history-framings-section">
      {history.framings.length === 0 ? <AppText tone="muted">No plate-solved lights, so no framing is known.</AppText> : <RecordedFramings framings={history.framings} />}
    </FormSection>
  );
}

/**
 * The history of lights no target matched, by their OBJECT text: the same totals, chart, nights
 * and framings as a target's, and the way to make it a target (continuing and sharing need one).
 */
export function ObjectHistoryScreen({ label }: { label: string }) {
  const history = useObjectHistoryQuery(label);
  const back = <BackToCalibration />;
  // Data first: adding the target empties this history (404 on the refetch) just before the
  // screen moves on to the target's own.
  if (!history.data) {
    if (history.isError) {
      const gone = isApiError(history.error, 404);
      return (
        <Screen above={back} testID="object-history">
          {gone ? (
            <ErrorView error={history.error} title="No such frames" />
          ) : (
            <ErrorView error={history.error} onRetry={() => history.refetch()} retrying={history.isFetching} title="Could not load the history" />
          )}
          {gone ? <TextLink href="/calibration?part=history" label="Back to the capture history ›" /> : null}
        </Screen>
      );
    }
    return (
      <Screen above={back}>
        <LoadingView label="Loading the history…" />
      </Screen>
    );
  }
  const h = history.data;
  const openTarget = (targetId: string) => router.replace({ pathname: '/targets/[id]/history', params: { id: targetId, from: 'calibration' } });
  return (
    <Screen title={h.target.label} subtitle="Frames with no target · capture history" above={back} testID="object-history">
      <HistoryTotals history={h} />
      <FormSection
        title="Add as a target"
        description="These frames match none of your targets, so there is nothing to continue or share yet: add it as a target first."
        testID="history-object-add-section"
      >
        <AddObjectTarget label={h.target.label} onAdded={(target) => openTarget(target.id)} />
      </FormSection>
      <HistoryBody history={h} aside={<Framings history={h} />} />
    </Screen>
  );
}
