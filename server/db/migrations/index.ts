import { Users1764650000000 } from './1764650000000-users';
import { Catalog1764700000000 } from './1764700000000-catalog';
import { RuleSettings1764800000000 } from './1764800000000-rule-settings';
import { ImportBounds1764900000000 } from './1764900000000-import-bounds';

/** Every migration, in order. Add new ones at the end (one file per change, named by timestamp). */
export const migrations = [Users1764650000000, Catalog1764700000000, RuleSettings1764800000000, ImportBounds1764900000000];
