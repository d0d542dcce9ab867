import { StyleSheet, View } from 'react-native';

import { formatBytes } from '@/components/catalogues/import-flow';
import { AppText } from '@/components/ui/app-text';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import type { UploadProgress as Progress } from '@/lib/upload';
import { radii, spacing, type Palette } from '@/constants/theme';


/** A bar while the file uploads, then a note while the server reads and stores it. */
export function UploadProgress({ progress }: { progress: Progress | null }) {
  const styles = useThemedStyles(makeStyles);
  const total = Math.max(1, progress?.totalBytes ?? 1);
  const loaded = Math.min(total, progress?.loadedBytes ?? 0);
  const fraction = loaded / total;
  const processing = fraction >= 1;
  const label = processing ? 'Uploaded. Reading and storing the objects…' : `Uploading ${formatBytes(loaded)} of ${formatBytes(total)}`;
  return (
    <View style={styles.box} testID="catalogue-progress">
      <View
        style={styles.track}
        role="progressbar"
        accessibilityLabel="Upload"
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={Math.round(fraction * 100)}
        accessibilityValue={{ min: 0, max: 100, now: Math.round(fraction * 100) }}
      >
        <View style={[styles.fill, { width: `${fraction * 100}%` }, processing && styles.fillDone]} />
      </View>
      <AppText variant="small" tone="muted" tabular testID={processing ? 'catalogue-processing' : 'catalogue-uploading'}>
        {label}
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
