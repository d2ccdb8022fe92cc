import { Fonts } from './index';
import { useTheme } from './use-theme';

/** The stack header's look, shared by the root stack and the sign-in pages' stack. */
export function useHeaderOptions() {
  const t = useTheme();
  return {
    headerStyle: { backgroundColor: t.surface },
    headerTintColor: t.primary,
    headerTitleStyle: { fontFamily: Fonts.semibold, color: t.text },
    contentStyle: { backgroundColor: t.background },
  };
}
