import { z } from 'zod';
import { AirHandlerSpecSchema, IndoorCoilSpecSchema, MeteringDeviceSpecSchema, OutdoorUnitSpecSchema } from './equipment';
import { blankToUndefined, isoDate, normalizeRefrigerantName, REFRIGERANT_IDS } from './fields';

/** The body of POST /api/checks (DESIGN.md §5, contract). */

export const SCOPES = ['new-system', 'component-replacement'] as const;
export const INDOOR_LOCATIONS = ['attic', 'above-ceiling', 'closet', 'utility-room', 'basement', 'garage', 'crawlspace'] as const;
export const AIRFLOW_DIRECTIONS = ['upflow', 'downflow', 'horizontal-left', 'horizontal-right'] as const;
export const FILTER_DRIERS = ['bi-flow', 'one-way', 'none'] as const;
export const WIRE_AWG = [14, 12, 10, 8, 6, 4, 3, 2, 1, '1/0', '2/0', '3/0', '4/0'] as const;
export const WIRE_MATERIALS = ['copper', 'aluminum'] as const;
export const TERMINAL_RATINGS_C = [60, 75, 90] as const;
export const CONDUCTOR_TYPES = ['nm-b', 'uf-b', 'thhn-conduit', 'se'] as const;
export const OVERCURRENT_TYPES = ['breaker', 'hacr-breaker', 'fuse'] as const;

/** A part is a catalog id or a spec typed from a nameplate; `kept` marks a part staying from the old system. */
export function partRef<T extends z.ZodType>(spec: T) {
  return z.union([
    z.object({ id: z.number().int().positive(), kept: z.boolean().optional() }).strict(),
    z.object({ spec, kept: z.boolean().optional() }).strict(),
  ]);
}

/** A number in [min, max] (JSON number or its text) with a plain-words message naming the field and unit. */
function amount(what: string, min: number, max: number, unit: string) {
  const message = `${what} must be a number from ${min} to ${max}${unit ? ` ${unit}` : ''}`;
  return z.preprocess(
    (v) => {
      const b = blankToUndefined(v);
      if (typeof b !== 'string') return b;
      const n = Number(b.trim().replace(/,/g, ''));
      return Number.isFinite(n) ? n : b;
    },
    z.number({ error: message }).min(min, { error: message }).max(max, { error: message }),
  );
}

/** An enum whose message lists the choices in words ("Choose copper or aluminum"). */
function choice<const T extends readonly [string, ...string[]]>(values: T, message: string) {
  return z.enum(values, { error: message });
}

const spoken = (values: readonly (string | number)[]) => `${values.slice(0, -1).join(', ')} or ${values[values.length - 1]}`;

export const SiteSchema = z.object({
  // Optional: only the efficiency rules need it, and they say so in coverage when it is missing.
  state: z.string({ error: 'State must be a two-letter code such as OH' }).trim().toUpperCase().regex(/^[A-Z]{2}$/, { error: 'State must be a two-letter code such as OH' }).optional(),
  indoorLocation: choice(INDOOR_LOCATIONS, 'Choose where the indoor unit sits: attic, above a ceiling, closet, utility room, basement, garage or crawlspace').optional(),
  airflowDirection: choice(AIRFLOW_DIRECTIONS, 'Choose the airflow direction: upflow, downflow, horizontal left or horizontal right').optional(),
  conditionedAreaSqFt: amount('Conditioned area', 1, 100000, 'sq ft').optional(),
  hasFloatSwitch: z.boolean({ error: 'Answer yes or no: is a float switch fitted?' }).optional(),
  hasSecondaryPan: z.boolean({ error: 'Answer yes or no: is there a secondary drain pan?' }).optional(),
  /** Height of the lowest supply opening into the room, ft: the A2L release height of a ducted unit. */
  lowestRegisterHeightFt: amount('Lowest supply register height', 0, 30, 'ft').optional(),
  /** Measured total external static pressure, in. w.c.: picks the blower table column. */
  externalStaticInWc: amount('External static pressure', 0.05, 2, 'in. w.c.').optional(),
});

export const ControlsSchema = z.object({
  thermostatHeatPump: z.boolean({ error: 'Answer yes or no: can the thermostat run a heat pump?' }).optional(),
  auxHeatStages: z.number({ error: 'Aux heat stages must be a whole number from 0 to 4' }).int({ error: 'Aux heat stages must be a whole number from 0 to 4' }).min(0, { error: 'Aux heat stages must be a whole number from 0 to 4' }).max(4, { error: 'Aux heat stages must be a whole number from 0 to 4' }).optional(),
});

/** Every line-set fact is optional: each rule runs on the facts it needs and names the ones it lacks. */
export const LineSetSchema = z.object({
  liquidOdIn: amount('Liquid line size', 0.125, 2.125, 'in').optional(),
  suctionOdIn: amount('Suction line size', 0.125, 2.125, 'in').optional(),
  lengthFt: amount('Line length', 1, 500, 'ft').optional(),
  liftFt: amount('Lift', -300, 300, 'ft').optional(),
  reused: z.boolean({ error: 'Answer yes or no: is the line set kept from the old system?' }).optional(),
  previousRefrigerant: z.preprocess((v) => normalizeRefrigerantName(blankToUndefined(v)), choice(REFRIGERANT_IDS, `Choose the refrigerant it ran before: ${spoken(REFRIGERANT_IDS)}`).optional()),
  burnoutHistory: z.boolean({ error: 'Answer yes or no: did the old system have a compressor burnout?' }).optional(),
  indoorFlareJoints: z.boolean({ error: 'Answer yes or no: are there flare joints indoors?' }).optional(),
  filterDrier: choice(FILTER_DRIERS, 'Choose the filter-drier: bi-flow, one-way or none').optional(),
  /** 90° elbows in the run: each adds equivalent length by tube size. */
  elbows: z.number({ error: 'Elbows must be a whole number from 0 to 50' }).int({ error: 'Elbows must be a whole number from 0 to 50' }).min(0, { error: 'Elbows must be a whole number from 0 to 50' }).max(50, { error: 'Elbows must be a whole number from 0 to 50' }).optional(),
  /** True when the outdoor unit sits above the indoor coil. */
  outdoorAbove: z.boolean({ error: 'Answer yes or no: does the outdoor unit sit above the indoor coil?' }).optional(),
});

/** Every electrical fact is optional: a breaker alone runs the breaker rules. */
export const ElectricalSchema = z.object({
  breakerAmps: amount('Breaker size', 1, 1000, 'A').optional(),
  wireAwg: z.literal(WIRE_AWG, { error: `Wire size must be one of ${spoken(WIRE_AWG)} AWG` }).optional(),
  wireMaterial: choice(WIRE_MATERIALS, 'Choose copper or aluminum').optional(),
  terminalRatingC: z.union([z.literal(60), z.literal(75), z.literal(90)], { error: 'Terminal rating must be 60, 75 or 90 °C' }).optional(),
  supplyVoltage: z.number({ error: 'Supply voltage must be a whole number from 100 to 600 V' }).int({ error: 'Supply voltage must be a whole number from 100 to 600 V' }).min(100, { error: 'Supply voltage must be a whole number from 100 to 600 V' }).max(600, { error: 'Supply voltage must be a whole number from 100 to 600 V' }).optional(),
  supplyPhase: z.union([z.literal(1), z.literal(3)], { error: 'Supply phase must be 1 or 3' }).optional(),
  /** Cable or wire type: NM-B and UF-B are held to the 60 °C column (NEC 334.80, 340.80). */
  conductorType: choice(CONDUCTOR_TYPES, 'Choose the wire type: NM-B cable, UF-B cable, THHN in conduit or SE cable').optional(),
  /** The disconnecting means at the outdoor unit (NEC 440.14). */
  disconnect: z
    .object({
      withinSight: z.boolean({ error: 'Answer yes or no: is the disconnect within sight of the outdoor unit?' }),
      ratingAmps: amount('Disconnect rating', 1, 1000, 'A').optional(),
      fused: z.boolean({ error: 'Answer yes or no: is the disconnect fused?' }).optional(),
    })
    .optional(),
  /** What protects the circuit: a plain breaker, an HACR-marked breaker or fuses. */
  overcurrentType: choice(OVERCURRENT_TYPES, 'Choose the protection: breaker, HACR breaker or fuses').optional(),
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
