import { Users1764650000000 } from './1764650000000-users';
import { Catalog1764700000000 } from './1764700000000-catalog';
import { RuleSettings1764800000000 } from './1764800000000-rule-settings';
import { EngineSecondPass1764900000000 } from './1764900000000-engine-second-pass';
import { ImportBounds1764950000000 } from './1764950000000-import-bounds';
import { Jobs1765000000000 } from './1765000000000-jobs';
import { JobOptions1765200000000 } from './1765200000000-job-options';
import { CatalogVersions1765300000000 } from './1765300000000-catalog-versions';
import { ChangeNotify1765400000000 } from './1765400000000-change-notify';
import { RebateTiersOneList1765430000000 } from './1765430000000-rebate-tiers-one-list';
import { RevisionBriefIndex1765440000000 } from './1765440000000-revision-brief-index';
import { PriceIndexByModel1765460000000 } from './1765460000000-price-index-by-model';

/** Every migration, in order. Add new ones at the end (one file per change, named by timestamp). */
export const migrations = [
  Users1764650000000,
  Catalog1764700000000,
  RuleSettings1764800000000,
  EngineSecondPass1764900000000,
  ImportBounds1764950000000,
  Jobs1765000000000,
  JobOptions1765200000000,
  CatalogVersions1765300000000,
  ChangeNotify1765400000000,
  RebateTiersOneList1765430000000,
  RevisionBriefIndex1765440000000,
  PriceIndexByModel1765460000000,
];
