export function fontPreloadTags(outDir: string): string[];
export function linkManifest(outDir: string): void;
export function writeServiceWorker(outDir: string): Promise<{ count: number; size: number }>;
export function finishWebExport(outDir: string): Promise<void>;
