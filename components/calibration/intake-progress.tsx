import { StyleSheet, View } from 'react-native';

import { readingText } from '@/components/calibration/calibration-format';
import type { IntakeFlow } from '@/components/calibration/use-intake';
import { formatBytes } from '@/components/catalogues/import-flow';
import { AppText } from '@/components/ui/app-text';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';

function Bar({ fraction, label, done }: { fraction: number; label: string; done?: boolean }) {
  const styles = useThemedStyles(makeStyles);
  const now = Math.round(Math.min(1, Math.max(0, fraction)) * 100);
  return (
    <View
      style={styles.track}
      role="progressbar"
      accessibilityLabel={label}
      aria-valuemin={0}
      aria-valuemax={100}
      aria-valuenow={now}
      accessibilityValue={{ min: 0, max: 100, now }}
    >
      <View style={[styles.fill, { width: `${now}%` }, done && styles.fillDone]} />
    </View>
  );
}

/** Headers read so far, then the upload, then a note while the server records the frames. */
export function IntakeProgress({ flow }: { flow: IntakeFlow }) {
  const styles = useThemedStyles(makeStyles);
  if (flow.phase === 'reading') {
    const { done, total } = flow.read;
    return (
      <View style={styles.box} testID="intake-progress">
        <Bar fraction={total ? done / total : 0} label="Reading headers" />
        <AppText variant="small" tone="muted" tabular testID="intake-progress-text">
          {readingText(done, total)}
        </AppText>
      </View>
    );
  }
  const total = Math.max(1, flow.progress?.totalBytes ?? 1);
  const loaded = Math.min(total, flow.progress?.loadedBytes ?? 0);
  const sent = loaded >= total;
  const text = sent ? 'Sent. Recording the frames…' : `Sending the headers: ${formatBytes(loaded)} of ${formatBytes(total)}`;
  return (
    <View style={styles.box} testID="intake-progress">
      <Bar fraction={loaded / total} label="Sending the headers" done={sent} />
      <AppText variant="small" tone="muted" tabular testID="intake-progress-text">
        {text}
      </AppText>
    </View>
  );
}

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    box: { gap: spacing.sm },
    track: { height: 8, borderRadius: radii.pill, backgroundColor: c.surfaceRaised, borderWidth: 1, borderColor: c.border, overflow: 'hidden' },
    fill: { height: '100%', backgroundColor: c.accent },
    fillDone: { opacity: 0.7 },
  });
