import { defineRule } from '../define-rule';
import { fmtTons } from '../facts';

/** Outdoor nominal tons against the indoor coil's listed range: outside it, the coil cannot carry the load (or starves the compressor). */
export const coilRange = defineRule({
  id: 'capacity.coil-range',
  title: 'Indoor coil capacity range',
  basis: { kind: 'common-practice', citation: "Coil manufacturer's listed tonnage range; matched-system practice (AHRI 210/240 rates matched coils)" },
  evaluate(pairing, _context, tools) {
    const coil = pairing.indoorCoil?.spec;
    if (!coil) return pairing.airHandler ? [] : [tools.missing('indoor coil', 'coil capacity not checked')];
    const tons = pairing.outdoor.spec.nominalTons;
    if (tons >= coil.minTons && tons <= coil.maxTons) return [];
    const under = tons > coil.maxTons;
    return [
      tools.finding({
        severity: 'blocker',
        title: `Coil covers ${fmtTons(coil.minTons)}–${fmtTons(coil.maxTons)} tons; the unit is ${fmtTons(tons)} ${tons === 1 ? 'ton' : 'tons'}`,
        detail: `Coil covers ${fmtTons(coil.minTons)}–${fmtTons(coil.maxTons)} tons; outdoor unit is ${fmtTons(tons)} tons.`,
        fix: under
          ? `Choose a coil rated for ${fmtTons(tons)} tons (its range must include it), or a smaller outdoor unit.`
          : `Choose a coil whose range starts at or below ${fmtTons(tons)} tons, or a larger outdoor unit.`,
        values: { outdoorTons: tons, coilMinTons: coil.minTons, coilMaxTons: coil.maxTons },
      }),
    ];
  },
});
