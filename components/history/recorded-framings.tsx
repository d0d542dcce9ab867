import { Pressable, StyleSheet, View } from 'react-native';

import { countText, degreesText } from '@/components/calibration/calibration-format';
import { byFilterText, flippedAngle, integrationText } from '@/components/history/history-format';
import { AppText } from '@/components/ui/app-text';
import type { WebPressState } from '@/components/ui/pressable-state';
import { useThemedStyles } from '@/hooks/use-themed-styles';
import { radii, spacing, type Palette } from '@/constants/theme';
import type { RecordedFraming } from '@/shared/schemas/calibration-api';
import type { Framing } from '@/shared/schemas/target';
import { formatDec, formatRa } from '@/shared/targets/schema';

/** Which of the user's framings this recorded one is, in words. */
export function matchText(f: RecordedFraming, framings: readonly Framing[]): string {
  if (!f.framingId) return 'New framing: none of this target’s framings has this centre and angle';
  const name = framings.find((x) => x.id === f.framingId)?.name ?? 'a framing of this target';
  return f.framingFlipped ? `Your framing “${name}”, turned by 180°` : `Your framing “${name}”`;
}

function FramingItem({ f, framings, selected, onSelect }: { f: RecordedFraming; framings: readonly Framing[]; selected: boolean; onSelect?: () => void }) {
  const styles = useThemedStyles(makeStyles);
  const flipped = f.flippedFrames > 0;
  const total = integrationText(f.seconds + f.flippedSeconds);
  const body = (
    <>
      <View style={styles.top}>
        {onSelect ? <View style={[styles.radio, selected && styles.radioOn]} /> : null}
        <AppText weight="semibold" tabular style={styles.grow}>
          {`PA ${degreesText(f.positionAngleDeg)}${flipped ? ` and ${degreesText(flippedAngle(f.positionAngleDeg))}` : ''}`}
        </AppText>
        <AppText weight="semibold" tabular>
          {total}
        </AppText>
      </View>
      <AppText variant="small" tone="muted" tabular>
        {`${formatRa(f.raDeg)}  ${formatDec(f.decDeg)} · ${countText(f.frames + f.flippedFrames, 'frame', 'frames')}`}
      </AppText>
      <AppText variant="small" tone="muted" tabular>
        {byFilterText(f.byFilter)}
      </AppText>
      {onSelect ? (
        <AppText variant="small" tone={f.framingId ? 'ok' : 'accent'} testID="history-framing-match">
          {matchText(f, framings)}
        </AppText>
      ) : null}
      {flipped ? (
        <AppText variant="small" tone="accent" testID="history-framing-flipped">
          {`${countText(f.flippedFrames, 'frame', 'frames')} at ${degreesText(flippedAngle(f.positionAngleDeg))}: the camera turned with a meridian flip.`}
        </AppText>
      ) : null}
    </>
  );
  if (!onSelect) {
    return (
      <View style={styles.item} role="listitem" testID={`history-framing-${f.key}`}>
        {body}
      </View>
    );
  }
  return (
    <Pressable
      role="radio"
      aria-checked={selected}
      accessibilityState={{ selected }}
      accessibilityLabel={`Framing at ${degreesText(f.positionAngleDeg)}, ${total}`}
      onPress={onSelect}
      testID={`history-framing-${f.key}`}
      style={({ hovered }: WebPressState) => [styles.item, hovered && styles.hover, selected && styles.selected]}
    >
      {body}
    </Pressable>
  );
}

type RecordedFramingsProps = {
  framings: readonly RecordedFraming[];
  /** The target's own framings; none for lights without a target. */
  targetFramings?: readonly Framing[];
  selectedKey?: string | null;
  /** Makes the list a choice (to continue at one); without it the framings are only listed. */
  onSelect?: (key: string) => void;
};

/**
 * The framings the lights were taken at (centre within 1′, PA modulo 180°); as a choice, also
 * which of the target's framings each one is.
 */
export function RecordedFramings({ framings, targetFramings = [], selectedKey = null, onSelect }: RecordedFramingsProps) {
  return (
    <View style={listStyle.list} role={onSelect ? 'radiogroup' : 'list'} accessibilityLabel="Recorded framings" testID="history-framings">
      {framings.map((f) => (
        <FramingItem key={f.key} f={f} framings={targetFramings} selected={f.key === selectedKey} onSelect={onSelect ? () => onSelect(f.key) : undefined} />
      ))}
    </View>
  );
}

const listStyle = StyleSheet.create({ list: { gap: spacing.sm } });

const makeStyles = (c: Palette) =>
  StyleSheet.create({
    item: { borderWidth: 1, borderColor: c.border, borderRadius: radii.md, padding: spacing.md, gap: spacing.xxs, backgroundColor: c.surface },
    hover: { borderColor: c.borderStrong },
    selected: { borderColor: c.accent, backgroundColor: c.accentSoft },
    top: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
    grow: { flexGrow: 1, flexShrink: 1 },
    radio: { width: 14, height: 14, borderRadius: radii.pill, borderWidth: 1.5, borderColor: c.textMuted },
    radioOn: { borderColor: c.accent, backgroundColor: c.accent },
  });
