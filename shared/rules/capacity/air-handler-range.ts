import { defineRule } from '../define-rule';
import { fmtTons } from '../facts';

/** Outdoor nominal tons against the air handler's (or furnace blower's) listed range. */
export const airHandlerRange = defineRule({
  id: 'capacity.air-handler-range',
  title: 'Air handler capacity range',
  basis: { kind: 'common-practice', citation: "Air handler / furnace manufacturer's listed cooling tonnage range" },
  evaluate(pairing, _context, tools) {
    const ah = pairing.airHandler?.spec;
    if (!ah) return [];
    if (ah.minTons === undefined || ah.maxTons === undefined) {
      return [tools.missing(`${ah.kind === 'furnace' ? 'furnace' : 'air handler'} tonnage range`, 'blower capacity not checked against the outdoor unit')];
    }
    const tons = pairing.outdoor.spec.nominalTons;
    if (tons >= ah.minTons && tons <= ah.maxTons) return [];
    const name = ah.kind === 'furnace' ? 'Furnace blower' : 'Air handler';
    return [
      tools.finding({
        severity: 'blocker',
        title: `${name} covers ${fmtTons(ah.minTons)}–${fmtTons(ah.maxTons)} tons; the unit is ${fmtTons(tons)} ${tons === 1 ? 'ton' : 'tons'}`,
        detail: `${name} covers ${fmtTons(ah.minTons)}–${fmtTons(ah.maxTons)} tons; outdoor unit is ${fmtTons(tons)} tons.`,
        fix: `Use ${ah.kind === 'furnace' ? 'a furnace' : 'an air handler'} whose cooling range includes ${fmtTons(tons)} tons, or resize the outdoor unit.`,
        values: { outdoorTons: tons, airHandlerMinTons: ah.minTons, airHandlerMaxTons: ah.maxTons },
      }),
    ];
  },
});
