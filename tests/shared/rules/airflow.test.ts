import { describe, expect, it } from 'vitest';
import { perTon } from '../../../shared/rules/airflow/per-ton';
import { makePairing, outcome, runRule, testContext, type PairingOverrides } from './pairing-builder';

// Band 350–450 CFM/ton around 400: common practice (no source) — values.json CM-09.
// Blocker beyond 50 CFM/ton outside the band (< 300, > 500): common practice (no source), our decision.
describe('airflow.per-ton', () => {
  const cases: [string, PairingOverrides, string][] = [
    ['1200 CFM on 3 tons (400 CFM/ton)', { airHandler: { airflowCfm: 1200 } }, 'none'],
    ['1050 CFM on 3 tons (350, band edge)', { airHandler: { airflowCfm: 1050 } }, 'none'],
    ['1350 CFM on 3 tons (450, band edge)', { airHandler: { airflowCfm: 1350 } }, 'none'],
    ['1000 CFM on 3 tons (333)', { airHandler: { airflowCfm: 1000 } }, 'caution'],
    ['1400 CFM on 3 tons (467)', { airHandler: { airflowCfm: 1400 } }, 'caution'],
    ['900 CFM on 3 tons (300, blocker edge not crossed)', { airHandler: { airflowCfm: 900 } }, 'caution'],
    ['880 CFM on 3 tons (293)', { airHandler: { airflowCfm: 880 } }, 'blocker'],
    ['1550 CFM on 3 tons (517)', { airHandler: { airflowCfm: 1550 } }, 'blocker'],
    ['the air handler gives no airflow', { airHandler: { airflowCfm: undefined } }, 'missing'],
    ['there is no air handler', { airHandler: null }, 'missing'],
  ];
  it.each(cases)('when %s, then the outcome is as expected', (_name, overrides, expected) => {
    expect(outcome(runRule(perTon, makePairing(overrides)))).toBe(expected);
  });

  it('when the shop narrows the band to 375–425, then 1100 CFM on 3 tons (367) is a caution', () => {
    // 375–425 is a shop setting chosen for this test (no source)
    const f = runRule(perTon, makePairing({ airHandler: { airflowCfm: 1100 } }), testContext({ cfmPerTonMin: 375, cfmPerTonMax: 425 }));
    expect(outcome(f)).toBe('caution');
    expect(f[0].values).toMatchObject({ cfmPerTon: 367, bandMin: 375, bandMax: 425 });
    expect(f[0].detail).toContain('367 CFM/ton');
  });
});
