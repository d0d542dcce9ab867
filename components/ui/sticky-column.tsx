import type { ReactNode } from 'react';
import { View, type StyleProp, type ViewStyle } from 'react-native';

type StickyColumnProps = { children: ReactNode; style?: StyleProp<ViewStyle>; testID?: string };

/** A side column; on the web it stays in view while the page scrolls (see the `.web` file). */
export function StickyColumn({ children, style, testID }: StickyColumnProps) {
  return (
    <View style={style} testID={testID}>
      {children}
    </View>
  );
}
