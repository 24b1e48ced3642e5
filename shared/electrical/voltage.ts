// Source: usual utilization tolerance of ±10 % around the nameplate rating (AHRI 210/240 test
// voltages; a "208/230" unit runs 187–253 V) — common practice as printed on nameplates.

export interface VoltageRange {
  ratedLowV: number;
  ratedHighV: number;
  /** Lowest supply voltage allowed, volts (10 % under the low rating, rounded to a volt). */
  minV: number;
  /** Highest supply voltage allowed, volts (10 % over the high rating, rounded to a volt). */
  maxV: number;
}

export const VOLTAGE_TOLERANCE = 0.1;

/** Parses a nameplate voltage ("230", "208/230", 230) into its utilization range in volts; undefined if unreadable. */
export function nameplateVoltageRange(nameplate: string | number | undefined): VoltageRange | undefined {
  if (nameplate === undefined) return undefined;
  const parts = String(nameplate).split('/').map((p) => Number(p.trim()));
  if (parts.length === 0 || parts.some((n) => !Number.isFinite(n) || n <= 0)) return undefined;
  const ratedLowV = Math.min(...parts);
  const ratedHighV = Math.max(...parts);
  return {
    ratedLowV,
    ratedHighV,
    minV: Math.round(ratedLowV * (1 - VOLTAGE_TOLERANCE)),
    maxV: Math.round(ratedHighV * (1 + VOLTAGE_TOLERANCE)),
  };
}

/** Resistive heater output in kW at a supply voltage: kW × (V / rated V)². */
export function heaterOutputKw(ratedKw: number, supplyV: number, ratedV: number): number {
  return ratedKw * (supplyV / ratedV) ** 2;
}

/**
 * Voltage a resistance heat kit's kW is rated at when the kit does not say: 240 V, the usual rating
 * printed for residential strip heaters (common practice, no source).
 */
export const DEFAULT_HEAT_KIT_RATED_V = 240;
