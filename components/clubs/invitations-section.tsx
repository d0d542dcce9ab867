import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { ROLE_CHOICES, rolesText } from '@/components/clubs/role-text';
import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { FormSection } from '@/components/ui/form-section';
import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';
import type { ClubInvitation, ClubRole, useClubPeopleMutations } from '@/hooks/use-clubs';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { ApiError } from '@/lib/api';
import { cleanError } from '@/lib/clean-error';
import { formatLogTime } from '@/lib/format';
import { spacing, type Palette } from '@/constants/theme';

type People = ReturnType<typeof useClubPeopleMutations>;
const EMAIL = /^[^\s@]+@[^\s@]+\.[^\s@]+$/;

/** Why a resend failed; joining in the meantime (another tab, a quick invitee) is said in our words. */
function resendErrorText(e: unknown): string {
  if (e instanceof ApiError && e.code === 'USER_IS_ALREADY_A_MEMBER_OF_THIS_ORGANIZATION') return 'They have joined the club in the meantime, so there is nothing to resend.';
  return cleanError(e);
}

function InviteForm({ people }: { people: People }) {
  const [email, setEmail] = useState('');
  const [role, setRole] = useState<ClubRole>('member');
  const [touched, setTouched] = useState(false);
  const [sentTo, setSentTo] = useState<string | null>(null);
  const error = touched && !EMAIL.test(email.trim()) ? 'Enter a valid e-mail address' : undefined;
  function send() {
    setTouched(true);
    const address = email.trim();
    if (!EMAIL.test(address)) return;
    people.invite.mutate({ email: address, role }, { onSuccess: () => (setSentTo(address), setEmail(''), setTouched(false)) });
  }
  return (
    <View style={stylesStatic.form}>
      {people.invite.error ? <Banner tone="danger" title="Could not send the invitation" message={cleanError(people.invite.error)} /> : null}
      {sentTo ? <Banner tone="ok" title="Invitation sent" message={`A link is on its way to ${sentTo}.`} testID="club-invite-sent" /> : null}
      <TextField label="Invite by e-mail" value={email} onChangeText={setEmail} onBlur={() => setTouched(true)} error={error} inputMode="email" autoCapitalize="none" autoComplete="off" testID="club-invite-email" />
      <SelectField label="Role" value={role} onChange={setRole} choices={ROLE_CHOICES.filter((c) => c.value !== 'owner')} testID="club-invite-role" />
      <Button label="Send invitation" onPress={send} pending={people.invite.isPending} testID="club-invite-send" />
    </View>
  );
}

function InvitationRow({ invitation, people, onResend }: { invitation: ClubInvitation; people: People; onResend: (i: ClubInvitation) => void }) {
  const styles = useThemedStyles(makeStyles);
  const resending = people.resend.isPending && people.resend.variables?.email === invitation.email;
  return (
    <View style={styles.row} testID={`club-invitation-${invitation.email}`}>
      <View style={styles.who}>
        <AppText weight="semibold" numberOfLines={1}>
          {invitation.email}
        </AppText>
        <AppText variant="small" tone="muted">{`${rolesText([invitation.role])} · expires ${formatLogTime(invitation.expiresAt)}`}</AppText>
      </View>
      <Button label="Resend" size="small" variant="secondary" accessibilityLabel={`Resend to ${invitation.email}`} onPress={() => onResend(invitation)} pending={resending} testID="club-invitation-resend" />
      <Button label="Revoke" size="small" variant="ghost" accessibilityLabel={`Revoke the invitation of ${invitation.email}`} onPress={() => (people.resend.reset(), people.revoke.mutate(invitation.id))} pending={people.revoke.isPending && people.revoke.variables === invitation.id} testID="club-invitation-revoke" />
    </View>
  );
}

/** Pending invitations (resend, revoke) and the invite form; owners and admins only. */
export function InvitationsSection({ invitations, people }: { invitations: ClubInvitation[]; people: People }) {
  const pending = invitations.filter((i) => i.status === 'pending');
  const resend = (i: ClubInvitation) => people.resend.mutate({ email: i.email, role: i.role as ClubRole });
  // The outcome of the last resend (the mutation keeps it until the next one).
  const { isSuccess: resent, error: resendError, variables: resentTo } = people.resend;
  return (
    <FormSection title="Invitations" description="The link in the mail lets them sign in or create an account, then join." testID="club-invitations">
      {people.revoke.error ? <Banner tone="danger" title="Could not revoke" message={cleanError(people.revoke.error)} /> : null}
      {resent && resentTo ? <Banner tone="ok" title={`Sent again to ${resentTo.email}`} message="Same link as before, with a new expiry date." testID="club-invitation-resent" /> : null}
      {resendError && resentTo ? <Banner tone="danger" title={`Could not resend to ${resentTo.email}`} message={resendErrorText(resendError)} testID="club-invitation-resend-error" /> : null}
      {pending.length === 0 ? <AppText tone="muted">No invitations waiting.</AppText> : pending.map((i) => <InvitationRow key={i.id} invitation={i} people={people} onResend={resend} />)}
      <InviteForm people={people} />
    </FormSection>
  );
}

const stylesStatic = StyleSheet.create({ form: { gap: spacing.md } });

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    row: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap', gap: spacing.sm, paddingVertical: spacing.sm, borderBottomWidth: StyleSheet.hairlineWidth, borderBottomColor: c.border },
    who: { flex: 1, minWidth: 160, gap: spacing.xxs },
  });
