import type { AirHandlerSpec, IndoorCoilSpec, MeteringDeviceSpec, OutdoorUnitSpec, RatedCombinationSpec } from '../../../shared/schemas/equipment';
import type { Controls, LineSet, Site } from '../../../shared/schemas/check';
import { DEFAULT_RULE_SETTINGS } from '../../../shared/rules/settings';
import type { Finding, Pairing, Rule, RuleContext } from '../../../shared/rules/types';

/**
 * Builds test pairings from invented equipment (brand "Northwind", models "NW-…"): a clean 3-ton
 * R-410A AC on a multi-position cased coil and a matching furnace, unless a case says otherwise.
 */

export const baseOutdoor = (): OutdoorUnitSpec => ({
  model: 'NW-AC36-R4',
  brand: 'Northwind',
  systemType: 'ac',
  refrigerant: 'R-410A',
  nominalTons: 3,
  meteringRequired: 'any',
  liquidLineOdIn: 0.375,
  suctionLineOdIn: 0.875,
  maxLineLengthFt: 80,
  maxLiftFt: 30,
  chargedLineLengthFt: 15,
  chargePerFtOz: 0.6,
  voltage: '208/230',
  phase: 1,
});

export const baseCoil = (): IndoorCoilSpec => ({
  model: 'NW-CA36-M',
  brand: 'Northwind',
  configuration: 'multi-position',
  cased: true,
  material: 'aluminum',
  minTons: 2.5,
  maxTons: 3.5,
  refrigerants: ['R-410A'],
  meteringType: 'txv',
  meteringRefrigerant: 'R-410A',
  meteringBidirectional: true,
  meteringBleed: true,
  a2lListed: false,
  widthIn: 17.5,
});

export const baseAirHandler = (): AirHandlerSpec => ({
  model: 'NW-FG80-17',
  brand: 'Northwind',
  kind: 'furnace',
  minTons: 2,
  maxTons: 3.5,
  airflowCfm: 1200,
  widthIn: 17.5,
});

export const baseLineSet = (): LineSet => ({ liquidOdIn: 0.375, suctionOdIn: 0.875, lengthFt: 25, liftFt: 8, filterDrier: 'bi-flow' });

export interface PairingOverrides {
  scope?: Pairing['scope'];
  installDate?: string;
  outdoor?: Partial<OutdoorUnitSpec>;
  /** null removes the coil. */
  indoorCoil?: Partial<IndoorCoilSpec> | null;
  coilKept?: boolean;
  airHandler?: Partial<AirHandlerSpec> | null;
  metering?: MeteringDeviceSpec;
  controls?: Controls;
  lineSet?: Partial<LineSet> | null;
  site?: Partial<Site> | null;
  ratedCombinations?: RatedCombinationSpec[] | null;
}

/** A full pairing with every fact a rule can want, overridden per case. */
export function makePairing(o: PairingOverrides = {}): Pairing {
  const p: Pairing = {
    scope: o.scope ?? 'component-replacement',
    installDate: o.installDate ?? '2026-06-15',
    site: o.site === null ? undefined : { state: 'OH', indoorLocation: 'basement', airflowDirection: 'upflow', hasFloatSwitch: true, ...o.site },
    outdoor: { spec: { ...baseOutdoor(), ...o.outdoor }, kept: false },
    indoorCoil: o.indoorCoil === null ? undefined : { spec: { ...baseCoil(), ...o.indoorCoil }, kept: o.coilKept ?? false },
    airHandler: o.airHandler === null ? undefined : { spec: { ...baseAirHandler(), ...o.airHandler }, kept: true },
    metering: o.metering ? { spec: o.metering, kept: false } : undefined,
    controls: o.controls ?? { thermostatHeatPump: true, auxHeatStages: 1 },
    lineSet: o.lineSet === null ? undefined : { ...baseLineSet(), ...o.lineSet },
    ratedCombinations: o.ratedCombinations === null ? undefined : (o.ratedCombinations ?? []),
  };
  return p;
}

export const testContext = (settings: Partial<RuleContext['settings']> = {}): RuleContext => ({
  settings: { ...DEFAULT_RULE_SETTINGS, ...settings },
  transitionRules: [],
});

/** The findings of one rule. */
export function runRule(rule: Rule, pairing: Pairing, context: RuleContext = testContext()): Finding[] {
  return rule.evaluate(pairing, context);
}

/** A compact outcome for case tables: 'none', 'missing', or the severities joined ("caution"). */
export function outcome(findings: Finding[]): string {
  if (findings.length === 0) return 'none';
  return findings.map((f) => (f.severity === 'info' && typeof f.values.missing === 'string' ? 'missing' : f.severity)).join(',');
}
