/**
 * A fontkit font shared by every report, with its text shaping remembered across documents.
 *
 * pdfkit keeps a layout cache per document, so each report shaped every word again through fontkit's
 * OpenType lookups (about half of a render's CPU). Shaping depends only on the text and features, so
 * the result is kept per process. pdfkit scales the positions of a run in place, so each caller gets
 * fresh position objects; the glyphs are fontkit's own shared objects and are never changed.
 */

interface Position {
  xAdvance: number;
  yAdvance: number;
  xOffset: number;
  yOffset: number;
  [key: string]: number;
}

interface Run {
  glyphs: unknown[];
  positions: Position[];
  script?: unknown;
  language?: unknown;
  direction?: unknown;
  features?: unknown;
}

interface Subset {
  glyphs: number[];
  encode(): Uint8Array;
}

interface LayoutFont {
  layout(text: string, features?: unknown): Run;
  createSubset(): Subset;
}

/** Distinct texts kept per font before the cache starts over (words and short labels: a few MB at most). */
const MAX_CACHED_RUNS = 20_000;
/** Embedded subsets kept per font (each ~20–60 kB), keyed by the glyphs in the order the document used them. */
const MAX_CACHED_SUBSETS = 64;

/** A run pdfkit may change freely: copied positions, and advanceWidth summed from them as fontkit's GlyphRun does. */
function freshRun(run: Run): Run & { advanceWidth: number } {
  const positions = run.positions.map((p) => ({ ...p }));
  return {
    glyphs: run.glyphs,
    positions,
    script: run.script,
    language: run.language,
    direction: run.direction,
    features: run.features,
    get advanceWidth() {
      let width = 0;
      for (const p of positions) width += p.xAdvance;
      return width;
    },
  };
}

/**
 * Wraps a fontkit font so `layout` answers from a per-process cache, and so does the encoding of the
 * subset a document embeds (the same glyphs in the same order give the same bytes: a report rendered
 * again, or another with the same words, skips re-encoding the font). Every other member is the font's own.
 */
export function withSharedLayout<F extends object>(font: F): F {
  const target = font as unknown as LayoutFont;
  const cache = new Map<string, Run>();
  const layout = (text: string, features?: unknown) => {
    const key = features === undefined ? text : `${text}\u0000${JSON.stringify(features)}`;
    let run = cache.get(key);
    if (!run) {
      if (cache.size >= MAX_CACHED_RUNS) cache.clear();
      const shaped = target.layout(text, features);
      run = { ...shaped, positions: shaped.positions.map((p) => ({ ...p })), glyphs: shaped.glyphs };
      cache.set(key, run);
    }
    return freshRun(run);
  };
  const subsets = new Map<string, Uint8Array>();
  const createSubset = () => {
    const subset = target.createSubset();
    const encode = subset.encode.bind(subset);
    subset.encode = () => {
      const key = subset.glyphs.join(',');
      let bytes = subsets.get(key);
      if (!bytes) {
        if (subsets.size >= MAX_CACHED_SUBSETS) subsets.clear();
        bytes = encode();
        subsets.set(key, bytes);
      }
      return bytes;
    };
    return subset;
  };
  return new Proxy(font, {
    get(obj, prop) {
      if (prop === 'layout') return layout;
      if (prop === 'createSubset') return createSubset;
      const value = Reflect.get(obj, prop, obj) as unknown;
      return typeof value === 'function' ? (value as (...a: unknown[]) => unknown).bind(obj) : value;
    },
  });
}
