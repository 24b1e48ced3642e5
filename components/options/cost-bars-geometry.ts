/** One bar of the annual-cost chart: an option (or the existing system) and its yearly cost. */
export interface CostBar {
  key: string;
  label: string;
  /** Yearly energy cost in cents; null when it cannot be worked out (shown as "not worked out"). */
  valueCents: number | null;
}

export interface CostBarsModel {
  widthPx: number;
  heightPx: number;
  /** Left edge and width of the bar area (the value text sits inside or just past a bar's end). */
  plot: { left: number; width: number };
  bars: { key: string; label: string; valueCents: number | null; labelY: number; barY: number; barWidth: number; barHeight: number }[];
  ticks: { cents: number; x: number }[];
}

/** Row layout in px: a label line above each bar. */
export const BAR_LAYOUT = { labelPx: 20, barPx: 22, gapPx: 14, axisPx: 22, sidePx: 8 } as const;

/** A "nice" tick step (1, 2 or 5 × a power of ten) giving about `count` ticks over `span`. */
export function niceStep(span: number, count: number): number {
  if (!(span > 0) || !(count > 0)) return 1;
  const raw = span / count;
  const pow = 10 ** Math.floor(Math.log10(raw));
  const nice = [1, 2, 5, 10].find((m) => m * pow >= raw) ?? 10;
  return nice * pow;
}

/**
 * Horizontal bars, one row per entry, scaled from zero to a rounded-up maximum so the lengths compare
 * truly (a bar chart that starts above zero exaggerates differences). Whole dollars on the axis.
 */
export function costBarsModel(entries: CostBar[], widthPx: number): CostBarsModel {
  const { labelPx, barPx, gapPx, axisPx, sidePx } = BAR_LAYOUT;
  const known = entries.map((e) => e.valueCents).filter((v): v is number => v !== null && Number.isFinite(v) && v >= 0);
  const maxDollars = known.length ? Math.max(...known) / 100 : 0;
  const stepDollars = niceStep(maxDollars || 1, 4);
  const topDollars = Math.max(stepDollars, Math.ceil(maxDollars / stepDollars) * stepDollars);
  const plot = { left: sidePx, width: Math.max(40, widthPx - 2 * sidePx) };
  const rowPx = labelPx + barPx + gapPx;
  const bars = entries.map((e, i) => {
    const top = i * rowPx;
    const value = e.valueCents !== null && Number.isFinite(e.valueCents) && e.valueCents >= 0 ? e.valueCents : null;
    return {
      key: e.key,
      label: e.label,
      valueCents: value,
      labelY: top + labelPx - 5,
      barY: top + labelPx,
      barWidth: value === null ? 0 : (value / 100 / topDollars) * plot.width,
      barHeight: barPx,
    };
  });
  const ticks: CostBarsModel['ticks'] = [];
  for (let d = 0; d <= topDollars + 1e-9; d += stepDollars) ticks.push({ cents: Math.round(d * 100), x: plot.left + (d / topDollars) * plot.width });
  return { widthPx, heightPx: entries.length * rowPx + axisPx, plot, bars, ticks };
}
