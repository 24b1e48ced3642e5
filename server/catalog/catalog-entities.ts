import { ColumnMapping } from '../imports/column-mapping.entity';
import { ImportChange } from '../imports/import-change.entity';
import { ImportRecord } from '../imports/import.entity';
import { AirHandler } from './air-handler.entity';
import { Distributor } from './distributor.entity';
import { IndoorCoil } from './indoor-coil.entity';
import { MeteringDevice } from './metering-device.entity';
import { OutdoorUnit } from './outdoor-unit.entity';
import { PriceEntry } from './price-entry.entity';
import { RatedCombination } from './rated-combination.entity';

/** The catalog and import entities, registered in one line of server/db/entities.ts. */
export const catalogEntities = [
  OutdoorUnit, IndoorCoil, AirHandler, MeteringDevice, RatedCombination, Distributor, PriceEntry,
  ImportRecord, ColumnMapping, ImportChange,
];
