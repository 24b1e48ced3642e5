import type { AppContext } from '../server/context';
import { IndoorCoil } from '../server/catalog/indoor-coil.entity';
import { OutdoorUnit } from '../server/catalog/outdoor-unit.entity';
import { createJob, updateJob } from '../server/jobs/jobs.service';
import { addReading } from '../server/systems/readings.service';
import { createSystem } from '../server/systems/systems.service';
import { User } from '../server/users/user.entity';

/**
 * Two demo jobs (invented customers and addresses): an open one with a draft record of a demo
 * R-454B heat pump and cased coil (on the kept furnace), serials and a first set of readings; and a closed one.
 */
/** An invented R-454B TXV start-up on a 90 °F day (demo and bench data, not a reference value). */
export const DEMO_CHARGE_READING = {
  refrigerant: 'R-454B',
  meteringType: 'txv',
  suctionPsig: 128,
  suctionLineF: 59,
  liquidPsig: 330,
  liquidLineF: 95,
  indoorWbF: 63,
  indoorDbF: 75,
  outdoorDbF: 90,
} as const;

export async function seedDemoJobs(ctx: AppContext): Promise<void> {
  const tech = await ctx.dataSource.getRepository(User).findOneByOrFail({ role: 'tech' });
  const idOf = async (entity: typeof OutdoorUnit | typeof IndoorCoil, model: string) =>
    (await ctx.dataSource.getRepository(entity).findOneByOrFail({ model })).id;

  const open = await createJob(
    ctx,
    {
      customerName: 'Marisol Thibault',
      siteAddress: '48 Wren Hollow Lane, Ashford',
      state: 'GA',
      contactEmail: 'marisol.thibault@example.test',
      contactPhone: '555-0187',
      notes: 'Dog in the back yard; attic access in the hall closet.',
    },
    tech.id,
  );
  const record = await createSystem(
    ctx,
    open.id,
    {
      scope: 'new-system',
      label: 'Main floor',
      site: { state: 'GA', indoorLocation: 'attic', hasSecondaryPan: true },
      outdoor: { id: await idOf(OutdoorUnit, 'CRH018-4B') },
      indoorCoil: { id: await idOf(IndoorCoil, 'BH-T4BAM') },
      lineSet: { liquidOdIn: 0.375, suctionOdIn: 0.75, lengthFt: 30, liftFt: 12, filterDrier: 'bi-flow' },
      electrical: { breakerAmps: 20, wireAwg: 12, wireMaterial: 'copper' },
      serials: { outdoor: 'CR2609H01288', indoorCoil: 'BH2608K55410' },
      checklist: { 'filter-drier': { state: 'done' }, 'nitrogen-purge': { state: 'done' }, 'overflow-protection': { state: 'done' } },
    },
    tech.id,
  );
  await addReading(ctx, record.id, { label: 'Evacuation', evacuation: { finalMicrons: 410, decayMicrons: 720, holdMinutes: 10 } }, tech.id);
  await addReading(
    ctx,
    record.id,
    {
      label: 'First start',
      charge: DEMO_CHARGE_READING,
    },
    tech.id,
  );

  const closed = await createJob(
    ctx,
    { customerName: 'Keir Abernathy', siteAddress: '310 Old Mill Road, Dunmore', state: 'OH', notes: 'Quote only; customer postponed.' },
    tech.id,
  );
  await updateJob(ctx, closed.id, { status: 'closed' }, tech.id);
}
