import { QueryClient } from '@tanstack/react-query';
import { describe, expect, it } from 'vitest';
import { heldCatalogItems, searchHeldItems } from '../../hooks/held-catalog';
import { catalogKeys, type CatalogEntry } from '../../hooks/use-catalog';

// Invented parts. Sizes in tons of cooling (1 ton = 12,000 Btu/h, common practice (no source)).
const HP36 = { id: 1, model: 'ZQ-HP36-454', brand: 'Zephtan', systemType: 'heat-pump', refrigerant: 'R-454B', nominalTons: 3, meteringRequired: 'txv' } as unknown as CatalogEntry;
const AC24 = { id: 2, model: 'ZQ-AC24-410', brand: 'Zephtan', systemType: 'ac', refrigerant: 'R-410A', nominalTons: 2, meteringRequired: 'any' } as unknown as CatalogEntry;
const AC48 = { id: 3, model: 'LM-AC48-32', brand: 'Lumarrow', systemType: 'ac', refrigerant: 'R-32', nominalTons: 4, meteringRequired: 'txv' } as unknown as CatalogEntry;
const COIL = { id: 7, model: 'ZQ-CL30', minTons: 2.5, maxTons: 3.5, refrigerants: ['R-454B', 'R-32'], meteringType: 'txv' } as unknown as CatalogEntry;

describe('heldCatalogItems', () => {
  it('when list pages and an item detail of one kind are cached, then each part is held once and other kinds are left out', () => {
    const client = new QueryClient();
    client.setQueryData(catalogKeys.list('outdoor-units', { q: 'zq', page: 1, pageSize: 8 }), { items: [HP36, AC24], total: 2, page: 1, pageSize: 8 });
    client.setQueryData(catalogKeys.list('outdoor-units', { q: 'hp', page: 1, pageSize: 8 }), { items: [HP36], total: 1, page: 1, pageSize: 8 });
    client.setQueryData(catalogKeys.detail('outdoor-units', 3), { item: AC48, prices: [], ratedCombinations: [] });
    client.setQueryData(catalogKeys.list('indoor-coils', { page: 1, pageSize: 20 }), { items: [COIL], total: 1, page: 1, pageSize: 20 });
    const held = heldCatalogItems(client, 'outdoor-units');
    expect(held.map((i) => i.id).sort()).toEqual([1, 2, 3]);
    expect(heldCatalogItems(client, 'indoor-coils').map((i) => i.id)).toEqual([7]);
    expect(heldCatalogItems(client, 'air-handlers')).toEqual([]);
  });
});

describe('searchHeldItems', () => {
  const held = [HP36, AC24, AC48];

  it('when the tech types part of a model with other punctuation, then that part comes first', () => {
    expect(searchHeldItems(held, 'hp36')[0].id).toBe(1);
    expect(searchHeldItems(held, 'zq hp36')[0].id).toBe(1);
  });

  it('when the tech types a brand, then only that brand’s parts match', () => {
    expect(searchHeldItems(held, 'lumarrow').map((i) => i.id)).toEqual([3]);
  });

  it('when the tech makes a typo in a model, then the fuzzy match still finds it', () => {
    expect(searchHeldItems(held, 'LM-AC84-32').map((i) => i.id)).toContain(3);
  });

  it('when nothing is typed, then every held part is listed in model order', () => {
    expect(searchHeldItems(held, '').map((i) => i.id)).toEqual([3, 2, 1]);
  });

  it('when filtered by refrigerant and size, then a coil matches by its list and range', () => {
    expect(searchHeldItems(held, '', { refrigerant: 'R-410A' }).map((i) => i.id)).toEqual([2]);
    expect(searchHeldItems(held, '', { tons: 4 }).map((i) => i.id)).toEqual([3]);
    // 3 tons lies in the coil's invented 2.5–3.5 ton range; 4 does not.
    expect(searchHeldItems([COIL], '', { refrigerant: 'R-32', tons: 3 }).map((i) => i.id)).toEqual([7]);
    expect(searchHeldItems([COIL], '', { tons: 4 })).toEqual([]);
  });

  it('when nothing held matches, then the answer is empty', () => {
    expect(searchHeldItems(held, 'qqqqqqqq')).toEqual([]);
  });
});
