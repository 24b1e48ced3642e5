import { describe, expect, it } from 'vitest';
import { describePart } from '../../components/check/part-description';

describe('describePart', () => {
  it('when the part is an outdoor heat pump, then the row says heat pump, refrigerant and tons', () => {
    // Invented unit; R-454B as an A2L replacement for R-410A (EPA SNAP listing, from memory).
    expect(describePart('outdoor-units', { systemType: 'heat-pump', refrigerant: 'R-454B', nominalTons: 3 })).toBe('Heat pump · R-454B · 3 tons');
  });

  it('when the part is an AC of one ton with a brand, then the row says AC, one ton and the brand last', () => {
    expect(describePart('outdoor-units', { systemType: 'ac', refrigerant: 'R-410A', nominalTons: 1, brand: 'Zephtan' })).toBe('AC · R-410A · 1 ton · Zephtan');
  });

  it('when the part is a coil, then the row lists its refrigerants, size range and valve refrigerant', () => {
    expect(describePart('indoor-coils', { refrigerants: ['R-454B', 'R-32'], minTons: 2.5, maxTons: 3.5, meteringRefrigerant: 'R-454B' })).toBe(
      'Coil · R-454B, R-32 · 2.5–3.5 tons · valve for R-454B',
    );
  });

  it('when the part is an air handler, then the row says so with its airflow in CFM', () => {
    expect(describePart('air-handlers', { kind: 'air-handler', minTons: 2, maxTons: 3, airflowCfm: 1200 })).toBe('Air handler · 2–3 tons · 1200 CFM');
  });

  it('when the part is a metering kit, then the row names the kit type and refrigerant', () => {
    expect(describePart('metering-devices', { type: 'txv', refrigerant: 'R-410A', minTons: 2, maxTons: 3 })).toBe('TXV kit · R-410A · 2–3 tons');
  });
});
