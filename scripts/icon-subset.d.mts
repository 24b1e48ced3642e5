export const ROOT: string;
export const FULL_GLYPH_MAP: string;
export const SUBSET_GLYPH_MAP: string;
export const ICON_SOURCES: string[];
export function usedIconNames(glyphMap: Record<string, number>, root?: string): string[];
export function readGlyphMap(file: string, root?: string): Record<string, number>;
export function writeIconSubset(root?: string): number;
