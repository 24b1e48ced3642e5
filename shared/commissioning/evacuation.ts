import { atmosphericPsia } from '../refrigerants/atmosphere';
import { resolveCommissioningSettings, type CommissioningSettingsInput } from './settings';

// Evacuation: pull to the shop's target (default 500 microns), isolate the pump, and hold; a reading
// that stays under the decay limit (default 1,000 microns) over the hold (default 10 minutes) passes —
// common practice (no source; values.json EV-01). A rise that keeps climbing points to a leak, one that
// levels off to moisture.
// Nitrogen test: dry nitrogen at a pressure no higher than the unit's installation instructions allow
// (the low side usually governs), held at least 15 minutes with no drop beyond what a temperature
// change explains (ideal gas: ΔP = P_abs × ΔT / T_abs, values.json EV-02) — common practice.

export interface TestVerdict {
  /** true passed, false failed, undefined not enough to judge. */
  pass: boolean | undefined;
  /** One plain sentence with the numbers. */
  reason: string;
}

export interface EvacuationInput {
  /** Deepest vacuum reached, in microns of mercury (absolute). */
  finalMicrons: number;
  /** Reading in microns at the end of the decay hold, pump isolated. */
  decayMicrons?: number;
  /** How long the decay test was held, in minutes. */
  holdMinutes?: number;
}

const int = (v: number) => Math.round(v).toLocaleString('en-US');

/** Pass/fail of an evacuation (microns, minutes) against the shop's targets. */
export function evaluateEvacuation(input: EvacuationInput, settingsInput: CommissioningSettingsInput = {}): TestVerdict {
  const s = resolveCommissioningSettings(settingsInput);
  if (!Number.isFinite(input.finalMicrons) || input.finalMicrons < 0) return { pass: undefined, reason: 'Enter the final vacuum in microns.' };
  if (input.finalMicrons > s.evacuationTargetMicrons) {
    return { pass: false, reason: `The vacuum reached ${int(input.finalMicrons)} microns, above the ${int(s.evacuationTargetMicrons)}-micron target: keep evacuating and look for a leak or moisture.` };
  }
  if (input.decayMicrons === undefined || !Number.isFinite(input.decayMicrons)) {
    return { pass: undefined, reason: `The vacuum reached ${int(input.finalMicrons)} microns; isolate the pump and record the decay test (${int(s.decayHoldMinutes)} minutes, under ${int(s.decayLimitMicrons)} microns).` };
  }
  if (input.decayMicrons > s.decayLimitMicrons) {
    return {
      pass: false,
      reason: `The vacuum rose to ${int(input.decayMicrons)} microns, above the ${int(s.decayLimitMicrons)}-micron limit: a rise that keeps climbing means a leak, one that levels off means moisture — find it and evacuate again.`,
    };
  }
  if (input.holdMinutes === undefined || !Number.isFinite(input.holdMinutes) || input.holdMinutes < s.decayHoldMinutes) {
    const held = input.holdMinutes === undefined ? 'the hold time is not recorded' : `it was held ${int(input.holdMinutes)} minutes`;
    return { pass: undefined, reason: `The decay test stayed at ${int(input.decayMicrons)} microns, but ${held}; hold it at least ${int(s.decayHoldMinutes)} minutes.` };
  }
  return {
    pass: true,
    reason: `Passed: ${int(input.finalMicrons)} microns reached and ${int(input.decayMicrons)} microns after ${int(input.holdMinutes)} minutes, under the ${int(s.decayLimitMicrons)}-micron limit.`,
  };
}

export interface PressureTestInput {
  /** Nitrogen test pressure in psig. */
  testPsig: number;
  /** Hold time in minutes. */
  holdMinutes: number;
  /** Pressure drop over the hold in psi (0 = none). */
  dropPsig?: number;
  /** Highest test pressure in psig the unit's installation instructions allow. */
  maxTestPsig?: number;
  /** Line-set or ambient temperature in °F at the start and end of the hold, to allow for a temperature change. */
  startTempF?: number;
  endTempF?: number;
  /** Altitude in ft, for the absolute pressure in the temperature allowance. */
  altitudeFt?: number;
}

/** Shortest nitrogen hold in minutes (values.json EV-02: hold at least 15–30 min) — common practice. */
export const MIN_NITROGEN_HOLD_MINUTES = 15;
/** Drop in psi a gauge can show without a leak (reading resolution) — common practice (no source). */
export const GAUGE_ALLOWANCE_PSI = 1;

/** Pass/fail of a standing nitrogen pressure test (psig, minutes, °F) against the unit's limit. */
export function evaluatePressureTest(input: PressureTestInput, _settingsInput: CommissioningSettingsInput = {}): TestVerdict {
  if (!Number.isFinite(input.testPsig) || input.testPsig <= 0) return { pass: undefined, reason: 'Enter the nitrogen test pressure in psig.' };
  if (input.maxTestPsig !== undefined && input.testPsig > input.maxTestPsig) {
    return { pass: false, reason: `The test pressure ${int(input.testPsig)} psig is above the ${int(input.maxTestPsig)} psig the unit's instructions allow: release to that pressure or below and test again.` };
  }
  if (!Number.isFinite(input.holdMinutes) || input.holdMinutes < MIN_NITROGEN_HOLD_MINUTES) {
    return { pass: undefined, reason: `Hold the nitrogen at least ${MIN_NITROGEN_HOLD_MINUTES} minutes (held ${Number.isFinite(input.holdMinutes) ? int(input.holdMinutes) : 'an unknown time'}).` };
  }
  if (input.dropPsig === undefined || !Number.isFinite(input.dropPsig)) return { pass: undefined, reason: 'Record the pressure after the hold to finish the test.' };
  const allowancePsi = GAUGE_ALLOWANCE_PSI + temperatureDropPsi(input);
  const limitNote = input.maxTestPsig === undefined ? ' Confirm the test pressure against the unit\'s installation instructions.' : '';
  if (input.dropPsig > allowancePsi) {
    return { pass: false, reason: `The pressure fell ${fmtPsi(input.dropPsig)} psi in ${int(input.holdMinutes)} minutes, more than the ${fmtPsi(allowancePsi)} psi a temperature change and the gauge explain: find the leak and test again.${limitNote}` };
  }
  return { pass: true, reason: `Passed: ${int(input.testPsig)} psig held ${int(input.holdMinutes)} minutes with a ${fmtPsi(input.dropPsig)} psi drop (allowed ${fmtPsi(allowancePsi)} psi).${limitNote}` };
}

/** Pressure drop in psi that cooling from startTempF to endTempF explains (ideal gas at the test pressure); 0 when not given or warming. */
export function temperatureDropPsi(input: Pick<PressureTestInput, 'testPsig' | 'startTempF' | 'endTempF' | 'altitudeFt'>): number {
  if (input.startTempF === undefined || input.endTempF === undefined) return 0;
  const fallF = input.startTempF - input.endTempF;
  if (!(fallF > 0)) return 0;
  // Absolute pressure through the standard atmosphere at the site (atmosphere.ts).
  const psia = input.testPsig + atmosphericPsia(input.altitudeFt ?? 0);
  return (psia * fallF) / (input.startTempF + 459.67);
}

const fmtPsi = (v: number) => (Math.round(v * 10) / 10).toString();
