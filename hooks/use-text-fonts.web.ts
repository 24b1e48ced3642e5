/**
 * Web: nothing to wait for and nothing to declare. The web export's index.html declares the Inter text faces
 * as CSS `@font-face` rules with `font-display: block` and preloads their files (scripts/service-worker.mjs,
 * fontFaceStyle and fontPreloadTags), so text set in Inter stays invisible (never in a fallback face) until
 * its file lands, and the files arrive while the bundle runs. Declaring them here instead (FontFace API +
 * expo-asset) cost ~200 ms of a throttled first render; expo-font's loadAsync also ran a FontFaceObserver
 * per face on the main thread. The icon font still loads through expo-font. The native fork waits (useFonts).
 */
export function useTextFonts(): boolean {
  return true;
}
