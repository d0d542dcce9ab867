import Svg, { Circle, Path } from 'react-native-svg';

import { useTheme } from '@/components/theme-provider';

/** Nightloom's mark: a low horizon arc under a crescent and one bright star. */
export function LogoMark({ size = 32 }: { size?: number }) {
  const { palette } = useTheme();
  return (
    <Svg width={size} height={size} viewBox="0 0 32 32" accessibilityElementsHidden importantForAccessibility="no">
      <Circle cx={16} cy={16} r={15} fill={palette.surfaceRaised} stroke={palette.borderStrong} strokeWidth={1} />
      <Path d="M19.5 7.5a7 7 0 1 0 5 11.2 5.6 5.6 0 1 1-5-11.2z" fill={palette.accent} />
      <Circle cx={10} cy={10} r={1.3} fill={palette.text} />
      <Path d="M4 23.5c4-2.6 8-3.4 12-3.4s8 .8 12 3.4" stroke={palette.textMuted} strokeWidth={1.6} fill="none" strokeLinecap="round" />
    </Svg>
  );
}
