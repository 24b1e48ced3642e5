// Sources: IPCC AR4 WG1 (2007) Table 2.14, 100-year GWP (HCFC-22 1810, HFC-32 675, HFC-125 3500,
// HFC-134a 1430); R-1234yf 4 is the AR4-era value US rules use (from memory: not in AR4 Table 2.14).
// US rules (EPA, AIM Act 40 CFR 84) use the AR4 basis; newer reports print other values — do not mix.

/** A pure refrigerant that the blends are made of, with its AR4 100-year GWP (dimensionless). */
export interface RefrigerantComponent {
  id: string;
  gwp100Ar4: number;
}

export const COMPONENTS: Record<string, RefrigerantComponent> = {
  'R-22': { id: 'R-22', gwp100Ar4: 1810 },
  'R-32': { id: 'R-32', gwp100Ar4: 675 },
  'R-125': { id: 'R-125', gwp100Ar4: 3500 },
  'R-134a': { id: 'R-134a', gwp100Ar4: 1430 },
  'R-1234yf': { id: 'R-1234yf', gwp100Ar4: 4 },
};

/** GWP of a blend as the mass-fraction weighted sum of its components' AR4 GWPs (dimensionless). */
export function blendGwp(composition: Record<string, number>): number {
  let total = 0;
  for (const [id, massPct] of Object.entries(composition)) {
    const component = COMPONENTS[id];
    if (!component) throw new Error(`unknown refrigerant component ${id}`);
    total += (massPct / 100) * component.gwp100Ar4;
  }
  return total;
}
