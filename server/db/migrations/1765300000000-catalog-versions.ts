import type { MigrationInterface, QueryRunner } from 'typeorm';
import { Table } from 'typeorm';

/**
 * One version counter per catalog kind, bumped in the same transaction as an import's commit or
 * revert, so every server instance can check it cheaply on each request and rebuild its in-memory
 * index at once (issue 13). Table API, so it runs on SQLite and PostgreSQL.
 */
export class CatalogVersions1765300000000 implements MigrationInterface {
  name = 'CatalogVersions1765300000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.createTable(
      new Table({
        name: 'catalog_versions',
        columns: [
          { name: 'kind', type: 'varchar', length: '24', isPrimary: true },
          { name: 'version', type: 'integer', default: 0 },
        ],
      }),
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.dropTable('catalog_versions');
  }
}
