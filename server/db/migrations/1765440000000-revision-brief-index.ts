import { TableIndex, type MigrationInterface, type QueryRunner } from 'typeorm';

const INDEX = 'IDX_system_revisions_brief';

/**
 * Every save and view of a record lists its revisions in brief (status, verdict, who and when). Those columns
 * sit after the large JSON columns (content, check), so SQLite read each revision's overflow pages to reach
 * them: a record's save grew slower with every revision. An index holding the brief columns answers that
 * list by itself (a covering index on SQLite, an index-only scan on PostgreSQL).
 */
export class RevisionBriefIndex1765440000000 implements MigrationInterface {
  name = 'RevisionBriefIndex1765440000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.createIndex(
      'system_revisions',
      new TableIndex({
        name: INDEX,
        columnNames: ['systemId', 'revision', 'id', 'status', 'verdict', 'savedAt', 'savedBy', 'finalizedBy', 'finalizedAt'],
      }),
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.dropIndex('system_revisions', INDEX);
  }
}
