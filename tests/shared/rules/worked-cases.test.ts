import { describe, expect, it } from 'vitest';
import { DEFAULT_CONTEXT, runChecks } from '../../../shared/rules/engine';
import type { CheckResult, Pairing, Verdict } from '../../../shared/rules/types';
import { awg, cleanInstall, edit } from './worked-case-builder';

/**
 * Worked pairings, argued the way a senior technician would before brazing anything. Each case
 * states the pairing, the verdict and the blocker/caution findings expected, the reason, and the
 * basis. All equipment is invented (see worked-case-builder.ts); the full registered rule set runs
 * with the default context, so a new rule that fires on one of these is noticed.
 */

const check = (p: Pairing): CheckResult => runChecks(p, DEFAULT_CONTEXT);
/** Rule ids of the findings that count for the verdict, as a sorted list. */
const serious = (r: CheckResult) => [...new Set(r.findings.filter((f) => f.severity !== 'info').map((f) => `${f.severity}:${f.ruleId}`))].sort();

interface WorkedCase {
  name: string;
  pairing: () => Pairing;
  verdict: Verdict;
  /** Every blocker and caution expected, "severity:rule-id". */
  findings: string[];
}

const cases: WorkedCase[] = [
  {
    // Pairing: clean 3-ton R-454B AC, A2L-listed coil with R-454B bleed TXV and leak sensor, certified combination.
    // Verdict: compatible. Reason: every part listed for the refrigerant, in range, fits, and rated.
    // Basis: DESIGN §3 verdict rule; 10 CFR 430.32(c) North 13.4 SEER2 (values.json EFF-01) met by 15.2.
    name: 'a clean, listed, certified R-454B combination',
    pairing: cleanInstall,
    verdict: 'compatible',
    findings: [],
  },
  {
    // Pairing: new R-410A heat pump (component replacement) on a kept coil listed R-22/R-410A whose
    // factory TXV is an R-22 valve. Verdict: incompatible. Reason: an R-22 TXV's power-element charge
    // and orifice are wrong for R-410A pressures: it overfeeds/underfeeds and cannot be set right.
    // Basis: TXV refrigerant rating (common practice, no source); DESIGN §1 "the classic failure".
    name: 'an R-410A heat pump on a coil whose factory TXV is for R-22',
    pairing: () =>
      edit((p) => {
        p.scope = 'component-replacement';
        Object.assign(p.outdoor.spec, { systemType: 'heat-pump', refrigerant: 'R-410A', hspf2: 7.8, seer2: 15, model: 'HW-H36-A4' });
        p.indoorCoil!.kept = true;
        Object.assign(p.indoorCoil!.spec, { refrigerants: ['R-22', 'R-410A'], meteringRefrigerant: 'R-22', a2lListed: false, leakSensor: false, material: 'aluminum' });
        p.controls = { thermostatHeatPump: true, auxHeatStages: 1 };
        p.ratedCombinations = [{ outdoorModel: 'HW-H36-A4', indoorModel: 'HW-K36-MP', seer2: 15, eer2: 11.8, hspf2: 7.8 }];
      }),
    verdict: 'incompatible',
    findings: ['blocker:refrigerant.metering-device'],
  },
  {
    // Pairing: 4-ton outdoor unit on a coil listed 2–3.5 tons (furnace covers 4).
    // Verdict: incompatible. Reason: the coil's surface cannot absorb 4 tons: low suction, icing, floodback.
    // Basis: the coil's listed range (manufacturer data), common practice (no source).
    name: 'a coil whose range stops below the outdoor tonnage',
    pairing: () =>
      edit((p) => {
        Object.assign(p.outdoor.spec, { nominalTons: 4, coolingBtuh: 47000 });
        Object.assign(p.indoorCoil!.spec, { minTons: 2, maxTons: 3.5 });
        Object.assign(p.airHandler!.spec, { maxTons: 4, airflowCfm: 1600 });
        p.ratedCombinations = [];
      }),
    verdict: 'incompatible',
    findings: ['blocker:capacity.coil-range', 'caution:rating.no-rated-combination'],
  },
  {
    // Pairing: R-454B heat pump; the coil's piston body is one-way (no flowrator bypass).
    // Verdict: incompatible. Reason: in heating the liquid leaving the indoor coil meets a restriction
    // it cannot lift off: double metering, no heat. Basis: heat-pump circuit practice (no source).
    name: 'a heat pump with an indoor piston that does not pass flow both ways',
    pairing: () =>
      edit((p) => {
        Object.assign(p.outdoor.spec, { systemType: 'heat-pump', hspf2: 7.8, meteringRequired: 'any', pistonSizeIn: 0.068 });
        Object.assign(p.indoorCoil!.spec, { meteringType: 'piston', pistonSizeIn: 0.068, meteringBidirectional: false, meteringBleed: undefined });
        p.controls = { thermostatHeatPump: true, auxHeatStages: 1 };
        p.ratedCombinations![0].hspf2 = 7.8;
      }),
    verdict: 'incompatible',
    findings: ['blocker:metering.heat-pump-bidirectional'],
  },
  {
    // Pairing: R-454B outdoor unit, field R-454B TXV kit, on a kept R-410A-only coil not listed for A2L.
    // Verdict: incompatible. Reason: an A2L system needs indoor parts listed for it (ignition sources,
    // leak detection); a coil listed only for R-410A is outside both the refrigerant and the A2L listing.
    // Basis: UL 60335-2-40 3rd ed. / EPA SNAP Rule 23 use conditions (values.json REG-06).
    name: 'an A2L outdoor unit with an indoor coil not listed for A2L',
    pairing: () =>
      edit((p) => {
        p.scope = 'component-replacement';
        p.indoorCoil!.kept = true;
        Object.assign(p.indoorCoil!.spec, { refrigerants: ['R-410A'], meteringType: 'none', meteringRefrigerant: undefined, a2lListed: false, leakSensor: false });
        p.metering = { kept: false, spec: { model: 'HW-XK36', type: 'txv', refrigerant: 'R-454B', minTons: 2.5, maxTons: 3.5, bidirectional: true, bleed: true } };
        p.ratedCombinations = [];
      }),
    verdict: 'incompatible',
    findings: ['blocker:refrigerant.a2l-listing', 'blocker:refrigerant.coil-listing', 'caution:rating.no-rated-combination'],
  },
  {
    // Pairing: the clean install on a 40 A breaker where the nameplate MOCP is 30 A.
    // Verdict: incompatible. Reason: the breaker would let a locked-rotor fault run past what the unit
    // is listed to survive. Basis: NEC 110.3(B), 440.22(C) (values.json EL-05 notes).
    name: 'a breaker above the nameplate MOCP',
    pairing: () =>
      edit((p) => {
        p.electrical = { ...p.electrical!, breakerAmps: 40, wireAwg: awg(8) };
      }),
    verdict: 'incompatible',
    findings: ['blocker:electrical.breaker-over-mocp'],
  },
  {
    // Pairing: MCA 28 A on 12 AWG copper at 60 °C terminals (20 A), 30 A breaker within MOCP 45 A.
    // Verdict: incompatible. Reason: the conductor carries less than the minimum circuit ampacity: it overheats.
    // Basis: NEC 440.35 / Table 310.16 (12 AWG Cu 60 °C = 20 A, values.json EL-01), 110.14(C).
    name: 'wire below the MCA',
    pairing: () =>
      edit((p) => {
        Object.assign(p.outdoor.spec, { mcaAmps: 28, mocpAmps: 45 });
        p.electrical = { ...p.electrical!, breakerAmps: 30, wireAwg: 12 };
      }),
    verdict: 'incompatible',
    findings: ['blocker:electrical.wire-ampacity'],
  },
  {
    // Pairing: a 3-ton split AC in Texas whose certified combination is SEER2 13.4 (EER2 11.2).
    // Verdict: incompatible. Reason: Texas is in the DOE Southeast region, where a split AC under
    // 45,000 Btu/h installed from 2023 needs 14.3 SEER2. Basis: 10 CFR 430.32(c) (values.json EFF-02, EFF-09).
    name: 'a combination below the regional minimum for its state',
    pairing: () =>
      edit((p) => {
        p.site!.state = 'TX';
        Object.assign(p.outdoor.spec, { seer2: 13.4, eer2: 11.2 });
        p.ratedCombinations = [{ ...p.ratedCombinations![0], seer2: 13.4, eer2: 11.2 }, ...p.ratedCombinations!.slice(1)];
      }),
    verdict: 'incompatible',
    findings: ['blocker:efficiency.regional-minimum'],
  },
  {
    // Pairing: an upflow-only coil laid horizontal in an attic (float switch fitted).
    // Verdict: incompatible. Reason: condensate runs off the A-coil past the upflow pan into the attic.
    // Basis: coil installation instructions (listed positions), common practice (no source).
    name: 'an upflow coil installed horizontal in an attic',
    pairing: () =>
      edit((p) => {
        p.indoorCoil!.spec.configuration = 'upflow';
        Object.assign(p.site!, { indoorLocation: 'attic', airflowDirection: 'horizontal-left', hasFloatSwitch: true });
      }),
    verdict: 'incompatible',
    findings: ['blocker:fit.coil-orientation'],
  },
  {
    // Pairing: a 21 in cased coil on a 17.5 in furnace.
    // Verdict: incompatible. Reason: it overhangs the furnace outlet; it cannot be sealed or supported
    // as listed. Basis: coil/furnace instructions (cabinet widths), common practice (no source).
    name: 'a coil wider than the furnace it sits on',
    pairing: () =>
      edit((p) => {
        p.indoorCoil!.spec.widthIn = 21;
      }),
    verdict: 'incompatible',
    findings: ['blocker:fit.coil-cabinet'],
  },
  {
    // Pairing: a 14.5 in coil on a 17.5 in furnace.
    // Verdict: compatible with cautions. Reason: it works with a sealed transition; without one air
    // bypasses the coil. Basis: common practice (no source).
    name: 'a coil narrower than the furnace',
    pairing: () =>
      edit((p) => {
        p.indoorCoil!.spec.widthIn = 14.5;
      }),
    verdict: 'compatible-with-cautions',
    findings: ['caution:fit.coil-cabinet'],
  },
  {
    // Pairing: a TXV-required outdoor unit on a new coil with a fixed piston.
    // Verdict: incompatible. Reason: the unit's rating and its protection assume an expansion valve.
    // Basis: outdoor unit installation instructions, common practice (no source).
    name: 'a TXV-required outdoor unit on a piston coil',
    pairing: () =>
      edit((p) => {
        Object.assign(p.indoorCoil!.spec, { meteringType: 'piston', pistonSizeIn: 0.068, meteringBleed: undefined });
      }),
    verdict: 'incompatible',
    findings: ['blocker:metering.type-required'],
  },
  {
    // Pairing: a 60 ft line set on a unit that gives no maximum (shop default 50 ft).
    // Verdict: compatible with cautions. Reason: not outside any stated limit, but long-line measures
    // need checking. Basis: shop default, common practice (no source) — values.json LS-05.
    name: 'a long line set on a unit with no stated limit',
    pairing: () =>
      edit((p) => {
        p.outdoor.spec.maxLineLengthFt = undefined;
        p.lineSet!.lengthFt = 60;
      }),
    verdict: 'compatible-with-cautions',
    findings: ['caution:lineset.length'],
  },
  {
    // Pairing: an R-454B heat pump with a one-way liquid-line drier.
    // Verdict: incompatible. Reason: the flow reverses through it in heating. Basis: common practice (no source).
    name: 'a heat pump with a one-way filter-drier',
    pairing: () =>
      edit((p) => {
        Object.assign(p.outdoor.spec, { systemType: 'heat-pump', hspf2: 7.8 });
        p.controls = { thermostatHeatPump: true, auxHeatStages: 1 };
        p.ratedCombinations![0].hspf2 = 7.8;
        p.lineSet!.filterDrier = 'one-way';
      }),
    verdict: 'incompatible',
    findings: ['blocker:lineset.filter-drier'],
  },
  {
    // Pairing: a heat pump on a cooling-only thermostat.
    // Verdict: incompatible. Reason: nothing drives the reversing valve: no heat-pump heating.
    // Basis: heat-pump control wiring, common practice (no source).
    name: 'a heat pump on a thermostat that cannot run one',
    pairing: () =>
      edit((p) => {
        Object.assign(p.outdoor.spec, { systemType: 'heat-pump', hspf2: 7.8 });
        p.ratedCombinations![0].hspf2 = 7.8;
        p.controls = { thermostatHeatPump: false };
      }),
    verdict: 'incompatible',
    findings: ['blocker:controls.heat-pump-thermostat'],
  },
  {
    // Pairing: the coil's TXV is a non-bleed valve, single-phase unit, no start kit.
    // Verdict: compatible with cautions. Reason: it works once a hard-start kit is fitted.
    // Basis: trade practice for hard-shutoff TXVs, common practice (no source).
    name: 'a non-bleed TXV on a single-phase unit without start assist',
    pairing: () =>
      edit((p) => {
        p.indoorCoil!.spec.meteringBleed = false;
      }),
    verdict: 'compatible-with-cautions',
    findings: ['caution:metering.start-assist'],
  },
  {
    // Pairing: the indoor unit in an attic with neither float switch nor secondary pan.
    // Verdict: compatible with cautions. Reason: a blocked drain comes through the ceiling.
    // Basis: IRC M1411.3 / IMC 307.2.3 (from memory for the clause numbers).
    name: 'an attic unit without overflow protection',
    pairing: () =>
      edit((p) => {
        Object.assign(p.site!, { indoorLocation: 'attic', hasFloatSwitch: false, hasSecondaryPan: false });
      }),
    verdict: 'compatible-with-cautions',
    findings: ['caution:condensate.overflow-protection'],
  },
  {
    // Pairing: a 5-ton outdoor unit on a furnace whose catalog gives one rated figure, 1400 CFM (coil
    // and furnace ranges cover 5 tons). Verdict: compatible with cautions. Reason (Issue 12 correction 1):
    // 280 CFM/ton would freeze the coil, but a catalog CFM is one tap; the tech must set the blower to
    // about 2000 CFM and confirm a tap reaches it, not walk away from the sale.
    // Basis: 350–450 CFM/ton band (values.json CM-09), common practice (no source).
    name: 'a blower whose one rated figure is far below the airflow the tonnage needs',
    pairing: () =>
      edit((p) => {
        Object.assign(p.outdoor.spec, { nominalTons: 5, coolingBtuh: 57000, mcaAmps: 28, mocpAmps: 45, suctionLineOdIn: 1.125 });
        Object.assign(p.indoorCoil!.spec, { minTons: 4, maxTons: 5, widthIn: 21 });
        Object.assign(p.airHandler!.spec, { minTons: 4, maxTons: 5, airflowCfm: 1400, widthIn: 21 });
        p.lineSet!.suctionOdIn = 1.125;
        p.electrical = { ...p.electrical!, breakerAmps: 40, wireAwg: awg(8) };
        p.ratedCombinations = [{ outdoorModel: 'HW-C36-B4', indoorModel: 'HW-K36-MP', seer2: 15, eer2: 11.9 }];
      }),
    verdict: 'compatible-with-cautions',
    findings: ['caution:airflow.per-ton'],
  },
  {
    // Same pairing with the furnace's blower table and 0.8 in. w.c. measured: the highest tap gives
    // 1518 CFM there, under the 1750 CFM 5 tons needs (350 × 5). Verdict: incompatible. Reason: no tap
    // can move enough air at this duct static; the coil would freeze and flood the compressor.
    // Basis: 350–450 CFM/ton band (values.json CM-09); the table's figures are invented for the case.
    name: 'a blower with no tap that reaches the band at the measured static',
    pairing: () =>
      edit((p) => {
        Object.assign(p.outdoor.spec, { nominalTons: 5, coolingBtuh: 57000, mcaAmps: 28, mocpAmps: 45, suctionLineOdIn: 1.125 });
        Object.assign(p.indoorCoil!.spec, { minTons: 4, maxTons: 5, widthIn: 21 });
        Object.assign(p.airHandler!.spec, { minTons: 4, maxTons: 5, airflowCfm: 1400, widthIn: 21 });
        p.lineSet!.suctionOdIn = 1.125;
        p.electrical = { ...p.electrical!, breakerAmps: 40, wireAwg: awg(8) };
        p.ratedCombinations = [{ outdoorModel: 'HW-C36-B4', indoorModel: 'HW-K36-MP', seer2: 15, eer2: 11.9 }];
        p.airHandler!.spec.blowerTable = [
          { tap: 'med', points: [{ staticInWc: 0.5, cfm: 1450 }, { staticInWc: 1, cfm: 1290 }] },
          { tap: 'high', points: [{ staticInWc: 0.5, cfm: 1650 }, { staticInWc: 1, cfm: 1430 }] },
        ];
        p.site!.externalStaticInWc = 0.8;
      }),
    verdict: 'incompatible',
    findings: ['blocker:airflow.per-ton'],
  },
  {
    // Pairing: R-454B with flare joints at the indoor coil.
    // Verdict: incompatible. Reason: a flare is a leak path into the occupied space for a flammable
    // refrigerant. Basis: UL 60335-2-40 3rd ed. joint rules (from memory).
    name: 'an A2L system with indoor flare joints',
    pairing: () =>
      edit((p) => {
        p.lineSet!.indoorFlareJoints = true;
      }),
    verdict: 'incompatible',
    findings: ['blocker:lineset.reuse-condition'],
  },
  {
    // Pairing: the clean install checked with no rated-combination lookup (offline in a driveway).
    // Verdict: compatible (no problem found), but coverage says the rating was not checked: a
    // missing fact never reads as a clean pass. Basis: DESIGN §3 coverage.
    name: 'an offline check with no rated-combination lookup',
    pairing: () =>
      edit((p) => {
        p.ratedCombinations = undefined;
      }),
    verdict: 'compatible',
    findings: [],
  },
];

describe('worked pairing cases', () => {
  it.each(cases.map((c) => [c.name, c] as const))('when %s is checked, then the verdict and findings are as a senior tech argues', (_name, c) => {
    const result = check(c.pairing());
    expect(serious(result)).toEqual([...c.findings].sort());
    expect(result.verdict).toBe(c.verdict);
  });

  it('when the check is offline, then coverage lists the rated-combination lookup as not checked', () => {
    const result = check(cases[cases.length - 1].pairing());
    expect(result.coverage.notChecked).toContainEqual({ family: 'rating', missing: 'rated-combination lookup (offline)' });
  });

  it('when the clean install is checked, then every family ran and only the second-pass checks ask for their new facts', () => {
    const result = check(cleanInstall());
    // Issue 12: a check with none of the new facts reads as before, plus a coverage note per new check.
    expect(result.coverage.notChecked).toEqual([
      { family: 'lineset', missing: "outdoor unit's standard line length (long-line instructions)" },
      { family: 'electrical', missing: 'disconnect at the outdoor unit (within sight, rating)' },
      { family: 'electrical', missing: 'whether the nameplate calls for fuses or HACR breakers' },
    ]);
    expect(result.coverage.ran).toHaveLength(13);
  });

  it('when the clean install is checked, then computed carries the figures behind the findings', () => {
    // 1200 / 3 = 400 CFM/ton (values.json CM-09); (25 − 15) × 0.55 = 5.5 oz (LS-03 method);
    // NEC 240.6(A) standard sizes between MCA 18 and MOCP 30: 20, 25, 30 (values.json EL-03);
    // North split AC 13.4 SEER2 (10 CFR 430.32(c), values.json EFF-01).
    const { computed } = check(cleanInstall());
    expect(computed.cfmPerTon).toBe(400);
    expect(computed.chargeAdjustmentOz).toBe(5.5);
    expect(computed.breakerRange).toEqual({ mcaAmps: 18, mocpAmps: 30, standardSizes: [20, 25, 30] });
    expect(computed.regionalMinimum).toMatchObject({ seer2: 13.4 });
    expect(computed.ratedCombination).toMatchObject({ reference: 'CERT-HW-0001' });
  });
});
