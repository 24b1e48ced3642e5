import { FontDisplay, loadAsync } from 'expo-font';
import { useState } from 'react';
import { FONT_FILES } from '@/constants/theme';

/**
 * Web: the first screen does not wait for the text faces. Their @font-face rules go in on the first render
 * with `font-display: block`, so text set in Inter stays invisible (never in a fallback face) until its file
 * lands, and scripts/service-worker.mjs preloads the files from index.html so they arrive while the bundle
 * runs. Waiting here instead cost a spinner render, a font round trip and a second full render.
 */
export function useTextFonts(): boolean {
  useState(declareTextFonts);
  return true;
}

function declareTextFonts(): true {
  const faces = Object.fromEntries(Object.entries(FONT_FILES).map(([name, uri]) => [name, { uri, display: FontDisplay.BLOCK }]));
  // A failed load leaves the browser's fallback face after the block period: the app still works.
  loadAsync(faces).catch(() => undefined);
  return true;
}
