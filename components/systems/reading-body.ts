import { ReadingCreateSchema, type ReadingCreate } from '@/shared/schemas/systems';
import type { EvacuationDraft } from '@/components/readings/evacuation-draft';
import { readNumber } from '@/components/readings/number-text';
import type { ReadingKey, ReadingsDraft } from '@/components/readings/readings-draft';

/**
 * The body of POST /api/systems/:id/readings from the Readings form as typed: the charge readings once
 * every needed field is in (pressures psig, temperatures °F), the evacuation (microns) and the nitrogen
 * test (psig, minutes) when started. `null` when nothing complete was typed.
 */
export function readingBody(draft: ReadingsDraft, evac: EvacuationDraft, complete: { charge: boolean }): ReadingCreate | null {
  const n = (k: ReadingKey) => readNumber(draft.values[k]).value;
  const e = (k: keyof EvacuationDraft['values']) => readNumber(evac.values[k]).value;
  const body: Record<string, unknown> = {};
  if (complete.charge && draft.meteringType) {
    body.charge = {
      refrigerant: draft.refrigerant,
      meteringType: draft.meteringType,
      mode: draft.mode,
      suctionPsig: n('suctionPsig'),
      suctionLineF: n('suctionLineF'),
      liquidPsig: n('liquidPsig'),
      liquidLineF: n('liquidLineF'),
      outdoorDbF: n('outdoorDbF'),
      ...(draft.indoorBy === 'wet-bulb' ? { indoorWbF: n('indoorWbF') } : { indoorDbF: n('indoorDbF'), indoorRhPct: n('indoorRhPct') }),
      targetSubcoolingF: n('targetSubcoolingF'),
      altitudeFt: n('altitudeFt'),
    };
  }
  const finalMicrons = e('finalMicrons');
  if (finalMicrons !== undefined) body.evacuation = { finalMicrons, decayMicrons: e('decayMicrons'), holdMinutes: e('decayHoldMinutes') };
  const pressurePsig = e('testPsig');
  const holdMinutes = e('nitrogenHoldMinutes');
  if (pressurePsig !== undefined && holdMinutes !== undefined) {
    body.pressureTest = { pressurePsig, holdMinutes, dropPsig: e('dropPsig'), maxTestPsig: e('maxTestPsig'), altitudeFt: n('altitudeFt') };
  }
  const parsed = ReadingCreateSchema.safeParse(JSON.parse(JSON.stringify(body)));
  return parsed.success ? parsed.data : null;
}
