import { z } from 'zod';

/** GET /api/refrigerants: what the trade needs to know about each refrigerant Tandem computes. */
export interface RefrigerantSummary {
  /** Trade spelling, e.g. "R-410A". */
  id: string;
  kind: string;
  /** ANSI/ASHRAE Standard 34 safety group (A1, A2L…). */
  safetyClass: string;
  /** 100-year GWP, IPCC AR4 basis. */
  gwp: number;
  oil: 'mineral' | 'poe';
  zeotropic: boolean;
  /** Dew minus bubble point at the reference dew point below, °F (0 for a pure refrigerant). */
  glideF: number;
  /** The saturated temperature the glide is quoted at, °F (a typical evaporator). */
  glideAtDewF: number;
  /** Temperatures the saturation functions answer for, °F, and the critical point. */
  validRange: { minF: number; maxF: number; criticalF: number; criticalPsia: number };
}

export interface RefrigerantsResponse {
  items: RefrigerantSummary[];
}

/** GET /api/refrigerants/:id/saturation answers (contract, DESIGN.md §5). */
export type SaturationAtPressure = { refrigerant: string; psig: number; bubbleF: number; dewF: number };
export type SaturationAtTemperature = { refrigerant: string; tempF: number; bubblePsig: number; dewPsig: number };

/** The :id path segment: any spelling the trade uses ("R-410A", "R410A", "410a"). */
export const RefrigerantParamSchema = z.object({ id: z.string().trim().min(1).max(40) });
