import { describe, expect, it } from 'vitest';
import { breakerNonstandard } from '../../../../shared/rules/electrical/breaker-nonstandard';
import { breakerOverMocp } from '../../../../shared/rules/electrical/breaker-over-mocp';
import { breakerUnderMca } from '../../../../shared/rules/electrical/breaker-under-mca';
import { heatKitCircuit } from '../../../../shared/rules/electrical/heat-kit-circuit';
import { voltageMismatch } from '../../../../shared/rules/electrical/voltage-mismatch';
import { wireAmpacity } from '../../../../shared/rules/electrical/wire-ampacity';
import { electricalRules } from '../../../../shared/rules/electrical';
import { expectWellFormed, pairing, run, severities } from '../reference-fixtures';

// Nameplate MCA 21.2 A / MOCP 35 A: RLA 16.0 + fan 1.2 (NEC 440.33 / 440.22(A), values.json EL-04/EL-05)
const unit = { mcaAmps: 21.2, mocpAmps: 35, voltage: '208/230', phase: 1 as const };

describe('electrical.breaker-over-mocp', () => {
  it.each([
    [35, []], // exactly at MOCP passes (NEC 440.22(C))
    [36, ['blocker']], // one amp over fails
    [40, ['blocker']],
    [25, []],
  ])('when the breaker is %d A on a 35 A MOCP unit, then %j', (breakerAmps, expected) => {
    expect(severities(breakerOverMocp, pairing({ outdoor: unit, electrical: { breakerAmps } }))).toEqual(expected);
  });

  it('when no breaker is given, then it says electrical was not checked', () => {
    expect(severities(breakerOverMocp, pairing({ outdoor: unit }))).toEqual(['missing']);
  });

  it('when the unit gives no MOCP, then it says so', () => {
    expect(severities(breakerOverMocp, pairing({ outdoor: { mcaAmps: 21.2 }, electrical: { breakerAmps: 30 } }))).toEqual(['missing']);
  });

  it('when it fires, then the finding carries the numbers and the licensed-electrician caution', () => {
    const [f] = run(breakerOverMocp, pairing({ outdoor: unit, electrical: { breakerAmps: 40 } }));
    expect(f.detail).toContain('40 A');
    expect(f.detail).toContain('35 A');
    expect(f.fix).toMatch(/licensed electrician/);
    expect(f.values).toMatchObject({ breakerAmps: 40, mocpAmps: 35 });
    expectWellFormed(breakerOverMocp, [f]);
  });
});

describe('electrical.breaker-under-mca', () => {
  it.each([
    [21.2, []], // at MCA passes (trade practice: between MCA and MOCP)
    [25, []],
    [20, ['blocker']],
    [15, ['blocker']],
  ])('when the breaker is %d A on a 21.2 A MCA unit, then %j', (breakerAmps, expected) => {
    expect(severities(breakerUnderMca, pairing({ outdoor: unit, electrical: { breakerAmps } }))).toEqual(expected);
  });

  it('when it fires, then it suggests the next standard size', () => {
    const [f] = run(breakerUnderMca, pairing({ outdoor: unit, electrical: { breakerAmps: 20 } }));
    // NEC 240.6(A): next standard size at or above 21.2 A is 25 A
    expect(f.values.suggestedBreakerAmps).toBe(25);
    expect(f.fix).toMatch(/AHJ/);
  });
});

describe('electrical.breaker-nonstandard', () => {
  it.each([
    [30, []],
    [25, []],
    [32, ['caution']], // not in NEC 240.6(A)
    [55, ['caution']], // 55 A is not standard (values.json EL-03 notes)
  ])('when the breaker is %d A, then %j', (breakerAmps, expected) => {
    expect(severities(breakerNonstandard, pairing({ outdoor: unit, electrical: { breakerAmps } }))).toEqual(expected);
  });

  it('when it fires, then it lists the standard sizes between MCA and MOCP', () => {
    const [f] = run(breakerNonstandard, pairing({ outdoor: unit, electrical: { breakerAmps: 32 } }));
    // NEC 240.6(A) sizes in 21.2..35 A: 25, 30, 35
    expect(f.values.standardSizes).toBe('25;30;35');
    expect(f.detail).toContain('25 A, 30 A, 35 A');
  });

  it('when MCA/MOCP are unknown, then it lists the neighbouring standard sizes', () => {
    const [f] = run(breakerNonstandard, pairing({ electrical: { breakerAmps: 32 } }));
    expect(f.values.standardSizes).toBe('30;35');
  });
});

describe('electrical.wire-ampacity', () => {
  it.each([
    // NEC Table 310.16 copper (values.json EL-01) at the NEC 110.14(C) column
    [{ wireAwg: 12 as const, wireMaterial: 'copper' as const }, 21.2, ['blocker']], // 20 A at 60 °C < 21.2
    [{ wireAwg: 12 as const, wireMaterial: 'copper' as const, terminalRatingC: 75 as const }, 21.2, ['info']], // 25 A at 75 °C passes; 30 A breaker on 12 AWG gets the 240.4(G) note
    [{ wireAwg: 10 as const, wireMaterial: 'copper' as const }, 30, []], // 30 A at 60 °C = MCA passes
    [{ wireAwg: 10 as const, wireMaterial: 'copper' as const }, 30.1, ['blocker']],
    // aluminum from memory of Table 310.16: 10 AWG Al 25 A at 60 °C
    [{ wireAwg: 10 as const, wireMaterial: 'aluminum' as const }, 26, ['blocker']],
    [{ wireAwg: 8 as const, wireMaterial: 'aluminum' as const, terminalRatingC: 75 as const }, 40, []],
  ])('when the wire is %j and MCA %d A, then %j', (wire, mcaAmps, expected) => {
    expect(severities(wireAmpacity, pairing({ outdoor: { mcaAmps, mocpAmps: 60 }, electrical: { breakerAmps: 30, ...wire } }))).toEqual(expected);
  });

  it('when the wire is 14 AWG aluminum, then it is a blocker (no ampacity in the table)', () => {
    expect(severities(wireAmpacity, pairing({ outdoor: { mcaAmps: 10 }, electrical: { breakerAmps: 15, wireAwg: 14, wireMaterial: 'aluminum' } }))).toEqual(['blocker']);
  });

  it('when 12 AWG copper at 75 °C is on a 30 A breaker, then a note cites NEC 240.4(G)', () => {
    // NEC 240.4(D) limits 12 AWG Cu to 20 A; 240.4(G) lifts it for Article 440 circuits (values.json EL-02)
    const findings = run(wireAmpacity, pairing({ outdoor: unit, electrical: { breakerAmps: 30, wireAwg: 12, wireMaterial: 'copper', terminalRatingC: 75 } }));
    expect(findings.map((f) => f.severity)).toEqual(['info']);
    expect(findings[0].detail).toMatch(/240\.4\(G\)/);
  });

  it('when it fires, then the detail names the column and the numbers', () => {
    const [f] = run(wireAmpacity, pairing({ outdoor: unit, electrical: { breakerAmps: 25, wireAwg: 12, wireMaterial: 'copper' } }));
    expect(f.detail).toContain('20 A');
    expect(f.detail).toContain('60 °C');
    expect(f.values).toMatchObject({ ampacityAmps: 20, mcaAmps: 21.2, columnC: 60 });
  });
});

describe('electrical.voltage-mismatch', () => {
  it.each([
    // 208/230 nameplate, ±10 % utilization range 187–253 V (common practice, printed on nameplates)
    [187, []],
    [186, ['blocker']],
    [253, []],
    [254, ['blocker']],
    [240, []],
  ])('when the supply is %d V on a 208/230 unit, then %j', (supplyVoltage, expected) => {
    expect(severities(voltageMismatch, pairing({ outdoor: unit, electrical: { supplyVoltage } }))).toEqual(expected);
  });

  it('when the phase differs, then it is a blocker', () => {
    expect(severities(voltageMismatch, pairing({ outdoor: unit, electrical: { supplyVoltage: 230, supplyPhase: 3 } }))).toEqual(['blocker']);
    expect(severities(voltageMismatch, pairing({ outdoor: unit, electrical: { supplyVoltage: 230, supplyPhase: 1 } }))).toEqual([]);
  });

  it('when the supply voltage is not given, then it says so', () => {
    expect(severities(voltageMismatch, pairing({ outdoor: unit, electrical: {} }))).toEqual(['missing']);
  });
});

describe('electrical.heat-kit-circuit', () => {
  const ah = { kind: 'air-handler' as const, mcaAmps: 52, mocpAmps: 60, heatKitKw: 10, voltage: '208/240' };

  it.each([
    // 6 AWG Cu 55 A at 60 °C (NEC Table 310.16, values.json EL-01) ≥ 52 A MCA; 60 A = MOCP passes
    [{ breakerAmps: 60, wireAwg: 6 as const, supplyVoltage: 240 }, ['info']],
    [{ breakerAmps: 70, wireAwg: 6 as const, supplyVoltage: 240 }, ['blocker', 'info']],
    [{ breakerAmps: 50, wireAwg: 6 as const, supplyVoltage: 240 }, ['blocker', 'info']],
    // 8 AWG Cu 40 A at 60 °C < 52 A
    [{ breakerAmps: 60, wireAwg: 8 as const, supplyVoltage: 240 }, ['blocker', 'info']],
    [{ breakerAmps: 60, wireAwg: 6 as const, supplyVoltage: 180 }, ['blocker', 'info']],
  ])('when the air handler circuit is %j, then %j', (e, expected) => {
    expect(severities(heatKitCircuit, pairing({ airHandler: ah, indoorElectrical: e }))).toEqual(expected);
  });

  it('when a 10 kW kit rated 240 V runs on 208 V, then the note gives about 7.51 kW', () => {
    // resistive heater P ∝ V²: 10 × (208/240)² = 7.51 kW
    const f = run(heatKitCircuit, pairing({ airHandler: ah, indoorElectrical: { breakerAmps: 60, wireAwg: 6, supplyVoltage: 208 } })).at(-1)!;
    expect(f.values.outputKw).toBeCloseTo(7.51, 2);
    expect(f.values.ratedVoltage).toBe(240);
  });

  it('when the air handler has a heat kit but no circuit is given, then it says so', () => {
    expect(severities(heatKitCircuit, pairing({ airHandler: ah }))).toEqual(['missing']);
  });

  it('when the indoor unit is a furnace, then the rule does not apply', () => {
    expect(severities(heatKitCircuit, pairing({ airHandler: { kind: 'furnace' } }))).toEqual([]);
  });
});

describe('electricalRules', () => {
  it('when the family is listed, then it has the contract ids', () => {
    expect(electricalRules.map((r) => r.id).sort()).toEqual([
      'electrical.breaker-nonstandard',
      'electrical.breaker-over-mocp',
      'electrical.breaker-under-mca',
      'electrical.disconnect',
      'electrical.heat-kit-circuit',
      'electrical.overcurrent-type',
      'electrical.voltage-mismatch',
      'electrical.wire-ampacity',
    ]);
    expect(electricalRules.every((r) => r.family === 'electrical')).toBe(true);
  });
});
