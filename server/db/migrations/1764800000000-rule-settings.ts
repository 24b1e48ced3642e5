import type { MigrationInterface, QueryRunner } from 'typeorm';
import { Table } from 'typeorm';
import { DEFAULT_TRANSITION_RULES } from '../../../shared/regulation/transition-rules';
import { settingsRowColumns } from './columns';

/**
 * Rule settings (one row of admin values) and the refrigerant transition rules as editable data,
 * seeded from the shared defaults so the office starts from the published rules.
 */
export class RuleSettings1764800000000 implements MigrationInterface {
  name = 'RuleSettings1764800000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.createTable(
      new Table({
        name: 'rule_settings',
        columns: settingsRowColumns(),
      }),
    );
    await queryRunner.createTable(
      new Table({
        name: 'transition_rules',
        columns: [
          { name: 'id', type: 'varchar', length: '64', isPrimary: true },
          { name: 'position', type: 'integer' },
          { name: 'refrigerants', type: 'text' },
          { name: 'scope', type: 'varchar', length: '32' },
          { name: 'installFrom', type: 'varchar', length: '10' },
          { name: 'manufacturedBefore', type: 'varchar', length: '10', isNullable: true },
          { name: 'severity', type: 'varchar', length: '16' },
          { name: 'citation', type: 'varchar', length: '300' },
          { name: 'note', type: 'text' },
        ],
      }),
    );
    // Plain SQL with named parameters (escaped by the driver in use), not the entity: a migration
    // must not depend on how the entity maps columns later.
    const driver = queryRunner.connection.driver;
    for (const [position, r] of DEFAULT_TRANSITION_RULES.entries()) {
      const [sql, params] = driver.escapeQueryWithParameters(
        'INSERT INTO "transition_rules" ("id", "position", "refrigerants", "scope", "installFrom", "manufacturedBefore", "severity", "citation", "note") ' +
          'VALUES (:id, :position, :refrigerants, :scope, :installFrom, :manufacturedBefore, :severity, :citation, :note)',
        {
          id: r.id,
          position,
          refrigerants: JSON.stringify(r.refrigerants),
          scope: r.scope,
          installFrom: r.installFrom,
          manufacturedBefore: r.manufacturedBefore ?? null,
          severity: r.severity,
          citation: r.citation,
          note: r.note,
        },
        {},
      );
      await queryRunner.query(sql, params);
    }
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.dropTable('transition_rules');
    await queryRunner.dropTable('rule_settings');
  }
}
