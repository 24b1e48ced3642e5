import type { Router } from 'express';
import type { AppContext } from './context';
import { catalogRouter } from './catalog/catalog.routes';
import { importsRouter } from './imports/imports.routes';
import { usersRouter } from './users/users.routes';
import { checksRouter } from './checks/checks.routes';
import { settingsRouter } from './settings/settings.routes';
import { jobsRouter } from './jobs/jobs.routes';
import { systemsRouter } from './systems/systems.routes';
import { attachmentsRouter } from './attachments/attachments.routes';
import { outboxRouter } from './mail/outbox.routes';
import { refrigerantsRouter } from './refrigerants/refrigerants.routes';
import { commissioningRouter } from './commissioning/commissioning.routes';
import { coilsRouter } from './coils/coils.routes';
import { optionsRouter } from './options/options.routes';
import { jobOptionsRouter } from './options/job-options.routes';
import { shopSettingsRouter } from './options/shop-settings.routes';

/**
 * The API's resource routers, mounted under /api/<prefix>. Each module adds its line here.
 * (Auth and health are mounted by createApp itself.)
 */
export const apiRoutes: [string, (ctx: AppContext) => Router][] = [
  ['users', usersRouter],
  ['catalog', catalogRouter],
  ['imports', importsRouter],
  ['checks', checksRouter],
  ['settings', settingsRouter],
  ['jobs', jobsRouter],
  ['systems', systemsRouter],
  ['attachments', attachmentsRouter],
  ['outbox', outboxRouter],
  ['refrigerants', refrigerantsRouter],
  ['commissioning', commissioningRouter],
  ['coils', coilsRouter],
  ['options', optionsRouter],
  ['jobs', jobOptionsRouter],
  ['settings/shop', shopSettingsRouter],
];
