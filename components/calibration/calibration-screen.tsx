import { useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { DarkLibrarySection } from '@/components/calibration/dark-library-section';
import { FlatsSection } from '@/components/calibration/flats-section';
import { ImportsSection } from '@/components/calibration/imports-section';
import { IntakeSection } from '@/components/calibration/intake-section';
import { useIntake } from '@/components/calibration/use-intake';
import { HistoryList } from '@/components/history/history-list';
import { Screen } from '@/components/ui/screen';
import { Segmented } from '@/components/ui/segmented';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { spacing } from '@/constants/theme';

type Part = 'frames' | 'darks' | 'flats' | 'history';
const PARTS: readonly Part[] = ['frames', 'darks', 'flats', 'history'];

/** The phone's chosen part, kept while visiting a target's history and coming back. */
let rememberedPart: Part = 'frames';

/**
 * Calibration: add a night's frames (headers only) and see past imports, the dark library, flats
 * for a night's lights and the capture history. Phones switch between the parts; from 900 px
 * they sit in two columns.
 */
export function CalibrationScreen() {
  const { isWide } = useBreakpoints();
  const flow = useIntake();
  const params = useLocalSearchParams<{ part?: string }>();
  const [part, setPartState] = useState<Part>(() => {
    const asked = PARTS.find((p) => p === params.part);
    if (asked) rememberedPart = asked;
    return rememberedPart;
  });
  const setPart = (next: Part) => {
    rememberedPart = next;
    setPartState(next);
  };
  const subtitle = 'Frames on record, the dark library, flats that match your lights, and what you have captured.';

  if (isWide) {
    return (
      <Screen title="Calibration" subtitle={subtitle} testID="calibration-screen">
        <View style={styles.columns}>
          <View style={styles.column}>
            <IntakeSection flow={flow} />
            <ImportsSection />
            <HistoryList />
          </View>
          <View style={styles.column}>
            <DarkLibrarySection />
            <FlatsSection />
          </View>
        </View>
      </Screen>
    );
  }
  return (
    <Screen title="Calibration" testID="calibration-screen">
      <Segmented
        accessibilityLabel="Calibration"
        value={part}
        onChange={setPart}
        segments={[
          { key: 'frames', label: 'Frames', testID: 'calibration-tab-frames' },
          { key: 'darks', label: 'Darks', testID: 'calibration-tab-darks' },
          { key: 'flats', label: 'Flats', testID: 'calibration-tab-flats' },
          { key: 'history', label: 'History', testID: 'calibration-tab-history' },
        ]}
      />
      {part === 'frames' ? (
        <>
          <IntakeSection flow={flow} />
          <ImportsSection />
        </>
      ) : null}
      {part === 'darks' ? <DarkLibrarySection /> : null}
      {part === 'flats' ? <FlatsSection /> : null}
      {part === 'history' ? <HistoryList /> : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  columns: { flexDirection: 'row', gap: spacing.xl, alignItems: 'flex-start' },
  column: { flex: 1, minWidth: 0, gap: spacing.xl },
});
