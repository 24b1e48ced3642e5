import { describe, expect, it } from 'vitest';
import { checkTargetSuperheat, targetSuperheatF } from '../../../shared/commissioning';
import { wetBulbF } from '../../../shared/psychrometrics';
import psychrolib from 'psychrolib';

describe('fixed-orifice target superheat', () => {
  it.each([
    // target SH = (3 × WB − 80 − ODB) / 2 — common practice (no source), values.json CM-05 worked values
    [67, 95, 13],
    [63, 95, 7],
    [62, 85, 10.5],
    [64, 96, 8],
    [66, 90, 14],
  ])('when the indoor wet bulb is %d °F and outdoor %d °F, then the target is %d °F', (wb, db, target) => {
    expect(targetSuperheatF(wb, db)).toBe(target);
    expect(checkTargetSuperheat(wb, db)).toEqual({ usable: true, targetF: target });
  });

  it('when the target falls under 5 °F, then superheat charging is not used', () => {
    // values.json CM-05: WB 62 / ODB 100 → 3 °F, below ~5 °F do not charge by superheat (common practice)
    const check = checkTargetSuperheat(62, 100);
    expect(check.usable).toBe(false);
    expect(check.targetF).toBe(3);
  });

  it.each([
    // Valid range of the relation (issue 9 / DESIGN §4): indoor WB about 50–76 °F, outdoor 55–115 °F (common practice)
    [49, 90],
    [77, 90],
    [65, 54],
    [65, 116],
  ])('when the indoor wet bulb is %d °F and outdoor %d °F, then the relation does not apply', (wb, db) => {
    const check = checkTargetSuperheat(wb, db);
    expect(check.usable).toBe(false);
    if (!check.usable) expect(check.reason).toMatch(/outside/);
  });
});

describe('wet bulb from dry bulb and humidity (psychrolib)', () => {
  it.each([
    // psychrolib 1.1.1, ASHRAE Handbook—Fundamentals 2017 ch. 1 equations — values.json PS-02 (±0.2 °F);
    // 80 °F / 50 % ≈ 66.6 °F also reads off the ASHRAE psychrometric chart
    [80, 50, 66.66],
    [75, 50, 62.55],
    [70, 50, 58.45],
    [95, 40, 75.08],
    [78, 55, 66.49],
  ])('when the dry bulb is %d °F at %d %% RH at sea level, then the wet bulb is %d °F', (db, rh, wb) => {
    expect(Math.abs(wetBulbF(db, rh) - wb)).toBeLessThanOrEqual(0.2);
  });

  it('when the site is at 5,000 ft, then the wet bulb uses the thinner air', () => {
    // values.json PS-05: 75 °F / 50 % at 5,000 ft → 61.76 °F (psychrolib standard atmosphere)
    expect(Math.abs(wetBulbF(75, 50, 5000) - 61.76)).toBeLessThanOrEqual(0.05);
  });

  it('when another module left psychrolib in SI units, then the wet bulb is still in °F', () => {
    // Same PS-02 value (80 °F / 50 % → 66.66 °F); psychrolib keeps one global unit system
    psychrolib.SetUnitSystem(psychrolib.SI);
    expect(Math.abs(wetBulbF(80, 50) - 66.66)).toBeLessThanOrEqual(0.2);
  });

  it('when the humidity is 0 or over 100 %, then the field is named', () => {
    expect(() => wetBulbF(80, 0)).toThrow(/relative humidity/);
    expect(() => wetBulbF(80, 120)).toThrow(/relative humidity/);
  });
});
