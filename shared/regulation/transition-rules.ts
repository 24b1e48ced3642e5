// Sources:
// - REG-01: EPA, Ban on the Sale or Distribution of Pre-Charged Appliances, 74 FR 66450 (Dec 15, 2009),
//   40 CFR Part 82 Subpart I. REG-02: 40 CFR 82 Subpart A, 85 FR 15258 (Mar 17, 2020).
// - REG-03: 40 CFR 84.54, AIM Act Technology Transitions, 88 FR 73098 (Oct 24, 2023): GWP 700 or greater
//   prohibited in new residential/light-commercial AC & HP systems from 2025-01-01.
// - REG-04: 88 FR 88825 (Dec 26, 2023): split-system components made or imported before 2025-01-01
//   may be installed in new systems until 2026-01-01. Uncertain (see note).
// Kept as data with effective dates so the office can update them (admin-editable copy on the server).
import { listRefrigerants } from '../refrigerants';
import type { TransitionRule } from '../rules/types';

/** AIM Act limit: a GWP (AR4 basis, 100-year) of 700 or greater is restricted (40 CFR 84.54(a)). */
export const AIM_GWP_LIMIT = 700;

/** HFC refrigerants at or over the AIM Act limit (HCFCs such as R-22 fall under 40 CFR 82 instead). */
export function refrigerantsOverGwpLimit(limit = AIM_GWP_LIMIT): string[] {
  return listRefrigerants()
    .filter((r) => r.kind !== 'HCFC' && r.gwp100Ar4 >= limit)
    .map((r) => r.id);
}

export const DEFAULT_TRANSITION_RULES: TransitionRule[] = [
  {
    id: 'r22-new-system',
    refrigerants: ['R-22'],
    scope: 'new-system',
    installFrom: '2010-01-01',
    severity: 'blocker',
    citation: 'EPA 74 FR 66450 (Dec 15, 2009), 40 CFR Part 82 Subpart I',
    note: 'No new R-22 appliances, including a new system assembled from components; R-22 components may be used only to service existing appliances.',
  },
  {
    id: 'r22-service-only',
    refrigerants: ['R-22'],
    scope: 'component-replacement',
    installFrom: '2020-01-01',
    severity: 'caution',
    citation: 'EPA 85 FR 15258 (Mar 17, 2020), 40 CFR Part 82 Subpart A; 74 FR 66450 (pre-charged ban)',
    note: 'Repairing an existing R-22 system is allowed, with recovered, reclaimed or stockpiled R-22 only (no new production since 2020-01-01); a replacement part made on or after 2010-01-01 must not come pre-charged with R-22.',
  },
  {
    id: 'aim-gwp700-new-split',
    refrigerants: refrigerantsOverGwpLimit(),
    scope: 'new-system',
    installFrom: '2025-01-01',
    manufacturedBefore: '2025-01-01',
    severity: 'blocker',
    citation: '40 CFR 84.54, EPA 88 FR 73098 (Oct 24, 2023)',
    note: 'New residential and light-commercial split AC and heat pump systems with a refrigerant of GWP 700 or more may not be installed from 2025-01-01, except with components made or imported before 2025-01-01 (see the next rule). Repairing an existing system with components labeled for servicing existing equipment is allowed.',
  },
  {
    id: 'aim-gwp700-split-sell-through-end',
    refrigerants: refrigerantsOverGwpLimit(),
    scope: 'new-system',
    installFrom: '2026-01-01',
    severity: 'blocker',
    citation: '40 CFR 84.54 as amended by EPA 88 FR 88825 (Dec 26, 2023)',
    note: 'As published, components made before 2025-01-01 may be installed in new split systems only until 2026-01-01. Uncertain as of early 2026: EPA proposed in 2025 to remove this installation cutoff and said in Dec 2025 it would deprioritize enforcement; no final repeal was seen. An admin may change this rule as the status changes.',
  },
];
