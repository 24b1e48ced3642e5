import type { KnownFindings } from '../../shared/rules/engine';
import { RULES } from '../../shared/rules/index';
import type { Finding, Pairing, RuleContext } from '../../shared/rules/types';
import type { IndoorCoilSpec } from '../../shared/schemas/equipment';
import { IDENTITY_FIELDS } from './coil-catalog';

/** What one group of coils (equal non-identity fields) shares for one search context. */
export interface CoilGroup {
  /** Findings by rule index for every rule that holds for the whole group; undefined runs per coil. */
  known: KnownFindings;
  /** Indexes of the rules that read the coil's identity (model, brand, description, id). */
  perCoil: number[];
  /** Blockers and cautions among the `known` findings. */
  blockers: number;
  cautions: number;
}

/**
 * Extends `fixed` (the rules that never read the coil) with the rules that read the coil but not its
 * identity, run once on `pairing` (any coil of the group). Each rule runs on a fresh pairing whose coil
 * part notes a read of `id`, of an identity field or of the field list. A rule that made none followed
 * the same path it would with any coil of the group, as rules are pure and the group's coils differ
 * only in those fields, so its findings hold for every one of them. A fresh pairing per rule keeps a memo
 * keyed on the pairing object (rated-match's) from hiding one rule's read behind another's.
 */
export function coilGroup(pairing: Pairing, context: RuleContext, fixed: KnownFindings): CoilGroup {
  const known: (readonly Finding[] | undefined)[] = [];
  const perCoil: number[] = [];
  let blockers = 0;
  let cautions = 0;
  for (let r = 0; r < RULES.length; r++) {
    let out = fixed[r];
    if (!out) {
      const watch = { read: false };
      const candidate = RULES[r].evaluate({ ...pairing, indoorCoil: watchedCoil(pairing.indoorCoil!, watch) }, context);
      if (watch.read) perCoil.push(r);
      else out = candidate;
    }
    known[r] = out;
    for (const f of out ?? []) {
      if (f.severity === 'blocker') blockers++;
      else if (f.severity === 'caution') cautions++;
    }
  }
  return { known, perCoil, blockers, cautions };
}

type CoilPart = NonNullable<Pairing['indoorCoil']>;

function watchedCoil(part: CoilPart, watch: { read: boolean }): CoilPart {
  const spec = new Proxy(part.spec, {
    get: (target, key, receiver) => {
      if (typeof key === 'string' && IDENTITY_FIELDS.has(key)) watch.read = true;
      return Reflect.get(target, key, receiver) as unknown;
    },
    has: (target, key) => {
      if (typeof key === 'string' && IDENTITY_FIELDS.has(key)) watch.read = true;
      return Reflect.has(target, key);
    },
    ownKeys: (target) => {
      watch.read = true;
      return Reflect.ownKeys(target);
    },
    getOwnPropertyDescriptor: (target, key) => {
      if (typeof key === 'string' && IDENTITY_FIELDS.has(key)) watch.read = true;
      return Reflect.getOwnPropertyDescriptor(target, key);
    },
  }) as IndoorCoilSpec;
  return new Proxy(
    { spec, kept: part.kept, id: part.id },
    {
      get: (target, key, receiver) => {
        if (key === 'id') watch.read = true;
        return Reflect.get(target, key, receiver) as unknown;
      },
      has: (target, key) => {
        if (key === 'id') watch.read = true;
        return Reflect.has(target, key);
      },
      ownKeys: (target) => {
        watch.read = true;
        return Reflect.ownKeys(target);
      },
      getOwnPropertyDescriptor: (target, key) => {
        if (key === 'id') watch.read = true;
        return Reflect.getOwnPropertyDescriptor(target, key);
      },
    },
  );
}
