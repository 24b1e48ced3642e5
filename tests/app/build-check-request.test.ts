import { describe, expect, it } from 'vitest';
import { buildCheckRequest } from '../../components/check/build-check-request';
import type { CheckFormState } from '../../components/check/check-store';
import type { SectionKey } from '../../components/check/check-sections';

/** A form with a catalog outdoor unit picked and the given section text, everything else empty. */
function form(sections: Partial<Record<SectionKey, Record<string, string>>>): CheckFormState {
  const empty = { mode: 'catalog' as const, typed: {}, kept: false };
  return {
    scope: 'new-system',
    parts: {
      outdoor: { ...empty, picked: { id: 7, label: 'Outdoor', spec: {} } },
      indoorCoil: empty,
      airHandler: empty,
      metering: empty,
    },
    sections: { lineSet: {}, electrical: {}, indoorElectrical: {}, site: {}, controls: {}, ...sections },
    errors: {},
    outcome: null,
  };
}

describe('buildCheckRequest with partial groups (Issue 7 item 3)', () => {
  it('when only the line length is typed, then the request carries a line set with only its length', () => {
    const built = buildCheckRequest(form({ lineSet: { lengthFt: '40' } }));
    expect(built.ok).toBe(true);
    if (built.ok) expect(built.request.lineSet).toEqual({ lengthFt: 40 });
  });

  it('when only "kept" and the previous refrigerant are set, then they go alone', () => {
    const built = buildCheckRequest(form({ lineSet: { reused: 'yes', previousRefrigerant: 'R-22' } }));
    expect(built.ok && built.request.lineSet).toEqual({ reused: true, previousRefrigerant: 'R-22' });
  });

  it('when only the breaker is typed, then the electrical block carries only the breaker', () => {
    const built = buildCheckRequest(form({ electrical: { breakerAmps: '30' } }));
    expect(built.ok && built.request.electrical).toEqual({ breakerAmps: 30 });
  });

  it('when the breaker is not a number, then the error beside it reads in plain words', () => {
    const built = buildCheckRequest(form({ electrical: { breakerAmps: 'thirty' } }));
    expect(built.ok).toBe(false);
    if (!built.ok) expect(built.errors['electrical.breakerAmps']).toMatch(/^Enter a number/);
  });

  it('when a section is left empty, then it is not sent', () => {
    const built = buildCheckRequest(form({}));
    expect(built.ok && Object.keys(built.request).sort()).toEqual(['outdoor', 'scope']);
  });
});

describe('buildCheckRequest with the second-pass fields', () => {
  it('when the wire type, elbows, register height and static are entered, then they go typed', () => {
    const built = buildCheckRequest(
      form({
        electrical: { breakerAmps: '30', conductorType: 'nm-b', overcurrentType: 'hacr-breaker' },
        lineSet: { lengthFt: '45', elbows: '4', outdoorAbove: 'no' },
        site: { lowestRegisterHeightFt: '7.5', externalStaticInWc: '0.6' },
      }),
    );
    expect(built.ok).toBe(true);
    if (built.ok) {
      expect(built.request.electrical).toEqual({ breakerAmps: 30, conductorType: 'nm-b', overcurrentType: 'hacr-breaker' });
      expect(built.request.lineSet).toEqual({ lengthFt: 45, elbows: 4, outdoorAbove: false });
      expect(built.request.site).toEqual({ lowestRegisterHeightFt: 7.5, externalStaticInWc: 0.6 });
    }
  });
});
