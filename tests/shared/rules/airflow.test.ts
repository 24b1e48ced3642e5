import { describe, expect, it } from 'vitest';
import { formatBlowerTable, parseBlowerTable, tapCfmAt } from '../../../shared/airflow/blower-table';
import { perTon } from '../../../shared/rules/airflow/per-ton';
import { makePairing, outcome, runRule, testContext, type PairingOverrides } from './pairing-builder';

// Band 350–450 CFM/ton around 400: common practice (no source) — values.json CM-09.
// Issue 12 correction 1: a single rated CFM is one tap, so outside the band it is a caution, never a blocker.
describe('airflow.per-ton from one rated figure', () => {
  const cases: [string, PairingOverrides, string][] = [
    ['1200 CFM on 3 tons (400 CFM/ton)', { airHandler: { airflowCfm: 1200 } }, 'none'],
    ['1050 CFM on 3 tons (350, band edge)', { airHandler: { airflowCfm: 1050 } }, 'none'],
    ['1049 CFM on 3 tons (349.7, just below)', { airHandler: { airflowCfm: 1049 } }, 'caution'],
    ['1350 CFM on 3 tons (450, band edge)', { airHandler: { airflowCfm: 1350 } }, 'none'],
    ['1351 CFM on 3 tons (450.3, just above)', { airHandler: { airflowCfm: 1351 } }, 'caution'],
    ['880 CFM on 3 tons (293, far below: still a caution)', { airHandler: { airflowCfm: 880 } }, 'caution'],
    ['1550 CFM on 3 tons (517, far above: still a caution)', { airHandler: { airflowCfm: 1550 } }, 'caution'],
    ['the air handler gives no airflow', { airHandler: { airflowCfm: undefined } }, 'missing'],
    ['there is no air handler', { airHandler: null }, 'missing'],
  ];
  it.each(cases)('when %s, then the outcome is as expected', (_name, overrides, expected) => {
    expect(outcome(runRule(perTon, makePairing(overrides)))).toBe(expected);
  });

  it('when the rated figure is far below the band, then the caution says to set the blower to about 1200 CFM', () => {
    // Target (350 + 450) / 2 × 3 tons = 1200 CFM (band midpoint, common practice (no source))
    const [f] = runRule(perTon, makePairing({ airHandler: { airflowCfm: 800 } }));
    expect(f.severity).toBe('caution');
    expect(f.title).toBe('Airflow 267 CFM per ton is below 350: set the blower to about 1200 CFM');
    expect(f.values).toMatchObject({ targetCfm: 1200 });
  });

  it('when the shop narrows the band to 375–425, then 1100 CFM on 3 tons (367) is a caution', () => {
    // 375–425 is a shop setting chosen for this test (no source)
    const f = runRule(perTon, makePairing({ airHandler: { airflowCfm: 1100 } }), testContext({ cfmPerTonMin: 375, cfmPerTonMax: 425 }));
    expect(outcome(f)).toBe('caution');
    expect(f[0].values).toMatchObject({ cfmPerTon: 367, bandMin: 375, bandMax: 425 });
    expect(f[0].detail).toContain('367 CFM/ton');
  });
});

/**
 * Invented blower table of a 3-ton furnace (figures made up for the test, shaped like published fan
 * data: CFM falls as static rises). 3 tons needs 1050–1350 CFM (350–450 CFM/ton, common practice).
 */
const TABLE = 'low:0.3=950/0.5=880/0.7=800;med:0.3=1150/0.5=1080/0.7=1000;high:0.3=1400/0.5=1320/0.7=1230';

describe('blower table', () => {
  it('when the compact text is parsed and written back, then it round-trips', () => {
    const parsed = parseBlowerTable(TABLE);
    expect('table' in parsed && formatBlowerTable(parsed.table)).toBe(TABLE);
  });

  it('when the static falls between two points, then the CFM is interpolated linearly', () => {
    const parsed = parseBlowerTable(TABLE);
    if (!('table' in parsed)) throw new Error('parse failed');
    // med tap: 1080 at 0.5, 1000 at 0.7 → 1040 at 0.6 (linear interpolation, arithmetic)
    expect(tapCfmAt(parsed.table[1], 0.6)).toBeCloseTo(1040, 9);
    expect(tapCfmAt(parsed.table[1], 0.9)).toBeUndefined();
  });

  it('when a point is malformed, then the message says how it should read', () => {
    expect(parseBlowerTable('low:0.3-900')).toEqual({ error: expect.stringContaining('static=CFM') });
  });
});

describe('airflow.per-ton with a blower table at the measured static', () => {
  const withTable = (staticInWc: number | undefined, table = TABLE) =>
    runRule(
      perTon,
      makePairing({ airHandler: { airflowCfm: 1400, blowerTable: parseTable(table) }, site: { externalStaticInWc: staticInWc } }),
    );

  it.each([
    // 0.5 in. w.c.: med 1080 and high 1320 sit in 1050–1350; low 880 does not
    [0.5, 'info', 'med;high'],
    // 0.7: med 1000 is below 1050; high 1230 fits
    [0.7, 'info', 'high'],
    // 0.3: med 1150 fits; high 1400 is above 1350
    [0.3, 'info', 'med'],
  ] as const)('when the static is %d in. w.c., then a %s names the taps in the band (%s)', (staticInWc, severity, taps) => {
    const [f] = withTable(staticInWc);
    expect(f.severity).toBe(severity);
    expect(f.values.tapsInBand).toBe(taps);
  });

  it('when no tap can reach the band at the measured static, then it is a blocker naming the taps', () => {
    // A blower whose high tap gives 1040 CFM at 0.7 in. w.c.: 10 CFM under 1050 (just below the band edge)
    const weak = 'low:0.5=850/0.7=780;high:0.5=1110/0.7=1040';
    const [f] = withTable(0.7, weak);
    expect(f.severity).toBe('blocker');
    expect(f.title).toBe('No blower tap reaches 1050–1350 CFM at 0.7 in. w.c.');
    expect(f.detail).toContain('low 780 CFM and high 1040 CFM');
  });

  it('when the high tap gives exactly 1050 CFM at the measured static, then it is in the band (edge)', () => {
    const [f] = withTable(0.7, 'low:0.5=850/0.7=780;high:0.5=1120/0.7=1050');
    expect(f.severity).toBe('info');
    expect(f.values.tapsInBand).toBe('high');
  });

  it('when the table is given but no static was measured, then the rated figure rules (a caution at most) and the static is asked for', () => {
    const findings = withTable(undefined);
    // 1400 CFM / 3 tons = 467 CFM/ton: above 450 → caution from the rated figure
    expect(outcome(findings)).toBe('caution,missing');
    expect(findings[1].values.missing).toBe('measured external static pressure');
  });

  it('when the measured static is outside the table, then the rule says it cannot pick a tap', () => {
    expect(outcome(withTable(1.2))).toBe('missing');
  });
});

function parseTable(text: string) {
  const parsed = parseBlowerTable(text);
  if (!('table' in parsed)) throw new Error(parsed.error);
  return parsed.table;
}
