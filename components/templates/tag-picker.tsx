import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Chip } from '@/components/ui/chip';
import { AppText } from '@/components/ui/app-text';
import { TextField } from '@/components/ui/text-field';
import { SUGGESTED_TAGS } from '@/hooks/use-templates';
import { spacing } from '@/constants/theme';

const clean = (t: string) => t.trim().toLowerCase().slice(0, 24);

/** The suggested tags as chips plus free ones, comma separated. */
export function TagPicker({ tags, onChange }: { tags: string[]; onChange: (tags: string[]) => void }) {
  const suggested: readonly string[] = SUGGESTED_TAGS;
  const [free, setFree] = useState(tags.filter((t) => !suggested.includes(t)).join(', '));
  const picked = tags.filter((t) => suggested.includes(t));
  const emit = (nextPicked: string[], nextFree: string) => onChange([...new Set([...nextPicked, ...nextFree.split(',').map(clean).filter(Boolean)])]);
  return (
    <View style={styles.field}>
      <AppText variant="small" weight="semibold" tone="muted">
        Tags
      </AppText>
      <View style={styles.chips}>
        {suggested.map((t) => (
          <Chip key={t} role="checkbox" label={t} selected={picked.includes(t)} onPress={() => emit(picked.includes(t) ? picked.filter((p) => p !== t) : [...picked, t], free)} testID={`tag-${t.replace(/\s+/g, '-')}`} />
        ))}
      </View>
      <TextField label="Other tags" hint="Comma separated, e.g. galaxies, portable" value={free} onChangeText={(v) => (setFree(v), emit(picked, v))} autoCapitalize="none" testID="tag-free" />
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: spacing.sm },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
