import type { MigrationInterface, QueryRunner } from 'typeorm';
import { Table, TableIndex } from 'typeorm';
import { at, fk, id, ref } from './columns';

/** Jobs with their change history, matched-system records and revisions, readings, attachments, sent e-mail. */
export class Jobs1765000000000 implements MigrationInterface {
  name = 'Jobs1765000000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.createTable(
      new Table({
        name: 'jobs',
        columns: [
          id,
          { name: 'customerName', type: 'varchar', length: '120' },
          { name: 'siteAddress', type: 'varchar', length: '300' },
          { name: 'state', type: 'varchar', length: '2' },
          { name: 'contactEmail', type: 'varchar', length: '254', isNullable: true },
          { name: 'contactPhone', type: 'varchar', length: '40', isNullable: true },
          { name: 'notes', type: 'text', isNullable: true },
          { name: 'status', type: 'varchar', length: '8' },
          ref('createdBy', true),
          at('createdAt'),
          at('updatedAt'),
        ],
        foreignKeys: [fk('createdBy', 'users', 'SET NULL')],
        indices: [new TableIndex({ columnNames: ['status'] }), new TableIndex({ columnNames: ['createdAt'] })],
      }),
    );
    await queryRunner.createTable(
      new Table({
        name: 'job_changes',
        columns: [id, ref('jobId'), ref('userId', true), at('at'), { name: 'changes', type: 'text' }],
        foreignKeys: [fk('jobId', 'jobs', 'CASCADE'), fk('userId', 'users', 'SET NULL')],
        indices: [new TableIndex({ columnNames: ['jobId'] })],
      }),
    );
    await queryRunner.createTable(
      new Table({
        name: 'system_records',
        columns: [
          id,
          ref('jobId'),
          { name: 'status', type: 'varchar', length: '8' },
          { name: 'revision', type: 'integer' },
          ref('createdBy', true),
          at('createdAt'),
          at('updatedAt'),
        ],
        foreignKeys: [fk('jobId', 'jobs'), fk('createdBy', 'users', 'SET NULL')],
        indices: [new TableIndex({ columnNames: ['jobId'] })],
      }),
    );
    await queryRunner.createTable(
      new Table({
        name: 'system_revisions',
        columns: [
          id,
          ref('systemId'),
          { name: 'revision', type: 'integer' },
          { name: 'status', type: 'varchar', length: '8' },
          { name: 'content', type: 'text' },
          { name: 'check', type: 'text' },
          { name: 'rulesVersion', type: 'varchar', length: '20' },
          { name: 'verdict', type: 'varchar', length: '30' },
          { name: 'parts', type: 'text' },
          { name: 'ratedCombination', type: 'text', isNullable: true },
          { name: 'prices', type: 'text' },
          ref('savedBy', true),
          at('savedAt'),
          ref('finalizedBy', true),
          at('finalizedAt', true),
          { name: 'openItemsReason', type: 'varchar', length: '500', isNullable: true },
        ],
        foreignKeys: [
          fk('systemId', 'system_records', 'CASCADE'),
          fk('savedBy', 'users', 'SET NULL'),
          fk('finalizedBy', 'users', 'SET NULL'),
        ],
        indices: [new TableIndex({ columnNames: ['systemId', 'revision'], isUnique: true })],
      }),
    );
    await queryRunner.createTable(
      new Table({
        name: 'commissioning_readings',
        columns: [
          id,
          ref('systemId'),
          { name: 'revision', type: 'integer' },
          at('takenAt'),
          ref('takenBy', true),
          { name: 'label', type: 'varchar', length: '80', isNullable: true },
          ...['outdoorDbF', 'indoorDbF', 'indoorWbF', 'superheatF', 'subcoolingF'].map((name) => ({
            name,
            type: 'double precision',
            isNullable: true,
          })),
          { name: 'chargeVerdict', type: 'varchar', length: '16', isNullable: true },
          { name: 'evacuationMicrons', type: 'double precision', isNullable: true },
          { name: 'evacuationPassed', type: 'boolean', isNullable: true },
          { name: 'nitrogenPsig', type: 'double precision', isNullable: true },
          { name: 'pressureTestPassed', type: 'boolean', isNullable: true },
          { name: 'input', type: 'text' },
          { name: 'results', type: 'text' },
        ],
        foreignKeys: [fk('systemId', 'system_records', 'CASCADE'), fk('takenBy', 'users', 'SET NULL')],
        indices: [new TableIndex({ columnNames: ['systemId'] })],
      }),
    );
    await queryRunner.createTable(
      new Table({
        name: 'attachments',
        columns: [
          id,
          ref('jobId'),
          ref('systemId', true),
          { name: 'kind', type: 'varchar', length: '16' },
          { name: 'fileName', type: 'varchar', length: '120' },
          { name: 'contentType', type: 'varchar', length: '40' },
          { name: 'sizeBytes', type: 'integer' },
          { name: 'sha256', type: 'varchar', length: '64' },
          { name: 'storageKey', type: 'varchar', length: '64' },
          ref('uploadedBy', true),
          at('createdAt'),
        ],
        foreignKeys: [fk('jobId', 'jobs', 'CASCADE'), fk('systemId', 'system_records', 'SET NULL'), fk('uploadedBy', 'users', 'SET NULL')],
        indices: [new TableIndex({ columnNames: ['jobId'] }), new TableIndex({ columnNames: ['systemId'] })],
      }),
    );
    await queryRunner.createTable(
      new Table({
        name: 'outbound_emails',
        columns: [
          id,
          ref('systemId'),
          { name: 'revision', type: 'integer' },
          { name: 'to', type: 'varchar', length: '254' },
          { name: 'subject', type: 'varchar', length: '200' },
          { name: 'status', type: 'varchar', length: '8' },
          { name: 'messageId', type: 'varchar', length: '200', isNullable: true },
          { name: 'error', type: 'varchar', length: '300', isNullable: true },
          { name: 'reportKey', type: 'varchar', length: '64', isNullable: true },
          { name: 'reportFileName', type: 'varchar', length: '120', isNullable: true },
          ref('sentBy', true),
          at('createdAt'),
        ],
        foreignKeys: [fk('systemId', 'system_records', 'CASCADE'), fk('sentBy', 'users', 'SET NULL')],
        indices: [new TableIndex({ columnNames: ['systemId'] }), new TableIndex({ columnNames: ['createdAt'] })],
      }),
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    for (const table of [
      'outbound_emails',
      'attachments',
      'commissioning_readings',
      'system_revisions',
      'system_records',
      'job_changes',
      'jobs',
    ]) {
      await queryRunner.dropTable(table);
    }
  }
}
