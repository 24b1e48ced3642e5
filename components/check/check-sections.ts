import { AIRFLOW_DIRECTIONS, CONDUCTOR_TYPES, FILTER_DRIERS, INDOOR_LOCATIONS, OVERCURRENT_TYPES, WIRE_AWG, WIRE_MATERIALS } from '@/shared/schemas/check';
import { REFRIGERANT_IDS } from '@/shared/schemas/fields';
import { opts, TUBE_OPTIONS, type FieldDesc } from './field-types';

/** The optional sections of a check (collapsed until opened), keyed as in the request body. */
export const SECTION_KEYS = ['lineSet', 'electrical', 'indoorElectrical', 'site', 'controls'] as const;
export type SectionKey = (typeof SECTION_KEYS)[number];

const electrical = (): FieldDesc[] => [
  { key: 'breakerAmps', label: 'Breaker (A)', type: 'number' },
  { key: 'wireAwg', label: 'Wire size (AWG)', type: 'choice', options: opts(WIRE_AWG) },
  { key: 'wireMaterial', label: 'Wire', type: 'choice', options: opts(WIRE_MATERIALS, { copper: 'Copper', aluminum: 'Aluminum' }) },
  { key: 'terminalRatingC', label: 'Terminal rating (°C)', type: 'choice', options: opts([60, 75, 90]), hint: '60 °C unless both ends are marked 75 °C' },
  { key: 'supplyVoltage', label: 'Supply voltage (V)', type: 'number' },
  { key: 'supplyPhase', label: 'Supply phase', type: 'choice', options: opts([1, 3]) },
  { key: 'conductorType', label: 'Wire type', type: 'choice', options: opts(CONDUCTOR_TYPES, { 'nm-b': 'NM-B cable', 'uf-b': 'UF-B cable', 'thhn-conduit': 'THHN in conduit', se: 'SE cable' }) },
  { key: 'overcurrentType', label: 'Protection', type: 'choice', options: opts(OVERCURRENT_TYPES, { breaker: 'Breaker', 'hacr-breaker': 'HACR breaker', fuse: 'Fuses' }) },
];

export const SECTIONS: Record<SectionKey, { title: string; icon: string; fields: FieldDesc[] }> = {
  lineSet: {
    title: 'Line set',
    icon: 'pipe',
    fields: [
      { key: 'liquidOdIn', label: 'Liquid line OD (in)', type: 'choice', options: TUBE_OPTIONS },
      { key: 'suctionOdIn', label: 'Suction line OD (in)', type: 'choice', options: TUBE_OPTIONS },
      { key: 'lengthFt', label: 'Length (ft)', type: 'number' },
      { key: 'liftFt', label: 'Lift (ft, outdoor unit above is +)', type: 'number' },
      { key: 'reused', label: 'Line set kept from the old system', type: 'bool' },
      { key: 'previousRefrigerant', label: 'Previous refrigerant', type: 'choice', options: opts(REFRIGERANT_IDS) },
      { key: 'burnoutHistory', label: 'Compressor burnout in its history', type: 'bool' },
      { key: 'indoorFlareJoints', label: 'Flare joints indoors', type: 'bool' },
      { key: 'filterDrier', label: 'Filter-drier', type: 'choice', options: opts(FILTER_DRIERS, { 'bi-flow': 'Bi-flow', 'one-way': 'One-way', none: 'None' }) },
      { key: 'elbows', label: '90° elbows in the run', type: 'number' },
      { key: 'outdoorAbove', label: 'Outdoor unit sits above the indoor coil', type: 'bool' },
    ],
  },
  electrical: { title: 'Electrical (outdoor unit)', icon: 'flash-outline', fields: electrical() },
  indoorElectrical: { title: 'Indoor electrical (air handler, heat kit)', icon: 'flash-outline', fields: electrical() },
  site: {
    title: 'Site',
    icon: 'home-outline',
    fields: [
      { key: 'state', label: 'State (two letters)', type: 'text' },
      { key: 'indoorLocation', label: 'Indoor unit sits in', type: 'choice', options: opts(INDOOR_LOCATIONS) },
      { key: 'airflowDirection', label: 'Airflow direction', type: 'choice', options: opts(AIRFLOW_DIRECTIONS) },
      { key: 'conditionedAreaSqFt', label: 'Conditioned area (sq ft)', type: 'number' },
      { key: 'hasFloatSwitch', label: 'Float switch fitted', type: 'bool' },
      { key: 'hasSecondaryPan', label: 'Secondary drain pan', type: 'bool' },
      { key: 'lowestRegisterHeightFt', label: 'Lowest supply register height (ft)', type: 'number' },
      { key: 'externalStaticInWc', label: 'Measured external static (in. w.c.)', type: 'number' },
    ],
  },
  controls: {
    title: 'Controls',
    icon: 'thermostat',
    fields: [
      { key: 'thermostatHeatPump', label: 'Thermostat runs a heat pump (reversing valve, aux heat)', type: 'bool' },
      { key: 'auxHeatStages', label: 'Aux heat stages', type: 'number' },
    ],
  },
};
