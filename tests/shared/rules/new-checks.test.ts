import { describe, expect, it } from 'vitest';
import { isMissingFacts } from '../../../shared/rules/define-rule';
import { DEFAULT_CONTEXT } from '../../../shared/rules/engine';
import { disconnect } from '../../../shared/rules/electrical/disconnect';
import { overcurrentType } from '../../../shared/rules/electrical/overcurrent-type';
import { wireAmpacity } from '../../../shared/rules/electrical/wire-ampacity';
import { length } from '../../../shared/rules/lineset/length';
import { lift } from '../../../shared/rules/lineset/lift';
import { longLine } from '../../../shared/rules/lineset/long-line';
import type { Finding, Pairing, Rule } from '../../../shared/rules/types';
import { awg, edit } from './worked-case-builder';

/**
 * Issue 12 items 11 and 12: conductor type, copper-only nameplates, the disconnect, the kind of
 * overcurrent protection, long-line practice with elbows' equivalent length, and the lift limit by
 * direction. Each table sits at its edges. Pairings: the clean R-454B install (MCA 18 A, MOCP 30 A,
 * 7/8 in suction, 80 ft maximum line, 30 ft lift) from worked-case-builder.ts.
 */
const run = (rule: Rule, p: Pairing): Finding[] => rule.evaluate(p, DEFAULT_CONTEXT);
const outcome = (fs: Finding[]) => (fs.length === 0 ? 'none' : fs.map((f) => (isMissingFacts(f) ? 'missing' : f.severity)).join(','));

describe('conductor type (NEC 334.80, 340.80) and copper-only nameplates', () => {
  // 10 AWG copper: 30 A at 60 °C, 35 A at 75 °C (NEC Table 310.16, values.json EL-01)
  const wire = (mcaAmps: number, conductorType: 'nm-b' | 'uf-b' | 'thhn-conduit' | undefined) =>
    edit((p) => {
      Object.assign(p.outdoor.spec, { mcaAmps, mocpAmps: 45 });
      p.electrical = { breakerAmps: 40, wireAwg: awg(10), wireMaterial: 'copper', terminalRatingC: 75, conductorType };
    });

  it.each([
    [30, 'nm-b', 'none'],
    [30.5, 'nm-b', 'blocker'],
    [30.5, 'uf-b', 'blocker'],
    [30.5, 'thhn-conduit', 'none'],
    [35, 'thhn-conduit', 'none'],
    [35.5, 'thhn-conduit', 'blocker'],
  ] as const)('when MCA is %d A on 10 AWG copper %s with 75 °C terminals, then %s', (mca, type, expected) => {
    // The NEC 240.4(D) note (10 AWG on a 40 A breaker, allowed by Article 440) is an info: only serious findings count here
    expect(outcome(run(wireAmpacity, wire(mca, type)).filter((f) => f.severity !== 'info'))).toBe(expected);
  });

  it('when NM-B limits the wire, then the finding names the cable rule', () => {
    const [f] = run(wireAmpacity, wire(30.5, 'nm-b'));
    expect(f.detail).toContain('NM-B cable is held to it (NEC 334.80)');
  });

  it.each([
    ['aluminum', true, 'blocker'],
    ['copper', true, 'none'],
    ['aluminum', undefined, 'none'],
  ] as const)('when %s wire feeds a unit with copperOnly %s, then %s', (material, copperOnly, expected) => {
    // 8 AWG aluminum: 40 A at 60 °C (NEC Table 310.16) ≥ 18 A, so only the marking decides
    const p = edit((q) => {
      q.outdoor.spec.copperOnly = copperOnly;
      q.electrical = { breakerAmps: 25, wireAwg: awg(8), wireMaterial: material };
    });
    expect(outcome(run(wireAmpacity, p))).toBe(expected);
  });

  it('worked: a 3-ton unit with MCA 31 A fed with 10 AWG NM-B through a 40 A breaker is refused', () => {
    // A senior tech: "Romex is 60 °C wire whatever the lugs say: 10 AWG NM-B is good for 30 A, and this
    // unit needs 31. Pull 8 AWG, or THHN in conduit landed on 75 °C terminals."
    const p = wire(31, 'nm-b');
    expect(run(wireAmpacity, p)[0].title).toBe('10 AWG copper carries 30 A; the unit needs 31 A');
  });
});

describe('electrical.disconnect (NEC 440.14, 440.12(A))', () => {
  const withDisconnect = (d: NonNullable<NonNullable<Pairing['electrical']>['disconnect']> | undefined) =>
    edit((p) => (p.electrical!.disconnect = d));
  it.each([
    ['within sight, 30 A', { withinSight: true, ratingAmps: 30 }, 'none'],
    ['within sight, 18 A (the MCA)', { withinSight: true, ratingAmps: 18 }, 'none'],
    ['within sight, 17 A', { withinSight: true, ratingAmps: 17 }, 'blocker'],
    ['not within sight, 30 A', { withinSight: false, ratingAmps: 30 }, 'blocker'],
    ['within sight, rating not given', { withinSight: true }, 'missing'],
    ['not described', undefined, 'missing'],
  ] as const)('when the disconnect is %s, then %s', (_name, d, expected) => {
    expect(outcome(run(disconnect, withDisconnect(d)))).toBe(expected);
  });

  it('worked: a disconnect on the far side of the house is a blocker', () => {
    // A senior tech: "The breaker in the basement panel does not count: 440.14 wants a disconnect I can see
    // from the condenser, so nobody switches it on while I have my hands in it."
    const [f] = run(disconnect, withDisconnect({ withinSight: false, ratingAmps: 60 }));
    expect(f.title).toBe('No disconnect within sight of the outdoor unit');
    expect(f.basis.citation).toContain('NEC 440.14');
  });
});

describe('electrical.overcurrent-type', () => {
  const protection = (
    required: 'fuse' | 'fuse-or-hacr' | undefined,
    given: 'breaker' | 'hacr-breaker' | 'fuse' | undefined,
    fusedDisconnect = false,
  ) =>
    edit((p) => {
      p.outdoor.spec.overcurrentRequired = required;
      p.electrical = {
        ...p.electrical!,
        overcurrentType: given,
        disconnect: fusedDisconnect ? { withinSight: true, ratingAmps: 30, fused: true } : undefined,
      };
    });
  it.each([
    ['fuse', 'fuse', false, 'none'],
    ['fuse', 'hacr-breaker', false, 'blocker'],
    ['fuse-or-hacr', 'hacr-breaker', false, 'none'],
    ['fuse-or-hacr', 'breaker', false, 'blocker'],
    ['fuse-or-hacr', undefined, true, 'none'],
    ['fuse', undefined, false, 'missing'],
    [undefined, 'breaker', false, 'missing'],
  ] as const)(
    'when the nameplate calls for %s and the circuit has %s (fused disconnect %s), then %s',
    (required, given, fused, expected) => {
      expect(outcome(run(overcurrentType, protection(required, given, fused)))).toBe(expected);
    },
  );
});

describe('lineset.long-line and elbows (equivalent length)', () => {
  // Standard length 50 ft from the unit's own field; 7/8 in elbow 2.0 ft (ASHRAE Handbook—Refrigeration ch. 1, from memory)
  const long = (lengthFt: number, change: (p: Pairing) => void = () => {}) =>
    edit((p) => {
      p.outdoor.spec.standardLineLengthFt = 50;
      p.lineSet!.lengthFt = lengthFt;
      change(p);
    });
  const accessories = (fs: Finding[]) => fs.filter((f) => !isMissingFacts(f)).map((f) => f.values.accessory);

  it.each([
    [50, 'none'],
    [51, 'caution,caution'],
  ] as const)('when an AC runs %d ft against a 50 ft standard length, then %s', (ft, expected) => {
    expect(outcome(run(longLine, long(ft)))).toBe(expected);
  });

  it('when an AC runs past it, then a crankcase heater and a hard-start kit are listed, each with its reason', () => {
    const fs = run(longLine, long(70));
    expect(accessories(fs)).toEqual(['crankcase heater', 'hard-start kit']);
    expect(fs[0].title).toBe('Long line (70 ft): a crankcase heater is usually required');
    expect(fs[0].detail).toContain('migrates to the cold compressor');
  });

  it('when a heat pump with start assist runs past it, then crankcase heater, solenoid and accumulator are listed, not the hard-start kit', () => {
    const fs = run(
      longLine,
      long(70, (p) => Object.assign(p.outdoor.spec, { systemType: 'heat-pump', startAssist: true })),
    );
    expect(accessories(fs)).toEqual(['crankcase heater', 'liquid-line solenoid valve', 'suction accumulator']);
  });

  it.each([
    // 45 + 2 × 2.0 = 49 ft; 45 + 3 × 2.0 = 51 ft equivalent
    [2, 'none'],
    [3, 'caution,caution'],
  ] as const)('when 45 ft has %d elbows on 7/8 in, then long-line gives %s', (elbows, expected) => {
    expect(
      outcome(
        run(
          longLine,
          long(45, (p) => (p.lineSet!.elbows = elbows)),
        ),
      ),
    ).toBe(expected);
  });

  it.each([
    // 74 + 3 × 2.0 = 80 ft (at the unit's 80 ft maximum); 75 + 3 × 2.0 = 81 ft
    [74, 'none'],
    [75, 'blocker'],
  ] as const)('when %d ft has 3 elbows on 7/8 in, then the length limit gives %s', (ft, expected) => {
    expect(
      outcome(
        run(
          length,
          edit((p) => Object.assign(p.lineSet!, { lengthFt: ft, elbows: 3 })),
        ),
      ),
    ).toBe(expected);
  });

  it('when the unit gives no standard length and the shop set none, then it is a coverage note', () => {
    expect(
      outcome(
        run(
          longLine,
          edit((p) => (p.lineSet!.lengthFt = 90)),
        ),
      ),
    ).toBe('missing');
  });

  it('when the shop sets a 50 ft standard length, then a unit without its own uses it', () => {
    const context = { ...DEFAULT_CONTEXT, settings: { ...DEFAULT_CONTEXT.settings, defaultStandardLineLengthFt: 50 } };
    expect(
      outcome(
        longLine.evaluate(
          edit((p) => (p.lineSet!.lengthFt = 60)),
          context,
        ),
      ),
    ).toBe('caution,caution');
  });
});

describe('lineset.lift by direction when the unit gives two limits', () => {
  // Invented unit: 50 ft with the outdoor unit above the coil, 15 ft below it
  const lifted = (liftFt: number, outdoorAbove?: boolean) =>
    edit((p) => {
      Object.assign(p.outdoor.spec, { maxLiftFt: undefined, maxLiftOutdoorAboveFt: 50, maxLiftOutdoorBelowFt: 15 });
      Object.assign(p.lineSet!, { liftFt, outdoorAbove });
    });
  it.each([
    [40, undefined, 'none'],
    [50, undefined, 'none'],
    [51, undefined, 'blocker'],
    [-15, undefined, 'none'],
    [-16, undefined, 'blocker'],
    [20, false, 'blocker'],
    [20, true, 'none'],
  ] as const)('when the lift is %d ft (outdoorAbove %s), then %s', (liftFt, above, expected) => {
    expect(outcome(run(lift, lifted(liftFt, above)))).toBe(expected);
  });
});
