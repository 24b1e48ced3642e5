import type { CatalogKind } from '@/shared/schemas/equipment';
import type { CatalogEntry } from '@/hooks/use-catalog';
import { words } from './catalog-kind-labels';
import { btuh, ratings, tonRange, tons } from './spec-format';

/** What a result card or table row shows about one item. */
export interface ItemSummary {
  title: string;
  brand?: string;
  refrigerants?: string;
  size?: string;
  /** The kind-specific key facts (type, metering, ratings). */
  keyFacts?: string;
}

// eslint-disable-next-line @typescript-eslint/no-explicit-any
type Any = Record<string, any>; // each kind's item is one of the spec shapes; read by field name

/** The short facts of an item, by kind. */
export function summarize(kind: CatalogKind, entry: CatalogEntry): ItemSummary {
  const e = entry as Any;
  const refs = (list: string[] | undefined) => (list?.length ? list.join(', ') : undefined);
  const join = (...parts: (string | undefined)[]) => parts.filter(Boolean).join(' · ') || undefined;
  switch (kind) {
    case 'outdoor-units':
      return { title: e.model, brand: e.brand, refrigerants: e.refrigerant, size: tons(e.nominalTons), keyFacts: join(words(e.systemType), ratings(e)) };
    case 'indoor-coils':
      return {
        title: e.model,
        brand: e.brand,
        refrigerants: refs(e.refrigerants),
        size: tonRange(e.minTons, e.maxTons),
        keyFacts: join(words(e.meteringType)?.split(' (')[0], e.meteringRefrigerant ? `for ${e.meteringRefrigerant}` : undefined, e.a2lListed ? 'A2L listed' : undefined),
      };
    case 'air-handlers':
      return {
        title: e.model,
        brand: e.brand,
        refrigerants: refs(e.refrigerants),
        size: tonRange(e.minTons, e.maxTons),
        keyFacts: join(words(e.kind), e.airflowCfm != null ? `${e.airflowCfm} CFM` : undefined, e.heatKitKw ? `${e.heatKitKw} kW heat` : undefined),
      };
    case 'metering-devices':
      return { title: e.model, brand: e.brand, refrigerants: e.refrigerant, size: tonRange(e.minTons, e.maxTons), keyFacts: join(words(e.type)?.split(' (')[0], e.bidirectional ? 'Two-way' : undefined) };
    case 'rated-combinations':
      return {
        title: [e.outdoorModel, e.indoorModel].join(' + '),
        brand: e.airHandlerModel ? `with ${e.airHandlerModel}` : undefined,
        size: btuh(e.coolingBtuh),
        keyFacts: ratings(e),
      };
  }
}
