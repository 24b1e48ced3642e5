import {
  AIR_HANDLER_KINDS,
  AirHandlerSpecSchema,
  COIL_CONFIGURATIONS,
  COIL_MATERIALS,
  IndoorCoilSpecSchema,
  KIT_TYPES,
  METERING_REQUIRED,
  METERING_TYPES,
  MeteringDeviceSpecSchema,
  OutdoorUnitSpecSchema,
  OVERCURRENT_REQUIRED,
  SYSTEM_TYPES,
  type AirHandlerSpec,
  type IndoorCoilSpec,
  type MeteringDeviceSpec,
  type OutdoorUnitSpec,
} from '@/shared/schemas/equipment';
import { REFRIGERANT_IDS } from '@/shared/schemas/fields';
import { opts, TUBE_OPTIONS, type FieldDesc, type FieldValues } from './field-types';
import type { PartSlot } from './part-slots';

type Desc = Omit<FieldDesc, 'key'>;
const identity = {
  // The model first and always shown: it names the part on the record and in the findings.
  model: { label: 'Model', type: 'text', essential: true },
  brand: { label: 'Brand', type: 'text' },
  description: { label: 'Description', type: 'text' },
} as const satisfies Record<string, Desc>;
const refrigerants = opts(REFRIGERANT_IDS);
const tons = (label: string, essential = false): Desc => ({ label, type: 'number', essential });
const bool = (label: string, essential = false): Desc => ({ label, type: 'bool', essential });
const num = (label: string, essential = false): Desc => ({ label, type: 'number', essential });
const date: Desc = { label: 'Manufacture date (YYYY-MM-DD)', type: 'date' };

// `satisfies Record<keyof Spec, …>`: a field added to a shared schema must get a label here.
const OUTDOOR = {
  ...identity,
  systemType: { label: 'System type', type: 'choice', options: opts(SYSTEM_TYPES, { ac: 'Air conditioner', 'heat-pump': 'Heat pump' }), essential: true },
  refrigerant: { label: 'Refrigerant', type: 'choice', options: refrigerants, essential: true },
  nominalTons: tons('Nominal tons', true),
  coolingBtuh: num('Cooling capacity (Btu/h)'),
  seer2: num('SEER2'),
  eer2: num('EER2'),
  hspf2: num('HSPF2'),
  meteringRequired: { label: 'Indoor metering it needs', type: 'choice', options: opts(METERING_REQUIRED, { txv: 'TXV', piston: 'Piston', any: 'Any' }), essential: true },
  pistonSizeIn: num('Piston size (in)'),
  liquidLineOdIn: { label: 'Liquid line OD (in)', type: 'choice', options: TUBE_OPTIONS, essential: true },
  suctionLineOdIn: { label: 'Suction line OD (in)', type: 'choice', options: TUBE_OPTIONS, essential: true },
  allowedLiquidOdIn: { label: 'Allowed liquid ODs (in, separate with ;)', type: 'text' },
  allowedSuctionOdIn: { label: 'Allowed suction ODs (in, separate with ;)', type: 'text' },
  maxLineLengthFt: num('Max line length (ft)'),
  maxLiftFt: num('Max lift (ft)'),
  maxLiftOutdoorAboveFt: num('Max lift, outdoor unit above (ft)'),
  maxLiftOutdoorBelowFt: num('Max lift, outdoor unit below (ft)'),
  standardLineLengthFt: num('Long-line instructions apply beyond (ft)'),
  factoryChargeOz: num('Factory charge (oz)'),
  chargedLineLengthFt: num('Charged for a line of (ft)'),
  chargePerFtOz: num('Charge per foot (oz/ft)'),
  mcaAmps: num('MCA (A)', true),
  mocpAmps: num('MOCP (A)', true),
  voltage: { label: 'Voltage (V), e.g. 208/230', type: 'text', essential: true },
  phase: { label: 'Phase', type: 'choice', options: opts([1, 3]) },
  copperOnly: bool('Nameplate: copper conductors only'),
  overcurrentRequired: { label: 'Nameplate protection', type: 'choice', options: opts(OVERCURRENT_REQUIRED, { fuse: 'Fuses only', 'fuse-or-hacr': 'Fuse or HACR breaker' }) },
  startAssist: bool('Start assist fitted'),
  manufactureDate: date,
  targetSubcoolingF: num('Target subcooling (°F)'),
} satisfies Record<keyof OutdoorUnitSpec, Desc>;

const COIL = {
  ...identity,
  configuration: { label: 'Configuration', type: 'choice', options: opts(COIL_CONFIGURATIONS) },
  cased: bool('Cased'),
  material: { label: 'Tube material', type: 'choice', options: opts(COIL_MATERIALS) },
  minTons: tons('Min tons', true),
  maxTons: tons('Max tons', true),
  refrigerants: { label: 'Listed refrigerants', type: 'multi', options: refrigerants, essential: true },
  meteringType: { label: 'Metering device', type: 'choice', options: opts(METERING_TYPES, { txv: 'TXV', piston: 'Piston', eev: 'EEV', none: 'None' }), essential: true },
  meteringRefrigerant: { label: 'Metering device is for', type: 'choice', options: refrigerants, essential: true },
  meteringBidirectional: bool('Metering passes flow both ways', true),
  meteringBleed: bool('Bleed-type TXV'),
  pistonSizeIn: num('Piston size (in)'),
  a2lListed: bool('Listed for A2L refrigerants'),
  leakSensor: bool('Leak sensor fitted'),
  widthIn: num('Width (in)'),
  liquidConnOdIn: { label: 'Liquid connection OD (in)', type: 'choice', options: TUBE_OPTIONS },
  suctionConnOdIn: { label: 'Suction connection OD (in)', type: 'choice', options: TUBE_OPTIONS },
  manufactureDate: date,
} satisfies Record<keyof IndoorCoilSpec, Desc>;

const AIR_HANDLER = {
  ...identity,
  kind: { label: 'Kind', type: 'choice', options: opts(AIR_HANDLER_KINDS, { 'air-handler': 'Air handler', furnace: 'Furnace' }), essential: true },
  minTons: tons('Min tons'),
  maxTons: tons('Max tons'),
  airflowCfm: num('Airflow (CFM)', true),
  blowerTable: { label: 'Blower table (tap:static=CFM, e.g. low:0.3=900/0.5=820;high:0.3=1300)', type: 'text' },
  widthIn: num('Width (in)'),
  refrigerants: { label: 'Listed refrigerants', type: 'multi', options: refrigerants },
  a2lListed: bool('Listed for A2L refrigerants'),
  heatKitKw: num('Heat kit (kW)'),
  heatKitRatedVoltage: num('Heat kit rated at (V)'),
  leakSensor: bool('Refrigerant leak sensor fitted'),
  mcaAmps: num('MCA (A)'),
  mocpAmps: num('MOCP (A)'),
  voltage: { label: 'Voltage (V)', type: 'text' },
} satisfies Record<keyof AirHandlerSpec, Desc>;

const METERING = {
  ...identity,
  type: { label: 'Kit type', type: 'choice', options: opts(KIT_TYPES, { txv: 'TXV', piston: 'Piston', eev: 'EEV' }), essential: true },
  refrigerant: { label: 'Refrigerant', type: 'choice', options: refrigerants, essential: true },
  minTons: tons('Min tons', true),
  maxTons: tons('Max tons', true),
  bidirectional: bool('Passes flow both ways', true),
  bleed: bool('Bleed type'),
  pistonSizeIn: num('Piston size (in)'),
} satisfies Record<keyof MeteringDeviceSpec, Desc>;

export const SPEC_SCHEMAS = {
  outdoor: OutdoorUnitSpecSchema,
  indoorCoil: IndoorCoilSpecSchema,
  airHandler: AirHandlerSpecSchema,
  metering: MeteringDeviceSpecSchema,
} as const;

const LABELS: Record<PartSlot, Record<string, Desc>> = { outdoor: OUTDOOR, indoorCoil: COIL, airHandler: AIR_HANDLER, metering: METERING };

/** True when the shared schema refuses the field left out: the check cannot run without it. */
function isRequired(slot: PartSlot, key: string): boolean {
  const shape = SPEC_SCHEMAS[slot].shape as Record<string, { safeParse(v: unknown): { success: boolean } }>;
  return !shape[key].safeParse(undefined).success;
}

/** The nameplate form's fields for a part, in the shared schema's field order; required ones are always shown. */
export function nameplateFields(slot: PartSlot): FieldDesc[] {
  return Object.keys(SPEC_SCHEMAS[slot].shape).map((key) => {
    const required = isRequired(slot, key);
    return { key, ...LABELS[slot][key], required, essential: required || LABELS[slot][key].essential };
  });
}

/**
 * A part typed from its nameplate starts empty: no refrigerant, size or metering preset, so nothing a
 * hurried tech leaves untouched can pass for a fact read off the unit.
 */
export const NAMEPLATE_DEFAULTS: Record<PartSlot, FieldValues> = { outdoor: {}, indoorCoil: {}, airHandler: {}, metering: {} };
