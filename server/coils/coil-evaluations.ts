import type { DataSource } from 'typeorm';
import { fixedFindings, runChecks, type KnownFindings } from '../../shared/rules/engine';
import { findRatedCombination } from '../../shared/rules/rated-match';
import { RULES } from '../../shared/rules/index';
import type { Pairing, RuleContext } from '../../shared/rules/types';
import type { CompatibleCoil } from '../../shared/schemas/coils';
import { efficiencyFigures } from '../../shared/efficiency/pairing-figures';
import type { CoilCatalog } from './coil-catalog';
import { coilGroup, type CoilGroup } from './group-findings';

/** Fewest coils in a group for its shared findings to be worked out once (else each coil runs every rule). */
export const GROUP_PROBE_MIN = 8;

/** A group whose coils run every rule that reads the coil themselves. */
function everyCoilRuleApart(fixed: KnownFindings): CoilGroup {
  const perCoil: number[] = [];
  let blockers = 0;
  let cautions = 0;
  for (let r = 0; r < RULES.length; r++) {
    const out = fixed[r];
    if (!out) perCoil.push(r);
    for (const f of out ?? []) {
      if (f.severity === 'blocker') blockers++;
      else if (f.severity === 'caution') cautions++;
    }
  }
  return { known: fixed, perCoil, blockers, cautions };
}

/** A coil's check in brief: enough to count, filter and sort without its findings. */
export interface CoilSummary {
  blocked: boolean;
  rated: boolean;
  cautions: number;
}

/** A checked coil as the answer shows it, before its price (kept per context, so shared: never mutate). */
export type CheckedCoil = Omit<CompatibleCoil, 'bestPrice'>;

/**
 * Every engine result for one search context (outdoor unit, air handler, site state, install date,
 * catalog index objects, shop settings): per coil group the findings that hold for the group, per coil
 * its summary and, for coils once shown, the full check. Same engine, settings and scope as POST
 * /api/checks; only the work is shared.
 */
export class CoilEvaluations {
  private fixed: KnownFindings | undefined;
  private readonly groups = new Map<number, CoilGroup>();
  // Per position: -1 not yet worked out, else blocked | rated << 1 | cautions << 2.
  private readonly summaries: Int32Array;
  private readonly checked = new Map<number, CheckedCoil>();

  constructor(
    readonly catalog: CoilCatalog,
    readonly base: Pairing,
    readonly context: RuleContext,
    readonly state: string | undefined,
  ) {
    this.summaries = new Int32Array(catalog.rows.length).fill(-1);
  }

  private pairing(position: number): Pairing {
    return { ...this.base, indoorCoil: { spec: this.catalog.spec(position), kept: false, id: this.catalog.rows[position].id } };
  }

  private group(position: number): CoilGroup {
    const id = this.catalog.groupOf(position);
    let group = this.groups.get(id);
    if (!group) {
      const pairing = this.pairing(position);
      // The rules that never read the coil (line set, electrical, controls…) hold for every coil.
      this.fixed ??= fixedFindings(pairing, this.context, 'indoorCoil');
      // Watching a rule's reads costs several runs of it: worth it only for a group of a few coils.
      group = this.catalog.groupSize(id) >= GROUP_PROBE_MIN ? coilGroup(pairing, this.context, this.fixed) : everyCoilRuleApart(this.fixed);
      this.groups.set(id, group);
    }
    return group;
  }

  /** The coil's summary: the group's counts plus the rules that read this coil's identity. */
  summary(position: number): number {
    let packed = this.summaries[position];
    if (packed < 0) {
      const group = this.group(position);
      let blockers = group.blockers;
      let cautions = group.cautions;
      const pairing = this.pairing(position);
      for (const r of group.perCoil) {
        for (const f of RULES[r].evaluate(pairing, this.context)) {
          if (f.severity === 'blocker') blockers++;
          else if (f.severity === 'caution') cautions++;
        }
      }
      const rated = findRatedCombination(pairing) !== undefined;
      packed = (blockers > 0 ? 1 : 0) | (rated ? 2 : 0) | (cautions << 2);
      this.summaries[position] = packed;
    }
    return packed;
  }

  /** The full check of one coil as the list shows it (worked out once per context). */
  check(position: number): CheckedCoil {
    let item = this.checked.get(position);
    if (!item) {
      const pairing = this.pairing(position);
      const spec = pairing.indoorCoil!.spec;
      const result = runChecks(pairing, this.context, RULES, this.group(position).known);
      item = { coil: { id: this.catalog.rows[position].id, ...spec, model: this.catalog.rows[position].model }, verdict: result.verdict, findings: result.findings };
      const combo = result.computed.ratedCombination as CompatibleCoil['ratedCombination'];
      if (combo) item.ratedCombination = combo;
      if (this.state && result.computed.regionalMinimum && efficiencyFigures(pairing).seer2 !== undefined) {
        item.meetsRegionalMinimum = !result.findings.some((f) => f.ruleId === 'efficiency.regional-minimum' && f.severity === 'blocker');
      }
      this.checked.set(position, item);
    }
    return item;
  }
}

export const isBlocked = (packed: number) => (packed & 1) === 1;
export const isRated = (packed: number) => (packed & 2) === 2;
export const cautionsIn = (packed: number) => packed >>> 2;

/** Most search contexts kept per database (each holds a few bytes per coil plus the coils once shown). */
const MAX_CONTEXTS = 64;
const contexts = new WeakMap<DataSource, { generation: string; byKey: Map<string, CoilEvaluations> }>();

const objectIds = new WeakMap<object, number>();
let nextObjectId = 0;
/** A number naming an object for as long as it lives (cache keys from catalog index and settings objects). */
export function objectId(value: object): number {
  let id = objectIds.get(value);
  if (id === undefined) objectIds.set(value, (id = ++nextObjectId));
  return id;
}

/**
 * The evaluations of a context, reused while its key holds (least recently used dropped past
 * MAX_CONTEXTS). `generation` names the catalog index and settings objects, which are replaced when an
 * import commits or reverts, a write rolls back or an admin saves settings: a new generation drops
 * every context of the old one (and the old catalog's rows with them).
 */
export function evaluationsFor(dataSource: DataSource, generation: string, key: string, create: () => CoilEvaluations): CoilEvaluations {
  let held = contexts.get(dataSource);
  if (!held || held.generation !== generation) contexts.set(dataSource, (held = { generation, byKey: new Map() }));
  let found = held.byKey.get(key);
  if (found) {
    held.byKey.delete(key);
  } else {
    found = create();
    if (held.byKey.size >= MAX_CONTEXTS) held.byKey.delete(held.byKey.keys().next().value!);
  }
  held.byKey.set(key, found);
  return found;
}
