import { useFonts } from 'expo-font';
import { SourceSans3_400Regular } from '@expo-google-fonts/source-sans-3/400Regular';
import { SourceSans3_600SemiBold } from '@expo-google-fonts/source-sans-3/600SemiBold';
import { faces } from './fonts.json';

/** The font files by family (lib/theme/fonts.json names them); Metro needs the imports written out. */
const FILES: Record<string, number> = { SourceSans3_400Regular, SourceSans3_600SemiBold };

/** The typeface's weights, loaded before the first screen (native apps; the web has use-app-fonts.web.ts). */
export function useAppFonts(): boolean {
  const [loaded, error] = useFonts(Object.fromEntries(faces.map((f) => [f.family, FILES[f.family]])));
  return loaded || !!error;
}
