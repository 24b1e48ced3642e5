import type { AppContext } from '../server/context';
import { AirHandler } from '../server/catalog/air-handler.entity';
import { IndoorCoil } from '../server/catalog/indoor-coil.entity';
import { MeteringDevice } from '../server/catalog/metering-device.entity';
import { OutdoorUnit } from '../server/catalog/outdoor-unit.entity';
import { createJob } from '../server/jobs/jobs.service';
import { createOption } from '../server/options/options.service';
import { User } from '../server/users/user.entity';

/**
 * Story 2 in the demo (invented customer and address): the outdoor unit has failed, the furnace stays,
 * and the estimator has put two options to the customer. Extras are typed demo prices.
 */
export async function seedDemoOptions(ctx: AppContext): Promise<void> {
  const estimator = await ctx.dataSource.getRepository(User).findOneByOrFail({ role: 'estimator' });
  const idOf = async (entity: typeof OutdoorUnit | typeof IndoorCoil | typeof AirHandler | typeof MeteringDevice, model: string) =>
    (await ctx.dataSource.getRepository(entity).findOneByOrFail({ model })).id;
  const job = await createJob(
    ctx,
    {
      customerName: 'Fenwick Ostrander',
      siteAddress: '9 Larkspur Court, Ashford',
      state: 'GA',
      contactEmail: 'fenwick.ostrander@example.test',
      notes: 'Outdoor unit failed (compressor). Gas furnace in the basement stays.',
    },
    estimator.id,
  );
  const common = {
    outdoor: { id: await idOf(OutdoorUnit, 'CRH036-41') },
    airHandler: { id: await idOf(AirHandler, 'OM-GFBS-60'), kept: true },
    lineSet: { liquidOdIn: 0.375, suctionOdIn: 0.75, lengthFt: 25, filterDrier: 'bi-flow' as const },
    laborHours: 7,
    lines: [
      { kind: 'filter-drier' as const, description: 'Bi-flow filter-drier', quantity: 1, unitPriceCents: 4200 },
      { kind: 'pad' as const, description: 'Equipment pad', quantity: 1, unitPriceCents: 6500 },
      { kind: 'disconnect' as const, description: 'Non-fused disconnect', quantity: 1, unitPriceCents: 3800 },
      { kind: 'refrigerant' as const, description: 'R-410A top-up (lb)', quantity: 2, unitPriceCents: 2500 },
      { kind: 'fee' as const, description: 'Permit (demo)', quantity: 1, unitPriceCents: 9500 },
    ],
  };
  await createOption(
    ctx,
    job.id,
    { ...common, name: 'Heat pump with cased coil', indoorCoil: { id: await idOf(IndoorCoil, 'BH-T41BBM') } },
    estimator.id,
  );
  await createOption(
    ctx,
    job.id,
    {
      ...common,
      name: 'Heat pump, coil rated with this furnace, TXV kit',
      indoorCoil: { id: await idOf(IndoorCoil, 'BH-P41BH') },
      // The coil ships with a piston; the heat pump needs an expansion valve, so a field TXV kit is fitted.
      metering: { id: await idOf(MeteringDevice, 'BH-TXK-41-36') },
    },
    estimator.id,
  );
}
