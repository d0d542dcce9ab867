import type { ReactNode } from 'react';
import { View, type StyleProp, type ViewStyle } from 'react-native';

import { spacing } from '@/constants/theme';

type StickyColumnProps = { children: ReactNode; style?: StyleProp<ViewStyle>; testID?: string };

// CSS sticky positioning: react-native-web passes it through, React Native's types do not know it.
const sticky = { position: 'sticky', top: spacing.lg, alignSelf: 'flex-start' } as unknown as ViewStyle;

/** A side column that stays in view while the page scrolls past the column beside it. */
export function StickyColumn({ children, style, testID }: StickyColumnProps) {
  return (
    <View style={[style, sticky]} testID={testID}>
      {children}
    </View>
  );
}
