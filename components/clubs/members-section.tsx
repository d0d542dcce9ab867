import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { ROLE_CHOICES, rolesText } from '@/components/clubs/role-text';
import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { FormSection } from '@/components/ui/form-section';
import { SelectField } from '@/components/ui/select-field';
import { isClubOwner, type ClubMember, type ClubRole, type useClubPeopleMutations } from '@/hooks/use-clubs';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { cleanError } from '@/lib/clean-error';
import { spacing, type Palette } from '@/constants/theme';

type People = ReturnType<typeof useClubPeopleMutations>;
type Props = { members: ClubMember[]; myRoles: string[]; myUserId: string | undefined; people: People; onLeft: () => void };

const firstRole = (roles: string[]): ClubRole => {
  const flat = roles.flatMap((r) => r.split(',')).map((r) => r.trim());
  return flat.includes('owner') ? 'owner' : flat.includes('admin') ? 'admin' : 'member';
};

function MemberRow({ member, canManage, people }: { member: ClubMember; canManage: boolean; people: People }) {
  const styles = useThemedStyles(makeStyles);
  return (
    <View style={styles.row} testID={`club-member-${member.email}`}>
      <View style={styles.who}>
        <AppText weight="semibold">{member.name}</AppText>
        <AppText variant="small" tone="muted" numberOfLines={1}>
          {member.email}
        </AppText>
      </View>
      {canManage ? (
        <View style={styles.controls}>
          <View style={styles.role}>
            <SelectField label={`Role of ${member.name}`} compact value={firstRole(member.roles)} choices={ROLE_CHOICES} onChange={(role) => people.changeRole.mutate({ member, role })} testID="club-member-role" />
          </View>
          <Button label="Remove" size="small" variant="ghost" accessibilityLabel={`Remove ${member.name}`} onPress={() => people.remove.mutate(member)} pending={people.remove.isPending && people.remove.variables?.userId === member.userId} testID="club-member-remove" />
        </View>
      ) : (
        <AppText variant="small" tone="accent" weight="semibold">
          {rolesText(member.roles)}
        </AppText>
      )}
    </View>
  );
}

/** Members with their roles; owners change roles and remove; anyone may leave. */
export function MembersSection({ members, myRoles, myUserId, people, onLeft }: Props) {
  const owner = isClubOwner(myRoles);
  const [confirmLeave, setConfirmLeave] = useState(false);
  const failure = people.changeRole.error ?? people.remove.error;
  return (
    <FormSection title="Members" description={`${members.length} ${members.length === 1 ? 'member' : 'members'}`} testID="club-members">
      {failure ? <Banner tone="danger" title="That did not work" message={cleanError(failure)} /> : null}
      {members.map((m) => (
        <MemberRow key={m.userId} member={m} canManage={owner && m.userId !== myUserId} people={people} />
      ))}
      {people.leave.error ? <Banner tone="danger" title="Could not leave the club" message={cleanError(people.leave.error)} testID="club-leave-error" /> : null}
      <View style={stylesStatic.leave}>
        {confirmLeave ? (
          <>
            <AppText tone="muted">Leave this club? Your copies of its templates stay in your recipes.</AppText>
            <Button label="Leave" variant="danger" size="small" onPress={() => people.leave.mutate(undefined, { onSuccess: onLeft })} pending={people.leave.isPending} testID="club-leave-confirm" />
            <Button label="Stay" variant="ghost" size="small" onPress={() => setConfirmLeave(false)} />
          </>
        ) : (
          <Button label="Leave club" variant="secondary" size="small" onPress={() => setConfirmLeave(true)} testID="club-leave" />
        )}
      </View>
    </FormSection>
  );
}

const stylesStatic = StyleSheet.create({ leave: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.sm } });

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    row: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap', gap: spacing.md, paddingVertical: spacing.sm, borderBottomWidth: StyleSheet.hairlineWidth, borderBottomColor: c.border },
    who: { flex: 1, minWidth: 160, gap: spacing.xxs },
    controls: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
    role: { width: 130 },
  });
