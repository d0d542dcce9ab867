import { router, useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { FindPanel } from '@/components/targets/find-panel';
import { MyTargetsPanel } from '@/components/targets/my-targets-panel';
import { Segmented } from '@/components/ui/segmented';
import { AppText } from '@/components/ui/app-text';
import { Button } from '@/components/ui/button';
import { Screen } from '@/components/ui/screen';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { spacing } from '@/constants/theme';

type Part = 'mine' | 'find';

/** The phone's chosen part, kept while moving to a target and back. */
let rememberedPart: Part = 'mine';

function PartHeading({ children }: { children: string }) {
  return (
    <AppText eyebrow tone="faint" weight="semibold" role="heading" aria-level={2}>
      {children}
    </AppText>
  );
}

/** Targets: my list and Find; a segmented switch on phones, side by side from 900 px. */
export function TargetsScreen() {
  const { isWide } = useBreakpoints();
  const params = useLocalSearchParams<{ part?: string }>();
  // A link may ask for a part (e.g. "search them" after an import); otherwise the last one used.
  const [part, setPartState] = useState<Part>(() => {
    if (params.part === 'find' || params.part === 'mine') rememberedPart = params.part;
    return rememberedPart;
  });
  const setPart = (next: Part) => {
    rememberedPart = next;
    setPartState(next);
  };
  const importButton = <Button label="Import catalogue" variant="secondary" size="small" onPress={() => router.push('/targets/import')} testID="targets-import" />;

  if (isWide) {
    return (
      <Screen title="Targets" subtitle="Your list, and the objects you can add to it." actions={importButton} testID="targets-screen">
        <View style={styles.columns}>
          <View style={styles.mine}>
            <PartHeading>My targets</PartHeading>
            <MyTargetsPanel />
          </View>
          <View style={styles.find}>
            <PartHeading>Find</PartHeading>
            <FindPanel />
          </View>
        </View>
      </Screen>
    );
  }
  return (
    <Screen title="Targets" actions={importButton} testID="targets-screen">
      <Segmented
        accessibilityLabel="Targets"
        value={part}
        onChange={setPart}
        segments={[
          { key: 'mine', label: 'My targets', testID: 'targets-tab-mine' },
          { key: 'find', label: 'Find', testID: 'targets-tab-find' },
        ]}
      />
      {part === 'mine' ? <MyTargetsPanel onFind={() => setPart('find')} /> : <FindPanel />}
    </Screen>
  );
}

const styles = StyleSheet.create({
  columns: { flexDirection: 'row', gap: spacing.xl, alignItems: 'flex-start' },
  mine: { flex: 2, minWidth: 0, gap: spacing.md },
  find: { flex: 3, minWidth: 0, gap: spacing.md },
});
