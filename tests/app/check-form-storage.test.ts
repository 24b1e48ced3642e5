import { describe, expect, it } from 'vitest';
import type { CheckResult } from '../../shared/rules/types';
import { restoreCheckForm, serializeCheckForm } from '../../components/check/check-form-storage';
import { initialCheckForm, type CheckFormState } from '../../components/check/check-store';

function filled(): CheckFormState {
  const form = initialCheckForm();
  // Invented parts and entries; 35 ft is a typical residential line-set length (common practice (no source)).
  form.scope = 'component-replacement';
  form.parts.outdoor = { ...form.parts.outdoor, mode: 'catalog', picked: { id: 12, label: 'ZQ-HP36-454', spec: { model: 'ZQ-HP36-454', refrigerant: 'R-454B', nominalTons: 3 } } };
  form.parts.indoorCoil = { ...form.parts.indoorCoil, mode: 'typed', typed: { model: 'OLD-COIL', refrigerants: 'R-22' }, kept: true };
  form.sections = { ...form.sections, lineSet: { lengthFt: '35' } } as CheckFormState['sections'];
  form.errors = { outdoor: 'Pick a part' };
  form.outcome = { result: { verdict: 'compatible', findings: [], computed: {}, coverage: [] } as unknown as CheckResult, offline: true };
  return form;
}

describe('check form storage', () => {
  it('when a filled form is stored and restored, then parts, entries, scope and the answer come back and error marks do not', () => {
    const form = filled();
    const back = restoreCheckForm(serializeCheckForm(form), initialCheckForm());
    expect(back.scope).toBe('component-replacement');
    expect(back.parts.outdoor.picked?.spec.refrigerant).toBe('R-454B');
    expect(back.parts.indoorCoil).toMatchObject({ mode: 'typed', kept: true, typed: { model: 'OLD-COIL', refrigerants: 'R-22' } });
    expect(back.sections).toMatchObject({ lineSet: { lengthFt: '35' } });
    expect(back.outcome?.offline).toBe(true);
    expect(back.errors).toEqual({});
  });

  it('when nothing is stored or the text is not JSON, then the fresh form is used', () => {
    const fresh = initialCheckForm();
    expect(restoreCheckForm(null, fresh)).toBe(fresh);
    expect(restoreCheckForm('{not json', fresh)).toBe(fresh);
    expect(restoreCheckForm('[1,2]', fresh)).toBe(fresh);
  });

  it('when stored values have the wrong shape, then each falls back to the fresh value on its own', () => {
    const fresh = initialCheckForm();
    const raw = JSON.stringify({
      scope: 'everything',
      parts: { outdoor: { mode: 'guess', typed: {} }, indoorCoil: { mode: 'typed', typed: { minTons: 3 }, kept: 'yes' } },
      sections: { lineSet: 'long' },
      outcome: { result: { verdict: 'compatible' } },
    });
    const back = restoreCheckForm(raw, fresh);
    expect(back.scope).toBe(fresh.scope);
    expect(back.parts.outdoor).toEqual(fresh.parts.outdoor);
    // A number where a field's text belongs: the typed values fall back, the mode is kept, "yes" is not true.
    expect(back.parts.indoorCoil).toEqual({ mode: 'typed', picked: undefined, typed: fresh.parts.indoorCoil.typed, kept: false });
    expect(back.sections).toEqual(fresh.sections);
    expect(back.outcome).toBeNull();
  });
});
