import { Platform } from 'react-native';
import { FontDisplay, useFonts } from 'expo-font';
import { SourceSans3_400Regular } from '@expo-google-fonts/source-sans-3/400Regular';
import { SourceSans3_600SemiBold } from '@expo-google-fonts/source-sans-3/600SemiBold';

/**
 * Source Sans 3 in two weights. On the web the first screen does not wait for the font
 * files (about 380 KB each, on a phone with poor signal): text shows in the fallback
 * font and swaps when they arrive. Native apps wait, as usual.
 */
export function useAppFonts(): boolean {
  const [loaded, error] = useFonts({
    SourceSans3_400Regular: { uri: SourceSans3_400Regular, display: FontDisplay.SWAP },
    SourceSans3_600SemiBold: { uri: SourceSans3_600SemiBold, display: FontDisplay.SWAP },
  });
  return Platform.OS === 'web' || loaded || !!error;
}
