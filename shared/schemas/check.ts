import { z } from 'zod';
import { AirHandlerSpecSchema, IndoorCoilSpecSchema, MeteringDeviceSpecSchema, OutdoorUnitSpecSchema } from './equipment';
import { isoDate, numberIn, refrigerant, tubeOdIn } from './fields';

/** The body of POST /api/checks (DESIGN.md §5, contract). */

export const SCOPES = ['new-system', 'component-replacement'] as const;
export const INDOOR_LOCATIONS = ['attic', 'above-ceiling', 'closet', 'utility-room', 'basement', 'garage', 'crawlspace'] as const;
export const AIRFLOW_DIRECTIONS = ['upflow', 'downflow', 'horizontal-left', 'horizontal-right'] as const;
export const FILTER_DRIERS = ['bi-flow', 'one-way', 'none'] as const;
export const WIRE_AWG = [14, 12, 10, 8, 6, 4, 3, 2, 1, '1/0', '2/0', '3/0', '4/0'] as const;
export const WIRE_MATERIALS = ['copper', 'aluminum'] as const;
export const TERMINAL_RATINGS_C = [60, 75, 90] as const;

/** A part is a catalog id or a spec typed from a nameplate; `kept` marks a part staying from the old system. */
export function partRef<T extends z.ZodType>(spec: T) {
  return z.union([
    z.object({ id: z.number().int().positive(), kept: z.boolean().optional() }).strict(),
    z.object({ spec, kept: z.boolean().optional() }).strict(),
  ]);
}

export const SiteSchema = z.object({
  state: z.string().trim().toUpperCase().regex(/^[A-Z]{2}$/, { error: 'state must be a two-letter code' }),
  indoorLocation: z.enum(INDOOR_LOCATIONS).optional(),
  airflowDirection: z.enum(AIRFLOW_DIRECTIONS).optional(),
  conditionedAreaSqFt: z.number().positive().max(100000).optional(),
  hasFloatSwitch: z.boolean().optional(),
  hasSecondaryPan: z.boolean().optional(),
});

export const ControlsSchema = z.object({
  thermostatHeatPump: z.boolean().optional(),
  auxHeatStages: z.number().int().min(0).max(4).optional(),
});

export const LineSetSchema = z.object({
  liquidOdIn: tubeOdIn,
  suctionOdIn: tubeOdIn,
  lengthFt: numberIn(1, 500),
  liftFt: numberIn(-300, 300).optional(),
  reused: z.boolean().optional(),
  previousRefrigerant: refrigerant.optional(),
  burnoutHistory: z.boolean().optional(),
  indoorFlareJoints: z.boolean().optional(),
  filterDrier: z.enum(FILTER_DRIERS).optional(),
});

export const ElectricalSchema = z.object({
  breakerAmps: z.number().positive().max(1000),
  wireAwg: z.literal(WIRE_AWG, { error: `wireAwg must be one of ${WIRE_AWG.join(', ')}` }),
  wireMaterial: z.enum(WIRE_MATERIALS),
  terminalRatingC: z.union([z.literal(60), z.literal(75), z.literal(90)]).optional(),
  supplyVoltage: z.number().int().min(100).max(600).optional(),
  supplyPhase: z.union([z.literal(1), z.literal(3)]).optional(),
});

export const CheckRequestSchema = z.object({
  scope: z.enum(SCOPES),
  installDate: isoDate.optional(),
  site: SiteSchema.optional(),
  outdoor: partRef(OutdoorUnitSpecSchema),
  indoorCoil: partRef(IndoorCoilSpecSchema).optional(),
  airHandler: partRef(AirHandlerSpecSchema).optional(),
  metering: partRef(MeteringDeviceSpecSchema).optional(),
  controls: ControlsSchema.optional(),
  lineSet: LineSetSchema.optional(),
  electrical: ElectricalSchema.optional(),
  indoorElectrical: ElectricalSchema.optional(),
});
export type CheckRequest = z.infer<typeof CheckRequestSchema>;
export type LineSet = z.infer<typeof LineSetSchema>;
export type Electrical = z.infer<typeof ElectricalSchema>;
export type Site = z.infer<typeof SiteSchema>;
export type Controls = z.infer<typeof ControlsSchema>;
export type WireAwg = (typeof WIRE_AWG)[number];
