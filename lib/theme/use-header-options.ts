import { useWindowDimensions } from 'react-native';
import { Fonts } from './index';
import { useTheme } from './use-theme';

/** The stack header's look, shared by the root stack and the sign-in pages' stack. */
/** Room kept for the header's sides: Back/Home on the left, the account (up to 180 px, plus a badge) on the right. */
const LEFT_ROOM = 90;
const RIGHT_ROOM = 200;

export function useHeaderOptions() {
  const t = useTheme();
  const { width } = useWindowDimensions();
  return {
    headerStyle: { backgroundColor: t.surface },
    // The navigator leaves 52 px per side, so a long title ran under the account's name on phones.
    headerTitleContainerStyle: { maxWidth: Math.max(120, width - LEFT_ROOM - RIGHT_ROOM) },
    headerTintColor: t.primary,
    headerTitleStyle: { fontFamily: Fonts.semibold, color: t.text },
    contentStyle: { backgroundColor: t.background },
  };
}
