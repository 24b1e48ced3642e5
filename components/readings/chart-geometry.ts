import { bubblePressurePsig, dewPressurePsig, saturationRange } from '@/shared/refrigerants';

/** One reading on the chart: where the gauge's saturation point sits and where the line actually is. */
export interface ChartReading {
  kind: 'suction' | 'liquid';
  psig: number;
  satF: number;
  lineF?: number;
}

export interface ChartModel {
  /** Plot area in px (axes drawn outside it by the component). */
  plot: { left: number; top: number; width: number; height: number };
  bubblePath: string;
  dewPath: string;
  xTicks: { value: number; x: number }[];
  yTicks: { value: number; y: number }[];
  marks: { kind: ChartReading['kind']; sat: { x: number; y: number }; line?: { x: number; y: number } }[];
}

const STEP_F = 2.5;

/** Tick spacing for a span: 10, 20, 50, 100 … so about `count` ticks show. */
function tickStep(span: number, count: number): number {
  const raw = span / count;
  const pow = 10 ** Math.floor(Math.log10(raw));
  const nice = [1, 2, 5, 10].find((m) => m * pow >= raw) ?? 10;
  return nice * pow;
}

/**
 * The saturation curve (bubble and dew, psig against °F) drawn for a box of `widthPx` × `heightPx`,
 * from 0 to 140 °F (widened to show any reading), with the readings placed on it.
 */
export function chartModel(
  refrigerant: string,
  altitudeFt: number,
  readings: ChartReading[],
  widthPx: number,
  heightPx: number,
): ChartModel {
  const range = saturationRange(refrigerant);
  const seen = readings.flatMap((r) => [r.satF, r.lineF ?? r.satF]);
  const minF = Math.max(range.minF, Math.floor(Math.min(0, ...seen) / 10) * 10);
  const maxF = Math.min(range.maxF, Math.ceil(Math.max(140, ...seen) / 10) * 10);
  const temps: number[] = [];
  for (let t = minF; t < maxF; t += STEP_F) temps.push(t);
  temps.push(maxF);
  const bubble = temps.map((t) => bubblePressurePsig(t, refrigerant, altitudeFt));
  const dew = temps.map((t) => dewPressurePsig(t, refrigerant, altitudeFt));
  const yStep = tickStep(Math.max(...bubble, ...readings.map((r) => r.psig)), 6);
  const maxPsig = Math.ceil(Math.max(...bubble, ...readings.map((r) => r.psig)) / yStep) * yStep;
  const minPsig = Math.min(0, Math.floor(Math.min(...dew) / yStep) * yStep);

  const plot = { left: 48, top: 24, width: Math.max(40, widthPx - 60), height: Math.max(40, heightPx - 56) };
  const x = (f: number) => plot.left + ((f - minF) / (maxF - minF)) * plot.width;
  const y = (p: number) => plot.top + plot.height - ((p - minPsig) / (maxPsig - minPsig)) * plot.height;
  const path = (ps: number[]) => ps.map((p, i) => `${i ? 'L' : 'M'}${x(temps[i]).toFixed(1)},${y(p).toFixed(1)}`).join(' ');

  const xStep = tickStep(maxF - minF, 7);
  const xTicks: ChartModel['xTicks'] = [];
  for (let f = Math.ceil(minF / xStep) * xStep; f <= maxF; f += xStep) xTicks.push({ value: f, x: x(f) });
  const yTicks: ChartModel['yTicks'] = [];
  for (let p = minPsig; p <= maxPsig; p += yStep) yTicks.push({ value: p, y: y(p) });

  const clampF = (f: number) => Math.min(maxF, Math.max(minF, f));
  return {
    plot,
    bubblePath: path(bubble),
    dewPath: path(dew),
    xTicks,
    yTicks,
    marks: readings.map((r) => ({
      kind: r.kind,
      sat: { x: x(clampF(r.satF)), y: y(r.psig) },
      line: r.lineF === undefined ? undefined : { x: x(clampF(r.lineF)), y: y(r.psig) },
    })),
  };
}
