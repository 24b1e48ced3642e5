// expo-asset comes with `expo` (its dependency; expo-font resolves font modules through it the same way).
import { Asset } from 'expo-asset';
import { useState } from 'react';
import { FONT_FILES } from '@/constants/theme';

/**
 * Web: the first screen does not wait for the text faces. They are declared on the first render with
 * `font-display: block`, so text set in Inter stays invisible (never in a fallback face) until its file
 * lands, and scripts/service-worker.mjs preloads the files from index.html so they arrive while the bundle
 * runs. Waiting here instead cost a spinner render, a font round trip and a second full render.
 * Declared through the browser's FontFace API, not expo-font's loadAsync: that one also starts a
 * FontFaceObserver per face, whose checks ran on the main thread during the first render (seen in a
 * throttled profile); the app never awaited its promise. The icon font still loads through expo-font.
 */
export function useTextFonts(): boolean {
  useState(declareTextFonts);
  return true;
}

function declareTextFonts(): true {
  if (typeof document === 'undefined' || typeof FontFace === 'undefined') return true;
  for (const [name, source] of Object.entries(FONT_FILES)) {
    const face = new FontFace(name, `url(${JSON.stringify(Asset.fromModule(source).uri)})`, { display: 'block' });
    (document.fonts as unknown as { add(face: FontFace): void }).add(face);
    // A failed load leaves the browser's fallback face after the block period: the app still works.
    face.load().catch(() => undefined);
  }
  return true;
}
