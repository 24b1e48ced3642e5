import { readFile } from 'node:fs/promises';
import path from 'node:path';
import type { ImportKind } from '../shared/schemas/equipment';
import type { AppContext } from '../server/context';
import { uploadImport } from '../server/imports/imports.service';
import { User } from '../server/users/user.entity';

const DEMO_DIR = path.resolve('catalog', 'demo');

/** The demo files in load order (equipment before combinations and prices), with the distributors' own headers. */
const FILES: { file: string; kind: ImportKind; distributor?: string; mapping?: Record<string, string> }[] = [
  { file: 'outdoor-units.csv', kind: 'outdoor-units' },
  { file: 'indoor-coils.csv', kind: 'indoor-coils' },
  { file: 'air-handlers.csv', kind: 'air-handlers' },
  { file: 'metering-devices.csv', kind: 'metering-devices' },
  { file: 'rated-combinations.csv', kind: 'rated-combinations' },
  { file: 'prices-harbor-supply.csv', kind: 'prices', distributor: 'Harbor Supply Co. (demo)' },
  {
    file: 'prices-ridgeline-parts.csv',
    kind: 'prices',
    distributor: 'Ridgeline Parts (demo)',
    mapping: { 'Item Code': 'model', 'Net Each': 'price', Starts: 'effective_from', 'Item Description': 'description' },
  },
];

/** Loads catalog/demo through the real importer, as the demo admin, one committed import per file. */
export async function seedDemoCatalog(ctx: AppContext): Promise<void> {
  const admin = await ctx.dataSource.getRepository(User).findOneBy({ role: 'admin', active: true });
  for (const f of FILES) {
    const view = await uploadImport(ctx, {
      buffer: await readFile(path.join(DEMO_DIR, f.file)),
      fileName: f.file,
      kind: f.kind,
      distributor: f.distributor,
      mapping: f.mapping,
      dryRun: false,
      userId: admin?.id ?? null,
    });
    ctx.logger.info({ file: f.file, counts: view.counts }, 'demo catalog file imported');
  }
}
