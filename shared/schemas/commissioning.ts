import { z } from 'zod';
import { refrigerant } from './fields';

/**
 * Start-up readings (DESIGN.md §4, §5 contract): POST /api/commissioning/evaluate and the
 * pressure–temperature lookups. The same schemas validate the server's input and the Readings form.
 */

export const METERING_TYPES_FOR_READINGS = ['txv', 'eev', 'piston'] as const;
export const OPERATING_MODES = ['cooling', 'heating'] as const;
export const READING_VERDICTS = ['on-target', 'off-target', 'not-evaluated'] as const;

/** Gauge pressure in psig; the lower bound is a hard vacuum at sea level (the solver checks absolute). */
const psig = z.number({ error: 'enter the pressure in psig' }).min(-14.7, { error: 'below zero absolute' }).max(1000);
const lineTempF = z.number({ error: 'enter the temperature in °F' }).min(-60).max(250);

export const CommissioningEvaluateSchema = z
  .object({
    refrigerant,
    meteringType: z.enum(METERING_TYPES_FOR_READINGS, { error: 'metering type must be txv, eev or piston' }),
    suctionPsig: psig,
    suctionLineF: lineTempF,
    liquidPsig: psig,
    liquidLineF: lineTempF,
    indoorWbF: z.number().min(20).max(100).optional(),
    indoorDbF: z.number().min(20).max(130).optional(),
    indoorRhPct: z.number().min(1).max(100).optional(),
    outdoorDbF: z.number({ error: 'enter the outdoor dry bulb in °F' }).min(-40).max(140),
    targetSubcoolingF: z.number().min(0).max(30).optional(),
    mode: z.enum(OPERATING_MODES).optional(),
    altitudeFt: z.number().min(-1500).max(15000).optional(),
  })
  .strict();
export type CommissioningEvaluateInput = z.infer<typeof CommissioningEvaluateSchema>;

/** The answer of POST /api/commissioning/evaluate (contract); extra fields may follow in `details`. */
export interface CommissioningEvaluateResult {
  superheatF: number;
  subcoolingF: number;
  suctionSatF: number;
  liquidSatF: number;
  targetSuperheatF?: number;
  targetSubcoolingF?: number;
  verdict: (typeof READING_VERDICTS)[number];
  /** One plain sentence: what to do next, with the numbers that led there. */
  advice: string;
  /** Indoor wet bulb in °F the fixed-orifice target used, and whether it was measured or computed from humidity. */
  indoorWbF?: number;
  wetBulbSource?: 'measured' | 'from-humidity';
  /** The shop's ± tolerance in °F the verdict used, and how far the judged reading is from its target (reading − target). */
  toleranceF?: number;
  marginF?: number;
  /** Short plain reasons behind the verdict (for records and tests). */
  reasons?: string[];
  /** Safety cautions for the work the advice leads to (certified technicians, A2L handling). */
  cautions?: string[];
}

/** GET /api/refrigerants/:id/saturation query: exactly one of psig or tempF. */
export const SaturationQuerySchema = z
  .object({
    psig: z.coerce.number().min(-14.7).max(1000).optional(),
    tempF: z.coerce.number().optional(),
    altitudeFt: z.coerce.number().min(-1500).max(15000).optional(),
  })
  .refine((q) => (q.psig === undefined) !== (q.tempF === undefined), { error: 'give either psig or tempF', path: ['psig'] });
export type SaturationQuery = z.infer<typeof SaturationQuerySchema>;
