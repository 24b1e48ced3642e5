import { isA2L } from '@/shared/refrigerants';

const GAUGES =
  'Use gauges, hoses and a recovery machine rated for this refrigerant and its pressures; wear eye protection and gloves — liquid refrigerant freezes skin.';
const CERTIFIED = 'Connecting to and charging a system is for certified technicians only (EPA Section 608); never vent refrigerant.';
const A2L =
  'A2L refrigerant (mildly flammable): no ignition sources near the work or where refrigerant can collect, ventilate the space, use tools and a leak detector made for A2L refrigerants, and only people trained for A2L systems.';
const NITROGEN =
  'Pressure-test with dry nitrogen through a regulator, never oxygen or refrigerant, and never above the test pressure the installation instructions allow.';

/** The Safety block's points for the refrigerant on the gauges. */
export function readingsSafetyPoints(refrigerant: string): string[] {
  return isA2L(refrigerant) ? [GAUGES, A2L, CERTIFIED, NITROGEN] : [GAUGES, CERTIFIED, NITROGEN];
}
