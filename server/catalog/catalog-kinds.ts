import type { z } from 'zod';
import {
  AirHandlerSpecSchema,
  CatalogAirHandlerSchema,
  CatalogIndoorCoilSchema,
  CatalogMeteringDeviceSchema,
  CatalogOutdoorUnitSchema,
  IndoorCoilSpecSchema,
  MeteringDeviceSpecSchema,
  OutdoorUnitSpecSchema,
  RatedCombinationSpecSchema,
  type CatalogKind,
} from '../../shared/schemas/equipment';
import { normalizeModel } from '../../shared/schemas/fields';
import { AirHandler } from './air-handler.entity';
import { IndoorCoil } from './indoor-coil.entity';
import { MeteringDevice } from './metering-device.entity';
import { OutdoorUnit } from './outdoor-unit.entity';
import { RatedCombination } from './rated-combination.entity';

/** What the importer, the catalog API and revert need to know about one catalog kind. */
export interface KindInfo {
  kind: CatalogKind;
  entity: typeof OutdoorUnit | typeof IndoorCoil | typeof AirHandler | typeof MeteringDevice | typeof RatedCombination;
  table: string;
  /** Validates one CSV row (typed or text values). */
  schema: z.ZodType<Record<string, unknown>>;
  /** The spec's fields, in template order. */
  fields: string[];
  /** Fields a file must have a column for. */
  required: string[];
  /** The unique key columns computed from a parsed row. */
  keyColumns(row: Record<string, unknown>): Record<string, string>;
  /** Short label of a row for messages (its model). */
  label(row: Record<string, unknown>): string;
}

const keysOf = (schema: { shape: Record<string, unknown> }) => Object.keys(schema.shape);
const requiredOf = (schema: { shape: Record<string, { isOptional(): boolean }> }) =>
  Object.entries(schema.shape)
    .filter(([, s]) => !s.isOptional())
    .map(([k]) => k);

const byModel = (row: Record<string, unknown>) => ({ normalizedModel: normalizeModel(String(row.model)) });
const modelLabel = (row: Record<string, unknown>) => String(row.model);

function equipment(kind: CatalogKind, entity: KindInfo['entity'], table: string, spec: typeof OutdoorUnitSpecSchema | typeof IndoorCoilSpecSchema | typeof AirHandlerSpecSchema | typeof MeteringDeviceSpecSchema, schema: z.ZodType): KindInfo {
  return {
    kind,
    entity,
    table,
    schema: schema as z.ZodType<Record<string, unknown>>,
    fields: keysOf(spec),
    required: ['model', ...requiredOf(spec as never)],
    keyColumns: byModel,
    label: modelLabel,
  };
}

export const KINDS: Record<CatalogKind, KindInfo> = {
  'outdoor-units': equipment('outdoor-units', OutdoorUnit, 'outdoor_units', OutdoorUnitSpecSchema, CatalogOutdoorUnitSchema),
  'indoor-coils': equipment('indoor-coils', IndoorCoil, 'indoor_coils', IndoorCoilSpecSchema, CatalogIndoorCoilSchema),
  'air-handlers': equipment('air-handlers', AirHandler, 'air_handlers', AirHandlerSpecSchema, CatalogAirHandlerSchema),
  'metering-devices': equipment('metering-devices', MeteringDevice, 'metering_devices', MeteringDeviceSpecSchema, CatalogMeteringDeviceSchema),
  'rated-combinations': {
    kind: 'rated-combinations',
    entity: RatedCombination,
    table: 'rated_combinations',
    schema: RatedCombinationSpecSchema as unknown as z.ZodType<Record<string, unknown>>,
    fields: keysOf(RatedCombinationSpecSchema),
    required: requiredOf(RatedCombinationSpecSchema as never),
    keyColumns: (row) => ({
      normalizedOutdoorModel: normalizeModel(String(row.outdoorModel)),
      normalizedIndoorModel: normalizeModel(String(row.indoorModel)),
      normalizedAirHandlerModel: row.airHandlerModel ? normalizeModel(String(row.airHandlerModel)) : '',
    }),
    label: (row) => [row.outdoorModel, row.indoorModel, row.airHandlerModel].filter(Boolean).join(' + '),
  },
};

/** Equipment kinds (those with a model of their own). */
export const EQUIPMENT_KINDS = ['outdoor-units', 'indoor-coils', 'air-handlers', 'metering-devices'] as const;
