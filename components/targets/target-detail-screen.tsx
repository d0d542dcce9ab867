import { TargetHistoryLink } from '@/components/history/target-history-link';
import { DeleteTargetZone } from '@/components/targets/delete-target-zone';
import { FramingsSection } from '@/components/targets/framings-section';
import { TargetFacts } from '@/components/targets/target-facts';
import { TargetNotes } from '@/components/targets/target-notes';
import { VisibilitySection } from '@/components/targets/visibility-section';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import { Screen } from '@/components/ui/screen';
import { TextLink } from '@/components/ui/text-link';
import { useTargetQuery } from '@/hooks/use-targets';
import { isApiError } from '@/lib/api';

function BackToTargets() {
  return <TextLink href="/targets" label="‹ Targets" variant="small" testID="back-to-targets" />;
}

/** One target: where it is, when it is up, how it is framed, and notes. */
export function TargetDetailScreen({ id }: { id: string }) {
  const target = useTargetQuery(id);
  if (target.isPending) {
    return (
      <Screen above={<BackToTargets />}>
        <LoadingView label="Loading the target…" />
      </Screen>
    );
  }
  if (target.isError) {
    return (
      <Screen above={<BackToTargets />}>
        <ErrorView error={target.error} onRetry={isApiError(target.error, 404) ? undefined : () => target.refetch()} retrying={target.isFetching} title="Could not load the target" />
      </Screen>
    );
  }
  const t = target.data;
  return (
    <Screen title={t.designation} subtitle={t.name || undefined} above={<BackToTargets />} testID="target-detail">
      <TargetFacts target={t} />
      <VisibilitySection raDeg={t.raDeg} decDeg={t.decDeg} />
      <FramingsSection target={t} />
      <TargetHistoryLink targetId={t.id} />
      <TargetNotes target={t} />
      <DeleteTargetZone target={t} />
    </Screen>
  );
}
