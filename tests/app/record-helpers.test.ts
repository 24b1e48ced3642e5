import { describe, expect, it } from 'vitest';
import type { ChecklistRow } from '../../shared/checklist';
import { initialEvacuationDraft } from '../../components/readings/evacuation-draft';
import { initialReadingsDraft, liveReadings } from '../../components/readings/readings-draft';
import { DEFAULT_RULE_SETTINGS } from '../../shared/rules/settings';
import { conflictRows, rebase } from '../../components/systems/record-conflict';
import { readingBody } from '../../components/systems/reading-body';
import { fieldWord, pageCount } from '../../components/jobs/job-words';

const row = (id: string, state: ChecklistRow['state'], note?: string): ChecklistRow => ({
  id,
  title: `Item ${id}`,
  reason: 'a reason',
  basis: 'common practice',
  state,
  ...(note ? { note } : {}),
});

describe('conflictRows', () => {
  it('when my serial differs from the newer revision, then both values are listed side by side', () => {
    const rows = conflictRows({ revision: 2, serials: { outdoor: 'AB-100' } }, { serials: { outdoor: 'AB-999' }, checklist: [] });
    expect(rows).toEqual([{ key: 'serial-outdoor', label: 'Outdoor unit serial', mine: 'AB-100', theirs: 'AB-999' }]);
  });

  it('when the newer revision already holds the same values, then nothing clashes', () => {
    const rows = conflictRows(
      { revision: 2, serials: { outdoor: 'AB-100' }, checklist: { drier: { state: 'done' } } },
      { serials: { outdoor: 'AB-100', indoorCoil: 'X' }, checklist: [row('drier', 'done')] },
    );
    expect(rows).toEqual([]);
  });

  it('when a checklist item was marked differently, then the item and both states with their reasons show', () => {
    const rows = conflictRows(
      { revision: 3, checklist: { trap: { state: 'not-applicable', note: 'no drain' } } },
      { serials: {}, checklist: [row('trap', 'done'), row('other', 'open')] },
    );
    expect(rows).toEqual([{ key: 'checklist-trap', label: 'Item trap', mine: 'Not applicable (no drain)', theirs: 'Done' }]);
  });

  it('when I keep mine, then the same change goes on top of their revision', () => {
    expect(rebase({ revision: 2, serials: { outdoor: 'A' } }, { latestRevision: 5 })).toEqual({ revision: 5, serials: { outdoor: 'A' } });
  });
});

// R-410A: dew 118.4 psig at 40 °F, bubble 318.5 psig at 100 °F — CoolProp 8.0.0, Lemmon 2003 EOS (values.json PT-02).
const TXV_VALUES = { suctionPsig: '118.4', suctionLineF: '50', liquidPsig: '318.5', liquidLineF: '90', outdoorDbF: '95' };

describe('readingBody', () => {
  it('when every TXV reading is typed, then the charge input carries the typed numbers in psig and °F', () => {
    const draft = { ...initialReadingsDraft(), refrigerant: 'R-410A', meteringType: 'txv' as const, values: TXV_VALUES };
    const live = liveReadings(draft, DEFAULT_RULE_SETTINGS);
    const body = readingBody(draft, initialEvacuationDraft(), { charge: live.result !== undefined });
    expect(body?.charge).toMatchObject({ refrigerant: 'R-410A', meteringType: 'txv', suctionPsig: 118.4, suctionLineF: 50, liquidPsig: 318.5, liquidLineF: 90, outdoorDbF: 95 });
    expect(body?.evacuation).toBeUndefined();
  });

  it('when the charge readings are incomplete and nothing else is typed, then there is nothing to save', () => {
    const draft = { ...initialReadingsDraft(), meteringType: 'txv' as const, values: { suctionPsig: '118.4' } };
    expect(readingBody(draft, initialEvacuationDraft(), { charge: false })).toBeNull();
  });

  it('when only an evacuation and a nitrogen test are typed, then both are saved with their units', () => {
    // 500 microns with a 10-minute decay test: common practice (no source) shop target.
    const evac = { values: { finalMicrons: '480', decayMicrons: '150', decayHoldMinutes: '10', testPsig: '300', nitrogenHoldMinutes: '30', dropPsig: '0' } };
    const body = readingBody(initialReadingsDraft(), evac, { charge: false });
    expect(body).toEqual({
      evacuation: { finalMicrons: 480, decayMicrons: 150, holdMinutes: 10 },
      pressureTest: { pressurePsig: 300, holdMinutes: 30, dropPsig: 0 },
    });
  });

  it('when a nitrogen test has no hold time, then it is not saved (the hold is what makes it a test)', () => {
    const body = readingBody(initialReadingsDraft(), { values: { testPsig: '300' } }, { charge: false });
    expect(body).toBeNull();
  });
});

describe('pageCount', () => {
  it('when 41 jobs are listed 20 a page, then there are 3 pages; an empty list still has one', () => {
    expect(pageCount(41, 20)).toBe(3);
    expect(pageCount(0, 20)).toBe(1);
  });
});

describe('fieldWord', () => {
  it('when a job change names a field, then the list shows it in plain words, never the raw key', () => {
    expect(fieldWord('contactEmail')).toBe('contact e-mail');
    expect(fieldWord('someNewField')).toBe('details');
  });
});
