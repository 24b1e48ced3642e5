/** One line of bench/results.json (DESIGN.md §8). A ratio is always against a baseline measured in the same run. */
export interface Measure {
  id: string;
  value: number;
  unit: string;
  baseline?: number;
  ratio?: number;
  note?: string;
}

/** A benchmark module: bench/<name>.bench.ts exports `run` returning its measures. */
export type BenchRun = () => Promise<Measure[]>;

/** p-th percentile (0–100) of a list of numbers, nearest-rank. */
export function percentile(values: number[], p: number): number {
  if (values.length === 0) return NaN;
  const sorted = [...values].sort((a, b) => a - b);
  const rank = Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1));
  return sorted[rank];
}

export const round = (value: number, digits = 2) => Math.round(value * 10 ** digits) / 10 ** digits;
