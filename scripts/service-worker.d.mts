export const FIRST_SCREEN_FACES: string[];
export function fontPreloadTags(outDir: string, faces?: string[]): string[];
export function textFontFamilies(themeSource?: string): [family: string, stem: string][];
export function fontFaceStyle(outDir: string, families?: [family: string, stem: string][]): string[];
export function linkManifest(outDir: string, families?: [family: string, stem: string][]): void;
export function writeServiceWorker(outDir: string): Promise<{ count: number; size: number }>;
export function finishWebExport(outDir: string): Promise<void>;
