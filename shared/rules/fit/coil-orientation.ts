import type { AIRFLOW_DIRECTIONS } from '../../schemas/check';
import type { COIL_CONFIGURATIONS } from '../../schemas/equipment';
import { defineRule } from '../define-rule';
import { capitalize, withArticle } from '../text';
import { CONFIGURATION_WORDS, DIRECTION_WORDS } from '../words';

type Direction = (typeof AIRFLOW_DIRECTIONS)[number];
type Configuration = (typeof COIL_CONFIGURATIONS)[number];

/** Directions each coil configuration is built for; its drain pan sits under the coil only for these. */
const FITS: Record<Configuration, readonly Direction[]> = {
  upflow: ['upflow'],
  downflow: ['downflow'],
  horizontal: ['horizontal-left', 'horizontal-right'],
  'multi-position': ['upflow', 'downflow', 'horizontal-left', 'horizontal-right'],
};

/** A coil installed in an airflow direction it is not built for drains wrong (the pan is on the wrong side). */
export const coilOrientation = defineRule({
  id: 'fit.coil-orientation',
  title: 'Coil airflow direction',
  basis: { kind: 'common-practice', citation: "Coil installation instructions (listed positions); condensate must reach the coil's drain pan" },
  evaluate(pairing, _context, tools) {
    const coil = pairing.indoorCoil?.spec;
    if (!coil) return [];
    if (!coil.configuration) return [tools.missing('coil configuration (upflow, downflow, horizontal or multi-position)', 'coil orientation not checked')];
    const direction = pairing.site?.airflowDirection;
    if (!direction) return [tools.missing('airflow direction of the installation', 'coil orientation not checked')];
    if (FITS[coil.configuration].includes(direction)) return [];
    return [
      tools.finding({
        severity: 'blocker',
        title: `${capitalize(CONFIGURATION_WORDS[coil.configuration])} coil installed ${DIRECTION_WORDS[direction]}`,
        detail: `${capitalize(withArticle(CONFIGURATION_WORDS[coil.configuration]))} coil is being installed ${DIRECTION_WORDS[direction]}: its drain pan will not catch the condensate, which runs off into the cabinet or the building.`,
        fix: `Use a coil listed for ${DIRECTION_WORDS[direction]} airflow (a multi-position coil fits every direction).`,
        values: { configuration: coil.configuration, airflowDirection: direction },
      }),
    ];
  },
});
