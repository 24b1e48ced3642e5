import { describe, expect, it } from 'vitest';
import { DEFAULT_RULE_SETTINGS } from '../../shared/rules/settings';
import { chartModel } from '../../components/readings/chart-geometry';
import { initialReadingsDraft, liveReadings, type ReadingsDraft } from '../../components/readings/readings-draft';
import { lookupByPressure, lookupByTemperature } from '../../components/readings/pt-lookup';
import { readNumber } from '../../components/readings/number-text';
import { applyUnit } from '../../components/readings/apply-unit';

const draftWith = (patch: Partial<ReadingsDraft>, values: ReadingsDraft['values'] = {}): ReadingsDraft => ({
  ...initialReadingsDraft(),
  ...patch,
  values,
});

// R-410A: dew 118.4 psig at 40 °F, bubble 318.5 psig at 100 °F — CoolProp 8.0.0, Lemmon 2003 EOS (values.json PT-02); ± 1 °F.
const TXV_VALUES = { suctionPsig: '118.4', suctionLineF: '50', liquidPsig: '318.5', liquidLineF: '90', outdoorDbF: '95' };

describe('liveReadings', () => {
  it('when only the suction pressure is typed, then the dew point shows and superheat waits for the line temperature', () => {
    const live = liveReadings(draftWith({ refrigerant: 'R-410A', meteringType: 'txv' }, { suctionPsig: '118.4' }), DEFAULT_RULE_SETTINGS);
    expect(Math.abs((live.suctionSatF ?? NaN) - 40)).toBeLessThanOrEqual(1);
    expect(live.superheatF).toBeUndefined();
    expect(live.result).toBeUndefined();
    expect(live.missing).toEqual(['suction line temperature', 'liquid pressure', 'liquid line temperature', 'outdoor dry bulb']);
  });

  it('when every TXV reading is in, then superheat 10 °F, subcooling 10 °F and an on-target verdict', () => {
    const live = liveReadings(draftWith({ refrigerant: 'R-410A', meteringType: 'txv' }, TXV_VALUES), DEFAULT_RULE_SETTINGS);
    // 50 − 40 and 100 − 90 (definitions, DESIGN §4)
    expect(Math.abs((live.superheatF ?? NaN) - 10)).toBeLessThanOrEqual(1);
    expect(Math.abs((live.subcoolingF ?? NaN) - 10)).toBeLessThanOrEqual(1);
    // 10 °F default target subcooling (shared defaults, common practice, no source)
    expect(live.result).toMatchObject({ verdict: 'on-target', targetSubcoolingF: 10 });
    expect(live.result?.subcoolingF).toBeCloseTo(live.subcoolingF ?? NaN, 6);
  });

  it('when a fixed orifice has no indoor wet bulb yet, then the verdict waits for it', () => {
    const live = liveReadings(draftWith({ refrigerant: 'R-410A', meteringType: 'piston' }, TXV_VALUES), DEFAULT_RULE_SETTINGS);
    expect(live.result).toBeUndefined();
    expect(live.missing).toEqual(['indoor wet bulb']);
  });

  it('when the indoor air is given as 75 °F and 50 % RH, then the wet bulb is 62.55 °F', () => {
    const draft = draftWith(
      { refrigerant: 'R-410A', meteringType: 'piston', indoorBy: 'humidity' },
      { ...TXV_VALUES, indoorDbF: '75', indoorRhPct: '50' },
    );
    const live = liveReadings(draft, DEFAULT_RULE_SETTINGS);
    // 62.55 °F: psychrolib 1.1.1, ASHRAE Fundamentals 2017 ch.1 (values.json PS-02), ± 0.2 °F
    expect(Math.abs((live.indoorWbF ?? NaN) - 62.55)).toBeLessThanOrEqual(0.2);
    expect(live.result?.targetSuperheatF).toEqual(expect.any(Number));
  });

  it('when a reading is not a number or past the critical point, then the field says so in words and no verdict shows', () => {
    const live = liveReadings(
      draftWith({ refrigerant: 'R-410A', meteringType: 'txv' }, { ...TXV_VALUES, suctionLineF: 'fifty', liquidPsig: '800' }),
      DEFAULT_RULE_SETTINGS,
    );
    expect(live.errors.suctionLineF).toBe('Type a number.');
    // 800 psig is above R-410A's critical pressure (about 711 psia, from memory)
    expect(live.errors.liquidPsig).toMatch(/critical/i);
    expect(live.result).toBeUndefined();
  });

  it('when the mode is heating, then the readings are not evaluated', () => {
    const live = liveReadings(
      draftWith({ refrigerant: 'R-410A', meteringType: 'txv', mode: 'heating' }, TXV_VALUES),
      DEFAULT_RULE_SETTINGS,
    );
    expect(live.result?.verdict).toBe('not-evaluated');
  });
});

describe('the P–T lookup', () => {
  it('when 118.4 psig or 40 °F is typed for R-410A, then the other side reads back (values.json PT-02, ± 1 °F / 1.5 psi)', () => {
    const byP = lookupByPressure('118.4', 'R-410A', 0);
    expect(Math.abs((byP.dew ?? NaN) - 40)).toBeLessThanOrEqual(1);
    const byT = lookupByTemperature('40', 'R-410A', 0);
    expect(Math.abs((byT.bubble ?? NaN) - 118.8)).toBeLessThanOrEqual(1.5);
    expect(Math.abs((byT.dew ?? NaN) - 118.4)).toBeLessThanOrEqual(1.5);
    expect(lookupByTemperature('', 'R-410A', 0)).toEqual({});
    expect(lookupByTemperature('200', 'R-410A', 0).error).toMatch(/critical/i);
  });
});

describe('readNumber', () => {
  it.each([
    ['', undefined, undefined],
    ['1,250', 1250, undefined],
    ['-3.5', -3.5, undefined],
    ['3.', 3, undefined],
    ['12a', undefined, 'Type a number.'],
  ])('when "%s" is typed, then %s', (text, value, error) => {
    expect(readNumber(text)).toEqual(value === undefined && error === undefined ? {} : error ? { error } : { value });
  });
});

describe('chartModel', () => {
  it('when suction and liquid readings are placed, then the liquid sits higher and the line marks sit beside the curve', () => {
    const model = chartModel(
      'R-410A',
      0,
      [
        { kind: 'suction', psig: 118.4, satF: 40, lineF: 50 },
        { kind: 'liquid', psig: 318.5, satF: 100, lineF: 90 },
      ],
      360,
      240,
    );
    const [suction, liquid] = model.marks;
    expect(liquid.sat.y).toBeLessThan(suction.sat.y); // higher pressure is drawn higher
    expect(suction.line!.x).toBeGreaterThan(suction.sat.x); // superheat: the line is warmer than saturation
    expect(liquid.line!.x).toBeLessThan(liquid.sat.x); // subcooling: colder
    expect(model.bubblePath.startsWith('M')).toBe(true);
    expect(model.xTicks.length).toBeGreaterThanOrEqual(4);
    for (const m of model.marks) {
      expect(m.sat.x).toBeGreaterThanOrEqual(model.plot.left);
      expect(m.sat.x).toBeLessThanOrEqual(model.plot.left + model.plot.width);
    }
  });
});

describe('applyUnit', () => {
  it('when a catalog outdoor unit is picked, then its refrigerant and target subcooling fill the readings', () => {
    // An invented unit: "R454B" as a price list might spell it, 12 °F target from its data plate
    const next = applyUnit(initialReadingsDraft(), { id: 7, label: 'OU-1', spec: { refrigerant: 'R454B', targetSubcoolingF: 12 } });
    expect(next).toMatchObject({ refrigerant: 'R-454B', unitLabel: 'OU-1', values: { targetSubcoolingF: '12' } });
    const plain = applyUnit(draftWith({ refrigerant: 'R-22' }, { targetSubcoolingF: '8' }), { id: 8, label: 'OU-2', spec: {} });
    expect(plain).toMatchObject({ refrigerant: 'R-22', values: { targetSubcoolingF: '8' } });
  });
});
