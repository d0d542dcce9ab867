import { router } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { AuthFrame } from '@/components/auth/auth-frame';
import { roleWithArticle, rolesText } from '@/components/clubs/role-text';
import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { LoadingView } from '@/components/ui/loading-view';
import { TextLink } from '@/components/ui/text-link';
import { useAcceptInvitationMutation, useInvitationPreviewQuery, useInvitationQuery, type InvitationPreview } from '@/hooks/use-clubs';
import { useSessionState } from '@/hooks/use-session';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { isApiError } from '@/lib/api';
import { cleanError } from '@/lib/clean-error';
import { formatLogTime } from '@/lib/format';
import { radii, spacing, type Palette } from '@/constants/theme';

/** Who invites the visitor where, from the public preview (no session needed). */
function PreviewCard({ preview }: { preview: InvitationPreview }) {
  const styles = useThemedStyles(makeStyles);
  return (
    <View style={styles.card} testID="invitation-preview">
      <AppText variant="lead">
        <AppText variant="lead" weight="semibold">
          {preview.inviterName}
        </AppText>
        {' invites you to '}
        <AppText variant="lead" weight="semibold">
          {preview.clubName}
        </AppText>
        {` as ${roleWithArticle(preview.role)}.`}
      </AppText>
      <AppText variant="small" tone="muted">{`Sent to ${preview.email} · open until ${formatLogTime(preview.expiresAt)}`}</AppText>
    </View>
  );
}

/** An invitation that will never open (unknown, withdrawn, accepted, expired, a broken link). */
const isClosed = (e: unknown) => isApiError(e) && [400, 404, 410].includes(e.status);

/** Signed out: who invites them where, then sign in or create an account and come back to accept. */
function SignedOut({ invitationId }: { invitationId: string }) {
  const preview = useInvitationPreviewQuery(invitationId, true);
  const next = `/invitations/${invitationId}`;
  if (preview.isPending) return <LoadingView label="Reading the invitation…" />;
  if (preview.isError && isClosed(preview.error)) {
    return (
      <>
        <Banner tone="danger" title="This invitation cannot be opened" message={cleanError(preview.error)} testID="invitation-error" />
        <TextLink href="/sign-in" label="Sign in to Nightloom" />
      </>
    );
  }
  return (
    <>
      {preview.data ? <PreviewCard preview={preview.data} /> : null}
      {preview.isError ? (
        <Banner tone="danger" title="Could not read the invitation" message={cleanError(preview.error)} testID="invitation-preview-error">
          <Button label="Retry" variant="secondary" size="small" onPress={() => void preview.refetch()} pending={preview.isFetching} />
        </Banner>
      ) : null}
      <AppText tone="muted">
        {preview.data
          ? `Sign in or create an account with the address it was sent to (${preview.data.email}). You will come back here to join.`
          : 'Sign in or create an account with the e-mail address the invitation was sent to. You will come back here to join.'}
      </AppText>
      <Button label="Create an account to accept" onPress={() => router.replace({ pathname: '/sign-up', params: { next } })} testID="invitation-sign-up" fullWidth />
      <Button label="Sign in to accept" variant="secondary" onPress={() => router.replace({ pathname: '/sign-in', params: { next } })} testID="invitation-sign-in" fullWidth />
    </>
  );
}

function SignedIn({ invitationId, email }: { invitationId: string; email: string }) {
  const invitation = useInvitationQuery(invitationId, true);
  const accept = useAcceptInvitationMutation();
  if (invitation.isPending) return <LoadingView label="Reading the invitation…" />;
  if (invitation.isError) {
    return (
      <>
        <Banner tone="danger" title="This invitation cannot be opened" message={`${cleanError(invitation.error)} You are signed in as ${email}; an invitation opens only for the address it was sent to, and only while it is pending.`} testID="invitation-error" />
        <TextLink href="/clubs" label="Go to my clubs" />
      </>
    );
  }
  const inv = invitation.data;
  const clubId = inv.organizationId;
  return (
    <>
      <AppText testID="invitation-summary">{`${inv.inviterEmail} invites you to join ${inv.organizationName} as ${rolesText([inv.role]).toLowerCase()}.`}</AppText>
      {accept.error ? <Banner tone="danger" title="Could not join" message={cleanError(accept.error)} /> : null}
      <Button
        label={`Join ${inv.organizationName}`}
        onPress={() => accept.mutate(invitationId, { onSuccess: () => router.replace({ pathname: '/clubs/[id]', params: { id: clubId } }) })}
        pending={accept.isPending}
        testID="invitation-accept"
        fullWidth
      />
    </>
  );
}

/** Where the e-mailed invitation link lands, signed in or out. */
export function InvitationScreen({ invitationId }: { invitationId: string }) {
  const { user } = useSessionState();
  return (
    <AuthFrame title="Club invitation" subtitle="Share recipes as templates with the people you image with.">
      <View style={styles.body} testID="invitation-screen">
        {user ? <SignedIn invitationId={invitationId} email={user.email} /> : <SignedOut invitationId={invitationId} />}
      </View>
    </AuthFrame>
  );
}

const styles = StyleSheet.create({ body: { gap: spacing.md } });

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    card: { gap: spacing.xs, padding: spacing.md, borderRadius: radii.md, borderWidth: 1, borderColor: c.border, backgroundColor: c.surfaceRaised },
  });
