import type { CheckRequest, Controls, Electrical, LineSet, Site } from '../schemas/check';
import type { AirHandlerSpec, IndoorCoilSpec, MeteringDeviceSpec, OutdoorUnitSpec, RatedCombinationSpec } from '../schemas/equipment';

/** The rules engine's types (DESIGN.md §3). Everything here is plain data: the engine is pure. */

export type Severity = 'blocker' | 'caution' | 'info';
export type Verdict = 'compatible' | 'compatible-with-cautions' | 'incompatible';

export interface Basis {
  kind: 'standard' | 'regulation' | 'common-practice';
  /** Something a contractor can look up: "NEC 240.6(A)", "10 CFR 430.32(c)". */
  citation: string;
}

export interface Finding {
  ruleId: string;
  severity: Severity;
  title: string;
  /** One sentence with the actual numbers. */
  detail: string;
  /** What to do about it; empty for a plain note. */
  fix: string;
  basis: Basis;
  values: Record<string, number | string | boolean | null>;
}

/** A part as the rules see it: its spec and whether it stays from the old system. */
export interface ResolvedPart<T> {
  spec: T;
  kept: boolean;
  /** Catalog id when the part came from the catalog. */
  id?: number;
}

/** A pairing with every part resolved to its spec (by the server from the catalog, or typed in). */
export interface Pairing {
  scope: CheckRequest['scope'];
  /** ISO date; the caller supplies it (the engine reads no clock). */
  installDate: string;
  site?: Site;
  outdoor: ResolvedPart<OutdoorUnitSpec>;
  indoorCoil?: ResolvedPart<IndoorCoilSpec>;
  airHandler?: ResolvedPart<AirHandlerSpec>;
  metering?: ResolvedPart<MeteringDeviceSpec>;
  controls?: Controls;
  lineSet?: LineSet;
  electrical?: Electrical;
  indoorElectrical?: Electrical;
  /**
   * Rated combinations that name this outdoor model (and indoor / air handler), looked up by the caller.
   * `undefined` means the lookup could not be made (offline): the rating rules then say so.
   */
  ratedCombinations?: readonly RatedCombinationSpec[];
}

/** A rebate tier's minimum ratings (at least one given). */
export interface RebateTierThresholds {
  name: string;
  seer2?: number;
  eer2?: number;
  hspf2?: number;
}

/** Shop-tunable thresholds (defaults in settings.ts, admin overrides stored by the server). */
export interface RuleSettings {
  cfmPerTonMin: number;
  cfmPerTonMax: number;
  defaultTargetSubcoolingF: number;
  /** Used when an outdoor unit gives no maximum line length. */
  defaultMaxLineLengthFt: number;
  defaultMaxLiftFt: number;
  /** Line length beyond which long-line practice applies when the unit gives none (optional for stored settings). */
  defaultStandardLineLengthFt?: number;
  /**
   * The shop's rebate tiers: the one list kept with the shop settings (Admin → Pricing), merged in by the
   * server. Undefined thresholds are not checked; none configured, no finding.
   */
  rebateTiers?: RebateTierThresholds[];
  // Start-up readings (shared/commissioning); optional so settings stored before them still load.
  /** ± band in °F around the fixed-orifice target superheat that counts as on target. */
  superheatToleranceF?: number;
  /** ± band in °F around the target subcooling that counts as on target. */
  subcoolingToleranceF?: number;
  /** Deepest vacuum in microns a finished evacuation must reach. */
  evacuationTargetMicrons?: number;
  /** Highest reading in microns the decay (standing vacuum) test may rise to. */
  decayLimitMicrons?: number;
  /** Hold time in minutes of the decay test. */
  decayHoldMinutes?: number;
}

/** A refrigerant transition rule, kept as data with effective dates so the office can update it. */
export interface TransitionRule {
  id: string;
  refrigerants: string[];
  scope: 'new-system' | 'component-replacement' | 'any';
  /** Installs on or after this ISO date are affected. */
  installFrom: string;
  /** Equipment manufactured before this ISO date is exempt (sell-through), if set. */
  manufacturedBefore?: string;
  severity: 'blocker' | 'caution';
  citation: string;
  note: string;
}

export interface RuleContext {
  settings: RuleSettings;
  transitionRules: TransitionRule[];
}

export interface Rule {
  id: string;
  title: string;
  family: string;
  basis: Basis;
  evaluate(pairing: Pairing, context: RuleContext): Finding[];
}

export interface Coverage {
  /** Rule families that ran with the facts they need. */
  ran: string[];
  /** Families that could not run, with the missing facts. */
  notChecked: { family: string; missing: string }[];
}

export interface CheckResult {
  verdict: Verdict;
  rulesVersion: string;
  findings: Finding[];
  coverage: Coverage;
  computed: Record<string, unknown>;
}
