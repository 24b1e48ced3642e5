import { z } from 'zod';
import { blankToUndefined, enumOf, isoDate, numberIn, numberListIn, parseDecimalText, refrigerant, refrigerantList, text, tons, tubeOdIn, yesNo } from './fields';

/**
 * Equipment specs: the same schemas validate catalog CSV rows, catalog API items and parts typed
 * from a nameplate in a check. Units are in the field names (DESIGN.md §2).
 * `model` is required for catalog rows (see `catalogRow`) and optional on a typed nameplate spec.
 */

export const SYSTEM_TYPES = ['ac', 'heat-pump'] as const;
export const METERING_REQUIRED = ['txv', 'piston', 'any'] as const;
export const COIL_CONFIGURATIONS = ['upflow', 'downflow', 'horizontal', 'multi-position'] as const;
export const COIL_MATERIALS = ['copper', 'aluminum'] as const;
export const METERING_TYPES = ['txv', 'piston', 'eev', 'none'] as const;
export const AIR_HANDLER_KINDS = ['air-handler', 'furnace'] as const;
export const KIT_TYPES = ['txv', 'piston', 'eev'] as const;

/** Optional fields treat a blank CSV cell or a JSON null as absent. */
const opt = <T extends z.ZodType>(schema: T) => z.preprocess(blankToUndefined, schema.optional());
const pistonSizeIn = numberIn(0.03, 0.2);
const amps = numberIn(0, 400);
const voltage = z.preprocess(
  (v) => (typeof v === 'number' ? String(v) : v),
  z.string().trim().regex(/^\d{3}(\/\d{3})?$/, { error: 'expected a voltage such as 230 or 208/230' }),
);

const identity = {
  model: opt(text(80)),
  brand: opt(text(80)),
  description: opt(text(300)),
};

export const OutdoorUnitSpecSchema = z.object({
  ...identity,
  systemType: enumOf(SYSTEM_TYPES),
  refrigerant,
  nominalTons: tons,
  coolingBtuh: opt(numberIn(6000, 300000)),
  seer2: opt(numberIn(8, 40)),
  eer2: opt(numberIn(5, 25)),
  hspf2: opt(numberIn(4, 15)),
  meteringRequired: opt(enumOf(METERING_REQUIRED)),
  pistonSizeIn: opt(pistonSizeIn),
  liquidLineOdIn: opt(tubeOdIn),
  suctionLineOdIn: opt(tubeOdIn),
  allowedLiquidOdIn: opt(numberListIn(0.125, 2.125)),
  allowedSuctionOdIn: opt(numberListIn(0.125, 2.125)),
  maxLineLengthFt: opt(numberIn(5, 500)),
  maxLiftFt: opt(numberIn(0, 300)),
  factoryChargeOz: opt(numberIn(0, 2000)),
  chargedLineLengthFt: opt(numberIn(0, 100)),
  chargePerFtOz: opt(numberIn(0, 5)),
  mcaAmps: opt(amps),
  mocpAmps: opt(amps),
  voltage: opt(voltage),
  phase: opt(z.preprocess((v) => (typeof v === 'string' && v.trim() !== '' ? (parseDecimalText(v) ?? v) : v === '' ? undefined : v), z.union([z.literal(1), z.literal(3)], { error: 'phase must be 1 or 3' }))),
  startAssist: opt(yesNo),
  manufactureDate: opt(isoDate),
  targetSubcoolingF: opt(numberIn(0, 30)),
});
export type OutdoorUnitSpec = z.infer<typeof OutdoorUnitSpecSchema>;

export const IndoorCoilSpecSchema = z.object({
  ...identity,
  configuration: opt(enumOf(COIL_CONFIGURATIONS)),
  cased: opt(yesNo),
  material: opt(enumOf(COIL_MATERIALS)),
  minTons: tons,
  maxTons: tons,
  refrigerants: refrigerantList,
  meteringType: enumOf(METERING_TYPES),
  meteringRefrigerant: opt(refrigerant),
  meteringBidirectional: opt(yesNo),
  meteringBleed: opt(yesNo),
  pistonSizeIn: opt(pistonSizeIn),
  a2lListed: opt(yesNo),
  leakSensor: opt(yesNo),
  widthIn: opt(numberIn(8, 40)),
  liquidConnOdIn: opt(tubeOdIn),
  suctionConnOdIn: opt(tubeOdIn),
  manufactureDate: opt(isoDate),
});
export type IndoorCoilSpec = z.infer<typeof IndoorCoilSpecSchema>;

export const AirHandlerSpecSchema = z.object({
  ...identity,
  kind: enumOf(AIR_HANDLER_KINDS),
  minTons: opt(tons),
  maxTons: opt(tons),
  airflowCfm: opt(numberIn(200, 10000)),
  widthIn: opt(numberIn(8, 40)),
  refrigerants: opt(refrigerantList),
  a2lListed: opt(yesNo),
  heatKitKw: opt(numberIn(0, 50)),
  mcaAmps: opt(amps),
  mocpAmps: opt(amps),
  voltage: opt(voltage),
});
export type AirHandlerSpec = z.infer<typeof AirHandlerSpecSchema>;

export const MeteringDeviceSpecSchema = z.object({
  ...identity,
  type: enumOf(KIT_TYPES),
  refrigerant,
  minTons: opt(tons),
  maxTons: opt(tons),
  bidirectional: opt(yesNo),
  bleed: opt(yesNo),
  pistonSizeIn: opt(pistonSizeIn),
});
export type MeteringDeviceSpec = z.infer<typeof MeteringDeviceSpecSchema>;

export const RatedCombinationSpecSchema = z.object({
  outdoorModel: text(80),
  indoorModel: text(80),
  airHandlerModel: opt(text(80)),
  coolingBtuh: opt(numberIn(6000, 300000)),
  seer2: opt(numberIn(8, 40)),
  eer2: opt(numberIn(5, 25)),
  hspf2: opt(numberIn(4, 15)),
  reference: opt(text(80)),
});
export type RatedCombinationSpec = z.infer<typeof RatedCombinationSpecSchema>;

/** Catalog rows need a model: it is the key the importer matches on. */
const catalogModel = { model: text(80) };

export const CatalogOutdoorUnitSchema = OutdoorUnitSpecSchema.extend(catalogModel)
  .refine((u) => u.mocpAmps == null || u.mcaAmps == null || u.mocpAmps >= u.mcaAmps, {
    error: 'mocp_amps must not be below mca_amps',
    path: ['mocpAmps'],
  });
export const CatalogIndoorCoilSchema = IndoorCoilSpecSchema.extend(catalogModel).refine((c) => c.maxTons >= c.minTons, {
  error: 'max_tons must not be below min_tons',
  path: ['maxTons'],
});
export const CatalogAirHandlerSchema = AirHandlerSpecSchema.extend(catalogModel);
export const CatalogMeteringDeviceSchema = MeteringDeviceSpecSchema.extend(catalogModel);

export const CATALOG_KINDS = ['outdoor-units', 'indoor-coils', 'air-handlers', 'metering-devices', 'rated-combinations'] as const;
export type CatalogKind = (typeof CATALOG_KINDS)[number];
export const IMPORT_KINDS = [...CATALOG_KINDS, 'prices'] as const;
export type ImportKind = (typeof IMPORT_KINDS)[number];

/** Catalog items as the API returns them: the spec plus id and import bookkeeping. */
export type CatalogItem<T> = T & { id: number; normalizedModel?: string };
