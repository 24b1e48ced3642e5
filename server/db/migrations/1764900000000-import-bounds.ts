import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Issue 8: an import keeps its total count of row errors (only the first 500 are stored) and, for a
 * price file, the decimal mark its amounts were read with; a distributor's mapping remembers that mark.
 * Plain ADD COLUMNs: SQLite adds them without rebuilding the tables.
 */
export class ImportBounds1764900000000 implements MigrationInterface {
  name = 'ImportBounds1764900000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE "imports" ADD COLUMN "errorsTotal" integer NOT NULL DEFAULT (0)');
    await queryRunner.query('ALTER TABLE "imports" ADD COLUMN "decimalConvention" varchar(8)');
    await queryRunner.query('ALTER TABLE "imports" ADD COLUMN "decimalSource" varchar(8)');
    await queryRunner.query('ALTER TABLE "column_mappings" ADD COLUMN "decimalConvention" varchar(8)');
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE "column_mappings" DROP COLUMN "decimalConvention"');
    await queryRunner.query('ALTER TABLE "imports" DROP COLUMN "decimalSource"');
    await queryRunner.query('ALTER TABLE "imports" DROP COLUMN "decimalConvention"');
    await queryRunner.query('ALTER TABLE "imports" DROP COLUMN "errorsTotal"');
  }
}
