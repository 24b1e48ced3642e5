import { describe, expect, it } from 'vitest';
import { A2L_CAUTION, CHARGING_CAUTION, evaluateReadings, ReadingInputError } from '../../../shared/commissioning';
import type { CommissioningEvaluateInput } from '../../../shared/schemas/commissioning';

// Pressures are taken from values.json PT-02 / PT-04 (CoolProp 8.0.0 implementing the reference EOS,
// sea level), so each saturation temperature is known without our own code:
// R-410A dew 118.4 psig at 40 °F, bubble 318.5 psig at 100 °F; R-454B dew 107.5 psig at 40 °F,
// bubble 303.3 psig at 100 °F. Superheat and subcooling then follow from their definitions.
const R410A = { refrigerant: 'R-410A', suctionPsig: 118.4, liquidPsig: 318.5 } as const;

function readings(over: Partial<CommissioningEvaluateInput>): CommissioningEvaluateInput {
  return { ...R410A, meteringType: 'txv', suctionLineF: 52, liquidLineF: 90, outdoorDbF: 95, ...over } as CommissioningEvaluateInput;
}

describe('superheat and subcooling from the definitions', () => {
  it('when R-410A reads 118.4 psig / 52 °F suction and 318.5 psig / 90 °F liquid, then superheat is 12 °F and subcooling 10 °F', () => {
    // SH = 52 − 40 (dew at 118.4 psig), SC = 100 (bubble at 318.5 psig) − 90; ±0.2 °F for the reference rounding
    const r = evaluateReadings(readings({}));
    expect(Math.abs(r.suctionSatF - 40)).toBeLessThanOrEqual(0.2);
    expect(Math.abs(r.liquidSatF - 100)).toBeLessThanOrEqual(0.2);
    expect(Math.abs(r.superheatF - 12)).toBeLessThanOrEqual(0.2);
    expect(Math.abs(r.subcoolingF - 10)).toBeLessThanOrEqual(0.2);
  });

  it('when R-454B is read, then superheat uses the dew point and subcooling the bubble point', () => {
    // values.json PT-04: dew 107.5 psig at 40 °F (bubble would be ~2.7 °F colder), bubble 303.3 psig at 100 °F
    const r = evaluateReadings(readings({ refrigerant: 'R-454B', suctionPsig: 107.5, liquidPsig: 303.3, suctionLineF: 50, liquidLineF: 91 }));
    expect(Math.abs(r.suctionSatF - 40)).toBeLessThanOrEqual(0.5);
    expect(Math.abs(r.superheatF - 10)).toBeLessThanOrEqual(0.5);
    expect(Math.abs(r.liquidSatF - 100)).toBeLessThanOrEqual(0.5);
    expect(Math.abs(r.subcoolingF - 9)).toBeLessThanOrEqual(0.5);
  });

  it('when the same gauges are read at 5,000 ft, then the saturation temperatures are lower', () => {
    // U.S. Standard Atmosphere 1976: 12.228 psia at 5,000 ft vs 14.696 at sea level (values.json PS-05)
    const sea = evaluateReadings(readings({}));
    const high = evaluateReadings(readings({ altitudeFt: 5000 }));
    expect(high.suctionSatF).toBeLessThan(sea.suctionSatF - 0.5);
    expect(high.superheatF).toBeGreaterThan(sea.superheatF + 0.5);
  });
});

describe('expansion valve: target subcooling', () => {
  it('when subcooling is within the tolerance of the unit’s target and the valve holds normal superheat, then on target', () => {
    // Unit target 12 °F (from its data), ±3 °F default tolerance — common practice (no source)
    const r = evaluateReadings(readings({ targetSubcoolingF: 12 }));
    expect(r.verdict).toBe('on-target');
    expect(r.targetSubcoolingF).toBe(12);
    expect(r.advice).toMatch(/On target/);
  });

  it('when the unit gives no target, then the shop default is used', () => {
    // Default 10 °F (DESIGN §4, common practice); a shop that sets 14 °F sees 10 °F subcooling as low
    expect(evaluateReadings(readings({})).targetSubcoolingF).toBe(10);
    const r = evaluateReadings(readings({}), { defaultTargetSubcoolingF: 14 });
    expect(r.targetSubcoolingF).toBe(14);
    expect(r.verdict).toBe('off-target');
    expect(r.advice).toMatch(/Add charge/);
  });

  it('when subcooling is low, then add charge, with the numbers', () => {
    // SC = 100 − 96 = 4 °F against 10 °F ±3
    const r = evaluateReadings(readings({ liquidLineF: 96 }));
    expect(r.verdict).toBe('off-target');
    expect(r.advice).toMatch(/^Add charge: subcooling 4 °F is 6 °F below the 10 °F target/);
    expect(r.marginF).toBe(-6);
  });

  it('when subcooling is high and the valve superheat normal, then recover charge', () => {
    // SC = 100 − 84 = 16 °F against 10 °F ±3; SH 12 °F
    const r = evaluateReadings(readings({ liquidLineF: 84 }));
    expect(r.verdict).toBe('off-target');
    expect(r.advice).toMatch(/^Recover charge/);
  });

  it('when subcooling and superheat are both high, then check for a restriction', () => {
    // SC 16 °F, SH = 66 − 40 = 26 °F (above the 5–20 °F band a valve holds; CM-06 typical 8–12)
    const r = evaluateReadings(readings({ liquidLineF: 84, suctionLineF: 66 }));
    expect(r.verdict).toBe('off-target');
    expect(r.advice).toMatch(/restriction/);
  });

  it('when subcooling is on target but superheat is near zero, then check the metering device', () => {
    // SH = 42 − 40 = 2 °F: the valve is overfeeding (common practice (no source))
    const r = evaluateReadings(readings({ suctionLineF: 42 }));
    expect(r.verdict).toBe('off-target');
    expect(r.advice).toMatch(/metering device/);
  });

  it('when the shop tightens the tolerance to 1 °F, then 2 °F off the target is off target', () => {
    // SC = 100 − 92 = 8 °F vs 10 °F: on target at ±3, off at ±1
    expect(evaluateReadings(readings({ liquidLineF: 92 })).verdict).toBe('on-target');
    expect(evaluateReadings(readings({ liquidLineF: 92 }), { subcoolingToleranceF: 1 }).verdict).toBe('off-target');
  });
});

describe('fixed orifice: target superheat', () => {
  const piston = (over: Partial<CommissioningEvaluateInput>) => readings({ meteringType: 'piston', indoorWbF: 67, outdoorDbF: 95, ...over });

  it('when superheat is near the target from 67 °F WB and 95 °F outdoor, then on target', () => {
    // Target (3×67 − 80 − 95)/2 = 13 °F (common practice, values.json CM-05); SH 12 °F; ±5 °F default
    const r = evaluateReadings(piston({}));
    expect(r.targetSuperheatF).toBe(13);
    expect(r.verdict).toBe('on-target');
  });

  it('when superheat is high and subcooling normal, then add charge', () => {
    // SH = 65 − 40 = 25 °F vs 13 °F target
    const r = evaluateReadings(piston({ suctionLineF: 65 }));
    expect(r.verdict).toBe('off-target');
    expect(r.advice).toMatch(/^Add charge: superheat 25 °F is 12 °F above the 13 °F target/);
  });

  it('when superheat and subcooling are both high, then check for a restriction', () => {
    // SH 25 °F, SC = 100 − 80 = 20 °F (> 15 °F, common practice (no source))
    const r = evaluateReadings(piston({ suctionLineF: 65, liquidLineF: 80 }));
    expect(r.advice).toMatch(/restriction/);
  });

  it('when superheat is low, then check airflow before recovering charge', () => {
    // SH = 44 − 40 = 4 °F vs 13 °F
    const r = evaluateReadings(piston({ suctionLineF: 44 }));
    expect(r.verdict).toBe('off-target');
    expect(r.advice).toMatch(/airflow.*recover charge/);
  });

  it('when the tech has dry bulb and humidity instead of wet bulb, then the wet bulb comes from psychrolib', () => {
    // 80 °F / 50 % → 66.66 °F WB (values.json PS-02) → target (3×66.7 − 80 − 95)/2 = 12.55 → 12.6 °F (WB rounded to 0.1 first)
    const r = evaluateReadings(piston({ indoorWbF: undefined, indoorDbF: 80, indoorRhPct: 50 }));
    expect(r.wetBulbSource).toBe('from-humidity');
    expect(r.indoorWbF).toBeCloseTo(66.7, 1);
    expect(r.targetSuperheatF).toBeCloseTo(12.6, 1);
  });

  it.each([
    // Valid range: indoor WB 50–76 °F, outdoor 55–115 °F; target ≥ 5 °F (issue 9 / CM-05, common practice)
    [{ indoorWbF: 48 }, /outside/],
    [{ outdoorDbF: 120 }, /outside/],
    [{ indoorWbF: 62, outdoorDbF: 100 }, /under 5/],
  ])('when the conditions are %o, then not evaluated and weigh in the charge', (over, why) => {
    const r = evaluateReadings(piston(over));
    expect(r.verdict).toBe('not-evaluated');
    expect(r.advice).toMatch(why);
    expect(r.advice).toMatch(/[Ww]eigh in the charge/);
  });

  it('when no indoor wet bulb or humidity is given, then not evaluated and asks for it', () => {
    const r = evaluateReadings(piston({ indoorWbF: undefined }));
    expect(r.verdict).toBe('not-evaluated');
    expect(r.advice).toMatch(/wet bulb/);
  });
});

describe('cautions', () => {
  it('when any readings are judged, then the certified-technician caution comes with them, and the A2L one for an A2L', () => {
    // ASHRAE 34: R-32 and R-454B are A2L, R-410A is A1 (values.json RP-02..RP-04)
    expect(evaluateReadings(readings({})).cautions).toEqual([CHARGING_CAUTION]);
    expect(evaluateReadings(readings({ refrigerant: 'R-454B', suctionPsig: 107.5, liquidPsig: 303.3 })).cautions).toEqual([CHARGING_CAUTION, A2L_CAUTION]);
  });
});

describe('heating mode and bad input', () => {
  it('when the system runs in heating mode, then the readings are shown but not judged', () => {
    const r = evaluateReadings(readings({ mode: 'heating' }));
    expect(r.verdict).toBe('not-evaluated');
    expect(r.advice).toMatch(/Heating mode/);
    expect(Math.abs(r.superheatF - 12)).toBeLessThanOrEqual(0.2);
    expect(r.targetSubcoolingF).toBeUndefined();
  });

  it('when the liquid gauge reads below the suction gauge, then not evaluated with a gauge check', () => {
    const r = evaluateReadings(readings({ liquidPsig: 100 }));
    expect(r.verdict).toBe('not-evaluated');
    expect(r.advice).toMatch(/gauge/);
  });

  it.each([
    ['suctionPsig', { suctionPsig: -20 }],
    ['liquidPsig', { liquidPsig: 900 }],
    ['refrigerant', { refrigerant: 'R-12' }],
    ['indoorRhPct', { meteringType: 'piston', indoorDbF: 80, indoorRhPct: 0 }],
  ] as const)('when %s is out of range, then the error names it', (field, over) => {
    try {
      evaluateReadings(readings(over as Partial<CommissioningEvaluateInput>));
      throw new Error('expected a ReadingInputError');
    } catch (err) {
      expect(err).toBeInstanceOf(ReadingInputError);
      expect((err as ReadingInputError).field).toBe(field);
    }
  });
});
