import Fuse from 'fuse.js';

type Row = Record<string, unknown> & { id: number };

/** Above this many candidates, fuse.js is too slow for a keystroke; a cheap rank orders them instead. */
const FUSE_MAX_CANDIDATES = 1500;
/** Candidates taken from the trigram pre-filter when no row holds the query literally (a typo). */
const FUZZY_CANDIDATES = 400;

const squash = (s: string) => s.toLowerCase().replace(/[\s\-./]/g, '');

/**
 * Search over one kind's rows: fuse.js ranks the matches, but only over a short candidate list, since
 * fuzzy-scoring 50,000 rows per keystroke takes half a second. Candidates are the rows that hold every
 * query word literally (model punctuation ignored), or, for a typo, the rows sharing most trigrams with it.
 */
export class CatalogSearch {
  private readonly haystacks: string[];
  private readonly models: string[];
  private readonly trigrams = new Map<string, number[]>();

  constructor(
    private readonly rows: Row[],
    private readonly keys: { name: string; weight: number }[],
  ) {
    this.models = rows.map((r) => squash(String(r[keys[0].name] ?? '')));
    this.haystacks = rows.map((r) => keys.map((k) => String(r[k.name] ?? '')).join(' ').toLowerCase());
    rows.forEach((_, i) => {
      const grams = new Set(trigramsOf(`${this.models[i]} ${this.haystacks[i]}`));
      for (const g of grams) {
        const list = this.trigrams.get(g);
        if (list) list.push(i);
        else this.trigrams.set(g, [i]);
      }
    });
  }

  /** Rows matching q, best first. */
  search(q: string): Row[] {
    const words = q.toLowerCase().split(/\s+/).filter(Boolean);
    const squashed = words.map(squash);
    const literal: number[] = [];
    for (let i = 0; i < this.rows.length; i++) {
      const hay = this.haystacks[i];
      const model = this.models[i];
      let all = true;
      for (let w = 0; w < words.length && all; w++) all = hay.includes(words[w]) || model.includes(squashed[w]);
      if (all) literal.push(i);
    }
    if (literal.length > FUSE_MAX_CANDIDATES) return this.cheapRank(literal, squash(q));
    const candidates = literal.length > 0 ? literal : this.fuzzyCandidates(q);
    const subset = candidates.map((i) => this.rows[i]);
    const fuse = new Fuse(subset, { keys: this.keys, threshold: 0.4, ignoreLocation: true });
    const ranked = fuse.search(q).map((r) => r.item);
    if (literal.length === 0) return ranked;
    // Rows that hold the query literally are matches even where fuse's score falls short of its threshold.
    const seen = new Set(ranked.map((r) => r.id));
    return [...ranked, ...this.cheapRank(literal, squash(q)).filter((r) => !seen.has(r.id))];
  }

  private cheapRank(indexes: number[], q: string): Row[] {
    // Three buckets in row order: model starts with the query, model holds it, anything else.
    const buckets: Row[][] = [[], [], []];
    for (const i of indexes) buckets[this.models[i].startsWith(q) ? 0 : this.models[i].includes(q) ? 1 : 2].push(this.rows[i]);
    return buckets.flat();
  }

  private fuzzyCandidates(q: string): number[] {
    const scores = new Uint16Array(this.rows.length);
    for (const g of new Set(trigramsOf(`${squash(q)} ${q.toLowerCase()}`))) for (const i of this.trigrams.get(g) ?? []) scores[i]++;
    // Highest shared-trigram counts first, by counting sort over the scores (no sort of 50k rows).
    let max = 0;
    for (const v of scores) if (v > max) max = v;
    const byScore: number[][] = Array.from({ length: max + 1 }, () => []);
    for (let i = 0; i < scores.length; i++) if (scores[i] > 0) byScore[scores[i]].push(i);
    const out: number[] = [];
    for (let v = max; v > 0 && out.length < FUZZY_CANDIDATES; v--) out.push(...byScore[v].slice(0, FUZZY_CANDIDATES - out.length));
    return out;
  }
}

function trigramsOf(text: string): string[] {
  const out: string[] = [];
  for (const word of text.split(/\s+/)) for (let i = 0; i + 3 <= word.length; i++) out.push(word.slice(i, i + 3));
  return out;
}
