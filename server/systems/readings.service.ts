import type { ReadingCreate } from '../../shared/schemas/systems';
import type { AppContext } from '../context';
import { withWriteLock } from '../db/write-transaction';
import { AppError } from '../lib/errors';
import { userNames } from '../lib/user-names';
import { loadRuleContext } from '../settings/settings.service';
import { CommissioningReadingRow } from './commissioning-reading.entity';
import { evaluateReading } from './reading-evaluation';
import { loadCurrent } from './systems.service';
import { readingView } from './system-view';

/**
 * POST /api/systems/:id/readings: computes superheat/subcooling and the evacuation and nitrogen-test
 * verdicts, and keeps them with the inputs, who and when. A final record takes no new readings
 * (409): start a new revision first, so a final revision never changes.
 */
export async function addReading(ctx: AppContext, id: number, body: ReadingCreate, userId: number) {
  const { settings } = await loadRuleContext(ctx);
  const results = evaluateReading(body, settings, (await loadCurrent(ctx.dataSource.manager, id)).revision.parts);
  const row = await withWriteLock(ctx, async (manager) => {
    const { record } = await loadCurrent(manager, id);
    if (record.status === 'final') {
      throw new AppError('record-final', 'This record is final: start a new revision to add readings.', 409, {
        currentRevision: record.revision,
        status: record.status,
      });
    }
    return manager.getRepository(CommissioningReadingRow).save({
      systemId: id,
      revision: record.revision,
      takenAt: body.takenAt ? new Date(body.takenAt).toISOString() : new Date().toISOString(),
      takenBy: userId,
      label: body.label ?? null,
      outdoorDbF: body.charge?.outdoorDbF ?? null,
      indoorDbF: body.charge?.indoorDbF ?? null,
      indoorWbF: body.charge?.indoorWbF ?? null,
      superheatF: results.charge?.superheatF ?? null,
      subcoolingF: results.charge?.subcoolingF ?? null,
      chargeVerdict: results.charge?.verdict ?? null,
      evacuationMicrons: body.evacuation?.finalMicrons ?? null,
      evacuationPassed: results.evacuation?.passed ?? null,
      nitrogenPsig: body.pressureTest?.pressurePsig ?? null,
      pressureTestPassed: results.pressureTest?.passed ?? null,
      input: body,
      results,
    });
  });
  return readingView(row, await userNames(ctx.dataSource.manager, [userId]));
}
