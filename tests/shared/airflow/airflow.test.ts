import { describe, expect, it } from 'vitest';
import { airflowForSensibleCfm, cfmPerTon, sensibleCapacityBtuh, temperatureSplitF } from '../../../shared/airflow/airflow';

describe('airflow computations', () => {
  it('when 1200 CFM serves 3 tons, then airflow is 400 CFM/ton', () => {
    // 1200 CFM at 400 CFM/ton for 3 tons: common practice (no source) — values.json CM-09
    expect(cfmPerTon(1200, 3)).toBe(400);
  });

  it('when 1200 CFM leaves the coil 20 °F colder, then the sensible capacity is 25,920 Btu/h', () => {
    // 1.08 × 1200 × 20 = 25,920 Btu/h: ASHRAE Handbook—Fundamentals standard-air relation — values.json CM-07
    expect(sensibleCapacityBtuh(1200, 20)).toBeCloseTo(25920, 6);
  });

  it('when 27,000 Btu/h sensible rides on 1200 CFM, then the split is about 20.8 °F', () => {
    // ~20.8 °F: consistency check with CM-07, common practice (no source) — values.json CM-10
    expect(temperatureSplitF(27000, 1200)).toBeCloseTo(20.8, 1);
  });

  it('when the sensible equation is inverted, then it returns the airflow it started from', () => {
    // identity of the 1.08 relation (ASHRAE Handbook—Fundamentals) at a point not in values.json
    expect(airflowForSensibleCfm(sensibleCapacityBtuh(875, 18.5), 18.5)).toBeCloseTo(875, 9);
  });

  it('when the altitude factor is given, then it replaces 1.08', () => {
    // ~0.90 at 5,000 ft: values.json CM-07 notes (published relation, factor scales with density)
    expect(sensibleCapacityBtuh(1000, 20, 0.9)).toBeCloseTo(18000, 6);
  });
});
