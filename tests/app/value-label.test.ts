import { describe, expect, it } from 'vitest';
import { valueLabel } from '../../components/check/value-label';

describe('valueLabel', () => {
  it.each([
    // Unit suffixes follow DESIGN.md §2's field naming (Amps, Ft, In, Oz, Cfm, F…).
    ['mcaAmps', 'MCA (A)'],
    ['mocpAmps', 'MOCP (A)'],
    ['lengthFt', 'Length (ft)'],
    ['liquidOdIn', 'Liquid OD (in)'],
    ['chargeAdjustmentOz', 'Charge adjustment (oz)'],
    ['airflowCfm', 'Airflow (CFM)'],
    ['targetSubcoolingF', 'Target subcooling (°F)'],
    ['columnC', 'Column (°C)'],
    ['conditionedAreaSqFt', 'Conditioned area (sq ft)'],
    ['seer2', 'SEER2'],
    ['minSeer2', 'Min SEER2'],
    ['systemRefrigerant', 'System refrigerant'],
    ['wireAwg', 'Wire AWG'],
  ])('when the key is %s, then it reads "%s"', (key, label) => {
    expect(valueLabel(key)).toBe(label);
  });
});
