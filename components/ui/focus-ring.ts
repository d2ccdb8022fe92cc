import { Platform, type ViewStyle } from 'react-native';
import type { ThemeColors } from '@/lib/theme';

/**
 * The visible keyboard focus (WCAG 2.4.7, 2.4.11): a 2 px ring in the theme's focus colour,
 * 2 px outside the control, so it shows on any background. Web only (native platforms draw their own).
 */
export function focusRing(t: ThemeColors, focused: boolean | undefined, inset = false): ViewStyle | null {
  if (Platform.OS !== 'web' || !focused) return null;
  // `inset` draws it inside, for controls at the window's edge (the bottom bar) where outside would be cut off.
  return { outlineColor: t.focus, outlineStyle: 'solid', outlineWidth: 2, outlineOffset: inset ? -4 : 2 } as ViewStyle;
}
