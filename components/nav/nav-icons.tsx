import Svg, { Circle, Path, Rect } from 'react-native-svg';

export type NavIconName = 'tonight' | 'recipes' | 'targets' | 'setup' | 'sites' | 'rig' | 'club' | 'account' | 'mail' | 'more' | 'calibration';

type IconProps = { name: NavIconName; color: string; size?: number };

/** Line icons for the navigation, drawn for Nightloom on a 24-unit grid. */
export function NavIcon({ name, color, size = 22 }: IconProps) {
  const stroke = { stroke: color, strokeWidth: 1.7, fill: 'none', strokeLinecap: 'round' as const, strokeLinejoin: 'round' as const };
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" accessibilityElementsHidden importantForAccessibility="no">
      {name === 'tonight' ? (
        <>
          <Path d="M14.5 3.5a6.5 6.5 0 1 0 6 9.2 5 5 0 1 1-6-9.2z" {...stroke} />
          <Path d="M3 20h18" {...stroke} />
          <Circle cx={5.5} cy={6} r={0.9} fill={color} />
        </>
      ) : null}
      {name === 'recipes' ? (
        <>
          {/* An outline of steps: two top-level lines and two indented under the second. */}
          <Path d="M4 5.5h3M10 5.5h10M4 10.5h3M10 10.5h10M9 15h2.5M14.5 15H20M9 19.5h2.5M14.5 19.5H20" {...stroke} />
        </>
      ) : null}
      {name === 'sites' ? (
        <>
          <Path d="M12 21s-6-5.6-6-10.5a6 6 0 0 1 12 0C18 15.4 12 21 12 21z" {...stroke} />
          <Circle cx={12} cy={10.5} r={2.2} {...stroke} />
        </>
      ) : null}
      {name === 'targets' ? (
        <>
          <Circle cx={12} cy={12} r={7.5} {...stroke} />
          <Path d="M12 2.5v4M12 17.5v4M2.5 12h4M17.5 12h4" {...stroke} />
          <Circle cx={12} cy={12} r={1.1} fill={color} />
        </>
      ) : null}
      {name === 'setup' || name === 'rig' ? (
        <>
          {/* A short tube on a tripod, tilted towards the sky. */}
          <Path d="M5 11.5l11.5-6.2 1.7 3.1L6.7 14.6z" {...stroke} />
          <Path d="M18.2 5l1.3-.7M11 12.7l-3 8.3M11 12.7l3 8.3M11 12.7V21" {...stroke} />
        </>
      ) : null}
      {name === 'calibration' ? (
        <>
          {/* A stack of frames, the top one with a check: frames on record. */}
          <Rect x={6.5} y={3.5} width={13} height={10} rx={1.5} {...stroke} />
          <Path d="M4.5 7.5v8a2 2 0 0 0 2 2h11" {...stroke} />
          <Path d="M2.5 11.5v8a2 2 0 0 0 2 2h11" {...stroke} />
          <Path d="M10 8.6l1.9 1.9 3.8-3.8" {...stroke} />
        </>
      ) : null}
      {name === 'more' ? (
        <>
          <Circle cx={5.5} cy={12} r={1.4} fill={color} />
          <Circle cx={12} cy={12} r={1.4} fill={color} />
          <Circle cx={18.5} cy={12} r={1.4} fill={color} />
        </>
      ) : null}
      {name === 'account' ? (
        <>
          <Circle cx={12} cy={8.5} r={3.6} {...stroke} />
          <Path d="M4.5 20c1.3-3.6 4.1-5.3 7.5-5.3s6.2 1.7 7.5 5.3" {...stroke} />
        </>
      ) : null}
      {name === 'club' ? (
        <>
          {/* Three heads under one small star: people who image together. */}
          <Circle cx={7} cy={11} r={2.3} {...stroke} />
          <Circle cx={17} cy={11} r={2.3} {...stroke} />
          <Circle cx={12} cy={9.5} r={2.6} {...stroke} />
          <Path d="M2.5 20c.7-2.6 2.3-4 4.5-4M21.5 20c-.7-2.6-2.3-4-4.5-4M7.5 20.5c.8-3.2 2.4-4.7 4.5-4.7s3.7 1.5 4.5 4.7" {...stroke} />
          <Path d="M12 2.5v2.4M10.8 3.7h2.4" {...stroke} />
        </>
      ) : null}
      {name === 'mail' ? (
        <>
          <Rect x={3.5} y={5.5} width={17} height={13} rx={2} {...stroke} />
          <Path d="M4 7l8 6 8-6" {...stroke} />
        </>
      ) : null}
    </Svg>
  );
}
