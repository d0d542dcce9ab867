import { StyleSheet, View } from 'react-native';

import { AppText } from '@/components/ui/app-text';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';

type ProgressBarProps = {
  /** 0…1; values outside are clamped. */
  fraction: number;
  /** The bar's accessible name, e.g. "Upload". */
  label: string;
  /** The line under the bar ("Uploading 1.2 MB of 3.4 MB"). */
  caption: string;
  /** Dims the bar once the work it measures is over and the server takes its turn. */
  done?: boolean;
  testID?: string;
  captionTestID?: string;
};

/** A determinate progress bar with a caption under it (uploads, reading files). */
export function ProgressBar({ fraction, label, caption, done, testID, captionTestID }: ProgressBarProps) {
  const styles = useThemedStyles(makeStyles);
  const now = Math.round(Math.min(1, Math.max(0, fraction)) * 100);
  return (
    <View style={styles.box} testID={testID}>
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
      <AppText variant="small" tone="muted" tabular testID={captionTestID}>
        {caption}
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
