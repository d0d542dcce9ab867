import { StyleSheet, View } from 'react-native';
import { G, Line, Path, Rect, Text as SvgText } from 'react-native-svg';

import { AltitudeChart } from '@/components/charts/altitude-chart';
import { pathOf, xOf, type Plot } from '@/components/charts/altitude-geometry';
import { curveBetween } from '@/components/dry-run/altitude-overlay';
import { formatClockRange, formatSpanS } from '@/components/dry-run/run-format';
import { exposureSpans, flipStarts, type TimedEvent } from '@/components/dry-run/timeline-rows';
import type { TargetFacts } from '@/components/dry-run/naming';
import { useTheme } from '@/components/theme-provider';
import { AppText } from '@/components/ui/app-text';
import { LoadingView } from '@/components/ui/loading-view';
import { useVisibilityQuery } from '@/hooks/use-visibility';
import { cleanError } from '@/lib/clean-error';
import { fonts, spacing, type Palette } from '@/constants/theme';
import type { VisibilitySample } from '@/shared/ephemeris/visibility';
import type { Night } from '@/shared/schemas/night';

type RunAltitudeChartProps = { target: TargetFacts; events: TimedEvent[]; night: Night; siteId: string; nowMs: number; shutterS: number };

const STRIP = 6;

type OverlayProps = { plot: Plot; spans: { startMs: number; endMs: number }[]; flips: TimedEvent[]; samples: VisibilitySample[]; c: Palette };

/** Exposure spans as a glow along the curve and a bar on the base line; flips as dotted marks. */
function Overlay({ plot, spans, flips, samples, c }: OverlayProps) {
  return (
    <G>
      {spans.map((s) => (
        <G key={s.startMs}>
          <Path d={pathOf(plot, curveBetween(samples, s.startMs, s.endMs))} stroke={c.accent} strokeOpacity={0.35} strokeWidth={9} strokeLinecap="round" strokeLinejoin="round" fill="none" />
          <Rect x={xOf(plot, s.startMs)} y={plot.bottom - STRIP} width={Math.max(1, xOf(plot, s.endMs) - xOf(plot, s.startMs))} height={STRIP} fill={c.accent} />
        </G>
      ))}
      {flips.map((f) => (
        <G key={f.index}>
          <Line x1={xOf(plot, f.startMs)} x2={xOf(plot, f.startMs)} y1={plot.top} y2={plot.bottom - STRIP} stroke={c.moon} strokeWidth={1.5} strokeDasharray="1 3" />
          <SvgText x={xOf(plot, f.startMs) + 4} y={plot.bottom - STRIP - 6} fontFamily={fonts.regular} fontSize={11} fill={c.moon}>
            Flip
          </SvgText>
        </G>
      ))}
    </G>
  );
}

/** A target's altitude through the night with the dry run's light frames and meridian flips laid over it. */
export function RunAltitudeChart({ target, events, night, siteId, nowMs, shutterS }: RunAltitudeChartProps) {
  const { palette: c } = useTheme();
  const vis = useVisibilityQuery({ siteId, date: night.date, raDeg: target.raDeg, decDeg: target.decDeg });
  const own = events.filter((e) => e.targetId === target.id);
  const spans = exposureSpans(own, target.id);
  const flips = flipStarts(own);
  const first = spans[0];
  const last = spans[spans.length - 1];
  const line = first && last ? `Light frames ${formatClockRange(first.startMs, last.endMs, night.timeZone)} · ${formatSpanS(shutterS)} of shutter` : 'No light frames on this night';
  return (
    <View style={styles.wrap} testID={`dry-run-altitude-${target.id}`}>
      <View style={styles.head}>
        <AppText weight="semibold">{target.designation || target.name}</AppText>
        {target.designation && target.name ? (
          <AppText variant="small" tone="muted" numberOfLines={1} style={styles.name}>
            {target.name}
          </AppText>
        ) : null}
      </View>
      <AppText variant="small" tone={first ? 'muted' : 'danger'} tabular>
        {`${line}${flips.length ? ` · ${flips.length} flip${flips.length > 1 ? 's' : ''}` : ''}`}
      </AppText>
      {vis.isPending ? (
        <LoadingView label="Working out the altitude…" />
      ) : vis.isError ? (
        <AppText variant="small" tone="danger">
          {cleanError(vis.error)}
        </AppText>
      ) : (
        <AltitudeChart night={night} visibility={vis.data.visibility} nowMs={nowMs} showLegend={false} overlay={(plot) => <Overlay plot={plot} spans={spans} flips={flips} samples={vis.data.visibility.samples} c={c} />} />
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.xs },
  head: { flexDirection: 'row', alignItems: 'baseline', gap: spacing.sm, flexWrap: 'wrap' },
  name: { flexShrink: 1 },
});
