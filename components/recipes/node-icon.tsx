import type { ReactNode } from 'react';
import Svg, { Circle, Path, Rect } from 'react-native-svg';
import type { NodeKind } from '@/shared/recipe/types';

export { NODE_KIND_HINTS, NODE_KIND_LABELS } from '@/components/recipes/node-editor/kind-text';

type StrokeProps = { stroke: string; strokeWidth: number; fill: 'none'; strokeLinecap: 'round'; strokeLinejoin: 'round' };
type Draw = (s: StrokeProps, color: string) => ReactNode;

/* Nightloom's own line drawings on a 24-unit grid; one stroke weight for all of them. */
const DRAWINGS: Record<NodeKind, Draw> = {
  stage: (s, c) => (
    <>
      <Rect x={3.5} y={4.5} width={17} height={15} rx={2} {...s} />
      <Path d="M12 8.5l1 2.5 2.5 1-2.5 1-1 2.5-1-2.5-2.5-1 2.5-1z" {...s} />
      <Circle cx={17} cy={7.5} r={0.8} fill={c} />
    </>
  ),
  repeat: (s) => (
    <>
      <Path d="M4.5 11a7.5 7.5 0 0 1 13-4.5M19.5 13a7.5 7.5 0 0 1-13 4.5" {...s} />
      <Path d="M17.5 3v3.5H14M6.5 21v-3.5H10" {...s} />
    </>
  ),
  group: (s) => (
    <>
      <Path d="M7 4H4.5v16H7M17 4h2.5v16H17" {...s} />
      <Path d="M8.5 9h7M8.5 12h7M8.5 15h7" {...s} />
    </>
  ),
  cool: (s) => (
    <>
      <Path d="M12 3v18M4.2 7.5l15.6 9M4.2 16.5l15.6-9" {...s} />
      <Path d="M9.8 4.5L12 6.5l2.2-2M9.8 19.5l2.2-2 2.2 2" {...s} />
    </>
  ),
  warm: (s) => (
    <>
      <Path d="M10 14.2V5a2 2 0 0 1 4 0v9.2a3.8 3.8 0 1 1-4 0z" {...s} />
      <Path d="M12 10v6.5M18 4.5c-1 1 1 2 0 3M20.5 4.5c-1 1 1 2 0 3" {...s} />
    </>
  ),
  slew: (s, c) => (
    <>
      <Path d="M4 19c1.5-7 6.5-12 14-13.5" {...s} />
      <Path d="M14.5 3.5l3.5 2-2 3.5" {...s} />
      <Circle cx={4} cy={19} r={1.3} fill={c} />
    </>
  ),
  centre: (s, c) => (
    <>
      <Path d="M4 8.5V4h4.5M15.5 4H20v4.5M20 15.5V20h-4.5M8.5 20H4v-4.5" {...s} />
      <Path d="M12 8v2.2M12 13.8V16M8 12h2.2M13.8 12H16" {...s} />
      <Circle cx={12} cy={12} r={0.9} fill={c} />
    </>
  ),
  rotate: (s) => (
    <>
      <Path d="M19.5 12a7.5 7.5 0 1 1-2.2-5.3" {...s} />
      <Path d="M17.8 3v4h-4M12 12V6.5" {...s} />
    </>
  ),
  focus: (s, c) => (
    <>
      <Path d="M3.5 4.5c3 10 5.5 13.5 8.5 13.5s5.5-3.5 8.5-13.5" {...s} />
      <Path d="M12 21v-1" {...s} />
      <Circle cx={12} cy={18} r={1.2} fill={c} />
    </>
  ),
  expose: (s) => (
    <>
      <Rect x={3} y={6} width={18} height={13} rx={2.5} {...s} />
      <Circle cx={12} cy={12.5} r={3.6} {...s} />
      <Path d="M8 6l1.3-2h5.4L16 6" {...s} />
    </>
  ),
  guide: (s, c) => (
    <>
      <Rect x={7} y={7} width={10} height={10} rx={1} {...s} />
      <Path d="M12 3v4M12 17v4M3 12h4M17 12h4" {...s} />
      <Circle cx={12.6} cy={11.4} r={1.2} fill={c} />
    </>
  ),
  meridian: (s) => (
    <>
      <Path d="M3 19a9 9 0 0 1 18 0M2.5 19h19" {...s} />
      <Path d="M12 6.5V19" {...s} strokeDasharray="2 2" />
    </>
  ),
  wait: (s) => (
    <>
      <Path d="M6.5 3.5h11M6.5 20.5h11" {...s} />
      <Path d="M7.5 3.5c0 5 9 4.5 9 8.5s-9 3.5-9 8.5M16.5 3.5c0 5-9 4.5-9 8.5s9 3.5 9 8.5" {...s} />
    </>
  ),
  flats: (s) => (
    <>
      <Rect x={5} y={5} width={14} height={14} rx={1.5} {...s} />
      <Path d="M2.5 9V5M2.5 15v4M21.5 9V5M21.5 15v4M9 12h6" {...s} />
    </>
  ),
  darks: (s, c) => (
    <>
      <Circle cx={12} cy={12} r={8} {...s} />
      <Circle cx={12} cy={12} r={4.5} fill={c} />
    </>
  ),
  park: (s) => (
    <>
      <Path d="M4 11l8-6.5 8 6.5M6.5 9.5V19.5h11V9.5" {...s} />
      <Path d="M10 19.5v-5h4v5" {...s} />
    </>
  ),
  note: (s) => (
    <>
      <Path d="M5.5 3.5h9l4 4v13h-13z" {...s} />
      <Path d="M14.5 3.5v4h4M8.5 12h7M8.5 15.5h7" {...s} />
    </>
  ),
};

type NodeIconProps = { kind: NodeKind; size?: number; color: string };

/** A small line icon for a recipe node kind, drawn in the colour passed in (a theme token). */
export function NodeIcon({ kind, size = 18, color }: NodeIconProps) {
  const stroke: StrokeProps = { stroke: color, strokeWidth: 1.7, fill: 'none', strokeLinecap: 'round', strokeLinejoin: 'round' };
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" accessibilityElementsHidden importantForAccessibility="no">
      {DRAWINGS[kind](stroke, color)}
    </Svg>
  );
}
