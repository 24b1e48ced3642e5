import { catalogEntities } from '../catalog/catalog-entities';
import { User } from '../users/user.entity';
import { settingsEntities } from '../settings/settings-entities';
import { jobsEntities } from '../jobs/jobs-entities';
import { optionsEntities } from '../options/options-entities';

/** Every TypeORM entity the data source knows. Each module adds its own here. */
export const entities = [User, ...catalogEntities, ...settingsEntities, ...jobsEntities, ...optionsEntities];
