import { useColorScheme, useWindowDimensions } from 'react-native';
import { useHydrated } from '../hooks/use-hydrated';
import { Colors, WIDE_BREAKPOINT, type ThemeColors } from './index';

/**
 * The colours of the device's scheme. While a static page hydrates, the light colours it was
 * rendered with (React keeps the page's styles as they are when it hydrates), then the device's:
 * without that a dark-scheme device kept light backgrounds under dark-scheme text.
 */
export function useTheme(): ThemeColors {
  const scheme = useColorScheme();
  return useHydrated() && scheme === 'dark' ? Colors.dark : Colors.light;
}

/** True on tablets and desktop browsers, where screens lay out in two columns (after hydration, as above). */
export function useIsWide(): boolean {
  const width = useWindowDimensions().width;
  return useHydrated() && width >= WIDE_BREAKPOINT;
}
