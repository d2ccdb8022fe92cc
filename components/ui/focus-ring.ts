import { Platform, type ViewStyle } from 'react-native';
import type { ThemeColors } from '@/lib/theme';

/**
 * The visible keyboard focus (WCAG 2.4.7, 2.4.11): a 2 px ring in the theme's focus colour,
 * 2 px outside the control, so it shows on any background. Web only (native platforms draw their own).
 */
export function focusRing(t: ThemeColors, focused: boolean | undefined): ViewStyle | null {
  if (Platform.OS !== 'web' || !focused) return null;
  return { outlineColor: t.focus, outlineStyle: 'solid', outlineWidth: 2, outlineOffset: 2 } as ViewStyle;
}
