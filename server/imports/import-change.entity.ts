import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/**
 * A row an import updated, with its values before (revert restores them). Rows an import inserted
 * need no entry: they carry its importId and revert deletes them.
 */
@Entity('import_changes')
export class ImportChange {
  @PrimaryGeneratedColumn({ type: 'integer' }) id: number;
  @Index() @Column({ type: 'integer' }) importId: number;
  /** Table name of the changed row. */
  @Column({ type: 'varchar', length: 40 }) entity: string;
  @Column({ type: 'integer' }) rowId: number;
  @Column({ type: 'text' }) before: string;
  /** The import that had written the row before (null: none); guards reverting out of order. */
  @Index() @Column({ type: 'integer', nullable: true }) beforeImportId: number | null;
}
