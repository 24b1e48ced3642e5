import type { MigrationInterface, QueryRunner } from 'typeorm';

const TABLES = ['users', 'catalog_versions'];

/**
 * PostgreSQL only: every statement that writes `users` or `catalog_versions` sends a NOTIFY on
 * `tandem_changes`, which PostgreSQL delivers when (and only if) its transaction commits, so every
 * instance can keep those rows in memory and drop them at once (server/db/postgres-change-listener.ts).
 * A trigger, not application code, so a write from anywhere (a task, psql) is announced too.
 * SQLite needs nothing: its change counters are read per request (server/db/sqlite-dialect.ts).
 */
export class ChangeNotify1765400000000 implements MigrationInterface {
  name = 'ChangeNotify1765400000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    if (queryRunner.connection.options.type !== 'postgres') return;
    await queryRunner.query(
      `CREATE OR REPLACE FUNCTION "tandem_notify_change"() RETURNS trigger LANGUAGE plpgsql AS $$
       BEGIN PERFORM pg_notify('tandem_changes', TG_TABLE_NAME); RETURN NULL; END $$`,
    );
    for (const table of TABLES) {
      await queryRunner.query(
        `CREATE TRIGGER "${table}_notify_change" AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON "${table}" ` +
          `FOR EACH STATEMENT EXECUTE FUNCTION "tandem_notify_change"()`,
      );
    }
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    if (queryRunner.connection.options.type !== 'postgres') return;
    for (const table of TABLES) await queryRunner.query(`DROP TRIGGER IF EXISTS "${table}_notify_change" ON "${table}"`);
    await queryRunner.query('DROP FUNCTION IF EXISTS "tandem_notify_change"()');
  }
}
