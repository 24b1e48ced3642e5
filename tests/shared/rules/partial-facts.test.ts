import { describe, expect, it } from 'vitest';
import { isMissingFacts } from '../../../shared/rules/define-rule';
import { DEFAULT_CONTEXT, runChecks } from '../../../shared/rules/engine';
import { CheckRequestSchema, ElectricalSchema, LineSetSchema, SiteSchema } from '../../../shared/schemas/check';
import type { CheckResult, Pairing } from '../../../shared/rules/types';
import { edit } from './worked-case-builder';

/**
 * Partial facts (Issue 7 item 3): every optional group takes what the tech has. Each rule runs on
 * the facts it needs and names the ones it lacks. Pairings start from the clean R-454B install
 * (3-ton, 3/8 in liquid connection, 0.55 oz/ft for 15 ft, MCA 18 A, MOCP 30 A: worked-case-builder).
 */
const check = (p: Pairing): CheckResult => runChecks(p, DEFAULT_CONTEXT);
const ofRule = (r: CheckResult, id: string) => r.findings.filter((f) => f.ruleId === id);
const missingOf = (r: CheckResult, id: string) =>
  ofRule(r, id)
    .filter(isMissingFacts)
    .map((f) => String(f.values.missing));

describe('a line set with only its length', () => {
  const result = check(edit((p) => (p.lineSet = { lengthFt: 90 })));

  it('when only the length is given, then the length rule runs against the unit maximum', () => {
    // 90 ft > the unit's 80 ft (its instructions' maximum, worked-case-builder)
    expect(ofRule(result, 'lineset.length').map((f) => f.severity)).toEqual(['blocker']);
  });

  it("when only the length is given, then the charge adjustment assumes the unit's own liquid size and says so", () => {
    // (90 − 15) ft × 0.55 oz/ft = 41.25 oz → 41.3 (DESIGN §4, equal sizes; unit figure)
    const [f] = ofRule(result, 'lineset.charge-adjustment');
    expect(f.values).toMatchObject({ chargeAdjustmentOz: 41.3, liquidSizeAssumed: true });
    expect(f.detail).toContain("the unit's own size is assumed");
  });

  it('when the tube sizes are not given, then the size rules say which fact they lack', () => {
    expect(missingOf(result, 'lineset.liquid-size')).toEqual(['installed liquid line size']);
    expect(missingOf(result, 'lineset.suction-size')).toEqual(['installed suction line size']);
    expect(result.coverage.notChecked).toContainEqual({ family: 'lineset', missing: 'installed liquid line size' });
  });

  it('when only the length is given, then the A2L charge limit still runs (the charge needs only the length)', () => {
    expect(missingOf(result, 'refrigerant.a2l-charge-area')).toEqual([]);
  });
});

describe('a kept line set with only what it ran before', () => {
  it('when only kept and the previous refrigerant are given, then the oil rule runs and the length rule names the length', () => {
    const result = check(
      edit((p) => {
        Object.assign(p.outdoor.spec, { refrigerant: 'R-410A' });
        Object.assign(p.indoorCoil!.spec, { refrigerants: ['R-410A'], meteringRefrigerant: 'R-410A', a2lListed: false });
        p.scope = 'component-replacement';
        p.lineSet = { reused: true, previousRefrigerant: 'R-22' };
      }),
    );
    // R-22 runs mineral oil, R-410A POE (refrigerant data; retrofit practice, common practice (no source))
    expect(ofRule(result, 'refrigerant.oil-compatibility').map((f) => f.severity)).toEqual(['caution']);
    expect(missingOf(result, 'lineset.length')).toEqual(['line set length']);
    expect(missingOf(result, 'lineset.charge-adjustment')).toEqual(['line set length']);
  });
});

describe('an electrical block with only the breaker', () => {
  it.each([
    // 40 A > 30 A MOCP (NEC 440.22(C)); 15 A < 18 A MCA (trade practice); 27 A not in NEC 240.6(A)
    [40, 'electrical.breaker-over-mocp', 'blocker'],
    [15, 'electrical.breaker-under-mca', 'blocker'],
    [27, 'electrical.breaker-nonstandard', 'caution'],
  ] as const)('when only a %d A breaker is given, then %s gives a %s', (amps, id, severity) => {
    const result = check(edit((p) => (p.electrical = { breakerAmps: amps })));
    expect(ofRule(result, id).map((f) => f.severity)).toEqual([severity]);
    expect(missingOf(result, 'electrical.wire-ampacity')).toEqual(['wire size and material']);
  });

  it('when the wire size is given without its material, then the wire rule names the material', () => {
    const result = check(edit((p) => (p.electrical = { breakerAmps: 25, wireAwg: 10 as never })));
    expect(missingOf(result, 'electrical.wire-ampacity')).toEqual(['wire material (copper or aluminum)']);
  });
});

describe('a site with no state', () => {
  it('when the site gives only the indoor location, then the efficiency minimum says the state is missing and the rest runs', () => {
    const result = check(
      edit((p) => (p.site = { indoorLocation: 'basement', airflowDirection: 'upflow', hasFloatSwitch: true, conditionedAreaSqFt: 1800 })),
    );
    expect(missingOf(result, 'efficiency.regional-minimum')).toEqual(['site state']);
    expect(result.verdict).toBe('compatible');
  });
});

describe('partial groups in the request schema, with messages in plain words', () => {
  it.each([
    ['a line set with only a length', LineSetSchema, { lengthFt: 40 }],
    ['a line set with only kept and what it ran', LineSetSchema, { reused: true, previousRefrigerant: 'r22' }],
    ['an electrical block with only a breaker', ElectricalSchema, { breakerAmps: 30 }],
    ['a site with only a location', SiteSchema, { indoorLocation: 'attic' }],
  ] as const)('when %s is sent, then it is accepted', (_name, schema, body) => {
    expect(schema.safeParse(body).success).toBe(true);
  });

  it.each([
    ['wire material', ElectricalSchema, { wireMaterial: 'tin' }, 'Choose copper or aluminum'],
    ['wire size', ElectricalSchema, { wireAwg: 11 }, 'Wire size must be one of 14, 12, 10, 8, 6, 4, 3, 2, 1, 1/0, 2/0, 3/0 or 4/0 AWG'],
    ['breaker', ElectricalSchema, { breakerAmps: 'lots' }, 'Breaker size must be a number from 1 to 1000 A'],
    ['line length', LineSetSchema, { lengthFt: 0 }, 'Line length must be a number from 1 to 500 ft'],
    [
      'previous refrigerant',
      LineSetSchema,
      { previousRefrigerant: 'R-12' },
      'Choose the refrigerant it ran before: R-22, R-410A, R-32, R-454B or R-407C',
    ],
    ['state', SiteSchema, { state: 'Ohio' }, 'State must be a two-letter code such as OH'],
  ] as const)('when the %s is wrong, then the message reads in plain words', (_name, schema, body, message) => {
    const result = schema.safeParse(body);
    expect(result.success).toBe(false);
    expect(result.error!.issues[0].message).toBe(message);
  });

  it('when a whole request carries only partial groups, then it parses', () => {
    const body = {
      scope: 'new-system',
      outdoor: { spec: { systemType: 'ac', refrigerant: 'R-410A', nominalTons: 3 } },
      lineSet: { lengthFt: 30 },
      electrical: { breakerAmps: 30 },
      site: { indoorLocation: 'closet' },
    };
    expect(CheckRequestSchema.safeParse(body).success).toBe(true);
  });
});
