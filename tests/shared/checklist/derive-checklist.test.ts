import { describe, expect, it } from 'vitest';
import { applyChecklistStates, deriveChecklist, openChecklistItems } from '../../../shared/checklist/index';
import type { Pairing } from '../../../shared/rules/types';

// Invented parts. Oils: R-22 runs in mineral oil, R-410A / R-454B in POE (ASHRAE Handbook—Refrigeration, ch. 12, from memory).
const outdoor = (over: object = {}) =>
  ({
    spec: { model: 'ZX-1', systemType: 'heat-pump', refrigerant: 'R-410A', nominalTons: 3, mcaAmps: 21.2, mocpAmps: 35, ...over },
    kept: false,
  }) as Pairing['outdoor'];
const coil = (over: object = {}, kept = false) =>
  ({ spec: { model: 'ZC-1', minTons: 2.5, maxTons: 3.5, refrigerants: ['R-410A'], meteringType: 'txv', ...over }, kept }) as NonNullable<
    Pairing['indoorCoil']
  >;
const pairing = (over: Partial<Pairing> = {}): Pairing => ({
  scope: 'new-system',
  installDate: '2026-06-01',
  outdoor: outdoor(),
  indoorCoil: coil(),
  ...over,
});
const ids = (p: Pairing) => deriveChecklist(p).map((i) => i.id);

describe('deriveChecklist', () => {
  it('when the system is a heat pump, then the drier item asks for a bi-flow drier; an AC asks for a liquid-line drier', () => {
    expect(deriveChecklist(pairing())[0]).toMatchObject({ id: 'filter-drier', title: expect.stringContaining('bi-flow') });
    expect(deriveChecklist(pairing({ outdoor: outdoor({ systemType: 'ac' }) }))[0].title).not.toContain('bi-flow');
  });

  it('when a kept line set carried R-22 and the new unit runs R-410A, then flushing is on the list because the oil changes', () => {
    const p = pairing({ lineSet: { liquidOdIn: 0.375, suctionOdIn: 0.875, lengthFt: 30, reused: true, previousRefrigerant: 'R-22' } });
    const item = deriveChecklist(p).find((i) => i.id === 'line-set-flush');
    expect(item?.reason).toMatch(/mineral oil.*POE/);
    expect(ids(p)).toContain('kept-parts-inspected');
  });

  it('when a kept line set carried the same oil, then no flush item; a burnout or an unknown history puts it back', () => {
    const line = { liquidOdIn: 0.375, suctionOdIn: 0.875, lengthFt: 30, reused: true };
    expect(ids(pairing({ lineSet: { ...line, previousRefrigerant: 'R-410A' } }))).not.toContain('line-set-flush');
    expect(ids(pairing({ lineSet: { ...line, previousRefrigerant: 'R-410A', burnoutHistory: true } }))).toContain('line-set-flush');
    expect(ids(pairing({ lineSet: line }))).toContain('line-set-flush');
    expect(ids(pairing({ lineSet: { ...line, reused: false } }))).not.toContain('line-set-flush');
  });

  it('when the indoor unit is in an attic or its place is unknown, then overflow protection is listed; in a garage it is not', () => {
    // Attic and above-ceiling: IRC M1411.3 secondary protection where overflow damages the building
    expect(ids(pairing({ site: { state: 'GA', indoorLocation: 'attic' } }))).toContain('overflow-protection');
    expect(ids(pairing())).toContain('overflow-protection');
    expect(ids(pairing({ site: { state: 'GA', indoorLocation: 'garage' } }))).not.toContain('overflow-protection');
    expect(ids(pairing({ indoorCoil: undefined }))).not.toContain('condensate-trap');
  });

  it('when the refrigerant is A2L or a sensor is fitted, then the leak sensor test is listed', () => {
    // R-454B is ASHRAE 34 class A2L (values.json RP-04)
    expect(ids(pairing({ outdoor: outdoor({ refrigerant: 'R-454B' }), indoorCoil: coil({ refrigerants: ['R-454B'] }) }))).toContain(
      'a2l-leak-sensor',
    );
    expect(ids(pairing({ indoorCoil: coil({ leakSensor: true }) }))).toContain('a2l-leak-sensor');
    expect(ids(pairing())).not.toContain('a2l-leak-sensor');
  });

  it('when the shop target is 300 microns, then the evacuation item says so; the circuit item names MCA and MOCP', () => {
    const items = deriveChecklist(pairing(), { evacuationTargetMicrons: 300 });
    expect(items.find((i) => i.id === 'evacuation')?.title).toContain('300 microns');
    // MCA 21.2 A / MOCP 35 A: NEC 440.32 / 440.22(A) worked values (values.json EL-04, EL-05)
    expect(items.find((i) => i.id === 'electrical-verified')?.reason).toMatch(/21\.2 A.*35 A/);
  });

  it('when parts are kept, then they are named in the inspection item; with nothing kept there is no such item', () => {
    const p = pairing({ indoorCoil: coil({}, true), airHandler: { spec: { kind: 'furnace' }, kept: true } as Pairing['airHandler'] });
    expect(deriveChecklist(p).find((i) => i.id === 'kept-parts-inspected')?.reason).toMatch(/indoor coil, furnace/);
    expect(ids(pairing())).not.toContain('kept-parts-inspected');
  });
});

describe('applyChecklistStates', () => {
  it('when states are saved, then items take them, others stay open, and states of items no longer derived are dropped', () => {
    const rows = applyChecklistStates(deriveChecklist(pairing()), {
      'filter-drier': { state: 'done' },
      'condensate-trap': { state: 'not-applicable', note: 'Gravity drain outside the air stream' },
      'line-set-flush': { state: 'done' },
    });
    expect(rows.find((r) => r.id === 'filter-drier')?.state).toBe('done');
    expect(rows.find((r) => r.id === 'condensate-trap')).toMatchObject({
      state: 'not-applicable',
      note: 'Gravity drain outside the air stream',
    });
    expect(rows.some((r) => r.id === 'line-set-flush')).toBe(false);
    expect(openChecklistItems(rows)).not.toContain('filter-drier');
    expect(openChecklistItems(rows)).toContain('nitrogen-purge');
  });
});
