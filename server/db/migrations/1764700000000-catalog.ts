import type { MigrationInterface, QueryRunner, TableColumnOptions } from 'typeorm';
import { Table, TableIndex } from 'typeorm';
import { id } from './columns';
import { portableTable } from './portable-table';

/**
 * Catalog, distributors, prices, imports, column mappings and import changes (issue 3).
 * Table API only, so it runs on SQLite and PostgreSQL. Frozen: later changes get their own migration.
 */

const str = (name: string, length: number, nullable = true): TableColumnOptions => ({ name, type: 'varchar', length: String(length), isNullable: nullable });
const num = (name: string, nullable = true): TableColumnOptions => ({ name, type: 'double precision', isNullable: nullable });
const int = (name: string, nullable = true): TableColumnOptions => ({ name, type: 'integer', isNullable: nullable });
const bool = (name: string): TableColumnOptions => ({ name, type: 'boolean', isNullable: true });
const json = (name: string, nullable = true): TableColumnOptions => ({ name, type: 'text', isNullable: nullable });
const equipmentHead = [id, str('model', 80, false), str('normalizedModel', 80, false), str('brand', 80), str('description', 300)];
const idx = (table: string, columns: string[], unique = false) =>
  new TableIndex({ name: `IDX_${table}_${columns.join('_')}`, columnNames: columns, isUnique: unique });

const tables: { table: Table; indices: TableIndex[] }[] = [
  {
    table: new Table({
      name: 'outdoor_units',
      columns: [
        ...equipmentHead,
        str('systemType', 16, false), str('refrigerant', 16, false), num('nominalTons', false),
        num('coolingBtuh'), num('seer2'), num('eer2'), num('hspf2'), str('meteringRequired', 16), num('pistonSizeIn'),
        num('liquidLineOdIn'), num('suctionLineOdIn'), json('allowedLiquidOdIn'), json('allowedSuctionOdIn'),
        num('maxLineLengthFt'), num('maxLiftFt'), num('factoryChargeOz'), num('chargedLineLengthFt'), num('chargePerFtOz'),
        num('mcaAmps'), num('mocpAmps'), str('voltage', 16), int('phase'), bool('startAssist'), str('manufactureDate', 10),
        num('targetSubcoolingF'), int('importId'),
      ],
    }),
    indices: [idx('outdoor_units', ['normalizedModel'], true), idx('outdoor_units', ['importId'])],
  },
  {
    table: new Table({
      name: 'indoor_coils',
      columns: [
        ...equipmentHead,
        str('configuration', 16), bool('cased'), str('material', 16), num('minTons', false), num('maxTons', false),
        json('refrigerants', false), str('meteringType', 16, false), str('meteringRefrigerant', 16), bool('meteringBidirectional'),
        bool('meteringBleed'), num('pistonSizeIn'), bool('a2lListed'), bool('leakSensor'), num('widthIn'), num('liquidConnOdIn'),
        num('suctionConnOdIn'), str('manufactureDate', 10), int('importId'),
      ],
    }),
    indices: [idx('indoor_coils', ['normalizedModel'], true), idx('indoor_coils', ['importId'])],
  },
  {
    table: new Table({
      name: 'air_handlers',
      columns: [
        ...equipmentHead,
        str('kind', 16, false), num('minTons'), num('maxTons'), num('airflowCfm'), num('widthIn'), json('refrigerants'),
        bool('a2lListed'), num('heatKitKw'), num('mcaAmps'), num('mocpAmps'), str('voltage', 16), int('importId'),
      ],
    }),
    indices: [idx('air_handlers', ['normalizedModel'], true), idx('air_handlers', ['importId'])],
  },
  {
    table: new Table({
      name: 'metering_devices',
      columns: [
        ...equipmentHead,
        str('type', 16, false), str('refrigerant', 16, false), num('minTons'), num('maxTons'), bool('bidirectional'),
        bool('bleed'), num('pistonSizeIn'), int('importId'),
      ],
    }),
    indices: [idx('metering_devices', ['normalizedModel'], true), idx('metering_devices', ['importId'])],
  },
  {
    table: new Table({
      name: 'rated_combinations',
      columns: [
        id, str('outdoorModel', 80, false), str('indoorModel', 80, false), str('airHandlerModel', 80),
        str('normalizedOutdoorModel', 80, false), str('normalizedIndoorModel', 80, false),
        { name: 'normalizedAirHandlerModel', type: 'varchar', length: '80', isNullable: false, default: "''" },
        num('coolingBtuh'), num('seer2'), num('eer2'), num('hspf2'), str('reference', 80), int('importId'),
      ],
    }),
    indices: [
      idx('rated_combinations', ['normalizedOutdoorModel', 'normalizedIndoorModel', 'normalizedAirHandlerModel'], true),
      idx('rated_combinations', ['normalizedOutdoorModel']),
      idx('rated_combinations', ['normalizedIndoorModel']),
      idx('rated_combinations', ['importId']),
    ],
  },
  {
    table: new Table({
      name: 'distributors',
      columns: [
        id,
        { name: 'name', type: 'varchar', length: '120', isUnique: true },
        { name: 'createdAt', type: 'datetime', default: 'CURRENT_TIMESTAMP' },
      ],
    }),
    indices: [],
  },
  {
    table: new Table({
      name: 'price_entries',
      columns: [
        id, int('distributorId', false), str('model', 80, false), str('normalizedModel', 80, false), int('priceCents', false),
        str('currency', 3, false), str('effectiveFrom', 10, false), str('description', 300), int('importId'),
      ],
      foreignKeys: [{ columnNames: ['distributorId'], referencedTableName: 'distributors', referencedColumnNames: ['id'] }],
    }),
    indices: [
      idx('price_entries', ['distributorId', 'normalizedModel', 'effectiveFrom'], true),
      idx('price_entries', ['normalizedModel']),
      idx('price_entries', ['importId']),
    ],
  },
  {
    table: new Table({
      name: 'imports',
      columns: [
        id, str('kind', 24, false), str('fileName', 255, false), int('distributorId'), int('uploadedById'), str('status', 16, false),
        ...['rows', 'inserted', 'updated', 'unchanged', 'rejected', 'unmatched'].map(
          (name): TableColumnOptions => ({ name, type: 'integer', default: 0 }),
        ),
        json('errors', false), json('payload'),
        { name: 'createdAt', type: 'datetime', default: 'CURRENT_TIMESTAMP' },
        { name: 'committedAt', type: 'datetime', isNullable: true },
        { name: 'revertedAt', type: 'datetime', isNullable: true },
      ],
    }),
    indices: [],
  },
  {
    table: new Table({
      name: 'column_mappings',
      columns: [
        id, int('distributorId', false), str('kind', 24, false), json('mapping', false),
        { name: 'updatedAt', type: 'datetime', isNullable: true },
      ],
    }),
    indices: [idx('column_mappings', ['distributorId', 'kind'], true)],
  },
  {
    table: new Table({
      name: 'import_changes',
      columns: [id, int('importId', false), str('entity', 40, false), int('rowId', false), json('before', false), int('beforeImportId')],
    }),
    indices: [idx('import_changes', ['importId']), idx('import_changes', ['beforeImportId'])],
  },
];

export class Catalog1764700000000 implements MigrationInterface {
  name = 'Catalog1764700000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    for (const { table, indices } of tables) {
      await queryRunner.createTable(portableTable(queryRunner, table));
      for (const index of indices) await queryRunner.createIndex(table.name, index);
    }
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    for (const { table } of [...tables].reverse()) await queryRunner.dropTable(table.name);
  }
}
