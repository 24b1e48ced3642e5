import type { OutdoorUnitSpec } from '../../schemas/equipment';
import { defineRule } from '../define-rule';
import { describeMetering, meteringInUse } from '../facts';

/** Highest nameplate voltage that is a single-phase residential rating (115, 208, 230 V). */
const SINGLE_PHASE_MAX_NAMEPLATE_V = 240;

/**
 * A hard-shutoff (non-bleed) TXV holds high and low side apart during the off cycle; a
 * single-phase compressor then starts against full head and may stall without a start assist.
 */
export const startAssist = defineRule({
  id: 'metering.start-assist',
  title: 'Start assist with a non-bleed valve',
  basis: { kind: 'common-practice', citation: "Trade practice for non-bleed TXVs on single-phase compressors; outdoor unit instructions (start kit requirement)" },
  evaluate(pairing, _context, tools) {
    const m = meteringInUse(pairing);
    if (!m || m.type !== 'txv') return [];
    const outdoor = pairing.outdoor.spec;
    if (outdoor.startAssist === true) return [];
    const phase = singlePhase(outdoor);
    if (phase === 'three') return [];
    if (phase === 'unknown') return [tools.missing('outdoor unit phase or voltage', 'start assist not checked')];
    if (m.bleed === true) return [];
    if (m.bleed === undefined) return [tools.missing(`whether ${describeMetering(m)} is a bleed type`, 'start assist not checked')];
    return [
      tools.finding({
        severity: 'caution',
        title: 'Non-bleed valve on a single-phase unit with no start assist',
        detail: `${describeMetering(m).replace(/^./, (c) => c.toUpperCase())} is a non-bleed (hard shutoff) valve and the ${phase === 'presumed' ? 'outdoor unit (presumed single-phase from its ' + outdoor.voltage + ' V rating)' : 'single-phase outdoor unit'} has no start assist: the compressor may fail to restart against unequalized pressures.`,
        fix: "Fit the hard-start kit the outdoor unit's maker lists (or use a bleed-type valve). De-energize and lock out the disconnect and discharge capacitors before wiring it.",
        values: { bleed: false, phase: outdoor.phase ?? null, voltage: outdoor.voltage ?? null, startAssist: outdoor.startAssist ?? null },
      }),
    ];
  },
});

function singlePhase(outdoor: OutdoorUnitSpec): 'yes' | 'presumed' | 'three' | 'unknown' {
  if (outdoor.phase === 1) return 'yes';
  if (outdoor.phase === 3) return 'three';
  if (!outdoor.voltage) return 'unknown';
  const highest = Math.max(...outdoor.voltage.split('/').map(Number));
  return highest <= SINGLE_PHASE_MAX_NAMEPLATE_V ? 'presumed' : 'unknown';
}
