import { isMissingFacts } from '@/shared/rules/define-rule';
import type { Finding } from '@/shared/rules/types';
import { isA2L } from '@/shared/refrigerants';

const ELECTRICAL =
  'Electrical: turn the power off at the disconnect and the breaker, lock and tag it, and prove it dead with a tester before touching terminals. Size breakers and wire to the nameplate and the code in force.';
const REFRIGERANT =
  'Refrigerant: recover it with certified equipment and people (EPA Section 608); never vent it. Wear eye protection and gloves, braze under a dry-nitrogen purge, and pressure-test with nitrogen through a regulator, never with oxygen or refrigerant.';
const A2L =
  'A2L refrigerant (mildly flammable): use a leak detector made for A2L refrigerants, keep ignition sources away from the work and from low spots where refrigerant can collect, ventilate, and have the work done only by people trained and qualified for A2L systems.';

/** The safety points a result calls for, or none when no electrical, refrigerant or A2L finding appears. */
export function safetyPoints(findings: Finding[], systemRefrigerant: string | undefined): string[] {
  const real = findings.filter((f) => !isMissingFacts(f));
  const points: string[] = [];
  if (real.some((f) => f.ruleId.startsWith('electrical.'))) points.push(ELECTRICAL);
  if (real.some((f) => f.ruleId.startsWith('refrigerant.') || f.ruleId.startsWith('lineset.'))) points.push(REFRIGERANT);
  if (isA2L(systemRefrigerant) || real.some((f) => f.ruleId.startsWith('refrigerant.a2l'))) points.push(A2L);
  return points;
}
