import { describe, expect, it } from 'vitest';
import { evaluateEvacuation, evaluatePressureTest, temperatureDropPsi } from '../../../shared/commissioning';

// Defaults: 500-micron target, decay under 1,000 microns over 10 minutes — common practice (no source), values.json EV-01.
describe('evacuation', () => {
  it('when the vacuum reaches 400 microns and holds under 1,000 for 10 minutes, then it passes', () => {
    expect(evaluateEvacuation({ finalMicrons: 400, decayMicrons: 800, holdMinutes: 10 }).pass).toBe(true);
  });

  it('when the vacuum stops at 700 microns, then it fails against the 500-micron target', () => {
    const v = evaluateEvacuation({ finalMicrons: 700, decayMicrons: 800, holdMinutes: 10 });
    expect(v.pass).toBe(false);
    expect(v.reason).toMatch(/700 microns.*500-micron/);
  });

  it('when the decay test rises to 1,500 microns, then it fails with leak or moisture advice', () => {
    const v = evaluateEvacuation({ finalMicrons: 450, decayMicrons: 1500, holdMinutes: 10 });
    expect(v.pass).toBe(false);
    expect(v.reason).toMatch(/leak/);
  });

  it('when no decay test or too short a hold is recorded, then it is not judged yet', () => {
    expect(evaluateEvacuation({ finalMicrons: 450 }).pass).toBeUndefined();
    expect(evaluateEvacuation({ finalMicrons: 450, decayMicrons: 600, holdMinutes: 5 }).pass).toBeUndefined();
  });

  it('when the shop asks for 300 microns, then 400 microns fails', () => {
    // UFGS refrigerant-piping example: evacuate to 300 microns (values.json EV-01)
    expect(evaluateEvacuation({ finalMicrons: 400, decayMicrons: 450, holdMinutes: 60 }, { evacuationTargetMicrons: 300 }).pass).toBe(false);
  });
});

describe('nitrogen pressure test', () => {
  it('when 300 psig cools from 80 °F to 70 °F, then the ideal-gas drop is about 5.8 psi', () => {
    // values.json EV-02: ΔP = P_abs × ΔT / T_abs = 314.7 × 10 / 539.67 = 5.83 psi (±0.3)
    expect(Math.abs(temperatureDropPsi({ testPsig: 300, startTempF: 80, endTempF: 70 }) - 5.83)).toBeLessThanOrEqual(0.3);
  });

  it('when the pressure holds 30 minutes with no drop, then it passes', () => {
    // Hold at least 15 minutes — values.json EV-02 (common practice)
    expect(evaluatePressureTest({ testPsig: 300, holdMinutes: 30, dropPsig: 0, maxTestPsig: 400 }).pass).toBe(true);
  });

  it('when a 6 psi drop matches a 10 °F cooling, then it passes; without the temperatures it fails', () => {
    // EV-02 ideal-gas allowance 5.8 psi plus 1 psi gauge reading (common practice (no source))
    expect(evaluatePressureTest({ testPsig: 300, holdMinutes: 30, dropPsig: 6, startTempF: 80, endTempF: 70 }).pass).toBe(true);
    expect(evaluatePressureTest({ testPsig: 300, holdMinutes: 30, dropPsig: 6 }).pass).toBe(false);
  });

  it('when the test pressure is above what the unit allows, then it fails', () => {
    const v = evaluatePressureTest({ testPsig: 450, holdMinutes: 30, dropPsig: 0, maxTestPsig: 400 });
    expect(v.pass).toBe(false);
    expect(v.reason).toMatch(/450 psig.*400 psig/);
  });

  it('when the hold is too short or the final pressure is missing, then it is not judged yet', () => {
    expect(evaluatePressureTest({ testPsig: 300, holdMinutes: 10, dropPsig: 0 }).pass).toBeUndefined();
    expect(evaluatePressureTest({ testPsig: 300, holdMinutes: 30 }).pass).toBeUndefined();
  });
});
