// Estimating an existing system's SEER2/HSPF2 from its age when the nameplate figures are unknown: we assume it
// met the federal minimum of the year it was installed (10 CFR 430.32(c) history: 10 SEER / 6.8 HSPF from 1992,
// 13 SEER / 7.7 HSPF from 2006, 14 SEER / 8.2 HSPF for heat pumps from 2015 — from memory), with no allowance for wear,
// and 8 SEER / 6 HSPF before 1992 (from memory). SEER → SEER2 and HSPF → HSPF2 use the ratio of the 2023 heat-pump
// minimums to their SEER/HSPF equivalents, 14.3 / 15 and 7.5 / 8.8 (from memory).

export const SEER2_PER_SEER = 14.3 / 15;
export const HSPF2_PER_HSPF = 7.5 / 8.8;

export interface ExistingEfficiency {
  seer2: number;
  hspf2: number;
  installYear: number;
  assumption: string;
}

function minimumsForYear(year: number, heatPump: boolean): { seer: number; hspf: number } {
  if (year < 1992) return { seer: 8, hspf: 6 };
  if (year < 2006) return { seer: 10, hspf: 6.8 };
  if (year < 2015 || !heatPump) return { seer: 13, hspf: 7.7 };
  return { seer: 14, hspf: 8.2 };
}

/** SEER2 and HSPF2 (two decimals) of a system installed `ageYears` before `asOfYear`, with the assumption in words. */
export function estimateExistingEfficiency(ageYears: number, asOfYear: number, heatPump: boolean): ExistingEfficiency {
  const installYear = Math.round(asOfYear - ageYears);
  const { seer, hspf } = minimumsForYear(installYear, heatPump);
  const seer2 = Math.round(seer * SEER2_PER_SEER * 100) / 100;
  const hspf2 = Math.round(hspf * HSPF2_PER_HSPF * 100) / 100;
  return {
    seer2,
    hspf2,
    installYear,
    assumption:
      `Existing efficiency estimated from its age (${ageYears} years, installed about ${installYear}): assumed to meet that year's federal minimum, ` +
      `${seer} SEER${heatPump ? ` / ${hspf} HSPF` : ''}, converted to ${seer2} SEER2${heatPump ? ` / ${hspf2} HSPF2` : ''}, with no allowance for wear. Enter the nameplate figures if known.`,
  };
}
