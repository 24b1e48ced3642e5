import type { MigrationInterface, QueryRunner } from 'typeorm';
import { Table } from 'typeorm';
import { id } from './columns';
import { portableTable } from './portable-table';

/** Users and their roles (Foundation). Written with the Table API so it runs on SQLite and PostgreSQL. */
export class Users1764650000000 implements MigrationInterface {
  name = 'Users1764650000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.createTable(
      portableTable(queryRunner, new Table({
        name: 'users',
        columns: [
          id,
          { name: 'email', type: 'varchar', length: '254', isUnique: true },
          { name: 'name', type: 'varchar', length: '120' },
          { name: 'role', type: 'varchar', length: '16' },
          { name: 'passwordHash', type: 'varchar', length: '100' },
          { name: 'active', type: 'boolean', default: true },
          { name: 'createdAt', type: 'datetime', default: 'CURRENT_TIMESTAMP' },
          { name: 'updatedAt', type: 'datetime', default: 'CURRENT_TIMESTAMP' },
        ],
      })),
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.dropTable('users');
  }
}
