import { describe, expect, it } from 'vitest';
import { refrigerantRules } from '../../../../shared/rules/refrigerant';
import { a2lChargeArea } from '../../../../shared/rules/refrigerant/a2l-charge-area';
import { a2lListing } from '../../../../shared/rules/refrigerant/a2l-listing';
import { coilListing } from '../../../../shared/rules/refrigerant/coil-listing';
import { meteringDevice } from '../../../../shared/rules/refrigerant/metering-device';
import { oilCompatibility } from '../../../../shared/rules/refrigerant/oil-compatibility';
import { maxChargeUnventilatedOz } from '../../../../shared/refrigerants/a2l-charge';
import { expectWellFormed, pairing, run, severities } from '../reference-fixtures';

describe('refrigerant.metering-device', () => {
  it.each([
    ['coil TXV for R-410A on R-410A', { coil: { meteringRefrigerant: 'R-410A' as const } }, []],
    ['coil TXV for R-22 on R-410A', { coil: { meteringRefrigerant: 'R-22' as const } }, ['blocker']],
    ['kit for R-410A overrides a coil TXV for R-22', { coil: { meteringRefrigerant: 'R-22' as const }, metering: { refrigerant: 'R-410A' as const } }, []],
    ['kit for R-22 on a good coil', { metering: { refrigerant: 'R-22' as const } }, ['blocker']],
    ['piston with no refrigerant', { coil: { meteringType: 'piston' as const, meteringRefrigerant: undefined } }, ['caution']],
    ['TXV with no refrigerant', { coil: { meteringRefrigerant: undefined } }, ['missing']],
    ['coil with no metering device', { coil: { meteringType: 'none' as const, meteringRefrigerant: undefined } }, ['caution']],
  ])('when %s, then %j', (_name, input, expected) => {
    expect(severities(meteringDevice, pairing(input))).toEqual(expected);
  });

  it('when it fires, then the detail names both refrigerants', () => {
    const findings = run(meteringDevice, pairing({ outdoor: { refrigerant: 'R-454B' }, coil: { refrigerants: ['R-454B'], meteringRefrigerant: 'R-410A' } }));
    expect(findings[0].detail).toMatch(/R-410A.*R-454B/);
    expect(findings[0].values).toMatchObject({ systemRefrigerant: 'R-454B', meteringRefrigerant: 'R-410A', source: 'coil' });
    expectWellFormed(meteringDevice, findings);
  });
});

describe('refrigerant.coil-listing', () => {
  it.each([
    ['coil listed for the system', {}, []],
    ['coil listed for R-22 only', { coil: { refrigerants: ['R-22' as const] } }, ['blocker']],
    ['dual-listed coil', { coil: { refrigerants: ['R-22' as const, 'R-410A' as const] } }, []],
    ['air handler listed for another refrigerant', { airHandler: { refrigerants: ['R-22' as const] } }, ['blocker']],
    ['furnace with no listing', { airHandler: { kind: 'furnace' as const } }, []],
  ])('when %s, then %j', (_name, input, expected) => {
    expect(severities(coilListing, pairing(input))).toEqual(expected);
  });
});

const a2lCoil = { refrigerants: ['R-454B' as const], meteringRefrigerant: 'R-454B' as const, leakSensor: true };
// R-454B unit: 120 oz for 15 ft, 0.6 oz/ft (LS-03 trade practice), 25 ft line → 126 oz
const a2lUnit = { refrigerant: 'R-454B' as const, factoryChargeOz: 120, chargedLineLengthFt: 15, chargePerFtOz: 0.6 };

describe('refrigerant.a2l-listing', () => {
  it.each([
    ['A1 system', {}, []],
    ['A2L system with listed coil and sensor', { outdoor: a2lUnit, coil: a2lCoil, lineSet: {} }, []],
    ['A2L system with an R-410A-only coil', { outdoor: a2lUnit, coil: { refrigerants: ['R-410A' as const] } }, ['blocker']],
    ['A2L coil marked not listed', { outdoor: a2lUnit, coil: { ...a2lCoil, a2lListed: false } }, ['blocker']],
    ['listed coil on an unlisted furnace', { outdoor: a2lUnit, coil: a2lCoil, airHandler: { kind: 'furnace' as const } }, ['blocker']],
    ['listed coil on a listed air handler', { outdoor: a2lUnit, coil: a2lCoil, airHandler: { a2lListed: true } }, []],
    // UL 60335-2-40 3rd ed. GG.1: 126 oz > m1 = 6 m³ × 0.296 kg/m³ = 1.776 kg = 62.6 oz → sensor required
    ['no leak sensor, charge above m1', { outdoor: a2lUnit, coil: { ...a2lCoil, leakSensor: false }, lineSet: {} }, ['blocker']],
    ['no leak sensor, charge unknown', { outdoor: a2lUnit, coil: { ...a2lCoil, leakSensor: false } }, ['caution']],
    ['no leak sensor, small charge under m1', { outdoor: { ...a2lUnit, factoryChargeOz: 30 }, coil: { ...a2lCoil, leakSensor: false }, lineSet: { lengthFt: 15 } }, []],
    ['leak sensor not stated', { outdoor: a2lUnit, coil: { ...a2lCoil, leakSensor: undefined } }, ['missing']],
  ])('when %s, then %j', (_name, input, expected) => {
    expect(severities(a2lListing, pairing(input))).toEqual(expected);
  });

  it('when it fires, then the fix carries the A2L safety caution', () => {
    const findings = run(a2lListing, pairing({ outdoor: a2lUnit, coil: { refrigerants: ['R-410A'] } }));
    expect(findings[0].fix).toMatch(/mildly flammable/);
    expect(findings[0].basis.citation).toMatch(/UL 60335-2-40, 3rd ed/);
  });
});

describe('refrigerant.a2l-charge-area', () => {
  // R-454B LFL 0.296 kg/m³ (ASHRAE 34, from memory); floor h0 0.6 m (UL 60335-2-40 3rd ed. GG.2)
  const limit1500Floor = maxChargeUnventilatedOz(0.296, 0.6, 1500);

  it('when the limit for 1,500 sq ft at floor height is worked by hand, then it is about 136 oz', () => {
    // 2.5 × 0.296^1.25 × 0.6 × √(1500 × 0.09290304) = 3.866 kg = 136.4 oz (UL 60335-2-40 3rd ed. GG.2, hand arithmetic)
    expect(limit1500Floor).toBeCloseTo(136.4, 0);
  });

  it.each([
    ['126 oz in 1,500 sq ft', 1500, {}, {}, []],
    // An attic unit is ducted: its release height is the lowest supply register, not the ceiling (GG.2 h0).
    // Register height unknown → the floor value 0.6 m (conservative): 250 oz > 136 oz → blocker
    ['250 oz in an attic, 1,500 sq ft, register height not given', 1500, { factoryChargeOz: 244 }, { indoorLocation: 'attic' as const }, ['blocker']],
    // Registers at 7.2 ft = 2.19 m: limit 136.4 × 2.19/0.6 ≈ 498 oz (GG.2, h0 proportional) → passes
    ['250 oz in an attic, 1,500 sq ft, registers at 7.2 ft', 1500, { factoryChargeOz: 244 }, { indoorLocation: 'attic' as const, lowestRegisterHeightFt: 7.2 }, []],
    ['250 oz in a closet, 1,500 sq ft, no mitigation', 1500, { factoryChargeOz: 244 }, { indoorLocation: 'closet' as const }, ['blocker']],
    ['126 oz in 1,000 sq ft (limit ~111 oz)', 1000, {}, {}, ['blocker']],
  ])('when %s, then %j', (_name, areaSqFt, unitOver, siteOver, expected) => {
    const p = pairing({ outdoor: { ...a2lUnit, ...unitOver }, coil: { ...a2lCoil, leakSensor: false }, lineSet: {}, site: { state: 'OH', conditionedAreaSqFt: areaSqFt, ...siteOver } });
    expect(severities(a2lChargeArea, p)).toEqual(expected);
  });

  it('when the charge sits exactly at the limit, then it passes; one ounce more fails', () => {
    const at = (factory: number) =>
      severities(a2lChargeArea, pairing({ outdoor: { ...a2lUnit, factoryChargeOz: factory, chargedLineLengthFt: 25 }, coil: a2lCoil, lineSet: {}, site: { state: 'OH', conditionedAreaSqFt: 1500 } }));
    expect(at(limit1500Floor)).toEqual([]);
    expect(at(limit1500Floor + 1)).toEqual(['blocker']);
  });

  it('when over the limit with a leak sensor and a listed air handler, then it is a caution', () => {
    const p = pairing({ outdoor: a2lUnit, coil: a2lCoil, airHandler: { a2lListed: true }, lineSet: {}, site: { state: 'OH', conditionedAreaSqFt: 800 } });
    const findings = run(a2lChargeArea, p);
    expect(findings.map((f) => f.severity)).toEqual(['caution']);
    expect(findings[0].detail).toMatch(/3rd ed/);
    expect(findings[0].values).toMatchObject({ chargeOz: 126, releaseHeightM: 0.6, mitigation: true });
  });

  it.each([
    ['the area', { outdoor: a2lUnit, lineSet: {}, site: { state: 'OH' } }],
    ['the factory charge', { outdoor: { refrigerant: 'R-32' as const }, lineSet: {}, site: { state: 'OH', conditionedAreaSqFt: 1500 } }],
    ['the line set', { outdoor: a2lUnit, site: { state: 'OH', conditionedAreaSqFt: 1500 } }],
  ])('when %s is missing, then it says so', (_name, input) => {
    expect(severities(a2lChargeArea, pairing(input))).toEqual(['missing']);
  });

  it('when the system is not A2L, then the rule does not apply', () => {
    expect(severities(a2lChargeArea, pairing({ lineSet: {}, site: { state: 'OH', conditionedAreaSqFt: 100 } }))).toEqual([]);
  });
});

describe('refrigerant.oil-compatibility', () => {
  it.each([
    ['kept line set that ran R-22, going to R-410A', { lineSet: { reused: true, previousRefrigerant: 'R-22' as const } }, ['caution']],
    ['kept line set that ran R-410A', { lineSet: { reused: true, previousRefrigerant: 'R-410A' as const } }, []],
    ['kept line set, old refrigerant unknown', { lineSet: { reused: true } }, ['missing']],
    ['new line set', { lineSet: { reused: false, previousRefrigerant: 'R-22' as const } }, []],
    ['kept coil listed only for R-22', { coil: { refrigerants: ['R-22' as const] }, coilKept: true }, ['caution']],
    ['kept dual-listed coil, old refrigerant unknown', { coil: { refrigerants: ['R-22' as const, 'R-410A' as const] }, coilKept: true }, ['missing']],
    ['new coil listed for R-22', { coil: { refrigerants: ['R-22' as const] } }, []],
    ['R-22 system (mineral to mineral)', { outdoor: { refrigerant: 'R-22' as const }, lineSet: { reused: true, previousRefrigerant: 'R-22' as const } }, []],
  ])('when %s, then %j', (_name, input, expected) => {
    expect(severities(oilCompatibility, pairing(input))).toEqual(expected);
  });

  it('when a line set and coil both ran R-22, then one caution names both and the fix says flush and new drier', () => {
    const findings = run(oilCompatibility, pairing({ outdoor: { systemType: 'heat-pump' }, coilKept: true, lineSet: { reused: true, previousRefrigerant: 'R-22' } }));
    expect(findings).toHaveLength(1);
    expect(findings[0].values.keptParts).toBe('line set;indoor coil');
    expect(findings[0].fix).toMatch(/[Ff]lush.*filter-drier \(bi-flow\)/);
  });
});

describe('refrigerantRules', () => {
  it('when the family is listed, then it has the contract ids', () => {
    expect(refrigerantRules.map((r) => r.id).sort()).toEqual([
      'refrigerant.a2l-charge-area',
      'refrigerant.a2l-listing',
      'refrigerant.coil-listing',
      'refrigerant.metering-device',
      'refrigerant.oil-compatibility',
    ]);
  });
});
