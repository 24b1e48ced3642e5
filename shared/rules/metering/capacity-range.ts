import { defineRule } from '../define-rule';
import { fmtTons } from '../facts';

/** A field metering kit's listed tonnage range must include the outdoor unit's tons. */
export const capacityRange = defineRule({
  id: 'metering.capacity-range',
  title: 'Metering kit capacity range',
  basis: { kind: 'common-practice', citation: "Expansion valve / piston kit maker's listed capacity range" },
  evaluate(pairing, _context, tools) {
    const kit = pairing.metering?.spec;
    if (!kit) return [];
    if (kit.minTons === undefined || kit.maxTons === undefined) return [tools.missing('metering kit tonnage range', 'kit capacity not checked')];
    const tons = pairing.outdoor.spec.nominalTons;
    if (tons >= kit.minTons && tons <= kit.maxTons) return [];
    const small = tons > kit.maxTons;
    return [
      tools.finding({
        severity: 'blocker',
        title: `Metering kit covers ${fmtTons(kit.minTons)}–${fmtTons(kit.maxTons)} tons; the unit is ${fmtTons(tons)} ${tons === 1 ? 'ton' : 'tons'}`,
        detail: `Metering kit covers ${fmtTons(kit.minTons)}–${fmtTons(kit.maxTons)} tons; outdoor unit is ${fmtTons(tons)} tons (${small ? 'too small: starves the coil' : 'too large: hunts and floods back'}).`,
        fix: `Use a kit listed for ${fmtTons(tons)} tons and ${kit.refrigerant}.`,
        values: { outdoorTons: tons, kitMinTons: kit.minTons, kitMaxTons: kit.maxTons },
      }),
    ];
  },
});
