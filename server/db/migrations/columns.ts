import type { TableColumnOptions, TableForeignKeyOptions } from 'typeorm';

// Column shapes the migrations repeat. A migration's effect must never change once it has shipped: change a
// helper only by adding a new one.

/** An auto-increment integer primary key named `id`. */
export const id: TableColumnOptions = { name: 'id', type: 'integer', isPrimary: true, isGenerated: true, generationStrategy: 'increment' };

/** An ISO-8601 date-time kept as text (`2026-12-02T16:05:53.000Z`, 24 characters; 30 leaves room). */
export const at = (name: string, nullable = false): TableColumnOptions => ({ name, type: 'varchar', length: '30', isNullable: nullable });

/** An integer id of a row in another table (its foreign key is declared apart, with `fk`). */
export const ref = (name: string, nullable = false): TableColumnOptions => ({ name, type: 'integer', isNullable: nullable });

/** A foreign key from `column` to `table`.id. */
export const fk = (column: string, table: string, onDelete = 'RESTRICT'): TableForeignKeyOptions => ({
  columnNames: [column],
  referencedTableName: table,
  referencedColumnNames: ['id'],
  onDelete,
});

/** A table of one settings row (id 1): the admin's values as JSON text, and when and by whom they were saved. */
export const settingsRowColumns = (): TableColumnOptions[] => [
  { name: 'id', type: 'integer', isPrimary: true },
  { name: 'settings', type: 'text' },
  at('updatedAt'),
  ref('updatedBy', true),
];
