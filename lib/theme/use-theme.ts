import { useColorScheme, useWindowDimensions } from 'react-native';
import { Colors, WIDE_BREAKPOINT, type ThemeColors } from './index';

export function useTheme(): ThemeColors {
  return useColorScheme() === 'dark' ? Colors.dark : Colors.light;
}

/** True on tablets and desktop browsers, where screens lay out in two columns. */
export function useIsWide(): boolean {
  return useWindowDimensions().width >= WIDE_BREAKPOINT;
}
