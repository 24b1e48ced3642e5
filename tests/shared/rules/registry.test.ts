import { readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { RULES } from '../../../shared/rules/index';

/** DESIGN.md §3 rule ids table (public contract), written out by hand. */
const DESIGN_RULE_IDS = [
  'refrigerant.metering-device',
  'refrigerant.coil-listing',
  'refrigerant.a2l-listing',
  'refrigerant.a2l-charge-area',
  'refrigerant.oil-compatibility',
  'regulation.refrigerant-transition',
  'capacity.coil-range',
  'capacity.air-handler-range',
  'airflow.per-ton',
  'fit.coil-orientation',
  'fit.coil-cabinet',
  'metering.type-required',
  'metering.piston-size',
  'metering.heat-pump-bidirectional',
  'metering.capacity-range',
  'metering.start-assist',
  'controls.heat-pump-thermostat',
  'lineset.liquid-size',
  'lineset.suction-size',
  'lineset.length',
  'lineset.long-line',
  'lineset.charge-adjustment',
  'lineset.lift',
  'lineset.filter-drier',
  'lineset.reuse-condition',
  'electrical.breaker-over-mocp',
  'electrical.breaker-under-mca',
  'electrical.breaker-nonstandard',
  'electrical.wire-ampacity',
  'electrical.disconnect',
  'electrical.overcurrent-type',
  'electrical.voltage-mismatch',
  'electrical.heat-kit-circuit',
  'efficiency.regional-minimum',
  'efficiency.rebate-tier',
  'rating.no-rated-combination',
  'rating.rated-combination',
  'coil.material',
  'condensate.overflow-protection',
];

const RULES_DIR = join(__dirname, '../../../shared/rules');

/** Rule files on disk: shared/rules/<family>/<rest>.ts (index.ts excluded) → "<family>.<rest>". */
function idsOnDisk(): string[] {
  const ids: string[] = [];
  for (const family of readdirSync(RULES_DIR)) {
    const dir = join(RULES_DIR, family);
    if (!statSync(dir).isDirectory()) continue;
    for (const file of readdirSync(dir)) {
      if (file === 'index.ts' || !file.endsWith('.ts')) continue;
      ids.push(`${family}.${file.slice(0, -3)}`);
    }
  }
  return ids;
}

describe('rule registry', () => {
  it('when the registry is listed, then its ids are exactly DESIGN.md §3 ids', () => {
    expect([...RULES.map((r) => r.id)].sort()).toEqual([...DESIGN_RULE_IDS].sort());
  });

  it('when ids are listed, then none repeats', () => {
    expect(new Set(RULES.map((r) => r.id)).size).toBe(RULES.length);
  });

  it('when the rule folders are read, then every rule file is registered and every registered rule has its file', () => {
    expect(idsOnDisk().sort()).toEqual(RULES.map((r) => r.id).sort());
  });

  it('when a rule is registered, then its family is the first segment of its id and its basis has a citation', () => {
    for (const rule of RULES) {
      expect(rule.family).toBe(rule.id.split('.')[0]);
      expect(['standard', 'regulation', 'common-practice']).toContain(rule.basis.kind);
      expect(rule.basis.citation.length).toBeGreaterThan(3);
      expect(rule.title.length).toBeGreaterThan(3);
    }
  });
});
