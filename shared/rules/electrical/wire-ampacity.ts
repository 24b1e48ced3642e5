import { ARTICLE_440_NOTE, conductorAmpacity, conductorColumnC, SMALL_CONDUCTOR_MAX_OCPD_AMPS } from '../../electrical';
import { defineRule } from '../define-rule';
import type { Finding } from '../types';
import { ELECTRICAL_SAFETY } from '../../electrical/safety-text';

/** Conductor ampacity at the terminal temperature column (NEC 110.14(C), Table 310.16) against the MCA (NEC 440.35). */
export const wireAmpacity = defineRule({
  id: 'electrical.wire-ampacity',
  title: 'Wire ampacity',
  basis: { kind: 'standard', citation: 'NEC Table 310.16 at the NEC 110.14(C) terminal rating; NEC 440.35 (conductors sized to the nameplate MCA)' },
  evaluate(pairing, _context, tools) {
    const e = pairing.electrical;
    if (!e) return [];
    const { wireAwg, wireMaterial } = e;
    if (wireAwg === undefined || wireMaterial === undefined) {
      if (wireAwg === undefined && wireMaterial === undefined) return [tools.missing('wire size and material', 'wire ampacity not checked')];
      return [tools.missing(wireAwg === undefined ? 'wire size' : 'wire material (copper or aluminum)', 'wire ampacity not checked')];
    }
    if (wireMaterial === 'aluminum' && pairing.outdoor.spec.copperOnly === true) {
      return [
        tools.finding({
          severity: 'blocker',
          title: 'Aluminum wire on a unit marked for copper conductors only',
          detail: `The outdoor unit's nameplate calls for copper conductors only, and ${wireAwg} AWG aluminum is run to it.`,
          fix: `Run copper conductors sized for the nameplate MCA to the unit's terminals. ${ELECTRICAL_SAFETY}`,
          basis: { kind: 'standard', citation: 'NEC 110.3(B): install per the listing and labeling (nameplate "use copper conductors only")' },
          values: { wireAwg: String(wireAwg), wireMaterial, copperOnly: true },
        }),
      ];
    }
    const mca = pairing.outdoor.spec.mcaAmps;
    if (mca === undefined) return [tools.missing("outdoor unit's MCA", 'wire size not checked')];
    const cable60 = e.conductorType === 'nm-b' || e.conductorType === 'uf-b';
    const column = conductorColumnC(e.terminalRatingC, e.conductorType);
    const wire = `${wireAwg} AWG ${wireMaterial}`;
    const ampacity = conductorAmpacity(wireAwg, wireMaterial, column);
    const values = { wireAwg: String(wireAwg), wireMaterial, columnC: column, ampacityAmps: ampacity ?? null, mcaAmps: mca };
    if (ampacity === undefined) {
      return [
        tools.finding({
          severity: 'blocker',
          title: `${wire} has no listed ampacity for this circuit`,
          detail: `NEC Table 310.16 gives no ampacity for ${wire}; it may not be used for this ${mca} A circuit.`,
          fix: `Run a conductor whose ampacity at the ${column} °C column is at least ${mca} A. ${ELECTRICAL_SAFETY}`,
          values,
        }),
      ];
    }
    const columnWhy = cable60
      ? `60 °C column, as ${e.conductorType === 'nm-b' ? 'NM-B cable is held to it (NEC 334.80)' : 'UF-B cable is held to it (NEC 340.80)'}`
      : column === 60
        ? '60 °C column, as both ends are not shown marked 75 °C'
        : '75 °C column, both ends marked 75 °C';
    if (ampacity < mca) {
      return [
        tools.finding({
          severity: 'blocker',
          title: `${wire} carries ${ampacity} A; the unit needs ${mca} A`,
          detail: `${wire} carries ${ampacity} A at the ${columnWhy}, below the outdoor unit's ${mca} A MCA.`,
          fix: `Run a larger conductor (ampacity at least ${mca} A at the ${column} °C column)${cable60 ? '' : ', or confirm both terminations are marked 75 °C'}. ${ELECTRICAL_SAFETY}`,
          values,
        }),
      ];
    }
    const findings: Finding[] = [];
    const smallLimit = SMALL_CONDUCTOR_MAX_OCPD_AMPS[wireMaterial][String(wireAwg)];
    if (smallLimit !== undefined && e.breakerAmps !== undefined && e.breakerAmps > smallLimit) {
      findings.push(
        tools.finding({
          severity: 'info',
          title: `${wire} on a ${e.breakerAmps} A breaker is allowed for this unit`,
          basis: { kind: 'standard', citation: 'NEC 240.4(G) and Article 440 Part III: motor-compressor circuits are protected per the nameplate MOCP, not 240.4(D)' },
          detail: `${wire} on a ${e.breakerAmps} A breaker exceeds the general ${smallLimit} A limit of NEC 240.4(D), which does not apply here. ${ARTICLE_440_NOTE}`,
          fix: '',
          values: { ...values, breakerAmps: e.breakerAmps, smallConductorLimitAmps: smallLimit },
        }),
      );
    }
    return findings;
  },
});
