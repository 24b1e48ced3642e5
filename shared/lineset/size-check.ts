import { formatLineSize, lineSizeIndex, lineSizeSteps } from './tube-sizes';

export interface LineSizeCheck {
  /** 0 when the OD is allowed; else the standard sizes between it and the nearest allowed size. */
  steps: number;
  /** The allowed size nearest the installed one, in. */
  nearestAllowedIn: number;
  /** True when the installed OD is not a standard tube size at all. */
  nonStandard: boolean;
}

/** Compares an installed line OD (in) with the allowed ODs (in) in standard-size steps. */
export function checkLineSize(installedOdIn: number, allowedOdIn: readonly number[]): LineSizeCheck {
  let steps = Infinity;
  let nearest = allowedOdIn[0];
  for (const allowed of allowedOdIn) {
    const s = lineSizeSteps(installedOdIn, allowed);
    if (s < steps) {
      steps = s;
      nearest = allowed;
    }
  }
  const nonStandard = lineSizeIndex(installedOdIn) < 0;
  return { steps: nonStandard ? Math.max(steps, 1) : steps, nearestAllowedIn: nearest, nonStandard };
}

/** "3/8 in" or "3/8 or 1/2 in" for a list of ODs (in). */
export function formatLineSizes(odIn: readonly number[]): string {
  return `${odIn.map(formatLineSize).join(' or ')} in`;
}
