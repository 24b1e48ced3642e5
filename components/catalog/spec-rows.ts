import type { CatalogKind } from '@/shared/schemas/equipment';
import type { CatalogEntry } from '@/hooks/use-catalog';
import { words } from './catalog-kind-labels';
import { btuh, calendarDate, circuit, ratings, tonRange, tons, tubeIn, tubeListIn, withUnit, yesNo } from './spec-format';

export interface SpecRow {
  label: string;
  value: string;
}

// eslint-disable-next-line @typescript-eslint/no-explicit-any
type Any = Record<string, any>; // read by field name; each kind's fields are listed below
type Line = [label: string, value: (e: Any) => string | undefined];

const identity: Line[] = [
  ['Brand', (e) => e.brand],
  ['Description', (e) => e.description],
];

const LINES: Record<CatalogKind, Line[]> = {
  'outdoor-units': [
    ...identity,
    ['Type', (e) => words(e.systemType)],
    ['Refrigerant', (e) => e.refrigerant],
    ['Size', (e) => tons(e.nominalTons)],
    ['Cooling capacity', (e) => btuh(e.coolingBtuh)],
    ['Ratings', (e) => ratings(e)],
    ['Metering required', (e) => words(e.meteringRequired)],
    ['Piston shipped', (e) => withUnit(e.pistonSizeIn, 'in')],
    ['Liquid line', (e) => tubeIn(e.liquidLineOdIn)],
    ['Suction line', (e) => tubeIn(e.suctionLineOdIn)],
    ['Liquid line sizes allowed', (e) => tubeListIn(e.allowedLiquidOdIn)],
    ['Suction line sizes allowed', (e) => tubeListIn(e.allowedSuctionOdIn)],
    ['Longest line set', (e) => withUnit(e.maxLineLengthFt, 'ft')],
    ['Greatest lift', (e) => withUnit(e.maxLiftFt, 'ft')],
    ['Factory charge', (e) => withUnit(e.factoryChargeOz, 'oz')],
    ['Charge covers', (e) => withUnit(e.chargedLineLengthFt, 'ft of line')],
    ['Charge per extra foot', (e) => withUnit(e.chargePerFtOz, 'oz/ft')],
    ['Target subcooling', (e) => withUnit(e.targetSubcoolingF, '°F')],
    ['Circuit', (e) => circuit(e.mcaAmps, e.mocpAmps)],
    ['Voltage', (e) => withUnit(e.voltage, e.phase ? `V, ${e.phase} phase` : 'V')],
    ['Start assist', (e) => yesNo(e.startAssist)],
    ['Made', (e) => calendarDate(e.manufactureDate)],
  ],
  'indoor-coils': [
    ...identity,
    ['Configuration', (e) => words(e.configuration)],
    ['Cased', (e) => yesNo(e.cased)],
    ['Tube material', (e) => words(e.material)],
    ['Size range', (e) => tonRange(e.minTons, e.maxTons)],
    ['Listed refrigerants', (e) => e.refrigerants?.join(', ')],
    ['Metering device', (e) => words(e.meteringType)],
    ['Metering device is for', (e) => e.meteringRefrigerant],
    ['Metering passes both ways', (e) => yesNo(e.meteringBidirectional)],
    ['Bleed-type valve', (e) => yesNo(e.meteringBleed)],
    ['Piston', (e) => withUnit(e.pistonSizeIn, 'in')],
    ['A2L listed', (e) => yesNo(e.a2lListed)],
    ['Leak sensor', (e) => yesNo(e.leakSensor)],
    ['Width', (e) => withUnit(e.widthIn, 'in')],
    ['Liquid connection', (e) => tubeIn(e.liquidConnOdIn)],
    ['Suction connection', (e) => tubeIn(e.suctionConnOdIn)],
    ['Made', (e) => calendarDate(e.manufactureDate)],
  ],
  'air-handlers': [
    ...identity,
    ['Kind', (e) => words(e.kind)],
    ['Size range', (e) => tonRange(e.minTons, e.maxTons)],
    ['Airflow', (e) => withUnit(e.airflowCfm, 'CFM at rated static pressure')],
    ['Width', (e) => withUnit(e.widthIn, 'in')],
    ['Listed refrigerants', (e) => e.refrigerants?.join(', ')],
    ['A2L listed', (e) => yesNo(e.a2lListed)],
    ['Heat kit', (e) => withUnit(e.heatKitKw, 'kW')],
    ['Circuit', (e) => circuit(e.mcaAmps, e.mocpAmps)],
    ['Voltage', (e) => withUnit(e.voltage, 'V')],
  ],
  'metering-devices': [
    ...identity,
    ['Type', (e) => words(e.type)],
    ['Refrigerant', (e) => e.refrigerant],
    ['Size range', (e) => tonRange(e.minTons, e.maxTons)],
    ['Passes both ways', (e) => yesNo(e.bidirectional)],
    ['Bleed-type valve', (e) => yesNo(e.bleed)],
    ['Piston', (e) => withUnit(e.pistonSizeIn, 'in')],
  ],
  'rated-combinations': [
    ['Outdoor unit', (e) => e.outdoorModel],
    ['Indoor coil', (e) => e.indoorModel],
    ['Air handler or furnace', (e) => e.airHandlerModel],
    ['Cooling capacity', (e) => btuh(e.coolingBtuh)],
    ['SEER2', (e) => e.seer2?.toString()],
    ['EER2', (e) => e.eer2?.toString()],
    ['HSPF2', (e) => e.hspf2?.toString()],
    ['Certificate', (e) => e.reference],
  ],
};

/** Every known spec of an item as label and value in plain words with units; unknown ones left out. */
export function specRows(kind: CatalogKind, item: CatalogEntry): SpecRow[] {
  const rows: SpecRow[] = [];
  for (const [label, value] of LINES[kind]) {
    const v = value(item as Any);
    if (v) rows.push({ label, value: v });
  }
  return rows;
}
