import { useState } from 'react';
import { StyleSheet, View, type LayoutChangeEvent } from 'react-native';
import Svg, { G, Line, Polygon, Rect, Text as SvgText } from 'react-native-svg';

import {
  formatArcmin,
  framingLayout,
  rotateByPa,
  scaleBarArcmin,
  type FieldSize,
  type FramingShape,
  type Point,
  type SkyObject,
} from '@/components/charts/framing-geometry';
import { useTheme } from '@/components/theme-provider';
import { fonts, type Palette } from '@/constants/theme';

const MAX_SIDE_PX = 440;
const PAD_PX = 14;
const ELLIPSE_POINTS = 48;

type FramingPreviewProps = { object: SkyObject; framing: FramingShape; field: FieldSize };

const pointsText = (ps: Point[]) => ps.map((p) => `${p.x.toFixed(1)},${p.y.toFixed(1)}`).join(' ');

/** The object's outline: an ellipse of its axes, major axis at its position angle east of north. */
function ellipse(obj: SkyObject, centre: Point): Point[] {
  const a = obj.majorArcmin / 2;
  const b = (obj.minorArcmin ?? obj.majorArcmin) / 2;
  const out: Point[] = [];
  for (let i = 0; i < ELLIPSE_POINTS; i++) {
    const t = (2 * Math.PI * i) / ELLIPSE_POINTS;
    const p = rotateByPa({ x: b * Math.cos(t), y: a * Math.sin(t) }, obj.positionAngleDeg ?? 0);
    out.push({ x: centre.x + p.x, y: centre.y + p.y });
  }
  return out;
}

function Compass({ x, y, c }: { x: number; y: number; c: Palette }) {
  const text = { fontFamily: fonts.semibold, fontSize: 11, fill: c.textMuted };
  return (
    <G>
      <Line x1={x} y1={y} x2={x} y2={y - 22} stroke={c.textMuted} strokeWidth={1.5} />
      <Line x1={x} y1={y} x2={x - 22} y2={y} stroke={c.textMuted} strokeWidth={1.5} />
      <SvgText {...text} x={x} y={y - 27} textAnchor="middle">
        N
      </SvgText>
      <SvgText {...text} x={x - 30} y={y + 4} textAnchor="middle">
        E
      </SvgText>
    </G>
  );
}

/**
 * The framing on the sky, north up and east left: the object's outline, every camera panel
 * turned by the position angle (overlaps show as denser fill), a mark on the image's top (+y)
 * edge, a compass and a scale bar.
 */
export function FramingPreview({ object, framing, field }: FramingPreviewProps) {
  const { palette: c } = useTheme();
  const [width, setWidth] = useState(0);
  const side = Math.min(width, MAX_SIDE_PX);
  const layout = framingLayout(object, framing, field);
  const k = (side / 2 - PAD_PX) / layout.halfViewArcmin;
  const px = (p: Point): Point => ({ x: side / 2 + p.x * k, y: side / 2 + p.y * k });
  const pa = framing.positionAngleDeg;
  const panel = (centre: Point) =>
    [
      { x: -1, y: -1 },
      { x: 1, y: -1 },
      { x: 1, y: 1 },
      { x: -1, y: 1 },
    ].map((s) => px(rotateByPa({ x: centre.x + (s.x * field.widthArcmin) / 2, y: centre.y + (s.y * field.heightArcmin) / 2 }, pa)));
  // A small triangle outside the mosaic's top edge: where the image's +y axis points.
  const { widthArcmin: mw, heightArcmin: mh } = layout.mosaic;
  const tip = 0.06 * Math.max(mw, mh);
  const topMark = [
    { x: -0.05 * mw, y: -mh / 2 },
    { x: 0.05 * mw, y: -mh / 2 },
    { x: 0, y: -mh / 2 - tip },
  ].map((p) => px(rotateByPa(p, pa)));
  const barArcmin = scaleBarArcmin((layout.halfViewArcmin * 2) / 3);
  const objectCentre = px(layout.object);
  const label = `Framing preview: ${framing.mosaicCols} × ${framing.mosaicRows} panel${framing.mosaicCols * framing.mosaicRows > 1 ? 's' : ''} at position angle ${Math.round(pa)}°, north up, east left.`;
  const text = { fontFamily: fonts.regular, fontSize: 11, fontFeatureSettings: "'tnum'" };

  return (
    <View style={styles.wrap} onLayout={(e: LayoutChangeEvent) => setWidth(e.nativeEvent.layout.width)} testID="framing-preview" role="img" accessibilityLabel={label}>
      {side > 0 ? (
        <Svg width={side} height={side}>
          <Rect x={0.5} y={0.5} width={side - 1} height={side - 1} rx={10} fill={c.skyDark} stroke={c.border} />
          {object.majorArcmin > 0 ? (
            <Polygon points={pointsText(ellipse(object, layout.object).map(px))} fill={c.moon} fillOpacity={0.1} stroke={c.moon} strokeOpacity={0.8} strokeWidth={1.2} />
          ) : (
            <G>
              <Line x1={objectCentre.x - 6} x2={objectCentre.x + 6} y1={objectCentre.y} y2={objectCentre.y} stroke={c.moon} />
              <Line x1={objectCentre.x} x2={objectCentre.x} y1={objectCentre.y - 6} y2={objectCentre.y + 6} stroke={c.moon} />
            </G>
          )}
          {layout.panels.map((p, i) => (
            <Polygon key={`panel-${i}`} points={pointsText(panel(p))} fill={c.accent} fillOpacity={0.09} stroke={c.accent} strokeWidth={1.4} testID="framing-preview-panel" />
          ))}
          <Polygon points={pointsText(topMark)} fill={c.accent} />
          <Compass x={side - 22} y={40} c={c} />
          <Line x1={PAD_PX} x2={PAD_PX + barArcmin * k} y1={side - PAD_PX} y2={side - PAD_PX} stroke={c.text} strokeWidth={2} />
          <SvgText {...text} x={PAD_PX} y={side - PAD_PX - 6} fill={c.textMuted}>
            {formatArcmin(barArcmin)}
          </SvgText>
        </Svg>
      ) : (
        <View style={styles.placeholder} />
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { width: '100%', maxWidth: MAX_SIDE_PX, alignSelf: 'center' },
  placeholder: { aspectRatio: 1 },
});
