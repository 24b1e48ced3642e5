import type { ImportKind } from '../../shared/schemas/equipment';
import { KINDS } from '../catalog/catalog-kinds';
import { PRICE_FIELDS, PRICE_REQUIRED } from './price-row';

/**
 * Matches a file's headers to our fields. A header is compared by its key: lower case with every
 * non-letter/digit removed, so "Nominal Tons", "nominal_tons", "NOMINAL-TONS" and "nominalTons" agree.
 */
export const headerKey = (header: string) => header.toLowerCase().replace(/[^a-z0-9]/g, '');

/** camelCase field to its canonical CSV header (nominalTons → nominal_tons, a2lListed → a2l_listed). */
export const toSnake = (field: string) => field.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`);

const MODEL_ALIASES = ['model number', 'model no', 'model #', 'part', 'part #', 'part number', 'part no', 'item', 'item number', 'sku'];

/** Extra names by field, beyond the field's own name; kept per kind where a word means different things. */
const ALIASES: Record<ImportKind, Record<string, string[]>> = {
  'outdoor-units': {
    model: MODEL_ALIASES,
    brand: ['make', 'manufacturer'],
    description: ['desc'],
    systemType: ['type', 'system', 'unit type'],
    refrigerant: ['refrig', 'ref', 'refrigerant type'],
    nominalTons: ['tons', 'tonnage', 'size tons', 'capacity tons'],
    coolingBtuh: ['btuh', 'cooling capacity', 'capacity btuh'],
    meteringRequired: ['metering', 'metering device'],
    pistonSizeIn: ['piston', 'piston size'],
    liquidLineOdIn: ['liquid line', 'liquid od', 'liquid line od'],
    suctionLineOdIn: ['suction line', 'suction od', 'vapor line', 'suction line od'],
    maxLineLengthFt: ['max line length', 'max length ft'],
    maxLiftFt: ['max lift', 'max vertical ft'],
    standardLineLengthFt: ['standard line length', 'long line beyond ft'],
    copperOnly: ['copper only', 'use copper conductors only'],
    overcurrentRequired: ['fuse or hacr', 'overcurrent type'],
    factoryChargeOz: ['factory charge', 'charge oz'],
    chargedLineLengthFt: ['charged line length', 'charged length ft'],
    chargePerFtOz: ['charge per ft', 'oz per ft', 'additional charge oz per ft'],
    mcaAmps: ['mca', 'min circuit ampacity', 'minimum circuit ampacity'],
    mocpAmps: ['mocp', 'max fuse', 'max breaker', 'max overcurrent protection'],
    startAssist: ['hard start', 'start kit'],
    targetSubcoolingF: ['target subcooling', 'subcooling'],
  },
  'indoor-coils': {
    model: MODEL_ALIASES,
    brand: ['make', 'manufacturer'],
    description: ['desc'],
    minTons: ['min tonnage', 'tons min'],
    maxTons: ['max tonnage', 'tons max'],
    refrigerants: ['refrigerant', 'refrig'],
    meteringType: ['metering', 'metering device'],
    meteringRefrigerant: ['txv refrigerant', 'metering refrig'],
    meteringBidirectional: ['bidirectional', 'bi flow', 'bi directional'],
    meteringBleed: ['bleed'],
    pistonSizeIn: ['piston', 'piston size'],
    a2lListed: ['a2l', 'a2l ready'],
    leakSensor: ['leak detector', 'refrigerant sensor'],
    widthIn: ['width', 'width in'],
    liquidConnOdIn: ['liquid connection', 'liquid conn'],
    suctionConnOdIn: ['suction connection', 'suction conn', 'vapor connection'],
  },
  'air-handlers': {
    model: MODEL_ALIASES,
    brand: ['make', 'manufacturer'],
    description: ['desc'],
    kind: ['type', 'unit type'],
    airflowCfm: ['cfm', 'airflow'],
    widthIn: ['width', 'width in'],
    refrigerants: ['refrigerant', 'refrig'],
    a2lListed: ['a2l', 'a2l ready'],
    heatKitKw: ['heat kit', 'heat kit kw', 'kw'],
    heatKitRatedVoltage: ['heat kit voltage', 'heat kit rated v'],
    blowerTable: ['blower data', 'fan table', 'airflow table'],
    leakSensor: ['leak detector', 'refrigerant sensor'],
    mcaAmps: ['mca'],
    mocpAmps: ['mocp', 'max fuse', 'max breaker'],
  },
  'metering-devices': {
    model: MODEL_ALIASES,
    brand: ['make', 'manufacturer'],
    description: ['desc'],
    type: ['kit type', 'metering type', 'device type'],
    refrigerant: ['refrig', 'ref'],
    bidirectional: ['bi flow', 'bi directional'],
    pistonSizeIn: ['piston', 'piston size', 'orifice'],
  },
  'rated-combinations': {
    outdoorModel: ['outdoor', 'outdoor unit', 'outdoor unit model', 'condenser', 'condenser model', 'heat pump model'],
    indoorModel: ['indoor', 'indoor coil', 'coil', 'coil model', 'indoor coil model'],
    airHandlerModel: ['air handler', 'furnace', 'furnace model', 'blower', 'air handler model'],
    coolingBtuh: ['btuh', 'cooling capacity', 'capacity btuh'],
    reference: ['certificate', 'certificate number', 'cert', 'reference number', 'rating reference'],
  },
  prices: {
    model: MODEL_ALIASES,
    price: ['cost', 'net price', 'unit price', 'dealer price', 'your price', 'list price', 'amount'],
    effectiveFrom: ['effective', 'effective date', 'start date', 'valid from', 'date'],
    description: ['desc', 'item description'],
    currency: ['curr', 'ccy'],
  },
};

export interface FieldSet {
  fields: string[];
  required: string[];
}

export function fieldsOf(kind: ImportKind): FieldSet {
  if (kind === 'prices') return { fields: [...PRICE_FIELDS], required: [...PRICE_REQUIRED] };
  return { fields: KINDS[kind].fields, required: KINDS[kind].required };
}

/** Lookup from a header key to a field, for one kind. */
function lookupFor(kind: ImportKind): Map<string, string> {
  const lookup = new Map<string, string>();
  for (const [field, names] of Object.entries(ALIASES[kind])) for (const name of names) lookup.set(headerKey(name), field);
  // A field's own name wins over any alias.
  for (const field of fieldsOf(kind).fields) lookup.set(headerKey(field), field);
  return lookup;
}
const LOOKUPS = new Map<ImportKind, Map<string, string>>();

export interface HeaderMatch {
  /** The field each column feeds (null: ignored). */
  columns: (string | null)[];
  /** The file's headers as written. */
  foundColumns: string[];
  /** Required fields no column feeds. */
  missingFields: string[];
  /** Headers that matched nothing. */
  ignoredColumns: string[];
}

/**
 * Matches headers to fields: an explicit mapping ({ "their header": "field" }, the field as camelCase
 * or snake_case) wins, then names and aliases. A field fed by two columns keeps the first.
 */
export function matchHeaders(kind: ImportKind, headers: string[], mapping: Record<string, string> = {}): HeaderMatch {
  let lookup = LOOKUPS.get(kind);
  if (!lookup) LOOKUPS.set(kind, (lookup = lookupFor(kind)));
  const { fields, required } = fieldsOf(kind);
  const fieldByKey = new Map(fields.map((f) => [headerKey(f), f]));
  const mapped = new Map(Object.entries(mapping).map(([header, field]) => [headerKey(header), fieldByKey.get(headerKey(field)) ?? null]));
  const used = new Set<string>();
  const ignoredColumns: string[] = [];
  const columns = headers.map((header) => {
    const key = headerKey(header);
    if (key === '') return null;
    const field = mapped.has(key) ? mapped.get(key)! : (lookup.get(key) ?? null);
    if (!field || used.has(field)) {
      ignoredColumns.push(header);
      return null;
    }
    used.add(field);
    return field;
  });
  return {
    columns,
    foundColumns: headers.filter((h) => h.trim() !== ''),
    missingFields: required.filter((f) => !used.has(f)),
    ignoredColumns,
  };
}
