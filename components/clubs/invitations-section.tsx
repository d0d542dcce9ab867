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
import { cleanError } from '@/lib/clean-error';
import { formatLogTime } from '@/lib/format';
import { spacing, type Palette } from '@/constants/theme';

type People = ReturnType<typeof useClubPeopleMutations>;
const EMAIL = /^[^\s@]+@[^\s@]+\.[^\s@]+$/;

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
      <Button label="Send invitation" onPress={send} pending={people.invite.isPending && !people.invite.variables?.resend} testID="club-invite-send" />
    </View>
  );
}

function InvitationRow({ invitation, people }: { invitation: ClubInvitation; people: People }) {
  const styles = useThemedStyles(makeStyles);
  const resending = people.invite.isPending && people.invite.variables?.email === invitation.email && people.invite.variables.resend;
  return (
    <View style={styles.row} testID={`club-invitation-${invitation.email}`}>
      <View style={styles.who}>
        <AppText weight="semibold" numberOfLines={1}>
          {invitation.email}
        </AppText>
        <AppText variant="small" tone="muted">{`${rolesText([invitation.role])} · expires ${formatLogTime(invitation.expiresAt)}`}</AppText>
      </View>
      <Button label="Resend" size="small" variant="secondary" accessibilityLabel={`Resend to ${invitation.email}`} onPress={() => people.invite.mutate({ email: invitation.email, role: invitation.role as ClubRole, resend: true })} pending={resending} testID="club-invitation-resend" />
      <Button label="Revoke" size="small" variant="ghost" accessibilityLabel={`Revoke the invitation of ${invitation.email}`} onPress={() => people.revoke.mutate(invitation.id)} pending={people.revoke.isPending && people.revoke.variables === invitation.id} testID="club-invitation-revoke" />
    </View>
  );
}

/** Pending invitations (resend, revoke) and the invite form; owners and admins only. */
export function InvitationsSection({ invitations, people }: { invitations: ClubInvitation[]; people: People }) {
  const pending = invitations.filter((i) => i.status === 'pending');
  return (
    <FormSection title="Invitations" description="The link in the mail lets them sign in or create an account, then join." testID="club-invitations">
      {people.revoke.error ? <Banner tone="danger" title="Could not revoke" message={cleanError(people.revoke.error)} /> : null}
      {pending.length === 0 ? <AppText tone="muted">No invitations waiting.</AppText> : pending.map((i) => <InvitationRow key={i.id} invitation={i} people={people} />)}
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
