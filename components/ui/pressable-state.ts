import type { PressableStateCallbackType } from 'react-native';

/** react-native-web also reports hover to Pressable style callbacks. */
export type WebPressState = PressableStateCallbackType & { hovered?: boolean };
