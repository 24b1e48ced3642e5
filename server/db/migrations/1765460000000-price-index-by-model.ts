import { TableIndex, type MigrationInterface, type QueryRunner } from 'typeorm';

const TABLE = 'price_entries';
const OLD_UNIQUE = new TableIndex({ name: 'IDX_price_entries_distributorId_normalizedModel_effectiveFrom', columnNames: ['distributorId', 'normalizedModel', 'effectiveFrom'], isUnique: true });
const OLD_MODEL = new TableIndex({ name: 'IDX_price_entries_normalizedModel', columnNames: ['normalizedModel'] });
const OLD_IMPORT = new TableIndex({ name: 'IDX_price_entries_importId', columnNames: ['importId'] });
const UNIQUE = new TableIndex({ name: 'IDX_price_entries_normalizedModel_distributorId_effectiveFrom', columnNames: ['normalizedModel', 'distributorId', 'effectiveFrom'], isUnique: true });
const DISTRIBUTOR_IMPORT = new TableIndex({ name: 'IDX_price_entries_distributorId_importId', columnNames: ['distributorId', 'importId'] });

/**
 * Every price row is written into each index of price_entries, and a price file is 100k rows: three
 * indexes instead of four. Prices are looked up by model (the coil search, a record's price list), so the
 * unique key leads with the model and the model's own index goes. What went by distributor (whether it has
 * any price yet) or by import (a revert, which knows its distributor) shares one index whose key is the same
 * for every row of a file, so a commit adds to it at one place.
 */
export class PriceIndexByModel1765460000000 implements MigrationInterface {
  name = 'PriceIndexByModel1765460000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    // The new unique key first: the table is never without one.
    await queryRunner.createIndex(TABLE, UNIQUE);
    await queryRunner.createIndex(TABLE, DISTRIBUTOR_IMPORT);
    for (const index of [OLD_UNIQUE, OLD_MODEL, OLD_IMPORT]) await queryRunner.dropIndex(TABLE, index.name!);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    for (const index of [OLD_UNIQUE, OLD_MODEL, OLD_IMPORT]) await queryRunner.createIndex(TABLE, index);
    await queryRunner.dropIndex(TABLE, DISTRIBUTOR_IMPORT.name!);
    await queryRunner.dropIndex(TABLE, UNIQUE.name!);
  }
}
