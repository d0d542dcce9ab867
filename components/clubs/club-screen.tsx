import { router } from 'expo-router';

import { ClubTemplatesSection } from '@/components/clubs/club-templates-section';
import { InvitationsSection } from '@/components/clubs/invitations-section';
import { MembersSection } from '@/components/clubs/members-section';
import { ClubCapturesSection } from '@/components/history/club-captures-section';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import { Screen } from '@/components/ui/screen';
import { TextLink } from '@/components/ui/text-link';
import { canManageClub, useClubPeopleMutations, useClubQuery } from '@/hooks/use-clubs';
import { useSessionState } from '@/hooks/use-session';

/** One club: templates, shared captures, members and (for owners and admins) invitations. */
export function ClubScreen({ clubId }: { clubId: string }) {
  const club = useClubQuery(clubId);
  const people = useClubPeopleMutations(clubId);
  const { user } = useSessionState();
  const back = <TextLink href="/clubs" label="‹ Clubs" variant="small" testID="club-back" />;
  if (club.isPending) return <Screen above={back}><LoadingView label="Loading the club…" /></Screen>;
  if (club.isError) return <Screen above={back}><ErrorView error={club.error} onRetry={() => club.refetch()} retrying={club.isFetching} title="Could not load this club" /></Screen>;
  const { myRoles, members, invitations, templates } = club.data;
  const manage = canManageClub(myRoles);
  const knownTags = [...new Set(templates.flatMap((t) => t.tags))];
  return (
    <Screen title={club.data.club.name} subtitle={`${members.length} ${members.length === 1 ? 'member' : 'members'}`} above={back} testID="club-screen">
      <ClubTemplatesSection clubId={clubId} canManage={manage} knownTags={knownTags} />
      <ClubCapturesSection clubId={clubId} />
      <MembersSection members={members} myRoles={myRoles} myUserId={user?.id} people={people} onLeft={() => router.replace('/clubs')} />
      {manage ? <InvitationsSection invitations={invitations} people={people} /> : null}
    </Screen>
  );
}
