import { router } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { TextField } from '@/components/ui/text-field';
import { slugOf, useCreateClubMutation } from '@/hooks/use-clubs';
import { cleanError } from '@/lib/clean-error';
import { spacing } from '@/constants/theme';

/** Name → slug; the creator becomes the club's owner and lands on its page. */
export function NewClubForm({ onCancel }: { onCancel: () => void }) {
  const [name, setName] = useState('');
  const [touched, setTouched] = useState(false);
  const create = useCreateClubMutation();
  const slug = slugOf(name);
  const nameError = touched && name.trim().length < 2 ? 'Give the club a name of at least 2 characters' : touched && !slug ? 'Use some letters or digits' : undefined;

  function submit() {
    setTouched(true);
    if (name.trim().length < 2 || !slug) return;
    create.mutate(
      { name: name.trim(), slug },
      { onSuccess: (club) => club && router.push({ pathname: '/clubs/[id]', params: { id: club.id } }) },
    );
  }

  return (
    <Card testID="club-new-form">
      <AppText variant="lead" weight="semibold" role="heading" aria-level={2}>
        New club
      </AppText>
      {create.error ? <Banner tone="danger" title="Could not create the club" message={cleanError(create.error)} /> : null}
      <TextField label="Club name" value={name} onChangeText={setName} onBlur={() => setTouched(true)} error={nameError} hint={slug ? `Address name: ${slug}` : undefined} maxLength={60} onSubmitEditing={submit} testID="club-name-input" />
      <View style={styles.actions}>
        <Button label="Create club" onPress={submit} pending={create.isPending} testID="club-create" />
        <Button label="Cancel" variant="ghost" onPress={onCancel} />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({ actions: { flexDirection: 'row', gap: spacing.sm } });
