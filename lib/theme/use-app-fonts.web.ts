/**
 * On the web the fonts are not loaded by the app: the build (scripts/web-fonts.js) puts a
 * preload and the @font-face rules in every page, so the first screen never waits for them
 * and text shows in the fallback font until they arrive.
 */
export function useAppFonts(): boolean {
  return true;
}
