import { JobOptionRow } from './option.entity';
import { ShopSettingsRow } from './shop-settings.entity';

/** The options module's entities, for server/db/entities.ts. */
export const optionsEntities = [JobOptionRow, ShopSettingsRow];
