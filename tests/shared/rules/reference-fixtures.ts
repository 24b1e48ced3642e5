import type { AirHandlerSpec, IndoorCoilSpec, MeteringDeviceSpec, OutdoorUnitSpec, RatedCombinationSpec } from '../../../shared/schemas/equipment';
import type { Electrical, LineSet, Site, WireAwg } from '../../../shared/schemas/check';
import { DEFAULT_RULE_SETTINGS } from '../../../shared/rules/settings';
import { DEFAULT_TRANSITION_RULES } from '../../../shared/regulation';
import type { Finding, Pairing, Rule, RuleContext, RuleSettings } from '../../../shared/rules/types';

/** Invented test equipment (no real brands or models); each test overrides what it is about. */
export function outdoor(over: Partial<OutdoorUnitSpec> = {}): OutdoorUnitSpec {
  return { model: 'TQ-OD36', brand: 'Testline', systemType: 'ac', refrigerant: 'R-410A', nominalTons: 3, ...over };
}

export function coil(over: Partial<IndoorCoilSpec> = {}): IndoorCoilSpec {
  return { model: 'TQ-C36', brand: 'Testline', minTons: 2, maxTons: 3.5, refrigerants: ['R-410A'], meteringType: 'txv', meteringRefrigerant: 'R-410A', ...over };
}

export function airHandler(over: Partial<AirHandlerSpec> = {}): AirHandlerSpec {
  return { model: 'TQ-AH36', brand: 'Testline', kind: 'air-handler', ...over };
}

export function kit(over: Partial<MeteringDeviceSpec> = {}): MeteringDeviceSpec {
  return { model: 'TQ-K3', brand: 'Testline', type: 'txv', refrigerant: 'R-410A', ...over };
}

/** Electrical facts; wireAwg takes every WIRE_AWG size (the schema's inferred type is narrower than its values). */
export type ElectricalInput = Partial<Omit<Electrical, 'wireAwg'> & { wireAwg: WireAwg }>;

export function electrical(over: ElectricalInput = {}): Electrical {
  return { breakerAmps: 30, wireAwg: 10, wireMaterial: 'copper', ...over } as Electrical;
}

export function lineSet(over: Partial<LineSet> = {}): LineSet {
  return { liquidOdIn: 0.375, suctionOdIn: 0.875, lengthFt: 25, ...over };
}

export function site(over: Partial<Site> = {}): Site {
  return { state: 'OH', ...over };
}

export function combo(over: Partial<RatedCombinationSpec> = {}): RatedCombinationSpec {
  return { outdoorModel: 'TQ-OD36', indoorModel: 'TQ-C36', ...over };
}

interface PairingInput {
  scope?: Pairing['scope'];
  installDate?: string;
  site?: Site;
  outdoor?: Partial<OutdoorUnitSpec>;
  outdoorKept?: boolean;
  coil?: Partial<IndoorCoilSpec> | null;
  coilKept?: boolean;
  airHandler?: Partial<AirHandlerSpec>;
  airHandlerKept?: boolean;
  metering?: Partial<MeteringDeviceSpec>;
  lineSet?: Partial<LineSet>;
  electrical?: ElectricalInput;
  indoorElectrical?: ElectricalInput;
  ratedCombinations?: RatedCombinationSpec[];
}

/** A pairing: outdoor unit and indoor coil always (coil: null drops it), other parts when given. */
export function pairing(input: PairingInput = {}): Pairing {
  return {
    scope: input.scope ?? 'new-system',
    installDate: input.installDate ?? '2026-06-01',
    site: input.site,
    outdoor: { spec: outdoor(input.outdoor), kept: input.outdoorKept ?? false },
    indoorCoil: input.coil === null ? undefined : { spec: coil(input.coil ?? {}), kept: input.coilKept ?? false },
    airHandler: input.airHandler ? { spec: airHandler(input.airHandler), kept: input.airHandlerKept ?? false } : undefined,
    metering: input.metering ? { spec: kit(input.metering), kept: false } : undefined,
    lineSet: input.lineSet ? lineSet(input.lineSet) : undefined,
    electrical: input.electrical ? electrical(input.electrical) : undefined,
    indoorElectrical: input.indoorElectrical ? electrical(input.indoorElectrical) : undefined,
    ratedCombinations: input.ratedCombinations,
  };
}

export function context(settings: Partial<RuleSettings> = {}, transitionRules = DEFAULT_TRANSITION_RULES): RuleContext {
  return { settings: { ...DEFAULT_RULE_SETTINGS, ...settings }, transitionRules };
}

/** Severities of a rule's findings for a pairing, in order ('missing' for a facts-missing note). */
export function severities(rule: Rule, p: Pairing, ctx: RuleContext = context()): string[] {
  return rule.evaluate(p, ctx).map((f) => (f.values.missing !== undefined && f.severity === 'info' ? 'missing' : f.severity));
}

export function run(rule: Rule, p: Pairing, ctx: RuleContext = context()): Finding[] {
  return rule.evaluate(p, ctx);
}

/** Every finding has the shape the product promises: ruleId, detail with a number or name, a fix or a plain note. */
export function expectWellFormed(rule: Rule, findings: Finding[]): void {
  for (const f of findings) {
    if (f.ruleId !== rule.id) throw new Error(`finding ruleId ${f.ruleId} is not ${rule.id}`);
    if (!f.detail || f.detail.length < 10) throw new Error(`finding of ${rule.id} has no detail`);
    if (f.severity !== 'info' && !f.fix) throw new Error(`a ${f.severity} of ${rule.id} has no fix`);
  }
}
