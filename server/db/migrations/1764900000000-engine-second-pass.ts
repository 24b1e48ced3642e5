import type { MigrationInterface, QueryRunner } from 'typeorm';
import { TableColumn } from 'typeorm';

/**
 * Engine second pass (issue 12): outdoor units carry two lift limits, a standard line length, a
 * copper-only marking and the protection the nameplate calls for; air handlers carry a blower table (CFM by tap at external static
 * pressures, stored as JSON), the heat kit's rated voltage and, with their own coil, a leak sensor.
 * Table API only, so it runs on SQLite and PostgreSQL.
 */
const COLUMNS: Record<string, TableColumn[]> = {
  outdoor_units: [
    new TableColumn({ name: 'maxLiftOutdoorAboveFt', type: 'double precision', isNullable: true }),
    new TableColumn({ name: 'maxLiftOutdoorBelowFt', type: 'double precision', isNullable: true }),
    new TableColumn({ name: 'standardLineLengthFt', type: 'double precision', isNullable: true }),
    new TableColumn({ name: 'copperOnly', type: 'boolean', isNullable: true }),
    new TableColumn({ name: 'overcurrentRequired', type: 'varchar', length: '16', isNullable: true }),
  ],
  air_handlers: [
    new TableColumn({ name: 'blowerTable', type: 'text', isNullable: true }),
    new TableColumn({ name: 'heatKitRatedVoltage', type: 'double precision', isNullable: true }),
    new TableColumn({ name: 'leakSensor', type: 'boolean', isNullable: true }),
  ],
};

export class EngineSecondPass1764900000000 implements MigrationInterface {
  name = 'EngineSecondPass1764900000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    for (const [table, columns] of Object.entries(COLUMNS)) await queryRunner.addColumns(table, columns);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    for (const [table, columns] of Object.entries(COLUMNS)) await queryRunner.dropColumns(table, columns);
  }
}
