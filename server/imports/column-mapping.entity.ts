import type { DecimalConvention } from '../../shared/schemas/imports';
import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** A distributor's own headers mapped to our fields, remembered from the last upload that sent one. */
@Entity('column_mappings')
@Index(['distributorId', 'kind'], { unique: true })
export class ColumnMapping {
  @PrimaryGeneratedColumn({ type: 'integer' }) id: number;
  @Column({ type: 'integer' }) distributorId: number;
  @Column({ type: 'varchar', length: 24 }) kind: string;
  /** { "their header": "field" } */
  @Column({ type: 'simple-json' }) mapping: Record<string, string>;
  /** Price files: the decimal mark this distributor's last file showed (point 1,234.50 or comma 1.234,50). */
  @Column({ type: 'varchar', length: 8, nullable: true }) decimalConvention: DecimalConvention | null;
  @Column({ type: Date, nullable: true }) updatedAt: Date | null;
}
