import type { MigrationInterface, QueryRunner } from 'typeorm';
import { Table, TableColumn, TableIndex } from 'typeorm';
import { at, fk, id, ref, settingsRowColumns } from './columns';

/** Priced options on a job (issue 11), the shop's pricing settings, and proposal e-mails in the outbox. */
export class JobOptions1765200000000 implements MigrationInterface {
  name = 'JobOptions1765200000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.createTable(
      new Table({
        name: 'job_options',
        columns: [
          id,
          ref('jobId'),
          { name: 'name', type: 'varchar', length: '60' },
          { name: 'revision', type: 'integer' },
          { name: 'content', type: 'text' },
          { name: 'lines', type: 'text' },
          at('chosenAt', true),
          ref('createdBy', true),
          at('createdAt'),
          at('updatedAt'),
        ],
        foreignKeys: [fk('jobId', 'jobs', 'CASCADE'), fk('createdBy', 'users', 'SET NULL')],
        indices: [new TableIndex({ columnNames: ['jobId'] })],
      }),
    );
    await queryRunner.createTable(
      new Table({
        name: 'shop_settings',
        columns: settingsRowColumns(),
      }),
    );
    // A proposal e-mail belongs to a job, not a system record: systemId and revision become optional.
    await queryRunner.changeColumns('outbound_emails', [
      {
        oldColumn: new TableColumn({ name: 'systemId', type: 'integer' }),
        newColumn: new TableColumn({ name: 'systemId', type: 'integer', isNullable: true }),
      },
      {
        oldColumn: new TableColumn({ name: 'revision', type: 'integer' }),
        newColumn: new TableColumn({ name: 'revision', type: 'integer', isNullable: true }),
      },
    ]);
    await queryRunner.addColumn('outbound_emails', new TableColumn({ name: 'jobId', type: 'integer', isNullable: true }));
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.dropColumn('outbound_emails', 'jobId');
    await queryRunner.query('DELETE FROM outbound_emails WHERE "systemId" IS NULL');
    await queryRunner.changeColumns('outbound_emails', [
      {
        oldColumn: new TableColumn({ name: 'systemId', type: 'integer', isNullable: true }),
        newColumn: new TableColumn({ name: 'systemId', type: 'integer' }),
      },
      {
        oldColumn: new TableColumn({ name: 'revision', type: 'integer', isNullable: true }),
        newColumn: new TableColumn({ name: 'revision', type: 'integer' }),
      },
    ]);
    await queryRunner.dropTable('shop_settings');
    await queryRunner.dropTable('job_options');
  }
}
