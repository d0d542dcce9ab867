import { useState } from 'react';

import { ContinuePanel } from '@/components/history/continue-panel';
import { BackToCalibration, HistoryBody, HistoryTotals, unsolvedText } from '@/components/history/history-sections';
import { RecordedFramings } from '@/components/history/recorded-framings';
import { ShareSection } from '@/components/history/share-section';
import { AppText } from '@/components/ui/app-text';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorView } from '@/components/ui/error-view';
import { FormSection } from '@/components/ui/form-section';
import { LoadingView } from '@/components/ui/loading-view';
import { Screen } from '@/components/ui/screen';
import { TextLink } from '@/components/ui/text-link';
import { useTargetHistoryQuery } from '@/hooks/use-history';
import { useTargetQuery } from '@/hooks/use-targets';
import { isApiError } from '@/lib/api';
import type { TargetHistory } from '@/shared/schemas/calibration-api';

type From = 'calibration' | 'target';

function Back({ targetId, from, label = 'Target' }: { targetId: string; from: From; label?: string }) {
  return from === 'calibration' ? <BackToCalibration /> : <TextLink href={`/targets/${targetId}`} label={`‹ ${label}`} variant="small" testID="history-back" />;
}

function FramingsAndContinue({ history, targetId }: { history: TargetHistory; targetId: string }) {
  const target = useTargetQuery(targetId);
  const [selected, setSelected] = useState<string | null>(history.framings[0]?.key ?? null);
  const framing = history.framings.find((f) => f.key === selected) ?? history.framings[0];
  return (
    <FormSection
      title="Recorded framings"
      description={`Where the lights were taken, and which of this target's framings each is. Choose one to continue this target.${unsolvedText(history)}`}
      testID="history-framings-section"
    >
      {history.framings.length === 0 ? (
        <AppText tone="muted">No plate-solved lights yet, so no framing is known. Solve a frame and add it again.</AppText>
      ) : (
        <>
          <RecordedFramings framings={history.framings} targetFramings={target.data?.framings ?? []} selectedKey={framing?.key ?? null} onSelect={setSelected} />
          {framing ? <ContinuePanel key={framing.key} targetId={targetId} framing={framing} /> : null}
        </>
      )}
    </FormSection>
  );
}

/** One target's capture history: totals by filter, how they grew, each night, the framings used, and what to do next. */
export function TargetHistoryScreen({ targetId, from }: { targetId: string; from: From }) {
  const history = useTargetHistoryQuery(targetId);
  let back = <Back targetId={targetId} from={from} />;
  if (history.isPending) {
    return (
      <Screen above={back}>
        <LoadingView label="Loading the history…" />
      </Screen>
    );
  }
  if (history.isError) {
    return (
      <Screen above={back}>
        <ErrorView error={history.error} onRetry={isApiError(history.error, 404) ? undefined : () => history.refetch()} retrying={history.isFetching} title="Could not load the history" />
      </Screen>
    );
  }
  const h = history.data;
  const title = h.target.label;
  back = <Back targetId={targetId} from={from} label={title} />;
  const subtitle = h.target.name && h.target.name !== h.target.label ? `${h.target.name} · capture history` : 'Capture history';
  if (h.nights.length === 0) {
    return (
      <Screen title={title} subtitle={subtitle} above={back} testID="target-history">
        <EmptyState title="Nothing captured yet" message="No recorded lights belong to this target. Add a night's frames under Calibration; they are linked by plate solution or OBJECT name." action={<TextLink href="/calibration" label="Add frames ›" />} testID="history-none" />
      </Screen>
    );
  }
  return (
    <Screen title={title} subtitle={subtitle} above={back} testID="target-history">
      <HistoryTotals history={h} />
      <HistoryBody history={h} aside={<FramingsAndContinue history={h} targetId={targetId} />} after={<ShareSection targetId={targetId} sharedWith={h.target.sharedWith} />} />
    </Screen>
  );
}
