import type { CatalogKind } from '@/shared/schemas/equipment';
import { tonRange, tons } from '@/components/catalog/spec-format';

// eslint-disable-next-line @typescript-eslint/no-explicit-any
type Spec = Record<string, any>; // one of the catalog spec shapes, read by field name

const OUTDOOR_TYPE: Record<string, string> = { ac: 'AC', 'heat-pump': 'Heat pump' };
const HANDLER_KIND: Record<string, string> = { 'air-handler': 'Air handler', furnace: 'Furnace' };
const KIT_TYPE: Record<string, string> = { txv: 'TXV kit', piston: 'Piston kit', eev: 'Electronic valve kit' };

const list = (values: unknown) => (Array.isArray(values) && values.length ? values.join(', ') : undefined);

/**
 * One search row's line under the model, enough to pick the right part without opening it:
 * "Heat pump · R-454B · 3 tons · Brand". Sizes in tons, airflow in CFM.
 */
export function describePart(kind: CatalogKind, spec: Spec): string {
  const bits: (string | undefined)[] = (() => {
    switch (kind) {
      case 'outdoor-units':
        return [OUTDOOR_TYPE[spec.systemType], spec.refrigerant, tons(spec.nominalTons)];
      case 'indoor-coils':
        return ['Coil', list(spec.refrigerants), tonRange(spec.minTons, spec.maxTons), spec.meteringRefrigerant ? `valve for ${spec.meteringRefrigerant}` : undefined];
      case 'air-handlers':
        return [HANDLER_KIND[spec.kind], list(spec.refrigerants), tonRange(spec.minTons, spec.maxTons), spec.airflowCfm != null ? `${spec.airflowCfm} CFM` : undefined];
      case 'metering-devices':
        return [KIT_TYPE[spec.type], spec.refrigerant, tonRange(spec.minTons, spec.maxTons)];
      case 'rated-combinations':
        return [[spec.outdoorModel, spec.indoorModel, spec.airHandlerModel].filter(Boolean).join(' + ')];
    }
  })();
  return [...bits, spec.brand].filter(Boolean).join(' · ');
}
